import 'fake-indexeddb/auto';
import { IDBFactory, forceCloseDatabase } from 'fake-indexeddb';
import { unwrap } from 'idb';
import { afterEach, describe, expect, it } from 'vitest';
import {
  DB_VERSION,
  DraftSaver,
  SurveyStore,
  type StoreNotice,
  type SurveyStoreOptions,
} from '../../web/storage/index.js';

const cleanups: Array<() => unknown> = [];
afterEach(async () => {
  for (const c of cleanups.splice(0).reverse()) await c();
});

function makeStore(factory: IDBFactory, options: SurveyStoreOptions = {}): SurveyStore {
  const s = new SurveyStore({
    indexedDB: factory,
    storage: null,
    isInstalled: () => false,
    broadcast: false,
    ...options,
  });
  cleanups.push(() => s.close());
  return s;
}

function notices(store: SurveyStore): StoreNotice[] {
  const list: StoreNotice[] = [];
  store.onNotice((n) => list.push(n));
  return list;
}

const wait = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('lost connection', () => {
  it('reopens after the connection was closed under it, and the save succeeds', async () => {
    const store = makeStore(new IDBFactory());
    const seen = notices(store);
    const rec = await store.createSurvey();
    (await store.database()).close(); // as a backgrounded mobile tab may find it
    const outcome = await store.saveDraft({ ...rec, address: 'after reopen' }, { baseRevision: 1 });
    expect(outcome.status).toBe('saved');
    expect((await store.getSurvey(rec.id))?.address).toBe('after reopen');
    expect(seen).toContainEqual({ type: 'reopened' });
  });

  it('reopens after the browser forcibly closed the database (the close event)', async () => {
    const store = makeStore(new IDBFactory());
    const rec = await store.createSurvey();
    forceCloseDatabase(
      unwrap(await store.database()) as unknown as Parameters<typeof forceCloseDatabase>[0],
    );
    await wait(0);
    const outcome = await store.saveDraft(
      { ...rec, team: 'after close event' },
      { baseRevision: 1 },
    );
    expect(outcome.status).toBe('saved');
    expect((await store.getRevisions(rec.id)).map((r) => r.revision)).toEqual([1, 2]);
  });

  it('never applies a retried save twice when the first attempt did commit', async () => {
    const store = makeStore(new IDBFactory());
    const seen = notices(store);
    const rec = await store.createSurvey();
    const raw = unwrap(await store.database()) as unknown as RawDb;
    patchTransactions(raw, (tx) => {
      // The transaction commits, but its success is never reported: the connection is lost
      // at that moment and the caller sees an abort instead.
      // Only the first listeners (idb's `done`) are fooled; the database's own bookkeeping
      // must still see the real completion.
      const listeners = new Map<string, EventListener>();
      const add = tx.addEventListener.bind(tx);
      let fooled = false;
      tx.addEventListener = ((type: string, fn: EventListener) => {
        if (listeners.has(type)) return add(type, fn);
        listeners.set(type, fn);
        if (type !== 'complete' || fooled) return add(type, fn);
        fooled = true;
        return add('complete', () => {
          forceCloseDatabase(raw as never);
          listeners.get('abort')?.(new Event('abort'));
        });
      }) as typeof tx.addEventListener;
    });
    const outcome = await store.saveDraft({ ...rec, address: 'once' }, { baseRevision: 1 });
    expect(outcome.status).toBe('saved');
    expect(seen).toContainEqual({ type: 'reopened' }); // the retry happened
    expect((await store.getRevisions(rec.id)).map((r) => r.record.address)).toEqual(['', 'once']);
  });
});

type RawDb = IDBDatabase & { transaction: IDBDatabase['transaction'] };

/** Runs `patch` on the first readwrite transaction the raw connection creates. */
function patchTransactions(raw: RawDb, patch: (tx: IDBTransaction) => void): void {
  const real = Object.getPrototypeOf(raw).transaction as IDBDatabase['transaction'];
  let done = false;
  raw.transaction = function (this: IDBDatabase, ...args: Parameters<IDBDatabase['transaction']>) {
    const tx = real.apply(this, args);
    if (!done && args[1] === 'readwrite') {
      done = true;
      patch(tx);
    }
    return tx;
  } as IDBDatabase['transaction'];
}

describe('database upgrades', () => {
  it('an old tab flushes its draft, closes, and is asked to reload when a newer version opens', async () => {
    const factory = new IDBFactory();
    const oldTab = makeStore(factory);
    const seen = notices(oldTab);
    const rec = await oldTab.createSurvey();
    const saver = new DraftSaver({
      store: oldTab,
      id: rec.id,
      lifecycle: false,
      registerWithApp: false,
      debounceMs: 60_000,
    });
    cleanups.push(() => saver.dispose());
    await saver.load();
    saver.update({ address: 'typed just before the update' });

    const newTab = makeStore(factory, { version: DB_VERSION + 1 });
    const newSeen = notices(newTab);
    const fromNew = await newTab.getSurvey(rec.id); // waits until the old tab closed
    expect(fromNew?.address).toBe('typed just before the update');
    expect(seen.map((n) => n.type)).toContain('reload-required');
    expect(seen.find((n) => n.type === 'reload-required')).toMatchObject({
      message:
        'Grainline was updated in another tab. Your entries so far are saved; reload this tab to keep working.',
    });
    expect(oldTab.reloadRequired).toBe(true);
    // The old tab does not reopen the old version behind the new one's back.
    saver.update({ address: 'after close' });
    await saver.flush();
    expect(saver.getState()).toMatchObject({
      saveState: 'error',
      error: { kind: 'reload-required' },
    });
    // The new tab was blocked while the old one flushed, was told so, and then that the
    // wait was over (so the app shell takes the notice down again).
    const types = newSeen.map((n) => n.type);
    expect(types).toContain('upgrade-blocked');
    expect(types.indexOf('upgrade-unblocked')).toBeGreaterThan(types.indexOf('upgrade-blocked'));
  });

  it('a tab of an older build refuses a database a newer build already upgraded', async () => {
    const factory = new IDBFactory();
    const newer = makeStore(factory, { version: DB_VERSION + 1 });
    await newer.createSurvey();
    newer.close();
    const older = makeStore(factory);
    const seen = notices(older);
    await expect(older.listSurveys()).rejects.toMatchObject({ kind: 'reload-required' });
    expect(seen.map((n) => n.type)).toEqual(['reload-required']);
  });
});
