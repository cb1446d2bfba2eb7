/**
 * Stiffness-loss indicator from a measured fundamental frequency. For an unchanged mass,
 * f = (1/2π)·√(k/m), so k_now/k_ref = (f_now/f_ref)² (SDOF relation, Chopra, Dynamics of
 * Structures, ch. 2). A ratio below 1 is evidence of lost stiffness — cracked connections,
 * loosened fasteners, damaged sheathing — that a walk-round cannot see.
 *
 * The reference matters more than the measurement: a pre-event measurement of the same
 * building is a good reference; a code formula is a weak one (it scatters widely against
 * measured periods, and ambient, low-amplitude stiffness includes finishes and partitions).
 */
import { requireNonNegative, requirePositive } from './checks.js';

/**
 * Relative standard uncertainty of a reference frequency taken from an empirical period
 * formula (EN 1998-1 eq. 4.6, ASCE 7-16 eq. 12.8-7): 30 %. From memory, verify; such
 * formulas are fitted to scattered measurements and are deliberately short (conservative
 * for force), so this is a placeholder for a documented scatter.
 */
export const EMPIRICAL_REFERENCE_SCATTER = 0.3;

export interface StiffnessIndicatorInput {
  frequencyHz: number;
  /** Standard uncertainty of the measured frequency, Hz (0 when unknown). */
  frequencyUncertaintyHz?: number | null;
  referenceFrequencyHz: number;
  /** Relative standard uncertainty of the reference (0.3 = 30 %; 0 when exact). */
  referenceRelativeUncertainty?: number | null;
}

export interface StiffnessIndicator {
  /** k_now/k_ref = (f_now/f_ref)². */
  stiffnessRatio: number;
  /** One standard uncertainty of the ratio. */
  uncertainty: number;
  /** 1 − ratio (negative when the building is stiffer than the reference). */
  lossFraction: number;
  frequencyRatio: number;
}

/** (f/f_ref)², dimensionless. */
export function stiffnessRatio(frequencyHz: number, referenceFrequencyHz: number): number {
  requirePositive('frequencyHz', frequencyHz);
  requirePositive('referenceFrequencyHz', referenceFrequencyHz);
  return (frequencyHz / referenceFrequencyHz) ** 2;
}

/**
 * The indicator with its uncertainty: for r = (f/f_ref)², u_r/r = 2·√((u_f/f)² + (u_ref/f_ref)²)
 * (first-order propagation, GUM JCGM 100:2008 §5.1.2).
 */
export function stiffnessLossIndicator(input: StiffnessIndicatorInput): StiffnessIndicator {
  const ratio = stiffnessRatio(input.frequencyHz, input.referenceFrequencyHz);
  const uf = requireNonNegative('frequencyUncertaintyHz', input.frequencyUncertaintyHz ?? 0);
  const uRef = requireNonNegative(
    'referenceRelativeUncertainty',
    input.referenceRelativeUncertainty ?? 0,
  );
  const relative = 2 * Math.hypot(uf / input.frequencyHz, uRef);
  return {
    stiffnessRatio: ratio,
    uncertainty: ratio * relative,
    lossFraction: 1 - ratio,
    frequencyRatio: input.frequencyHz / input.referenceFrequencyHz,
  };
}
