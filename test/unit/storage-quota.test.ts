import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { afterEach, describe, expect, it } from 'vitest';
import { emptySurvey } from '../../forms/schema/index.js';
import { DraftSaver, StorageError, SurveyStore, isQuotaError } from '../../web/storage/index.js';

const cleanups: Array<() => unknown> = [];
const realPut = IDBObjectStore.prototype.put;
const realAdd = IDBObjectStore.prototype.add;
afterEach(async () => {
  IDBObjectStore.prototype.put = realPut;
  IDBObjectStore.prototype.add = realAdd;
  for (const c of cleanups.splice(0).reverse()) await c();
});

function makeStore(estimate = { usage: 1_000, quota: 1_000_000_000 }): SurveyStore {
  const s = new SurveyStore({
    indexedDB: new IDBFactory(),
    storage: { estimate: async () => estimate },
    isInstalled: () => false,
    broadcast: false,
  });
  cleanups.push(() => s.close());
  return s;
}

/** Makes `put` into the surveys store throw as a full disk would, after the revision add. */
function failSurveyPutsWith(error: () => Error): void {
  IDBObjectStore.prototype.put = function (
    this: IDBObjectStore,
    ...args: Parameters<IDBObjectStore['put']>
  ) {
    if (this.name === 'surveys') throw error();
    return realPut.apply(this, args);
  };
}

const QUOTA_SENTENCE =
  'This device is out of storage space, so the last change was not saved. Export your surveys now, ' +
  'then remove photos you no longer need (or free space on the device) and try again. ' +
  'Nothing already saved has been lost.';

describe('quota errors', () => {
  it('leaves no partial write: the revision added in the same transaction is rolled back', async () => {
    const store = makeStore();
    const rec = await store.createSurvey();
    failSurveyPutsWith(
      () => new DOMException('The quota has been exceeded.', 'QuotaExceededError'),
    );
    const error = await store
      .saveDraft({ ...rec, address: 'lost?' }, { baseRevision: 1 })
      .catch((e: unknown) => e);
    expect(error).toBeInstanceOf(StorageError);
    expect((error as StorageError).kind).toBe('quota');
    expect((error as StorageError).userMessage).toBe(QUOTA_SENTENCE);
    IDBObjectStore.prototype.put = realPut;
    expect(await store.getRevisions(rec.id)).toHaveLength(1);
    expect((await store.getSurvey(rec.id))?.address).toBe('');
  });

  it('treats an AbortError near the quota as the quota, and elsewhere as an unknown failure', async () => {
    const abort = () => new DOMException('The transaction was aborted.', 'AbortError');
    const near = makeStore({ usage: 990, quota: 1000 });
    const a = await near.createSurvey();
    failSurveyPutsWith(abort);
    await expect(near.saveDraft({ ...a, team: 't' }, { baseRevision: 1 })).rejects.toMatchObject({
      kind: 'quota',
    });

    IDBObjectStore.prototype.put = realPut;
    const roomy = makeStore({ usage: 10, quota: 1_000_000_000 });
    const b = await roomy.createSurvey();
    failSurveyPutsWith(abort);
    await expect(roomy.saveDraft({ ...b, team: 't' }, { baseRevision: 1 })).rejects.toMatchObject({
      kind: 'unknown',
      userMessage: 'The change could not be saved (AbortError). Try again, or export now.',
    });
  });

  it('writes none of a batch when the disk fills in the middle of it', async () => {
    const store = makeStore();
    let adds = 0;
    IDBObjectStore.prototype.add = function (
      this: IDBObjectStore,
      ...args: Parameters<IDBObjectStore['add']>
    ) {
      if (this.name === 'revisions' && ++adds === 50) {
        throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
      }
      return realAdd.apply(this, args);
    };
    const records = Array.from({ length: 100 }, (_, i) =>
      emptySurvey('d', new Date(Date.UTC(2025, 0, 1, 0, 0, i))),
    );
    await expect(store.writeRevisions(records)).rejects.toMatchObject({ kind: 'quota' });
    IDBObjectStore.prototype.add = realAdd;
    expect(await store.listSurveys()).toEqual([]);
    const db = await store.database();
    expect(await db.count('revisions')).toBe(0);
  });

  it('shows the quota sentence in the draft state and saves again once space is freed', async () => {
    const store = makeStore();
    const rec = await store.createSurvey();
    const d = new DraftSaver({ store, id: rec.id, lifecycle: false, registerWithApp: false });
    cleanups.push(() => d.dispose());
    await d.load();
    failSurveyPutsWith(() => new DOMException('full', 'QuotaExceededError'));
    d.update({ address: 'typed while full' });
    await d.flush();
    expect(d.getState()).toMatchObject({
      saveState: 'error',
      error: { kind: 'quota', message: QUOTA_SENTENCE },
    });
    expect(d.getState().record?.address).toBe('typed while full'); // still on screen
    IDBObjectStore.prototype.put = realPut; // the inspector removed photos
    await d.retry();
    expect(d.getState().saveState).toBe('saved');
    expect((await store.getSurvey(rec.id))?.address).toBe('typed while full');
  });

  it('recognises the browsers’ names for a full disk', () => {
    expect(isQuotaError(new DOMException('x', 'QuotaExceededError'))).toBe(true);
    expect(isQuotaError({ name: 'NS_ERROR_DOM_QUOTA_REACHED' })).toBe(true);
    expect(isQuotaError(new DOMException('x', 'AbortError'))).toBe(false);
    expect(isQuotaError(null)).toBe(false);
    expect(isQuotaError('QuotaExceededError')).toBe(false);
  });
});
