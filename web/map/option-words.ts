/** Words for the filter values: structural systems, needs-assessment, damage states. */
import type { StructuralSystem } from '../../calc/index.js';
import { t, type MessageKey } from '../i18n/index.js';
import type { AssessmentKey, Facet } from './map-filters.js';
import type { DamageKey, PostingKey } from './map-points.js';
import { damageLabel, postingStyle } from './marker-style.js';

export const SYSTEMS: readonly StructuralSystem[] = [
  'light-frame',
  'mass-timber-panel',
  'rocking-wall',
  'heavy-timber-frame',
];

const SYSTEM_WORDS: Record<StructuralSystem, MessageKey> = {
  'light-frame': 'map.system.lightFrame',
  'mass-timber-panel': 'map.system.massTimber',
  'rocking-wall': 'map.system.rockingWall',
  'heavy-timber-frame': 'map.system.heavyFrame',
};

export const ASSESSMENT: readonly AssessmentKey[] = ['needed', 'not-needed'];

/** The word for one value of a facet. Inspector names are shown as typed. */
export function valueWord(facet: Facet, value: string): string {
  switch (facet) {
    case 'posting':
      return t(postingStyle(value as PostingKey).label);
    case 'damage':
      return t(damageLabel(value as DamageKey));
    case 'system':
      return t(SYSTEM_WORDS[value as StructuralSystem] ?? 'map.system.unknown');
    case 'assessment':
      return t(value === 'needed' ? 'map.assessment.needed' : 'map.assessment.notNeeded');
    case 'inspector':
      return value.trim() === '' ? t('map.inspector.none') : value;
  }
}
