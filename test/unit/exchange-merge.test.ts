/**
 * The merge policy (web/exchange/merge-plan.ts), decided before anything is written:
 * duplicates removed by id, every revision kept, the newest current, conflicts kept side by
 * side, nothing stored changed.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { SurveyRecord } from '../../forms/index.js';
import { planMerge, type ExistingSurvey } from '../../web/exchange/merge-plan.js';
import { surveyRecordArb } from '../fixtures/records/arbitrary.js';
import { makeTown } from '../fixtures/exchange/town.js';

const rev = (
  r: SurveyRecord,
  revision: number,
  over: Partial<SurveyRecord> = {},
): SurveyRecord => ({
  ...r,
  revision,
  ...over,
});

function held(...records: SurveyRecord[]): Map<string, ExistingSurvey> {
  const m = new Map<string, ExistingSurvey>();
  for (const r of records) {
    const e = m.get(r.id) ?? { revisions: [], conflicts: [] };
    m.set(r.id, { ...e, revisions: [...e.revisions, r] });
  }
  return m;
}

describe('merge plan', () => {
  it('adds every survey of an empty device', () => {
    const town = makeTown(20, { seed: 1 });
    const plan = planMerge(town, new Map());
    expect(plan.revisions).toEqual(town);
    expect(plan.newSurveys).toEqual(town.map((r) => r.id));
    expect(plan.conflicts).toEqual([]);
    expect(plan.duplicates).toBe(0);
  });

  it('removes duplicates by survey id and revision, within a file and against the device', () => {
    const town = makeTown(10, { seed: 2 });
    const plan = planMerge([...town, ...town], held(...town.slice(0, 4)));
    expect(plan.revisions).toEqual(town.slice(4));
    expect(plan.duplicates).toBe(4 + 10);
  });

  it('counts the same content with keys in another order as a duplicate', () => {
    const [r] = makeTown(1, { seed: 3 }) as [SurveyRecord];
    const reordered = JSON.parse(
      JSON.stringify(Object.fromEntries(Object.entries(r).reverse())),
    ) as SurveyRecord;
    const plan = planMerge([reordered], held(r));
    expect(plan.duplicates).toBe(1);
    expect(plan.revisions).toEqual([]);
  });

  it('does not take a survey exported twice from one device for a conflict (lastExportedAt)', () => {
    const [r] = makeTown(1, { seed: 8 }) as [SurveyRecord];
    const markedOnDevice = { ...r, lastExportedAt: '2031-05-14T18:00:00.000Z' };
    const plan = planMerge([r], held(markedOnDevice));
    expect(plan.conflicts).toEqual([]);
    expect(plan.duplicates).toBe(1);
    // Any other difference is still a conflict.
    expect(planMerge([{ ...r, team: 'other' }], held(markedOnDevice)).conflicts).toHaveLength(1);
  });

  it('keeps every revision of a survey, and makes the newest current', () => {
    const [base] = makeTown(1, { seed: 4 }) as [SurveyRecord];
    const r3 = rev(base, 3, { address: 'third' });
    const r5 = rev(base, 5, { address: 'fifth' });
    const r4 = rev(base, 4, { address: 'fourth' });
    const plan = planMerge([r5, r4], held(r3));
    expect(plan.revisions).toEqual([r5, r4]);
    expect(plan.newerCurrent).toEqual([base.id]);
    expect(plan.newSurveys).toEqual([]);
  });

  it('fills in older revisions without changing which one is current', () => {
    const [base] = makeTown(1, { seed: 5 }) as [SurveyRecord];
    const plan = planMerge([rev(base, 2), rev(base, 1)], held(rev(base, 7)));
    expect(plan.revisions.map((r) => r.revision)).toEqual([2, 1]);
    expect(plan.newerCurrent).toEqual([]);
  });

  it('keeps the same revision with other content beside the stored one and flags it', () => {
    const [base] = makeTown(1, { seed: 6 }) as [SurveyRecord];
    const mine = rev(base, 4, { inspector: 'R. Amsel' });
    const theirs = rev(base, 4, { inspector: 'J. Kestrel' });
    const plan = planMerge([theirs], held(mine));
    expect(plan.revisions).toEqual([]);
    expect(plan.conflicts).toEqual([{ record: theirs, holder: mine }]);
    // Importing the same variant again adds nothing new.
    const again = planMerge(
      [theirs],
      new Map([[base.id, { revisions: [mine], conflicts: [theirs] }]]),
    );
    expect(again.conflicts).toEqual([]);
    expect(again.duplicates).toBe(1);
  });

  it('keeps conflicting copies that arrive in the same import, the first holding the slot', () => {
    const [base] = makeTown(1, { seed: 7 }) as [SurveyRecord];
    const a = rev(base, 2, { team: 'A' });
    const b = rev(base, 2, { team: 'B' });
    const c = rev(base, 2, { team: 'C' });
    const plan = planMerge([a, b, c, b], new Map());
    expect(plan.revisions).toEqual([a]);
    expect(plan.conflicts).toEqual([
      { record: b, holder: a },
      { record: c, holder: a },
    ]);
    expect(plan.duplicates).toBe(1);
  });

  it('never plans to write a revision the device already holds (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(surveyRecordArb, { minLength: 1, maxLength: 6 }),
        fc.array(fc.nat(), { maxLength: 8 }),
        fc.array(fc.integer({ min: 1, max: 4 }), { maxLength: 8 }),
        (records, picks, revisions) => {
          // Build a device and an import that overlap: same ids, some same revisions.
          const stored = records.map((r, i) => rev(r, 1 + (i % 3)));
          const incoming = picks.map((p, i) => {
            const r = records[p % records.length]!;
            return rev(r, revisions[i] ?? 1, i % 2 === 0 ? {} : { address: `changed ${i}` });
          });
          const device = held(...stored);
          const plan = planMerge(incoming, device);
          const storedKeys = new Set(stored.map((r) => `${r.id}#${r.revision}`));
          for (const w of plan.revisions)
            expect(storedKeys.has(`${w.id}#${w.revision}`)).toBe(false);
          const written = plan.revisions.map((w) => `${w.id}#${w.revision}`);
          expect(new Set(written).size).toBe(written.length);
          // Every incoming record is accounted for exactly once.
          expect(plan.revisions.length + plan.conflicts.length + plan.duplicates).toBe(
            incoming.length,
          );
        },
      ),
      { numRuns: 200 },
    );
  });
});
