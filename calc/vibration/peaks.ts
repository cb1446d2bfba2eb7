/**
 * Local maxima of a sampled curve and their topographic prominence: how far a peak rises
 * above the higher of the two lowest points that separate it from any higher ground on
 * either side (or from the ends of the range). This is the definition used by
 * scipy.signal.peak_prominences (common practice in signal processing; it comes from the
 * prominence of mountain summits). Prominence, unlike height, does not reward a peak for
 * sitting on a sloping background, so it suits a spectrum with 1/f sensor noise.
 */
import { requireFiniteSamples, requireIntegerIn } from './checks.js';
import type { Samples } from './checks.js';

export interface Peak {
  /** Index of the peak (the middle of a flat top). */
  index: number;
  value: number;
  /** Height above the higher of its two bases, same unit as the values. */
  prominence: number;
  /** Indices of the lowest points between the peak and higher ground, left and right. */
  leftBase: number;
  rightBase: number;
}

/**
 * Every local maximum of values[from..to] (inclusive) with its prominence, sorted by index.
 * A flat top counts once, at its middle. The end points are never peaks.
 */
export function findPeaks(values: Samples, from = 0, to = values.length - 1): Peak[] {
  requireFiniteSamples('values', values);
  if (values.length < 3) return [];
  requireIntegerIn('from', from, 0, values.length - 1);
  requireIntegerIn('to', to, from, values.length - 1);
  const v = (i: number) => values[i] as number;
  const peaks: Peak[] = [];
  let i = from + 1;
  while (i < to) {
    if (v(i) > v(i - 1)) {
      // Walk across a possible plateau.
      let j = i;
      while (j + 1 <= to && v(j + 1) === v(i)) j += 1;
      if (j < to && v(j + 1) < v(i)) {
        const index = (i + j) >> 1;
        peaks.push(withProminence(v, index, from, to));
      }
      i = j + 1;
    } else {
      i += 1;
    }
  }
  return peaks;
}

function withProminence(v: (i: number) => number, index: number, from: number, to: number): Peak {
  const top = v(index);
  let leftMin = top;
  let leftBase = index;
  for (let i = index - 1; i >= from; i--) {
    if (v(i) > top) break;
    if (v(i) < leftMin) {
      leftMin = v(i);
      leftBase = i;
    }
  }
  let rightMin = top;
  let rightBase = index;
  for (let i = index + 1; i <= to; i++) {
    if (v(i) > top) break;
    if (v(i) < rightMin) {
      rightMin = v(i);
      rightBase = i;
    }
  }
  return {
    index,
    value: top,
    prominence: top - Math.max(leftMin, rightMin),
    leftBase,
    rightBase,
  };
}
