/**
 * "Valid to store": checks a value against the current record schema and reports field
 * messages. For stored values of any version use `parseStoredRecord` (migrate.ts).
 */
import { fieldMessages, type FieldMessage } from './field-messages.js';
import { en, type MessageCatalogue } from './messages.js';
import { surveyRecordSchema, type SurveyRecord } from './survey-record.js';

export type ValidationResult =
  { ok: true; record: SurveyRecord } | { ok: false; messages: FieldMessage[] };

/** Parses a value as a current (version 2) record. Never throws for bad data. */
export function validateRecord(value: unknown, catalogue: MessageCatalogue = en): ValidationResult {
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
