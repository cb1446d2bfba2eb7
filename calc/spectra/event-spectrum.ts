import { requireNonNegative } from './checks.js';
import { dampingCorrection, specDamping } from './damping-correction.js';
import { resolvedSpectralAcceleration, type ResolvedSpectrum } from './resolved-spectrum.js';
import type { EventSpectrum } from './spectrum-spec.js';

/** The shape parameters an event spectrum is built from, in g and s. */
export interface EventShape {
  /** Ordinate at T = 0: the map's PGA. */
  pga: number;
  /** Plateau (constant acceleration) ordinate at 5 %: max(Sa(0.3 s), Sa(1.0 s)). */
  plateau: number;
  /** Ordinate times period in the constant-velocity branch: Sa(1.0 s)·1 s. */
  sa1: number;
  /** Start of the plateau: 0.2·TS. */
  T0: number;
  /** End of the plateau: Sa(1.0 s)·1 s / plateau (≤ 1 s). */
  TS: number;
}

/**
 * Shape of the single-event spectrum. It is the two-parameter shape of ASCE 7-16 §11.4.6
 * (also the "standard shape" of the FEMA Hazus earthquake technical manual §4.1.3, from
 * memory, verify), fitted to what a shaking map gives:
 *
 * - the plateau is Sa(0.3 s) and the constant-velocity branch is Sa(1.0 s)/T, so the
 *   spectrum passes through both map values whenever 0.3·Sa(0.3) ≤ Sa(1.0) ≤ Sa(0.3);
 * - TS = Sa(1.0)/plateau and T0 = 0.2·TS, as ASCE 7-16 §11.4.6 places its corners;
 * - the short-period ramp starts at the map's PGA (instead of ASCE's 0.4·SDS), since the
 *   spectrum at T = 0 is the peak ground acceleration;
 * - when Sa(1.0) > Sa(0.3) (long-period-rich sites) the plateau is raised to Sa(1.0) and
 *   runs to 1 s — a conservative choice of ours (common practice, no source);
 * - a map gives no long-period corner, so Sa(1.0)/T is kept for all T > TS (no TL).
 *   Conservative for displacement at long periods (common practice, no source).
 */
export function eventShape(spec: EventSpectrum): EventShape {
  const pga = requireNonNegative('spec.pga', spec.pga);
  const sa03 = requireNonNegative('spec.sa03', spec.sa03);
  const sa10 = requireNonNegative('spec.sa10', spec.sa10);
  const plateau = Math.max(sa03, sa10);
  // sa10 is Sa at T = 1 s, so Sa·T in the velocity branch is sa10 × 1 s.
  const TS = plateau > 0 ? sa10 / plateau : 0;
  return { pga, plateau, sa1: sa10, T0: 0.2 * TS, TS }; // 0.2: as ASCE 7-16 §11.4.6 sets T0
}

/**
 * The single-event spectrum of {@link eventShape} resolved for evaluation. Damping other
 * than 5 % scales every ordinate but T = 0 by η = max(0.55, √(10/(5+ξ%))), EN 1998-1:2004
 * eq. (3.6), applied as EN 1998-1 does (a common-practice extension for this shape).
 */
export function resolveEvent(spec: EventSpectrum): ResolvedSpectrum {
  const { pga, plateau, T0, TS } = eventShape(spec);
  const dampingRatio = specDamping(spec.damping);
  const eta = dampingCorrection(dampingRatio);
  return {
    atZeroG: pga,
    plateauG: eta * plateau,
    rampEndS: T0,
    plateauEndS: TS, // plateau·TS = Sa(1.0 s)·1 s: the 1/T branch through the map value
    velocityEndS: Infinity, // a shaking map gives no long-period corner
    dampingRatio,
    eta,
  };
}

/** Sa(T) in g of the single-event spectrum described at {@link eventShape}. */
export function eventSpectralAcceleration(spec: EventSpectrum, T: number): number {
  return resolvedSpectralAcceleration(resolveEvent(spec), T);
}
