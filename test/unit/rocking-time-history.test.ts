// Behaviour of the rocking time history: impacts, rest, symmetry, and the energy closure used by
// the pulse check. Checks are against the first integral of Housner's equation (Housner 1963,
// BSSA 53(2):403–417; derived: ε = θ̇²/2 + p²[cos(α − |θ|) − cos α] is constant between impacts
// and becomes r²·ε at one).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  G,
  freeRockingOutcome,
  groundPulse,
  pulseResponse,
  rockingBlock,
  rockingTimeHistory,
  rockingWall,
} from '../../calc/index.js';

const peakAfterOneImpact = (alpha: number, r: number, theta0: number): number => {
  // Released from rest at θ₀: at the base ε = cos(α − θ₀) − cos α (per p²); after impact r²·ε.
  const eps = r * r * (Math.cos(alpha - theta0) - Math.cos(alpha));
  return alpha - Math.acos(Math.cos(alpha) + eps);
};

describe('impacts multiply θ̇ by the restitution', () => {
  it('reaches the amplitude the energy first integral predicts after one impact', () => {
    const block = rockingBlock(0.6, 2.4);
    const run = rockingTimeHistory(block, () => 0, 2.5, { initialTheta: 0.6 * block.alpha });
    const t1 = run.impactTimesS[0] as number;
    const t2 = run.impactTimesS[1] ?? Infinity;
    let peak = 0;
    run.t.forEach((t, i) => {
      if (t > t1 && t < t2) peak = Math.max(peak, Math.abs(run.theta[i] as number));
    });
    const expected = peakAfterOneImpact(block.alpha, block.restitution, 0.6 * block.alpha);
    expect(peak).toBeCloseTo(expected, 9);
  });

  it('comes to rest after a run of impacts when the ground is still', () => {
    const block = rockingBlock(0.8, 2.0); // r = 0.78: decays fast
    const run = rockingTimeHistory(block, () => 0, 60, { initialTheta: 0.5 * block.alpha });
    expect(run.completed).toBe(true);
    expect(run.impacts).toBeGreaterThan(10);
    expect(run.theta[run.theta.length - 1]).toBe(0);
    expect(run.t[run.t.length - 1]).toBe(60);
  });

  it('stops at the first impact when r = 0', () => {
    const block = { ...rockingBlock(0.5, 2), restitution: 0 };
    const run = rockingTimeHistory(block, () => 0, 5, { initialTheta: 0.4 * block.alpha });
    expect(run.impacts).toBe(1);
  });
});

describe('lift-off', () => {
  const block = rockingBlock(0.5, 2.0); // tan α = 0.25
  it('stays at rest while |üg| stays at or below g·tanα', () => {
    const run = rockingTimeHistory(block, (t) => 0.999 * 0.25 * G * Math.sin(2 * Math.PI * t), 3);
    expect(run.upliftTimeS).toBeNull();
    expect(run.peakRatio).toBe(0);
  });
  it('lifts off at the instant |üg| first exceeds g·tanα, rocking away from the push', () => {
    const A = 0.5;
    const run = rockingTimeHistory(block, (t) => A * G * Math.sin(2 * Math.PI * t), 0.4);
    const expected = Math.asin(0.25 / A) / (2 * Math.PI);
    expect(run.upliftTimeS as number).toBeCloseTo(expected, 9);
    // Positive üg throws the block onto its negative side.
    expect(Math.min(...run.theta)).toBeLessThan(0);
    expect(Math.max(...run.theta)).toBe(0);
  });
  it('keeps a wall at rest until its hold-downs are overcome, then rocks on the equivalent block', () => {
    const base = {
      widthM: 1.2,
      heightM: 2.7,
      selfWeightN: 13_000,
      gravityLoadN: 0,
      postTensionN: 0,
    };
    const free = rockingWall({ ...base, holdDownCapacityN: 0 });
    const held = rockingWall({ ...base, holdDownCapacityN: 20_000 });
    const pulse = groundPulse('sine', 0.9 * held.upliftAccelerationG, 1.0);
    expect(rockingTimeHistory(held, pulse.acceleration, 3).upliftTimeS).toBeNull();
    expect(rockingTimeHistory(free, pulse.acceleration, 3).upliftTimeS).not.toBeNull();
  });
});

describe('symmetry and the energy closure (fast-check)', () => {
  it('mirrors θ when the ground motion changes sign', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 2, noNaN: true }),
        fc.double({ min: 0.3, max: 2, noNaN: true }),
        fc.double({ min: 0.3, max: 1.5, noNaN: true }),
        (w, A, Tp) => {
          const block = rockingBlock(w, 4 * w);
          const p = groundPulse('sine', A, Tp);
          const m = groundPulse('sine', -A, Tp);
          const opts = { breakpointsS: p.breakpointsS };
          const rp = rockingTimeHistory(block, p.acceleration, Tp + 1, opts);
          const rm = rockingTimeHistory(block, m.acceleration, Tp + 1, opts);
          expect(rm.overturned).toBe(rp.overturned);
          expect(rm.peakRatio).toBeCloseTo(rp.peakRatio, 10);
        },
      ),
      { numRuns: 25 },
    );
  });

  it('settles free rocking after a pulse by energy exactly as the full time history does', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.2, max: 1.5, noNaN: true }),
        fc.double({ min: 1, max: 5, noNaN: true }),
        fc.double({ min: 0.3, max: 2, noNaN: true }),
        fc.constantFrom('sine' as const, 'ricker' as const),
        (w, ampOverTan, Tp, shape) => {
          const block = rockingBlock(w, 4 * w);
          const A = ampOverTan * block.upliftAccelerationG;
          const quick = pulseResponse(block, shape, A, Tp);
          const pulse = groundPulse(shape, A, Tp);
          const full = rockingTimeHistory(block, pulse.acceleration, pulse.durationS + 30, {
            breakpointsS: pulse.breakpointsS,
          });
          expect(quick.overturned).toBe(full.overturned);
          expect(quick.peakRatio).toBeCloseTo(full.peakRatio, 6);
        },
      ),
      { numRuns: 30 },
    );
  });

  it('reports toppling from energy when a block leaves the base with more than the barrier', () => {
    const block = rockingBlock(0.5, 2);
    const { alpha, p } = block;
    const barrierSpeed = Math.sqrt(2 * p * p * (1 - Math.cos(alpha)));
    expect(freeRockingOutcome(block, 1e-9, 1.001 * barrierSpeed).overturns).toBe(true);
    expect(freeRockingOutcome(block, 1e-9, 0.999 * barrierSpeed).overturns).toBe(false);
    // Moving back towards the base it first loses r² of its energy.
    expect(freeRockingOutcome(block, 1e-9, -1.001 * barrierSpeed).overturns).toBe(false);
  });
});
