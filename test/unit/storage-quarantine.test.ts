import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { afterEach, describe, expect, it } from 'vitest';
import { validateRecord, type SurveyRecord } from '../../forms/schema/index.js';
import { DraftSaver, SurveyStore, toJsonSafe, type StoreNotice } from '../../web/storage/index.js';
import v2 from '../fixtures/records/v2-three-storey-clt.json' with { type: 'json' };

const open: Array<{ close(): void }> = [];
afterEach(() => {
  for (const s of open.splice(0)) s.close();
});

function makeStore(factory = new IDBFactory()): SurveyStore {
  const s = new SurveyStore({
    indexedDB: factory,
    storage: null,
    isInstalled: () => false,
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

/** Puts a raw value into a store, bypassing every check (a bug, an old build, a disk fault). */
async function putRaw(store: SurveyStore, storeName: 'surveys' | 'revisions', value: unknown) {
  const db = await store.database();
  const tx = db.transaction(storeName, 'readwrite');
  const os = tx.objectStore(storeName) as unknown as { put(v: unknown): Promise<unknown> };
  const key = await os.put(value);
  await tx.done;
  return key;
}

describe('quarantine of unreadable current rows', () => {
  it('keeps a corrupted record, lists it, and leaves the good ones untouched', async () => {
    const store = makeStore();
    const good = await store.createSurvey();
    const other = await store.createSurvey();
    const bad = { ...fixture(), id: '11111111-2222-4333-8444-555555555555' };
    const badRow = {
      id: bad.id,
      revision: bad.revision,
      updatedAt: bad.updatedAt,
      outcome: 'unscreened',
      saveId: 'x',
      record: { ...bad, building: { ...bad.building, storeys: [{ heightM: -3 }] } },
    };
    await putRaw(store, 'surveys', badRow);
    const notices: StoreNotice[] = [];
    store.onNotice((n) => notices.push(n));

    const list = await store.listSurveys();
    expect(list.map((r) => r.id).sort()).toEqual([good.id, other.id].sort());
    expect(list.find((r) => r.id === good.id)).toEqual(good);

    const q = await store.listQuarantined();
    expect(q).toHaveLength(1);
    expect(q[0]).toMatchObject({ source: 'surveys', sourceKey: bad.id, reason: 'invalid' });
    expect(q[0]?.raw).toEqual(badRow); // exactly as it was found
    expect(q[0]?.messages.map((m) => m.path)).toContain('building.storeys.0.heightM');
    expect(notices).toContainEqual({
      type: 'quarantined',
      count: 1,
      message:
        'One stored record could not be read. It is kept apart, unchanged, and can be exported.',
    });

    // Moved, not copied: a second listing does not quarantine it again.
    await store.listSurveys();
    expect(await store.countQuarantined()).toBe(1);
    expect(await store.getSurvey(bad.id)).toBeUndefined();
  });

  it('quarantines on getSurvey too, and a later save of that survey does not overwrite silently', async () => {
    const store = makeStore();
    const rec = await store.createSurvey();
    await putRaw(store, 'surveys', { id: rec.id, revision: 7, junk: true });
    expect(await store.getSurvey(rec.id)).toBeUndefined();
    expect((await store.listQuarantined())[0]?.raw).toEqual({
      id: rec.id,
      revision: 7,
      junk: true,
    });
    // The saver that loaded revision 1 saves on: the revisions know revision 1 is the last.
    const outcome = await store.saveDraft({ ...rec, address: 'after' }, { baseRevision: 1 });
    expect(outcome.status).toBe('saved');
    expect(await store.countQuarantined()).toBe(1);
  });

  it('does not crash on rows of any shape: each is kept, none is dropped', async () => {
    const store = makeStore();
    const good = await store.createSurvey();
    // The surveys store keys rows by their `id`, so even a damaged row has one.
    const shapes: Array<Record<string, unknown>> = [
      {},
      { revision: 'one' },
      { revision: 1, record: null },
      { revision: 1, record: 42 },
      { revision: 1, record: [fixture()] },
      { revision: 1, record: fixture() }, // the record inside has another id
      { revision: 1, record: { ...fixture(), schemaVersion: 9 } },
      { revision: 1, record: new Map([['id', 'm']]) },
      { revision: 1, record: new Date(0) },
      { revision: 2, record: { ...fixture(), revision: 3 } },
    ];
    const rows = shapes.map((shape, i) => ({ id: `key-${i}`, ...shape }));
    for (const row of rows) await putRaw(store, 'surveys', row);
    expect((await store.listSurveys()).map((r) => r.id)).toEqual([good.id]);
    const q = await store.listQuarantined();
    expect(q.map((e) => e.sourceKey).sort()).toEqual(rows.map((r) => r.id).sort());
    for (const row of rows) expect(q.find((e) => e.sourceKey === row.id)?.raw).toEqual(row);
    expect(q.find((e) => e.sourceKey === 'key-6')?.reason).toBe('newer-version');
    expect(q.find((e) => e.sourceKey === 'key-5')?.reason).toBe('row-mismatch');
  });
});

describe('quarantine of unreadable revisions', () => {
  it('copies a bad revision once and leaves it in the append-only history', async () => {
    const store = makeStore();
    const rec = await store.createSurvey();
    const seq = await putRaw(store, 'revisions', {
      surveyId: rec.id,
      revision: 2,
      savedAt: '2025-01-01T00:00:00.000Z',
      kind: 'save',
      conflictWith: null,
      tabId: null,
      record: { nonsense: true },
    });
    const revs = await store.getRevisions(rec.id);
    expect(revs.map((r) => r.revision)).toEqual([1]);
    await store.getRevisions(rec.id);
    const q = await store.listQuarantined();
    expect(q).toHaveLength(1);
    expect(q[0]).toMatchObject({ source: 'revisions', sourceKey: String(seq) });
    const db = await store.database();
    expect(await db.count('revisions')).toBe(2);
  });

  it('finds bad rows no index reaches with checkIntegrity()', async () => {
    const store = makeStore();
    await store.createSurvey();
    await putRaw(store, 'revisions', { surveyId: 12, garbage: [1, 2, 3] });
    const report = await store.checkIntegrity();
    expect(report).toEqual({ surveysChecked: 1, revisionsChecked: 2, newlyQuarantined: 1 });
    expect((await store.checkIntegrity()).newlyQuarantined).toBe(0);
  });
});

describe('quarantine of drafts that are not valid to store', () => {
  it('keeps the invalid draft aside, shows field messages, and saves again once fixed', async () => {
    const store = makeStore();
    const rec = await store.createSurvey();
    const saver = new DraftSaver({ store, id: rec.id, lifecycle: false, registerWithApp: false });
    open.push({ close: () => void saver.dispose() });
    await saver.load();
    saver.update((r) => ({
      ...r,
      building: {
        ...r.building,
        storeys: [
          { heightM: 0, floorAreaM2: 50, floorConstruction: 'on-grade', unitWeightPa: null },
        ],
      },
    }));
    await saver.flush();
    const s = saver.getState();
    expect(s.saveState).toBe('error');
    expect(s.error?.kind).toBe('invalid');
    expect(s.error?.fieldMessages).toEqual([
      { path: 'building.storeys.0.heightM', message: 'Storey height must be more than 0 m.' },
    ]);
    const q = await store.listQuarantined();
    expect(q).toMatchObject([{ source: 'draft', sourceKey: rec.id }]);
    expect((q[0]?.raw as SurveyRecord).building.storeys[0]?.heightM).toBe(0);
    expect(await store.getRevisions(rec.id)).toHaveLength(1);

    saver.update((r) => ({
      ...r,
      building: {
        ...r.building,
        storeys: [
          { heightM: 2.6, floorAreaM2: 50, floorConstruction: 'on-grade', unitWeightPa: null },
        ],
      },
    }));
    await saver.flush();
    expect(saver.getState().saveState).toBe('saved');
    expect((await store.getSurvey(rec.id))?.building.storeys[0]?.heightM).toBe(2.6);
  });
});

describe('exporting the quarantine', () => {
  it('writes every entry as JSON that says what each odd value was', async () => {
    const store = makeStore();
    await putRaw(store, 'surveys', {
      id: 'odd',
      when: new Date(0),
      big: 10n,
      n: NaN,
      m: new Map([[1, 'a']]),
      u: undefined,
    });
    await store.listSurveys();
    const exported = JSON.parse(await store.exportQuarantined()) as {
      kind: string;
      entries: Array<{ raw: unknown }>;
    };
    expect(exported.kind).toBe('grainline-quarantine');
    expect(exported.entries[0]?.raw).toEqual({
      id: 'odd',
      when: { $type: 'date', value: '1970-01-01T00:00:00.000Z' },
      big: { $type: 'bigint', value: '10' },
      n: { $type: 'number', value: 'NaN' },
      m: { $type: 'map', entries: [[1, 'a']] },
      u: { $type: 'undefined' },
    });
  });

  it('toJsonSafe keeps plain JSON as it is, "__proto__" keys included, and marks cycles', async () => {
    const plain = JSON.parse('{"a":[1,"x",null,true],"__proto__":{"b":2}}') as unknown;
    const out = await toJsonSafe(plain);
    expect(JSON.stringify(out)).toBe('{"a":[1,"x",null,true],"__proto__":{"b":2}}');
    const cyclic: Record<string, unknown> = { k: 1 };
    cyclic['self'] = cyclic;
    expect(await toJsonSafe(cyclic)).toEqual({ k: 1, self: { $type: 'cycle' } });
    expect(await toJsonSafe({ $type: 'x' })).toEqual({
      $type: 'object',
      entries: [['$type', 'x']],
    });
    expect(await toJsonSafe(new Blob(['hi'], { type: 'text/plain' }))).toEqual({
      $type: 'blob',
      mime: 'text/plain',
      size: 2,
      base64: 'aGk=',
    });
    // eslint-disable-next-line no-sparse-arrays
    expect(await toJsonSafe([1, , 3])).toEqual([1, { $type: 'hole' }, 3]);
  });
});
