/**
 * Refining one resonance peak by fitting a single-degree-of-freedom model to the raw
 * periodogram of the whole record, by maximum likelihood.
 *
 * Why: the Welch average finds peaks reliably, but each of its values still scatters by
 * ±1.5 dB or so, and its segments blur the resolution. The raw periodogram of the whole
 * record has the finest resolution (1/T), and for a stationary Gaussian signal its values
 * are independent, exponentially distributed around the true PSD M(f), so the negative
 * log-likelihood is Whittle's Σ [ln M(f_k) + P(f_k)/M(f_k)] (Whittle 1953, Ark. Mat.
 * 2(5):423–434). Using all bins around the peak at once gives frequency errors near the
 * statistical limit of the record. This follows the idea of the Bayesian FFT method of
 * ambient modal identification (Au 2011, J. Eng. Mech. 137(3):214–226), simplified to one
 * channel and a point estimate with its curvature-based (Fisher) uncertainty.
 *
 * Model: M(f) = A·h(f) + B, with h the PSD shape of the absolute acceleration of an SDOF
 * under white base acceleration, h = (1 + (2ζr)²)/((1 − r²)² + (2ζr)²), r = f/f_n (the
 * transmissibility squared, Chopra, Dynamics of Structures, §3.6; from memory, verify
 * section), and B a locally white sensor-noise floor.
 */
import { requireFiniteSamples, requirePositive } from './checks.js';
import type { Samples } from './checks.js';
import { realFft } from './fft.js';
import { halfPowerBand } from './half-power.js';
import { nelderMead } from './nelder-mead.js';

/** PSD shape of an SDOF's absolute acceleration under white base acceleration (see header). */
export function sdofAccelerationShape(
  fHz: number,
  naturalHz: number,
  dampingRatio: number,
): number {
  const r = fHz / naturalHz;
  const d = 2 * dampingRatio * r;
  return (1 + d * d) / ((1 - r * r) ** 2 + d * d);
}

/** The raw (rectangular-window) periodogram of a whole record, one-sided density. */
export interface Periodogram {
  frequencies: Float64Array;
  psd: Float64Array;
  /** Record length, s. */
  durationS: number;
}

/**
 * One-sided periodogram 2|X_k|²/(fs·N) of `samples` (already detrended), at the record's own
 * Fourier frequencies k·fs/N; exact length N (Bluestein when N is not a power of two), so
 * the values stay independent.
 */
export function periodogram(samples: Samples, sampleRateHz: number): Periodogram {
  requireFiniteSamples('samples', samples);
  const fs = requirePositive('sampleRateHz', sampleRateHz);
  const n = samples.length;
  const { re, im } = realFft(samples);
  const bins = re.length;
  const frequencies = new Float64Array(bins);
  const psd = new Float64Array(bins);
  for (let k = 0; k < bins; k++) {
    const side = k === 0 || (n % 2 === 0 && k === n / 2) ? 1 : 2;
    frequencies[k] = (k * fs) / n;
    psd[k] = (side * ((re[k] as number) ** 2 + (im[k] as number) ** 2)) / (fs * n);
  }
  return { frequencies, psd, durationS: n / fs };
}

export interface SdofFit {
  frequencyHz: number;
  /** The model's damping parameter ζ. */
  modelDampingRatio: number;
  /** Damping from the half-power bandwidth of the fitted peak, ζ = (f_b − f_a)/(2f_n); null when narrower than two bins of the record. */
  halfPowerDampingRatio: number | null;
  halfPowerBandHz: readonly [number, number] | null;
  amplitude: number;
  background: number;
  /** Standard errors from the inverse Hessian of the negative log-likelihood (null when not positive definite). */
  frequencyUncertaintyHz: number | null;
  dampingUncertainty: number | null;
  /** Bins used. */
  binCount: number;
  /** Whittle negative log-likelihood at the optimum (compare fits over the same bins only). */
  negativeLogLikelihood: number;
}

/** Inverse of a small symmetric matrix by Gauss–Jordan; null when singular. */
function invert(m: number[][]): number[][] | null {
  const n = m.length;
  const a = m.map((row, i) => [...row, ...Array.from({ length: n }, (_, j) => (i === j ? 1 : 0))]);
  for (let c = 0; c < n; c++) {
    let pivot = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(a[r]![c]!) > Math.abs(a[pivot]![c]!)) pivot = r;
    if (!(Math.abs(a[pivot]![c]!) > 1e-300)) return null;
    [a[c], a[pivot]] = [a[pivot]!, a[c]!];
    const p = a[c]![c]!;
    for (let j = 0; j < 2 * n; j++) a[c]![j]! /= p;
    for (let r = 0; r < n; r++) {
      if (r === c) continue;
      const f = a[r]![c]!;
      if (f === 0) continue;
      for (let j = 0; j < 2 * n; j++) a[r]![j]! -= f * a[c]![j]!;
    }
  }
  return a.map((row) => row.slice(n));
}

/**
 * Fits the SDOF model to the periodogram bins within `bandHz`, starting from a guess (Welch
 * peak frequency and a rough damping). Null when too few bins or the fit leaves the band.
 */
export function fitSdofPeak(
  pg: Periodogram,
  guess: { frequencyHz: number; dampingRatio: number },
  bandHz: readonly [number, number],
): SdofFit | null {
  const f0 = requirePositive('guess.frequencyHz', guess.frequencyHz);
  const z0 = requirePositive('guess.dampingRatio', guess.dampingRatio);
  const df = (pg.frequencies[1] as number) - (pg.frequencies[0] as number);
  const lo = Math.max(1, Math.ceil(bandHz[0] / df));
  const hi = Math.min(pg.psd.length - 2, Math.floor(bandHz[1] / df));
  const MIN_BINS = 12; // four parameters need a good many more bins (our choice)
  if (hi - lo + 1 < MIN_BINS) return null;
  const f = pg.frequencies.subarray(lo, hi + 1);
  const p = pg.psd.subarray(lo, hi + 1);
  const sorted = Float64Array.from(p).sort();
  const backgroundGuess = Math.max(sorted[Math.floor(sorted.length * 0.25)] as number, 1e-300);
  let peakGuess = 0;
  for (let k = 0; k < f.length; k++) {
    if (Math.abs((f[k] as number) - f0) <= Math.max(2 * df, z0 * f0))
      peakGuess = Math.max(peakGuess, p[k] as number);
  }
  const aGuess =
    Math.max(peakGuess - backgroundGuess, backgroundGuess) / sdofAccelerationShape(f0, f0, z0);
  // A half-power width under two bins (2/T) cannot be told from a single high bin, so ζ is
  // kept at or above 1/(f·T) (derived: 2ζf ≥ 2/T), and never below 1e-4 (our choice).
  const MIN_Z = Math.max(1e-4, 1 / (f0 * pg.durationS));
  const MAX_Z = 0.5; // beyond this "peak" is not a resonance (our choice)
  const fLo = f[0] as number;
  const fHi = f[f.length - 1] as number;
  // Parameters: ln f_n, ln ζ, ln A, ln B (logs keep them positive and the problem well scaled).
  const nll = (q: readonly number[]): number => {
    const fn = Math.exp(q[0] as number);
    const z = Math.exp(q[1] as number);
    if (!(fn > fLo && fn < fHi && z >= MIN_Z && z <= MAX_Z)) return Infinity;
    const A = Math.exp(q[2] as number);
    const B = Math.exp(q[3] as number);
    let sum = 0;
    for (let k = 0; k < f.length; k++) {
      const m = A * sdofAccelerationShape(f[k] as number, fn, z) + B;
      sum += Math.log(m) + (p[k] as number) / m;
    }
    return sum;
  };
  const start = [
    Math.log(f0),
    Math.log(Math.min(MAX_Z / 2, Math.max(z0, 2 * MIN_Z))),
    Math.log(aGuess),
    Math.log(backgroundGuess),
  ];
  const steps = [Math.max(z0, df / f0), 0.5, 0.7, 0.5];
  let best = nelderMead(nll, start, { steps, tolerance: 1e-12, maxIterations: 3000 });
  // One restart from the best point guards against a collapsed simplex (Nelder–Mead practice).
  best = nelderMead(nll, best.x, {
    steps: steps.map((s) => s / 2),
    tolerance: 1e-12,
    maxIterations: 3000,
  });
  if (!Number.isFinite(best.value)) return null;
  const [lf, lz, la, lb] = best.x as [number, number, number, number];
  const fn = Math.exp(lf);
  const z = Math.exp(lz);
  const A = Math.exp(la);
  const B = Math.exp(lb);
  // The fit must stay clear of the band's edges, else it found the band's slope, not a peak.
  const EDGE_SHARE = 0.05;
  if (fn < fLo + EDGE_SHARE * (fHi - fLo) || fn > fHi - EDGE_SHARE * (fHi - fLo)) return null;

  // Curvature of the negative log-likelihood at the optimum (observed Fisher information).
  const h = [Math.min(1e-3, 0.1 * z), 0.02, 0.02, 0.02];
  const x0 = best.x;
  const at = (d: number[]) => nll(x0.map((v, i) => v + (d[i] as number)));
  const H: number[][] = [];
  const base = best.value;
  for (let i = 0; i < 4; i++) {
    H.push([]);
    for (let j = 0; j < 4; j++) {
      const hi_ = h[i] as number;
      const hj = h[j] as number;
      const e = (k: number, s: number) => Array.from({ length: 4 }, (_, m) => (m === k ? s : 0));
      let v: number;
      if (i === j) {
        v = (at(e(i, hi_)) - 2 * base + at(e(i, -hi_))) / (hi_ * hi_);
      } else {
        const pp = at(e(i, hi_).map((a, m) => a + (e(j, hj)[m] as number)));
        const pm = at(e(i, hi_).map((a, m) => a + (e(j, -hj)[m] as number)));
        const mp = at(e(i, -hi_).map((a, m) => a + (e(j, hj)[m] as number)));
        const mm = at(e(i, -hi_).map((a, m) => a + (e(j, -hj)[m] as number)));
        v = (pp - pm - mp + mm) / (4 * hi_ * hj);
      }
      (H[i] as number[]).push(v);
    }
  }
  const cov = invert(H);
  const varF = cov ? (cov[0]![0] as number) : NaN;
  const varZ = cov ? (cov[1]![1] as number) : NaN;
  const frequencyUncertaintyHz = varF > 0 && Number.isFinite(varF) ? fn * Math.sqrt(varF) : null;
  const dampingUncertainty = varZ > 0 && Number.isFinite(varZ) ? z * Math.sqrt(varZ) : null;

  // Half-power band of the fitted peak above its background, on a fine grid.
  const span = Math.max(8 * z * fn, 8 * df);
  const GRID = 4001; // fine enough that interpolation error ≪ one record bin (our choice)
  const gf = new Float64Array(GRID);
  const gp = new Float64Array(GRID);
  let top = 0;
  for (let k = 0; k < GRID; k++) {
    const fk = Math.max(1e-9, fn - span + (2 * span * k) / (GRID - 1));
    gf[k] = fk;
    gp[k] = A * sdofAccelerationShape(fk, fn, z);
    if ((gp[k] as number) > (gp[top] as number)) top = k;
  }
  const band = halfPowerBand(gf, gp, top, gp[top] as number, 0);
  const MIN_RESOLVED_BINS = 2; // a bandwidth under two record bins (2/T) is not resolved (our choice)
  const resolved = band !== null && band.bandwidthHz >= MIN_RESOLVED_BINS * df;
  return {
    frequencyHz: fn,
    modelDampingRatio: z,
    halfPowerDampingRatio: resolved && band ? band.bandwidthHz / (2 * fn) : null,
    halfPowerBandHz: band ? [band.lowerHz, band.upperHz] : null,
    amplitude: A,
    background: B,
    frequencyUncertaintyHz,
    dampingUncertainty,
    binCount: f.length,
    negativeLogLikelihood: best.value,
  };
}
