/**
 * Sentences the rocking results carry, for the UI and exports to show beside the figures.
 * (The web layer translates; these are the calculation's own statements.)
 */

/** The equivalent-SDOF estimate is known to be unreliable in some cases. */
export const SPECTRAL_ROCKING_CAUTION =
  'The rocking estimate from the displacement spectrum treats the wall as an equivalent ' +
  'linear oscillator with an amplitude-dependent period and damping from impact losses. ' +
  'This is known to be unreliable in some cases, in either direction (Makris & ' +
  'Konstantinidis 2003, Earthquake Engng Struct. Dyn. 32(2):265–289): a rocking wall is not ' +
  'a damped linear oscillator. A time-history check under a pulse is shown beside it.';

/** Screening results are no substitute for an engineer. */
export const SCREENING_CAUTION =
  'Screening estimate only: not a substitute for evaluation by a licensed engineer. Follow ' +
  "local codes and the jurisdiction's posting rules, and never enter a building that looks " +
  'unsafe.';

/** Supplemental devices are recorded but not modelled. */
export const DEVICES_CAUTION =
  'This wall has supplemental devices (dampers, inerters, clutches, friction devices or ' +
  'other). They are recorded but not modelled here, so the rocking results ignore them; the ' +
  'wall needs a detailed assessment.';
