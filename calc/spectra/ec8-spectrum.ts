import { requireNonNegative, requirePositive } from './checks.js';
import { dampingCorrection, specDamping } from './damping-correction.js';
import { resolvedSpectralAcceleration, type ResolvedSpectrum } from './resolved-spectrum.js';
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
 * The EN 1998-1 spectrum resolved for evaluation: ramp from ag·S at T = 0 to the plateau
 * 2.5·ag·S·η at TB (eq. 3.2), plateau to TC (eq. 3.3), 1/T to TD (eq. 3.4), 1/T² beyond
 * (eq. 3.5). 2.5 is the plateau amplification of eqs. (3.2)–(3.5).
 */
export function resolveEc8(spec: Ec8Spectrum): ResolvedSpectrum {
  const { S, TB, TC, TD } = ec8Parameters(spec);
  const ag = requireNonNegative('spec.ag', spec.ag);
  const dampingRatio = specDamping(spec.damping);
  const eta = dampingCorrection(dampingRatio);
  return {
    atZeroG: ag * S,
    plateauG: 2.5 * ag * S * eta,
    rampEndS: TB,
    plateauEndS: TC,
    velocityEndS: TD,
    dampingRatio,
    eta,
  };
}

/**
 * EN 1998-1:2004 §3.2.2.2 horizontal elastic response spectrum Se(T), in g, eqs. (3.2)–(3.5),
 * with η from eq. (3.6). The standard defines it up to 4 s; beyond 4 s the 1/T² branch
 * (constant spectral displacement) is simply continued — EN 1998-1 Annex A, which treats
 * longer periods, is not modelled.
 */
export function ec8SpectralAcceleration(spec: Ec8Spectrum, T: number): number {
  return resolvedSpectralAcceleration(resolveEc8(spec), T);
}
