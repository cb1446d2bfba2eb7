import { requirePositive } from '../spectra/checks.js';

/** Which code's empirical period formula to use. */
export type EmpiricalPeriodMethod = 'ec8' | 'asce7';

/**
 * Ct for "all other structures" (timber falls here), H in m.
 * Source: EN 1998-1:2004 §4.3.3.2.2(3), eq. (4.6).
 */
export const EC8_CT = 0.05;

/**
 * Height limit of the EN 1998-1 formula, in m. Source: EN 1998-1:2004 §4.3.3.2.2(3).
 */
export const EC8_MAX_HEIGHT_M = 40;

/**
 * Ct for "all other structural systems" with hn in m, and the exponent x.
 * Source: ASCE 7-16 Table 12.8-2 (Ct = 0.02 for hn in ft; 0.0488 for hn in m).
 */
export const ASCE7_CT_SI = 0.0488;
export const ASCE7_X = 0.75;

/** Exponent of the EN 1998-1 formula, T1 = Ct·H^(3/4). Source: EN 1998-1:2004 eq. (4.6). */
const EC8_EXPONENT = 0.75;

/**
 * Height above which ASCE 7-16 no longer lets the equivalent lateral force procedure (and so
 * Ta) stand on its own for most structures: 160 ft = 48.77 m, ASCE 7-16 Table 12.6-1
 * (from memory, verify). Eq. 12.8-7 itself states no height limit.
 */
export const ASCE7_ELF_MAX_HEIGHT_M = 160 * 0.3048;

function checkMethod(method: EmpiricalPeriodMethod): void {
  if (method !== 'ec8' && method !== 'asce7') {
    throw new RangeError(`method must be 'ec8' or 'asce7', got ${String(method)}`);
  }
}

/**
 * Empirical fundamental period, in s.
 *
 * - `ec8`: T1 = Ct·H^(3/4), Ct = 0.050 (all other structures), EN 1998-1:2004 §4.3.3.2.2,
 *   eq. (4.6); valid for H ≤ 40 m.
 * - `asce7`: Ta = Ct·hn^x, Ct = 0.0488 (m), x = 0.75, ASCE 7-16 eq. (12.8-7), Table 12.8-2.
 *
 * Heights outside a method's range are not refused: see {@link empiricalPeriodRange}.
 *
 * @param heightM height of the building above the base (foundation or top of a rigid
 *   basement), in m; finite and > 0.
 * @throws RangeError naming the bad value when the height is ≤ 0 or not finite.
 */
export function empiricalPeriod(heightM: number, method: EmpiricalPeriodMethod): number {
  requirePositive('heightM', heightM);
  checkMethod(method);
  return method === 'ec8'
    ? EC8_CT * Math.pow(heightM, EC8_EXPONENT)
    : ASCE7_CT_SI * Math.pow(heightM, ASCE7_X);
}

/**
 * Warnings for a height outside the range the method was written for; empty when in range.
 * Same checks on the arguments as {@link empiricalPeriod}.
 */
export function empiricalPeriodRange(heightM: number, method: EmpiricalPeriodMethod): string[] {
  requirePositive('heightM', heightM);
  checkMethod(method);
  if (method === 'ec8' && heightM > EC8_MAX_HEIGHT_M) {
    return [
      `height ${heightM} m exceeds the 40 m limit of EN 1998-1 §4.3.3.2.2 eq. (4.6); the period is an extrapolation`,
    ];
  }
  if (method === 'asce7' && heightM > ASCE7_ELF_MAX_HEIGHT_M) {
    return [
      `height ${heightM} m exceeds 160 ft (48.8 m), beyond which ASCE 7-16 Table 12.6-1 does not let the equivalent lateral force procedure stand alone (from memory, verify); Ta is an extrapolation`,
    ];
  }
  return [];
}
