/**
 * The page side of the browser storage benchmark (test/bench/storage-browser.bench.ts):
 * bulk put and get of N seeded surveys in Chromium's real IndexedDB, through the storage
 * layer (`SurveyStore`) and through the bare IndexedDB API on the same rows, in databases
 * with the app's own layout (db.ts `upgrade`). Bundled by the benchmark with Vite; exposes
 * `window.storageBench(count, seed)`, which returns the raw timings.
 */
import { unwrap } from 'idb';
import type { SurveyRecord } from '../../../forms/index.js';
import { DB_VERSION, openDatabase } from '../../../web/storage/db.js';
import { toRevisionRow, toSurveyRow } from '../../../web/storage/rows.js';
import { SurveyStore } from '../../../web/storage/survey-store.js';
import { mulberry32 } from '../prng.js';
import { sampleSurveys } from '../survey-sample.js';

export interface BrowserBulkFigures {
  count: number;
  bytesPerRecord: number;
  /** Two rounds each, in the order bare, ours, ours, bare. */
  putOursMs: number[];
  putBareMs: number[];
  getOursMs: number[];
  getBareMs: number[];
  byIdCount: number;
  byIdOursMs: number;
  byIdBareMs: number;
}

function gc(): void {
  (globalThis as { gc?: () => void }).gc?.();
}

function req<T>(r: IDBRequest<T>): Promise<T> {
  return new Promise((resolve, reject) => {
    r.onsuccess = () => resolve(r.result);
    r.onerror = () => reject(r.error);
  });
}

function txDone(tx: IDBTransaction): Promise<void> {
  return new Promise((resolve, reject) => {
    tx.oncomplete = () => resolve();
    tx.onerror = () => reject(tx.error);
    tx.onabort = () => reject(tx.error);
  });
}

async function deleteDb(name: string): Promise<void> {
  await new Promise<void>((resolve, reject) => {
    const r = indexedDB.deleteDatabase(name);
    r.onsuccess = () => resolve();
    r.onerror = () => reject(r.error);
  });
}

/** A bare IDBDatabase with exactly the app's stores and indexes. */
async function openBare(name: string): Promise<IDBDatabase> {
  return unwrap(await openDatabase(indexedDB, name, DB_VERSION)) as IDBDatabase;
}

async function timed<T>(fn: () => Promise<T>): Promise<{ ms: number; value: T }> {
  gc();
  await new Promise((r) => setTimeout(r, 50));
  const t0 = performance.now();
  const value = await fn();
  return { ms: performance.now() - t0, value };
}

async function storageBench(count: number, seed: number): Promise<BrowserBulkFigures> {
  const make = sampleSurveys(seed);
  const records: SurveyRecord[] = Array.from({ length: count }, (_, i) => make(i));
  const savedAt = new Date().toISOString();
  // The rows the store writes, built beforehand so the bare runs do no extra work.
  const currentRows = records.map((r) => toSurveyRow(r, 'bench'));
  const revisionRows = records.map((r) => toRevisionRow(r, 'import', savedAt, null, null));

  let n = 0;
  const fresh = () => `bench-${seed}-${n++}`;

  const barePut = async () => {
    const name = fresh();
    const db = await openBare(name);
    const r = await timed(async () => {
      // Same durability as the app's saves (transaction.ts): flushed to disk at commit.
      const tx = db.transaction(['surveys', 'revisions'], 'readwrite', { durability: 'strict' });
      const s = tx.objectStore('surveys');
      const rv = tx.objectStore('revisions');
      for (let i = 0; i < count; i++) {
        rv.add(revisionRows[i]);
        s.put(currentRows[i]);
      }
      await txDone(tx);
    });
    return { ms: r.ms, db, name };
  };
  const ourPut = async () => {
    const name = fresh();
    const store = new SurveyStore({
      name,
      storage: null,
      broadcast: false,
      isInstalled: () => false,
    });
    const r = await timed(() => store.writeRevisions(records));
    if (r.value.revisionsWritten !== count) throw new Error('not every record was written');
    return { ms: r.ms, store, name };
  };

  // Put: two rounds in swapped order, each into a fresh database; the first of each side is
  // dropped before the next is filled, so disk and memory hold at most two copies.
  const bare1 = await barePut();
  bare1.db.close();
  await deleteDb(bare1.name);
  const ours1 = await ourPut();
  ours1.store.close();
  await deleteDb(ours1.name);
  const ours2 = await ourPut();
  const bare2 = await barePut();
  const bareDb = bare2.db;
  const store = ours2.store;

  // Get all: every current row (ours: parsed and migrated through the schema, sorted).
  const bareGet = () =>
    timed(async () => {
      const tx = bareDb.transaction('surveys', 'readonly');
      return (await req(tx.objectStore('surveys').getAll())).length;
    });
  const ourGet = () => timed(async () => (await store.listSurveys()).length);
  const g1 = await bareGet();
  const o1 = await ourGet();
  const o2 = await ourGet();
  const g2 = await bareGet();
  if (o1.value !== count || g1.value !== count) throw new Error('counts differ');

  // Get by id: 10,000 random ids, one transaction each (as a screen opening a survey does).
  const rand = mulberry32(seed + 1);
  const ids = Array.from(
    { length: Math.min(10_000, count) },
    () => (records[Math.floor(rand() * count)] as SurveyRecord).id,
  );
  const bareById = await timed(async () => {
    for (const id of ids) {
      const tx = bareDb.transaction('surveys', 'readonly');
      await req(tx.objectStore('surveys').get(id));
    }
  });
  const ourById = await timed(async () => {
    for (const id of ids) await store.getSurvey(id);
  });

  bareDb.close();
  store.close();
  await deleteDb(bare2.name);
  await deleteDb(ours2.name);
  return {
    count,
    bytesPerRecord: JSON.stringify(records[0]).length,
    putOursMs: [ours1.ms, ours2.ms],
    putBareMs: [bare1.ms, bare2.ms],
    getOursMs: [o1.ms, o2.ms],
    getBareMs: [g1.ms, g2.ms],
    byIdCount: ids.length,
    byIdOursMs: ourById.ms,
    byIdBareMs: bareById.ms,
  };
}

(globalThis as { storageBench?: typeof storageBench }).storageBench = storageBench;
