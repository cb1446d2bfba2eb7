/**
 * One piece of evidence behind a screening verdict: a predicted figure (from the spectrum
 * and the storey model) or an observation, with its value, the threshold it is read
 * against, and what it implies. Plain JSON.
 */
import type { DamageState } from '../damage/damage-state.js';
import type { PostingLevel } from './posting-level.js';
import type { ScreeningFlagId } from './screening-flags.js';

/** Predicted: computed from the hazard and the building model. Observed: seen or measured on site. */
export type EvidenceSide = 'predicted' | 'observed';

export type EvidenceKind =
  | 'fragility-drift' // Hazus fragility from the peak inter-storey drift ratio
  | 'fragility-spectral-displacement' // Hazus fragility from the spectral displacement
  | 'demand-capacity' // storey shear demand over nominal strength
  | 'no-racking-strength' // a storey with no dependable racking strength
  | 'soft-weak-storey' // ASCE 7-16 Table 12.3-2 soft or weak storey
  | 'torsion' // torsional eccentricity of a storey
  | 'rocking' // rocking wall, predicted θ/α or observed uplift
  | 'stiffness-loss' // measured frequency against the expected one
  | 'devices' // supplemental devices on a wall (not modelled)
  | 'residual-drift' // measured residual drift of a storey
  | 'checklist' // an item of the observed-damage checklist
  | 'uplift'; // uplift measured under a wall not meant to rock

/** Unit of `value`: 'ratio' is dimensionless (0.01 = 1 %). */
export type EvidenceUnit = 'ratio' | 'm' | 'none';

export interface EvidenceItem {
  /** Unique within a result, stable across runs, e.g. 'residual-drift.0.x'. */
  id: string;
  side: EvidenceSide;
  kind: EvidenceKind;
  /** What the item is, in a few words. */
  label: string;
  /** Where in the building ('storey 1, along y', 'wall R2'); null for the whole building. */
  where: string | null;
  /** The figure, in SI or as a ratio; null for items without a number (a checklist entry). */
  value: number | null;
  unit: EvidenceUnit;
  /** The value as people read it ('1.8 %', 'severe'). */
  valueText: string;
  /** The threshold the value was read against (the one passed, else the first not reached). */
  threshold: number | null;
  thresholdText: string;
  /** Least damage state this item shows; null when it sets no state (a flag or information). */
  state: DamageState | null;
  /** Least posting this item asks for, beside the one of the damage state; null for none. */
  postingFloor: PostingLevel | null;
  /** The detailed-assessment flag this item raises, if any. */
  flag: ScreeningFlagId | null;
  /** One sentence: the figure, the threshold and what follows. */
  text: string;
  /** Where the threshold or the rule comes from. */
  source: string;
}
