/**
 * Stiffness loss from a measured fundamental frequency. With the mass unchanged,
 * f = (1/2π)·√(k/m), so k_now/k_ref = (f_now/f_ref)² (single-degree-of-freedom relation,
 * Chopra, Dynamics of Structures, ch. 2). A low ratio is a sign of stiffness lost in
 * connections and sheathing that a walk-round cannot see.
 *
 * The reference here is the expected frequency: the storey model's (from the walls) or,
 * without one, the empirical period formula. Neither is a measurement of the undamaged
 * building, and ambient vibration at tiny amplitude includes finishes and partitions, so the
 * ratio prompts a closer look (a detailed assessment) rather than setting a damage state.
 */

/**
 * Ratio below which the building is sent to detailed assessment when the reference is the
 * storey model: 0.5, a frequency 30 % below the model's (our own, common practice, no
 * source).
 */
export const STIFFNESS_RATIO_LIMIT_MODEL = 0.5;

/**
 * The same when the reference is an empirical period formula, which scatters widely against
 * measured periods (about ±30 % on the period, from memory, verify): 0.25 (our own, common
 * practice, no source).
 */
export const STIFFNESS_RATIO_LIMIT_EMPIRICAL = 0.25;

/** k_now/k_ref = (f_now/f_ref)². Both frequencies finite > 0, in Hz. */
export function stiffnessRatioFromFrequency(measuredHz: number, referenceHz: number): number {
  for (const [name, v] of [
    ['measuredHz', measuredHz],
    ['referenceHz', referenceHz],
  ] as const) {
    if (typeof v !== 'number' || !Number.isFinite(v) || v <= 0) {
      throw new RangeError(`${name} must be a finite number > 0, got ${String(v)}`);
    }
  }
  const r = measuredHz / referenceHz;
  return r * r;
}
