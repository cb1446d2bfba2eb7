import { G } from '../units/gravity.js';
import { requireFinite, requireInRange, requirePositive } from './guards.js';

/**
 * What the rocking equation of motion needs, and all that {@link rockingTimeHistory},
 * {@link rockingDemand} and {@link pulseOverturningCheck} read:
 *
 *   θ̈ = −p²·[sin(α·sgnθ − θ) + (üg/g)·cos(α·sgnθ − θ)]   (Housner 1963, BSSA 53(2):403–417)
 *
 * with θ̇ multiplied by `restitution` at every impact (θ crossing zero).
 */
export interface RockingOscillator {
  /** Slenderness angle α in rad: the angle at which the block topples with no ground motion. */
  alpha: number;
  /** Frequency parameter p in rad/s. */
  p: number;
  /** Coefficient of restitution r of the angular velocity at each impact, 0 ≤ r ≤ 1. */
  restitution: number;
  /**
   * Ground acceleration (in g) at which the block first lifts off from rest. For a bare block
   * it is tan α; a wall's hold-downs can raise it for the first uplift only (see rockingWall).
   */
  upliftAccelerationG: number;
}

/** A rigid rectangular block on a rigid base, rocking about its corners. */
export interface RockingBlock extends RockingOscillator {
  /** Full width 2b in m (the heel-to-toe length of the rocking base). */
  widthM: number;
  /** Full height 2h in m. */
  heightM: number;
  /** Distance from a rocking corner to the centre of mass, in m (half-diagonal √(b² + h²)). */
  R: number;
}

/**
 * Rocking parameters of a rigid rectangular block of full width `widthM` = 2b and full height
 * `heightM` = 2h on a rigid base (Housner 1963, BSSA 53(2):403–417):
 *
 * - α = atan(b/h), R = √(b² + h²);
 * - p = √(3g/(4R)), from the moment of inertia about a corner I₀ = (4/3)·m·R²;
 * - uplift from rest when |üg| > g·tan α;
 * - r = 1 − 1.5·sin²α, from conservation of angular momentum about the new corner at impact
 *   (so a fraction r² of the kinetic energy survives each impact); taken as 0 for squat
 *   blocks (b/h ≥ √2) where the formula gives r ≤ 0 and the impact stops the block.
 *
 * @throws RangeError when a dimension is not a finite number > 0.
 */
export function rockingBlock(widthM: number, heightM: number): RockingBlock {
  requirePositive('widthM', widthM);
  requirePositive('heightM', heightM);
  const b = widthM / 2;
  const h = heightM / 2;
  const alpha = Math.atan2(b, h);
  const R = Math.hypot(b, h);
  // 3/4 from I₀ = (4/3)·m·R² of a rectangle about its corner (Housner 1963).
  const p = Math.sqrt((3 * G) / (4 * R));
  const s = Math.sin(alpha);
  // 1.5 = 2·m·R²/I₀ (Housner 1963, eq. for the angular velocity ratio at impact). For squat
  // blocks (b/h ≥ √2) the formula reaches 0 or below: the impact stops the block, so r = 0.
  const restitution = Math.max(0, 1 - 1.5 * s * s);
  return { widthM, heightM, alpha, R, p, restitution, upliftAccelerationG: Math.tan(alpha) };
}

/**
 * Checks an oscillator passed in by a caller (it may be hand-made) and throws a RangeError
 * naming the bad field. α must lie in (0, π/2), p > 0, 0 ≤ r ≤ 1 and the uplift
 * acceleration finite and ≥ 0.
 */
export function checkOscillator(block: RockingOscillator): RockingOscillator {
  if (block === null || typeof block !== 'object') {
    throw new RangeError(`block must be an object, got ${String(block)}`);
  }
  requireFinite('block.alpha', block.alpha);
  if (!(block.alpha > 0 && block.alpha < Math.PI / 2)) {
    throw new RangeError(`block.alpha must be in (0, π/2) rad, got ${block.alpha}`);
  }
  requirePositive('block.p', block.p);
  requireInRange('block.restitution', block.restitution, 0, 1);
  requireFinite('block.upliftAccelerationG', block.upliftAccelerationG);
  if (block.upliftAccelerationG < 0) {
    throw new RangeError(
      `block.upliftAccelerationG must be ≥ 0, got ${String(block.upliftAccelerationG)}`,
    );
  }
  return block;
}

/**
 * Effective height h_e in m of the equivalent single-degree-of-freedom oscillator of a rocking
 * block: the height at which rotation θ gives the SDOF displacement Δ = θ·h_e. Derived here by
 * linearising the rocking equation at small θ, θ̈ ≈ … − (p²·cos α / g)·üg, and matching it to
 * Δ̈ + … = −üg, so h_e = g / (p²·cos α). For a bare block this is I₀/(m·h) = 4R²/(3h).
 */
export function effectiveHeight(block: RockingOscillator): number {
  return G / (block.p * block.p * Math.cos(block.alpha));
}
