/**
 * First-screen benchmark: `npx tsx test/bench/first-screen.bench.ts` (after `npm run build`).
 *
 * How fast the building list — the first screen — becomes usable offline on a slow phone,
 * against a blank page served by the same service worker in the same run:
 *
 * - Chromium at 412 × 915, the app visited once (service worker installed, everything
 *   precached), then the network switched off and the CPU throttled 4× through the DevTools
 *   protocol (Emulation.setCPUThrottlingRate).
 * - "Interactive": the "New survey" button is in the page with its handler, and the list
 *   has been read from IndexedDB (the empty-list text, or the list tools, are shown). A
 *   MutationObserver installed before the page's own scripts (addInitScript, via the
 *   protocol, so the page's CSP does not apply to it) records performance.now() at that
 *   moment, measured from the start of the navigation.
 * - Baseline: /blank.html (web/public/blank.html, precached like the app shell), "ready"
 *   when its one paragraph exists.
 * - Both pages are loaded RUNS times, in an order shuffled by the seeded PRNG
 *   (test/bench/prng.ts), after one discarded warm-up each; medians are compared.
 * - Two variants of the list: empty, and with LIST_SIZE surveys stored.
 * - Also: keystroke to "Saved on this device" (the save indicator turns to saved only after
 *   the IndexedDB transaction completed), p50 and p95 over KEYS keystrokes in the address
 *   field, same throttling.
 *
 * Goal: first screen ≤ 2 × the blank page. A benchmark, not a test: it prints figures.
 */
import type { BrowserContext, Page } from 'playwright-core';
import {
  PHONE,
  distDir,
  launchContext,
  startServer,
  waitForServiceWorkerControl,
} from '../e2e/support/index.js';
import { mulberry32 } from './prng.js';

const RUNS = Number(process.env.BENCH_RUNS ?? 9);
const KEYS = Number(process.env.BENCH_KEYS ?? 20);
const LIST_SIZE = Number(process.env.BENCH_LIST ?? 40);
const THROTTLE = 4;
const GOAL = 2;
const SEED = 20_250_304;

declare global {
  interface Window {
    __readyAt?: number;
    __buttonAt?: number;
  }
}

/**
 * Installed before any page script: notes when the first screen is usable. Plain text, not
 * a function, because the TypeScript loader would wrap a function with helpers the page
 * does not have.
 */
const WATCH_READY = `(() => {
  const ready = () =>
    document.getElementById('blank-ready') !== null ||
    ([...document.querySelectorAll('button')].some((b) => (b.textContent || '').includes('New survey')) &&
      document.querySelector('.home__empty, .home__tools') !== null);
  const button = () =>
    document.getElementById('blank-ready') !== null ||
    [...document.querySelectorAll('button')].some((b) => (b.textContent || '').includes('New survey'));
  const check = () => {
    if (window.__buttonAt === undefined && button()) window.__buttonAt = performance.now();
    if (window.__readyAt === undefined && ready()) window.__readyAt = performance.now();
  };
  new MutationObserver(check).observe(document, { childList: true, subtree: true });
})();`;

async function loadTime(
  page: Page,
  url: string,
): Promise<{ ready: number; button: number; load: number }> {
  await page.goto(url, { waitUntil: 'load' });
  await page.waitForFunction(() => window.__readyAt !== undefined, undefined, { timeout: 30_000 });
  return page.evaluate(() => ({
    ready: window.__readyAt as number,
    button: window.__buttonAt as number,
    load: performance.getEntriesByType('navigation')[0]?.duration ?? NaN,
  }));
}

function median(xs: readonly number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
}

function quantile(xs: readonly number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))] as number;
}

const fmt = (ms: number) => `${ms.toFixed(0).padStart(5)} ms`;

async function compare(page: Page, origin: string, label: string): Promise<void> {
  const rand = mulberry32(SEED);
  const order = [
    ...Array.from({ length: RUNS }, () => 'app'),
    ...Array.from({ length: RUNS }, () => 'blank'),
  ];
  for (let i = order.length - 1; i > 0; i--) {
    const j = Math.floor(rand() * (i + 1));
    [order[i], order[j]] = [order[j] as string, order[i] as string];
  }
  await loadTime(page, `${origin}/`);
  await loadTime(page, `${origin}/blank.html`);
  const app: number[] = [];
  const appLoad: number[] = [];
  const appButton: number[] = [];
  const blank: number[] = [];
  for (const which of order) {
    const t = await loadTime(page, which === 'app' ? `${origin}/` : `${origin}/blank.html`);
    if (which === 'app') {
      app.push(t.ready);
      appLoad.push(t.load);
      appButton.push(t.button);
    } else blank.push(t.ready);
  }
  const a = median(app);
  const b = median(blank);
  console.log(`\n${label}`);
  console.log(
    `  building list interactive  median ${fmt(a)}  (min ${fmt(Math.min(...app))}, max ${fmt(Math.max(...app))}); load event ${fmt(median(appLoad))}`,
  );
  console.log(
    `  "New survey" rendered       median ${fmt(median(appButton))}  (ratio ${(median(appButton) / b).toFixed(2)} ×)`,
  );
  console.log(
    `  blank page ready           median ${fmt(b)}  (min ${fmt(Math.min(...blank))}, max ${fmt(Math.max(...blank))})`,
  );
  console.log(
    `  ratio ${(a / b).toFixed(2)} × (goal ≤ ${GOAL} ×: ${a / b <= GOAL ? 'met' : 'NOT met'})`,
  );
}

async function addSurveys(page: Page, origin: string, n: number): Promise<void> {
  for (let i = 0; i < n; i++) {
    await page.goto(`${origin}/`);
    await page.getByRole('button', { name: 'New survey' }).click();
    const address = page.getByRole('textbox', { name: 'Address or description' });
    await address.waitFor();
    await address.fill(`Bench building ${i + 1}`);
    await page.locator('[data-save-state="saved"]').waitFor();
  }
}

async function keystrokeToSaved(page: Page, origin: string): Promise<number[]> {
  await page.goto(`${origin}/`);
  await page.getByRole('button', { name: 'New survey' }).click();
  const address = page.getByRole('textbox', { name: 'Address or description' });
  await address.waitFor();
  await address.click();
  const rand = mulberry32(SEED + 1);
  const out: number[] = [];
  for (let i = 0; i < KEYS; i++) {
    await page.locator('[data-save-state="saved"]').waitFor();
    const ch = String.fromCharCode(97 + Math.floor(rand() * 26));
    const start = await page.evaluate(() => performance.now());
    await page.keyboard.type(ch);
    await page.waitForFunction(
      () =>
        document.querySelector('[data-save-state="saved"]') !== null &&
        document.querySelector('[data-save-state="unsaved"], [data-save-state="saving"]') === null,
      undefined,
      { polling: 'raf' },
    );
    // Saved, and the page has not moved on since: read the time now.
    out.push((await page.evaluate(() => performance.now())) - start);
  }
  return out;
}

async function main(): Promise<void> {
  const server = await startServer(distDir);
  let context: BrowserContext | null = null;
  try {
    context = await launchContext({ viewport: PHONE });
    await context.addInitScript({ content: WATCH_READY });
    const page = await context.newPage();
    await page.goto(server.url);
    await waitForServiceWorkerControl(page);
    await page.goto(`${server.url}/blank.html`);
    const cdp = await context.newCDPSession(page);
    await context.setOffline(true);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: THROTTLE });
    console.log(
      `First screen offline, ${THROTTLE}× CPU throttling, ${PHONE.width}×${PHONE.height}, ${RUNS} runs each`,
    );

    await compare(page, server.url, 'Empty building list:');

    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 1 });
    await addSurveys(page, server.url, LIST_SIZE);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: THROTTLE });
    await compare(page, server.url, `Building list with ${LIST_SIZE} surveys:`);

    const saves = await keystrokeToSaved(page, server.url);
    console.log(
      `\nKeystroke to "Saved" (IndexedDB transaction done), ${THROTTLE}× throttling, ${KEYS} keys:`,
    );
    console.log(
      `  p50 ${fmt(quantile(saves, 0.5))}, p95 ${fmt(quantile(saves, 0.95))}, max ${fmt(Math.max(...saves))} (promise: stored within ~300 ms)`,
    );
  } finally {
    await context?.close();
    await server.close();
  }
}

await main();
