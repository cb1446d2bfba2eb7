/**
 * How a posting follows from the damage state and the evidence. A table of our own (common
 * practice, no source), not any agency's scheme:
 *
 * | governing damage state | posting  |
 * | ---------------------- | -------- |
 * | None, Slight           | open     |
 * | Moderate               | limited  |
 * | Extensive, Complete    | keep-out |
 *
 * Some evidence asks for a posting of its own whatever the damage state (a least posting,
 * see `CHECKLIST_POSTING_FLOORS`): a falling hazard or failing ground endanger anyone
 * near the building, even when the structure itself is sound.
 */
import type { DamageState } from '../damage/damage-state.js';
import type { ChecklistItem, Severity } from '../survey/survey-input.js';
import { POSTING_LEVELS, postingRank, type PostingLevel } from './posting-level.js';

export const POSTING_BY_STATE: Readonly<Record<DamageState, PostingLevel>> = {
  none: 'open',
  slight: 'open',
  moderate: 'limited',
  extensive: 'keep-out',
  complete: 'keep-out',
};

/** Least posting of checklist items that endanger people near the building (ours, no source). */
export const CHECKLIST_POSTING_FLOORS: Readonly<
  Partial<Record<ChecklistItem, Record<Severity, PostingLevel>>>
> = {
  'falling-hazard': { minor: 'limited', severe: 'keep-out' },
  'ground-failure': { minor: 'limited', severe: 'keep-out' },
};

/** The stricter of two postings. */
export function stricterPosting(a: PostingLevel, b: PostingLevel): PostingLevel {
  return postingRank(a) >= postingRank(b) ? a : b;
}

/** True when `value` is one of the posting ids. */
export function isPostingLevel(value: unknown): value is PostingLevel {
  return typeof value === 'string' && (POSTING_LEVELS as readonly string[]).includes(value);
}
