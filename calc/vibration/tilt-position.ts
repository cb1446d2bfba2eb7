/**
 * One position of the tilt meter: about two seconds of gravity readings averaged, with a
 * check that the phone was held still and an uncertainty for the averaged angle.
 *
 * The uncertainty of the mean comes from batch means (split the readings into consecutive
 * batches, take the scatter of the batch means), which stays honest when hand tremor makes
 * neighbouring readings correlated (Law & Kelton, Simulation Modeling and Analysis, batch
 * means method; from memory, verify edition). When the browser rounds readings (0.1 m/s²,
 * see sensor-limits.ts) and the readings barely change, averaging cannot beat the rounding:
 * a uniform rounding error of step/√12 is added (quantisation noise of a uniform quantiser,
 * Widrow & Kollár, Quantization Noise, 2008, ch. 4; from memory, verify chapter).
 */
import { G } from '../units/gravity.js';
import { requireFiniteSamples } from './checks.js';
import type { Samples } from './checks.js';
import { tiltFromGravity } from './gravity-tilt.js';
import { BROWSER_ACCELERATION_STEP_MPS2, quantizationStep } from './sensor-limits.js';

/** Per-axis standard deviation, m/s², above which the phone was not still. Our choice (about 0.35° of scatter per reading), no source. */
export const STILL_STD_MPS2 = 0.06;

/** Largest spread (max − min) of any axis within one position, m/s². Catches a single knock. Our choice, no source. */
export const STILL_RANGE_MPS2 = 0.4;

/** |a| may differ from G by this share before the reading is called implausible (motion, or a badly calibrated sensor). Our choice, no source. */
export const MAGNITUDE_TOLERANCE = 0.05;

/** The phone's long axis must be within this angle of vertical, rad (45°). Our choice, no source. */
export const UPRIGHT_LIMIT_RAD = Math.PI / 4;

/** Fewest readings one position may average. Our choice (about 0.3 s at 60 Hz), no source. */
export const MIN_POSITION_SAMPLES = 20;

/** Raw gravity readings of one position, m/s², one array per phone axis. */
export interface GravityReadings {
  x: Samples;
  y: Samples;
  z: Samples;
}

/** The averaged reading of one position. */
export interface TiltPosition {
  /** Elevation of the phone's x axis, rad: the lean of the face under the long edge plus the sensor's offset. */
  angleRad: number;
  /** Standard uncertainty of `angleRad` from noise and rounding, rad. */
  uncertaintyRad: number;
  meanMps2: { x: number; y: number; z: number };
  stdMps2: { x: number; y: number; z: number };
  magnitudeMps2: number;
  sampleCount: number;
  /** Rounding step detected on the x axis, m/s² (null when the readings look continuous). */
  quantizationStepMps2: number | null;
  /** Every check passed: still, upright, plausible magnitude, enough readings. */
  ok: boolean;
  still: boolean;
  upright: boolean;
  magnitudePlausible: boolean;
  enoughSamples: boolean;
}

function meanStd(values: Samples): { mean: number; std: number; min: number; max: number } {
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i] as number;
    sum += v;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  const mean = sum / values.length;
  let ss = 0;
  for (let i = 0; i < values.length; i++) ss += ((values[i] as number) - mean) ** 2;
  const std = values.length > 1 ? Math.sqrt(ss / (values.length - 1)) : 0;
  return { mean, std, min, max };
}

/** Standard error of the mean by batch means (see the file header). */
function batchMeanError(values: Samples): number {
  const n = values.length;
  const MAX_BATCHES = 10; // our choice: ten batches of ≥ 0.2 s each at 50 Hz and 2 s
  const batches = Math.min(MAX_BATCHES, Math.floor(n / 5));
  if (batches < 2) return n > 1 ? meanStd(values).std / Math.sqrt(n) : 0;
  const size = Math.floor(n / batches);
  const means: number[] = [];
  for (let b = 0; b < batches; b++) {
    let s = 0;
    for (let i = b * size; i < (b + 1) * size; i++) s += values[i] as number;
    means.push(s / size);
  }
  const { std } = meanStd(means);
  return std / Math.sqrt(batches);
}

/**
 * Averages one position's readings into an angle with its uncertainty and the checks
 * behind `ok`. Throws on unequal axis lengths, no readings, or non-finite values (the
 * recorder drops incomplete events before they get here).
 */
export function measureTiltPosition(readings: GravityReadings): TiltPosition {
  const { x, y, z } = readings;
  requireFiniteSamples('readings.x', x);
  requireFiniteSamples('readings.y', y);
  requireFiniteSamples('readings.z', z);
  if (x.length !== y.length || x.length !== z.length) {
    throw new RangeError(
      `readings.x, .y and .z must have the same length, got ${x.length}, ${y.length}, ${z.length}`,
    );
  }
  if (x.length === 0) throw new RangeError('readings must hold at least one reading, got 0');
  const sx = meanStd(x);
  const sy = meanStd(y);
  const sz = meanStd(z);
  const tilt = tiltFromGravity(sx.mean, sy.mean, sz.mean);
  const m = tilt.magnitudeMps2;
  // d(asin(ax/|a|)) ≈ dax/(|a|·cos θ) for a small change of ax alone (derived).
  const perMps2 = 1 / (m * Math.max(Math.cos(tilt.xRad), 1e-6));
  // The rounding step: from x alone, else from all three axes together (a browser rounds
  // them alike), else — when x never changed at all — the browsers' 0.1 m/s² rounding, since
  // a real sensor always shows some scatter (sensor-limits.ts).
  const step =
    quantizationStep(x) ??
    quantizationStep([...Array.from(x), ...Array.from(y), ...Array.from(z)]) ??
    (sx.std === 0 && x.length > 1 ? BROWSER_ACCELERATION_STEP_MPS2 : null);
  const statistical = batchMeanError(x) * perMps2;
  // Without dither (scatter below half a step) the mean of rounded readings keeps the rounding error.
  const rounding = step !== null && sx.std < step / 2 ? (step / Math.sqrt(12)) * perMps2 : 0;
  const still =
    Math.max(sx.std, sy.std, sz.std) <= STILL_STD_MPS2 &&
    Math.max(sx.max - sx.min, sy.max - sy.min, sz.max - sz.min) <= STILL_RANGE_MPS2;
  const upright = Math.abs(tilt.yRad) >= Math.PI / 2 - UPRIGHT_LIMIT_RAD;
  const magnitudePlausible = Math.abs(m - G) <= MAGNITUDE_TOLERANCE * G;
  const enoughSamples = x.length >= MIN_POSITION_SAMPLES;
  return {
    angleRad: tilt.xRad,
    uncertaintyRad: Math.hypot(statistical, rounding),
    meanMps2: { x: sx.mean, y: sy.mean, z: sz.mean },
    stdMps2: { x: sx.std, y: sy.std, z: sz.std },
    magnitudeMps2: m,
    sampleCount: x.length,
    quantizationStepMps2: step,
    ok: still && upright && magnitudePlausible && enoughSamples,
    still,
    upright,
    magnitudePlausible,
    enoughSamples,
  };
}
