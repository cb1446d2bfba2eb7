// The rocking time history against a general-purpose ODE solver and against the free-rocking
// period formula.
// References: odex 2.0.4 (Hairer & Wanner's Gragg–Bulirsch–Stoer ODEX, from npm) integrating the
// same equations; Housner 1963, BSSA 53(2):403–417 (equation of motion, period formula); the
// method notes §6 (derived: the nonlinear period exceeds the linearised formula by 7e-5, 2.9e-4
// and 1.8e-3 relative at θ₀ = α/2 for α = 0.05, 0.1, 0.25).
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import {
  G,
  freeRockingPeriod,
  rockingBlock,
  rockingTimeHistory,
  rockingWall,
} from '../../calc/index.js';

/** The part of odex 2.0.4's Solver used here (its README, "Solver" API). */
interface OdexSolver {
  absoluteTolerance: number;
  relativeTolerance: number;
  maxSteps: number;
  solve(
    f: (x: number, y: number[]) => number[],
    x0: number,
    y0: number[],
    x1: number,
  ): { y: number[] };
}
// odex ships TypeScript sources that do not compile under this project's strict settings, so it is
// loaded through require and given the small interface above.
const { Solver } = createRequire(import.meta.url)('odex') as {
  Solver: new (n: number) => OdexSolver;
};

/** θ(t) from odex for θ'' = f(t, θ), at each of the given times (one solve per time, no interpolation). */
function odexAt(
  f: (t: number, th: number) => number,
  theta0: number,
  omega0: number,
  times: number[],
): number[] {
  const solver = new Solver(2);
  solver.absoluteTolerance = 1e-13;
  solver.relativeTolerance = 1e-13;
  solver.maxSteps = 1e6;
  return times.map((t) => {
    const r = solver.solve(
      (x: number, y: number[]) => [y[1] as number, f(x, y[0] as number)],
      0,
      [theta0, omega0],
      t,
    );
    return r.y[0] as number;
  });
}

/** θ of the run at each checkpoint before its first impact equals odex's to 1e-9 rad. */
function expectMatchBeforeImpact(
  run: { t: number[]; theta: number[]; impactTimesS: number[] },
  ref: number[],
  times: number[],
  atLeast: number,
): void {
  const firstImpact = run.impactTimesS[0] ?? Infinity;
  let compared = 0;
  times.forEach((t, i) => {
    if (t >= firstImpact) return;
    const k = run.t.indexOf(t);
    expect(k).toBeGreaterThanOrEqual(0);
    expect(Math.abs((run.theta[k] as number) - (ref[i] as number))).toBeLessThan(1e-9);
    compared++;
  });
  expect(compared).toBeGreaterThanOrEqual(atLeast);
}

describe('free-rocking period: the formula against the time history with no impact loss (Housner 1963)', () => {
  // α, and the relative excess of the nonlinear period over the formula (method notes §6, derived).
  const CASES: Array<[alpha: number, excess: number]> = [
    [0.05, 7e-5],
    [0.1, 2.9e-4],
    [0.25, 1.8e-3],
  ];
  for (const [alpha, excess] of CASES) {
    it(`agrees to ${excess} relative, as derived, for α = ${alpha} released from α/2`, () => {
      const heightM = 3;
      const widthM = heightM * Math.tan(alpha);
      const block = { ...rockingBlock(widthM, heightM), restitution: 1 };
      const run = rockingTimeHistory(block, () => 0, 25, { initialTheta: alpha / 2 });
      const imp = run.impactTimesS;
      expect(imp.length).toBeGreaterThanOrEqual(5);
      // Impacts are half a period apart; average over four of them.
      const T = ((imp[4] as number) - (imp[0] as number)) / 2;
      const Tformula = freeRockingPeriod(widthM, heightM, alpha / 2);
      const rel = (T - Tformula) / Tformula;
      // The method notes give the excess to two significant figures.
      expect(rel).toBeGreaterThan(excess * 0.95);
      expect(rel).toBeLessThan(excess * 1.05);
      // No loss at impact: the amplitude stays α/2 for good.
      expect(run.peakRatio).toBeCloseTo(0.5, 9);
      expect(run.overturned).toBe(false);
    });
  }
});

describe('the integrator against odex on the Housner equation between impacts', () => {
  const block = rockingBlock(0.5, 2.0);
  const { alpha, p } = block;
  // Pushes the block further onto its positive side, then back.
  const ag = (t: number): number => -0.35 * G * Math.sin(2 * Math.PI * t);
  // Positive side: θ'' = −p²[sin(α − θ) + (üg/g)cos(α − θ)].
  const f = (t: number, th: number): number =>
    -p * p * (Math.sin(alpha - th) + (ag(t) / G) * Math.cos(alpha - th));
  const times = Array.from({ length: 20 }, (_, i) => 0.05 * (i + 1));

  it('matches odex to 1e-9 rad under a harmonic ground motion from θ₀ = 0.3α', () => {
    const run = rockingTimeHistory(block, ag, 1.0, {
      initialTheta: 0.3 * alpha,
      breakpointsS: times,
    });
    expectMatchBeforeImpact(run, odexAt(f, 0.3 * alpha, 0, times), times, 12);
  });

  it('locates the first impact where odex puts θ = 0 (to 1e-8 s)', () => {
    const run = rockingTimeHistory(block, () => 0, 2, { initialTheta: 0.5 * alpha });
    const tImpact = run.impactTimesS[0] as number;
    const free = (_t: number, th: number): number => -p * p * Math.sin(alpha - th);
    const [before, after] = odexAt(free, 0.5 * alpha, 0, [tImpact - 1e-8, tImpact + 1e-8]);
    expect(before as number).toBeGreaterThan(0);
    expect(after as number).toBeLessThan(0);
  });
});

describe('the equivalent block of a wall against its own two-mass equation integrated by odex', () => {
  // First principles, moments about the toe: the panel (mass m, centre at (b, h)) and the gravity
  // load as a point mass m_N at the top centre (b, 2h); the tendon force P acting at the base
  // centre (b, 0). θ'' = −[ΣWᵢ·Rᵢ·sin(αᵢ − θ) + P·b·cos θ + (üg/g)·ΣWᵢ·Rᵢ·cos(αᵢ − θ)] / I₀.
  const widthM = 1.2;
  const heightM = 2.7;
  const b = widthM / 2;
  const h = heightM / 2;
  const W = 12_000;
  const N = 30_000;
  const twoMass = (P: number, ag: (t: number) => number) => {
    const R1 = Math.hypot(b, h);
    const a1 = Math.atan2(b, h);
    const R2 = Math.hypot(b, 2 * h);
    const a2 = Math.atan2(b, 2 * h);
    const I0 = (4 / 3) * (W / G) * R1 * R1 + (N / G) * R2 * R2;
    return (t: number, th: number): number => {
      const u = ag(t) / G;
      const restoring =
        W * R1 * Math.sin(a1 - th) + N * R2 * Math.sin(a2 - th) + P * b * Math.cos(th);
      const driving = u * (W * R1 * Math.cos(a1 - th) + N * R2 * Math.cos(a2 - th));
      return -(restoring + driving) / I0;
    };
  };
  const times = Array.from({ length: 16 }, (_, i) => 0.05 * (i + 1));

  it('is exact for a wall with a gravity load and no post-tension (ground motion, 1e-9 rad)', () => {
    const wall = rockingWall({
      widthM,
      heightM,
      selfWeightN: W,
      gravityLoadN: N,
      postTensionN: 0,
      holdDownCapacityN: 0,
    });
    const ag = (t: number): number => -0.6 * G * Math.sin(3 * t);
    const run = rockingTimeHistory(wall, ag, 0.8, {
      initialTheta: 0.2 * wall.alpha,
      breakpointsS: times,
    });
    expectMatchBeforeImpact(run, odexAt(twoMass(0, ag), 0.2 * wall.alpha, 0, times), times, 12);
  });

  it('is exact in free rocking with post-tension (restoring moment is one sinusoid, derived)', () => {
    const P = 40_000;
    const wall = rockingWall({
      widthM,
      heightM,
      selfWeightN: W,
      gravityLoadN: N,
      postTensionN: P,
      holdDownCapacityN: 0,
    });
    const run = rockingTimeHistory(wall, () => 0, 0.8, {
      initialTheta: 0.6 * wall.alpha,
      breakpointsS: times,
    });
    expectMatchBeforeImpact(
      run,
      odexAt(
        twoMass(P, () => 0),
        0.6 * wall.alpha,
        0,
        times,
      ),
      times,
      4,
    );
  });

  it('topples statically at α_e: the two-mass equation with post-tension has zero moment there', () => {
    const P = 40_000;
    const wall = rockingWall({
      widthM,
      heightM,
      selfWeightN: W,
      gravityLoadN: N,
      postTensionN: P,
      holdDownCapacityN: 0,
    });
    const f = twoMass(P, () => 0);
    expect(Math.abs(f(0, wall.alpha))).toBeLessThan(1e-12);
    expect(f(0, wall.alpha * 0.99)).toBeLessThan(0);
    expect(f(0, wall.alpha * 1.01)).toBeGreaterThan(0);
  });
});
