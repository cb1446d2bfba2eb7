/**
 * Rocking benchmark: `npx tsx test/bench/rocking.bench.ts`.
 *
 * 1. pulseOverturningCheck for one typical wall: median time per call.
 * 2. 10,000 seeded random walls (mulberry32): walls per second for pulseOverturningCheck, and
 *    the per-wall time of the full assessRockingWall (the phone UI budget is 50 ms per wall).
 * 3. Side by side in the same run: one pulse time history by our integrator and by odex (the
 *    Gragg–Bulirsch–Stoer ODEX from npm) on the same equation, same tolerance, impacts located
 *    on odex's dense output and restarted; time ratio and agreement of the results.
 */
import { createRequire } from 'node:module';
import {
  G,
  assessRockingWall,
  freeRockingOutcome,
  groundPulse,
  pulseOverturningCheck,
  rockingWall,
  rockingWallFromInput,
  rockingTimeHistory,
} from '../../calc/index.js';
import type { PulseShape, RockingWall, WallInput } from '../../calc/index.js';
import { mulberry32 } from './prng.js';

type Dense = (c: number, x: number) => number;
/** The part of odex 2.0.4's Solver used here (its README, "Solver" API). */
interface OdexSolver {
  absoluteTolerance: number;
  relativeTolerance: number;
  maxSteps: number;
  denseOutput: boolean;
  solve(
    f: (x: number, y: number[]) => number[],
    x0: number,
    y0: number[],
    x1: number,
    out?: (n: number, xOld: number, x: number, y: number[], dense?: Dense) => boolean | void,
  ): { y: number[]; nEval: number };
}
// odex ships TypeScript sources that do not compile under the strict settings; load it untyped.
const { Solver } = createRequire(import.meta.url)('odex') as {
  Solver: new (n: number) => OdexSolver;
};

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
}
function quantile(xs: number[], q: number): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor(q * s.length))] as number;
}

/** Rocking under a pulse with odex between impacts (bench baseline). Sine pulses only. */
function odexPulse(
  block: RockingWall,
  amplitudeG: number,
  periodS: number,
  tol: number,
): { peakRatio: number; overturned: boolean; evaluations: number } {
  const { alpha, p, restitution: r } = block;
  const p2 = p * p;
  const w = (2 * Math.PI) / periodS;
  const ag = (t: number): number => (t < periodS ? amplitudeG * G * Math.sin(w * t) : 0);
  const lambda = Math.max(block.upliftAccelerationG, Math.tan(alpha));
  if (amplitudeG <= lambda) return { peakRatio: 0, overturned: false, evaluations: 0 };
  let t = Math.asin(lambda / amplitudeG) / w; // lift-off instant of the sine pulse
  let side = -1; // positive üg throws the block onto its negative side
  let th = 0;
  let om = 0;
  let peak = 0;
  let evaluations = 0;
  const solver = new Solver(2);
  solver.relativeTolerance = tol;
  solver.absoluteTolerance = tol * 1e-2 * alpha;
  solver.denseOutput = true;
  solver.maxSteps = 1e6;
  const f = (x: number, y: number[]): number[] => {
    const phi = alpha * side - (y[0] as number);
    return [y[1] as number, -p2 * (Math.sin(phi) + (ag(x) / G) * Math.cos(phi))];
  };
  for (let guard = 0; guard < 10_000 && t < periodS; guard++) {
    let event: 'impact' | 'topple' | null = null;
    let tEv = periodS;
    let omEv = 0;
    const res = solver.solve(f, t, [th, om], periodS, (n, xOld, x, y, dense) => {
      if (n === 1 || !dense) return;
      const u = side * (y[0] as number);
      // A peak inside the step: bisect θ̇ = 0 on the dense output.
      if (dense(1, xOld) * (y[1] as number) < 0) {
        let lo = xOld;
        let hi = x;
        const s0 = Math.sign(dense(1, xOld));
        for (let i = 0; i < 60; i++) {
          const mid = 0.5 * (lo + hi);
          if (Math.sign(dense(1, mid)) === s0) lo = mid;
          else hi = mid;
        }
        const thPeak = dense(0, 0.5 * (lo + hi));
        if (side * thPeak >= 0) peak = Math.max(peak, Math.abs(thPeak));
      }
      if (u >= 0 && u < alpha) peak = Math.max(peak, Math.abs(y[0] as number));
      if (u >= alpha || u < 0) {
        event = u >= alpha ? 'topple' : 'impact';
        const level = u >= alpha ? alpha : 0;
        let lo = xOld;
        let hi = x;
        for (let i = 0; i < 60; i++) {
          const mid = 0.5 * (lo + hi);
          if (side * dense(0, mid) - level >= 0 === (level === 0)) lo = mid;
          else hi = mid;
        }
        tEv = 0.5 * (lo + hi);
        omEv = dense(1, tEv);
        return false;
      }
    });
    evaluations += res.nEval;
    if (event === 'topple') return { peakRatio: 1, overturned: true, evaluations };
    if (event === null) {
      th = res.y[0] as number;
      om = res.y[1] as number;
      break;
    }
    t = tEv;
    th = 0;
    om = r * omEv;
    side = -side;
    if (Math.abs(om) < 1e-4 * p * alpha) break; // settled: same rule as ours
  }
  // Free rocking after the pulse, by energy (as pulseOverturningCheck does).
  const u = Math.abs(th);
  const ca = Math.cos(alpha);
  let eps = 0.5 * om * om + p2 * (Math.cos(alpha - u) - ca);
  if (th !== 0 && Math.sign(th) * om < 0) eps *= r * r;
  if (eps >= p2 * (1 - ca)) return { peakRatio: 1, overturned: true, evaluations };
  const after = alpha - Math.acos(Math.min(1, ca + eps / p2));
  return { peakRatio: Math.max(peak, u, after) / alpha, overturned: false, evaluations };
}

/** Ours on the same pulse, timed the same way (same tolerance, free phase by energy). */
function oursPulse(block: RockingWall, amplitudeG: number, periodS: number, tol: number) {
  const pulse = groundPulse('sine', amplitudeG, periodS);
  const run = rockingTimeHistory(block, pulse.acceleration, pulse.durationS, {
    relativeTolerance: tol,
    absoluteTolerance: tol * 1e-2 * block.alpha,
    maxStepS: periodS / 20,
    restScanStepS: periodS / 500,
    breakpointsS: pulse.breakpointsS,
    record: false,
  });
  const f = run.final;
  const after = run.overturned ? null : freeRockingOutcome(block, f.theta, f.thetaDot);
  return {
    impacts: run.impacts,
    overturned: run.overturned || (after?.overturns ?? false),
    peakRatio: Math.max(run.peakTheta, after?.peakAbsTheta ?? 0) / block.alpha,
  };
}

function time<T>(fn: () => T): [T, number] {
  const t0 = performance.now();
  const v = fn();
  return [v, performance.now() - t0];
}

// ——— 1. one wall ———
const typical = rockingWall({
  widthM: 1.2,
  heightM: 2.7,
  selfWeightN: 1.2 * 2.7 * 0.12 * 4200,
  gravityLoadN: 15_000,
  postTensionN: 0,
  holdDownCapacityN: 0,
});
const oneInput = { pga: 0.4, pulsePeriod: 0.6, shape: 'sine' as const };
for (let i = 0; i < 50; i++) pulseOverturningCheck(typical, oneInput); // warm-up
const oneTimes: number[] = [];
let oneResult = pulseOverturningCheck(typical, oneInput);
for (let i = 0; i < 300; i++) {
  const [r, ms] = time(() => pulseOverturningCheck(typical, oneInput));
  oneResult = r;
  oneTimes.push(ms);
}
console.log('pulseOverturningCheck, one wall (1.2 × 2.7 m CLT, 15 kN on top; sine, Tp 0.6 s):');
console.log(
  `  median ${median(oneTimes).toFixed(3)} ms, p95 ${quantile(oneTimes, 0.95).toFixed(3)} ms ` +
    `(${oneResult.runs} time histories; toppling amplitude ` +
    `${oneResult.overturningAmplitudeG?.toFixed(4)} g, uplift ${oneResult.upliftAmplitudeG.toFixed(4)} g)`,
);

// ——— 2. 10,000 walls ———
const rand = mulberry32(20_260_401);
const between = (a: number, b: number): number => a + (b - a) * rand();
interface Case {
  input: WallInput;
  storeyH: number;
  pga: number;
  Tp: number;
  shape: PulseShape;
}
const cases: Case[] = [];
for (let i = 0; i < 10_000; i++) {
  const storeyH = between(2.4, 3.6);
  const held = rand() < 0.3;
  cases.push({
    storeyH,
    pga: between(0.1, 0.8),
    Tp: between(0.3, 2.0),
    shape: rand() < 0.5 ? 'sine' : 'ricker',
    input: {
      id: `w${i}`,
      storey: 0,
      direction: 'x',
      type: 'rocking',
      lengthM: between(0.6, 3.0),
      heightM: null,
      positionM: null,
      connectors: held
        ? {
            holdDownCount: 2,
            holdDownCapacityN: between(10_000, 60_000),
            holdDownStiffnessNPerM: null,
            bracketCount: null,
            bracketCapacityN: null,
            bracketStiffnessNPerM: null,
          }
        : null,
      rocking: {
        thicknessM: between(0.09, 0.24),
        selfWeightN: null,
        gravityLoadN: between(0, 60_000),
        postTensionN: rand() < 0.5 ? between(0, 120_000) : 0,
      },
      devices: [],
      userUnitShearNPerM: null,
      userUnitStiffnessNPerM2: null,
    },
  });
}
const models = cases.map((c) => rockingWallFromInput(c.input, c.storeyH));
let toppledWalls = 0;
const [, totalMs] = time(() => {
  cases.forEach((c, i) => {
    const m = models[i] as (typeof models)[number];
    const r = pulseOverturningCheck(m.wall, { pga: c.pga, pulsePeriod: c.Tp, shape: c.shape });
    if (r.atPga.overturned) toppledWalls++;
  });
});
console.log('pulseOverturningCheck, 10,000 seeded random walls (mixed sine/Ricker, Tp 0.3–2 s):');
console.log(
  `  ${(totalMs / 1000).toFixed(2)} s in all → ${Math.round(10_000 / (totalMs / 1000))} walls/s ` +
    `(${(totalMs / 10_000).toFixed(3)} ms per wall; ${toppledWalls} topple at their PGA)`,
);

const assessTimes: number[] = [];
for (let i = 0; i < 1000; i++) {
  const c = cases[i] as Case;
  const spec = { kind: 'ec8' as const, type: 1 as const, ground: 'C' as const, ag: c.pga / 1.15 };
  const [, ms] = time(() => assessRockingWall(models[i] as (typeof models)[number], spec, 0.01));
  assessTimes.push(ms);
}
console.log('assessRockingWall (spectral + pulse check + observed), first 1,000 walls:');
console.log(
  `  median ${median(assessTimes).toFixed(3)} ms, p95 ${quantile(assessTimes, 0.95).toFixed(3)} ms, ` +
    `max ${Math.max(...assessTimes).toFixed(3)} ms per wall (budget 50 ms)`,
);

// ——— 3. side by side with odex ———
for (const Tp of [0.6, 2.0]) {
  const check = pulseOverturningCheck(typical, { pga: 0.4, pulsePeriod: Tp, shape: 'sine' });
  const amp = 0.97 * (check.overturningAmplitudeG ?? 1);
  console.log(
    `One pulse time history (sine ${amp.toFixed(4)} g = 0.97 × toppling, Tp ${Tp} s), ours vs odex:`,
  );
  for (const tol of [1e-6, 1e-8, 1e-10]) {
    for (let i = 0; i < 30; i++) {
      oursPulse(typical, amp, Tp, tol);
      odexPulse(typical, amp, Tp, tol);
    }
    const tOurs: number[] = [];
    const tOdex: number[] = [];
    let ours = oursPulse(typical, amp, Tp, tol);
    let theirs = odexPulse(typical, amp, Tp, tol);
    for (let i = 0; i < 200; i++) {
      const [a, ta] = time(() => oursPulse(typical, amp, Tp, tol));
      const [b, tb] = time(() => odexPulse(typical, amp, Tp, tol));
      ours = a;
      theirs = b;
      tOurs.push(ta);
      tOdex.push(tb);
    }
    const mo = median(tOurs);
    const mx = median(tOdex);
    console.log(
      `  rtol ${tol.toExponential(0)}: ours ${(mo * 1000).toFixed(1)} µs, odex ${(mx * 1000).toFixed(1)} µs, ` +
        `odex/ours ${(mx / mo).toFixed(2)}×; impacts ${ours.impacts}, ` +
        `peak θ/α ours ${ours.peakRatio.toFixed(6)} vs odex ${theirs.peakRatio.toFixed(6)}, ` +
        `toppled ${ours.overturned}/${theirs.overturned}, odex evaluations ${theirs.evaluations}`,
    );
  }
}
