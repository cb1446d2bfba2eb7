/** The offline basemap archives on this device (store `archives` of map-db.ts). */
import { mapDb, type StoredBasemap } from './map-db.js';

export type { StoredBasemap } from './map-db.js';

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
  const rows: unknown[] = await (await mapDb()).getAll('archives');
  return rows.filter(isStored).sort((a, b) => (a.addedAt < b.addedAt ? 1 : -1));
}

export async function getBasemap(id: string): Promise<StoredBasemap | undefined> {
  const row: unknown = await (await mapDb()).get('archives', id);
  return isStored(row) ? row : undefined;
}

export async function putBasemap(row: StoredBasemap): Promise<void> {
  await (await mapDb()).put('archives', row);
}

export async function deleteBasemap(id: string): Promise<void> {
  await (await mapDb()).delete('archives', id);
}
