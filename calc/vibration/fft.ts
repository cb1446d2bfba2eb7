/**
 * Discrete Fourier transform, forward sign convention X[k] = Σ x[n]·e^(−2πi·k·n/N), no
 * scaling (the inverse divides by N).
 *
 * - Powers of two: iterative radix-2 decimation in time (Cooley & Tukey 1965, Math. Comp.
 *   19(90):297–301), twiddle factors from Math.cos/Math.sin of each angle (no recurrences,
 *   so the rounding error does not grow with N).
 * - Any other length: Bluestein's chirp-z algorithm (Bluestein 1970, IEEE Trans. Audio
 *   Electroacoust. AU-18(4):451–455), which turns a length-N DFT into a circular
 *   convolution of power-of-two length M ≥ 2N − 1.
 * - Real input of power-of-two length: one complex transform of half the length and a
 *   split step (the "two-for-one" packing, e.g. Press et al., Numerical Recipes, §12.3).
 *
 * Plans (bit-reversal tables, twiddles, Bluestein chirps) are cached per length.
 */
import { isPowerOfTwo, nextPowerOfTwo, requireFiniteSamples, requireIntegerIn } from './checks.js';
import type { Samples } from './checks.js';

/** Real and imaginary parts, same length. */
export interface ComplexArrays {
  re: Float64Array;
  im: Float64Array;
}

/** Longest transform accepted: 2^24 points (≈ 46 h at 100 Hz), far beyond any recording. */
const MAX_SIZE = 2 ** 24; // our choice, no source: bounds memory

/** In-place forward radix-2 transform of one power-of-two length. */
class Radix2Plan {
  readonly size: number;
  private readonly rev: Uint32Array;
  private readonly cos: Float64Array;
  private readonly negSin: Float64Array;

  constructor(n: number) {
    this.size = n;
    this.rev = new Uint32Array(n);
    const bits = Math.round(Math.log2(n));
    for (let i = 0; i < n; i++) {
      let r = 0;
      for (let b = 0; b < bits; b++) r |= ((i >>> b) & 1) << (bits - 1 - b);
      this.rev[i] = r >>> 0;
    }
    const half = Math.max(1, n >> 1);
    this.cos = new Float64Array(half);
    this.negSin = new Float64Array(half);
    for (let k = 0; k < half; k++) {
      const angle = (2 * Math.PI * k) / n;
      this.cos[k] = Math.cos(angle);
      this.negSin[k] = -Math.sin(angle);
    }
  }

  transform(re: Float64Array, im: Float64Array): void {
    const n = this.size;
    const rev = this.rev;
    for (let i = 0; i < n; i++) {
      const j = rev[i] as number;
      if (j > i) {
        const tr = re[i] as number;
        re[i] = re[j] as number;
        re[j] = tr;
        const ti = im[i] as number;
        im[i] = im[j] as number;
        im[j] = ti;
      }
    }
    const cos = this.cos;
    const negSin = this.negSin;
    for (let size = 2; size <= n; size <<= 1) {
      const half = size >> 1;
      const step = n / size;
      for (let start = 0; start < n; start += size) {
        for (let j = 0, k = 0; j < half; j++, k += step) {
          const wr = cos[k] as number;
          const wi = negSin[k] as number;
          const a = start + j;
          const b = a + half;
          const br = re[b] as number;
          const bi = im[b] as number;
          const xr = br * wr - bi * wi;
          const xi = br * wi + bi * wr;
          const ar = re[a] as number;
          const ai = im[a] as number;
          re[b] = ar - xr;
          im[b] = ai - xi;
          re[a] = ar + xr;
          im[a] = ai + xi;
        }
      }
    }
  }
}

/** In-place forward transform of any length via Bluestein's chirp-z convolution. */
class BluesteinPlan {
  readonly size: number;
  private readonly inner: Radix2Plan;
  private readonly chirpRe: Float64Array;
  private readonly chirpIm: Float64Array;
  private readonly kernelRe: Float64Array;
  private readonly kernelIm: Float64Array;
  private readonly workRe: Float64Array;
  private readonly workIm: Float64Array;

  constructor(n: number) {
    this.size = n;
    const m = nextPowerOfTwo(2 * n - 1);
    this.inner = radix2(m);
    this.chirpRe = new Float64Array(n);
    this.chirpIm = new Float64Array(n);
    for (let k = 0; k < n; k++) {
      // e^(−iπk²/N); k² is reduced mod 2N in exact integer arithmetic first, so the angle
      // stays accurate for large k (k² < 2^53 for every accepted N).
      const k2 = (k * k) % (2 * n);
      const angle = (Math.PI * k2) / n;
      this.chirpRe[k] = Math.cos(angle);
      this.chirpIm[k] = -Math.sin(angle);
    }
    const bRe = new Float64Array(m);
    const bIm = new Float64Array(m);
    bRe[0] = this.chirpRe[0] as number;
    bIm[0] = -(this.chirpIm[0] as number);
    for (let k = 1; k < n; k++) {
      const cr = this.chirpRe[k] as number;
      const ci = -(this.chirpIm[k] as number);
      bRe[k] = cr;
      bIm[k] = ci;
      bRe[m - k] = cr;
      bIm[m - k] = ci;
    }
    this.inner.transform(bRe, bIm);
    this.kernelRe = bRe;
    this.kernelIm = bIm;
    this.workRe = new Float64Array(m);
    this.workIm = new Float64Array(m);
  }

  transform(re: Float64Array, im: Float64Array): void {
    const n = this.size;
    const m = this.inner.size;
    const wr = this.workRe;
    const wi = this.workIm;
    wr.fill(0);
    wi.fill(0);
    for (let k = 0; k < n; k++) {
      const cr = this.chirpRe[k] as number;
      const ci = this.chirpIm[k] as number;
      const xr = re[k] as number;
      const xi = im[k] as number;
      wr[k] = xr * cr - xi * ci;
      wi[k] = xr * ci + xi * cr;
    }
    this.inner.transform(wr, wi);
    // Multiply by the kernel's spectrum and conjugate, so a second forward transform acts
    // as the inverse: ifft(x) = conj(fft(conj(x)))/M.
    for (let k = 0; k < m; k++) {
      const ar = wr[k] as number;
      const ai = wi[k] as number;
      const br = this.kernelRe[k] as number;
      const bi = this.kernelIm[k] as number;
      wr[k] = ar * br - ai * bi;
      wi[k] = -(ar * bi + ai * br);
    }
    this.inner.transform(wr, wi);
    for (let k = 0; k < n; k++) {
      const cr = (wr[k] as number) / m;
      const ci = -(wi[k] as number) / m;
      const pr = this.chirpRe[k] as number;
      const pi = this.chirpIm[k] as number;
      re[k] = cr * pr - ci * pi;
      im[k] = cr * pi + ci * pr;
    }
  }
}

type ComplexPlan = Radix2Plan | BluesteinPlan;

const CACHE_LIMIT = 24; // our choice, no source: a handful of lengths per session
const radix2Cache = new Map<number, Radix2Plan>();
const complexCache = new Map<number, ComplexPlan>();

function remember<T>(cache: Map<number, T>, n: number, make: () => T): T {
  const hit = cache.get(n);
  if (hit) return hit;
  const plan = make();
  if (cache.size >= CACHE_LIMIT) {
    const oldest = cache.keys().next().value;
    if (oldest !== undefined) cache.delete(oldest);
  }
  cache.set(n, plan);
  return plan;
}

function radix2(n: number): Radix2Plan {
  return remember(radix2Cache, n, () => new Radix2Plan(n));
}

function complexPlan(n: number): ComplexPlan {
  return remember(complexCache, n, () => (isPowerOfTwo(n) ? radix2(n) : new BluesteinPlan(n)));
}

function toFloat64(name: string, values: Samples, n: number): Float64Array {
  requireFiniteSamples(name, values);
  if (values.length !== n) {
    throw new RangeError(`${name} must have length ${n}, got ${values.length}`);
  }
  return Float64Array.from(values);
}

/**
 * Forward DFT of a complex sequence of any length ≥ 1 (imaginary part defaults to zeros).
 * Returns new arrays; the inputs are not changed.
 */
export function fft(re: Samples, im?: Samples): ComplexArrays {
  const n = requireIntegerIn('re.length', re?.length, 1, MAX_SIZE);
  const outRe = toFloat64('re', re, n);
  const outIm = im === undefined ? new Float64Array(n) : toFloat64('im', im, n);
  complexPlan(n).transform(outRe, outIm);
  return { re: outRe, im: outIm };
}

/** Inverse DFT (with the 1/N factor), any length ≥ 1. */
export function inverseFft(re: Samples, im?: Samples): ComplexArrays {
  const n = requireIntegerIn('re.length', re?.length, 1, MAX_SIZE);
  const outRe = toFloat64('re', re, n);
  const outIm = im === undefined ? new Float64Array(n) : toFloat64('im', im, n);
  for (let i = 0; i < n; i++) outIm[i] = -(outIm[i] as number);
  complexPlan(n).transform(outRe, outIm);
  for (let i = 0; i < n; i++) {
    outRe[i] = (outRe[i] as number) / n;
    outIm[i] = -(outIm[i] as number) / n;
  }
  return { re: outRe, im: outIm };
}

/**
 * A reusable transform of real input of one length N: fills bins 0..⌊N/2⌋ (the rest
 * follow from conjugate symmetry). Used by the Welch estimator, which repeats one length.
 */
export interface RealFftPlan {
  readonly size: number;
  /** Number of output bins, ⌊N/2⌋ + 1. */
  readonly bins: number;
  /** `input` has length N; `outRe`/`outIm` have length `bins`. No checks: callers own it. */
  forward(input: Float64Array, outRe: Float64Array, outIm: Float64Array): void;
}

class PackedRealPlan implements RealFftPlan {
  readonly size: number;
  readonly bins: number;
  private readonly half: Radix2Plan;
  private readonly zRe: Float64Array;
  private readonly zIm: Float64Array;
  private readonly cos: Float64Array;
  private readonly negSin: Float64Array;

  constructor(n: number) {
    this.size = n;
    this.bins = n / 2 + 1;
    const h = n / 2;
    this.half = radix2(h);
    this.zRe = new Float64Array(h);
    this.zIm = new Float64Array(h);
    this.cos = new Float64Array(h + 1);
    this.negSin = new Float64Array(h + 1);
    for (let k = 0; k <= h; k++) {
      const angle = (2 * Math.PI * k) / n;
      this.cos[k] = Math.cos(angle);
      this.negSin[k] = -Math.sin(angle);
    }
  }

  forward(input: Float64Array, outRe: Float64Array, outIm: Float64Array): void {
    const h = this.size / 2;
    const zr = this.zRe;
    const zi = this.zIm;
    for (let k = 0; k < h; k++) {
      zr[k] = input[2 * k] as number;
      zi[k] = input[2 * k + 1] as number;
    }
    this.half.transform(zr, zi);
    for (let k = 0; k <= h; k++) {
      const a = k % h;
      const b = (h - k) % h;
      const ar = zr[a] as number;
      const ai = zi[a] as number;
      const br = zr[b] as number;
      const bi = -(zi[b] as number); // conj(Z[h − k])
      // Even part E = (Z_k + conj Z_{h−k})/2; odd part O = (Z_k − conj Z_{h−k})/(2i).
      const er = (ar + br) / 2;
      const ei = (ai + bi) / 2;
      const or = (ai - bi) / 2;
      const oi = -(ar - br) / 2;
      const wr = this.cos[k] as number;
      const wi = this.negSin[k] as number;
      outRe[k] = er + (or * wr - oi * wi);
      outIm[k] = ei + (or * wi + oi * wr);
    }
  }
}

class GeneralRealPlan implements RealFftPlan {
  readonly size: number;
  readonly bins: number;
  private readonly plan: ComplexPlan;
  private readonly re: Float64Array;
  private readonly im: Float64Array;

  constructor(n: number) {
    this.size = n;
    this.bins = Math.floor(n / 2) + 1;
    this.plan = complexPlan(n);
    this.re = new Float64Array(n);
    this.im = new Float64Array(n);
  }

  forward(input: Float64Array, outRe: Float64Array, outIm: Float64Array): void {
    this.re.set(input);
    this.im.fill(0);
    this.plan.transform(this.re, this.im);
    for (let k = 0; k < this.bins; k++) {
      outRe[k] = this.re[k] as number;
      outIm[k] = this.im[k] as number;
    }
  }
}

const realCache = new Map<number, RealFftPlan>();

/** The cached real-input plan for length N ≥ 1 (power of two or not). */
export function realFftPlan(n: number): RealFftPlan {
  requireIntegerIn('n', n, 1, MAX_SIZE);
  return remember(realCache, n, () =>
    isPowerOfTwo(n) && n >= 2 ? new PackedRealPlan(n) : new GeneralRealPlan(n),
  );
}

/**
 * DFT bins 0..⌊N/2⌋ of a real sequence, zero-padded to `n` points when `n` is given
 * (n ≥ input length).
 */
export function realFft(input: Samples, n?: number): ComplexArrays {
  requireFiniteSamples('input', input);
  const size = n ?? input.length;
  requireIntegerIn('n', size, Math.max(1, input.length), MAX_SIZE);
  const plan = realFftPlan(size);
  const padded = new Float64Array(size);
  for (let i = 0; i < input.length; i++) padded[i] = input[i] as number;
  const re = new Float64Array(plan.bins);
  const im = new Float64Array(plan.bins);
  plan.forward(padded, re, im);
  return { re, im };
}
