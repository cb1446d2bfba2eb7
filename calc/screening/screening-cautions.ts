/**
 * Sentences every screening result carries, so a result that travels without the app still
 * says what it is (and is not). The web layer may translate; these are the calculation's own.
 */
import { SCREENING_CAUTION } from '../rocking/rocking-cautions.js';

/** Screening results are no substitute for an engineer (the same sentence as calc/rocking's). */
export const VERDICT_CAUTION = SCREENING_CAUTION;

/** What the damage state rests on. */
export const FRAGILITY_CAUTION =
  'The predicted damage state comes from Hazus fragility curves for typical wood buildings, ' +
  'read at an elastic demand from a simplified spectrum: a particular building can do much ' +
  'better or worse. What was observed counts as seen and is never lowered by a prediction.';

/** What the posting is. */
export const POSTING_CAUTION =
  "The posting is a recommendation from Grainline's own table, not a jurisdiction's placard: " +
  'the inspector decides under local rules.';

/** The residual drift limits are recalled, not yet checked against the source. */
export const RESIDUAL_DRIFT_CAUTION =
  'The residual drift limits (0.2 %, 0.5 %, 1 %) are taken from FEMA P-58 as recalled and ' +
  'await verification against the document.';
