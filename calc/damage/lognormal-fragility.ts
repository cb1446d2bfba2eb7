import { standardNormalCdf } from './normal-cdf.js';

/**
 * A lognormal fragility curve: the probability that a damage state is reached or exceeded
 * at demand x, P(DS ≥ ds | x) = Φ(ln(x / median) / β) (Hazus earthquake model technical manual,
 * chapter 5, structural fragility curves: the median of the demand at the state's threshold
 * and the lognormal standard deviation β; chapter number from memory, verify).
 *
 * @param x the demand (drift ratio, spectral displacement in m, …), finite ≥ 0; 0 gives 0.
 * @param median the demand at which the probability is one half, finite > 0, same unit as x.
 * @param beta the lognormal standard deviation, finite > 0.
 * @throws RangeError naming the argument when one is out of range.
 */
export function lognormalFragility(x: number, median: number, beta: number): number {
  if (typeof x !== 'number' || !Number.isFinite(x) || x < 0) {
    throw new RangeError(`x must be a finite number ≥ 0, got ${String(x)}`);
  }
  if (typeof median !== 'number' || !Number.isFinite(median) || median <= 0) {
    throw new RangeError(`median must be a finite number > 0, got ${String(median)}`);
  }
  if (typeof beta !== 'number' || !Number.isFinite(beta) || beta <= 0) {
    throw new RangeError(`beta must be a finite number > 0, got ${String(beta)}`);
  }
  if (x === 0) return 0;
  return standardNormalCdf(Math.log(x / median) / beta);
}
