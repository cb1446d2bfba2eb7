/** Physical constants and unit helpers shared by the calculation. */
export { G } from './gravity.js';
