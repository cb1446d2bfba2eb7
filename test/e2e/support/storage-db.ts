/**
 * Helpers for the storage browser tests: start a survey as the inspector does, wait for
 * "Saved", and read or write the app's IndexedDB with the bare API in the page (no app
 * code involved), to check what is really on disk.
 */
import type { Page } from 'playwright-core';
import { taggedCodec } from './tagged-value.js';

/** The app's database name (web/storage/db.ts). */
export const APP_DB = 'grainline';

/** A row of `surveys` or `revisions`, as far as these tests look into it. */
export interface StoredRow {
  id?: string;
  surveyId?: string;
  revision: number;
  kind?: string;
  record: { id: string; address: string; revision: number };
}

export interface RawStores {
  surveys: StoredRow[];
  revisions: StoredRow[];
  quarantine: Array<{ source: string; sourceKey: string; reason: string; raw: unknown }>;
}

/** Reads every row of surveys, revisions and quarantine with the bare IndexedDB API. */
export async function readRawStores(page: Page): Promise<RawStores> {
  return page.evaluate(async (name) => {
    const db = await new Promise<IDBDatabase>((resolve, reject) => {
      const r = indexedDB.open(name);
      r.onsuccess = () => resolve(r.result);
      r.onerror = () => reject(r.error);
    });
    const all = (store: string) =>
      new Promise<unknown[]>((resolve, reject) => {
        const r = db.transaction(store, 'readonly').objectStore(store).getAll();
        r.onsuccess = () => resolve(r.result);
        r.onerror = () => reject(r.error);
      });
    try {
      return {
        surveys: (await all('surveys')) as never,
        revisions: (await all('revisions')) as never,
        quarantine: (await all('quarantine')) as never,
      };
    } finally {
      db.close();
    }
  }, APP_DB);
}

/** Makes `globalThis.taggedCodec` (tagged-value.ts) available in the page. */
export async function installCodec(page: Page): Promise<void> {
  await page.evaluate(`(${taggedCodec.toString()})(); undefined`);
}

/**
 * Every row of `store`, keyed by its primary key (as text), encoded with the tagged codec:
 * equal texts mean identical stored values. Needs `installCodec(page)` first.
 */
export async function encodedRows(page: Page, store: string): Promise<Record<string, string>> {
  return page.evaluate(
    async ({ name, store }) => {
      const codec = (globalThis as unknown as { taggedCodec: { encode(v: unknown): string } })
        .taggedCodec;
      const db = await new Promise<IDBDatabase>((resolve, reject) => {
        const r = indexedDB.open(name);
        r.onsuccess = () => resolve(r.result);
        r.onerror = () => reject(r.error);
      });
      try {
        return await new Promise<Record<string, string>>((resolve, reject) => {
          const out: Record<string, string> = {};
          const r = db.transaction(store, 'readonly').objectStore(store).openCursor();
          r.onsuccess = () => {
            const c = r.result;
            if (c === null) return resolve(out);
            out[String(c.primaryKey)] = codec.encode(c.value);
            c.continue();
          };
          r.onerror = () => reject(r.error);
        });
      } finally {
        db.close();
      }
    },
    { name: APP_DB, store },
  );
}

/**
 * Puts values, given as tagged-codec texts, straight into `store` of the app's database, in
 * one transaction. Needs `installCodec(page)` first.
 */
export async function putEncoded(page: Page, store: string, encoded: string[]): Promise<void> {
  await page.evaluate(
    async ({ name, store, encoded }) => {
      const codec = (globalThis as unknown as { taggedCodec: { decode(t: string): unknown } })
        .taggedCodec;
      const db = await new Promise<IDBDatabase>((resolve, reject) => {
        const r = indexedDB.open(name);
        r.onsuccess = () => resolve(r.result);
        r.onerror = () => reject(r.error);
      });
      try {
        await new Promise<void>((resolve, reject) => {
          const tx = db.transaction(store, 'readwrite');
          const s = tx.objectStore(store);
          for (const text of encoded) s.put(codec.decode(text));
          tx.oncomplete = () => resolve();
          tx.onerror = () => reject(tx.error);
          tx.onabort = () => reject(tx.error);
        });
      } finally {
        db.close();
      }
    },
    { name: APP_DB, store, encoded },
  );
}

/** Waits until the save indicator says the last change reached IndexedDB. */
export async function waitSaved(page: Page, timeout = 10_000): Promise<void> {
  await page.locator('[data-save-state="saved"]').waitFor({ timeout });
}

/** The first step's address field. */
export const addressField = (page: Page) =>
  page.getByRole('textbox', { name: 'Address or description' });

/** Starts a survey from the building list ("New survey"); returns its first step's URL. */
export async function newSurvey(page: Page, baseUrl: string): Promise<string> {
  await page.goto(baseUrl);
  await page.getByRole('button', { name: 'New survey' }).click();
  await page.waitForURL(/\/survey\/[0-9a-f-]{36}\/place$/);
  await addressField(page).waitFor();
  await waitSaved(page);
  return page.url();
}

/** The survey id in a survey URL. */
export function surveyIdOf(url: string): string {
  const m = /\/survey\/([0-9a-f-]{36})/.exec(url);
  if (!m?.[1]) throw new Error(`no survey id in ${url}`);
  return m[1];
}

/** The number of rows in `store` of the app's database (cheap: nothing is copied out). */
export async function countRows(page: Page, store: string): Promise<number> {
  return page.evaluate(
    async ({ name, store }) => {
      const db = await new Promise<IDBDatabase>((resolve, reject) => {
        const r = indexedDB.open(name);
        r.onsuccess = () => resolve(r.result);
        r.onerror = () => reject(r.error);
      });
      try {
        return await new Promise<number>((resolve, reject) => {
          const r = db.transaction(store, 'readonly').objectStore(store).count();
          r.onsuccess = () => resolve(r.result);
          r.onerror = () => reject(r.error);
        });
      } finally {
        db.close();
      }
    },
    { name: APP_DB, store },
  );
}
