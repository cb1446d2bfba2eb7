/**
 * Browser storage benchmark: `npx tsx test/bench/storage-browser.bench.ts` (after
 * `npm run build`; BENCH_COUNT=… changes N, default 100,000). Measured in the system
 * Chromium (headless, persistent profile on disk), side by side in one run:
 *
 * 1. Keystroke to durable save, in the built app: an inspector types into the first survey
 *    step's "Address or description". For every keystroke, the time from the key event
 *    (`KeyboardEvent.timeStamp`) to the `complete` event of the first IndexedDB transaction
 *    that wrote a survey row holding that keystroke (readwrite saves use durability
 *    'strict': flushed to disk at commit). Found by an init script that watches
 *    `IDBObjectStore.prototype.put` on the surveys store; the app is not changed for it.
 *    Two patterns: isolated keystrokes (type one, wait until it is durable, pause), and
 *    steady typing (one key every 120 ms). At 1× and under 4× CPU throttling (DevTools
 *    Protocol `Emulation.setCPUThrottlingRate`), p50 / p95 / max. The draft saver's
 *    debounce (250 ms, draft-saver.ts) is part of the figure by design: the promise is
 *    "on disk within about 0.3 s".
 * 2. Bulk put and get of N seeded surveys (test/bench/survey-sample.ts), through the storage
 *    layer and through bare IndexedDB on the same rows, in a page bundled here with Vite
 *    (test/bench/browser/storage-harness.ts): records/s and the time ratio ours/bare
 *    (goal ≤ 1.5×). Two rounds of each in swapped order; the faster counts.
 *
 * A benchmark, not a test: it prints figures and never fails on speed.
 */
import { existsSync, mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { chromium, type Page } from 'playwright-core';
import { build } from 'vite';
import preact from '@preact/preset-vite';
import {
  CHROMIUM_FLAGS,
  distDir,
  findChromium,
  freshProfileDir,
  launchContext,
  startServer,
} from '../e2e/support/index.js';
import { DEFAULT_DEBOUNCE_MS } from '../../web/storage/draft-saver.js';
import type { BrowserBulkFigures } from './browser/storage-harness.js';

const COUNT = Number(process.env.BENCH_COUNT ?? 100_000);
const SEED = 20_250_611;
const GOAL = 1.5;
const THROTTLE = 4;
const ISOLATED_KEYS = 30;
const STEADY_KEYS = 60;
const STEADY_INTERVAL_MS = 120;

/** The draft saver's debounce (web/storage/draft-saver.ts), part of every figure. */
const DEBOUNCE_MS = DEFAULT_DEBOUNCE_MS;

const here = (p: string) => fileURLToPath(new URL(p, import.meta.url));
const harnessOut = here('../output/bench-storage/');

// ——— keystroke to durable save ———

/** Init script: records key times and, per surveys-row write, when its transaction completed. */
const PROBE = `(() => {
  const log = { keys: [], durable: [] };
  globalThis.__latency = log;
  addEventListener('keydown', (e) => { if (e.key.length === 1) log.keys.push(e.timeStamp); }, true);
  const put = IDBObjectStore.prototype.put;
  IDBObjectStore.prototype.put = function (value, ...rest) {
    const address = value && value.record && value.record.address;
    if (this.name === 'surveys' && typeof address === 'string') {
      const entry = { putAt: performance.now(), len: address.length, t: 0 };
      this.transaction.addEventListener('complete', () => {
        entry.t = performance.now();
        log.durable.push(entry);
      });
    }
    return put.call(this, value, ...rest);
  };
})();`;

interface LatencyLog {
  keys: number[];
  durable: Array<{ putAt: number; len: number; t: number }>;
}

const readLog = (page: Page) =>
  page.evaluate(() => (globalThis as unknown as { __latency: LatencyLog }).__latency);
const resetLog = (page: Page) =>
  page.evaluate(() => {
    const log = (globalThis as unknown as { __latency: LatencyLog }).__latency;
    log.keys.length = 0;
    log.durable.length = 0;
  });

/** Per keystroke: key time to the first completed write holding it, and that write's own time. */
function latencies(
  log: LatencyLog,
  startLen: number,
): { total: number[]; toPut: number[]; write: number[] } {
  const total: number[] = [];
  const toPut: number[] = [];
  const write: number[] = [];
  log.keys.forEach((keyAt, i) => {
    const need = startLen + i + 1;
    const hit = log.durable
      .filter((d) => d.len >= need && d.t >= keyAt)
      .sort((a, b) => a.t - b.t)[0];
    if (hit === undefined) throw new Error(`keystroke ${i + 1} never reached the disk`);
    total.push(hit.t - keyAt);
    toPut.push(hit.putAt - keyAt);
    write.push(hit.t - hit.putAt);
  });
  return { total, toPut, write };
}

function quantile(xs: readonly number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  const at = (s.length - 1) * q;
  const lo = Math.floor(at);
  const hi = Math.ceil(at);
  return (s[lo] as number) + ((s[hi] as number) - (s[lo] as number)) * (at - lo);
}

const fmt = (ms: number) => `${Math.round(ms)}`.padStart(5);
const summary = (xs: readonly number[]) =>
  `p50 ${fmt(quantile(xs, 0.5))}  p95 ${fmt(quantile(xs, 0.95))}  max ${fmt(Math.max(...xs))}`;

async function keystrokeLatency(): Promise<void> {
  if (!existsSync(`${distDir}index.html`)) {
    console.log('keystroke latency: no build in dist/ — run `npm run build` first; skipped.');
    return;
  }
  const server = await startServer(distDir);
  const context = await launchContext();
  try {
    await context.addInitScript({ content: PROBE });
    const page = await context.newPage();
    await page.goto(server.url);
    await page.getByRole('button', { name: 'New survey' }).click();
    const field = page.getByRole('textbox', { name: 'Address or description' });
    await field.waitFor();
    await page.locator('[data-save-state="saved"]').waitFor();
    const cdp = await context.newCDPSession(page);

    console.log(
      `\nkeystroke → durable save (ms), address field of a new survey; steady = one key every ${STEADY_INTERVAL_MS} ms`,
    );
    for (const rate of [1, THROTTLE]) {
      await cdp.send('Emulation.setCPUThrottlingRate', { rate });
      // Isolated keystrokes.
      await field.fill('');
      await page.locator('[data-save-state="saved"]').waitFor();
      await field.click();
      await resetLog(page);
      for (let i = 0; i < ISOLATED_KEYS; i++) {
        await page.keyboard.type('a');
        await page.waitForFunction(
          (n) =>
            (globalThis as unknown as { __latency: LatencyLog }).__latency.durable.some(
              (d) => d.len >= n,
            ),
          i + 1,
          { timeout: 10_000 },
        );
        await page.waitForTimeout(100);
      }
      const isolated = latencies(await readLog(page), 0);
      // Steady typing.
      await field.fill('');
      await page.locator('[data-save-state="saved"]').waitFor();
      await field.click();
      await resetLog(page);
      await page.keyboard.type('b'.repeat(STEADY_KEYS), { delay: STEADY_INTERVAL_MS });
      await page.locator('[data-save-state="saved"]').waitFor({ timeout: 10_000 });
      const steady = latencies(await readLog(page), 0);
      const label = rate === 1 ? 'no throttling' : `${rate}× CPU throttling`;
      console.log(`  ${label}`);
      console.log(`    isolated (${ISOLATED_KEYS} keys)  ${summary(isolated.total)}`);
      console.log(`    steady   (${STEADY_KEYS} keys)  ${summary(steady.total)}`);
      console.log(
        `    isolated, key → put (debounce ${DEBOUNCE_MS} ms, validation, the save's read): ${summary(isolated.toPut)}`,
      );
      console.log(
        `    the IndexedDB write itself (put → complete), all keys: ${summary([...isolated.write, ...steady.write])}`,
      );
    }
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 1 });
  } finally {
    await context.close();
    await server.close();
  }
}

// ——— bulk put and get ———

async function buildHarness(): Promise<void> {
  mkdirSync(harnessOut, { recursive: true });
  await build({
    configFile: false,
    logLevel: 'warn',
    root: here('./browser/'),
    plugins: [preact()],
    define: { __BUILD_ID__: JSON.stringify('bench') },
    build: {
      outDir: harnessOut,
      emptyOutDir: true,
      target: 'es2022',
      rollupOptions: { input: here('./browser/storage-harness.html') },
    },
  });
}

async function bulk(): Promise<void> {
  await buildHarness();
  const server = await startServer(harnessOut);
  const context = await chromium.launchPersistentContext(freshProfileDir('grainline-bench-'), {
    executablePath: findChromium(),
    args: [...CHROMIUM_FLAGS, '--js-flags=--expose-gc'],
    headless: true,
  });
  try {
    const page = await context.newPage();
    await page.goto(`${server.url}/storage-harness.html`);
    await page.waitForFunction(() => 'storageBench' in globalThis);
    const f = await page.evaluate(
      ([count, seed]) =>
        (
          globalThis as unknown as {
            storageBench: (c: number, s: number) => Promise<BrowserBulkFigures>;
          }
        ).storageBench(count, seed),
      [COUNT, SEED] as const,
    );
    const rate = (n: number, ms: number) => `${Math.round((n / ms) * 1000).toLocaleString('en')}/s`;
    const best = (xs: number[]) => Math.min(...xs);
    const rows: Array<[string, number, number, number]> = [
      ['put (revision + current, 1 tx)', f.count, best(f.putOursMs), best(f.putBareMs)],
      ['get all (listSurveys vs getAll)', f.count, best(f.getOursMs), best(f.getBareMs)],
      [
        `get by id (${f.byIdCount.toLocaleString('en')} random)`,
        f.byIdCount,
        f.byIdOursMs,
        f.byIdBareMs,
      ],
    ];
    const rounds = (xs: number[]) => xs.map((x) => Math.round(x)).join(' / ');
    console.log(
      `\nbulk, ${f.count.toLocaleString('en')} surveys of ≈ ${f.bytesPerRecord} bytes (JSON), Chromium IndexedDB on disk`,
    );
    console.log(
      `  rounds, ms: put ours ${rounds(f.putOursMs)}, bare ${rounds(f.putBareMs)}; get ours ${rounds(f.getOursMs)}, bare ${rounds(f.getBareMs)}`,
    );
    console.log('  records per second (ours | bare IndexedDB | time ratio ours/bare, goal ≤ 1.5)');
    for (const [name, n, ours, bare] of rows) {
      const ratio = ours / bare;
      console.log(
        `    ${name.padEnd(34)} ${rate(n, ours).padStart(12)} | ${rate(n, bare).padStart(12)} | ${ratio.toFixed(2)}×${ratio <= GOAL ? '' : '  (above goal)'}`,
      );
    }
  } finally {
    await context.close();
    await server.close();
  }
}

console.log(
  `Browser storage bench: Chromium ${chromium.name()} at ${findChromium()}, seed ${SEED}, N = ${COUNT.toLocaleString('en')}`,
);
await keystrokeLatency();
await bulk();
