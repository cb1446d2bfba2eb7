/**
 * Rocking walls: walls allowed to uplift and rock (post-tensioned or free-standing CLT and
 * heavy-timber walls, walls whose hold-downs have let go). Housner's rigid block
 * (`rockingBlock`), a wall with gravity load, post-tension and hold-downs mapped onto an
 * equivalent block (`rockingWall`), the free-rocking period, the equivalent-SDOF spectral
 * estimate of peak rocking (`rockingDemand`, known to be unreliable in some cases), a
 * nonlinear time history with impacts (`rockingTimeHistory`), the smallest toppling pulse
 * (`pulseOverturningCheck`), what an observed uplift gap says (`observedRocking`), and the
 * per-wall screening entry points (`rockingWallFromInput`, `assessRockingWall`).
 * SI units; angles in rad; accelerations of the ground in m/s² as functions, thresholds in g.
 */
export { rockingBlock, effectiveHeight } from './rocking-block.js';
export type { RockingBlock, RockingOscillator } from './rocking-block.js';
export { rockingWall } from './rocking-wall.js';
export type {
  RockingWall,
  RockingWallParams,
  RockingWallLeverArms,
  RockingWallMoments,
} from './rocking-wall.js';
export { freeRockingPeriod, rockingPeriod } from './free-rocking-period.js';
export { rockingDemand, rockingDampingRatio } from './rocking-demand.js';
export type { RockingDemand } from './rocking-demand.js';
export { rockingTimeHistory } from './rocking-time-history.js';
export type { RockingTimeHistory } from './rocking-time-history.js';
export { freeRockingOutcome } from './rocking-integrator.js';
export type { GroundAcceleration, RockingIntegrationOptions } from './rocking-integrator.js';
export { groundPulse, rectangularPulse, pulsePeriodFromMagnitude } from './ground-pulses.js';
export type { GroundPulse, PulseShape } from './ground-pulses.js';
export { pulseOverturningCheck, pulseResponse } from './pulse-overturning.js';
export type { PulseCheckInput, PulseOverturningCheck } from './pulse-overturning.js';
export {
  observedRocking,
  rockingBand,
  rockingBandText,
  ROCKING_BAND_LIMITS,
} from './observed-rocking.js';
export type { ObservedRocking, RockingBand } from './observed-rocking.js';
export {
  rockingWallFromInput,
  CLT_UNIT_WEIGHT_N_PER_M3,
  DEFAULT_PANEL_THICKNESS_M,
} from './rocking-wall-from-input.js';
export type { RockingWallModel } from './rocking-wall-from-input.js';
export { assessRockingWall, spectrumCornerPeriod } from './assess-rocking-wall.js';
export type {
  RockingAssessmentOptions,
  RockingFlag,
  RockingWallAssessment,
} from './assess-rocking-wall.js';
export {
  SPECTRAL_ROCKING_CAUTION,
  SCREENING_CAUTION as ROCKING_SCREENING_CAUTION,
  DEVICES_CAUTION,
} from './rocking-cautions.js';
