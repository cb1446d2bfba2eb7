import 'fake-indexeddb/auto';
import fc from 'fast-check';
import { IDBFactory } from 'fake-indexeddb';
import { describe, expect, it } from 'vitest';
import { validateRecord } from '../../forms/schema/index.js';
import { SurveyStore } from '../../web/storage/index.js';
import { brokenRecordArb, garbageArb, surveyRecordArb } from '../fixtures/records/arbitrary.js';

function makeStore(): SurveyStore {
  return new SurveyStore({
    indexedDB: new IDBFactory(),
    storage: null,
    isInstalled: () => false,
    broadcast: false,
  });
}

describe('property: storage round trip', () => {
  it('stores random valid records and reads them back unchanged, current and revisions', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.uniqueArray(surveyRecordArb, { maxLength: 5, selector: (r) => r.id }),
        async (records) => {
          const store = makeStore();
          try {
            await store.writeRevisions(records);
            for (const r of records) {
              expect(await store.getSurvey(r.id)).toEqual(r);
              const revs = await store.getRevisions(r.id);
              expect(revs.map((e) => e.record)).toEqual([r]);
            }
            const listed = await store.listSurveys();
            expect(listed).toHaveLength(records.length);
            expect(await store.countQuarantined()).toBe(0);
          } finally {
            store.close();
          }
        },
      ),
      { numRuns: 60 },
    );
  });

  it('saves a random valid record as a draft and returns exactly it, renumbered', async () => {
    await fc.assert(
      fc.asyncProperty(surveyRecordArb, async (record) => {
        const store = makeStore();
        try {
          const outcome = await store.saveDraft(record, { baseRevision: 0 });
          if (outcome.status !== 'saved') throw new Error('conflict on an empty store');
          expect(outcome.record).toEqual({
            ...record,
            revision: 1,
            updatedAt: outcome.record.updatedAt,
          });
          expect(await store.getSurvey(record.id)).toEqual(outcome.record);
        } finally {
          store.close();
        }
      }),
      { numRuns: 60 },
    );
  });
});

describe('property: garbage never corrupts good records', () => {
  it('keeps every good record intact and every bad row in quarantine, whatever is mixed in', async () => {
    const badRow = fc.oneof(
      // A damaged envelope around anything at all.
      garbageArb.map((g) => ({ revision: 1, record: g })),
      // A proper envelope around a record with one thing broken.
      brokenRecordArb.map((b) => ({ revision: 1, record: b })),
      // Any object whatsoever (its own `id` is replaced by the store key).
      fc.dictionary(fc.string({ maxLength: 5 }), garbageArb, { maxKeys: 4 }),
    );
    await fc.assert(
      fc.asyncProperty(
        fc.uniqueArray(surveyRecordArb, { minLength: 1, maxLength: 3, selector: (r) => r.id }),
        fc.array(badRow, { minLength: 1, maxLength: 6 }),
        async (good, bad) => {
          const store = makeStore();
          try {
            await store.writeRevisions(good);
            const db = await store.database();
            const rows = bad.map((b, i) => ({ ...(b as object), id: `bad-${i}` }));
            // Rows that happen to be valid are fine too; count the ones that are not.
            const invalid = rows.filter((row) => {
              const rec = (row as { record?: unknown }).record;
              const v = validateRecord(rec);
              return !(
                v.ok &&
                v.record.id === row.id &&
                (row as { revision?: unknown }).revision === v.record.revision
              );
            });
            const tx = db.transaction('surveys', 'readwrite');
            for (const row of rows) await tx.store.put(row as never);
            await tx.done;

            const listed = await store.listSurveys();
            for (const g of good) expect(listed.find((r) => r.id === g.id)).toEqual(g);
            expect(listed).toHaveLength(good.length + rows.length - invalid.length);
            const q = await store.listQuarantined();
            expect(q).toHaveLength(invalid.length);
            for (const row of invalid)
              expect(q.find((e) => e.sourceKey === row.id)?.raw).toEqual(row);
            // And the good ones' history is untouched.
            for (const g of good)
              expect((await store.getRevisions(g.id)).map((e) => e.record)).toEqual([g]);
          } finally {
            store.close();
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});
