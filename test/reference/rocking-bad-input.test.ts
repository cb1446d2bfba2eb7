// Bad input gives clear errors and no NaN leaves the rocking API.
// Reference: the project rule (programmer errors throw a RangeError naming the bad value) and the
// domain of the Housner 1963 (BSSA 53(2):403–417) formulas: dimensions > 0, 0 < θ₀ < α.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  G,
  assessRockingWall,
  freeRockingPeriod,
  groundPulse,
  observedRocking,
  pulseOverturningCheck,
  pulsePeriodFromMagnitude,
  rockingBlock,
  rockingDemand,
  rockingTimeHistory,
  rockingWall,
  rockingWallFromInput,
} from '../../calc/index.js';
import type { WallInput } from '../../calc/index.js';

const okWall = {
  widthM: 1.2,
  heightM: 2.7,
  selfWeightN: 13_000,
  gravityLoadN: 0,
  postTensionN: 0,
  holdDownCapacityN: 0,
};

describe('rockingBlock and freeRockingPeriod reject bad dimensions and amplitudes', () => {
  for (const bad of [0, -1, Number.NaN, Infinity]) {
    it(`does not crash on width ${bad}: throws a RangeError naming widthM`, () => {
      expect(() => rockingBlock(bad, 2)).toThrow(RangeError);
      expect(() => rockingBlock(bad, 2)).toThrow(/widthM must be a finite number > 0/);
    });
    it(`does not crash on height ${bad}: throws a RangeError naming heightM`, () => {
      expect(() => rockingBlock(1, bad)).toThrow(/heightM must be a finite number > 0/);
      expect(() => freeRockingPeriod(1, bad, 0.1)).toThrow(/heightM/);
    });
  }
  it('does not crash on θ₀ = α: says the block topples', () => {
    const { alpha } = rockingBlock(0.5, 2);
    expect(() => freeRockingPeriod(0.5, 2, alpha)).toThrow(/theta0 must be < alpha/);
    expect(() => freeRockingPeriod(0.5, 2, 2 * alpha)).toThrow(RangeError);
  });
  it('does not crash on θ₀ ≤ 0 or NaN', () => {
    expect(() => freeRockingPeriod(0.5, 2, 0)).toThrow(/theta0 must be > 0/);
    expect(() => freeRockingPeriod(0.5, 2, -0.1)).toThrow(RangeError);
    expect(() => freeRockingPeriod(0.5, 2, Number.NaN)).toThrow(
      /theta0 must be a finite number, got NaN/,
    );
  });
});

describe('rockingWall rejects bad loads', () => {
  it('does not crash on zero self weight', () => {
    expect(() => rockingWall({ ...okWall, selfWeightN: 0 })).toThrow(
      /selfWeightN must be a finite number > 0, got 0/,
    );
  });
  it('does not crash on negative or NaN loads', () => {
    expect(() => rockingWall({ ...okWall, gravityLoadN: -1 })).toThrow(
      /gravityLoadN must be a finite number ≥ 0, got -1/,
    );
    expect(() => rockingWall({ ...okWall, postTensionN: Number.NaN })).toThrow(/postTensionN/);
    expect(() => rockingWall({ ...okWall, holdDownCapacityN: -5 })).toThrow(/holdDownCapacityN/);
    expect(() => rockingWall({ ...okWall, widthM: 0 })).toThrow(/widthM/);
  });
});

describe('rockingTimeHistory rejects bad arguments', () => {
  const block = rockingBlock(0.5, 2);
  it('does not crash on a zero, negative or NaN duration', () => {
    expect(() => rockingTimeHistory(block, () => 0, 0)).toThrow(
      /durationS must be a finite number > 0/,
    );
    expect(() => rockingTimeHistory(block, () => 0, -1)).toThrow(RangeError);
    expect(() => rockingTimeHistory(block, () => 0, Number.NaN)).toThrow(/got NaN/);
  });
  it('does not crash on a ground motion that returns NaN: names the time', () => {
    expect(() => rockingTimeHistory(block, (t) => (t > 0.5 ? Number.NaN : 0), 1)).toThrow(
      /groundAcceleration\(.+\) must return a finite number, got NaN/,
    );
  });
  it('does not crash on a hand-made block with NaN or out-of-range fields', () => {
    expect(() => rockingTimeHistory({ ...block, alpha: Number.NaN }, () => 0, 1)).toThrow(
      /block.alpha/,
    );
    expect(() => rockingTimeHistory({ ...block, alpha: 2 }, () => 0, 1)).toThrow(
      /block.alpha must be in/,
    );
    expect(() => rockingTimeHistory({ ...block, p: 0 }, () => 0, 1)).toThrow(/block.p/);
    expect(() => rockingTimeHistory({ ...block, restitution: 1.5 }, () => 0, 1)).toThrow(
      /block.restitution/,
    );
  });
  it('does not crash on an initial rotation at or past α', () => {
    expect(() => rockingTimeHistory(block, () => 0, 1, { initialTheta: block.alpha })).toThrow(
      /initialTheta/,
    );
  });
});

describe('the pulse check, the spectral estimate and observed rocking reject bad input', () => {
  const block = rockingBlock(0.5, 2);
  it('does not crash on a NaN or negative PGA, or a missing period', () => {
    expect(() =>
      pulseOverturningCheck(block, { pga: Number.NaN, pulsePeriod: 1, shape: 'sine' }),
    ).toThrow(/pga/);
    expect(() =>
      pulseOverturningCheck(block, { pga: -0.1, pulsePeriod: 1, shape: 'sine' }),
    ).toThrow(/pga/);
    expect(() => pulseOverturningCheck(block, { pga: 0.3, shape: 'sine' })).toThrow(
      /pulsePeriod or magnitude/,
    );
    expect(() => pulseOverturningCheck(block, { pga: 0.3, pulsePeriod: 0, shape: 'sine' })).toThrow(
      /pulsePeriod/,
    );
    expect(() => pulsePeriodFromMagnitude(Number.NaN)).toThrow(/magnitude/);
    expect(() => pulsePeriodFromMagnitude(12)).toThrow(/magnitude must be in/);
    expect(() => groundPulse('sine', 0.3, -1)).toThrow(/periodS/);
  });
  it('does not crash on a spectrum with a NaN ordinate', () => {
    expect(() =>
      rockingDemand(block, { kind: 'ec8', type: 1, ground: 'B', ag: Number.NaN }),
    ).toThrow(RangeError);
  });
  it('does not crash on a negative or NaN uplift gap', () => {
    expect(() => observedRocking(block, -0.01)).toThrow(/upliftGapM must be a finite number ≥ 0/);
    expect(() => observedRocking(block, Number.NaN)).toThrow(/upliftGapM/);
  });
  it('does not crash on a survey wall with zero length: names the wall and field', () => {
    const wall: WallInput = {
      id: 'w7',
      storey: 0,
      direction: 'x',
      type: 'rocking',
      lengthM: 0,
      heightM: null,
      positionM: null,
      connectors: null,
      rocking: null,
      devices: [],
      userUnitShearNPerM: null,
      userUnitStiffnessNPerM2: null,
    };
    expect(() => rockingWallFromInput(wall, 2.7)).toThrow(/wall w7: lengthM/);
    expect(() => rockingWallFromInput({ ...wall, lengthM: 1 }, Number.NaN)).toThrow(
      /storeyHeightM/,
    );
  });
});

/** Every number inside a value (recursively), to check none is NaN. */
function numbersIn(v: unknown, out: number[] = []): number[] {
  if (typeof v === 'number') out.push(v);
  else if (Array.isArray(v)) v.forEach((x) => numbersIn(x, out));
  else if (v && typeof v === 'object') Object.values(v).forEach((x) => numbersIn(x, out));
  return out;
}

describe('no NaN comes out (fast-check properties)', () => {
  const dims = fc.record({
    w: fc.double({ min: 0.05, max: 6, noNaN: true }),
    h: fc.double({ min: 0.3, max: 12, noNaN: true }),
  });
  it('rockingBlock, rockingWall and freeRockingPeriod give finite numbers for any valid input', () => {
    fc.assert(
      fc.property(
        dims,
        fc.double({ min: 0, max: 1e6, noNaN: true }),
        fc.double({ min: 0, max: 1e6, noNaN: true }),
        fc.double({ min: 0.01, max: 0.99, noNaN: true }),
        ({ w, h }, N, P, f) => {
          const block = rockingBlock(w, h);
          const wall = rockingWall({
            widthM: w,
            heightM: h,
            selfWeightN: 1000 * w * h,
            gravityLoadN: N,
            postTensionN: P,
            holdDownCapacityN: N / 2,
          });
          const T = freeRockingPeriod(w, h, f * block.alpha);
          for (const x of [...numbersIn(block), ...numbersIn(wall), T])
            expect(Number.isFinite(x)).toBe(true);
          expect(wall.restitution).toBeGreaterThanOrEqual(0);
          expect(wall.restitution).toBeLessThanOrEqual(1);
        },
      ),
      { numRuns: 300 },
    );
  });
  it('the time history gives a finite peak ratio in [0, 1] under random pulses', () => {
    fc.assert(
      fc.property(
        dims,
        fc.double({ min: -3, max: 3, noNaN: true }),
        fc.double({ min: 0.1, max: 3, noNaN: true }),
        fc.constantFrom('sine' as const, 'ricker' as const),
        ({ w, h }, A, Tp, shape) => {
          const block = rockingBlock(w, h);
          const pulse = groundPulse(shape, A, Tp);
          const r = rockingTimeHistory(block, pulse.acceleration, pulse.durationS + 2, {
            breakpointsS: pulse.breakpointsS,
          });
          expect(Number.isFinite(r.peakRatio)).toBe(true);
          expect(r.peakRatio).toBeGreaterThanOrEqual(0);
          expect(r.peakRatio).toBeLessThanOrEqual(1 + 1e-12);
          expect(r.theta.every(Number.isFinite)).toBe(true);
          expect(r.completed).toBe(true);
        },
      ),
      { numRuns: 60 },
    );
  });
  it('the assessment has no NaN anywhere, for random walls and spectra', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.3, max: 4, noNaN: true }),
        fc.double({ min: 1.5, max: 6, noNaN: true }),
        fc.double({ min: 0.05, max: 0.6, noNaN: true }),
        fc.option(fc.double({ min: 0, max: 0.2, noNaN: true }), { nil: null }),
        (len, h, ag, gap) => {
          const wall: WallInput = {
            id: 'w',
            storey: 0,
            direction: 'x',
            type: 'rocking',
            lengthM: len,
            heightM: h,
            positionM: null,
            connectors: null,
            rocking: null,
            devices: [],
            userUnitShearNPerM: null,
            userUnitStiffnessNPerM2: null,
          };
          const a = assessRockingWall(
            rockingWallFromInput(wall, h),
            { kind: 'ec8', type: 1, ground: 'C', ag },
            gap,
          );
          for (const x of numbersIn(a)) expect(Number.isNaN(x)).toBe(false);
        },
      ),
      { numRuns: 40 },
    );
  });
  it('uses g = 9.81 m/s² from calc/units', () => {
    expect(G).toBe(9.81);
  });
});
