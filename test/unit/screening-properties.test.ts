// Properties of screen() with fast-check (general-purpose property-testing library): more
// shaking, more residual drift, more uplift or a worse observation never lowers the damage
// state or the posting; the result is never below what was observed; odd or missing inputs
// never crash it and never put NaN or Infinity in the result.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { emptySurvey } from '../../forms/schema/index.js';
import {
  CHECKLIST_RULES,
  WALL_UNIT_VALUES,
  damageStateRank,
  postingRank,
  screen,
} from '../../calc/index.js';
import type {
  ChecklistEntry,
  ChecklistItem,
  ScreeningResult,
  StoreyInput,
  SurveyInput,
  WallInput,
  WallType,
} from '../../calc/index.js';

// From calc's own tables, so a new item or sheathing type is covered without editing here.
const ITEMS = Object.keys(CHECKLIST_RULES) as ChecklistItem[];
const SHEAR_TYPES = Object.keys(WALL_UNIT_VALUES) as WallType[];

function wallOf(
  storey: number,
  direction: 'x' | 'y',
  k: number,
  type: WallType,
  lengthM: number,
  positionM: number,
): WallInput {
  return {
    id: `w${storey}${direction}${k}`,
    storey,
    direction,
    type,
    lengthM,
    heightM: null,
    positionM,
    connectors: null,
    rocking: null,
    devices: [],
    userUnitShearNPerM: null,
    userUnitStiffnessNPerM2: null,
  };
}

/** Plausible light-frame surveys of 1–3 storeys without rocking walls. */
const surveyArb: fc.Arbitrary<SurveyInput> = fc
  .record({
    n: fc.integer({ min: 1, max: 3 }),
    h: fc.double({ min: 2.4, max: 3.2, noNaN: true }),
    px: fc.double({ min: 6, max: 20, noNaN: true }),
    py: fc.double({ min: 6, max: 15, noNaN: true }),
    walls: fc.array(
      fc.record({
        type: fc.constantFrom(...SHEAR_TYPES),
        share: fc.double({ min: 0.1, max: 1, noNaN: true }),
        at: fc.constantFrom(0, 0.5, 1),
      }),
      { minLength: 2, maxLength: 6 },
    ),
    code: fc.constantFrom('pre-code', 'low', 'moderate', 'high', 'unknown' as const),
    ag: fc.double({ min: 0.02, max: 0.6, noNaN: true }),
    ground: fc.constantFrom('A', 'B', 'C', 'D', 'E' as const),
  })
  .map(({ n, h, px, py, walls, code, ag, ground }) => {
    const storeys: StoreyInput[] = Array.from({ length: n }, (_, i) => ({
      heightM: h,
      floorAreaM2: px * py,
      floorConstruction: i === 0 ? 'on-grade' : 'light-timber',
      unitWeightPa: null,
    }));
    const list: WallInput[] = [];
    for (let s = 0; s < n; s++) {
      for (const d of ['x', 'y'] as const) {
        walls.forEach((w, k) => {
          const span = d === 'x' ? px : py;
          list.push(
            wallOf(s, d, k, w.type, Math.max(0.5, span * w.share), w.at * (d === 'x' ? py : px)),
          );
        });
      }
    }
    return {
      building: {
        system: 'light-frame',
        codeLevel: code,
        occupancy: 'single-family',
        planXM: px,
        planYM: py,
        storeys,
        roofConstruction: 'light',
        roofUnitWeightPa: null,
      },
      walls: list,
      observations: { uplift: [], residualDrift: [], checklist: [], notes: '' },
      hazard: { kind: 'ec8', type: 1, ground, ag },
      measured: null,
    } satisfies SurveyInput;
  });

const checklistArb: fc.Arbitrary<ChecklistEntry[]> = fc.uniqueArray(
  fc.record({
    item: fc.constantFrom(...ITEMS),
    severity: fc.constantFrom('minor' as const, 'severe' as const),
  }),
  { selector: (e) => e.item, maxLength: 4 },
);

function notLower(a: ScreeningResult, b: ScreeningResult): void {
  expect(damageStateRank(b.damageState)).toBeGreaterThanOrEqual(damageStateRank(a.damageState));
  expect(postingRank(b.posting.level)).toBeGreaterThanOrEqual(postingRank(a.posting.level));
}

const drift = (storey: number, ratio: number) => ({
  storey,
  direction: 'x' as const,
  ratio,
  method: 'offset' as const,
  offsetM: null,
  overHeightM: null,
  tiltRad: null,
  uncertainty: null,
});

describe('screen() properties', () => {
  it('never lowers the state or the posting when the shaking grows (fast-check)', () => {
    fc.assert(
      fc.property(surveyArb, fc.double({ min: 1, max: 4, noNaN: true }), (s, k) => {
        const hazard = s.hazard as { kind: 'ec8'; type: 1; ground: 'B'; ag: number };
        const more = { ...s, hazard: { ...hazard, ag: Math.min(1.5, hazard.ag * k) } };
        notLower(screen(s), screen(more));
      }),
      { numRuns: 150 },
    );
  });

  it('never lowers the state or the posting when a residual drift grows (fast-check)', () => {
    fc.assert(
      fc.property(
        surveyArb,
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        (s, a, b) => {
          const [lo, hi] = a <= b ? [a, b] : [b, a];
          const with1 = {
            ...s,
            observations: { ...s.observations, residualDrift: [drift(0, lo)] },
          };
          const with2 = {
            ...s,
            observations: { ...s.observations, residualDrift: [drift(0, hi)] },
          };
          notLower(screen(with1), screen(with2));
        },
      ),
      { numRuns: 150 },
    );
  });

  it('never lowers the state when an uplift gap grows, under a shear wall or a rocking wall (fast-check)', () => {
    const rockingWall: WallInput = {
      ...wallOf(0, 'x', 9, 'rocking', 1.2, 0),
      id: 'R1',
      heightM: 3,
      rocking: { thicknessM: 0.16, selfWeightN: 2400, gravityLoadN: 60_000, postTensionN: 0 },
      connectors: {
        holdDownCount: 2,
        holdDownCapacityN: 40_000,
        holdDownStiffnessNPerM: null,
        bracketCount: null,
        bracketCapacityN: null,
        bracketStiffnessNPerM: null,
      },
    };
    fc.assert(
      fc.property(
        surveyArb,
        fc.boolean(),
        fc.double({ min: 0, max: 0.4, noNaN: true }),
        fc.double({ min: 0, max: 0.4, noNaN: true }),
        (s, rocking, a, b) => {
          const [lo, hi] = a <= b ? [a, b] : [b, a];
          const base = rocking ? { ...s, walls: [...s.walls, rockingWall] } : s;
          const id = rocking ? 'R1' : s.walls[0]!.id;
          const at = (gapM: number) => ({
            ...base,
            observations: { ...base.observations, uplift: [{ wallId: id, gapM }] },
          });
          const opts = { rockingTimeHistory: false };
          const r1 = screen(at(lo), opts);
          const r2 = screen(at(hi), opts);
          notLower(r1, r2);
          expect(damageStateRank(r2.damage.observed)).toBeGreaterThanOrEqual(
            damageStateRank(r1.damage.observed),
          );
        },
      ),
      { numRuns: 120 },
    );
  });

  it('never lowers the state or the posting for a worse observation: a severity raised or an item added (fast-check)', () => {
    fc.assert(
      fc.property(
        surveyArb,
        checklistArb,
        fc.constantFrom(...ITEMS),
        fc.nat(),
        (s, list, extra, which) => {
          const at = (checklist: ChecklistEntry[]) =>
            screen({ ...s, observations: { ...s.observations, checklist } });
          const before = at(list);
          const worse =
            list.length > 0 && which % 2 === 0
              ? list.map((e, i) =>
                  i === which % list.length ? { ...e, severity: 'severe' as const } : e,
                )
              : [
                  ...list.filter((e) => e.item !== extra),
                  { item: extra, severity: 'severe' as const },
                ];
          notLower(before, at(worse));
        },
      ),
      { numRuns: 150 },
    );
  });

  it('never gives a state below any observed item, whatever is predicted (fast-check)', () => {
    fc.assert(
      fc.property(
        surveyArb,
        checklistArb,
        fc.array(fc.double({ min: 0, max: 0.05, noNaN: true }), { maxLength: 2 }),
        fc.boolean(),
        (s, checklist, ratios, noHazard) => {
          const r = screen({
            ...s,
            hazard: noHazard ? null : s.hazard,
            observations: {
              ...s.observations,
              checklist,
              residualDrift: ratios.map((x) => drift(0, x)),
            },
          });
          for (const item of r.evidence.observed) {
            expect(damageStateRank(r.damageState)).toBeGreaterThanOrEqual(
              damageStateRank(item.state ?? 'none'),
            );
          }
          expect(damageStateRank(r.damageState)).toBeGreaterThanOrEqual(
            damageStateRank(r.damage.observed),
          );
          if (r.damage.predicted !== null) {
            expect(damageStateRank(r.damageState)).toBeGreaterThanOrEqual(
              damageStateRank(r.damage.predicted),
            );
          }
        },
      ),
      { numRuns: 150 },
    );
  });
});

/** Every non-finite number in a value, with its path. */
function badNumbers(value: unknown, path = '$', out: string[] = []): string[] {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) out.push(`${path} = ${value}`);
  } else if (Array.isArray(value)) value.forEach((v, i) => badNumbers(v, `${path}[${i}]`, out));
  else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) badNumbers(v, `${path}.${k}`, out);
  }
  return out;
}

// Numbers as a broken form or file might deliver them when validation is bypassed.
const wild = fc.oneof(
  { weight: 5, arbitrary: fc.double({ min: 0.01, max: 100, noNaN: true }) },
  { weight: 1, arbitrary: fc.constantFrom(0, -1, NaN, Infinity, -Infinity, 1e-300, 1e300) },
);

describe('screen() on odd inputs', () => {
  it('does not crash on NaN, Infinity, negative or absurd numbers anywhere, and returns plain JSON (fast-check)', () => {
    fc.assert(
      fc.property(
        surveyArb,
        fc.record({
          h: wild,
          area: wild,
          len: wild,
          pos: wild,
          ratio: wild,
          gap: wild,
          ag: wild,
          f: wild,
        }),
        fc.boolean(),
        (s, w, rocking) => {
          const walls: WallInput[] = s.walls.map((x, i) =>
            i === 0
              ? { ...x, lengthM: w.len, positionM: w.pos, type: rocking ? 'rocking' : x.type }
              : x,
          );
          const odd: SurveyInput = {
            ...s,
            building: {
              ...s.building,
              planXM: w.pos,
              storeys: s.building.storeys.map((st, i) =>
                i === 0 ? { ...st, heightM: w.h, floorAreaM2: w.area } : st,
              ),
            },
            walls,
            observations: {
              uplift: [{ wallId: walls[0]!.id, gapM: w.gap }],
              residualDrift: [drift(0, w.ratio)],
              checklist: [],
              notes: '',
            },
            hazard: { kind: 'ec8', type: 1, ground: 'B', ag: w.ag },
            measured: { frequencyHz: w.f, dampingRatio: null, confidence: 0.5, direction: null },
          };
          const r = screen(odd, { rockingTimeHistory: false });
          expect(badNumbers(r)).toEqual([]);
          expect(JSON.parse(JSON.stringify(r))).toEqual(r);
          expect(r.resultVersion).toBe(1);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('does not crash on a survey with nothing entered: no storeys, walls, hazard or observations', () => {
    // The record the app starts every new survey with.
    const r = screen(emptySurvey('test-device', new Date(0)));
    expect(r.damageState).toBe('none');
    expect(r.confidence.level).toBe('low');
    expect(r.missingInputs.length).toBeGreaterThan(0);
    expect(r.confidence.defaulted.join(' ')).toMatch(/pre-code/);
  });

  it('throws a RangeError for something that is not a survey at all (a programmer error)', () => {
    expect(() => screen(null as unknown as SurveyInput)).toThrow(RangeError);
    expect(() => screen({} as SurveyInput)).toThrow(/building/);
  });
});
