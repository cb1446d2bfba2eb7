import { G } from '../units/gravity.js';
import { requireFinite, requireNonNegative, requirePositive } from './guards.js';
import { checkOscillator, type RockingOscillator } from './rocking-block.js';

/**
 * The engine behind rockingTimeHistory and pulseOverturningCheck: the nonlinear rocking
 * equation (Housner 1963, BSSA 53(2):403–417)
 *
 *   θ̈ = −p²·[sin(α·s − θ) + (üg/g)·cos(α·s − θ)],   s = the side the block stands on,
 *
 * integrated with the Dormand–Prince 5(4) embedded Runge–Kutta pair (Dormand & Prince 1980,
 * J. Comput. Appl. Math. 6(1):19–26) under local error control, with
 * - rest until |üg| exceeds the uplift threshold (the crossing found by bisection);
 * - impacts (θ through zero) and toppling (|θ| through α) located by safeguarded Newton
 *   iteration on the length of a Runge–Kutta step from the last accepted point, so the event
 *   lands on the integrator's own trajectory to ~1e-12 s, then θ̇ × r at each impact;
 * - peaks located the same way (θ̇ through zero), so max|θ| is not sampled but solved for.
 */

/** Ground acceleration in m/s² as a function of time in s. */
export type GroundAcceleration = (t: number) => number;

/** Settings of the rocking integrator; every field has a default. */
export interface RockingIntegrationOptions {
  /** Relative local error tolerance (default 1e-8). */
  relativeTolerance?: number | undefined;
  /** Absolute tolerance on θ in rad (default 1e-10·α); on θ̇ it is this × p. */
  absoluteTolerance?: number | undefined;
  /** Largest step in s (default 0.01 s, so no feature of a record is stepped over). */
  maxStepS?: number | undefined;
  /** Times (s) where the ground acceleration may jump or kink; steps end exactly on them. */
  breakpointsS?: readonly number[] | undefined;
  /** Sampling step (s) of the ground motion while the block rests (default 0.001 s). */
  restScanStepS?: number | undefined;
  /** Initial rotation in rad (default 0, at rest); |θ₀| < α. */
  initialTheta?: number | undefined;
  /** Initial angular velocity in rad/s (default 0). */
  initialThetaDot?: number | undefined;
  /** Keep the trajectory (t, θ) and impact times (default true for time histories). */
  record?: boolean | undefined;
  /** Upper bound on attempted steps, a guard against runaway cases (default 500 000). */
  maxSteps?: number | undefined;
}

/** What the engine reports. */
export interface RockingRun {
  overturned: boolean;
  /** Time at which |θ| reached α, or null. */
  overturnTimeS: number | null;
  /** max|θ| in rad over the run (α when it toppled). */
  peakAbsTheta: number;
  /** Time of the first uplift, or null when the block never left rest. */
  upliftTimeS: number | null;
  impacts: number;
  impactTimesS: number[];
  t: number[];
  theta: number[];
  /** State at the end of the run (the toppling instant when it toppled). */
  final: { t: number; theta: number; thetaDot: number; atRest: boolean };
  /** False when the step guard stopped the run before the end time. */
  completed: boolean;
  acceptedSteps: number;
  rejectedSteps: number;
  /** Number of evaluations of the ground acceleration. */
  groundEvaluations: number;
}

// Dormand–Prince 5(4) coefficients (Dormand & Prince 1980, Table 2; also Hairer, Nørsett &
// Wanner, Solving ODEs I, 2nd ed., Table II.5.2).
const C2 = 1 / 5,
  C3 = 3 / 10,
  C4 = 4 / 5,
  C5 = 8 / 9;
const A21 = 1 / 5;
const A31 = 3 / 40,
  A32 = 9 / 40;
const A41 = 44 / 45,
  A42 = -56 / 15,
  A43 = 32 / 9;
const A51 = 19372 / 6561,
  A52 = -25360 / 2187,
  A53 = 64448 / 6561,
  A54 = -212 / 729;
const A61 = 9017 / 3168,
  A62 = -355 / 33,
  A63 = 46732 / 5247,
  A64 = 49 / 176,
  A65 = -5103 / 18656;
const B1 = 35 / 384,
  B3 = 500 / 1113,
  B4 = 125 / 192,
  B5 = -2187 / 6784,
  B6 = 11 / 84;
// Error weights: 5th-order minus embedded 4th-order weights (same source).
const E1 = 71 / 57600,
  E3 = -71 / 16695,
  E4 = 71 / 1920,
  E5 = -17253 / 339200,
  E6 = 22 / 525,
  E7 = -1 / 40;

// Step-size control: safety factor and growth limits, the usual values (Hairer, Nørsett &
// Wanner, §II.4; common practice).
const SAFETY = 0.9;
const MAX_GROWTH = 5;
const MIN_SHRINK = 0.2;

/** Post-impact angular velocity below which the block is taken to settle, × p·α (ours). */
const REST_VELOCITY = 1e-4;
/** Time tolerance of event location, s (ours: well below any physical time scale). */
const EVENT_TIME_TOL = 1e-12;
/** First step after a lift-off, × 1/p (ours: a hundredth of the block's time scale). */
const FIRST_STEP = 0.01;
/** Shortest step, relative to t, before the run is given up (ours: near double precision). */
const MIN_STEP = 1e-14;

class Engine {
  readonly alpha: number;
  readonly p2: number;
  readonly r: number;
  readonly ag: GroundAcceleration;
  side = 1;
  evaluations = 0;
  // Results of the last trial step.
  th1 = 0;
  om1 = 0;
  acc1 = 0;
  err = 0;
  rtol: number;
  atolTh: number;
  atolOm: number;
  /** Time the last stage of a step is evaluated at (left limit at a breakpoint). */
  tLast = 0;

  constructor(block: RockingOscillator, ag: GroundAcceleration, rtol: number, atol: number) {
    this.alpha = block.alpha;
    this.p2 = block.p * block.p;
    this.r = block.restitution;
    this.ag = ag;
    this.rtol = rtol;
    this.atolTh = atol;
    this.atolOm = atol * block.p;
  }

  ground(t: number): number {
    this.evaluations++;
    const a = this.ag(t);
    if (typeof a !== 'number' || !Number.isFinite(a)) {
      throw new RangeError(`groundAcceleration(${t}) must return a finite number, got ${a}`);
    }
    return a;
  }

  /** θ̈ on the current side. */
  accel(t: number, th: number): number {
    const phi = this.alpha * this.side - th;
    return -this.p2 * (Math.sin(phi) + (this.ground(t) / G) * Math.cos(phi));
  }

  /**
   * One Dormand–Prince step of size h from (t, θ, ω) with θ̈(t) = a0. Leaves the new state in
   * th1, om1, its θ̈ in acc1 (first-same-as-last), and the scaled error norm in err.
   */
  step(t: number, th: number, om: number, a0: number, h: number, tEnd: number): void {
    const k1t = om;
    const k1o = a0;
    const k2t = om + h * (A21 * k1o);
    const k2o = this.accel(t + C2 * h, th + h * (A21 * k1t));
    const k3t = om + h * (A31 * k1o + A32 * k2o);
    const k3o = this.accel(t + C3 * h, th + h * (A31 * k1t + A32 * k2t));
    const k4t = om + h * (A41 * k1o + A42 * k2o + A43 * k3o);
    const k4o = this.accel(t + C4 * h, th + h * (A41 * k1t + A42 * k2t + A43 * k3t));
    const k5t = om + h * (A51 * k1o + A52 * k2o + A53 * k3o + A54 * k4o);
    const k5o = this.accel(t + C5 * h, th + h * (A51 * k1t + A52 * k2t + A53 * k3t + A54 * k4t));
    const k6t = om + h * (A61 * k1o + A62 * k2o + A63 * k3o + A64 * k4o + A65 * k5o);
    const k6o = this.accel(
      tEnd,
      th + h * (A61 * k1t + A62 * k2t + A63 * k3t + A64 * k4t + A65 * k5t),
    );
    const th1 = th + h * (B1 * k1t + B3 * k3t + B4 * k4t + B5 * k5t + B6 * k6t);
    const om1 = om + h * (B1 * k1o + B3 * k3o + B4 * k4o + B5 * k5o + B6 * k6o);
    const k7t = om1;
    const k7o = this.accel(tEnd, th1);
    const et = h * (E1 * k1t + E3 * k3t + E4 * k4t + E5 * k5t + E6 * k6t + E7 * k7t);
    const eo = h * (E1 * k1o + E3 * k3o + E4 * k4o + E5 * k5o + E6 * k6o + E7 * k7o);
    const st = this.atolTh + this.rtol * Math.max(Math.abs(th), Math.abs(th1));
    const so = this.atolOm + this.rtol * Math.max(Math.abs(om), Math.abs(om1));
    this.th1 = th1;
    this.om1 = om1;
    this.acc1 = k7o;
    this.err = Math.sqrt(0.5 * ((et / st) ** 2 + (eo / so) ** 2));
  }
}

/** Which quantity an event search zeroes: s·θ − level, or θ̇ (a peak). */
type EventKind = 'theta' | 'omega';

/**
 * Root of the event function on a step from (t, θ, ω, a0), for step lengths in [lo, hi] where
 * the function changes sign (or vanishes at lo). Safeguarded Newton on the step length: each
 * trial is a full Dormand–Prince step from the accepted point, so the root lies on the
 * integrator's trajectory. Leaves the state at the root in the engine; returns its length.
 */
function locate(
  e: Engine,
  kind: EventKind,
  level: number,
  t: number,
  th: number,
  om: number,
  a0: number,
  lo: number,
  hi: number,
  gLo: number,
  guess: number,
  tEndOf: (x: number) => number,
): number {
  const value = (x: number): [number, number] => {
    if (x === 0) {
      e.th1 = th;
      e.om1 = om;
      e.acc1 = a0;
    } else {
      e.step(t, th, om, a0, x, tEndOf(x));
    }
    return kind === 'theta' ? [e.side * e.th1 - level, e.side * e.om1] : [e.om1, e.acc1];
  };
  if (gLo === 0) {
    value(lo);
    return lo;
  }
  let x = guess > lo && guess < hi ? guess : 0.5 * (lo + hi);
  for (let i = 0; i < 100; i++) {
    const [g, dg] = value(x);
    if (g === 0) return x;
    if (Math.sign(g) === Math.sign(gLo)) {
      lo = x;
      gLo = g;
    } else {
      hi = x;
    }
    let next = x - g / dg;
    if (!(next > lo && next < hi) || !Number.isFinite(next)) next = 0.5 * (lo + hi);
    if (Math.abs(next - x) <= EVENT_TIME_TOL || hi - lo <= EVENT_TIME_TOL) {
      x = next;
      break;
    }
    x = next;
  }
  value(x);
  return x;
}

/** Linear-interpolation guess of a root between two samples. */
function secantGuess(a: number, ga: number, b: number, gb: number): number {
  const d = gb - ga;
  return d !== 0 ? a - (ga * (b - a)) / d : 0.5 * (a + b);
}

/**
 * Integrates the rocking equation from t = 0 to `endS` (see the module comment).
 * Throws a RangeError for a bad block, duration, option or a non-finite ground acceleration.
 */
export function runRocking(
  block: RockingOscillator,
  groundAcceleration: GroundAcceleration,
  endS: number,
  options: RockingIntegrationOptions = {},
): RockingRun {
  checkOscillator(block);
  if (typeof groundAcceleration !== 'function') {
    throw new RangeError(
      `groundAcceleration must be a function of t, got ${typeof groundAcceleration}`,
    );
  }
  requirePositive('durationS', endS);
  const alpha = block.alpha;
  const rtol = requirePositive('relativeTolerance', options.relativeTolerance ?? 1e-8);
  const atol = requirePositive('absoluteTolerance', options.absoluteTolerance ?? 1e-10 * alpha);
  const hMax = requirePositive('maxStepS', options.maxStepS ?? 0.01);
  const scan = requirePositive('restScanStepS', options.restScanStepS ?? 0.001);
  const maxSteps = requirePositive('maxSteps', options.maxSteps ?? 500_000);
  const record = options.record ?? true;
  const theta0 = requireFinite('initialTheta', options.initialTheta ?? 0);
  const omega0 = requireFinite('initialThetaDot', options.initialThetaDot ?? 0);
  if (Math.abs(theta0) >= alpha) {
    throw new RangeError(`initialTheta must satisfy |θ₀| < alpha = ${alpha} rad, got ${theta0}`);
  }
  const breaks = (options.breakpointsS ?? [])
    .map((b, i) => requireNonNegative(`breakpointsS[${i}]`, b))
    .filter((b) => b > 0 && b < endS)
    .sort((a, b) => a - b);
  breaks.push(endS);

  const e = new Engine(block, groundAcceleration, rtol, atol);
  const tanA = Math.tan(alpha);
  // A hand-made block could claim an uplift threshold below tan α, where the block cannot
  // lift; never use less than tan α.
  const firstThreshold = Math.max(block.upliftAccelerationG, tanA) * G;
  const laterThreshold = tanA * G;
  const restOmega = REST_VELOCITY * block.p * alpha;

  const out: RockingRun = {
    overturned: false,
    overturnTimeS: null,
    peakAbsTheta: 0,
    upliftTimeS: null,
    impacts: 0,
    impactTimesS: [],
    t: [],
    theta: [],
    final: { t: 0, theta: 0, thetaDot: 0, atRest: true },
    completed: true,
    acceptedSteps: 0,
    rejectedSteps: 0,
    groundEvaluations: 0,
  };
  const push = (t: number, th: number): void => {
    if (record) {
      out.t.push(t);
      out.theta.push(th);
    }
  };

  let t = 0;
  let th = theta0;
  let om = omega0;
  let atRest = theta0 === 0 && omega0 === 0;
  let lifted = !atRest;
  if (!atRest) e.side = theta0 !== 0 ? Math.sign(theta0) : Math.sign(omega0);
  out.peakAbsTheta = Math.abs(theta0);
  push(0, th);
  let bi = 0; // index of the next breakpoint ≥ t
  let h = Math.min(hMax, FIRST_STEP / block.p, endS);
  let a0 = atRest ? 0 : e.accel(t, th);
  let attempts = 0;
  let restFrom = 0;

  while (t < endS) {
    if (atRest) {
      // Scan the ground motion for the first time it exceeds the threshold.
      const thr = lifted ? laterThreshold : firstThreshold;
      let tPrev = Math.max(t, restFrom);
      let tNext = tPrev;
      let found = false;
      while (tNext <= endS) {
        if (Math.abs(e.ground(tNext)) > thr) {
          found = true;
          break;
        }
        tPrev = tNext;
        if (tNext === endS) break;
        while (bi < breaks.length && (breaks[bi] as number) <= tPrev) bi++;
        tNext = Math.min(tPrev + scan, breaks[bi] ?? endS);
      }
      if (!found) {
        t = endS;
        push(t, 0);
        break;
      }
      // Bisection between the last quiet sample and the first loud one.
      let lo = tPrev;
      let hi = tNext;
      if (hi > lo) {
        for (let i = 0; i < 200 && hi - lo > EVENT_TIME_TOL; i++) {
          const mid = 0.5 * (lo + hi);
          if (Math.abs(e.ground(mid)) > thr) hi = mid;
          else lo = mid;
        }
      }
      t = hi;
      while (bi < breaks.length && (breaks[bi] as number) <= t) bi++;
      e.side = -Math.sign(e.ground(t)) || 1;
      th = 0;
      om = 0;
      atRest = false;
      if (!lifted) out.upliftTimeS = t;
      lifted = true;
      a0 = e.accel(t, th);
      push(t, th);
      h = Math.min(hMax, FIRST_STEP / block.p);
      continue;
    }

    if (++attempts > maxSteps) {
      out.completed = false;
      break;
    }
    // Land exactly on the next breakpoint (or the end); the last stages then take the
    // ground motion's left limit there.
    while (bi < breaks.length && (breaks[bi] as number) <= t) bi++;
    const bp = breaks[bi] ?? endS;
    let hs = Math.min(h, hMax);
    let onBreak = false;
    if (t + hs >= bp) {
      hs = bp - t;
      onBreak = true;
    }
    const tEndOf = (x: number): number => {
      const te = t + x;
      return onBreak && x === hs ? te - 1e-13 * Math.max(1, Math.abs(te)) : te;
    };
    e.step(t, th, om, a0, hs, tEndOf(hs));
    const err = e.err;
    if (!(err <= 1) || !Number.isFinite(e.th1)) {
      out.rejectedSteps++;
      const f = Number.isFinite(err) ? Math.max(MIN_SHRINK, SAFETY * err ** -0.2) : MIN_SHRINK;
      h = hs * Math.min(1, f);
      if (h < MIN_STEP * Math.max(1, t)) {
        out.completed = false;
        break;
      }
      continue;
    }
    out.acceptedSteps++;
    const grow = err === 0 ? MAX_GROWTH : Math.min(MAX_GROWTH, SAFETY * err ** -0.2);
    const hNext = hs * Math.max(MIN_SHRINK, grow);

    // Candidate end state of this step.
    let th1 = e.th1;
    let om1 = e.om1;
    let acc1 = e.acc1;
    const s = e.side;
    const u0 = s * th;
    const v0 = s * om;
    const u1 = s * th1;
    const v1 = s * om1;

    // Just lifted (θ = θ̇ = 0) and already back below the base at the step's end: the step was
    // too long to resolve the small first excursion. Shorten it; a lift-off has s·θ̈ > 0.
    if (u0 === 0 && v0 === 0 && u1 < 0) {
      out.acceptedSteps--;
      out.rejectedSteps++;
      if (hs < 1e3 * EVENT_TIME_TOL) {
        // The excursion is below any resolution: the block stays down. Resume the scan just
        // after this instant so the same sample does not lift it again.
        atRest = true;
        restFrom = t + 1e3 * EVENT_TIME_TOL;
        continue;
      }
      h = hs / 8;
      continue;
    }

    // Split the step at an extremum of θ, if there is one inside it.
    const ends: Array<{ x: number; u: number; th: number; om: number; acc: number }> = [
      { x: 0, u: u0, th, om, acc: a0 },
    ];
    if (v0 * v1 < 0) {
      const x = locate(
        e,
        'omega',
        0,
        t,
        th,
        om,
        a0,
        0,
        hs,
        om,
        secantGuess(0, om, hs, om1),
        tEndOf,
      );
      ends.push({ x, u: s * e.th1, th: e.th1, om: e.om1, acc: e.acc1 });
    }
    ends.push({ x: hs, u: u1, th: th1, om: om1, acc: acc1 });

    let event: 'none' | 'impact' | 'topple' = 'none';
    let xEvent = hs;
    for (let k = 0; k + 1 < ends.length; k++) {
      const A = ends[k] as (typeof ends)[number];
      const B = ends[k + 1] as (typeof ends)[number];
      if (A.u < alpha && B.u >= alpha) {
        xEvent = locate(
          e,
          'theta',
          alpha,
          t,
          th,
          om,
          a0,
          A.x,
          B.x,
          A.u - alpha,
          secantGuess(A.x, A.u - alpha, B.x, B.u - alpha),
          tEndOf,
        );
        event = 'topple';
        break;
      }
      if (A.u >= 0 && B.u < 0) {
        xEvent = locate(
          e,
          'theta',
          0,
          t,
          th,
          om,
          a0,
          A.x,
          B.x,
          A.u,
          secantGuess(A.x, A.u, B.x, B.u),
          tEndOf,
        );
        event = 'impact';
        break;
      }
    }
    if (event !== 'none') {
      th1 = e.th1;
      om1 = e.om1;
      acc1 = e.acc1;
    }
    // The extremum counts (and is recorded) only if the block got there before an event.
    const mid = ends.length === 3 ? ends[1] : undefined;
    if (mid !== undefined && (event === 'none' || mid.x < xEvent)) {
      if (Math.abs(mid.th) > out.peakAbsTheta) out.peakAbsTheta = Math.abs(mid.th);
      push(t + mid.x, mid.th);
    }
    const tNew = event === 'none' ? t + hs : t + xEvent;
    if (Math.abs(th1) > out.peakAbsTheta) out.peakAbsTheta = Math.abs(th1);

    if (event === 'topple') {
      t = tNew;
      th = s * alpha;
      om = om1;
      push(t, th);
      out.overturned = true;
      out.overturnTimeS = t;
      out.peakAbsTheta = alpha;
      break;
    }
    if (event === 'impact') {
      t = tNew;
      th = 0;
      push(t, 0);
      out.impacts++;
      if (record) out.impactTimesS.push(t);
      e.side = -s;
      om = e.r * om1;
      if (Math.abs(om) <= restOmega) {
        atRest = true;
        om = 0;
        continue;
      }
      a0 = e.accel(t, 0);
      // The next excursion is shorter than the last: restart from a step that fits it.
      h = Math.min(hNext, Math.abs(om) / (e.p2 * Math.sin(alpha)) + 1e-6);
      continue;
    }
    t = tNew;
    th = th1;
    om = om1;
    // On a breakpoint the ground motion may jump: take θ̈ afresh with its right value.
    a0 = onBreak ? e.accel(t, th) : acc1;
    push(t, th);
    h = hNext;
  }

  out.final = { t, theta: th, thetaDot: om, atRest };
  out.groundEvaluations = e.evaluations;
  return out;
}

/**
 * Fate of a block rocking freely (no more ground motion) from the state (θ, θ̇), from energy
 * alone, derived here from the first integral of the rocking equation:
 * ε = θ̇²/2 + p²·[cos(α − |θ|) − cos α] is constant between impacts and becomes r²·ε at an
 * impact; the block topples iff it reaches the barrier p²·(1 − cos α) moving away from the
 * base. Returns whether it topples and the largest |θ| still to come.
 */
export function freeRockingOutcome(
  block: RockingOscillator,
  theta: number,
  thetaDot: number,
): { overturns: boolean; peakAbsTheta: number } {
  const { alpha, p, restitution: r } = block;
  const p2 = p * p;
  const u = Math.abs(theta);
  if (u >= alpha) return { overturns: true, peakAbsTheta: alpha };
  if (theta === 0 && thetaDot === 0) return { overturns: false, peakAbsTheta: 0 };
  const side = theta !== 0 ? Math.sign(theta) : Math.sign(thetaDot);
  const ca = Math.cos(alpha);
  const barrier = p2 * (1 - ca);
  const eps = 0.5 * thetaDot * thetaDot + p2 * (Math.cos(alpha - u) - ca);
  const peakOf = (en: number): number => alpha - Math.acos(Math.min(1, ca + en / p2));
  if (side * thetaDot > 0) {
    if (eps >= barrier) return { overturns: true, peakAbsTheta: alpha };
    return { overturns: false, peakAbsTheta: Math.max(u, peakOf(eps)) };
  }
  // Moving back to the base (or at a turning point): one impact first.
  const after = r * r * eps;
  if (after >= barrier) return { overturns: true, peakAbsTheta: alpha };
  return { overturns: false, peakAbsTheta: Math.max(u, peakOf(after)) };
}
