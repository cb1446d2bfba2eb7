import { G } from '../units/gravity.js';
import { resolveAsce7 } from './asce7-spectrum.js';
import { requireNonNegative } from './checks.js';
import { resolveEc8 } from './ec8-spectrum.js';
import { resolveEvent } from './event-spectrum.js';
import { resolvedSpectralAcceleration, type ResolvedSpectrum } from './resolved-spectrum.js';
import type { SpectrumSpec } from './spectrum-spec.js';

/**
 * Spectral acceleration Sa(T), in g, of any supported spectrum, at 5 % damping unless
 * `spec.damping` (a ratio, 0.05 = 5 %) says otherwise.
 *
 * - `ec8`: EN 1998-1:2004 §3.2.2.2, η from eq. (3.6).
 * - `asce7`: ASCE 7-16 §11.4.6. At damping ≠ 5 % the EN 1998-1 eq. (3.6) factor
 *   η = max(0.55, √(10/(5+ξ%))) is applied — a common-practice extension, not ASCE 7.
 * - `event`: the shaking-map shape of {@link eventShape}, with the same η extension.
 *
 * @param T period in s, finite and ≥ 0.
 * @throws RangeError naming the bad value when T or a spec field is out of range.
 */
export function spectralAcceleration(spec: SpectrumSpec, T: number): number {
  requireNonNegative('T', T);
  return resolvedSpectralAcceleration(resolveSpectrum(spec), T);
}

/**
 * Checks a spec and works out its corner periods, plateau and damping factor once, for
 * evaluating many periods with {@link resolvedSpectralAcceleration} (same values as
 * {@link spectralAcceleration}).
 *
 * @throws RangeError naming the bad value when a spec field is out of range.
 */
export function resolveSpectrum(spec: SpectrumSpec): ResolvedSpectrum {
  switch (spec.kind) {
    case 'ec8':
      return resolveEc8(spec);
    case 'asce7':
      return resolveAsce7(spec);
    case 'event':
      return resolveEvent(spec);
    default: {
      const never: never = spec;
      throw new RangeError(
        `spec.kind must be 'ec8', 'asce7' or 'event', got ${JSON.stringify(never)}`,
      );
    }
  }
}

/**
 * Spectral displacement Sd(T) = Sa(T)·g·(T/2π)², in m (EN 1998-1:2004 §3.2.2.4, eq. 3.7),
 * at the spec's damping like {@link spectralAcceleration}.
 */
export function spectralDisplacement(spec: SpectrumSpec, T: number): number {
  const sa = spectralAcceleration(spec, T);
  const w = T / (2 * Math.PI);
  return sa * G * w * w;
}
