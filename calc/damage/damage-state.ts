/**
 * Damage states of the Hazus earthquake technical manual (structural damage: None, Slight,
 * Moderate, Extensive, Complete), in increasing order of severity.
 */
export const DAMAGE_STATES = ['none', 'slight', 'moderate', 'extensive', 'complete'] as const;

export type DamageState = (typeof DAMAGE_STATES)[number];

/** 0 for none up to 4 for complete, for comparisons. */
export function damageStateRank(state: DamageState): number {
  return DAMAGE_STATES.indexOf(state);
}

/** The more severe of two states. */
export function worseDamageState(a: DamageState, b: DamageState): DamageState {
  return damageStateRank(a) >= damageStateRank(b) ? a : b;
}
