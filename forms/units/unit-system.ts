/**
 * The two unit systems an inspector can choose in settings. Storage and the calculation are
 * always SI; the chosen system only changes what fields show and accept.
 */
export const UNIT_SYSTEMS = ['si', 'us'] as const;

/** 'si': metres, kilonewtons, kilopascals; 'us': US customary feet, inches, kips, pounds. */
export type UnitSystem = (typeof UNIT_SYSTEMS)[number];

/** True for a known unit system id. */
export function isUnitSystem(value: unknown): value is UnitSystem {
  return value === 'si' || value === 'us';
}
