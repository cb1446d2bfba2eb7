import { requireNonNegative, requirePositive } from './guards.js';
import { groundPulse, pulsePeriodFromMagnitude, type PulseShape } from './ground-pulses.js';
import { checkOscillator, type RockingOscillator } from './rocking-block.js';
import { freeRockingOutcome, runRocking } from './rocking-integrator.js';

/** The pulse to check against. Give the pulse period, or the magnitude to estimate it from. */
export interface PulseCheckInput {
  /** The site's peak ground acceleration, in g. */
  pga: number;
  /** Pulse period in s; when absent, estimated from `magnitude`. */
  pulsePeriod?: number | null | undefined;
  /** Moment magnitude, used only when `pulsePeriod` is absent. */
  magnitude?: number | null | undefined;
  shape: PulseShape;
}

/** Result of {@link pulseOverturningCheck}. Accelerations in g. */
export interface PulseOverturningCheck {
  shape: PulseShape;
  pulsePeriodS: number;
  pulsePeriodSource: 'input' | 'magnitude';
  pga: number;
  /** Below this amplitude the pulse does not lift the block at all. */
  upliftAmplitudeG: number;
  /** Smallest pulse amplitude found to topple the block, or null if none up to searchedUpToG. */
  overturningAmplitudeG: number | null;
  /** Largest amplitude tried. */
  searchedUpToG: number;
  /**
   * pga / overturningAmplitudeG: ≥ 1 means a pulse of the site's PGA reaches the toppling
   * amplitude. When nothing toppled up to searchedUpToG, an upper bound pga/searchedUpToG.
   */
  ratio: number;
  /** True when `ratio` is only an upper bound (no toppling found). */
  ratioIsUpperBound: boolean;
  /** The response to the pulse at the site's PGA itself. */
  atPga: { peakRatio: number; overturned: boolean };
  /** Time histories run. */
  runs: number;
}

/** Growth factor of the amplitude scan before bisection (ours: coarse enough to be cheap). */
const SCAN_FACTOR = 1.2;
/** Relative width at which the bisection on amplitude stops (ours). */
const AMPLITUDE_TOL = 1e-3;
/** The scan stops at max(20 × uplift amplitude, 4 × pga) (ours: past any credible pulse). */
const SCAN_UPLIFT_MULTIPLE = 20;
const SCAN_PGA_MULTIPLE = 4;

/** Integration settings for the pulse runs: tolerances well below the 1e-3 bisection width. */
function runOptions(periodS: number, alpha: number) {
  return {
    relativeTolerance: 1e-8,
    absoluteTolerance: 1e-10 * alpha,
    // 1/20 of the pulse period keeps every stage inside one lobe of the pulse (ours).
    maxStepS: periodS / 20,
    // The block rests until the pulse first exceeds the uplift threshold; sampling the pulse
    // at 1/500 of its period finds that crossing (then bisection pins it down).
    restScanStepS: periodS / 500,
    record: false,
  };
}

/**
 * Response of the block to one pulse: integrate while the ground moves, then settle the rest
 * by energy (free rocking can only lose energy, see freeRockingOutcome).
 */
export function pulseResponse(
  block: RockingOscillator,
  shape: PulseShape,
  amplitudeG: number,
  periodS: number,
): { peakRatio: number; overturned: boolean } {
  const pulse = groundPulse(shape, amplitudeG, periodS);
  const run = runRocking(block, pulse.acceleration, pulse.durationS, {
    ...runOptions(periodS, block.alpha),
    breakpointsS: pulse.breakpointsS,
  });
  if (run.overturned) return { peakRatio: 1, overturned: true };
  const f = run.final;
  const after = f.atRest
    ? { overturns: false, peakAbsTheta: 0 }
    : freeRockingOutcome(block, f.theta, f.thetaDot);
  const peak = Math.max(run.peakAbsTheta, after.peakAbsTheta);
  return after.overturns
    ? { peakRatio: 1, overturned: true }
    : { peakRatio: peak / block.alpha, overturned: false };
}

/**
 * Smallest amplitude of a one-cycle pulse ('sine' or 'ricker', see groundPulse) that topples
 * the block, compared with the site's PGA. The block is integrated with rockingTimeHistory's
 * engine while the pulse lasts and its free rocking afterwards is settled by energy.
 *
 * Search: amplitudes grow by ×1.2 from the uplift amplitude until one topples the block,
 * then bisection between the last survivor and the first toppler to 0.1 %. Rocking blocks
 * can survive some pulses stronger than one that topples them (Zhang & Makris 2001), so the
 * scan finds the lowest toppling amplitude on its grid, and `atPga` reports the response to
 * the site's own amplitude directly.
 *
 * The pulse period is `input.pulsePeriod`, or estimated from `input.magnitude` with
 * pulsePeriodFromMagnitude (Baker 2007).
 * @throws RangeError for a bad block, pga not finite ≥ 0, or a missing or bad period.
 */
export function pulseOverturningCheck(
  block: RockingOscillator,
  input: PulseCheckInput,
): PulseOverturningCheck {
  checkOscillator(block);
  if (input === null || typeof input !== 'object') {
    throw new RangeError(`input must be an object, got ${String(input)}`);
  }
  const pga = requireNonNegative('pga', input.pga);
  if (input.shape !== 'sine' && input.shape !== 'ricker') {
    throw new RangeError(`shape must be 'sine' or 'ricker', got ${String(input.shape)}`);
  }
  let periodS: number;
  let source: 'input' | 'magnitude';
  if (input.pulsePeriod !== undefined && input.pulsePeriod !== null) {
    periodS = requirePositive('pulsePeriod', input.pulsePeriod);
    source = 'input';
  } else if (input.magnitude !== undefined && input.magnitude !== null) {
    periodS = pulsePeriodFromMagnitude(input.magnitude);
    source = 'magnitude';
  } else {
    throw new RangeError('pulsePeriod or magnitude must be given, got neither');
  }
  const shape = input.shape;
  const uplift = Math.max(block.upliftAccelerationG, Math.tan(block.alpha));
  const top = Math.max(SCAN_UPLIFT_MULTIPLE * uplift, SCAN_PGA_MULTIPLE * pga);
  let runs = 0;
  const topples = (a: number): boolean => {
    runs++;
    return pulseResponse(block, shape, a, periodS).overturned;
  };

  let lo = uplift; // the pulse's peak equals the threshold: no lift-off, no toppling
  let hi: number | null = null;
  for (let a = uplift * SCAN_FACTOR; ; a *= SCAN_FACTOR) {
    const tryA = Math.min(a, top);
    if (topples(tryA)) {
      hi = tryA;
      break;
    }
    lo = tryA;
    if (tryA >= top) break;
  }
  if (hi !== null) {
    let top1: number = hi;
    while (top1 / lo - 1 > AMPLITUDE_TOL) {
      const mid: number = 0.5 * (lo + top1);
      if (topples(mid)) top1 = mid;
      else lo = mid;
    }
    hi = top1;
  }
  if (pga > uplift) runs++;
  const atPga =
    pga > uplift ? pulseResponse(block, shape, pga, periodS) : { peakRatio: 0, overturned: false };
  return {
    shape,
    pulsePeriodS: periodS,
    pulsePeriodSource: source,
    pga,
    upliftAmplitudeG: uplift,
    overturningAmplitudeG: hi,
    searchedUpToG: top,
    ratio: hi !== null ? pga / hi : pga / top,
    ratioIsUpperBound: hi === null,
    atPga,
    runs,
  };
}
