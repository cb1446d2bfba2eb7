/**
 * A full disk in real Chromium, two ways:
 * - the origin's quota is cut to 1 byte (DevTools Protocol `Storage.overrideQuotaForOrigin`),
 *   so the next save fails inside Chromium's own IndexedDB at commit time;
 * - `IDBObjectStore.prototype.put` on the surveys store throws QuotaExceededError (stubbed
 *   with an init script), after the save's revision row was already queued in the same
 *   transaction: the half-done transaction must be rolled back.
 * Either way the inspector is told what to do (export, remove photos), the text stays on
 * screen, nothing partial is written, and once space is back "Try saving again" saves it.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, CDPSession, Page } from 'playwright-core';
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
  type RawStores,
} from './support/storage-db.js';

const QUOTA_SENTENCE = 'This device is out of storage space, so the last change was not saved.';

/** Flips `globalThis.__failSurveyPuts` to make puts into `surveys` throw QuotaExceededError. */
const FAILING_PUT = `(() => {
  const put = IDBObjectStore.prototype.put;
  IDBObjectStore.prototype.put = function (...args) {
    if (globalThis.__failSurveyPuts && this.name === 'surveys') {
      throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    }
    return put.apply(this, args);
  };
})();`;

const currentAddress = (stores: RawStores, id: string) =>
  stores.surveys.find((r) => r.id === id)?.record.address;
const revisionsOf = (stores: RawStores, id: string) =>
  stores.revisions.filter((r) => r.surveyId === id);

/** Types, sees the quota message, checks nothing was written; returns the text typed. */
async function typeIntoFullDisk(page: Page, id: string, before: RawStores): Promise<string> {
  const long = `3 Birch Close, ${'rear annex and garage '.repeat(20)}`.slice(0, 480);
  await addressField(page).fill(long);
  const alert = page.getByRole('alert').filter({ hasText: QUOTA_SENTENCE });
  await alert.waitFor({ timeout: 15_000 });
  expect(await alert.textContent()).toMatch(/Export your surveys now, then remove photos/);
  expect(await page.locator('[data-save-state]').getAttribute('data-save-state')).toBe('error');
  expect(await addressField(page).inputValue()).toBe(long);
  const during = await readRawStores(page);
  expect(revisionsOf(during, id)).toEqual(revisionsOf(before, id));
  expect(during.revisions).toHaveLength(before.revisions.length);
  expect(currentAddress(during, id)).toBe('3 Birch Close');
  return long;
}

describe('quota exceeded while saving, in real Chromium', () => {
  let server: TestServer;
  let context: BrowserContext;
  let page: Page;
  let cdp: CDPSession;
  const pageErrors: string[] = [];

  beforeAll(async () => {
    server = await startServer(distDir);
    context = await launchContext();
    await context.addInitScript({ content: FAILING_PUT });
    page = await context.newPage();
    page.on('pageerror', (e) => pageErrors.push(e.message));
    cdp = await context.newCDPSession(page);
  });

  afterAll(async () => {
    await context?.close();
    await server?.close();
  });

  it("says what to do when Chromium's quota is full, writes nothing, saves once space is back", async () => {
    const id = surveyIdOf(await newSurvey(page, server.url));
    await addressField(page).fill('3 Birch Close');
    await waitSaved(page);
    const before = await readRawStores(page);

    const origin = new URL(server.url).origin;
    await cdp.send('Storage.overrideQuotaForOrigin', { origin, quotaSize: 1 });
    // Chromium's IndexedDB keeps the space it may use cached for about 30 s, so the new
    // quota takes effect only then: wait until a 1 kB write into a database of the test's
    // own is refused for quota.
    await expect
      .poll(
        () =>
          page.evaluate(async () => {
            const db = await new Promise<IDBDatabase>((resolve, reject) => {
              const r = indexedDB.open('quota-probe');
              r.onupgradeneeded = () => r.result.createObjectStore('s');
              r.onsuccess = () => resolve(r.result);
              r.onerror = () => reject(r.error);
            });
            const outcome = await new Promise<string>((resolve) => {
              const tx = db.transaction('s', 'readwrite');
              tx.objectStore('s').put('y'.repeat(1000), Math.random());
              tx.oncomplete = () => resolve('written');
              tx.onabort = () => resolve(tx.error?.name ?? 'aborted');
            });
            db.close();
            return outcome;
          }),
        { timeout: 75_000, interval: 1000 },
      )
      .toBe('QuotaExceededError');

    const long = await typeIntoFullDisk(page, id, before);
    await page.screenshot({ path: `${screenshotDir}storage-quota.png` });

    // The inspector frees space (here: the quota goes back to normal) and tries again.
    await cdp.send('Storage.overrideQuotaForOrigin', { origin });
    await page.getByRole('button', { name: 'Try saving again' }).click();
    await waitSaved(page);
    const after = await readRawStores(page);
    expect(currentAddress(after, id)).toBe(long);
    expect(revisionsOf(after, id)).toHaveLength(revisionsOf(before, id).length + 1);
    expect(pageErrors).toEqual([]);
  });

  it('rolls back a save whose second write fails for quota after the first was queued', async () => {
    const id = surveyIdOf(await newSurvey(page, server.url));
    await addressField(page).fill('3 Birch Close');
    await waitSaved(page);
    const before = await readRawStores(page);

    await page.evaluate(() => {
      (globalThis as { __failSurveyPuts?: boolean }).__failSurveyPuts = true;
    });
    const long = await typeIntoFullDisk(page, id, before);

    await page.evaluate(() => {
      (globalThis as { __failSurveyPuts?: boolean }).__failSurveyPuts = false;
    });
    await page.getByRole('button', { name: 'Try saving again' }).click();
    await waitSaved(page);
    const after = await readRawStores(page);
    expect(currentAddress(after, id)).toBe(long);
    expect(revisionsOf(after, id)).toHaveLength(revisionsOf(before, id).length + 1);
    expect(pageErrors).toEqual([]);
  });
});
