/**
 * What the map, the CSV and the summary card need from a survey's stored result: the
 * recommended posting, the damage state and whether the building needs a detailed
 * assessment.
 *
 * The result snapshot is calc/screening's ScreeningResult stored as JSON
 * (test/unit/exchange-verdict.test.ts checks this reader against real `screen()` results).
 * A stored snapshot may come from any build or file, so the reader is tolerant: it looks
 * for the fields below and treats anything it cannot read as "not screened", never guessing.
 * - posting: `result.posting` (a posting id) or `result.posting.level`;
 * - damage state: `result.damageState` (a damage-state id) or `result.damage.state`;
 * - needs assessment: `result.needsAssessment` (boolean) or `result.detailedAssessment`.
 */
import {
  DAMAGE_STATES,
  POSTING_LEVELS,
  type DamageState,
  type PostingLevel,
} from '../../calc/index.js';
import type { SurveyRecord } from '../../forms/index.js';

export interface SurveyVerdict {
  /** null when the survey has no readable result yet. */
  posting: PostingLevel | null;
  damageState: DamageState | null;
  /** True when the result sends the building to an engineer for detailed assessment. */
  needsAssessment: boolean;
}

const NO_VERDICT: SurveyVerdict = { posting: null, damageState: null, needsAssessment: false };

function field(obj: unknown, key: string): unknown {
  if (typeof obj !== 'object' || obj === null || Array.isArray(obj)) return undefined;
  // Own properties only: an imported "__proto__" or "constructor" key must not reach
  // Object.prototype's members.
  return Object.prototype.hasOwnProperty.call(obj, key)
    ? (obj as Record<string, unknown>)[key]
    : undefined;
}

function oneOf<T extends string>(list: readonly T[], value: unknown): T | null {
  return typeof value === 'string' && (list as readonly string[]).includes(value)
    ? (value as T)
    : null;
}

/** Reads the verdict of a record's result snapshot; never throws. */
export function readVerdict(record: Pick<SurveyRecord, 'result'>): SurveyVerdict {
  const result = record.result?.result;
  if (result === undefined || result === null) return NO_VERDICT;
  const postingField = field(result, 'posting');
  const posting =
    oneOf(POSTING_LEVELS, postingField) ?? oneOf(POSTING_LEVELS, field(postingField, 'level'));
  const damageState =
    oneOf(DAMAGE_STATES, field(result, 'damageState')) ??
    oneOf(DAMAGE_STATES, field(field(result, 'damage'), 'state'));
  const flag = field(result, 'needsAssessment') ?? field(result, 'detailedAssessment');
  return { posting, damageState, needsAssessment: flag === true };
}
