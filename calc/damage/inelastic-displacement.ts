/**
 * Inelastic displacement of a short-period building: when the elastic demand exceeds the
 * strength, a stiff building displaces more than the elastic spectrum says. The
 * coefficient C1 of the nonlinear static procedure scales the elastic displacement:
 *
 *   C1 = 1 + (μ − 1) / (a · Te²), with μ = elastic demand / strength,
 *
 * C1 = 1 for μ ≤ 1 or Te ≥ 1 s, and for Te < 0.2 s the value at 0.2 s
 * (ASCE 41-17 §7.4.3.3.2, eq. 7-29, after FEMA 440 (2005) eq. 5-1; from memory, verify).
 */

/**
 * The site-class constant a of C1: 130 for site classes A and B, 90 for C, 60 for D, E and
 * F (ASCE 41-17 §7.4.3.3.2; from memory, verify).
 */
export const C1_SITE_CONSTANT = { AB: 130, C: 90, DEF: 60 } as const;

/** Period below which C1 is held at its 0.2 s value, in s (ASCE 41-17 §7.4.3.3.2). */
export const C1_MIN_PERIOD_S = 0.2;
/** Period from which C1 = 1, in s (ASCE 41-17 §7.4.3.3.2). */
export const C1_MAX_PERIOD_S = 1.0;

/**
 * The displacement modification factor C1 ≥ 1.
 *
 * @param mu strength ratio μ = elastic demand / strength, finite ≥ 0.
 * @param periodS effective period Te in s, finite > 0.
 * @param siteConstant a (60, 90 or 130), finite > 0.
 * @throws RangeError naming the argument when one is out of range.
 */
export function inelasticDisplacementFactor(
  mu: number,
  periodS: number,
  siteConstant: number,
): number {
  if (typeof mu !== 'number' || !Number.isFinite(mu) || mu < 0) {
    throw new RangeError(`mu must be a finite number ≥ 0, got ${String(mu)}`);
  }
  if (typeof periodS !== 'number' || !Number.isFinite(periodS) || periodS <= 0) {
    throw new RangeError(`periodS must be a finite number > 0, got ${String(periodS)}`);
  }
  if (typeof siteConstant !== 'number' || !Number.isFinite(siteConstant) || siteConstant <= 0) {
    throw new RangeError(`siteConstant must be a finite number > 0, got ${String(siteConstant)}`);
  }
  if (mu <= 1 || periodS >= C1_MAX_PERIOD_S) return 1;
  const T = Math.max(periodS, C1_MIN_PERIOD_S);
  return 1 + (mu - 1) / (siteConstant * T * T);
}
