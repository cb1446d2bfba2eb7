import { requireNonNegative } from './checks.js';

/**
 * Lower bound of the damping correction factor η. Source: EN 1998-1:2004 §3.2.2.2(3),
 * eq. (3.6).
 */
export const ETA_MIN = 0.55;

/**
 * Reference viscous damping of the elastic spectra, as a ratio: 5 %. Source: EN 1998-1:2004
 * §3.2.2.2(3) (η = 1 at 5 %); ASCE 7-16 §11.4.6 spectra are likewise for 5 % damping.
 */
export const REFERENCE_DAMPING = 0.05;

/**
 * Damping correction factor η = max(0.55, √(10 / (5 + ξ))) with ξ in percent,
 * EN 1998-1:2004 §3.2.2.2(3), eq. (3.6). η = 1 at 5 % damping.
 *
 * @param dampingRatio viscous damping as a ratio (0.05 = 5 %); finite and ≥ 0.
 */
export function dampingCorrection(dampingRatio: number): number {
  requireNonNegative('dampingRatio', dampingRatio);
  // eq. (3.6) takes ξ in percent.
  const xiPercent = dampingRatio * 100;
  return Math.max(ETA_MIN, Math.sqrt(10 / (5 + xiPercent)));
}

/** The damping ratio of a spec, defaulting to 5 %, checked to be finite and ≥ 0. */
export function specDamping(damping: number | undefined): number {
  if (damping === undefined) return REFERENCE_DAMPING;
  return requireNonNegative('spec.damping', damping);
}
