/**
 * Units the forms show and accept, each with its exact factor to the SI unit it is stored in
 * (value in the unit × factor = value in SI).
 *
 * Sources of the factors: NIST Special Publication 811 (2008), "Guide for the Use of the
 * International System of Units", Appendix B.8 and B.9. The foot (0.3048 m) and the inch
 * (0.0254 m) are exact by the 1959 international yard and pound agreement; the pound-force is
 * exactly 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N (NIST SP 811 B.8, "pound-force").
 * Every other US factor below is derived from those three by exact arithmetic.
 */

/** Exact length of the international foot, m (NIST SP 811 B.8). */
export const FOOT_M = 0.3048;
/** Exact length of the inch, m (NIST SP 811 B.8). */
export const INCH_M = 0.0254;
/** Exact pound-force, N: 0.45359237 kg × standard gravity 9.80665 m/s² (NIST SP 811 B.8). */
export const POUND_FORCE_N = 0.45359237 * 9.80665;

/** Identifiers of the units (their symbols for people live in the message catalogue). */
export type UnitId =
  | 'm'
  | 'cm'
  | 'mm'
  | 'ft'
  | 'in'
  | 'm2'
  | 'ft2'
  | 'N'
  | 'kN'
  | 'lbf'
  | 'kip'
  | 'kN/mm'
  | 'kip/in'
  | 'kN/m'
  | 'plf'
  | 'kN/mm/m'
  | 'kip/in/ft'
  | 'kPa'
  | 'psf'
  | 'g'
  | 's'
  | 'deg'
  | 'pct'
  | 'Hz'
  | 'coord'
  | 'factor'
  | 'count';

export interface UnitDef {
  /** Value in this unit × toSI = value in the SI storage unit. */
  toSI: number;
  /**
   * Decimal places shown in results and plots, chosen so one step of the last digit is
   * finer than a field reading can be (common practice, no source).
   */
  decimals: number;
  /** What a person may type after the number to mean this unit (lower case). */
  typed: readonly string[];
}

/** Every unit, by id. */
export const UNITS: Readonly<Record<UnitId, UnitDef>> = {
  m: { toSI: 1, decimals: 2, typed: ['m'] },
  cm: { toSI: 0.01, decimals: 1, typed: ['cm'] },
  mm: { toSI: 0.001, decimals: 0, typed: ['mm'] },
  ft: { toSI: FOOT_M, decimals: 2, typed: ['ft', "'", 'feet', 'foot', '’'] },
  in: { toSI: INCH_M, decimals: 2, typed: ['in', '"', 'inch', 'inches', '”'] },
  m2: { toSI: 1, decimals: 1, typed: ['m2', 'm²', 'sqm', 'sq m'] },
  ft2: { toSI: FOOT_M * FOOT_M, decimals: 0, typed: ['ft2', 'ft²', 'sqft', 'sq ft', 'sf'] },
  N: { toSI: 1, decimals: 0, typed: ['n'] },
  kN: { toSI: 1000, decimals: 1, typed: ['kn'] },
  lbf: { toSI: POUND_FORCE_N, decimals: 0, typed: ['lbf', 'lb', 'lbs'] },
  kip: { toSI: 1000 * POUND_FORCE_N, decimals: 2, typed: ['kip', 'kips', 'k'] },
  'kN/mm': { toSI: 1000 / 0.001, decimals: 2, typed: ['kn/mm'] },
  'kip/in': { toSI: (1000 * POUND_FORCE_N) / INCH_M, decimals: 1, typed: ['kip/in', 'k/in'] },
  'kN/m': { toSI: 1000, decimals: 2, typed: ['kn/m'] },
  plf: { toSI: POUND_FORCE_N / FOOT_M, decimals: 0, typed: ['plf', 'lb/ft', 'lbf/ft'] },
  'kN/mm/m': { toSI: 1000 / 0.001, decimals: 2, typed: ['kn/mm/m', 'kn/mm per m'] },
  'kip/in/ft': {
    toSI: (1000 * POUND_FORCE_N) / INCH_M / FOOT_M,
    decimals: 1,
    typed: ['kip/in/ft', 'k/in/ft', 'kip/in per ft'],
  },
  kPa: { toSI: 1000, decimals: 2, typed: ['kpa'] },
  psf: { toSI: POUND_FORCE_N / (FOOT_M * FOOT_M), decimals: 1, typed: ['psf', 'lb/ft2'] },
  g: { toSI: 1, decimals: 3, typed: ['g'] },
  s: { toSI: 1, decimals: 2, typed: ['s', 'sec'] },
  deg: { toSI: Math.PI / 180, decimals: 2, typed: ['°', 'deg', 'degrees'] },
  pct: { toSI: 0.01, decimals: 2, typed: ['%'] },
  Hz: { toSI: 1, decimals: 2, typed: ['hz'] },
  // Latitude and longitude in decimal degrees: stored as degrees (WGS84), not radians.
  coord: { toSI: 1, decimals: 5, typed: ['°', 'deg'] },
  factor: { toSI: 1, decimals: 2, typed: [] },
  count: { toSI: 1, decimals: 0, typed: [] },
};
