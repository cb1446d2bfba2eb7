/**
 * Loads what the map shows: from the map's cache first when it is current (map-cache.ts),
 * then the surveys saved since; or, without a usable cache, every current survey from
 * device storage. `onData` is called once or twice: the cached view, then the checked one
 * (only when something changed).
 */
import { IMPORT_STAMP_SETTING, readConflictFlags } from '../exchange/index.js';
import { getDefaultStore } from '../storage/index.js';
import { applyChanges, readMapCache, writeMapCache } from './map-cache.js';
import { toMapData, type MapData } from './map-points.js';

function mark(name: string): void {
  try {
    performance.mark(name);
  } catch {
    // diagnostics only
  }
}

export type DataPhase = 'cached' | 'checked';

export async function loadMapData(
  onData: (data: MapData, phase: DataPhase) => void,
): Promise<void> {
  const store = getDefaultStore();
  const [cache, stampValue] = await Promise.all([
    readMapCache(),
    store.getSetting(IMPORT_STAMP_SETTING).catch(() => undefined),
  ]);
  const stamp = typeof stampValue === 'string' ? stampValue : null;
  const builtAt = new Date().toISOString();

  if (cache && cache.importStamp === stamp) {
    mark('grainline:map-records');
    onData(cache.data, 'cached');
    const [changed, flags] = await Promise.all([
      store.listUpdatedSince(cache.builtAt),
      readConflictFlags(store).catch(() => []),
    ]);
    const conflictIds = new Set(flags.map((f) => f.surveyId));
    const next = applyChanges(cache.data, toMapData(changed, conflictIds), conflictIds);
    const flagsMoved = [...cache.data.points, ...cache.data.unplaced].some(
      (s) => s.conflict !== conflictIds.has(s.id),
    );
    if (changed.length > 0 || flagsMoved) {
      onData(next, 'checked');
      await writeMapCache(next, builtAt, stamp);
    } else {
      // Nothing changed: the cache stays as it is (the next check looks from its time on).
      onData(cache.data, 'checked');
    }
    return;
  }

  const [records, flags] = await Promise.all([
    store.listSurveys(),
    readConflictFlags(store).catch(() => []),
  ]);
  mark('grainline:map-records');
  const data = toMapData(records, new Set(flags.map((f) => f.surveyId)));
  onData(data, 'checked');
  await writeMapCache(data, builtAt, stamp);
}
