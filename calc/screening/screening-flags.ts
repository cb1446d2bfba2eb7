/**
 * Reasons to send a building to an engineer for a detailed assessment. Our own names and
 * rules (common practice, no source); each flag comes with a sentence in the result.
 */
export const SCREENING_FLAGS = [
  /** Governing state Extensive or Complete: repair, shoring or demolition is an engineer's call. */
  'extensive-damage',
  /** A soft or weak storey (ASCE 7-16 Table 12.3-2) that yields, or an extreme one. */
  'soft-or-weak-storey',
  /** A storey with no dependable racking strength (bare studs, e.g. a cripple wall) under shaking. */
  'no-racking-strength',
  /** Large torsional eccentricity. */
  'torsion',
  /** A rocking wall result needing attention (see calc/rocking). */
  'rocking-wall',
  /** Supplemental devices recorded: not modelled. */
  'devices-not-modelled',
  /** Residual drift at or above the level where repair often costs more than rebuilding. */
  'residual-drift',
  /** Residual drift at which stability in aftershocks needs an engineer. */
  'residual-drift-stability',
  /** Ground failure seen: a geotechnical matter. */
  'ground-failure',
  /** The measured frequency is far below the expected one. */
  'stiffness-loss',
] as const;

export type ScreeningFlagId = (typeof SCREENING_FLAGS)[number];

/** A raised flag and why. */
export interface ScreeningFlag {
  id: ScreeningFlagId;
  /** Sentences, one per item that raised it. */
  reasons: string[];
}
