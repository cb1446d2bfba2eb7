/**
 * Plausibility limits for survey values, in SI. A value outside is taken as an entry error:
 * it is listed as invalid and treated as absent, so absurd numbers (1e300 m, 1e-300 Pa)
 * cannot overflow the arithmetic. Wide on purpose: sanity limits for screening input,
 * common practice, no source.
 */
export const PLAUSIBLE = {
  storeyHeightM: [0.1, 30],
  wallHeightM: [0.1, 30],
  floorAreaM2: [0.1, 1e5],
  unitWeightPa: [0, 2e4],
  wallLengthM: [0.01, 1000],
  planM: [0.1, 1000],
  positionM: [-1e4, 1e4],
  frequencyHz: [0.01, 100],
  connectorCount: [0, 1000],
  connectorCapacityN: [0, 1e8],
  connectorStiffnessNPerM: [0, 1e11],
  userUnitShearNPerM: [0, 1e7],
  userUnitStiffnessNPerM2: [0, 1e10],
  /** First-mode period of a storey model, in s: outside it the wall values are in error. */
  modelPeriodS: [0.001, 100],
  /** Any spectral ordinate (g) or corner period (s) of a hazard. */
  hazardValue: [0, 100],
} as const satisfies Record<string, readonly [number, number]>;

/** A [low, high] plausibility range, both ends included. */
export type PlausibleRange = readonly [number, number];

/** True when x is a number inside `range` (both ends included; NaN fails). */
export function plausible(x: unknown, range: PlausibleRange): x is number {
  return typeof x === 'number' && x >= range[0] && x <= range[1];
}

/** "from 0.1 to 30", for messages. */
export function rangeText(range: PlausibleRange): string {
  return `from ${range[0]} to ${range[1]}`;
}
