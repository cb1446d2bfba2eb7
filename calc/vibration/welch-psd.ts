/**
 * Power spectral density by Welch's method of averaged, windowed, overlapping periodograms
 * (Welch 1967, "The use of fast Fourier transform for the estimation of power spectra",
 * IEEE Trans. Audio Electroacoust. AU-15(2):70–73), and the cross-spectral density and
 * magnitude-squared coherence of two channels built the same way.
 *
 * Scaling is the one-sided density: Σ psd·Δf over all bins equals the mean square of the
 * (detrended, windowed-and-renormalised) signal, units (input unit)²/Hz. The DC bin and, for
 * even transform lengths, the Nyquist bin are not doubled.
 */
import {
  previousPowerOfTwo,
  requireFiniteSamples,
  requireIntegerIn,
  requirePositive,
} from './checks.js';
import type { Samples } from './checks.js';
import { removeLineInPlace, removeMeanInPlace } from './detrend.js';
import type { DetrendKind } from './detrend.js';
import { realFftPlan } from './fft.js';
import { windowCoefficients, windowProperties } from './window.js';
import type { WindowKind } from './window.js';

/** Choices of the Welch estimate; every one has a default. */
export interface WelchOptions {
  /** Samples per segment. Default: the largest power of two that leaves ≥ 8 segments. */
  segmentLength?: number;
  /** Overlap as a fraction of the segment, 0 ≤ overlap < 1. Default 0.5. */
  overlap?: number;
  /** Data window. Default 'hann'. */
  window?: WindowKind;
  /** Trend removed from each segment before windowing. Default 'constant'. */
  detrend?: DetrendKind;
  /** Transform length ≥ segmentLength (zero padding refines the frequency grid). Default: segmentLength. */
  nfft?: number;
}

/** A Welch spectrum and the facts needed to judge it. */
export interface WelchPsd {
  /** Bin frequencies in Hz, 0 to fs/2. */
  frequencies: Float64Array;
  /** One-sided power spectral density, (input unit)²/Hz. */
  psd: Float64Array;
  segmentCount: number;
  segmentLength: number;
  nfft: number;
  /** Samples shared by consecutive segments. */
  overlapSamples: number;
  window: WindowKind;
  /** Spacing of the frequency grid, fs/nfft, in Hz. */
  binSpacingHz: number;
  /** Resolution of one segment, fs/segmentLength, in Hz. */
  resolutionHz: number;
  /** Full width at half power of the window's kernel, in Hz: no peak is narrower than this. */
  kernelHalfPowerWidthHz: number;
  /**
   * Equivalent degrees of freedom ν of each PSD value (a scaled χ²_ν variable for a
   * stationary Gaussian input), from Welch 1967's variance formula for overlapped segments.
   */
  degreesOfFreedom: number;
}

/**
 * The default segment length: the largest power of two L with at least 8 half-overlapping
 * segments in n samples (n ≥ 4.5·L), at least 8 and at most n. Eight averages keep the
 * scatter of each PSD value near ±1.5 dB; our choice (common practice, no source).
 */
export function defaultSegmentLength(n: number): number {
  requireIntegerIn('n', n, 1, 2 ** 30);
  const MIN_SEGMENTS_FACTOR = 4.5; // 8 segments at 50 % overlap need (8 + 1)/2 = 4.5 lengths
  const candidate = previousPowerOfTwo(Math.max(1, Math.floor(n / MIN_SEGMENTS_FACTOR)));
  return Math.min(n, Math.max(8, candidate));
}

/** Resolved settings shared by the auto- and cross-spectrum. */
interface Setup {
  n: number;
  fs: number;
  segmentLength: number;
  nfft: number;
  step: number;
  segmentCount: number;
  window: WindowKind;
  detrend: DetrendKind;
  w: Float64Array;
  sumSquares: number;
  halfPowerWidthBins: number;
  degreesOfFreedom: number;
}

function resolve(n: number, sampleRateHz: number, options: WelchOptions): Setup {
  const fs = requirePositive('sampleRateHz', sampleRateHz);
  if (n < 4) throw new RangeError(`samples must hold at least 4 values, got ${n}`);
  const segmentLength = requireIntegerIn(
    'options.segmentLength',
    options.segmentLength ?? defaultSegmentLength(n),
    4,
    n,
  );
  const overlap = options.overlap ?? 0.5; // Welch 1967 recommends half overlap with a data window
  if (typeof overlap !== 'number' || !(overlap >= 0 && overlap < 1)) {
    throw new RangeError(`options.overlap must be a number in [0, 1), got ${String(overlap)}`);
  }
  const nfft = requireIntegerIn(
    'options.nfft',
    options.nfft ?? segmentLength,
    segmentLength,
    2 ** 24,
  );
  const window = options.window ?? 'hann';
  const detrend = options.detrend ?? 'constant';
  if (detrend !== 'none' && detrend !== 'constant' && detrend !== 'linear') {
    throw new RangeError(
      `options.detrend must be 'none', 'constant' or 'linear', got ${String(detrend)}`,
    );
  }
  const overlapSamples = Math.min(segmentLength - 1, Math.floor(overlap * segmentLength));
  const step = segmentLength - overlapSamples;
  const segmentCount = Math.floor((n - segmentLength) / step) + 1;
  const w = windowCoefficients(window, segmentLength);
  const props = windowProperties(window, segmentLength);
  // Welch 1967: var/mean² of the averaged estimate is
  //   (1/K)·[1 + 2·Σ_{j=1}^{K−1} (K − j)/K · ρ²(j·step)],
  // ρ the window's overlap correlation; a χ²_ν variable has var/mean² = 2/ν.
  let sum = 0;
  for (let j = 1; j < segmentCount && j * step < segmentLength; j++) {
    sum += ((segmentCount - j) / segmentCount) * props.overlapCorrelation(j * step) ** 2;
  }
  const ratio = (1 + 2 * sum) / segmentCount;
  return {
    n,
    fs,
    segmentLength,
    nfft,
    step,
    segmentCount,
    window,
    detrend,
    w,
    sumSquares: props.sumSquares,
    halfPowerWidthBins: props.halfPowerWidthBins,
    degreesOfFreedom: 2 / ratio,
  };
}

/** Calls `each(re, im)` with the spectrum of every windowed segment, in order. */
function forEachSegment(
  samples: Samples,
  s: Setup,
  each: (re: Float64Array, im: Float64Array, index: number) => void,
): void {
  const plan = realFftPlan(s.nfft);
  const buffer = new Float64Array(s.nfft);
  const re = new Float64Array(plan.bins);
  const im = new Float64Array(plan.bins);
  for (let seg = 0; seg < s.segmentCount; seg++) {
    const start = seg * s.step;
    buffer.fill(0);
    for (let i = 0; i < s.segmentLength; i++) buffer[i] = samples[start + i] as number;
    if (s.detrend === 'constant') removeMeanInPlace(buffer, 0, s.segmentLength);
    else if (s.detrend === 'linear') removeLineInPlace(buffer, 0, s.segmentLength);
    for (let i = 0; i < s.segmentLength; i++) {
      buffer[i] = (buffer[i] as number) * (s.w[i] as number);
    }
    plan.forward(buffer, re, im);
    each(re, im, seg);
  }
}

/** One-sided density factor of bin k: 2, except DC and (even nfft) Nyquist. */
function sideFactor(k: number, nfft: number): number {
  return k === 0 || (nfft % 2 === 0 && k === nfft / 2) ? 1 : 2;
}

function describe(s: Setup, psd: Float64Array): WelchPsd {
  const bins = psd.length;
  const frequencies = new Float64Array(bins);
  for (let k = 0; k < bins; k++) frequencies[k] = (k * s.fs) / s.nfft;
  return {
    frequencies,
    psd,
    segmentCount: s.segmentCount,
    segmentLength: s.segmentLength,
    nfft: s.nfft,
    overlapSamples: s.segmentLength - s.step,
    window: s.window,
    binSpacingHz: s.fs / s.nfft,
    resolutionHz: s.fs / s.segmentLength,
    kernelHalfPowerWidthHz: (s.halfPowerWidthBins * s.fs) / s.segmentLength,
    degreesOfFreedom: s.degreesOfFreedom,
  };
}

/**
 * Welch power spectral density of uniformly sampled `samples` at `sampleRateHz`.
 * Throws on non-finite samples, fewer than 4 samples, or invalid options.
 */
export function welchPsd(
  samples: Samples,
  sampleRateHz: number,
  options: WelchOptions = {},
): WelchPsd {
  requireFiniteSamples('samples', samples);
  const s = resolve(samples.length, sampleRateHz, options);
  const bins = Math.floor(s.nfft / 2) + 1;
  const acc = new Float64Array(bins);
  forEachSegment(samples, s, (re, im) => {
    for (let k = 0; k < bins; k++)
      acc[k] = (acc[k] as number) + (re[k] as number) ** 2 + (im[k] as number) ** 2;
  });
  const scale = 1 / (s.fs * s.sumSquares * s.segmentCount);
  for (let k = 0; k < bins; k++) acc[k] = (acc[k] as number) * scale * sideFactor(k, s.nfft);
  return describe(s, acc);
}

/** The Welch estimate together with each segment's own periodogram (same scaling). */
export interface WelchSegments extends WelchPsd {
  /** One-sided density periodogram of each segment; their mean is `psd`. */
  segments: Float64Array[];
}

/**
 * Like `welchPsd`, and also returns each segment's periodogram, for delete-one-segment
 * (jackknife) error estimates (Thomson & Chave 1991, "Jackknifed error estimates for
 * spectra, coherences, and transfer functions", in Haykin (ed.), Advances in Spectrum
 * Analysis and Array Processing, vol. 1, ch. 2).
 */
export function welchSegments(
  samples: Samples,
  sampleRateHz: number,
  options: WelchOptions = {},
): WelchSegments {
  requireFiniteSamples('samples', samples);
  const s = resolve(samples.length, sampleRateHz, options);
  const bins = Math.floor(s.nfft / 2) + 1;
  const scale = 1 / (s.fs * s.sumSquares);
  const acc = new Float64Array(bins);
  const segments: Float64Array[] = [];
  forEachSegment(samples, s, (re, im) => {
    const p = new Float64Array(bins);
    for (let k = 0; k < bins; k++) {
      const v = ((re[k] as number) ** 2 + (im[k] as number) ** 2) * scale * sideFactor(k, s.nfft);
      p[k] = v;
      acc[k] = (acc[k] as number) + v / s.segmentCount;
    }
    segments.push(p);
  });
  return { ...describe(s, acc), segments };
}

/** Auto- and cross-spectral densities of two channels, and their coherence. */
export interface WelchCrossSpectrum {
  frequencies: Float64Array;
  pxx: Float64Array;
  pyy: Float64Array;
  /** Cross-spectral density conj(X)·Y, real and imaginary parts. */
  pxyRe: Float64Array;
  pxyIm: Float64Array;
  /** Magnitude-squared coherence |Pxy|²/(Pxx·Pyy), 0..1 (NaN-free: 0 where a channel is silent). */
  coherence: Float64Array;
  segmentCount: number;
  degreesOfFreedom: number;
}

/**
 * Welch cross-spectral density and magnitude-squared coherence of two channels sampled
 * together (Welch 1967; coherence as in Bendat & Piersol, Random Data, ch. 9, from memory,
 * verify chapter). With K segments, noise alone gives a coherence near 1/K, not 0.
 */
export function welchCrossSpectrum(
  x: Samples,
  y: Samples,
  sampleRateHz: number,
  options: WelchOptions = {},
): WelchCrossSpectrum {
  requireFiniteSamples('x', x);
  requireFiniteSamples('y', y);
  if (x.length !== y.length) {
    throw new RangeError(`x and y must have the same length, got ${x.length} and ${y.length}`);
  }
  const s = resolve(x.length, sampleRateHz, options);
  const bins = Math.floor(s.nfft / 2) + 1;
  const xs: Float64Array[] = [];
  forEachSegment(x, s, (re, im) => {
    const both = new Float64Array(2 * bins);
    both.set(re.subarray(0, bins), 0);
    both.set(im.subarray(0, bins), bins);
    xs.push(both);
  });
  const pxx = new Float64Array(bins);
  const pyy = new Float64Array(bins);
  const pxyRe = new Float64Array(bins);
  const pxyIm = new Float64Array(bins);
  forEachSegment(y, s, (re, im, seg) => {
    const xsSeg = xs[seg] as Float64Array;
    for (let k = 0; k < bins; k++) {
      const ar = xsSeg[k] as number;
      const ai = xsSeg[bins + k] as number;
      const br = re[k] as number;
      const bi = im[k] as number;
      pxx[k] = (pxx[k] as number) + ar * ar + ai * ai;
      pyy[k] = (pyy[k] as number) + br * br + bi * bi;
      pxyRe[k] = (pxyRe[k] as number) + ar * br + ai * bi;
      pxyIm[k] = (pxyIm[k] as number) + ar * bi - ai * br;
    }
  });
  const coherence = new Float64Array(bins);
  const scale = 1 / (s.fs * s.sumSquares * s.segmentCount);
  const frequencies = new Float64Array(bins);
  for (let k = 0; k < bins; k++) {
    const f = scale * sideFactor(k, s.nfft);
    pxx[k] = (pxx[k] as number) * f;
    pyy[k] = (pyy[k] as number) * f;
    pxyRe[k] = (pxyRe[k] as number) * f;
    pxyIm[k] = (pxyIm[k] as number) * f;
    const denom = (pxx[k] as number) * (pyy[k] as number);
    const num = (pxyRe[k] as number) ** 2 + (pxyIm[k] as number) ** 2;
    coherence[k] = denom > 0 ? Math.min(1, num / denom) : 0;
    frequencies[k] = (k * s.fs) / s.nfft;
  }
  return {
    frequencies,
    pxx,
    pyy,
    pxyRe,
    pxyIm,
    coherence,
    segmentCount: s.segmentCount,
    degreesOfFreedom: s.degreesOfFreedom,
  };
}
