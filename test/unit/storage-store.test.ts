import 'fake-indexeddb/auto';
import { IDBFactory } from 'fake-indexeddb';
import { afterEach, describe, expect, it } from 'vitest';
import { emptySurvey, validateRecord, type SurveyRecord } from '../../forms/schema/index.js';
import {
  DB_NAME,
  SurveyStore,
  StorageError,
  encodeGeohash,
  needsExport,
  outcomeOf,
  type SurveyStoreOptions,
} from '../../web/storage/index.js';
import v1 from '../fixtures/records/v1-two-storey-house.json' with { type: 'json' };
import v2 from '../fixtures/records/v2-three-storey-clt.json' with { type: 'json' };

const open: SurveyStore[] = [];
let clock = Date.parse('2025-01-01T00:00:00.000Z');
const now = () => new Date((clock += 1000));

function makeStore(factory = new IDBFactory(), options: SurveyStoreOptions = {}): SurveyStore {
  const s = new SurveyStore({
    indexedDB: factory,
    storage: null,
    isInstalled: () => false,
    broadcast: false,
    now,
    ...options,
  });
  open.push(s);
  return s;
}

afterEach(() => {
  for (const s of open.splice(0)) s.close();
});

function v2Fixture(): SurveyRecord {
  const r = validateRecord(structuredClone(v2));
  if (!r.ok) throw new Error(JSON.stringify(r.messages));
  return r.record;
}

describe('SurveyStore: surveys and revisions', () => {
  it('creates a survey as revision 1 and reads it back', async () => {
    const store = makeStore();
    const created = await store.createSurvey({ inspector: 'C. Test' });
    expect(created.revision).toBe(1);
    expect(await store.getSurvey(created.id)).toEqual(created);
    const revisions = await store.getRevisions(created.id);
    expect(revisions.map((r) => [r.revision, r.kind])).toEqual([[1, 'save']]);
  });

  it('keeps one device id for the device', async () => {
    const factory = new IDBFactory();
    const a = await makeStore(factory).getDeviceId();
    const b = await makeStore(factory).getDeviceId();
    expect(a).toBe(b);
    const created = await makeStore(factory).createSurvey();
    expect(created.deviceId).toBe(a);
  });

  it('writes one revision per save and never changes an earlier one (append-only)', async () => {
    const store = makeStore();
    let record = await store.createSurvey();
    const snapshots = [structuredClone(await store.getRevisions(record.id))];
    for (let i = 1; i <= 5; i++) {
      const outcome = await store.saveDraft(
        { ...record, address: `Address ${i}` },
        { baseRevision: record.revision },
      );
      if (outcome.status !== 'saved') throw new Error('unexpected conflict');
      record = outcome.record;
      snapshots.push(structuredClone(await store.getRevisions(record.id)));
    }
    const final = snapshots[snapshots.length - 1] ?? [];
    expect(final.map((r) => r.revision)).toEqual([1, 2, 3, 4, 5, 6]);
    expect(final.map((r) => r.record.address)).toEqual([
      '',
      'Address 1',
      'Address 2',
      'Address 3',
      'Address 4',
      'Address 5',
    ]);
    // Every earlier listing is a prefix of every later one, entry for entry.
    snapshots.forEach((snap, i) => expect(final.slice(0, i + 1)).toEqual(snap));
    expect((await store.getSurvey(record.id))?.address).toBe('Address 5');
  });

  it('sets revision and updatedAt on save and lists surveys newest first', async () => {
    const store = makeStore();
    const a = await store.createSurvey();
    const b = await store.createSurvey();
    const saved = await store.saveDraft({ ...a, address: 'later' }, { baseRevision: 1 });
    expect(saved.status === 'saved' && saved.record.revision).toBe(2);
    const list = await store.listSurveys();
    expect(list.map((r) => r.id)).toEqual([a.id, b.id]);
    expect((list[0]?.updatedAt ?? '') > (list[1]?.updatedAt ?? '')).toBe(true);
  });

  it('refuses an invalid record with field messages and writes nothing', async () => {
    const store = makeStore();
    const record = await store.createSurvey();
    const bad = { ...record, address: 'x'.repeat(501) };
    await expect(store.saveDraft(bad, { baseRevision: 1 })).rejects.toMatchObject({
      kind: 'invalid',
      fieldMessages: [
        { path: 'address', message: 'Address or description must be at most 500 characters long.' },
      ],
    });
    expect(await store.getRevisions(record.id)).toHaveLength(1);
  });

  it('reads a version 1 row as a migrated version 2 record, and leaves the stored row as it was', async () => {
    const factory = new IDBFactory();
    const store = makeStore(factory);
    await store.getDeviceId(); // creates the database
    const db = await store.database();
    const row = {
      id: v1.id,
      revision: v1.revision,
      updatedAt: v1.updatedAt,
      outcome: 'unscreened',
      saveId: 'old',
      record: structuredClone(v1),
    };
    await db.put('surveys', row as never);
    const read = await store.getSurvey(v1.id);
    expect(read?.schemaVersion).toBe(2);
    expect(read?.building.storeys[0]?.heightM).toBe(2.7);
    expect((await store.listSurveys()).map((r) => r.id)).toEqual([v1.id]);
    expect(await db.get('surveys', v1.id)).toEqual(row);
  });
});

describe('SurveyStore: indexes for the building list and the map', () => {
  it('finds surveys by outcome, by location cell and by time of change', async () => {
    const store = makeStore();
    const located = v2Fixture(); // posting 'limited-entry' is not a posting id → unscreened
    located.result = {
      calcVersion: '0.1.0',
      computedAt: '2025-06-11T06:40:00.000Z',
      result: { posting: 'limited' },
    };
    const plain = { ...emptySurvey('d', new Date('2025-02-01T00:00:00Z')), revision: 3 };
    await store.writeRevisions([located, plain]);
    expect((await store.listByOutcome('limited')).map((r) => r.id)).toEqual([located.id]);
    expect((await store.listByOutcome('unscreened')).map((r) => r.id)).toEqual([plain.id]);
    // 45.0312 N, 7.6618 E: the geohash cell of the fixture's location, prefix of 5 characters.
    const cell = encodeGeohash(45.0312, 7.6618, 5);
    expect((await store.listInCell(cell)).map((r) => r.id)).toEqual([located.id]);
    expect(await store.listInCell('s')).toEqual([]);
    expect((await store.listUpdatedSince('2025-06-01T00:00:00.000Z')).map((r) => r.id)).toEqual([
      located.id,
    ]);
  });

  it('reads the posting from result.posting or result.posting.level, else "unscreened"', () => {
    const at = { calcVersion: '0', computedAt: '2025-01-01T00:00:00.000Z' };
    expect(outcomeOf({ result: null })).toBe('unscreened');
    expect(outcomeOf({ result: { ...at, result: { posting: 'keep-out' } } })).toBe('keep-out');
    expect(outcomeOf({ result: { ...at, result: { posting: { level: 'open' } } } })).toBe('open');
    expect(outcomeOf({ result: { ...at, result: { posting: 'green' } } })).toBe('unscreened');
    expect(outcomeOf({ result: { ...at, result: [1, 2] } })).toBe('unscreened');
  });
});

describe('SurveyStore: writeRevisions', () => {
  it('writes many revisions and current pointers in one transaction', async () => {
    const store = makeStore();
    const a = emptySurvey('d', new Date('2025-01-01T00:00:00Z'));
    const recs = [1, 2, 3].map((revision) => ({ ...a, revision, address: `r${revision}` }));
    const result = await store.writeRevisions(recs);
    expect(result).toEqual({ revisionsWritten: 3, currentUpdated: [a.id] });
    expect((await store.getSurvey(a.id))?.address).toBe('r3');
    expect((await store.getRevisions(a.id)).map((r) => [r.revision, r.kind])).toEqual([
      [1, 'import'],
      [2, 'import'],
      [3, 'import'],
    ]);
  });

  it('moves a pointer only to a newer revision by default, always or never on request', async () => {
    const store = makeStore();
    const a = emptySurvey('d', new Date('2025-01-01T00:00:00Z'));
    await store.writeRevisions([{ ...a, revision: 5, address: 'five' }]);
    expect(
      (await store.writeRevisions([{ ...a, revision: 4, address: 'four' }])).currentUpdated,
    ).toEqual([]);
    expect((await store.getSurvey(a.id))?.address).toBe('five');
    await store.writeRevisions([{ ...a, revision: 4, address: 'four' }], { current: 'always' });
    expect((await store.getSurvey(a.id))?.address).toBe('four');
    await store.writeRevisions([{ ...a, revision: 9, address: 'nine' }], { current: 'never' });
    expect((await store.getSurvey(a.id))?.address).toBe('four');
    expect(await store.getRevisions(a.id)).toHaveLength(4);
  });

  it('writes nothing at all when one record of the batch is invalid, and says which', async () => {
    const store = makeStore();
    const good = emptySurvey('d', new Date('2025-01-01T00:00:00Z'));
    const bad = {
      ...emptySurvey('d', new Date('2025-01-01T00:00:00Z')),
      inspectionKind: 'third',
    } as unknown as SurveyRecord;
    const error = await store.writeRevisions([good, bad]).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(StorageError);
    expect((error as StorageError).userMessage).toBe(
      'One record is not valid, so none of them were written.',
    );
    expect((error as StorageError).fieldMessages).toEqual([
      {
        path: '1.inspectionKind',
        message: 'Kind of inspection: choose one of the options offered.',
      },
    ]);
    expect(await store.listSurveys()).toEqual([]);
    expect(await store.getRevisions(good.id)).toEqual([]);
  });
});

describe('SurveyStore: export marker', () => {
  it('marks the exported revision without writing a revision, and only if it is still current', async () => {
    const store = makeStore();
    const a = await store.createSurvey();
    expect(needsExport(a)).toBe(true);
    expect(
      await store.markExported([{ id: a.id, revision: 1 }], new Date('2030-01-01T00:00:00Z')),
    ).toEqual([a.id]);
    const marked = await store.getSurvey(a.id);
    expect(marked?.lastExportedAt).toBe('2030-01-01T00:00:00.000Z');
    expect(needsExport(marked as SurveyRecord)).toBe(false);
    expect(await store.getRevisions(a.id)).toHaveLength(1);
    await store.saveDraft({ ...(marked as SurveyRecord), address: 'changed' }, { baseRevision: 1 });
    expect(await store.markExported([{ id: a.id, revision: 1 }], new Date())).toEqual([]);
  });
});

describe('SurveyStore: photos and settings', () => {
  it('stores photo Blobs by survey and deletes them on request', async () => {
    const store = makeStore();
    const blob = new Blob([new Uint8Array([0xff, 0xd8, 0xff, 0xd9])], { type: 'image/jpeg' });
    await store.putPhoto({
      id: 'p1',
      surveyId: 's1',
      blob,
      type: 'image/jpeg',
      width: 1,
      height: 1,
      bytes: 4,
      storedAt: '2025-01-01T00:00:00.000Z',
    });
    const back = await store.getPhoto('p1');
    expect(back?.bytes).toBe(4);
    expect(new Uint8Array(await (back?.blob as Blob).arrayBuffer())).toEqual(
      new Uint8Array([0xff, 0xd8, 0xff, 0xd9]),
    );
    expect(await store.listPhotoIds('s1')).toEqual(['p1']);
    await store.deletePhoto('p1');
    expect(await store.getPhoto('p1')).toBeUndefined();
  });

  it('keeps settings as given', async () => {
    const store = makeStore();
    await store.setSetting('units', { system: 'si' });
    expect(await store.getSetting('units')).toEqual({ system: 'si' });
    expect(await store.getSetting('missing')).toBeUndefined();
  });
});

describe('SurveyStore: persistence and eviction warning', () => {
  it('asks for persistent storage once, on the first save', async () => {
    let asked = 0;
    const storage = {
      persist: async () => {
        asked++;
        return true;
      },
      persisted: async () => false,
      estimate: async () => ({ usage: 1000, quota: 10_000_000 }),
    };
    const store = makeStore(new IDBFactory(), { storage });
    const a = await store.createSurvey();
    await store.saveDraft({ ...a, address: 'x' }, { baseRevision: 1 });
    await new Promise((r) => setTimeout(r, 0));
    expect(asked).toBe(1);
  });

  it('warns of eviction when storage is not persisted and the app is not installed', async () => {
    const storage = {
      persisted: async () => false,
      estimate: async () => ({ usage: 5, quota: 50 }),
    };
    const risky = await makeStore(new IDBFactory(), { storage }).storageStatus();
    expect(risky).toMatchObject({
      usageBytes: 5,
      quotaBytes: 50,
      persisted: false,
      installed: false,
      evictionRisk: true,
    });
    expect(risky.warning).toMatch(/Install Grainline/);
    const installed = await makeStore(new IDBFactory(), {
      storage,
      isInstalled: () => true,
    }).storageStatus();
    expect(installed.evictionRisk).toBe(false);
    const persisted = await makeStore(new IDBFactory(), {
      storage: { persisted: async () => true },
    }).storageStatus();
    expect(persisted).toMatchObject({ evictionRisk: false, warning: null, usageBytes: null });
  });
});

describe('database layout', () => {
  it('has the five stores and the indexes the map and list use', async () => {
    const store = makeStore();
    const own = await store.database();
    expect(own.name).toBe(DB_NAME);
    expect([...own.objectStoreNames].sort()).toEqual([
      'photos',
      'quarantine',
      'revisions',
      'settings',
      'surveys',
    ]);
    const tx = own.transaction(['surveys', 'revisions'], 'readonly');
    expect([...tx.objectStore('surveys').indexNames].sort()).toEqual([
      'cell',
      'outcome',
      'updatedAt',
    ]);
    expect([...tx.objectStore('revisions').indexNames].sort()).toEqual([
      'surveyId',
      'surveyRevision',
    ]);
    await tx.done;
  });
});
