/**
 * Trend removal before spectral estimation. A phone's accelerometer carries gravity (a
 * constant), slow thermal drift and a tilt that may change as the floor settles; left in,
 * they leak through the window's side lobes into the low-frequency bins.
 */
import { requireFiniteSamples } from './checks.js';
import type { Samples } from './checks.js';

/** How each record or segment is detrended: nothing, its mean, or its least-squares line. */
export type DetrendKind = 'none' | 'constant' | 'linear';

/** Subtracts the mean in place over [start, start + length) of `out`. */
export function removeMeanInPlace(out: Float64Array, start = 0, length = out.length): void {
  let sum = 0;
  for (let i = 0; i < length; i++) sum += out[start + i] as number;
  const mean = sum / length;
  for (let i = 0; i < length; i++) out[start + i] = (out[start + i] as number) - mean;
}

/**
 * Subtracts the least-squares straight line in place over [start, start + length). The
 * index is centred first (t = i − (length − 1)/2), which makes the slope and intercept
 * independent sums and keeps the arithmetic well conditioned for long records.
 */
export function removeLineInPlace(out: Float64Array, start = 0, length = out.length): void {
  if (length < 2) {
    removeMeanInPlace(out, start, length);
    return;
  }
  const centre = (length - 1) / 2;
  let sy = 0;
  let sty = 0;
  let stt = 0;
  for (let i = 0; i < length; i++) {
    const t = i - centre;
    const y = out[start + i] as number;
    sy += y;
    sty += t * y;
    stt += t * t;
  }
  const mean = sy / length;
  const slope = sty / stt;
  for (let i = 0; i < length; i++) {
    out[start + i] = (out[start + i] as number) - mean - slope * (i - centre);
  }
}

/** A detrended copy of `samples`. */
export function detrend(samples: Samples, kind: DetrendKind = 'linear'): Float64Array {
  requireFiniteSamples('samples', samples);
  const out = Float64Array.from(samples);
  if (out.length === 0) return out;
  if (kind === 'constant') removeMeanInPlace(out);
  else if (kind === 'linear') removeLineInPlace(out);
  else if (kind !== 'none') {
    throw new RangeError(`detrend must be 'none', 'constant' or 'linear', got ${String(kind)}`);
  }
  return out;
}
