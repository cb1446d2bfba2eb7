/**
 * Plausibility limits for what an inspector can enter, in SI units. They catch typing slips
 * (a height in mm typed into a field in m) rather than judge the building: each is a generous
 * bound well outside timber buildings that exist. Source for all: common practice, no source
 * (sanity bounds chosen by the team; widen them if a real building needs it).
 */

/** Longest free text in a short field (address, names, captions), in characters. */
export const MAX_SHORT_TEXT = 500;
/** Longest notes text, in characters (about ten pages). */
export const MAX_NOTES = 20_000;
/** Most storeys a record may hold (tallest timber buildings have under 30). */
export const MAX_STOREYS = 60;
/** Most walls (or wall groups) a record may hold. */
export const MAX_WALLS = 2_000;
/** Most photos listed in one record. */
export const MAX_PHOTOS = 500;

/** Storey or wall height, m. */
export const MAX_HEIGHT_M = 30;
/** Plan dimension, wall length or wall position, m. */
export const MAX_PLAN_M = 1_000;
/** Floor area of one storey, m². */
export const MAX_AREA_M2 = 100_000;
/** Dead load per area, Pa (10 kPa is a heavy concrete-topped floor). */
export const MAX_UNIT_WEIGHT_PA = 50_000;
/** Panel thickness, m. */
export const MAX_THICKNESS_M = 1;
/** A force such as a connector capacity, a self weight or a post-tension force, N. */
export const MAX_FORCE_N = 1e9;
/** A stiffness, N/m. */
export const MAX_STIFFNESS_N_PER_M = 1e12;
/** Number of connectors on one wall. */
export const MAX_CONNECTOR_COUNT = 1_000;
/** Measured uplift gap, m. */
export const MAX_GAP_M = 1;
/** Residual drift ratio (0.5 = 50 %: far beyond collapse, so only a slip gets here). */
export const MAX_DRIFT_RATIO = 0.5;
/** Tilt magnitude, rad (a quarter turn). */
export const MAX_TILT_RAD = Math.PI / 2;
/** Measured frequency, Hz. */
export const MAX_FREQUENCY_HZ = 100;
/** Damping ratio (below 1: an overdamped building does not vibrate). */
export const MAX_DAMPING_RATIO = 0.99;
/** Spectral ordinate or ground acceleration, g. */
export const MAX_ACCELERATION_G = 5;
/** Spectrum corner period, s. */
export const MAX_PERIOD_S = 20;
/** GPS accuracy radius, m. */
export const MAX_ACCURACY_M = 100_000;
