/**
 * Map benchmark: `npx tsx test/bench/map.bench.ts` after `npm run build`
 * (BENCH_COUNT to change the number of surveys, default 100,000).
 *
 * In the system Chromium, with N surveys of a seeded invented town on the device (imported
 * once through the map screen's Files panel), it times opening the map until the first
 * clustered markers are drawn, under 4× CPU throttling (Chrome DevTools Protocol,
 * Emulation.setCPUThrottlingRate) and, side by side in the same run, without throttling;
 * goal ≤ 2 s throttled. Two ways of opening it:
 * - in the app: from the Settings screen, a tap on Map (the lazy map chunk, Leaflet,
 *   reading the surveys, clustering, drawing);
 * - a cold page load of /map (the app shell as well).
 * The map screen's performance marks split the time: surveys read from IndexedDB (parsed
 * and checked by storage), map data built, Leaflet ready, first markers drawn.
 *
 * A benchmark: it prints figures and never fails on speed.
 */
import { existsSync, mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { geoJsonExport } from '../../web/exchange/geojson-export.js';
import {
  distDir,
  freshProfileDir,
  launchContext,
  startServer,
  waitForServiceWorkerControl,
} from '../e2e/support/index.js';
import { makeTown } from '../fixtures/exchange/town.js';

const COUNT = Number(process.env.BENCH_COUNT ?? 100_000);
const RUNS = 3;
const MARKS = [
  'grainline:map-open',
  'grainline:map-records',
  'grainline:map-data',
  'grainline:map-view',
  'grainline:map-rendered',
];

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;
const s = (ms: number) => `${(ms / 1000).toFixed(2)} s`;

async function throttle(context: BrowserContext, page: Page, rate: number): Promise<void> {
  const cdp = await context.newCDPSession(page);
  await cdp.send('Emulation.setCPUThrottlingRate', { rate });
}

async function marks(page: Page): Promise<Record<string, number>> {
  return page.evaluate(
    (names) =>
      Object.fromEntries(
        names.map((n) => [n, performance.getEntriesByName(n, 'mark')[0]?.startTime ?? NaN]),
      ),
    MARKS,
  );
}

/**
 * Opens the map from another screen of the app (Settings, so that the timing is the map's
 * own and not the building list's, which renders every survey); ms from the tap to the
 * first markers.
 */
async function openFromList(context: BrowserContext, origin: string, rate: number) {
  const page = await context.newPage();
  await page.goto(origin + '/settings');
  await page.getByRole('navigation', { name: 'Main' }).waitFor();
  await page.waitForLoadState('networkidle');
  await page.evaluate(
    () => new Promise<void>((resolve) => requestIdleCallback(() => resolve(), { timeout: 60_000 })),
  );
  await throttle(context, page, rate);
  const t0 = await page.evaluate(() => performance.now());
  await page
    .getByRole('navigation', { name: 'Main' })
    .getByRole('link', { name: 'Map' })
    .click({ timeout: 600_000 });
  await page.locator('[data-testid=map][data-rendered]').waitFor({ timeout: 600_000 });
  const m = await marks(page);
  await page.close();
  return { total: (m['grainline:map-rendered'] as number) - t0, m, t0 };
}

/** Loads /map cold; ms from navigation start to the first markers. */
async function coldLoad(context: BrowserContext, origin: string, rate: number) {
  const page = await context.newPage();
  await throttle(context, page, rate);
  await page.goto(origin + '/map');
  await page.locator('[data-testid=map][data-rendered]').waitFor({ timeout: 600_000 });
  const m = await marks(page);
  await page.close();
  return { total: m['grainline:map-rendered'] as number, m, t0: 0 };
}

function split(r: { m: Record<string, number>; t0: number }): string {
  const at = (n: string) => (r.m[n] as number) - r.t0;
  return [
    `chunk+mount ${s(at('grainline:map-open'))}`,
    `surveys read ${s(at('grainline:map-records') - at('grainline:map-open'))}`,
    `map data ${s(at('grainline:map-data') - at('grainline:map-records'))}`,
    `leaflet ready at ${s(at('grainline:map-view'))}`,
    `drawn ${s(at('grainline:map-rendered') - Math.max(at('grainline:map-data'), at('grainline:map-view')))} after both`,
  ].join(', ');
}

async function setUp(): Promise<void> {
  const setup = await context.newPage();
  await setup.goto(server.url + '/');
  await waitForServiceWorkerControl(setup);
  await setup.goto(server.url + '/map');
  await setup.getByRole('button', { name: 'Files', exact: true }).click();
  const t = performance.now();
  await setup.locator('[data-testid=import-file]').setInputFiles(file);
  await setup.locator('.gl-report').waitFor({ timeout: 1_800_000 });
  const text = (await setup.locator('.gl-report__title').textContent()) ?? '';
  console.log(`setup: imported through the Files panel in ${s(performance.now() - t)} (${text})`);
  // The map then reads every survey once and writes its cache: wait for that too.
  const t2 = performance.now();
  await setup
    .locator('[data-testid=map-status]', { hasNotText: 'checking' })
    .waitFor({ timeout: 1_800_000 });
  await setup.waitForTimeout(3000);
  console.log(`setup: first full read of the surveys by the map in ${s(performance.now() - t2)}`);
  await setup.close();
  writeFileSync(ready, 'ok');
}

console.log(`Map benchmark: ${COUNT.toLocaleString('en')} surveys on the device, system Chromium`);
const dir = mkdtempSync(join(tmpdir(), 'grainline-map-bench-'));
const file = join(dir, 'town.geojson');
const records = makeTown(COUNT, { seed: 20_310_512, withoutLocation: 0.02, spreadDeg: 0.2 });
writeFileSync(
  file,
  geoJsonExport(records, { exportedAt: new Date(), build: 'bench' }).parts.join(''),
);

// BENCH_PROFILE=<dir> keeps the browser profile (with its imported surveys) between runs.
const keep = process.env.BENCH_PROFILE;
const profile = keep ?? freshProfileDir();
const ready = join(profile, `grainline-bench-${COUNT}`);
if (keep) mkdirSync(keep, { recursive: true });
// The profile's origin must stay the same between runs: a fixed port when one is kept.
const server = await startServer(distDir, keep ? 4199 : 0);
const context = await launchContext({ userDataDir: profile });
try {
  if (!existsSync(ready)) await setUp();
  else {
    console.log('setup: surveys already on the kept profile; installing this build');
    // The kept profile's service worker would keep serving the build it cached.
    const page = await context.newPage();
    await page.goto(server.url + '/settings');
    await page.evaluate(async () => {
      for (const r of await navigator.serviceWorker.getRegistrations()) await r.unregister();
      for (const k of await caches.keys()) await caches.delete(k);
    });
    await page.goto(server.url + '/settings');
    await waitForServiceWorkerControl(page);
    await page.close();
  }

  for (const rate of [1, 4]) {
    type Run = Awaited<ReturnType<typeof coldLoad>>;
    const fromList: Run[] = [];
    const cold: Run[] = [];
    for (let i = 0; i < RUNS; i++) {
      fromList.push(await openFromList(context, server.url, rate));
      cold.push(await coldLoad(context, server.url, rate));
    }
    const mid = (xs: Run[]) => xs.find((x) => x.total === median(xs.map((y) => y.total)))!;
    console.log(`\nCPU ${rate === 1 ? 'not throttled' : `throttled ${rate}×`} (median of ${RUNS})`);
    console.log(
      `  tap Map in the app → first clustered markers: ${s(mid(fromList).total)}  [${split(mid(fromList))}]`,
    );
    console.log(
      `  cold load of /map → first clustered markers:  ${s(mid(cold).total)}  [${split(mid(cold))}]`,
    );
    if (rate === 4)
      console.log(`  goal ≤ 2 s throttled: ${(mid(fromList).total / 2000).toFixed(2)}× the goal`);
  }
} finally {
  await context.close();
  await server.close();
  rmSync(dir, { recursive: true, force: true });
}
