/**
 * Loads the demo town (test/fixtures/demo/demo-town.geojson, written by `npm run demo`) into
 * the device storage through web/exchange's import: the same validation and the same
 * all-or-nothing write as any exchange file. The file is bundled as a separate asset and
 * fetched only when asked for, so it adds nothing to the first load.
 */
import demoUrl from '../../test/fixtures/demo/demo-town.geojson?url';
import { importDemoTown } from '../exchange/device-exchange.js';
import type { ImportReport } from '../exchange/import-file.js';

/** URL of the bundled demo file. */
export const DEMO_TOWN_URL: string = demoUrl;

/** Fetches the bundled demo town and imports it; resolves to the import report. */
export function loadDemoTown(): Promise<ImportReport> {
  return importDemoTown({ url: DEMO_TOWN_URL });
}
