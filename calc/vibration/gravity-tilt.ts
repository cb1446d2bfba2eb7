/**
 * Tilt from the gravity vector a resting phone measures. A resting accelerometer reads the
 * support's push, +g pointing up (W3C DeviceOrientation Event spec: a phone lying face up
 * reads accelerationIncludingGravity z ≈ +9.8 m/s²). Each phone axis then makes an angle
 * with the horizontal plane of asin(a_i/|a|) (plain vector geometry).
 *
 * How the tilt meter uses it: the phone stands upright on its long edge, screen
 * perpendicular to the wall or column face, so its x axis is the face's normal. The
 * elevation of x is then exactly the face's lean from vertical, whatever angle the phone is
 * held at within the face, and it changes only to second order if the screen is not quite
 * perpendicular to the face (derived).
 */
import { requireFinite } from './checks.js';

/** Elevation of each phone axis above the horizontal plane, and the magnitude read. */
export interface GravityTilt {
  /** asin(ax/|a|): lean of a surface the phone's long edge is pressed on, rad. */
  xRad: number;
  /** asin(ay/|a|): π/2 when the phone stands upright. */
  yRad: number;
  /** asin(az/|a|): π/2 when the phone lies face up. */
  zRad: number;
  /** |a|, m/s² (≈ G when the phone is still). */
  magnitudeMps2: number;
}

/**
 * Angles of the phone's axes from the horizontal, from one gravity reading (m/s², any
 * consistent unit). Throws on a non-finite component or a zero vector (free fall).
 */
export function tiltFromGravity(ax: number, ay: number, az: number): GravityTilt {
  requireFinite('ax', ax);
  requireFinite('ay', ay);
  requireFinite('az', az);
  const m = Math.hypot(ax, ay, az);
  if (!(m > 0)) {
    throw new RangeError(`gravity vector must not be zero, got (${ax}, ${ay}, ${az})`);
  }
  // atan2 against the other two components equals asin(a_i/|a|) and stays accurate near ±π/2.
  return {
    xRad: Math.atan2(ax, Math.hypot(ay, az)),
    yRad: Math.atan2(ay, Math.hypot(ax, az)),
    zRad: Math.atan2(az, Math.hypot(ax, ay)),
    magnitudeMps2: m,
  };
}
