/**
 * IndexedDB database "grainline-basemaps": the offline basemap archives a team loaded onto
 * this device. One object store, `archives`, key = archive id, value = the PMTiles file as a
 * Blob with what its header says (zoom range, bounds, tile type, name, attribution).
 *
 * Kept apart from the survey database ("grainline", web/storage) because the archives are
 * large, replaceable files, not records: removing one never touches a survey, and the survey
 * database's upgrades never have to move hundreds of megabytes.
 */
import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { ArchiveInfo } from './pmtiles-archive.js';

export const BASEMAP_DB_NAME = 'grainline-basemaps';
const BASEMAP_DB_VERSION = 1;

export interface StoredBasemap {
  id: string;
  /** The file name it was loaded from (plain text). */
  fileName: string;
  blob: Blob;
  bytes: number;
  addedAt: string;
  info: ArchiveInfo;
}

interface BasemapSchema extends DBSchema {
  archives: { key: string; value: StoredBasemap };
}

let dbPromise: Promise<IDBPDatabase<BasemapSchema>> | null = null;

function db(): Promise<IDBPDatabase<BasemapSchema>> {
  dbPromise ??= openDB<BasemapSchema>(BASEMAP_DB_NAME, BASEMAP_DB_VERSION, {
    upgrade(database, oldVersion) {
      if (oldVersion < 1) database.createObjectStore('archives', { keyPath: 'id' });
    },
    terminated() {
      dbPromise = null; // reopen on next use
    },
  });
  return dbPromise;
}

function isStored(v: unknown): v is StoredBasemap {
  if (typeof v !== 'object' || v === null) return false;
  const r = v as Record<string, unknown>;
  return (
    typeof r['id'] === 'string' &&
    typeof r['fileName'] === 'string' &&
    r['blob'] instanceof Blob &&
    typeof r['info'] === 'object' &&
    r['info'] !== null
  );
}

/** Every stored archive (unreadable rows are skipped: they are replaceable files). */
export async function listBasemaps(): Promise<StoredBasemap[]> {
  const rows: unknown[] = await (await db()).getAll('archives');
  return rows.filter(isStored).sort((a, b) => (a.addedAt < b.addedAt ? 1 : -1));
}

export async function getBasemap(id: string): Promise<StoredBasemap | undefined> {
  const row: unknown = await (await db()).get('archives', id);
  return isStored(row) ? row : undefined;
}

export async function putBasemap(row: StoredBasemap): Promise<void> {
  await (await db()).put('archives', row);
}

export async function deleteBasemap(id: string): Promise<void> {
  await (await db()).delete('archives', id);
}
