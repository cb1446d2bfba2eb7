/**
 * A phone's ambient vibration record, start to finish: timestamps as delivered → cleaned and
 * resampled → each horizontal axis searched for its fundamental → the axes compared (the
 * same peak on both, coherent or not; a different peak on each) → the vertical axis used as
 * a check → the measured frequency the verdict reads, a stiffness-loss indicator against a
 * reference, and the caveats the inspector must see.
 *
 * Phone frame (W3C DeviceOrientation Event spec): x across the screen, y along the long
 * edge, z out of the screen. The phone lies flat, so x and y are horizontal.
 */
import type { Direction, MeasuredFrequencyInput } from '../survey/survey-input.js';
import type { Samples } from './checks.js';
import { requirePositive } from './checks.js';
import { detrend } from './detrend.js';
import { analyseFundamental, DEFAULT_BAND_HZ } from './fundamental.js';
import type { FundamentalAnalysis, FundamentalEstimate, NoEstimateReason } from './fundamental.js';
import { resampleToUniform } from './resample.js';
import type { ResampleReport } from './resample.js';
import { BROWSER_ACCELERATION_STEP_MPS2, quantizationStep } from './sensor-limits.js';
import { stiffnessLossIndicator } from './stiffness-indicator.js';
import type { StiffnessIndicator } from './stiffness-indicator.js';
import { defaultSegmentLength, welchCrossSpectrum } from './welch-psd.js';

/** Shortest record analysed, s. The recorder asks for 60–120 s. Our choice, no source. */
export const MIN_RECORD_S = 20;

/** Lowest sample rate analysed, Hz: keeps the 0.45·fs search limit above 4.5 Hz. Our choice. */
export const MIN_RATE_HZ = 10;

/** Coherence above which a peak seen on both horizontal axes counts as one coherent motion. Our choice, no source. */
export const COHERENT = 0.5;

/** Why there is no measured frequency, or 'estimate' when there is one. */
export type AmbientStatus =
  'estimate' | 'too-short' | 'rate-too-low' | 'below-resolution' | NoEstimateReason;

/** Things the inspector should know about a record (each has a sentence in the UI catalogue). */
export type AmbientCaveat =
  | 'phone-noise' // always: the phone's own noise may hide a stiff building's motion
  | 'browser-rounding' // readings arrive rounded (0.1 m/s² or coarser)
  | 'reordered' // timestamps arrived out of order
  | 'dropped-samples' // non-finite or repeated samples were dropped
  | 'gaps' // the record had gaps; the longest clean stretch was used
  | 'not-flat' // the phone was not lying flat
  | 'vertical-dominant' // the peak is as strong vertically: maybe a floor or machine, not sway
  | 'both-axes' // the peak shows on both horizontal axes
  | 'two-modes' // each horizontal axis has its own, different peak
  | 'damping-unresolved' // the peak is too narrow or too low for a half-power damping
  | 'empirical-reference'; // the reference frequency is a code-formula estimate

export type PhoneAxis = 'x' | 'y';

/** An estimate tied to a phone axis and (if known) a plan direction. */
export interface DirectionalEstimate extends FundamentalEstimate {
  axis: PhoneAxis | 'both';
  direction: Direction | null;
  /** Coherence of the two horizontal axes at the peak, 0..1. */
  crossAxisCoherence: number | null;
  /** PSD of the vertical axis over the horizontal PSD at the peak. */
  verticalRatio: number | null;
}

export interface AmbientRecordInput {
  /** Sample times, s. */
  timesS: Samples;
  /** accelerationIncludingGravity per phone axis, m/s². */
  x: Samples;
  y: Samples;
  z: Samples;
  /** Plan direction the phone's long edge points along (null: not noted). */
  longEdgeAlong?: Direction | null;
  /** Expected fundamental frequency, Hz, for the stiffness indicator. */
  referenceFrequencyHz?: number | null;
  /** Relative standard uncertainty of the reference (see EMPIRICAL_REFERENCE_SCATTER). */
  referenceRelativeUncertainty?: number | null;
  /** True when the reference is a code-formula estimate, not a measurement. */
  referenceIsEmpirical?: boolean;
  bandHz?: readonly [number, number];
}

/** A compact spectrum for display: band-limited, max-pooled to at most 200 points. */
export interface DisplaySpectrum {
  frequenciesHz: number[];
  /** PSD per phone axis, (m/s²)²/Hz. */
  x: number[];
  y: number[];
  z: number[];
}

export interface AxisSummary {
  estimate: FundamentalEstimate | null;
  reason: NoEstimateReason | null;
  /** RMS of the detrended axis, m/s². */
  rmsMps2: number;
  quantizationStepMps2: number | null;
}

export interface AmbientAnalysis {
  status: AmbientStatus;
  /** What the verdict reads (null when no clear peak). */
  measured: MeasuredFrequencyInput | null;
  estimate: DirectionalEstimate | null;
  /** The other horizontal axis's own fundamental, when it differs from `estimate`. */
  secondary: DirectionalEstimate | null;
  stiffness: StiffnessIndicator | null;
  sampleRateHz: number | null;
  /** Duration analysed, s. */
  durationS: number;
  resample: ResampleReport;
  axes: { x: AxisSummary | null; y: AxisSummary | null; z: AxisSummary | null };
  caveats: AmbientCaveat[];
  spectrum: DisplaySpectrum | null;
}

function rms(values: Float64Array): number {
  let ss = 0;
  for (let i = 0; i < values.length; i++) ss += (values[i] as number) ** 2;
  return values.length > 0 ? Math.sqrt(ss / values.length) : 0;
}

function directionOf(axis: PhoneAxis, longEdgeAlong: Direction | null): Direction | null {
  if (longEdgeAlong === null) return null;
  const other: Direction = longEdgeAlong === 'x' ? 'y' : 'x';
  return axis === 'y' ? longEdgeAlong : other;
}

function binOf(frequencies: Float64Array, f: number): number {
  const step = (frequencies[1] as number) - (frequencies[0] as number);
  return Math.min(frequencies.length - 1, Math.max(0, Math.round(f / step)));
}

function pooled(
  frequencies: Float64Array,
  series: Float64Array[],
  band: readonly [number, number],
): DisplaySpectrum {
  const MAX_POINTS = 200; // enough for a phone-wide plot (our choice)
  const lo = binOf(frequencies, band[0]);
  const hi = binOf(frequencies, band[1]);
  const width = Math.max(1, Math.ceil((hi - lo + 1) / MAX_POINTS));
  const out: DisplaySpectrum = { frequenciesHz: [], x: [], y: [], z: [] };
  const keys = ['x', 'y', 'z'] as const;
  for (let k = lo; k <= hi; k += width) {
    const end = Math.min(hi, k + width - 1);
    out.frequenciesHz.push(Number(((frequencies[k] as number) + (frequencies[end] as number)) / 2));
    keys.forEach((key, c) => {
      let m = 0;
      const s = series[c] as Float64Array;
      for (let j = k; j <= end; j++) m = Math.max(m, s[j] as number);
      out[key].push(m);
    });
  }
  return out;
}

/** The finite values of a raw channel, in the order given (for the rounding check). */
function finiteValues(values: Samples): number[] {
  const out: number[] = [];
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (typeof v === 'number' && Number.isFinite(v)) out.push(v);
  }
  return out;
}

function summary(
  analysis: FundamentalAnalysis,
  detrended: Float64Array,
  step: number | null,
): AxisSummary {
  return {
    estimate: analysis.estimate,
    reason: analysis.reason,
    rmsMps2: rms(detrended),
    quantizationStepMps2: step,
  };
}

/** Anything that is not array-like counts as an empty channel (the caller then gets 'too-short'). */
function asSamples(values: unknown): Samples {
  return values !== null &&
    typeof values === 'object' &&
    typeof (values as Samples).length === 'number'
    ? (values as Samples)
    : [];
}

/**
 * Analyses one ambient record. Never throws for bad data (NaN, disorder, repeats, gaps,
 * short or silent records): it returns a status and caveats. Throws only for a bad option.
 */
export function analyseAmbientRecord(input: AmbientRecordInput): AmbientAnalysis {
  const longEdgeAlong = input.longEdgeAlong ?? null;
  if (longEdgeAlong !== null && longEdgeAlong !== 'x' && longEdgeAlong !== 'y') {
    throw new RangeError(`longEdgeAlong must be 'x', 'y' or null, got ${String(longEdgeAlong)}`);
  }
  const reference = input.referenceFrequencyHz ?? null;
  if (reference !== null) requirePositive('referenceFrequencyHz', reference);
  const raw = {
    t: asSamples(input.timesS),
    x: asSamples(input.x),
    y: asSamples(input.y),
    z: asSamples(input.z),
  };
  const lengths = [raw.t.length, raw.x.length, raw.y.length, raw.z.length];
  const n = Math.min(...lengths);
  const cut = (s: Samples): Samples => (s.length === n ? s : Array.prototype.slice.call(s, 0, n));
  const { record, report } = resampleToUniform(cut(raw.t), [cut(raw.x), cut(raw.y), cut(raw.z)]);
  const caveats: AmbientCaveat[] = ['phone-noise'];
  if (report.reordered) caveats.push('reordered');
  if (report.droppedNonFinite + report.droppedDuplicate > 0 || lengths.some((l) => l !== n)) {
    caveats.push('dropped-samples');
  }
  if (report.gapCount > 0) caveats.push('gaps');
  const empty = (status: AmbientStatus, extra: Partial<AmbientAnalysis> = {}): AmbientAnalysis => ({
    status,
    measured: null,
    estimate: null,
    secondary: null,
    stiffness: null,
    sampleRateHz: record?.rateHz ?? null,
    durationS: record ? (record.channels[0]?.length ?? 0) / record.rateHz : 0,
    resample: report,
    axes: { x: null, y: null, z: null },
    caveats,
    spectrum: null,
    ...extra,
  });
  if (!record) return empty('too-short');
  const fs = record.rateHz;
  const [cx, cy, cz] = record.channels as [Float64Array, Float64Array, Float64Array];
  const durationS = cx.length / fs;
  if (fs < MIN_RATE_HZ) return empty('rate-too-low');
  if (durationS < MIN_RECORD_S) return empty('too-short');

  const meanZ = cz.reduce((s, v) => s + v, 0) / cz.length;
  const meanX = cx.reduce((s, v) => s + v, 0) / cx.length;
  const meanY = cy.reduce((s, v) => s + v, 0) / cy.length;
  const FLAT_COS = Math.cos((10 * Math.PI) / 180); // within 10° of flat; our choice
  if (Math.abs(meanZ) < FLAT_COS * Math.hypot(meanX, meanY, meanZ)) caveats.push('not-flat');

  const band = input.bandHz ?? DEFAULT_BAND_HZ;
  const rawSteps = {
    x: quantizationStep(finiteValues(raw.x)),
    y: quantizationStep(finiteValues(raw.y)),
    z: quantizationStep(finiteValues(raw.z)),
  };
  const dx = detrend(cx, 'linear');
  const dy = detrend(cy, 'linear');
  const dz = detrend(cz, 'linear');
  const ax = analyseFundamental(dx, fs, { bandHz: band, quantizationStep: rawSteps.x });
  const ay = analyseFundamental(dy, fs, { bandHz: band, quantizationStep: rawSteps.y });
  const az = analyseFundamental(dz, fs, { bandHz: band, quantizationStep: rawSteps.z });
  const axes = {
    x: summary(ax, dx, rawSteps.x),
    y: summary(ay, dy, rawSteps.y),
    z: summary(az, dz, rawSteps.z),
  };
  const steps = [axes.x, axes.y, axes.z].map((a) => a.quantizationStepMps2 ?? 0);
  const ROUNDING_SHARE = 0.5; // a step of half the browser's rounding or more counts as rounding (our choice)
  if (Math.max(...steps) >= ROUNDING_SHARE * BROWSER_ACCELERATION_STEP_MPS2)
    caveats.push('browser-rounding');

  const cross = welchCrossSpectrum(dx, dy, fs, {
    segmentLength: defaultSegmentLength(dx.length),
    nfft: 2 * defaultSegmentLength(dx.length),
  });
  const spectrum =
    ax.spectrum && ay.spectrum && az.spectrum && ax.bandHz
      ? pooled(
          ax.spectrum.frequencies,
          [ax.spectrum.psd, ay.spectrum.psd, az.spectrum.psd],
          ax.bandHz,
        )
      : null;
  const base = { sampleRateHz: fs, durationS, axes, spectrum };

  // Rounding hides motion smaller than about a step: nothing on either axis is real then.
  const hidden = (a: FundamentalAnalysis) => a.reason === 'below-resolution';
  if (hidden(ax) && hidden(ay)) return empty('below-resolution', base);

  const ex = ax.estimate;
  const ey = ay.estimate;
  if (!ex && !ey) {
    const reasons = [ax.reason, ay.reason];
    const status: AmbientStatus = reasons.includes('no-clear-peak')
      ? 'no-clear-peak'
      : reasons.includes('below-resolution')
        ? 'below-resolution'
        : reasons.includes('no-signal')
          ? 'no-signal'
          : 'too-short';
    return empty(status, base);
  }

  const freqs = cross.frequencies;
  const coherenceAt = (f: number) => cross.coherence[binOf(freqs, f)] as number;
  const verticalAt = (f: number, horizontal: Float64Array): number | null => {
    if (!az.spectrum) return null;
    const k = binOf(az.spectrum.frequencies, f);
    const h = horizontal[k] as number;
    return h > 0 ? (az.spectrum.psd[k] as number) / h : null;
  };
  const psdX = (ax.spectrum as NonNullable<typeof ax.spectrum>).psd;
  const psdY = (ay.spectrum as NonNullable<typeof ay.spectrum>).psd;
  const directional = (e: FundamentalEstimate, axis: PhoneAxis): DirectionalEstimate => ({
    ...e,
    axis,
    direction: directionOf(axis, longEdgeAlong),
    crossAxisCoherence: coherenceAt(e.frequencyHz),
    verticalRatio: verticalAt(e.frequencyHz, axis === 'x' ? psdX : psdY),
  });

  let primary: DirectionalEstimate;
  let secondary: DirectionalEstimate | null = null;
  if (ex && ey) {
    const kernel = (ax.spectrum as NonNullable<typeof ax.spectrum>).kernelHalfPowerWidthHz;
    const SAME_SHARE = 0.03; // peaks within 3 % (or one kernel width) are the same peak; our choice
    const same =
      Math.abs(ex.frequencyHz - ey.frequencyHz) <=
      Math.max(kernel, SAME_SHARE * Math.min(ex.frequencyHz, ey.frequencyHz));
    if (same) {
      caveats.push('both-axes');
      const wx = ex.significance;
      const wy = ey.significance;
      const frequencyHz = (ex.frequencyHz * wx + ey.frequencyHz * wy) / (wx + wy);
      const gamma = coherenceAt(frequencyHz);
      // Coherent: two looks at one motion, independent noise, so the evidence adds
      // (1 − (1 − c_x)(1 − c_y)); incoherent: two close modes or noise, take the better.
      const confidence =
        gamma >= COHERENT
          ? 1 - (1 - ex.confidence) * (1 - ey.confidence)
          : Math.max(ex.confidence, ey.confidence);
      const stronger = ex.peakPsd >= ey.peakPsd ? ex : ey;
      const DOMINANT = 2; // one axis carries twice the power: the motion is along it (3 dB; our choice)
      const ratio = ex.peakPsd / ey.peakPsd;
      const axis: PhoneAxis | 'both' =
        ratio >= DOMINANT ? 'x' : ratio <= 1 / DOMINANT ? 'y' : 'both';
      const damping = [ex.dampingRatio, ey.dampingRatio].filter((d): d is number => d !== null);
      const fu = [ex.frequencyUncertaintyHz, ey.frequencyUncertaintyHz].filter(
        (u): u is number => u !== null,
      );
      primary = {
        ...stronger,
        frequencyHz,
        confidence,
        dampingRatio:
          damping.length > 0 ? damping.reduce((s, d) => s + d, 0) / damping.length : null,
        frequencyUncertaintyHz: fu.length > 0 ? Math.min(...fu) : null,
        axis,
        direction: axis === 'both' ? null : directionOf(axis, longEdgeAlong),
        crossAxisCoherence: gamma,
        verticalRatio: verticalAt(frequencyHz, stronger === ex ? psdX : psdY),
      };
    } else {
      caveats.push('two-modes');
      const [low, high] = ex.frequencyHz < ey.frequencyHz ? [ex, ey] : [ey, ex];
      primary = directional(low, low === ex ? 'x' : 'y');
      secondary = directional(high, high === ex ? 'x' : 'y');
    }
  } else {
    primary = ex ? directional(ex, 'x') : directional(ey as FundamentalEstimate, 'y');
  }

  const VERTICAL_PENALTY = 0.5; // as strong vertically: halve the confidence (our choice, no source)
  if (primary.verticalRatio !== null && primary.verticalRatio >= 1) {
    caveats.push('vertical-dominant');
    primary = { ...primary, confidence: primary.confidence * VERTICAL_PENALTY };
  }
  if (primary.dampingRatio === null) caveats.push('damping-unresolved');
  let stiffness: StiffnessIndicator | null = null;
  if (reference !== null) {
    stiffness = stiffnessLossIndicator({
      frequencyHz: primary.frequencyHz,
      frequencyUncertaintyHz: primary.frequencyUncertaintyHz,
      referenceFrequencyHz: reference,
      referenceRelativeUncertainty: input.referenceRelativeUncertainty ?? null,
    });
    if (input.referenceIsEmpirical) caveats.push('empirical-reference');
  }
  return {
    status: 'estimate',
    measured: {
      frequencyHz: primary.frequencyHz,
      dampingRatio: primary.dampingRatio,
      confidence: primary.confidence,
      direction: primary.direction,
    },
    estimate: primary,
    secondary,
    stiffness,
    resample: report,
    caveats,
    ...base,
  };
}
