/**
 * Searching and filtering the building list. Pure, so it is tested without a browser.
 * Search matches every word typed (in any order) against the address or description, the
 * inspector and the team, ignoring case and accents.
 */
import type { PostingLevel } from '../../../calc/index.js';
import type { SurveyRecord } from '../../../forms/index.js';
import { readVerdict } from '../../exchange/survey-verdict.js';
import { needsExport } from '../../storage/derived.js';

export type ListFilter = 'all' | PostingLevel | 'unscreened' | 'not-exported';

export const LIST_FILTERS: readonly ListFilter[] = [
  'all',
  'open',
  'limited',
  'keep-out',
  'unscreened',
  'not-exported',
];

/** Lower case without accents, for matching. */
export function fold(text: string): string {
  return text
    .normalize('NFD')
    .replace(/\p{Diacritic}/gu, '')
    .toLowerCase();
}

/** Whether `record` matches every word of `query`. */
export function matchesSearch(record: SurveyRecord, query: string): boolean {
  const words = fold(query)
    .split(/\s+/)
    .filter((w) => w !== '');
  if (words.length === 0) return true;
  const hay = fold(`${record.address} ${record.inspector} ${record.team}`);
  return words.every((w) => hay.includes(w));
}

/** Whether `record` passes the outcome filter. */
export function matchesFilter(record: SurveyRecord, filter: ListFilter): boolean {
  switch (filter) {
    case 'all':
      return true;
    case 'not-exported':
      return needsExport(record);
    case 'unscreened':
      return readVerdict(record).posting === null;
    default:
      return readVerdict(record).posting === filter;
  }
}

/** The records to show, in the given order. */
export function filterBuildings(
  records: readonly SurveyRecord[],
  query: string,
  filter: ListFilter,
): SurveyRecord[] {
  return records.filter((r) => matchesFilter(r, filter) && matchesSearch(r, query));
}
