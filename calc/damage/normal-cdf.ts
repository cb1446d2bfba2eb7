/**
 * The standard normal cumulative distribution Φ(z), computed from the complementary error
 * function: Φ(z) = ½·erfc(−z/√2). No approximation formula with fitted coefficients: erfc
 * comes from the two classic expansions, each used where it converges fast, to about 1e-15.
 */

/** √π. */
const SQRT_PI = Math.sqrt(Math.PI);

/**
 * Where the expansion switches from the power series to the continued fraction (|x| of
 * erfc). Chosen so both need fewer than ~60 terms at the switch (numerical choice, no source).
 */
const SERIES_LIMIT = 2.5;

/** Relative size of the last term or correction at which an expansion stops. */
const TOLERANCE = 1e-16;

/** Most terms of either expansion (both converge long before; a guard, not a setting). */
const MAX_TERMS = 500;

/**
 * erf(x) for 0 ≤ x < SERIES_LIMIT by the series of positive terms
 * erf x = (2/√π)·e^(−x²)·Σ 2ⁿx^(2n+1)/(1·3·5···(2n+1))
 * (Abramowitz & Stegun 1964, Handbook of Mathematical Functions, eq. 7.1.6). All terms are
 * positive, so there is no cancellation.
 */
function erfSeries(x: number): number {
  const x2 = x * x;
  let term = x;
  let sum = x;
  for (let n = 1; n < MAX_TERMS; n++) {
    term *= (2 * x2) / (2 * n + 1);
    sum += term;
    if (term < sum * TOLERANCE) break;
  }
  return (2 / SQRT_PI) * Math.exp(-x2) * sum;
}

/**
 * erfc(x) for x ≥ SERIES_LIMIT by the continued fraction
 * erfc x = (e^(−x²)/√π) · 1/(x + (1/2)/(x + 1/(x + (3/2)/(x + 2/(x + …)))))
 * (Abramowitz & Stegun 1964, eq. 7.1.14), evaluated by the modified Lentz method
 * (Press et al., Numerical Recipes, 3rd ed., §5.2).
 */
function erfcContinuedFraction(x: number): number {
  const tiny = 1e-300;
  let f = x;
  let c = x;
  let d = 0;
  for (let n = 1; n < MAX_TERMS; n++) {
    const a = n / 2;
    d = x + a * d;
    d = d === 0 ? tiny : d;
    c = x + a / c;
    c = c === 0 ? tiny : c;
    d = 1 / d;
    const delta = c * d;
    f *= delta;
    if (Math.abs(delta - 1) < TOLERANCE) break;
  }
  return Math.exp(-x * x) / (SQRT_PI * f);
}

/** The complementary error function erfc(x) = 1 − erf(x), for any finite x. */
export function erfc(x: number): number {
  if (typeof x !== 'number' || Number.isNaN(x)) {
    throw new RangeError(`x must be a number, got ${String(x)}`);
  }
  if (x === Infinity) return 0;
  if (x === -Infinity) return 2;
  if (x < 0) return 2 - erfc(-x);
  if (x < SERIES_LIMIT) return 1 - erfSeries(x);
  return erfcContinuedFraction(x);
}

/**
 * Φ(z), the standard normal cumulative distribution function: ½·erfc(−z/√2). Accurate in
 * both tails (the small tail is computed directly, never as 1 − a number close to 1).
 *
 * @throws RangeError when z is NaN or not a number.
 */
export function standardNormalCdf(z: number): number {
  if (typeof z !== 'number' || Number.isNaN(z)) {
    throw new RangeError(`z must be a number, got ${String(z)}`);
  }
  return 0.5 * erfc(-z / Math.SQRT2);
}
