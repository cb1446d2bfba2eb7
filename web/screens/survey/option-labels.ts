/** Catalogue keys of the words for each choice in the survey (ids come from calc/forms). */
import type {
  ChecklistItem,
  CodeLevel,
  FloorConstruction,
  Occupancy,
  RoofConstruction,
  StructuralSystem,
  SupplementalDevice,
  WallType,
} from '../../../calc/index.js';
import type { ChoiceOption } from '../../../forms/fields/index.js';
import { t, type MessageKey } from '../../i18n/index.js';

export const SYSTEMS: readonly StructuralSystem[] = [
  'light-frame',
  'mass-timber-panel',
  'rocking-wall',
  'heavy-timber-frame',
];
export const CODE_LEVELS: readonly CodeLevel[] = ['pre-code', 'low', 'moderate', 'high', 'unknown'];
export const OCCUPANCIES: readonly Occupancy[] = [
  'single-family',
  'multi-family',
  'commercial',
  'industrial',
  'public-assembly',
  'essential-facility',
];
export const ROOFS: readonly RoofConstruction[] = ['light', 'heavy-tile', 'clt', 'green'];
export const FLOORS: readonly FloorConstruction[] = [
  'on-grade',
  'light-timber',
  'timber-concrete',
  'clt',
];
export const WALL_TYPES: readonly WallType[] = [
  'wsp-150',
  'wsp-100',
  'wsp-75',
  'wsp-50',
  'gypsum',
  'diagonal-boards',
  'unsheathed',
  'clt-bracketed',
  'rocking',
  'user',
];
export const DEVICES: readonly SupplementalDevice[] = [
  'viscous-damper',
  'inerter',
  'clutch',
  'friction',
  'other',
];
export const CHECKLIST: readonly ChecklistItem[] = [
  'cracked-or-split-members',
  'fastener-withdrawal',
  'hold-down-or-bracket-damage',
  'sill-plate-sliding',
  'foundation-movement',
  'leaning-cripple-wall-or-soft-storey',
  'falling-hazard',
  'ground-failure',
];

/** Options with labels `${prefix}.${id}` and, when present, details `${prefix}.${id}.detail`. */
export function options<T extends string>(
  ids: readonly T[],
  prefix: string,
  withDetail = false,
): ChoiceOption<T>[] {
  return ids.map((id) => ({
    value: id,
    label: t(`${prefix}.${id}` as MessageKey),
    detail: withDetail ? t(`${prefix}.${id}.detail` as MessageKey) : undefined,
  }));
}

/** The word for one choice. */
export function optionLabel(prefix: string, id: string): string {
  return t(`${prefix}.${id}` as MessageKey);
}
