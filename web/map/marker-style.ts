/**
 * How a survey looks on the map: the posting's colour, symbol and word (web/app's
 * posting-style.ts, Grainline's own colour-blind-safe scheme), plus a style for surveys not
 * screened yet, and short tags for the damage state.
 */
import type { DamageState } from '../../calc/index.js';
import { damageStateLabels, postingStyles, type LevelStyle } from '../app/posting-style.js';
import type { MessageKey } from '../i18n/index.js';
import type { DamageKey, PostingKey } from './map-points.js';

/** Not screened yet: grey, dashed, a question mark; reads without colour too. */
export const unscreenedStyle: LevelStyle = {
  label: 'posting.unscreened',
  symbol: '?',
  fill: '#f2f2f2',
  border: '#5f5f5f',
  ink: '#2b2b2b',
  fillLevel: 'hollow',
};

export function postingStyle(key: PostingKey): LevelStyle {
  return key === 'unscreened' ? unscreenedStyle : postingStyles[key];
}

/** Damage-state tag: the Hazus state's initial and its rank (S1 slight … C4 complete). */
const DAMAGE_TAGS: Record<DamageState, string> = {
  none: 'N0',
  slight: 'S1',
  moderate: 'M2',
  extensive: 'E3',
  complete: 'C4',
};

export function damageTag(key: DamageKey): string {
  return key === 'unknown' ? '' : DAMAGE_TAGS[key];
}

export function damageLabel(key: DamageKey): MessageKey {
  return key === 'unknown' ? 'map.damage.unknown' : damageStateLabels[key];
}
