/**
 * The storage connection's life in real Chromium:
 * - persistence: `navigator.storage.persist()` is asked once, after the first save; where
 *   the browser refuses (stubbed, as a browser that keeps best-effort storage would answer)
 *   the inspector is urged to install and export, and can hide that for a while; the
 *   settings screen shows usage and quota from `estimate()`;
 * - lost connection: the connection is closed under the app (as a backgrounded mobile
 *   browser does) just before a save; the app reopens the database and the save succeeds;
 * - upgrade from another tab: a newer database version is opened from another page while a
 *   change is still waiting for its save; the app tab saves it first, closes its connection
 *   (so the other page is not blocked) and asks to be reloaded.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import {
  distDir,
  launchContext,
  screenshotDir,
  startServer,
  type TestServer,
} from './support/index.js';
import {
  addressField,
  newSurvey,
  readRawStores,
  surveyIdOf,
  waitSaved,
} from './support/storage-db.js';

const EVICTION = 'This browser may delete saved surveys after some days without use.';

/** Answers persist()/persisted() with `granted`, and counts the persist() calls. */
const persistStub = (granted: boolean) => `(() => {
  const calls = [];
  globalThis.__persistCalls = calls;
  navigator.storage.persist = async () => { calls.push(performance.now()); return ${granted}; };
  navigator.storage.persisted = async () => ${granted};
})();`;

/** `__dropConnections = n` closes the app's connection before its next n transactions. */
const CONNECTION_DROPPER = `(() => {
  globalThis.__dropConnections = 0;
  globalThis.__opens = 0;
  const open = IDBFactory.prototype.open;
  IDBFactory.prototype.open = function (name, ...rest) {
    if (name === 'grainline') globalThis.__opens++;
    return open.call(this, name, ...rest);
  };
  const transaction = IDBDatabase.prototype.transaction;
  IDBDatabase.prototype.transaction = function (...args) {
    if (globalThis.__dropConnections > 0 && this.name === 'grainline' && args[1] === 'readwrite') {
      globalThis.__dropConnections--;
      this.close(); // Chromium itself now refuses the transaction with InvalidStateError
    }
    return transaction.apply(this, args);
  };
})();`;

const persistCalls = (page: Page) =>
  page.evaluate(
    () => (globalThis as unknown as { __persistCalls: number[] }).__persistCalls.length,
  );

describe('storage connection life in real Chromium', () => {
  let server: TestServer;
  const contexts: BrowserContext[] = [];
  const pageErrors: string[] = [];

  const open = async (initScripts: string[]): Promise<Page> => {
    const context = await launchContext();
    contexts.push(context);
    for (const content of initScripts) await context.addInitScript({ content });
    const page = await context.newPage();
    page.on('pageerror', (e) => pageErrors.push(e.message));
    return page;
  };

  beforeAll(async () => {
    server = await startServer(distDir);
  });

  afterAll(async () => {
    for (const c of contexts) await c.close();
    await server?.close();
  });

  it('asks for persistence once after the first save, urges installing where refused, shows the estimate', async () => {
    const page = await open([persistStub(false)]);
    await page.goto(server.url);
    await page.getByRole('heading', { level: 1, name: 'Buildings' }).waitFor();
    await page.waitForTimeout(500);
    // Nothing saved yet: nothing asked, nothing to lose, no warning.
    expect(await persistCalls(page)).toBe(0);
    expect(await page.getByText(EVICTION).count()).toBe(0);

    await newSurvey(page, server.url);
    await addressField(page).fill('5 Larch Lane');
    await waitSaved(page);
    await page.getByText(EVICTION).waitFor();
    expect(await persistCalls(page)).toBe(1);
    await addressField(page).fill('5 Larch Lane, rear');
    await waitSaved(page);
    expect(await persistCalls(page)).toBe(1);
    await page.screenshot({ path: `${screenshotDir}storage-eviction-notice.png` });

    // Hidden on request, and still hidden after a reload.
    await page
      .locator('[data-storage-notice="eviction-risk"]')
      .getByRole('button', { name: 'Hide' })
      .click();
    expect(await page.getByText(EVICTION).count()).toBe(0);
    await page.reload();
    await addressField(page).waitFor();
    await page.waitForTimeout(500);
    expect(await page.getByText(EVICTION).count()).toBe(0);

    // The settings screen: usage and quota from estimate(), and whether data are kept.
    await page.goto(`${server.url}/settings`);
    await page.getByText(/Using \d+\.\d MB of about \d+\.\d MB\./).waitFor();
    await page.getByText('The browser may remove these data when space runs out').waitFor();
    expect(pageErrors).toEqual([]);
  });

  it('shows no eviction warning where the browser keeps the data', async () => {
    const page = await open([persistStub(true)]);
    await newSurvey(page, server.url);
    await addressField(page).fill('6 Larch Lane');
    await waitSaved(page);
    await page.waitForTimeout(500);
    expect(await page.getByText(EVICTION).count()).toBe(0);
    await page.goto(`${server.url}/settings`);
    await page.getByText('The browser keeps these data until you remove them.').waitFor();
  });

  it('reopens the database when the connection was lost, and the save goes through', async () => {
    const page = await open([CONNECTION_DROPPER]);
    const id = surveyIdOf(await newSurvey(page, server.url));
    const opensBefore = await page.evaluate(
      () => (globalThis as unknown as { __opens: number }).__opens,
    );
    await page.evaluate(() => {
      (globalThis as unknown as { __dropConnections: number }).__dropConnections = 2;
    });
    await addressField(page).fill('8 Rowan Court');
    await waitSaved(page);
    const state = await page.evaluate(() => {
      const g = globalThis as unknown as { __dropConnections: number; __opens: number };
      return { left: g.__dropConnections, opens: g.__opens };
    });
    expect(state.left).toBe(0); // both drops happened
    expect(state.opens).toBeGreaterThanOrEqual(opensBefore + 2);
    const stored = await readRawStores(page);
    expect(stored.surveys.find((r) => r.id === id)?.record.address).toBe('8 Rowan Court');
    expect(await page.locator('.save-indicator__error').count()).toBe(0);
    expect(pageErrors).toEqual([]);
  });

  it('saves the waiting change, then closes and asks for a reload when another tab upgrades', async () => {
    const app = await open([]);
    const id = surveyIdOf(await newSurvey(app, server.url));
    const other = await app.context().newPage();
    // A page of the same origin without the app: only the raw upgrade runs there.
    await other.goto(`${server.url}/manifest.webmanifest`);

    await addressField(app).fill('9 Hazel Yard');
    // At once, before the debounced save: the other page opens a newer version.
    const upgraded = await other.evaluate(async () => {
      // 'blocked' fires while the app tab is still saving (it closes only after): the
      // open waits, and succeeds once the app tab has closed its connection.
      let blocked = false;
      const startedAt = performance.now();
      const db = await new Promise<IDBDatabase>((resolve, reject) => {
        const r = indexedDB.open('grainline', 1000);
        r.onsuccess = () => resolve(r.result);
        r.onerror = () => reject(r.error);
        r.onblocked = () => {
          blocked = true;
        };
      });
      const waitedMs = performance.now() - startedAt;
      const rows = await new Promise<unknown[]>((resolve, reject) => {
        const r = db.transaction('surveys', 'readonly').objectStore('surveys').getAll();
        r.onsuccess = () => resolve(r.result);
        r.onerror = () => reject(r.error);
      });
      db.close();
      return { version: db.version, rows, blocked, waitedMs };
    });
    expect(upgraded.version).toBe(1000);
    // Waited for the flush, not for the app's 3 s give-up (connection.ts).
    expect(upgraded.waitedMs).toBeLessThan(2500);
    const row = (upgraded.rows as Array<{ id: string; record: { address: string } }>).find(
      (r) => r.id === id,
    );
    expect(row?.record.address).toBe('9 Hazel Yard');

    const notice = app.locator('[data-storage-notice="reload-required"]');
    await notice.getByText('Grainline was updated in another tab.').waitFor();
    await notice.getByRole('button', { name: 'Reload this tab' }).waitFor();
    await app.screenshot({ path: `${screenshotDir}storage-reload-required.png` });
    expect(pageErrors).toEqual([]);
  });
});
