/**
 * "Valid to store": checks a value against the current record schema and reports field
 * messages. For stored values of any version use `parseStoredRecord` (migrate.ts).
 */
import { fieldMessages, type FieldMessage } from './field-messages.js';
import { compileInPlaceCheck } from './in-place-check.js';
import { en, type MessageCatalogue } from './messages.js';
import { surveyRecordSchema, type SurveyRecord } from './survey-record.js';

const inPlace = compileInPlaceCheck(surveyRecordSchema);

/**
 * True when `value` is a valid current record. Fast (in-place-check.ts), with zod as the
 * fallback; a valid value is used as it is, not copied.
 */
export function isSurveyRecord(value: unknown): value is SurveyRecord {
  return inPlace !== null ? inPlace(value) : surveyRecordSchema.safeParse(value).success;
}

export type ValidationResult =
  { ok: true; record: SurveyRecord } | { ok: false; messages: FieldMessage[] };

/**
 * Parses a value as a current (version 2) record. Never throws for bad data. A valid value
 * is returned as it is (not a copy); do not mutate it.
 */
export function validateRecord(value: unknown, catalogue: MessageCatalogue = en): ValidationResult {
  // The common case (valid) without building a copy; zod only to explain a failure.
  if (inPlace?.(value)) return { ok: true, record: value as SurveyRecord };
  const r = surveyRecordSchema.safeParse(value);
  return r.success
    ? { ok: true, record: r.data }
    : { ok: false, messages: fieldMessages(r.error.issues, catalogue) };
}

/** The messages for one field path and everything inside it (a storey, a wall, ...). */
export function messagesAt(messages: readonly FieldMessage[], path: string): string[] {
  return messages
    .filter((m) => m.path === path || m.path.startsWith(`${path}.`))
    .map((m) => m.message);
}
