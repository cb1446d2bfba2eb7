/**
 * Storage benchmark: `npx tsx test/bench/storage.bench.ts` (BENCH_COUNT=… to change N).
 *
 * Bulk put and get of N (100,000) seeded random surveys (mulberry32), through the storage
 * layer and through bare IndexedDB on the same data, side by side in one run:
 *
 * - put, ours: `SurveyStore.writeRevisions(records)` — zod validation of every record, one
 *   revision row and one current row per record (with derived index fields), one
 *   transaction.
 * - put, bare (same layout): raw IndexedDB API, one transaction, the same two rows per
 *   record, no validation. This is the like-for-like baseline the ratio uses.
 * - put, bare (one row): one `put` per record into a single store: what the data costs
 *   with no history at all, for context.
 * - get, ours: `SurveyStore.listSurveys()` — every row read, parsed and migrated through
 *   the schema, sorted newest first. Bare: `getAll()` on the same store.
 * - get by id, 10,000 random ids: `getSurvey(id)` against a bare `get(id)`, and idb's own
 *   `db.get` (no parsing) to show how much of the difference is idb's promise wrapper.
 *
 * Runs in Node on fake-indexeddb (an in-memory JavaScript implementation), so absolute
 * figures say little about a phone; the ratios show the wrapper's own cost (validation,
 * row building, parsing). The browser figures (the same bulk numbers on Chromium's
 * IndexedDB, and the keystroke-to-durable-save latency p50/p95 under 4× CPU throttling)
 * come from test/bench/storage-browser.bench.ts.
 *
 * A benchmark, not a test: it prints figures and never fails on speed.
 */
import { spawnSync } from 'node:child_process';
import { getHeapStatistics } from 'node:v8';
import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import type { SurveyRecord } from '../../forms/index.js';
import { SurveyStore } from '../../web/storage/index.js';
import { cellOf, outcomeOf } from '../../web/storage/derived.js';
import { mulberry32 } from './prng.js';
import { sampleSurveys } from './survey-sample.js';

const COUNT = Number(process.env.BENCH_COUNT ?? 100_000);
const SEED = 20_250_611;
const GOAL = 1.5;

const makeSurvey = sampleSurveys(SEED);
/** Picks the ids for the get-by-id round (its own stream, so the records do not change). */
const rand = mulberry32(SEED + 1);

function gc(): void {
  (globalThis as { gc?: () => void }).gc?.();
}

async function time<T>(fn: () => Promise<T>): Promise<{ ms: number; value: T }> {
  gc();
  const t0 = performance.now();
  const value = await fn();
  return { ms: performance.now() - t0, value };
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

/** Bare IndexedDB with the same stores and indexes as the app's database. */
async function openBare(factory: IDBFactory): Promise<IDBDatabase> {
  const r = factory.open('bare', 1);
  r.onupgradeneeded = () => {
    const db = r.result;
    const s = db.createObjectStore('surveys', { keyPath: 'id' });
    s.createIndex('updatedAt', 'updatedAt');
    s.createIndex('outcome', 'outcome');
    s.createIndex('cell', 'cell');
    const rv = db.createObjectStore('revisions', { keyPath: 'seq', autoIncrement: true });
    rv.createIndex('surveyId', 'surveyId');
    rv.createIndex('surveyRevision', ['surveyId', 'revision']);
    db.createObjectStore('plain', { keyPath: 'id' });
  };
  return req(r);
}

async function main(): Promise<void> {
  console.log(
    `Storage bench: ${COUNT.toLocaleString('en')} surveys, seed ${SEED}, Node ${process.version}, fake-indexeddb`,
  );
  const records = Array.from({ length: COUNT }, (_, i) => makeSurvey(i));
  const bytes = JSON.stringify(records[0]).length;
  console.log(`one record ≈ ${bytes} bytes as JSON`);
  // The same rows the store writes, built beforehand so the bare runs do no extra work.
  const now = new Date().toISOString();
  const currentRows = records.map((r) => {
    const row: Record<string, unknown> = {
      id: r.id,
      revision: r.revision,
      updatedAt: r.updatedAt,
      outcome: outcomeOf(r),
      saveId: 'bench',
      record: r,
    };
    const cell = cellOf(r);
    if (cell !== undefined) row['cell'] = cell;
    return row;
  });
  const revisionRows = records.map((r) => ({
    surveyId: r.id,
    revision: r.revision,
    savedAt: now,
    kind: 'import',
    conflictWith: null,
    tabId: null,
    record: r,
  }));

  // ——— put ———
  // Two rounds in swapped order, each into a fresh database; the faster of each side counts,
  // so warm-up and garbage collection do not favour whichever runs second.
  const barePutOnce = async () => {
    const db = await openBare(new IDBFactory());
    const r = await time(async () => {
      const tx = db.transaction(['surveys', 'revisions'], 'readwrite');
      const s = tx.objectStore('surveys');
      const rv = tx.objectStore('revisions');
      for (let i = 0; i < COUNT; i++) {
        rv.add(revisionRows[i]);
        s.put(currentRows[i]);
      }
      await txDone(tx);
    });
    return { ms: r.ms, db };
  };
  const ourPutOnce = async () => {
    const s = new SurveyStore({
      indexedDB: new IDBFactory(),
      storage: null,
      broadcast: false,
      isInstalled: () => false,
    });
    const r = await time(() => s.writeRevisions(records));
    if (r.value.revisionsWritten !== COUNT) throw new Error('not every record was written');
    return { ms: r.ms, store: s };
  };
  // Each first-round database is closed and dropped before the next one is filled, so
  // memory holds at most two copies of the data.
  let bare1: Awaited<ReturnType<typeof barePutOnce>> | null = await barePutOnce();
  bare1.db.close();
  const bare1Ms = bare1.ms;
  bare1 = null;
  let ours1: Awaited<ReturnType<typeof ourPutOnce>> | null = await ourPutOnce();
  const ours1Ms = ours1.ms;
  ours1.store.close();
  ours1 = null;
  gc();
  const ours2 = await ourPutOnce();
  const bare2 = await barePutOnce();
  const barePut = { ms: Math.min(bare1Ms, bare2.ms) };
  const ourPut = { ms: Math.min(ours1Ms, ours2.ms) };
  const bareDb = bare2.db;
  const store = ours2.store;
  console.log(
    `put rounds, ms: bare ${Math.round(bare1Ms)} / ${Math.round(bare2.ms)}, ours ${Math.round(ours1Ms)} / ${Math.round(ours2.ms)}`,
  );
  const barePlain = await time(async () => {
    const tx = bareDb.transaction('plain', 'readwrite');
    const p = tx.objectStore('plain');
    for (const r of records) p.put(r);
    await txDone(tx);
  });

  // ——— get all ——— (two rounds, swapped order, faster of each)
  const bareGetOnce = () =>
    time(async () => {
      const tx = bareDb.transaction('surveys', 'readonly');
      const all = await req(tx.objectStore('surveys').getAll());
      return all.length;
    });
  const ourGetOnce = () => time(() => store.listSurveys());
  const g1 = await bareGetOnce();
  const o1 = await ourGetOnce();
  const o2 = await ourGetOnce();
  const g2 = await bareGetOnce();
  if (o1.value.length !== COUNT || g1.value !== COUNT) throw new Error('counts differ');
  const bareGet = { ms: Math.min(g1.ms, g2.ms) };
  const ourGet = { ms: Math.min(o1.ms, o2.ms) };

  // ——— get by id ———
  const ids = Array.from(
    { length: 10_000 },
    () => (records[Math.floor(rand() * COUNT)] as SurveyRecord).id,
  );
  const bareById = await time(async () => {
    for (const id of ids) {
      const tx = bareDb.transaction('surveys', 'readonly');
      await req(tx.objectStore('surveys').get(id));
    }
  });
  // idb's own `db.get` on the store's database, no parsing: separates the cost of idb's
  // promise wrapper from the storage layer's. Same database as `getSurvey`, swapped order.
  const ourDb = await store.database();
  const idbOnce = () =>
    time(async () => {
      for (const id of ids) await ourDb.get('surveys', id);
    });
  const oursOnce = () =>
    time(async () => {
      for (const id of ids) await store.getSurvey(id);
    });
  const i1 = await idbOnce();
  const s1 = await oursOnce();
  const s2 = await oursOnce();
  const i2 = await idbOnce();
  const ourById = { ms: Math.min(s1.ms, s2.ms) };
  const idbById = { ms: Math.min(i1.ms, i2.ms) };

  const rate = (n: number, ms: number) => `${Math.round((n / ms) * 1000).toLocaleString('en')}/s`;
  const ratio = (ours: number, bare: number) => (ours / bare).toFixed(2);
  const rows = [
    [
      'put (revision + current, 1 tx)',
      rate(COUNT, ourPut.ms),
      rate(COUNT, barePut.ms),
      ratio(ourPut.ms, barePut.ms),
    ],
    [
      'get all (listSurveys vs getAll)',
      rate(COUNT, ourGet.ms),
      rate(COUNT, bareGet.ms),
      ratio(ourGet.ms, bareGet.ms),
    ],
    [
      'get by id (10,000 random)',
      rate(ids.length, ourById.ms),
      rate(ids.length, bareById.ms),
      ratio(ourById.ms, bareById.ms),
    ],
  ];
  console.log('\nrecords per second (ours | bare IndexedDB | time ratio ours/bare, goal ≤ 1.5)');
  for (const [name, ours, bare, r] of rows) {
    console.log(
      `  ${name!.padEnd(34)} ${ours!.padStart(12)} | ${bare!.padStart(12)} | ${r}×${Number(r) <= GOAL ? '' : '  (above goal)'}`,
    );
  }
  console.log(`  context: bare put into one store, no history: ${rate(COUNT, barePlain.ms)}`);
  console.log(
    `  context: get by id through idb alone (no parsing): ${rate(ids.length, idbById.ms)}, ` +
      `so the storage layer's own share is ${ratio(ourById.ms, idbById.ms)}× of idb's`,
  );
  console.log(
    '\nNode with fake-indexeddb, not a browser. The browser figures (bulk on Chromium, keystroke\n' +
      'to durable save under 4× CPU throttling): npx tsx test/bench/storage-browser.bench.ts',
  );
  store.close();
  bareDb.close();
}

// fake-indexeddb keeps every database in the JavaScript heap; two copies of 100,000 surveys
// do not fit Node's default heap without constant garbage collection, which would distort
// the figures. Run again with a larger heap if needed.
const HEAP_MB = 12_288;
if (
  getHeapStatistics().heap_size_limit < (HEAP_MB / 2) * 1024 * 1024 &&
  !process.env.STORAGE_BENCH_CHILD
) {
  const r = spawnSync(
    process.execPath,
    [`--max-old-space-size=${HEAP_MB}`, ...process.execArgv, ...process.argv.slice(1)],
    { stdio: 'inherit', env: { ...process.env, STORAGE_BENCH_CHILD: '1' } },
  );
  process.exit(r.status ?? 1);
} else {
  await main();
}
