// No NaN (or Infinity) ever leaves the calculation core, whatever the survey holds.
// Property tests with fast-check (general-purpose property-testing library from the registry).
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  buildingResponse,
  empiricalPeriod,
  empiricalPeriodRange,
  upperLimitCoefficient,
} from '../../calc/index.js';
import type { SpectrumSpec, StoreyInput, SurveyInput, WallInput } from '../../calc/index.js';

/** Every number reachable in a value, with its path. */
function badNumbers(value: unknown, path = '$', out: string[] = []): string[] {
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) out.push(`${path} = ${value}`);
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => badNumbers(v, `${path}[${i}]`, out));
  } else if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) badNumbers(v, `${path}.${k}`, out);
  }
  return out;
}

// Numbers as a form might deliver them when validation is bypassed: good, odd and broken.
const wild = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: 0.01, max: 200, noNaN: true }) },
  { weight: 1, arbitrary: fc.constantFrom(0, -1, NaN, Infinity, -Infinity, 1e-300, 1e300) },
);
const maybe = <T>(a: fc.Arbitrary<T>) => fc.option(a, { nil: null, freq: 4 });

const storeyArb: fc.Arbitrary<StoreyInput> = fc.record({
  heightM: wild,
  floorAreaM2: wild,
  floorConstruction: fc.constantFrom('light-timber', 'timber-concrete', 'clt', 'on-grade'),
  unitWeightPa: maybe(fc.oneof(fc.double({ min: 0, max: 5000, noNaN: true }), wild)),
});

const wallArb = (nStoreys: number): fc.Arbitrary<WallInput> =>
  fc.record({
    id: fc.string({ maxLength: 4 }),
    storey: fc.oneof(
      fc.integer({ min: 0, max: Math.max(0, nStoreys - 1) }),
      fc.constantFrom(-1, 99, 0.5),
    ),
    direction: fc.constantFrom('x' as const, 'y' as const),
    type: fc.constantFrom(
      'wsp-150',
      'wsp-100',
      'wsp-75',
      'wsp-50',
      'gypsum',
      'diagonal-boards',
      'unsheathed',
      'clt-bracketed',
      'rocking',
      'user',
    ),
    lengthM: wild,
    heightM: maybe(wild),
    positionM: maybe(fc.oneof(fc.double({ min: -5, max: 40, noNaN: true }), wild)),
    connectors: maybe(
      fc.record({
        holdDownCount: maybe(fc.integer({ min: 0, max: 6 })),
        holdDownCapacityN: maybe(fc.oneof(fc.double({ min: 0, max: 2e5, noNaN: true }), wild)),
        holdDownStiffnessNPerM: maybe(fc.double({ min: 0, max: 2e7, noNaN: true })),
        bracketCount: maybe(fc.integer({ min: 0, max: 10 })),
        bracketCapacityN: maybe(fc.double({ min: 0, max: 1e5, noNaN: true })),
        bracketStiffnessNPerM: maybe(wild),
      }),
    ),
    rocking: fc.constant(null),
    devices: fc.constantFrom([], ['viscous-damper' as const]),
    userUnitShearNPerM: maybe(fc.oneof(fc.double({ min: 0, max: 3e4, noNaN: true }), wild)),
    userUnitStiffnessNPerM2: maybe(fc.oneof(fc.double({ min: 0, max: 5e6, noNaN: true }), wild)),
  });

const g = fc.double({ min: 0, max: 2, noNaN: true });
const hazardArb: fc.Arbitrary<SpectrumSpec | null> = fc.oneof(
  fc.constant(null),
  fc.record({
    kind: fc.constant('ec8' as const),
    type: fc.constantFrom(1 as const, 2 as const),
    ground: fc.constantFrom('A' as const, 'B' as const, 'C' as const, 'D' as const, 'E' as const),
    ag: fc.oneof(g, wild),
    damping: fc.option(fc.double({ min: 0, max: 0.5, noNaN: true }), { nil: undefined }),
  }),
  fc.record({ kind: fc.constant('asce7' as const), SDS: fc.oneof(g, wild), SD1: g, TL: wild }),
  fc.record({ kind: fc.constant('event' as const), pga: g, sa03: g, sa10: fc.oneof(g, wild) }),
);

const surveyArb: fc.Arbitrary<SurveyInput> = fc
  .array(storeyArb, { minLength: 0, maxLength: 8 })
  .chain((storeys) =>
    fc.record({
      building: fc.record({
        system: fc.constant('light-frame' as const),
        codeLevel: fc.constant('unknown' as const),
        occupancy: fc.constant('multi-family' as const),
        planXM: maybe(wild),
        planYM: maybe(wild),
        storeys: fc.constant(storeys),
        roofConstruction: fc.constantFrom('light', 'heavy-tile', 'clt', 'green'),
        roofUnitWeightPa: maybe(wild),
      }),
      walls: fc.array(wallArb(storeys.length), { maxLength: 16 }),
      observations: fc.constant({ uplift: [], residualDrift: [], checklist: [], notes: '' }),
      hazard: hazardArb,
      measured: maybe(
        fc.record({
          frequencyHz: wild,
          dampingRatio: fc.constant(null),
          confidence: fc.double({ min: 0, max: 1, noNaN: true }),
          direction: fc.constantFrom('x' as const, 'y' as const, null),
        }),
      ),
    }),
  );

describe('buildingResponse with any survey (fast-check)', () => {
  it('never throws and never returns NaN or Infinity anywhere in its result', () => {
    fc.assert(
      fc.property(surveyArb, (s) => {
        const r = buildingResponse(s);
        expect(badNumbers(r).join('; ')).toBe('');
      }),
      { numRuns: 1500 },
    );
  });
  it('lists an assumption source for every assumption and survives a JSON round trip unchanged', () => {
    fc.assert(
      fc.property(surveyArb, (s) => {
        const r = buildingResponse(s);
        for (const a of r.assumptions) expect(a.source.length).toBeGreaterThan(0);
        expect(JSON.parse(JSON.stringify(r))).toEqual(r);
      }),
      { numRuns: 300 },
    );
  });
});

describe('buildingResponse on counterexamples fast-check once found', () => {
  it('does not pass Infinity on when a wall strength is vanishingly small (9e-323 N/m)', () => {
    const s = JSON.parse(
      readFileSync(
        new URL('../fixtures/calc/subnormal-wall-strength.json', import.meta.url),
        'utf8',
      ),
    ) as SurveyInput;
    const r = buildingResponse(s);
    expect(badNumbers(r)).toEqual([]);
    expect(r.x.demandToCapacity?.[0]).toBeNull();
    expect(
      r.missingInputs.some((m) => m.problem === 'invalid' && m.field === 'storeys[0].walls.x'),
    ).toBe(true);
  });
});

describe('period helpers with any number (fast-check)', () => {
  it('empiricalPeriod returns a finite period > 0 or throws a RangeError', () => {
    fc.assert(
      fc.property(fc.double(), fc.constantFrom('ec8' as const, 'asce7' as const), (h, m) => {
        try {
          const T = empiricalPeriod(h, m);
          empiricalPeriodRange(h, m);
          return Number.isFinite(T) && T > 0;
        } catch (e) {
          return e instanceof RangeError && !(Number.isFinite(h) && h > 0);
        }
      }),
      { numRuns: 2000 },
    );
  });
  it('upperLimitCoefficient stays within [1.4, 1.7] for any SD1 ≥ 0', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e6, noNaN: true }), (sd1) => {
        const cu = upperLimitCoefficient(sd1);
        return cu >= 1.4 && cu <= 1.7;
      }),
    );
  });
});
