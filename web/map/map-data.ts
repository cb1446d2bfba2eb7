/** Loads what the map shows from device storage: every current survey, and the conflict flags. */
import { readConflictFlags, deviceStore } from '../exchange/index.js';
import { toMapData, type MapData } from './map-points.js';

export async function loadMapData(): Promise<MapData> {
  const store = deviceStore();
  const [records, flags] = await Promise.all([
    store.listSurveys(),
    readConflictFlags(store).catch(() => []),
  ]);
  return toMapData(records, new Set(flags.map((f) => f.surveyId)));
}
