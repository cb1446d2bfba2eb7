/**
 * Guards for sample arrays: programmer errors throw a RangeError naming the argument and
 * showing the bad value (and where it sits), so no NaN can travel into a spectrum.
 */
export { requireFinite, requireNonNegative, requirePositive } from '../spectra/checks.js';

/** Anything indexable by number with a length: number[], Float64Array, Float32Array. */
export type Samples = ArrayLike<number>;

/** Throws unless `values` is array-like and every entry is a finite number. */
export function requireFiniteSamples(name: string, values: Samples): Samples {
  if (values === null || typeof values !== 'object' || typeof values.length !== 'number') {
    throw new RangeError(`${name} must be an array of numbers, got ${String(values)}`);
  }
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      throw new RangeError(`${name}[${i}] must be a finite number, got ${String(v)}`);
    }
  }
  return values;
}

/** Throws unless `value` is an integer within [min, max]. */
export function requireIntegerIn(name: string, value: number, min: number, max: number): number {
  if (!Number.isInteger(value) || value < min || value > max) {
    throw new RangeError(`${name} must be an integer from ${min} to ${max}, got ${String(value)}`);
  }
  return value;
}

/** True when n is a power of two (1, 2, 4, …). */
export function isPowerOfTwo(n: number): boolean {
  return Number.isInteger(n) && n >= 1 && (n & (n - 1)) === 0 && n <= 2 ** 30;
}

/** Smallest power of two ≥ n (n ≥ 1). */
export function nextPowerOfTwo(n: number): number {
  let p = 1;
  while (p < n) p *= 2;
  return p;
}

/** Largest power of two ≤ n (n ≥ 1). */
export function previousPowerOfTwo(n: number): number {
  let p = 1;
  while (p * 2 <= n) p *= 2;
  return p;
}
