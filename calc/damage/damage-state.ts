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

/** The most severe of a list of states ('none' for an empty list). */
export function worstDamageState(states: Iterable<DamageState | null>): DamageState {
  let worst: DamageState = 'none';
  for (const s of states) if (s !== null && damageStateRank(s) > damageStateRank(worst)) worst = s;
  return worst;
}

/** True when `value` is one of the damage-state ids. */
export function isDamageState(value: unknown): value is DamageState {
  return typeof value === 'string' && (DAMAGE_STATES as readonly string[]).includes(value);
}
