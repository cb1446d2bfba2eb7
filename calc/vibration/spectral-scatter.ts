/**
 * How much a Welch PSD value scatters around the true spectrum, on a decibel scale. For a
 * stationary Gaussian signal each averaged value is S·χ²_ν/ν (Welch 1967), so
 * ln(Ŝ/S) has variance ψ₁(ν/2), the trigamma function at half the degrees of freedom
 * (a property of the log of a gamma variable: Var[ln X] = ψ₁(k) for X ~ Gamma(k);
 * Abramowitz & Stegun, Handbook of Mathematical Functions, 6.4). A peak's prominence is
 * judged against this scatter.
 */
import { requirePositive } from './checks.js';

/** 10/ln 10: decibels per neper of power (definition of the decibel). */
const DB_PER_NEPER = 10 / Math.LN10;

/**
 * Trigamma ψ₁(x) for x > 0: the recurrence ψ₁(x) = ψ₁(x + 1) + 1/x² up to x ≥ 10, then the
 * asymptotic series 1/x + 1/(2x²) + 1/(6x³) − 1/(30x⁵) + 1/(42x⁷) − 1/(30x⁹)
 * (Abramowitz & Stegun 6.4.6 and 6.4.12); relative error below 1e-11 from x = 10 on (derived
 * from the size of the next term, 5/(66x¹¹)).
 */
export function trigamma(x: number): number {
  requirePositive('x', x);
  let acc = 0;
  let z = x;
  while (z < 10) {
    acc += 1 / (z * z);
    z += 1;
  }
  const inv = 1 / z;
  const inv2 = inv * inv;
  const series =
    inv + inv2 / 2 + inv * inv2 * (1 / 6 - inv2 * (1 / 30 - inv2 * (1 / 42 - inv2 / 30)));
  return acc + series;
}

/** Standard deviation, in dB, of 10·log10 of a PSD value with ν degrees of freedom. */
export function spectralScatterDb(degreesOfFreedom: number): number {
  requirePositive('degreesOfFreedom', degreesOfFreedom);
  return DB_PER_NEPER * Math.sqrt(trigamma(degreesOfFreedom / 2));
}
