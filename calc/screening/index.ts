/**
 * The screening verdict. `screen(survey)` returns a `ScreeningResult`: the governing damage
 * state with its probabilities, predicted and observed evidence side by side (each with its
 * value and threshold), the recommended posting (`POSTING_LEVELS`, with the English word and
 * symbol of `POSTING_WORDS`), the flags that call for a detailed assessment, a confidence
 * statement, the calc version and the cautions. Plain JSON, stored and exported as it is.
 */
export * from './posting-level.js';
export { fieldLabel } from './field-label.js';
export { screen, ADDED_BETA_PER_GROUP, type ScreenOptions } from './screen.js';
export {
  RESULT_VERSION,
  type ScreeningConfidence,
  type ScreeningDamage,
  type ScreeningPosting,
  type ScreeningProbabilities,
  type ScreeningResult,
} from './screening-result.js';
export type { EvidenceItem, EvidenceKind, EvidenceSide, EvidenceUnit } from './evidence.js';
export { SCREENING_FLAGS, type ScreeningFlag, type ScreeningFlagId } from './screening-flags.js';
export {
  CHECKLIST_POSTING_FLOORS,
  POSTING_BY_STATE,
  isPostingLevel,
  stricterPosting,
} from './posting-rules.js';
export { DAMAGE_STATE_WORDS, POSTING_WORDS, type PostingWords } from './verdict-words.js';
export type { DirectionSummary, FlaggedStorey } from './direction-summary.js';
export type { RockingWallSummary } from './rocking-evidence.js';
export {
  NO_STRENGTH_SA_G,
  TORSION_ECCENTRICITY_LIMIT,
  YIELD_DEMAND_TO_CAPACITY,
} from './predicted-evidence.js';
export {
  FRAGILITY_CAUTION,
  POSTING_CAUTION,
  RESIDUAL_DRIFT_CAUTION,
  VERDICT_CAUTION,
} from './screening-cautions.js';
