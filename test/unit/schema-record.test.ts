import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  clearUnparsed,
  confirmField,
  emptySurvey,
  keepUnparsed,
  markUnconfirmed,
  messagesAt,
  messagesByField,
  parseStoredRecord,
  screeningGaps,
  shiftPathsAfterRemoval,
  surveyRecordSchema,
  validateRecord,
  type SurveyRecord,
} from '../../forms/schema/index.js';
import { isJsonValue } from '../../forms/schema/json-value.js';
import { brokenRecordArb, garbageArb, surveyRecordArb } from '../fixtures/records/arbitrary.js';
import v2 from '../fixtures/records/v2-three-storey-clt.json' with { type: 'json' };

const NOW = new Date('2025-01-02T03:04:05.000Z');

function fixture(): SurveyRecord {
  const r = validateRecord(structuredClone(v2));
  if (!r.ok) throw new Error(JSON.stringify(r.messages));
  return r.record;
}

function withStorey(record: SurveyRecord, patch: Record<string, unknown>): unknown {
  const copy = structuredClone(record) as unknown as { building: { storeys: unknown[] } };
  copy.building.storeys[0] = { ...(copy.building.storeys[0] as object), ...patch };
  return copy;
}

describe('emptySurvey', () => {
  it('makes a draft that is valid to store with nothing entered', () => {
    const draft = emptySurvey('device-1', NOW);
    expect(validateRecord(draft).ok).toBe(true);
    expect(draft.createdAt).toBe('2025-01-02T03:04:05.000Z');
    expect(draft.building.storeys).toEqual([]);
  });

  it('lists the defaulted building fields as unconfirmed rather than passing them off as answers', () => {
    const draft = emptySurvey('device-1', NOW);
    expect(draft.unconfirmed).toEqual([
      'building.system',
      'building.codeLevel',
      'building.occupancy',
      'building.roofConstruction',
    ]);
  });

  it('gives each new draft its own identifier', () => {
    expect(emptySurvey('d', NOW).id).not.toBe(emptySurvey('d', NOW).id);
  });

  it('throws with the bad value when called with an invalid date or device id', () => {
    expect(() => emptySurvey('d', new Date('nope'))).toThrow(/Invalid Date/);
    expect(() => emptySurvey('', NOW)).toThrow(/deviceId must be a non-empty string, got ""/);
  });
});

describe('validation messages', () => {
  it('says "Storey height must be more than 0 m." at the storey height field', () => {
    const r = validateRecord(withStorey(fixture(), { heightM: 0 }));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(messagesAt(r.messages, 'building.storeys.0.heightM')).toEqual([
      'Storey height must be more than 0 m.',
    ]);
  });

  it('names the unit and the limit for an implausibly large value', () => {
    const r = validateRecord(withStorey(fixture(), { floorAreaM2: 2e6 }));
    if (r.ok) throw new Error('expected failure');
    expect(messagesAt(r.messages, 'building.storeys.0.floorAreaM2')).toEqual([
      'Floor area must be at most 100000 m².',
    ]);
  });

  it('asks for a number in the field unit when text or NaN is stored', () => {
    const r = validateRecord(withStorey(fixture(), { heightM: '2.7', unitWeightPa: NaN }));
    if (r.ok) throw new Error('expected failure');
    const byField = messagesByField(
      surveyRecordSchema.safeParse(withStorey(fixture(), { heightM: '2.7', unitWeightPa: NaN }))
        .error?.issues ?? [],
    );
    expect(byField.get('building.storeys.0.heightM')).toEqual([
      'Storey height must be a number in m.',
    ]);
    expect(byField.get('building.storeys.0.unitWeightPa')).toEqual([
      'Floor unit weight must be a number in Pa.',
    ]);
  });

  it('explains a drift ratio limit as a ratio', () => {
    const rec = structuredClone(fixture()) as SurveyRecord;
    (rec.observations.residualDrift[0] as { ratio: number }).ratio = 0.8;
    const r = validateRecord(rec);
    if (r.ok) throw new Error('expected failure');
    expect(messagesAt(r.messages, 'observations.residualDrift.0.ratio')).toEqual([
      'Residual drift must be at most 0.5 (a ratio: 0.01 = 1 %).',
    ]);
  });

  it('reports an unknown choice, a bad date and an unknown field as plain sentences', () => {
    const rec = structuredClone(fixture()) as unknown as Record<string, unknown>;
    (rec['building'] as Record<string, unknown>)['system'] = 'steel';
    rec['createdAt'] = 'yesterday';
    rec['colour'] = 'blue';
    const r = validateRecord(rec);
    if (r.ok) throw new Error('expected failure');
    expect(messagesAt(r.messages, 'building.system')).toEqual([
      'Structural system: choose one of the options offered.',
    ]);
    expect(messagesAt(r.messages, 'createdAt')).toEqual([
      'Creation time must be a date and time in UTC, such as 2024-05-01T14:30:00Z.',
    ]);
    expect(r.messages.find((m) => m.path === '')?.message).toBe(
      'The record holds fields this version of the app does not know: colour.',
    );
  });

  it('reports a non-JSON result at the result field', () => {
    const rec = structuredClone(fixture()) as SurveyRecord;
    (rec.result as { result: unknown }).result = { when: new Date(0) };
    const r = validateRecord(rec);
    if (r.ok) throw new Error('expected failure');
    expect(messagesAt(r.messages, 'result.result')).toEqual([
      'Screening result data must be plain data (text, finite numbers, yes/no, lists and groups).',
    ]);
  });

  it('ends every message with a full stop and never leaks zod wording', () => {
    fc.assert(
      fc.property(brokenRecordArb, (value) => {
        const r = validateRecord(value);
        if (r.ok) return;
        for (const m of r.messages) {
          expect(m.message).toMatch(/[.]$/);
          expect(m.message).not.toMatch(/Invalid input|\bexpected\b|\breceived\b/);
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe('JSON parts are kept exactly', () => {
  it('keeps an own "__proto__" key in result data and in unparsed text', () => {
    const rec = structuredClone(fixture());
    const result = JSON.parse('{"__proto__": {"x": 1}, "posting": "p"}') as unknown;
    (rec.result as { result: unknown }).result = result;
    rec.unparsed = JSON.parse('{"__proto__": "typed"}') as Record<string, string>;
    const r = validateRecord(rec);
    if (!r.ok) throw new Error(JSON.stringify(r.messages));
    expect(Object.keys(r.record.result?.result as object)).toEqual(['__proto__', 'posting']);
    expect(Object.keys(r.record.unparsed)).toEqual(['__proto__']);
  });

  it('accepts any JSON value and refuses cycles, NaN, holes and class instances', () => {
    fc.assert(fc.property(fc.jsonValue(), (v) => isJsonValue(v)));
    const cyclic: Record<string, unknown> = {};
    cyclic['self'] = cyclic;
    expect(isJsonValue(cyclic)).toBe(false);
    expect(isJsonValue([1, NaN])).toBe(false);
    // eslint-disable-next-line no-sparse-arrays
    expect(isJsonValue([1, , 2])).toBe(false);
    expect(isJsonValue(new Map())).toBe(false);
    expect(isJsonValue({ a: undefined })).toBe(false);
  });

  it('does not crash on nesting deeper than any stack', () => {
    let deep: unknown = 1;
    for (let i = 0; i < 100_000; i++) deep = [deep];
    expect(isJsonValue(deep)).toBe(false);
  });
});

describe('property: schema', () => {
  it('accepts every generated valid record and returns it unchanged', () => {
    fc.assert(
      fc.property(surveyRecordArb, (record) => {
        const r = validateRecord(record);
        if (!r.ok) throw new Error(JSON.stringify(r.messages));
        expect(r.record).toEqual(record);
      }),
      { numRuns: 300 },
    );
  });

  it('does not crash on garbage: every value parses or fails with messages', () => {
    fc.assert(
      fc.property(fc.oneof(garbageArb, brokenRecordArb), (value) => {
        const r = parseStoredRecord(value);
        if (!r.ok) expect(r.messages.length).toBeGreaterThan(0);
      }),
      { numRuns: 500 },
    );
  });
});

describe('screeningGaps', () => {
  it('lists what an empty draft lacks, as sentences', () => {
    const gaps = screeningGaps(emptySurvey('d', NOW));
    expect(gaps.map((g) => g.message)).toEqual([
      'Confirm structural system: the app filled in this value.',
      'Confirm code era: the app filled in this value.',
      'Confirm occupancy: the app filled in this value.',
      'Confirm roof construction: the app filled in this value.',
      'Add at least one storey.',
      'Choose the hazard: the response spectrum to screen against.',
    ]);
  });

  it('asks for walls along both directions of every storey and for kept text to be fixed', () => {
    const gaps = screeningGaps(fixture());
    expect(gaps.map((g) => g.kind)).toEqual([
      'unparsed',
      'unconfirmed',
      'no-walls',
      'no-walls',
      'no-walls',
      'no-walls',
    ]);
    expect(gaps[0]?.message).toBe('Plan length along x: “24,6,1” is not a valid value yet.');
    expect(gaps[2]?.message).toBe('Storey 2: add at least one wall along x.');
  });

  it('finds walls, uplift and drift readings that point at nothing', () => {
    const rec = fixture();
    rec.walls.push({ ...(rec.walls[0] as SurveyRecord['walls'][number]), storey: 7 });
    rec.observations.uplift.push({ wallId: 'ghost', gapM: 0.001 });
    rec.observations.residualDrift.push({
      ...(rec.observations
        .residualDrift[0] as SurveyRecord['observations']['residualDrift'][number]),
      storey: 9,
    });
    const kinds = screeningGaps(rec).map((g) => g.kind);
    expect(kinds).toContain('wall-on-missing-storey');
    expect(kinds).toContain('duplicate-wall-id');
    expect(kinds).toContain('uplift-unknown-wall');
    expect(kinds).toContain('drift-on-missing-storey');
  });

  it('checks EC8 corner periods the way the calculation fills them (EN 1998-1 Table 3.2 values)', () => {
    const rec = fixture();
    // Type 1, ground C: TB = 0.2 s in Table 3.2, so a typed TC of 0.1 s is out of order.
    rec.hazard = { kind: 'ec8', type: 1, ground: 'C', ag: 0.25, TC: 0.1 };
    expect(screeningGaps(rec).some((g) => g.kind === 'corner-periods-order')).toBe(true);
    rec.hazard = { kind: 'ec8', type: 1, ground: 'C', ag: 0.25, TC: 0.7 };
    expect(screeningGaps(rec).some((g) => g.kind === 'corner-periods-order')).toBe(false);
  });

  it('reports nothing for a complete record', () => {
    const rec = fixture();
    rec.unparsed = {};
    rec.unconfirmed = [];
    for (const storey of [1, 2]) {
      for (const direction of ['x', 'y'] as const) {
        rec.walls.push({
          ...(rec.walls[0] as SurveyRecord['walls'][number]),
          id: `s${storey}${direction}`,
          storey,
          direction,
        });
      }
    }
    expect(screeningGaps(rec)).toEqual([]);
  });
});

describe('draft bookkeeping', () => {
  it('confirms, marks, keeps and clears without touching the argument', () => {
    const draft = emptySurvey('d', NOW);
    const confirmed = confirmField(draft, 'building.system');
    expect(confirmed.unconfirmed).not.toContain('building.system');
    expect(draft.unconfirmed).toContain('building.system');
    expect(markUnconfirmed(confirmed, 'building.system').unconfirmed).toContain('building.system');
    const kept = keepUnparsed(draft, 'building.planXM', '12,5,');
    expect(kept.unparsed).toEqual({ 'building.planXM': '12,5,' });
    expect(validateRecord(kept).ok).toBe(true);
    expect(clearUnparsed(kept, 'building.planXM').unparsed).toEqual({});
  });

  it('renumbers paths after an item is removed from a list', () => {
    expect(
      shiftPathsAfterRemoval(
        [
          'building.storeys.0.heightM',
          'building.storeys.1.heightM',
          'building.storeys.2',
          'walls.1.id',
        ],
        'building.storeys',
        1,
      ),
    ).toEqual(['building.storeys.0.heightM', 'building.storeys.1', 'walls.1.id']);
  });
});
