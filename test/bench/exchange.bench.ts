/**
 * Exchange benchmark: `npx tsx test/bench/exchange.bench.ts` (BENCH_COUNT to change the
 * number of surveys, default 100,000).
 *
 * 1. Export: the GeoJSON FeatureCollection of N surveys (geoJsonExport, every record whole
 *    plus its summary properties) beside a bare `JSON.stringify` of the same records, in the
 *    same run; ratio (goal ≤ 1.5×). The CSV summary is timed too.
 * 2. Import: read + validate every Feature (JSON.parse and the forms/ zod schemas) and plan
 *    the merge, into an empty device and again into a device that already holds every
 *    survey (all duplicates); surveys per second.
 * 3. Writing the plan through storage's writeRevisions, on fake-indexeddb in Node, for a
 *    smaller batch (fake-indexeddb is far slower than a browser's IndexedDB, so this figure
 *    is a floor, not the app's speed).
 *
 * Seeded (mulberry32 through the town fixture). A benchmark: it prints figures, never fails.
 */
import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import type { SurveyRecord } from '../../forms/index.js';
import { csvParts } from '../../web/exchange/csv-export.js';
import { geoJsonExport } from '../../web/exchange/geojson-export.js';
import { readExchangeText } from '../../web/exchange/geojson-import.js';
import { importText } from '../../web/exchange/import-file.js';
import { planMerge, type ExistingSurvey } from '../../web/exchange/merge-plan.js';
import { SurveyStore } from '../../web/storage/index.js';
import { makeTown } from '../fixtures/exchange/town.js';

const COUNT = Number(process.env.BENCH_COUNT ?? 100_000);
const WRITE_COUNT = Number(process.env.BENCH_WRITE_COUNT ?? 5_000);
const RUNS = 3;
const context = { exportedAt: new Date('2031-05-14T18:00:00.000Z'), build: 'bench' };

function gc(): void {
  (globalThis as { gc?: () => void }).gc?.();
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
}

function time<T>(fn: () => T): { ms: number; value: T } {
  gc();
  const t0 = performance.now();
  const value = fn();
  return { ms: performance.now() - t0, value };
}

const fmt = (ms: number) => `${ms.toFixed(0)} ms`;
const rate = (n: number, ms: number) => `${Math.round((n / ms) * 1000).toLocaleString('en')} /s`;

console.log(`Exchange benchmark, ${COUNT.toLocaleString('en')} surveys (seeded town)`);
const records: SurveyRecord[] = makeTown(COUNT, {
  seed: 20_310_512,
  withoutLocation: 0.02,
  spreadDeg: 0.2,
});

// 1. Export beside JSON.stringify, interleaved so both see the same machine state.
const bare: number[] = [];
const geo: number[] = [];
let bytesBare = 0;
let bytesGeo = 0;
for (let i = 0; i < RUNS; i++) {
  const a = time(() => JSON.stringify(records));
  bare.push(a.ms);
  bytesBare = a.value.length;
  const b = time(() => geoJsonExport(records, context).parts);
  geo.push(b.ms);
  bytesGeo = b.value.reduce((n, p) => n + p.length, 0);
}
const csv = time(() => csvParts(records));
const csvBytes = csv.value.reduce((n, p) => n + p.length, 0);
console.log('\n1. Export (median of 3)');
console.log(
  `   JSON.stringify(records)      ${fmt(median(bare))}  (${(bytesBare / 1e6).toFixed(0)} MB of text)`,
);
console.log(
  `   GeoJSON FeatureCollection    ${fmt(median(geo))}  (${(bytesGeo / 1e6).toFixed(0)} MB of text)`,
);
console.log(
  `   ratio GeoJSON / stringify    ${(median(geo) / median(bare)).toFixed(2)}×  (goal ≤ 1.5×)`,
);
console.log(`   CSV summary                  ${fmt(csv.ms)}  (${(csvBytes / 1e6).toFixed(0)} MB)`);

// 2. Read + validate + merge plan.
const text = geoJsonExport(records, context).parts.join('');
const bareParse = time(() => JSON.parse(text) as unknown);
const parsed = time(() => readExchangeText(text));
if (!parsed.value.ok) throw new Error(parsed.value.reason);
const accepted = parsed.value.accepted.map((a) => a.record);
const fresh = time(() => planMerge(accepted, new Map()));
const held = new Map<string, ExistingSurvey>(
  records.map((r) => [r.id, { revisions: [r], conflicts: [] }]),
);
const again = time(() => planMerge(accepted, held));
console.log('\n2. Import: read, validate, merge');
console.log(`   JSON.parse alone (baseline)   ${fmt(bareParse.ms)}  ${rate(COUNT, bareParse.ms)}`);
console.log(
  `   read + validate every Feature ${fmt(parsed.ms)}  ${rate(COUNT, parsed.ms)}  (accepted ${accepted.length}, rejected ${parsed.value.rejected.length})`,
);
console.log(
  `   merge plan, empty device      ${fmt(fresh.ms)}  ${rate(COUNT, fresh.ms)}  (new ${fresh.value.newSurveys.length})`,
);
console.log(
  `   merge plan, all duplicates    ${fmt(again.ms)}  ${rate(COUNT, again.ms)}  (duplicates ${again.value.duplicates})`,
);
console.log(
  `   total, empty device           ${fmt(parsed.ms + fresh.ms)}  ${rate(COUNT, parsed.ms + fresh.ms)}`,
);

// 3. Through storage on fake-indexeddb (a floor: the browser's IndexedDB is much faster).
const store = new SurveyStore({ indexedDB: new IDBFactory(), broadcast: false, storage: null });
const small = geoJsonExport(records.slice(0, WRITE_COUNT), context).parts.join('');
const t0 = performance.now();
const report = await importText(small, 'bench.geojson', { strict: true }, store);
const writeMs = performance.now() - t0;
const t1 = performance.now();
const report2 = await importText(small, 'bench.geojson', { strict: true }, store);
const againMs = performance.now() - t1;
store.close();
console.log(
  `\n3. importText into SurveyStore on fake-indexeddb, ${WRITE_COUNT.toLocaleString('en')} surveys`,
);
console.log(
  `   fresh device                  ${fmt(writeMs)}  ${rate(WRITE_COUNT, writeMs)}  (${report.status})`,
);
console.log(
  `   same file again (duplicates)  ${fmt(againMs)}  ${rate(WRITE_COUNT, againMs)}  (${report2.status})`,
);
