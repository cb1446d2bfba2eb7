/**
 * The observed-damage checklist: each item, in the trade's own words, and the least damage
 * state it shows when seen minor or severe. A table of our own (common practice, no source),
 * read against the Hazus descriptions of wood damage states (Hazus-MH 2.1 Earthquake Model
 * Technical Manual, §5.3.1, W1/W2 descriptions; from memory, verify): slip at connections is
 * Moderate; splitting of sill plates, slippage over the foundation and foundation cracks are
 * Extensive; failure of a cripple wall or soft storey and falling off the foundation are
 * Complete.
 *
 * Two items are also a danger to anyone near the building whatever the structure's state:
 * falling hazards and ground failure. They set a least posting (see calc/screening).
 */
import type { ChecklistItem, Severity } from '../survey/survey-input.js';
import type { DamageState } from './damage-state.js';

export interface ChecklistRule {
  item: ChecklistItem;
  /** What the inspector looks for, in the trade's words. */
  words: string;
  /** Least damage state when seen, by severity. */
  state: Record<Severity, DamageState>;
  /** Why, in a sentence. */
  why: string;
}

export const CHECKLIST_RULES: Readonly<Record<ChecklistItem, ChecklistRule>> = {
  'cracked-or-split-members': {
    item: 'cracked-or-split-members',
    words: 'cracked or split studs, posts, beams, plates or panels',
    state: { minor: 'slight', severe: 'extensive' },
    why: 'a split member has lost part of its load path',
  },
  'fastener-withdrawal': {
    item: 'fastener-withdrawal',
    words: 'nails or screws withdrawn, or nail heads pulled through the sheathing',
    state: { minor: 'moderate', severe: 'extensive' },
    why: 'slip at the fasteners is where a nailed wall gives its strength away',
  },
  'hold-down-or-bracket-damage': {
    item: 'hold-down-or-bracket-damage',
    words: 'hold-downs or angle brackets bent, torn or pulled out',
    state: { minor: 'moderate', severe: 'extensive' },
    why: 'the connectors that tie the walls down have yielded',
  },
  'sill-plate-sliding': {
    item: 'sill-plate-sliding',
    words: 'sill plate slid on the foundation, anchor bolts bent or sheared',
    state: { minor: 'moderate', severe: 'extensive' },
    why: 'the building has moved on its foundation',
  },
  'foundation-movement': {
    item: 'foundation-movement',
    words: 'foundation cracked, settled or shifted',
    state: { minor: 'moderate', severe: 'extensive' },
    why: 'the support of the whole building is damaged',
  },
  'leaning-cripple-wall-or-soft-storey': {
    item: 'leaning-cripple-wall-or-soft-storey',
    words: 'cripple wall or soft storey leaning',
    state: { minor: 'extensive', severe: 'complete' },
    why: 'a leaning storey is the start of a collapse of that storey',
  },
  'falling-hazard': {
    item: 'falling-hazard',
    words: 'chimney, parapet, cladding or heavy finishes loose and liable to fall',
    state: { minor: 'slight', severe: 'moderate' },
    why: 'a falling part endangers people at the entrances and around the building',
  },
  'ground-failure': {
    item: 'ground-failure',
    words: 'ground cracked, settled or spread, or sand boiled up (liquefaction ejecta)',
    state: { minor: 'slight', severe: 'extensive' },
    why: 'failing ground can keep moving and undermine the foundation',
  },
};

/** The least damage state one checklist entry shows. */
export function checklistState(item: ChecklistItem, severity: Severity): DamageState {
  const rule = CHECKLIST_RULES[item];
  if (rule === undefined) throw new RangeError(`unknown checklist item ${String(item)}`);
  const state = rule.state[severity];
  if (state === undefined) throw new RangeError(`unknown severity ${String(severity)}`);
  return state;
}
