import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { afterEach, describe, expect, it } from 'vitest';
import { flushPendingWrites } from '../../web/app/pending-writes.js';
import {
  DraftSaver,
  StorageError,
  SurveyStore,
  type DraftSaverOptions,
  type DraftState,
  type SaveState,
  type SurveyStoreOptions,
} from '../../web/storage/index.js';

const cleanups: Array<() => unknown> = [];
afterEach(async () => {
  for (const c of cleanups.splice(0).reverse()) await c();
});

/** One "tab": its own store (connection + BroadcastChannel) on a shared fake IndexedDB. */
function tab(
  factory: IDBFactory,
  channelName: string,
  options: SurveyStoreOptions = {},
): SurveyStore {
  const s = new SurveyStore({
    indexedDB: factory,
    storage: null,
    isInstalled: () => false,
    channelName,
    ...options,
  });
  cleanups.push(() => s.close());
  return s;
}

function saver(
  store: SurveyStore,
  id: string,
  options: Partial<DraftSaverOptions> = {},
): DraftSaver {
  const d = new DraftSaver({ store, id, lifecycle: false, registerWithApp: false, ...options });
  cleanups.push(() => d.dispose());
  return d;
}

const wait = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function until(check: () => boolean, timeoutMs = 2000): Promise<void> {
  const start = Date.now();
  while (!check()) {
    if (Date.now() - start > timeoutMs) throw new Error('condition not met in time');
    await wait(5);
  }
}

let channelCount = 0;
const freshChannel = () => `test-channel-${process.pid}-${++channelCount}`;

describe('DraftSaver: autosave', () => {
  it('persists a change within 300 ms and says "saved" only once it is stored', async () => {
    const factory = new IDBFactory();
    const store = tab(factory, freshChannel());
    const rec = await store.createSurvey();
    const d = saver(store, rec.id);
    await d.load();
    const states: Array<{ t: number; s: SaveState }> = [];
    const t0 = performance.now();
    d.subscribe((s) => states.push({ t: performance.now() - t0, s: s.saveState }));
    d.update({ address: '7 Quarry Road' });
    expect(d.getState().saveState).toBe('unsaved');
    await until(() => d.getState().saveState === 'saved');
    const savedAt = states.find((x) => x.s === 'saved' && x.t > 0)?.t ?? Infinity;
    expect(savedAt).toBeLessThan(300);
    // A second tab's own connection sees it: the transaction had completed.
    const other = tab(factory, freshChannel());
    expect((await other.getSurvey(rec.id))?.address).toBe('7 Quarry Road');
    expect(states.map((x) => x.s)).toEqual(['saved', 'unsaved', 'saving', 'saved']);
  });

  it('keeps saving during steady typing instead of waiting for a pause', async () => {
    const store = tab(new IDBFactory(), freshChannel());
    const rec = await store.createSurvey();
    const d = saver(store, rec.id, { debounceMs: 100 });
    await d.load();
    for (let i = 0; i < 20; i++) {
      d.update({ address: 'x'.repeat(i + 1) });
      await wait(25);
    }
    const during = (await store.getRevisions(rec.id)).length - 1;
    expect(during).toBeGreaterThanOrEqual(3); // ~500 ms of typing at one save per 100 ms
    await d.flush();
    expect((await store.getSurvey(rec.id))?.address).toBe('x'.repeat(20));
  });

  it('shows "saving" until the transaction is done, and "error" (never "saved") when it fails', async () => {
    const store = tab(new IDBFactory(), freshChannel());
    const rec = await store.createSurvey();
    const d = saver(store, rec.id);
    await d.load();
    const real = store.saveDraft.bind(store);
    let release: () => void = () => undefined;
    store.saveDraft = async (...args) => {
      await new Promise<void>((r) => (release = r));
      return real(...args);
    };
    d.update({ team: 'Team West' });
    const flushing = d.flush();
    await wait(20);
    expect(d.getState().saveState).toBe('saving');
    release();
    await flushing;
    expect(d.getState().saveState).toBe('saved');

    store.saveDraft = () =>
      Promise.reject(new StorageError('unknown', 'The change could not be saved (disk).'));
    d.update({ team: 'Team East' });
    await d.flush();
    expect(d.getState().saveState).toBe('error');
    expect(d.getState().error?.message).toBe('The change could not be saved (disk).');
    await expect(d.flushOrThrow()).rejects.toThrow('The change could not be saved (disk).');
  });

  it('flushes at once on pagehide and when the page becomes hidden', async () => {
    const store = tab(new IDBFactory(), freshChannel());
    const rec = await store.createSurvey();
    const doc = Object.assign(new EventTarget(), {
      visibilityState: 'visible' as DocumentVisibilityState,
    });
    const win = new EventTarget();
    const d = saver(store, rec.id, {
      debounceMs: 60_000,
      lifecycle: { document: doc, window: win },
    });
    await d.load();

    d.update({ address: 'hidden' });
    doc.visibilityState = 'hidden';
    doc.dispatchEvent(new Event('visibilitychange'));
    await until(() => d.getState().saveState === 'saved');
    expect((await store.getSurvey(rec.id))?.address).toBe('hidden');

    d.update({ address: 'pagehide' });
    win.dispatchEvent(new Event('pagehide'));
    await until(() => d.getState().saveState === 'saved');
    expect((await store.getSurvey(rec.id))?.address).toBe('pagehide');
  });

  it('registers with the app so flushPendingWrites() saves the draft before an update', async () => {
    const store = tab(new IDBFactory(), freshChannel());
    const rec = await store.createSurvey();
    const d = saver(store, rec.id, { debounceMs: 60_000, registerWithApp: true });
    await d.load();
    d.update({ inspector: 'D. Field' });
    await flushPendingWrites();
    expect((await store.getSurvey(rec.id))?.inspector).toBe('D. Field');
  });

  it('reports a survey that is not on the device', async () => {
    const store = tab(new IDBFactory(), freshChannel());
    const d = saver(store, '00000000-0000-4000-8000-000000000000');
    await d.load();
    expect(d.getState()).toMatchObject({
      loading: false,
      record: null,
      error: { kind: 'not-found' },
    });
    expect(() => d.update({ address: 'x' })).toThrow(/before it was loaded/);
  });
});

describe('DraftSaver: two tabs on one survey', () => {
  it('detects the later writer, tells it, and keeps both versions', async () => {
    const factory = new IDBFactory();
    const channel = freshChannel();
    const tabA = tab(factory, channel);
    const tabB = tab(factory, channel);
    const rec = await tabA.createSurvey();
    const a = saver(tabA, rec.id);
    const b = saver(tabB, rec.id);
    await a.load();
    await b.load();
    await until(() => a.getState().otherTabs === 1 && b.getState().otherTabs === 1);

    // Both edit before either save lands; A saves first.
    a.update({ address: 'from A' });
    b.update({ address: 'from B' });
    await a.flush();
    await b.flush();
    await until(() => b.getState().conflict !== null);

    const bState: DraftState = b.getState();
    expect(bState.conflict?.theirs?.address).toBe('from A');
    expect(bState.conflict?.message).toMatch(/Both versions are kept/);
    expect(bState.record?.address).toBe('from B'); // B's text is still on B's screen
    expect((await tabA.getSurvey(rec.id))?.address).toBe('from A'); // nothing overwritten
    const revs = await tabA.getRevisions(rec.id);
    expect(revs.map((r) => [r.record.address, r.kind])).toEqual([
      ['', 'save'],
      ['from A', 'save'],
      ['from B', 'conflict'],
    ]);
    expect(revs[2]?.conflictWith).toBe(2);

    // B keeps its version: it becomes current, and A (with nothing unsaved) shows it.
    await b.keepMine();
    expect(b.getState().conflict).toBeNull();
    expect((await tabA.getSurvey(rec.id))?.address).toBe('from B');
    await until(() => a.getState().record?.address === 'from B');
    expect(a.getState().updatedElsewhere).toBe(true);
    expect((await tabA.getRevisions(rec.id)).map((r) => r.record.address)).toEqual([
      '',
      'from A',
      'from B',
      'from B',
    ]);
  });

  it('raises the conflict from the other tab’s message before its own next save', async () => {
    const factory = new IDBFactory();
    const channel = freshChannel();
    const tabA = tab(factory, channel);
    const tabB = tab(factory, channel);
    const rec = await tabA.createSurvey();
    const a = saver(tabA, rec.id);
    const b = saver(tabB, rec.id, { debounceMs: 60_000 });
    await a.load();
    await b.load();
    b.update({ inspector: 'B typing' }); // unsaved in B (long debounce)
    a.update({ address: 'A saved' });
    await a.flush();
    await until(() => b.getState().conflict !== null);
    expect(b.getState().conflict?.theirRevision).toBe(2);
    // Taking theirs: B shows A's version; B's own text went to the revisions first.
    await b.takeTheirs();
    expect(b.getState().record?.address).toBe('A saved');
    const kinds = (await tabA.getRevisions(rec.id)).map((r) => r.kind);
    expect(kinds).toEqual(['save', 'save', 'conflict']);
  });

  it('catches a conflict by the revision check alone, without any tab messages', async () => {
    const factory = new IDBFactory();
    const tabA = tab(factory, freshChannel(), { broadcast: false });
    const tabB = tab(factory, freshChannel(), { broadcast: false });
    const rec = await tabA.createSurvey();
    const a = saver(tabA, rec.id);
    const b = saver(tabB, rec.id);
    await a.load();
    await b.load();
    a.update({ address: 'A' });
    await a.flush();
    b.update({ address: 'B' });
    await b.flush();
    expect(b.getState().conflict?.theirs?.address).toBe('A');
    expect((await tabB.getSurvey(rec.id))?.address).toBe('A');
    expect((await tabB.getRevisions(rec.id)).at(-1)).toMatchObject({
      kind: 'conflict',
      record: { address: 'B' },
    });
  });
});
