/**
 * Values derived from a record for the indexes and the building list. Pure.
 */
import { POSTING_LEVELS, type PostingLevel } from '../../calc/index.js';
import type { SurveyRecord } from '../../forms/index.js';
import { encodeGeohash } from './geohash.js';

/** What the `outcome` index holds: a posting level, or 'unscreened'. */
export type Outcome = PostingLevel | 'unscreened';

function own(obj: unknown, key: string): unknown {
  if (typeof obj !== 'object' || obj === null || Array.isArray(obj)) return undefined;
  return Object.prototype.hasOwnProperty.call(obj, key)
    ? (obj as Record<string, unknown>)[key]
    : undefined;
}

function asPosting(v: unknown): PostingLevel | null {
  return typeof v === 'string' && (POSTING_LEVELS as readonly string[]).includes(v)
    ? (v as PostingLevel)
    : null;
}

/**
 * The posting level in the record's result snapshot: `result.posting` (a posting id) or
 * `result.posting.level` — the same fields web/exchange/survey-verdict.ts reads. A record
 * without a readable result is 'unscreened'. (The result shape is owned by calc/screening;
 * when it settles, this and the exchange reader should become one function there.)
 */
export function outcomeOf(record: Pick<SurveyRecord, 'result'>): Outcome {
  const result = record.result?.result;
  const posting = own(result, 'posting');
  return asPosting(posting) ?? asPosting(own(posting, 'level')) ?? 'unscreened';
}

/** The geohash cell of the record's location, or undefined without one. */
export function cellOf(record: Pick<SurveyRecord, 'location'>): string | undefined {
  const l = record.location;
  return l === null ? undefined : encodeGeohash(l.lat, l.lon);
}

/**
 * True when the record changed since it was last exported (or was never exported): what
 * the building list marks as "not yet exported".
 */
export function needsExport(record: Pick<SurveyRecord, 'lastExportedAt' | 'updatedAt'>): boolean {
  return record.lastExportedAt === null || record.lastExportedAt < record.updatedAt;
}
