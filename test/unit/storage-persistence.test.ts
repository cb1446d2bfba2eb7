import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { afterEach, describe, expect, it } from 'vitest';
import { validateRecord, type SurveyRecord } from '../../forms/schema/index.js';
import { SurveyStore, type StorageManagerLike, type StoreNotice } from '../../web/storage/index.js';
import v2 from '../fixtures/records/v2-three-storey-clt.json' with { type: 'json' };

const open: SurveyStore[] = [];
afterEach(() => {
  for (const s of open.splice(0)) s.close();
});

/** A fake navigator.storage that answers `granted` and counts the requests. */
function fakeStorage(granted: boolean, estimate = { usage: 1_000_000, quota: 50_000_000 }) {
  const calls = { persist: 0 };
  const storage: StorageManagerLike = {
    persist: () => {
      calls.persist++;
      return Promise.resolve(granted);
    },
    persisted: () => Promise.resolve(granted && calls.persist > 0),
    estimate: () => Promise.resolve(estimate),
  };
  return { storage, calls };
}

function makeStore(storage: StorageManagerLike | null, installed = false): SurveyStore {
  const s = new SurveyStore({
    indexedDB: new IDBFactory(),
    storage,
    isInstalled: () => installed,
    broadcast: false,
  });
  open.push(s);
  return s;
}

function fixture(): SurveyRecord {
  const r = validateRecord(structuredClone(v2));
  if (!r.ok) throw new Error('fixture invalid');
  return r.record;
}

const settle = () => new Promise((r) => setTimeout(r, 0));

describe('persistent storage', () => {
  it('asks the browser to keep the data once, after the first save, and reports the answer', async () => {
    const { storage, calls } = fakeStorage(false);
    const store = makeStore(storage);
    const seen: StoreNotice[] = [];
    store.onNotice((n) => seen.push(n));
    await store.listSurveys();
    await settle();
    expect(calls.persist).toBe(0); // reading is not saving

    const record = await store.createSurvey();
    await settle();
    expect(calls.persist).toBe(1);
    expect(seen).toContainEqual({ type: 'persistence', granted: false });

    await store.saveDraft({ ...record, address: 'again' }, { baseRevision: 1 });
    await store.writeRevisions([fixture()]);
    await settle();
    expect(calls.persist).toBe(1);
    expect(seen.filter((n) => n.type === 'persistence')).toHaveLength(1);
  });

  it('asks after an import too, when that is the first write', async () => {
    const { storage, calls } = fakeStorage(true);
    const store = makeStore(storage);
    await store.writeRevisions([fixture()]);
    await settle();
    expect(calls.persist).toBe(1);
  });

  it('warns of eviction when the data are neither persisted nor the app installed', async () => {
    const refused = makeStore(fakeStorage(false).storage);
    const status = await refused.storageStatus();
    expect(status).toMatchObject({
      usageBytes: 1_000_000,
      quotaBytes: 50_000_000,
      persisted: false,
      installed: false,
      evictionRisk: true,
    });
    expect(status.warning).toMatch(/may delete saved surveys.*Install Grainline.*export/);

    const installed = await makeStore(fakeStorage(false).storage, true).storageStatus();
    expect(installed).toMatchObject({ evictionRisk: false, warning: null });

    const kept = makeStore(fakeStorage(true).storage);
    await kept.requestPersistence();
    expect(await kept.storageStatus()).toMatchObject({ persisted: true, evictionRisk: false });
  });

  it('does not crash where the browser has no storage manager or its estimate fails', async () => {
    const none = await makeStore(null).storageStatus();
    expect(none).toMatchObject({ usageBytes: null, quotaBytes: null, persisted: null });
    expect(none.evictionRisk).toBe(true);
    const failing: StorageManagerLike = {
      estimate: () => Promise.reject(new Error('denied')),
      persisted: () => Promise.reject(new Error('denied')),
    };
    expect(await makeStore(failing).storageStatus()).toMatchObject({
      usageBytes: null,
      quotaBytes: null,
      persisted: null,
    });
  });
});

describe('counts for the app shell', () => {
  it('counts unreadable records, leaving out drafts kept aside while a form is invalid', async () => {
    const store = makeStore(null);
    const good = await store.createSurvey();
    expect(await store.countSurveys()).toBe(1);
    await store.quarantineDraft(good.id, { ...good, address: 42 }, []);
    expect(await store.countQuarantined()).toBe(1);
    expect(await store.countUnreadable()).toBe(0);

    const db = await store.database();
    const tx = db.transaction('surveys', 'readwrite');
    await (tx.store as unknown as { put(v: unknown): Promise<unknown> }).put({
      id: 'damaged',
      revision: 1,
      record: { broken: true },
    });
    await tx.done;
    await store.listSurveys(); // the read quarantines it
    expect(await store.countUnreadable()).toBe(1);
    expect(await store.countSurveys()).toBe(1);
  });
});
