import { requireNonNegative, requirePositive } from './checks.js';
import { dampingCorrection, specDamping } from './damping-correction.js';
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
 * ASCE 7-16 §11.4.6 design response spectrum Sa(T), in g (eqs. 11.4-5 to 11.4-8).
 *
 * Damping other than 5 % (`spec.damping`) is not part of ASCE 7's design spectrum. As a
 * common-practice extension the ordinates are scaled by the EN 1998-1:2004 eq. (3.6) factor
 * η = max(0.55, √(10/(5+ξ%))), in the way EN 1998-1 applies it: the T = 0 ordinate (the
 * ground acceleration, 0.4·SDS) is not scaled and the short-period ramp runs up to η·SDS.
 */
export function asce7SpectralAcceleration(spec: Asce7Spectrum, T: number): number {
  const { T0, TS, TL } = asce7Corners(spec);
  const { SDS, SD1 } = spec;
  const eta = dampingCorrection(specDamping(spec.damping));
  // 0.4 and 0.6: ASCE 7-16 eq. (11.4-5), Sa = SDS(0.4 + 0.6 T/T0); written so that η scales
  // the plateau end of the ramp only.
  if (T === 0) return 0.4 * SDS; // eq. (11.4-5) at T = 0, also when SD1 = 0 makes T0 = 0
  if (T < T0) return SDS * (0.4 + ((eta - 0.4) * T) / T0);
  if (T <= TS) return eta * SDS; // §11.4.6 item 2
  if (T <= TL) return (eta * SD1) / T; // eq. (11.4-6)
  return (eta * SD1 * TL) / (T * T); // eq. (11.4-7)
}
