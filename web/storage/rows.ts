/**
 * Building rows from records, and reading rows back. Every value read from IndexedDB goes
 * through here: the row wrapper is checked, the record inside is parsed and migrated
 * (forms/schema), and the row must agree with its record. Anything else is reported as
 * corrupt, with sentences, for the quarantine.
 */
import {
  en,
  parseStoredRecord,
  type FieldMessage,
  type MessageCatalogue,
  type SurveyRecord,
} from '../../forms/index.js';
import type { RevisionKind, RevisionRow, SurveyRow } from './db.js';
import { cellOf, outcomeOf } from './derived.js';

/** The row stored in `surveys` for a record. */
export function toSurveyRow(record: SurveyRecord, saveId: string): SurveyRow {
  const row: SurveyRow = {
    id: record.id,
    revision: record.revision,
    updatedAt: record.updatedAt,
    outcome: outcomeOf(record),
    saveId,
    record,
  };
  const cell = cellOf(record);
  if (cell !== undefined) row.cell = cell;
  return row;
}

export function toRevisionRow(
  record: SurveyRecord,
  kind: RevisionKind,
  savedAt: string,
  conflictWith: number | null,
  tabId: string | null,
): RevisionRow {
  return {
    surveyId: record.id,
    revision: record.revision,
    savedAt,
    kind,
    conflictWith,
    tabId,
    record,
  };
}

export type RowRead<R> =
  | { ok: true; row: R; record: SurveyRecord; fromVersion: number }
  | { ok: false; reason: string; messages: FieldMessage[] };

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function corrupt(
  reason: string,
  catalogue: MessageCatalogue,
): { ok: false; reason: string; messages: FieldMessage[] } {
  return { ok: false, reason, messages: [{ path: '', message: catalogue.storage.damagedRow }] };
}

/** Reads a `surveys` value stored under `key`. */
export function readSurveyRow(
  raw: unknown,
  key: IDBValidKey,
  catalogue: MessageCatalogue = en,
): RowRead<SurveyRow> {
  if (!isObject(raw) || typeof raw['id'] !== 'string' || typeof raw['revision'] !== 'number') {
    return corrupt('bad-row', catalogue);
  }
  const parsed = parseStoredRecord(raw['record'], catalogue);
  if (!parsed.ok) return { ok: false, reason: parsed.reason, messages: parsed.messages };
  const r = parsed.record;
  if (raw['id'] !== key || r.id !== key || r.revision !== raw['revision']) {
    return corrupt('row-mismatch', catalogue);
  }
  return { ok: true, row: raw as unknown as SurveyRow, record: r, fromVersion: parsed.fromVersion };
}

const KINDS: readonly string[] = ['save', 'conflict', 'import'];

/** Reads a `revisions` value. */
export function readRevisionRow(
  raw: unknown,
  catalogue: MessageCatalogue = en,
): RowRead<RevisionRow> {
  if (
    !isObject(raw) ||
    typeof raw['surveyId'] !== 'string' ||
    typeof raw['revision'] !== 'number' ||
    typeof raw['savedAt'] !== 'string' ||
    !KINDS.includes(raw['kind'] as string)
  ) {
    return corrupt('bad-row', catalogue);
  }
  const parsed = parseStoredRecord(raw['record'], catalogue);
  if (!parsed.ok) return { ok: false, reason: parsed.reason, messages: parsed.messages };
  if (parsed.record.id !== raw['surveyId'] || parsed.record.revision !== raw['revision']) {
    return corrupt('row-mismatch', catalogue);
  }
  return {
    ok: true,
    row: raw as unknown as RevisionRow,
    record: parsed.record,
    fromVersion: parsed.fromVersion,
  };
}
