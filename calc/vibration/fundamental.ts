/**
 * The building's fundamental frequency from one channel of ambient acceleration:
 * 1. detrend; Welch PSD (Hann, half overlap, zero-padded ×2);
 * 2. peaks on the decibel scale; each peak's prominence — its height over the median of the
 *    surrounding spectrum (an octave either side, the peak's own half-power core left out)
 *    — judged against the known scatter of a Welch estimate (spectral-scatter.ts):
 *    detection and confidence;
 * 3. the chosen peak refined by a maximum-likelihood SDOF fit to the raw periodogram of the
 *    whole record (sdof-fit.ts): frequency, and damping from the half-power bandwidth of the
 *    fitted peak, with standard errors.
 *
 * When no peak stands clearly above the scatter, the answer is null: a phone on a quiet
 * floor records mostly its own sensor noise, and an invented frequency is worse than none.
 */
import { requireFiniteSamples, requirePositive } from './checks.js';
import type { Samples } from './checks.js';
import { detrend } from './detrend.js';
import { quantizationStep } from './sensor-limits.js';
import { halfPowerBand, dampingFromBandwidth } from './half-power.js';
import { fitSdofPeak, periodogram } from './sdof-fit.js';
import { findPeaks } from './peaks.js';
import type { Peak } from './peaks.js';
import { spectralScatterDb } from './spectral-scatter.js';
import { defaultSegmentLength, welchPsd } from './welch-psd.js';
import type { WelchPsd } from './welch-psd.js';
import type { WindowKind } from './window.js';

/** Default search band, Hz: from 0.5 Hz (a tall, flexible timber building) to 25 Hz. */
export const DEFAULT_BAND_HZ: readonly [number, number] = [0.5, 25]; // our choice: low-rise timber buildings sway at roughly 1–15 Hz (EN 1998-1 eq. 4.6 gives 5.2 Hz at 6 m, 2.1 Hz at 20 m; derived)

/**
 * A peak counts only if its prominence is at least this many standard deviations of the
 * PSD's own scatter (spectralScatterDb). For Gaussian noise the upper tail of a Welch
 * value on the dB scale is very light (ν ≈ 19: P(> 5σ) < 1e-9 per bin; derived from χ²_ν).
 * Over 2,000 seeded noise-only phone records (white noise, drift up to 0.03 m/s², 16-bit
 * rounding; 60, 90 and 120 s; 60 and 100 Hz) the largest prominence seen was 4.3σ, so 5σ
 * leaves a margin; test/reference/vibration-fundamental.test.ts repeats a share of them.
 * Our choice, tuned, no source.
 */
export const DETECTION_SIGMA = 5;

/** Prominence, in scatter units, at which the prominence part of the confidence reaches 1. Our choice, no source. */
export const FULL_CONFIDENCE_SIGMA = 12;

/**
 * A peak must also rise this many scatter units above the valleys that separate it from
 * higher ground (its topographic prominence, peaks.ts); a bump on the flank of a larger
 * peak is part of that peak, not a mode of its own. Our choice, no source.
 */
export const SEPARATION_SIGMA = 3;

/** How many of the topographically most prominent maxima are examined. Our choice: real peaks are always among them. */
const MAX_EXAMINED = 24;

/** A segment must span at least this many cycles of the lowest frequency searched. Our choice (common practice, no source). */
export const MIN_CYCLES_PER_SEGMENT = 5;

/** Fewer samples than this cannot hold a spectrum worth searching. Our choice, no source. */
export const MIN_SAMPLES = 64;

/** Options of `identifyFundamental`; all have defaults. */
export interface FundamentalOptions {
  /** Frequency band searched, Hz. Default DEFAULT_BAND_HZ, capped at 45 % of the sample rate. */
  bandHz?: readonly [number, number];
  /** Welch segment length, samples. Default: defaultSegmentLength(n). */
  segmentLength?: number;
  /** Welch overlap fraction. Default 0.5. */
  overlap?: number;
  window?: WindowKind;
  /** Zero padding: transform length = padFactor × segment length. Default 2. */
  padFactor?: number;
  /** Detection threshold in scatter units. Default DETECTION_SIGMA. */
  detectionSigma?: number;
  /**
   * Rounding step of the readings, same unit as the samples; null when they are not rounded.
   * Default: detected from the samples (which resampled data hides, so pass it then).
   */
  quantizationStep?: number | null;
}

/** The estimate `identifyFundamental` returns. */
export interface FundamentalEstimate {
  frequencyHz: number;
  /** Half-power damping ratio, or null when the peak is too narrow or too low to measure it. */
  dampingRatio: number | null;
  /** 0..1: from the peak's prominence over the spectrum's scatter, lowered when other peaks compete. */
  confidence: number;
  /** Standard error of the frequency from the fit's likelihood curvature, Hz (null without a fit). */
  frequencyUncertaintyHz: number | null;
  /** Standard error of the fitted damping (null when damping is null). */
  dampingUncertainty: number | null;
  /** Prominence: the peak's height over the median of the surrounding spectrum, dB. */
  prominenceDb: number;
  /** Prominence over the PSD's scatter (dimensionless). */
  significance: number;
  /** Half-power band of the fitted peak, Hz; null without a fit. */
  halfPowerBandHz: readonly [number, number] | null;
  /** PSD at the peak, (input unit)²/Hz. */
  peakPsd: number;
  /** Number of other peaks in the band that also passed the threshold. */
  competingPeaks: number;
  /** True when the SDOF fit refined the Welch peak (false: Welch peak only, no damping). */
  refined: boolean;
}

/** Why there is no estimate. */
export type NoEstimateReason = 'too-short' | 'no-signal' | 'below-resolution' | 'no-clear-peak';

/** A significant peak, for display and for cross-axis checks. */
export interface PeakCandidate {
  frequencyHz: number;
  prominenceDb: number;
  significance: number;
}

/** Everything the identification looked at. */
export interface FundamentalAnalysis {
  estimate: FundamentalEstimate | null;
  reason: NoEstimateReason | null;
  /** The Welch spectrum of the detrended record (null when too short). */
  spectrum: WelchPsd | null;
  /** Band actually searched, Hz (the low end rises for short records). */
  bandHz: readonly [number, number] | null;
  /** Peaks that passed the threshold, by frequency. */
  candidates: PeakCandidate[];
  /** Standard deviation of the PSD values on the dB scale. */
  scatterDb: number | null;
}

const TINY = 1e-300; // keeps log10 finite on an exactly zero bin

/** 10·log10 of psd over [lo, hi], others left 0. */
function toDb(psd: Float64Array, lo: number, hi: number, floor: number): Float64Array {
  const out = new Float64Array(psd.length);
  for (let k = lo; k <= hi; k++) out[k] = 10 * Math.log10(Math.max(psd[k] as number, floor));
  return out;
}

/** Median of a list (sorted copy). */
function medianOf(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[s.length >> 1] as number;
}

/**
 * The spectrum's level around a peak, dB: the mean of two medians, of the octave below and
 * of the octave above the peak (so a sloping 1/f background is met at the peak, not a
 * quarter-octave above it), first over all bins, then again without the peak's core (its
 * half-power width above that first level, widened by half on each side), so a broad,
 * well-damped peak does not raise its own background. Our choice, no source; the noise-only
 * statistics behind DETECTION_SIGMA were measured with exactly this background.
 */
function localBackgroundDb(
  db: Float64Array,
  peak: number,
  lo: number,
  hi: number,
  binHz: number,
): number {
  const f = peak * binHz;
  const k1 = Math.max(lo, Math.ceil(f / 2 / binHz));
  const k2 = Math.min(hi, Math.floor((2 * f) / binHz));
  // Both octaves must hold this many bins, else the peak sits too close to the band's edge to
  // be judged (one side alone is biased on a sloping background). Our choice, no source.
  const MIN_SIDE = 8;
  const level = (skipFrom: number, skipTo: number): number | null => {
    const left: number[] = [];
    const right: number[] = [];
    for (let k = k1; k < peak; k++) if (k < skipFrom || k > skipTo) left.push(db[k] as number);
    for (let k = peak + 1; k <= k2; k++)
      if (k < skipFrom || k > skipTo) right.push(db[k] as number);
    if (left.length < MIN_SIDE || right.length < MIN_SIDE) return null;
    return (medianOf(left) + medianOf(right)) / 2;
  };
  const first = level(peak, peak);
  if (first === null) return db[peak] as number; // no room to judge: the peak does not count
  const top = db[peak] as number;
  // Half power above the background, in dB: 10·log10((P_top + P_bg)/2).
  const half = 10 * Math.log10((10 ** (top / 10) + 10 ** (first / 10)) / 2);
  let a = peak;
  let b = peak;
  while (a - 1 >= k1 && (db[a - 1] as number) >= half) a -= 1;
  while (b + 1 <= k2 && (db[b + 1] as number) >= half) b += 1;
  const widen = Math.ceil((b - a) / 2);
  // Without room for both octaves once the core is left out, keep the first level.
  return level(a - widen, b + widen) ?? first;
}

/** Refined peak position (fractional bin index) by a least-squares parabola over the top 3 dB. */
function refinePeak(db: Float64Array, peak: number, lo: number, hi: number): number {
  const TOP_DB = 3; // the half-power region (3.01 dB ≈ half power, definition of the decibel)
  const MAX_HALF_WIDTH = 40; // bins; bounds the work on a very broad peak (our choice)
  const top = db[peak] as number;
  let a = peak;
  while (a - 1 >= lo && peak - (a - 1) <= MAX_HALF_WIDTH && (db[a - 1] as number) >= top - TOP_DB)
    a -= 1;
  let b = peak;
  while (b + 1 <= hi && b + 1 - peak <= MAX_HALF_WIDTH && (db[b + 1] as number) >= top - TOP_DB)
    b += 1;
  if (a === peak && peak - 1 >= lo) a = peak - 1;
  if (b === peak && peak + 1 <= hi) b = peak + 1;
  if (b - a < 2) return peak;
  // Normal equations of y = c0 + c1·u + c2·u², u = k − peak.
  let s0 = 0;
  let s1 = 0;
  let s2 = 0;
  let s3 = 0;
  let s4 = 0;
  let t0 = 0;
  let t1 = 0;
  let t2 = 0;
  for (let k = a; k <= b; k++) {
    const u = k - peak;
    const y = db[k] as number;
    const u2 = u * u;
    s0 += 1;
    s1 += u;
    s2 += u2;
    s3 += u2 * u;
    s4 += u2 * u2;
    t0 += y;
    t1 += u * y;
    t2 += u2 * y;
  }
  // Solve the 3×3 system by Cramer's rule (well conditioned: u is centred on the peak).
  const det = s0 * (s2 * s4 - s3 * s3) - s1 * (s1 * s4 - s3 * s2) + s2 * (s1 * s3 - s2 * s2);
  if (det === 0) return peak;
  const c1 = (s0 * (t1 * s4 - s3 * t2) - t0 * (s1 * s4 - s3 * s2) + s2 * (s1 * t2 - t1 * s2)) / det;
  const c2 = (s0 * (s2 * t2 - t1 * s3) - s1 * (s1 * t2 - t1 * s2) + t0 * (s1 * s3 - s2 * s2)) / det;
  if (!(c2 < 0)) return peak;
  const vertex = -c1 / (2 * c2);
  if (!(vertex >= a - peak && vertex <= b - peak)) return peak;
  return peak + vertex;
}

/**
 * A rough damping from the Welch peak's half-power width (smeared by the window, so on the
 * high side): only the fit's starting point and the width of its band.
 */
function roughDamping(
  frequencies: Float64Array,
  psd: Float64Array,
  peak: Peak,
  fHz: number,
): number | null {
  const peakPsd = psd[peak.index] as number;
  // Background under the peak: geometric mean of its two bases (a sloping 1/f floor is met
  // halfway); our choice, no source.
  const background = Math.sqrt(
    Math.max(psd[peak.leftBase] as number, 0) * Math.max(psd[peak.rightBase] as number, 0),
  );
  const hp =
    peakPsd > background ? halfPowerBand(frequencies, psd, peak.index, peakPsd, background) : null;
  return hp && fHz > 0 ? dampingFromBandwidth(fHz, hp.bandwidthHz) : null;
}

/**
 * Full analysis behind `identifyFundamental`: the estimate or the reason there is none,
 * the spectrum, the band searched and every significant peak.
 *
 * @param samples uniformly sampled acceleration of one axis, any unit (m/s² from the phone)
 * @param sampleRateHz sample rate of `samples`
 */
export function analyseFundamental(
  samples: Samples,
  sampleRateHz: number,
  options: FundamentalOptions = {},
): FundamentalAnalysis {
  requireFiniteSamples('samples', samples);
  const fs = requirePositive('sampleRateHz', sampleRateHz);
  const [bandLo, bandHi] = options.bandHz ?? DEFAULT_BAND_HZ;
  requirePositive('options.bandHz[0]', bandLo);
  requirePositive('options.bandHz[1]', bandHi);
  if (!(bandHi > bandLo)) {
    throw new RangeError(`options.bandHz must be increasing, got [${bandLo}, ${bandHi}]`);
  }
  const padFactor = options.padFactor ?? 2;
  if (!Number.isInteger(padFactor) || padFactor < 1 || padFactor > 16) {
    throw new RangeError(
      `options.padFactor must be an integer from 1 to 16, got ${String(padFactor)}`,
    );
  }
  const detectionSigma = requirePositive(
    'options.detectionSigma',
    options.detectionSigma ?? DETECTION_SIGMA,
  );
  const none = (
    reason: NoEstimateReason,
    spectrum: WelchPsd | null = null,
    bandHz: readonly [number, number] | null = null,
  ): FundamentalAnalysis => ({
    estimate: null,
    reason,
    spectrum,
    bandHz,
    candidates: [],
    scatterDb: spectrum ? spectralScatterDb(spectrum.degreesOfFreedom) : null,
  });
  const n = samples.length;
  if (n < MIN_SAMPLES) return none('too-short');

  const x = detrend(samples, 'linear');
  // A record that never changes (beyond floating-point dust) has no spectrum to search.
  let scale = 0;
  let ss = 0;
  for (let i = 0; i < n; i++) {
    scale = Math.max(scale, Math.abs(samples[i] as number));
    ss += (x[i] as number) ** 2;
  }
  const DUST = 1e-12; // relative size of rounding residue after detrending (our choice)
  if (!(Math.sqrt(ss / n) > DUST * Math.max(1, scale))) return none('no-signal');
  const segmentLength = options.segmentLength ?? defaultSegmentLength(n);
  const welch = welchPsd(x, fs, {
    segmentLength,
    overlap: options.overlap ?? 0.5,
    window: options.window ?? 'hann',
    detrend: 'constant',
    nfft: segmentLength * padFactor,
  });
  const { frequencies, psd } = welch;
  const spectrum = welch;
  const binHz = welch.binSpacingHz;
  // The low end rises when a segment is too short to hold enough cycles.
  const lowHz = Math.max(bandLo, (MIN_CYCLES_PER_SEGMENT * fs) / segmentLength);
  const NYQUIST_SHARE = 0.45; // stay clear of the anti-alias roll-off near fs/2 (our choice)
  const highHz = Math.min(bandHi, NYQUIST_SHARE * fs);
  const lo = Math.ceil(lowHz / binHz);
  const hi = Math.min(psd.length - 2, Math.floor(highHz / binHz));
  if (!(hi - lo >= 4 * padFactor)) return none('too-short', spectrum);
  const bandHz = [lo * binHz, hi * binHz] as const;

  let maxPsd = 0;
  let bandPower = 0;
  for (let k = lo; k <= hi; k++) {
    maxPsd = Math.max(maxPsd, psd[k] as number);
    bandPower += (psd[k] as number) * binHz;
  }
  // Rounded readings: the rounding adds noise of power step²/12 (Widrow & Kollár, Quantization
  // Noise, 2008) that is not Gaussian (a slow drift crossing a level makes a step, and steps
  // make peaks). Unless the motion in the band is at least one step RMS — rounding noise then
  // ≤ 1/12 of the power — the spectrum is the rounding's, not the building's. Our choice.
  const step =
    options.quantizationStep === undefined ? quantizationStep(samples) : options.quantizationStep;
  if (step !== null && Math.sqrt(bandPower) < step) {
    return none('below-resolution', spectrum, [lo * binHz, hi * binHz]);
  }
  if (!(maxPsd > 0)) return none('no-signal', spectrum, bandHz);
  const floor = Math.max(TINY, maxPsd * 1e-20);

  const db = toDb(psd, lo, hi, floor);
  const scatterDb = spectralScatterDb(welch.degreesOfFreedom);
  const examined = findPeaks(db, lo, hi)
    .sort((p, q) => q.prominence - p.prominence)
    .slice(0, MAX_EXAMINED)
    .map((p) => ({
      peak: p,
      height: (db[p.index] as number) - localBackgroundDb(db, p.index, lo, hi, binHz),
    }))
    .sort((p, q) => p.peak.index - q.peak.index);
  const significant = examined.filter(
    (e) =>
      e.height / scatterDb >= detectionSigma && e.peak.prominence / scatterDb >= SEPARATION_SIGMA,
  );
  const candidates: PeakCandidate[] = significant.map((e) => ({
    frequencyHz: e.peak.index * binHz,
    prominenceDb: e.height,
    significance: e.height / scatterDb,
  }));
  if (significant.length === 0) {
    return { estimate: null, reason: 'no-clear-peak', spectrum, bandHz, candidates, scatterDb };
  }
  const kernelHz = welch.kernelHalfPowerWidthHz;
  const DEFAULT_GUESS_DAMPING = 0.03; // a typical ambient damping of timber buildings, only a starting point (from memory, verify)
  const MIN_GUESS_DAMPING = 0.003; // our choice: keeps the fit's first simplex off a spike
  type Found = (typeof significant)[number];
  const all = significant.map((e: Found) => {
    const fHz = refinePeak(db, e.peak.index, lo, hi) * binHz;
    const rough = roughDamping(frequencies, psd, e.peak, fHz);
    const z0 = Math.max(MIN_GUESS_DAMPING, Math.min(0.2, rough ?? DEFAULT_GUESS_DAMPING));
    return { ...e, fHz, z0 };
  });
  type Located = (typeof all)[number];
  const pg = periodogram(x, fs);
  // Fit band: ±6ζ around the peak (the resonance's tails), 10–45 % of f wide, inside the
  // search band, cut halfway to any peak known to be separate. Our choice, no source.
  const fitFor = (e: Located, separate: readonly Located[]) => {
    const WIDE_DAMPING = 0.04; // the band is never narrower than for ζ = 4 % (±24 %), our choice
    const half = Math.min(0.45, 6 * Math.max(e.z0, WIDE_DAMPING)) * e.fHz;
    let fitLo = Math.max(bandHz[0], e.fHz - half);
    let fitHi = Math.min(bandHz[1], e.fHz + half);
    for (const o of separate) {
      if (o.fHz < e.fHz) fitLo = Math.max(fitLo, (o.fHz + e.fHz) / 2);
      else fitHi = Math.min(fitHi, (o.fHz + e.fHz) / 2);
    }
    // Several starting dampings; the likeliest fit wins (a rough Welch width can mislead).
    const STARTS = [e.z0, 0.02, 0.06]; // our choice: light, typical and heavy damping
    let fit: ReturnType<typeof fitSdofPeak> = null;
    for (const z of STARTS) {
      const f = fitSdofPeak(pg, { frequencyHz: e.fHz, dampingRatio: z }, [fitLo, fitHi]);
      if (f && (!fit || f.negativeLogLikelihood < fit.negativeLogLikelihood)) fit = f;
    }
    return { fit, band: [fitLo, fitHi] as const };
  };
  // Peaks closer than this belong to one resonance: three half-power widths of the fitted
  // peak (a noisy, well-damped peak shows several bumps), at least two kernel widths. Our choice.
  const REACH_WIDTHS = 3;
  type Fitted = { fit: ReturnType<typeof fitSdofPeak>; reach: number; separate: Located[] };
  /** Fits a peak, finds which candidates are separate from it, refits if one fell inside its band. */
  const resolvePeak = (e: Located, known: readonly Located[]): Fitted => {
    let { fit, band } = fitFor(e, known);
    const reachOf = (ft: typeof fit) =>
      Math.max(
        REACH_WIDTHS * 2 * (ft ? ft.modelDampingRatio * ft.frequencyHz : e.z0 * e.fHz),
        2 * kernelHz,
      );
    let reach = reachOf(fit);
    const centre = fit ? fit.frequencyHz : e.fHz;
    const separate = all.filter((o) => o !== e && Math.abs(o.fHz - centre) > reach);
    if (separate.some((o) => o.fHz > band[0] && o.fHz < band[1] && !known.includes(o))) {
      ({ fit, band } = fitFor(e, separate));
      reach = reachOf(fit);
    }
    return { fit, reach, separate };
  };
  const tallest = all.reduce((p, q) => (q.height > p.height ? q : p));
  const tallestResolved = resolvePeak(tallest, []);
  // The fundamental is the tallest peak, unless a separate peak below it is at least half as
  // tall (in dB): the fundamental mode usually dominates the top storey's motion, but a
  // taller peak above a clear lower one is more likely a higher or local mode. Our choice.
  const COMPETITOR_SHARE = 0.5;
  const tallestHz = tallestResolved.fit ? tallestResolved.fit.frequencyHz : tallest.fHz;
  const lower = tallestResolved.separate.filter(
    (e) => e.fHz < tallestHz && e.height >= COMPETITOR_SHARE * tallest.height,
  );
  const pick = lower.length > 0 ? (lower[0] as Located) : tallest;
  const resolved = pick === tallest ? tallestResolved : resolvePeak(pick, [tallest]);
  const fit = resolved.fit;
  const separate = resolved.separate;
  const welchHz = pick.fHz;
  const chosen = pick.peak;
  const rival = Math.max(0, ...separate.map((e) => e.height));

  const significance = pick.height / scatterDb;
  const prominencePart = Math.min(
    1,
    Math.max(0, (significance - detectionSigma) / (FULL_CONFIDENCE_SIGMA - detectionSigma)),
  );
  // A rival as prominent as the chosen peak halves the confidence (our choice, no source).
  const RIVAL_PENALTY = 0.5;
  const rivalPart = 1 - RIVAL_PENALTY * Math.min(1, rival / pick.height);
  const confidence = Math.max(0, Math.min(1, prominencePart * rivalPart));

  return {
    estimate: {
      frequencyHz: fit ? fit.frequencyHz : welchHz,
      dampingRatio: fit ? fit.halfPowerDampingRatio : null,
      confidence,
      frequencyUncertaintyHz: fit ? fit.frequencyUncertaintyHz : null,
      dampingUncertainty: fit && fit.halfPowerDampingRatio !== null ? fit.dampingUncertainty : null,
      prominenceDb: pick.height,
      significance,
      halfPowerBandHz: fit ? fit.halfPowerBandHz : null,
      peakPsd: psd[chosen.index] as number,
      competingPeaks: separate.length,
      refined: fit !== null,
    },
    reason: null,
    spectrum,
    bandHz,
    candidates,
    scatterDb,
  };
}

/**
 * The fundamental frequency (Hz), half-power damping ratio and a 0..1 confidence of a
 * uniformly sampled ambient acceleration record, or null when no clear peak exists (or
 * the record is too short, or silent). Throws on non-finite samples or a bad sample rate.
 */
export function identifyFundamental(
  samples: Samples,
  sampleRateHz: number,
  options: FundamentalOptions = {},
): FundamentalEstimate | null {
  return analyseFundamental(samples, sampleRateHz, options).estimate;
}
