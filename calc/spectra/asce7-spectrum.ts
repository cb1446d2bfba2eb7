import { requireNonNegative, requirePositive } from './checks.js';
import { dampingCorrection, specDamping } from './damping-correction.js';
import { resolvedSpectralAcceleration, type ResolvedSpectrum } from './resolved-spectrum.js';
import type { Asce7Spectrum } from './spectrum-spec.js';

/** Corner periods of an ASCE 7-16 design spectrum, in s. */
export interface Asce7Corners {
  T0: number;
  TS: number;
  TL: number;
}

/** T0 = 0.2·SD1/SDS and TS = SD1/SDS, ASCE 7-16 §11.4.6. */
export function asce7Corners(spec: Asce7Spectrum): Asce7Corners {
  const SDS = requirePositive('spec.SDS', spec.SDS);
  const SD1 = requireNonNegative('spec.SD1', spec.SD1);
  const TL = requirePositive('spec.TL', spec.TL);
  const TS = SD1 / SDS; // ASCE 7-16 §11.4.6
  return { T0: 0.2 * TS, TS, TL }; // 0.2: ASCE 7-16 §11.4.6
}

/**
 * The ASCE 7-16 §11.4.6 spectrum resolved for evaluation: 0.4·SDS at T = 0 rising linearly
 * to SDS at T0 (eq. 11.4-5), SDS to TS, SD1/T to TL (eq. 11.4-6), SD1·TL/T² beyond
 * (eq. 11.4-7). 0.4 is the T = 0 ratio of eq. (11.4-5).
 *
 * Damping other than 5 % (`spec.damping`) is not part of ASCE 7's design spectrum. As a
 * common-practice extension the ordinates are scaled by the EN 1998-1:2004 eq. (3.6) factor
 * η = max(0.55, √(10/(5+ξ%))), the way EN 1998-1 applies it: the T = 0 ordinate (the
 * ground acceleration, 0.4·SDS) is not scaled and the short-period ramp runs up to η·SDS.
 */
export function resolveAsce7(spec: Asce7Spectrum): ResolvedSpectrum {
  const { T0, TS, TL } = asce7Corners(spec);
  const dampingRatio = specDamping(spec.damping);
  const eta = dampingCorrection(dampingRatio);
  return {
    atZeroG: 0.4 * spec.SDS,
    plateauG: eta * spec.SDS,
    rampEndS: T0,
    plateauEndS: TS, // so plateau·TS/T = η·SD1/T
    velocityEndS: TL,
    dampingRatio,
    eta,
  };
}

/**
 * ASCE 7-16 §11.4.6 design response spectrum Sa(T), in g (eqs. 11.4-5 to 11.4-7), with
 * the damping extension described at {@link resolveAsce7}.
 */
export function asce7SpectralAcceleration(spec: Asce7Spectrum, T: number): number {
  return resolvedSpectralAcceleration(resolveAsce7(spec), T);
}
