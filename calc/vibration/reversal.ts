/**
 * Two-position reversal: the way a spirit level is checked, applied to the phone. Measure
 * with one long edge on the face, then turn the phone half a turn about its long (vertical)
 * axis and press the other long edge on the same spot. The face's lean θ changes sign in
 * the phone's frame, the sensor's zero offset b does not:
 *   r₁ = θ + b,  r₂ = −θ + b  ⇒  θ = (r₁ − r₂)/2,  b = (r₁ + r₂)/2.
 * Turning about the long axis (not end over end) also cancels the sensor axis's
 * misalignment towards the long axis, because the long axis points up in both positions
 * (derived: the coupled term c·a_y is the same in both readings).
 */
import { requireFinite, requireNonNegative } from './checks.js';

/**
 * Relative sensitivity (scale) tolerance of a phone accelerometer, used as a standard
 * uncertainty on the tilt: 2 %. From memory, verify: MEMS datasheets state ±1–2 %
 * sensitivity tolerance (e.g. Bosch BMI160, ST LSM6DSO); the reversal does not cancel it.
 */
export const SENSITIVITY_TOLERANCE = 0.02;

/**
 * Largest zero offset, rad, before the pair is suspected of a handling error (different
 * spot, wrong turn): asin(0.1) ≈ 5.7°, about twice a typical datasheet zero-g offset of
 * ±40 mg (from memory, verify: Bosch BMI160). Our choice.
 */
export const MAX_PLAUSIBLE_OFFSET_RAD = Math.asin(0.1);

/** One averaged reading: an angle and its standard uncertainty, rad. */
export interface AngleReading {
  angleRad: number;
  uncertaintyRad: number;
}

export interface ReversalResult {
  /** The face's lean, rad, free of the sensor's zero offset. */
  tiltRad: number;
  /** The sensor's zero offset along the measuring axis, rad. */
  offsetRad: number;
  /**
   * Standard uncertainty of `tiltRad`: half the root-sum-square of the two readings'
   * uncertainties (θ is their half-difference), combined with the sensitivity tolerance.
   */
  uncertaintyRad: number;
  /** False when |offset| exceeds MAX_PLAUSIBLE_OFFSET_RAD: measure the pair again. */
  offsetPlausible: boolean;
}

/** Combines the readings of the two positions (see the file header). */
export function reversalCalibration(first: AngleReading, second: AngleReading): ReversalResult {
  const r1 = requireFinite('first.angleRad', first.angleRad);
  const r2 = requireFinite('second.angleRad', second.angleRad);
  const u1 = requireNonNegative('first.uncertaintyRad', first.uncertaintyRad);
  const u2 = requireNonNegative('second.uncertaintyRad', second.uncertaintyRad);
  const tiltRad = (r1 - r2) / 2;
  const offsetRad = (r1 + r2) / 2;
  const noise = Math.hypot(u1, u2) / 2;
  const scale = SENSITIVITY_TOLERANCE * Math.abs(tiltRad);
  return {
    tiltRad,
    offsetRad,
    uncertaintyRad: Math.hypot(noise, scale),
    offsetPlausible: Math.abs(offsetRad) <= MAX_PLAUSIBLE_OFFSET_RAD,
  };
}
