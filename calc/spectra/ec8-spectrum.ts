import { requireNonNegative, requirePositive } from './checks.js';
import { dampingCorrection, specDamping } from './damping-correction.js';
import type { Ec8Ground, Ec8Spectrum } from './spectrum-spec.js';

/** Soil factor and corner periods (s) of an EN 1998-1 elastic spectrum. */
export interface Ec8Parameters {
  S: number;
  TB: number;
  TC: number;
  TD: number;
}

/**
 * Recommended values for the Type 1 spectrum (surface-wave magnitude Ms > 5.5).
 * Source: EN 1998-1:2004 §3.2.2.2, Table 3.2.
 */
export const EC8_TYPE1: Readonly<Record<Ec8Ground, Readonly<Ec8Parameters>>> = {
  A: { S: 1.0, TB: 0.15, TC: 0.4, TD: 2.0 },
  B: { S: 1.2, TB: 0.15, TC: 0.5, TD: 2.0 },
  C: { S: 1.15, TB: 0.2, TC: 0.6, TD: 2.0 },
  D: { S: 1.35, TB: 0.2, TC: 0.8, TD: 2.0 },
  E: { S: 1.4, TB: 0.15, TC: 0.5, TD: 2.0 },
};

/**
 * Recommended values for the Type 2 spectrum (Ms ≤ 5.5).
 * Source: EN 1998-1:2004 §3.2.2.2, Table 3.3.
 */
export const EC8_TYPE2: Readonly<Record<Ec8Ground, Readonly<Ec8Parameters>>> = {
  A: { S: 1.0, TB: 0.05, TC: 0.25, TD: 1.2 },
  B: { S: 1.35, TB: 0.05, TC: 0.25, TD: 1.2 },
  C: { S: 1.5, TB: 0.1, TC: 0.25, TD: 1.2 },
  D: { S: 1.8, TB: 0.1, TC: 0.3, TD: 1.2 },
  E: { S: 1.6, TB: 0.05, TC: 0.25, TD: 1.2 },
};

/**
 * The S, TB, TC, TD an EC8 spec uses: the recommended table values, each replaced by the
 * user's value when one is given (national annexes). Throws when the result is not
 * 0 < TB ≤ TC ≤ TD and S > 0.
 */
export function ec8Parameters(spec: Ec8Spectrum): Ec8Parameters {
  if (spec.type !== 1 && spec.type !== 2) {
    throw new RangeError(`spec.type must be 1 or 2, got ${String(spec.type)}`);
  }
  const table = spec.type === 1 ? EC8_TYPE1 : EC8_TYPE2;
  const row = table[spec.ground];
  if (row === undefined) {
    throw new RangeError(`spec.ground must be one of A, B, C, D, E, got ${String(spec.ground)}`);
  }
  const S = requirePositive('spec.S', spec.S ?? row.S);
  const TB = requirePositive('spec.TB', spec.TB ?? row.TB);
  const TC = requirePositive('spec.TC', spec.TC ?? row.TC);
  const TD = requirePositive('spec.TD', spec.TD ?? row.TD);
  if (!(TB <= TC && TC <= TD)) {
    throw new RangeError(`spec corner periods must satisfy TB ≤ TC ≤ TD, got ${TB}, ${TC}, ${TD}`);
  }
  return { S, TB, TC, TD };
}

/**
 * EN 1998-1:2004 §3.2.2.2 horizontal elastic response spectrum Se(T), in g, eqs. (3.2)–(3.5),
 * with η from eq. (3.6). The standard defines it up to 4 s; beyond 4 s the 1/T² branch is
 * continued (constant spectral displacement), which §3.2.2.4 and Annex A do for longer
 * periods when TE, TF are not set.
 */
export function ec8SpectralAcceleration(spec: Ec8Spectrum, T: number): number {
  const { S, TB, TC, TD } = ec8Parameters(spec);
  const ag = requireNonNegative('spec.ag', spec.ag);
  const eta = dampingCorrection(specDamping(spec.damping));
  // 2.5 is the spectral amplification of the plateau, EN 1998-1 eqs. (3.2)–(3.5).
  const plateau = 2.5 * ag * S * eta;
  if (T <= TB) return ag * S * (1 + (T / TB) * (2.5 * eta - 1)); // eq. (3.2)
  if (T <= TC) return plateau; // eq. (3.3)
  if (T <= TD) return (plateau * TC) / T; // eq. (3.4)
  return (plateau * TC * TD) / (T * T); // eq. (3.5)
}
