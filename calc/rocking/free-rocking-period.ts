import { requireFinite } from './guards.js';
import { checkOscillator, rockingBlock, type RockingOscillator } from './rocking-block.js';

/**
 * Period of free rocking, in s, of an oscillator released from rest at amplitude θ₀, with no
 * loss at impact: T = (4/p)·cosh⁻¹[1 / (1 − θ₀/α)] (Housner 1963, BSSA 53(2):403–417, from the
 * equation linearised for slender blocks). The full equation gives a slightly longer period:
 * 7e-5 (α = 0.05), 2.9e-4 (α = 0.1), 1.8e-3 (α = 0.25) relative at θ₀ = α/2 (derived).
 *
 * @throws RangeError unless 0 < θ₀ < α.
 */
export function rockingPeriod(block: RockingOscillator, theta0: number): number {
  checkOscillator(block);
  requireFinite('theta0', theta0);
  if (!(theta0 > 0)) throw new RangeError(`theta0 must be > 0 rad, got ${theta0}`);
  if (!(theta0 < block.alpha)) {
    throw new RangeError(
      `theta0 must be < alpha = ${block.alpha} rad (at θ₀ ≥ α the block topples), got ${theta0}`,
    );
  }
  return (4 / block.p) * Math.acosh(1 / (1 - theta0 / block.alpha));
}

/**
 * Free-rocking period in s of a rigid rectangular block of full width `widthM` and full
 * height `heightM`, released from rest at amplitude `theta0` (rad), no impact loss:
 * T = (4/p)·cosh⁻¹[1 / (1 − θ₀/α)] (Housner 1963). See {@link rockingPeriod}.
 *
 * @throws RangeError for dimensions not finite > 0, or unless 0 < θ₀ < α.
 */
export function freeRockingPeriod(widthM: number, heightM: number, theta0: number): number {
  return rockingPeriod(rockingBlock(widthM, heightM), theta0);
}
