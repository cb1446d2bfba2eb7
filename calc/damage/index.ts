/**
 * Damage states and the evidence that maps to them:
 * - the Hazus damage states (`DAMAGE_STATES`) and comparisons;
 * - the lognormal fragility curve `lognormalFragility(x, median, beta)` = Φ(ln(x/median)/β)
 *   and the normal distribution it uses (`standardNormalCdf`, `erfc`);
 * - the Hazus wood fragility parameters (types W1/W2 by design level, `HAZUS_WOOD`), the
 *   mapping of a survey onto them (`hazusWoodClass`) and damage-state probabilities
 *   (`damageProbabilities`);
 * - the inelastic displacement factor C1 of short-period buildings;
 * - residual drift thresholds (FEMA P-58), the observed-damage checklist table, rocking
 *   bands and uplift, and stiffness loss from a measured frequency.
 */
export * from './damage-state.js';
export { erfc, standardNormalCdf } from './normal-cdf.js';
export { lognormalFragility } from './lognormal-fragility.js';
export {
  HAZUS_WOOD,
  THRESHOLD_STATES,
  hazusWoodParameters,
  type HazusDesignLevel,
  type HazusWoodParameters,
  type HazusWoodType,
  type PerState,
  type ThresholdState,
} from './hazus-wood-parameters.js';
export { W1_MAX_FLOOR_AREA_M2, hazusWoodClass, type HazusWoodClass } from './hazus-wood-class.js';
export {
  damageProbabilities,
  type DamageProbabilities,
  type DiscreteProbabilities,
  type ExceedanceProbabilities,
} from './damage-probabilities.js';
export {
  C1_MAX_PERIOD_S,
  C1_MIN_PERIOD_S,
  C1_SITE_CONSTANT,
  inelasticDisplacementFactor,
} from './inelastic-displacement.js';
export {
  REPAIR_VERSUS_REBUILD_RATIO,
  RESIDUAL_DRIFT_THRESHOLDS,
  RESIDUAL_STABILITY_RATIO,
  residualDriftState,
  type ResidualDriftThreshold,
} from './residual-drift-states.js';
export { CHECKLIST_RULES, checklistState, type ChecklistRule } from './checklist-states.js';
export {
  ENGAGED_HOLD_DOWN_STATE,
  ROCKING_BAND_STATES,
  SHEAR_WALL_UPLIFT_STATE,
  UPLIFT_YIELD_GAP_M,
} from './rocking-states.js';
export {
  STIFFNESS_RATIO_LIMIT_EMPIRICAL,
  STIFFNESS_RATIO_LIMIT_MODEL,
  stiffnessRatioFromFrequency,
} from './stiffness-loss.js';
