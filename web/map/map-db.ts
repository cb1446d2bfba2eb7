/**
 * IndexedDB database "grainline-basemaps", the map's own small database:
 * - `archives` — the offline basemap archives a team loaded onto this device: key =
 *   archive id, value = the PMTiles file as a Blob with what its header says (zoom range,
 *   bounds, tile type, name, attribution). See basemap-store.ts.
 * - `map-cache` — one row, key 'summary': a compact copy of what the map draws of every
 *   survey (position, posting, damage state, flags, names), so the map can draw 100 000
 *   surveys at once when it opens instead of waiting for every record to be read and
 *   checked. It is only a cache: the surveys themselves live in "grainline" (web/storage),
 *   and the map checks them for changes after drawing. See map-cache.ts.
 *
 * Kept apart from the survey database because both are replaceable: removing an archive or
 * the cache never touches a survey, and the survey database's upgrades never have to move
 * hundreds of megabytes of tiles.
 */
import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { ArchiveInfo } from './pmtiles-archive.js';

export const MAP_DB_NAME = 'grainline-basemaps';
const MAP_DB_VERSION = 2;

export interface StoredBasemap {
  id: string;
  /** The file name it was loaded from (plain text). */
  fileName: string;
  blob: Blob;
  bytes: number;
  addedAt: string;
  info: ArchiveInfo;
}

export interface MapDbSchema extends DBSchema {
  archives: { key: string; value: StoredBasemap };
  'map-cache': { key: string; value: unknown };
}

let dbPromise: Promise<IDBPDatabase<MapDbSchema>> | null = null;

/** The open database (opened on first use, reopened after the browser closed it). */
export function mapDb(): Promise<IDBPDatabase<MapDbSchema>> {
  dbPromise ??= openDB<MapDbSchema>(MAP_DB_NAME, MAP_DB_VERSION, {
    upgrade(database, oldVersion) {
      // One step per version; never edit a past step.
      if (oldVersion < 1) database.createObjectStore('archives', { keyPath: 'id' });
      if (oldVersion < 2) database.createObjectStore('map-cache');
    },
    blocking() {
      // A newer tab wants to upgrade: let it (this tab reopens on next use).
      void dbPromise?.then((d) => d.close());
      dbPromise = null;
    },
    terminated() {
      dbPromise = null;
    },
  }).catch((err: unknown) => {
    dbPromise = null;
    throw err;
  });
  return dbPromise;
}
