/**
 * The demo town: `loadDemoTown()` fetches the bundled demo file and imports it through
 * web/exchange (see load-demo-town.ts). Import this folder lazily, from the button that
 * loads the demo.
 */
export { DEMO_TOWN_URL, loadDemoTown } from './load-demo-town.js';
