/**
 * From the timestamps a phone actually delivered to a uniform sample grid. Browser motion
 * events arrive with jitter, now and then late, twice, out of order or not at all (a busy
 * main thread, a screen that dimmed); spectral estimation needs equal spacing.
 *
 * The cleaning is explicit and counted, never silent: samples with a non-finite time or
 * value are dropped, out-of-order samples are put back in time order, repeated timestamps
 * keep their first sample, and the record is cut to its longest stretch without a gap.
 * The uniform grid is then filled by linear interpolation between the neighbouring real
 * samples (a low-pass of sinc² shape: −0.2 dB at 12 % of the sample rate, so a building
 * frequency is not shifted, only very slightly damped; derived).
 */
import { requirePositive } from './checks.js';
import type { Samples } from './checks.js';

/** Options of `resampleToUniform`. */
export interface ResampleOptions {
  /** Target rate in Hz. Default: the median rate of the timestamps. */
  rateHz?: number;
  /**
   * A gap longer than this, in s, splits the record; the longest part is kept. Default:
   * the larger of 0.25 s and five median intervals (our choice, common practice, no source:
   * interpolating across a longer hole would invent a quarter-cycle of a 1 Hz motion).
   */
  maxGapS?: number;
}

/** What the cleaning did, for the record and the caveats shown to the inspector. */
export interface ResampleReport {
  /** Samples given. */
  inputCount: number;
  /** Dropped for a non-finite time or value. */
  droppedNonFinite: number;
  /** Dropped because their timestamp repeated an earlier one. */
  droppedDuplicate: number;
  /** True when timestamps were not in order and had to be sorted. */
  reordered: boolean;
  /** Median interval between timestamps, s (null with fewer than 2 samples). */
  medianIntervalS: number | null;
  /** Longest interval between consecutive kept timestamps, s. */
  largestGapS: number;
  /** Number of gaps longer than the split limit. */
  gapCount: number;
  /** Time span kept (longest stretch without a gap), s from the first timestamp given. */
  keptFromS: number;
  keptToS: number;
}

/** Uniformly resampled channels, or null when fewer than two usable samples remain. */
export interface UniformRecord {
  rateHz: number;
  /** Time of the first uniform sample, s (the same clock as the input). */
  startS: number;
  channels: Float64Array[];
  report: ResampleReport;
}

/** Median of finite values (copy-sorted). */
function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 === 1
    ? (s[mid] as number)
    : ((s[mid - 1] as number) + (s[mid] as number)) / 2;
}

/**
 * Cleans irregular timestamped samples and resamples every channel onto one uniform grid.
 * Never throws for bad data (NaN, disorder, repeats, gaps, too few samples); it reports
 * them. Throws only for a bad option value or channels of unequal length.
 *
 * @param timesS sample times in seconds (any origin; a phone's event time stamps / 1000)
 * @param channels one array per axis, each the same length as `timesS`
 */
export function resampleToUniform(
  timesS: Samples,
  channels: readonly Samples[],
  options: ResampleOptions = {},
): { record: UniformRecord | null; report: ResampleReport } {
  const n = timesS.length;
  for (const [c, ch] of channels.entries()) {
    if (ch.length !== n) {
      throw new RangeError(`channels[${c}] must have ${n} values like timesS, got ${ch.length}`);
    }
  }
  if (options.rateHz !== undefined) requirePositive('options.rateHz', options.rateHz);
  if (options.maxGapS !== undefined) requirePositive('options.maxGapS', options.maxGapS);

  // 1. Keep samples whose time and every value are finite.
  let order: number[] = [];
  let droppedNonFinite = 0;
  for (let i = 0; i < n; i++) {
    let ok = Number.isFinite(timesS[i]);
    for (const ch of channels) ok = ok && Number.isFinite(ch[i]);
    if (ok) order.push(i);
    else droppedNonFinite += 1;
  }
  // 2. Put them in time order (stable), noting whether that changed anything.
  let reordered = false;
  for (let i = 1; i < order.length; i++) {
    if ((timesS[order[i] as number] as number) < (timesS[order[i - 1] as number] as number)) {
      reordered = true;
      break;
    }
  }
  if (reordered) {
    order = order
      .map((index, rank) => ({ index, rank }))
      .sort((a, b) => (timesS[a.index] as number) - (timesS[b.index] as number) || a.rank - b.rank)
      .map((e) => e.index);
  }
  // 3. Repeated timestamps keep their first sample.
  const kept: number[] = [];
  let droppedDuplicate = 0;
  for (const index of order) {
    const last = kept[kept.length - 1];
    if (last !== undefined && timesS[index] === timesS[last]) droppedDuplicate += 1;
    else kept.push(index);
  }
  const t0 = n > 0 && kept.length > 0 ? (timesS[kept[0] as number] as number) : 0;
  const baseReport = {
    inputCount: n,
    droppedNonFinite,
    droppedDuplicate,
    reordered,
  };
  if (kept.length < 2) {
    const report: ResampleReport = {
      ...baseReport,
      medianIntervalS: null,
      largestGapS: 0,
      gapCount: 0,
      keptFromS: 0,
      keptToS: 0,
    };
    return { record: null, report };
  }
  // 4. Intervals, the split limit and the longest stretch without a gap.
  const intervals: number[] = [];
  for (let i = 1; i < kept.length; i++) {
    intervals.push(
      (timesS[kept[i] as number] as number) - (timesS[kept[i - 1] as number] as number),
    );
  }
  const medianIntervalS = median(intervals);
  const GAP_FLOOR_S = 0.25; // see ResampleOptions.maxGapS
  const GAP_INTERVALS = 5; // see ResampleOptions.maxGapS
  const maxGap = options.maxGapS ?? Math.max(GAP_FLOOR_S, GAP_INTERVALS * medianIntervalS);
  let largestGapS = 0;
  let gapCount = 0;
  let bestStart = 0;
  let bestEnd = 0;
  let runStart = 0;
  for (let i = 0; i < intervals.length; i++) {
    const dt = intervals[i] as number;
    largestGapS = Math.max(largestGapS, dt);
    if (dt > maxGap) {
      gapCount += 1;
      runStart = i + 1;
    }
    const runEnd = i + 1;
    const span =
      (timesS[kept[runEnd] as number] as number) - (timesS[kept[runStart] as number] as number);
    const bestSpan =
      (timesS[kept[bestEnd] as number] as number) - (timesS[kept[bestStart] as number] as number);
    if (span > bestSpan) {
      bestStart = runStart;
      bestEnd = runEnd;
    }
  }
  const tStart = timesS[kept[bestStart] as number] as number;
  const tEnd = timesS[kept[bestEnd] as number] as number;
  const report: ResampleReport = {
    ...baseReport,
    medianIntervalS,
    largestGapS,
    gapCount,
    keptFromS: tStart - t0,
    keptToS: tEnd - t0,
  };
  if (bestEnd - bestStart < 1 || !(medianIntervalS > 0)) return { record: null, report };

  // 5. Linear interpolation onto t_k = tStart + k/rate.
  const rateHz = options.rateHz ?? 1 / medianIntervalS;
  const count = Math.floor((tEnd - tStart) * rateHz + 1e-9) + 1;
  const out = channels.map(() => new Float64Array(count));
  let j = bestStart;
  for (let k = 0; k < count; k++) {
    const t = tStart + k / rateHz;
    while (j < bestEnd - 1 && (timesS[kept[j + 1] as number] as number) <= t) j += 1;
    const ia = kept[j] as number;
    const ib = kept[Math.min(j + 1, bestEnd)] as number;
    const ta = timesS[ia] as number;
    const tb = timesS[ib] as number;
    const u = tb > ta ? Math.min(1, Math.max(0, (t - ta) / (tb - ta))) : 0;
    for (let c = 0; c < channels.length; c++) {
      const ch = channels[c] as Samples;
      const va = ch[ia] as number;
      const vb = ch[ib] as number;
      (out[c] as Float64Array)[k] = va + u * (vb - va);
    }
  }
  return { record: { rateHz, startS: tStart, channels: out, report }, report };
}
