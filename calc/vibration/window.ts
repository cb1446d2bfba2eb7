/**
 * Data windows for spectral estimation, in their periodic ("DFT-even") form, which is the
 * form whose spectral properties Harris tabulates (Harris 1978, "On the use of windows for
 * harmonic analysis with the discrete Fourier transform", Proc. IEEE 66(1):51–83, Table 1).
 * The properties below are computed from the coefficients, not copied, so they hold for any
 * length; the tests compare them with Harris's Table 1.
 */
import { requireIntegerIn } from './checks.js';

/** Window shapes offered. Hann is the default of the Welch estimate. */
export type WindowKind = 'hann' | 'hamming' | 'rectangular';

export const WINDOW_KINDS: readonly WindowKind[] = ['hann', 'hamming', 'rectangular'];

/**
 * Coefficients of a periodic window of length n.
 * - Hann: w[i] = 0.5 − 0.5·cos(2πi/n), the cos² window (Harris 1978).
 * - Hamming: w[i] = 0.54 − 0.46·cos(2πi/n); 0.54/0.46 are Hamming's rounded coefficients
 *   (Harris 1978).
 * - Rectangular: all ones.
 */
export function windowCoefficients(kind: WindowKind, n: number): Float64Array {
  requireIntegerIn('n', n, 1, 2 ** 24);
  const w = new Float64Array(n);
  switch (kind) {
    case 'hann':
      for (let i = 0; i < n; i++) w[i] = 0.5 - 0.5 * Math.cos((2 * Math.PI * i) / n);
      return w;
    case 'hamming':
      for (let i = 0; i < n; i++) w[i] = 0.54 - 0.46 * Math.cos((2 * Math.PI * i) / n);
      return w;
    case 'rectangular':
      return w.fill(1);
    default:
      throw new RangeError(
        `window must be one of ${WINDOW_KINDS.join(', ')}, got ${String(kind as unknown)}`,
      );
  }
}

/** Spectral properties of a window, all computed from its coefficients. */
export interface WindowProperties {
  /** Σw. */
  sum: number;
  /** Σw², the power normalisation of a periodogram. */
  sumSquares: number;
  /** Coherent gain Σw/n (Harris 1978, Table 1 column "coherent gain"). */
  coherentGain: number;
  /** Equivalent noise bandwidth in bins, n·Σw²/(Σw)² (Harris 1978, "ENBW"). */
  enbwBins: number;
  /**
   * Full width of the kernel |W(f)|² at half its peak (the "3.0-dB bandwidth"), in bins:
   * the resolution limit a spectral peak is smeared to.
   */
  halfPowerWidthBins: number;
  /**
   * Correlation between periodograms of segments that overlap by `shift` samples, for each
   * shift from 0 to n − 1: ρ(s) = Σ w[i]·w[i+s] / Σw², squared in Welch's variance formula.
   */
  overlapCorrelation(shift: number): number;
}

/** |W(f)|², f in bins, of the given coefficients (direct sum, no FFT: the length is small). */
function kernelPower(w: Float64Array, fBins: number): number {
  const n = w.length;
  let re = 0;
  let im = 0;
  for (let i = 0; i < n; i++) {
    const a = (-2 * Math.PI * fBins * i) / n;
    re += (w[i] as number) * Math.cos(a);
    im += (w[i] as number) * Math.sin(a);
  }
  return re * re + im * im;
}

/**
 * Properties of a window of length n. The half-power width is found by bisection on the
 * main lobe; for long windows it is evaluated on a 256-point version of the same shape (the
 * width in bins converges quickly with n; the change from 256 to 4096 points is < 1e-4 bin).
 */
export function windowProperties(kind: WindowKind, n: number): WindowProperties {
  const w = windowCoefficients(kind, n);
  let sum = 0;
  let sumSquares = 0;
  for (let i = 0; i < n; i++) {
    sum += w[i] as number;
    sumSquares += (w[i] as number) ** 2;
  }
  const probe = n > 256 ? windowCoefficients(kind, 256) : w;
  const peak = kernelPower(probe, 0);
  let lo = 0;
  let hi = probe.length > 1 ? 2 : 0.5; // main lobes of these windows end within ±2 bins (Harris 1978)
  if (kernelPower(probe, hi) > peak / 2) hi = probe.length / 2;
  for (let it = 0; it < 60; it++) {
    const mid = (lo + hi) / 2;
    if (kernelPower(probe, mid) > peak / 2) lo = mid;
    else hi = mid;
  }
  return {
    sum,
    sumSquares,
    coherentGain: sum / n,
    enbwBins: (n * sumSquares) / (sum * sum),
    halfPowerWidthBins: lo + hi,
    overlapCorrelation(shift: number): number {
      requireIntegerIn('shift', shift, 0, Math.max(0, n - 1));
      let acc = 0;
      for (let i = 0; i + shift < n; i++) acc += (w[i] as number) * (w[i + shift] as number);
      return acc / sumSquares;
    },
  };
}
