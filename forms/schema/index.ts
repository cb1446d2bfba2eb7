/**
 * The survey record: its zod schema (current version and every earlier one), migrations,
 * the empty draft, validation with field-level sentences, the screening-readiness check,
 * and the message catalogue.
 *
 * - `surveyRecordSchema`, `SurveyRecord`, `SCHEMA_VERSION` — the stored record (version 2);
 *   `z.infer<typeof surveyRecordSchema>` is assignable to calc's `SurveyInput`.
 * - `surveyRecordV1Schema`, `SurveyRecordV1`, `migrateV1toV2` — the first version.
 * - `parseStoredRecord(raw)` — parse and migrate any stored value; never throws.
 * - `validateRecord(value)`, `isSurveyRecord(value)`, `messagesAt()`, `fieldMessages()`,
 *   `messagesByField()` — "valid to store", with `{ path, message }` per field.
 * - `screeningGaps(record)` — "complete enough to screen", as a list of missing things.
 * - `emptySurvey(deviceId, now)` — a new draft, valid to store with nothing entered.
 * - `confirmField`, `markUnconfirmed`, `keepUnparsed`, `clearUnparsed`,
 *   `shiftPathsAfterRemoval` — draft bookkeeping.
 * - `en`, `catalogues`, `MessageCatalogue` — every sentence shown to people.
 */
export { SCHEMA_VERSION } from './survey-record.js';
export {
  buildingSchema,
  checklistEntrySchema,
  connectorSchema,
  instrumentRecordSchema,
  locationSchema,
  measuredFrequencySchema,
  observationsSchema,
  photoMetaSchema,
  residualDriftSchema,
  resultSnapshotSchema,
  rockingSchema,
  storeySchema,
  surveyRecordSchema,
  upliftSchema,
  wallSchema,
} from './survey-record.js';
export type {
  InstrumentRecord,
  LocationRecord,
  PhotoMeta,
  ResultSnapshot,
  StoreyRecord,
  SurveyRecord,
  WallRecord,
} from './survey-record.js';
export * from './enums.js';
export {
  asce7SpectrumSchema,
  ec8SpectrumSchema,
  eventSpectrumSchema,
  spectrumSpecSchema,
} from './spectrum.js';
export { surveyRecordV1Schema } from './survey-record-v1.js';
export type { SurveyRecordV1 } from './survey-record-v1.js';
export { READABLE_VERSIONS, migrateV1toV2, parseStoredRecord } from './migrate.js';
export type { ParseFailureReason, StoredParseResult } from './migrate.js';
export { DEFAULTED_BUILDING_FIELDS, emptySurvey } from './empty-survey.js';
export { isSurveyRecord, messagesAt, validateRecord } from './validate.js';
export { compileInPlaceCheck } from './in-place-check.js';
export { isJsonValue, jsonValueSchema } from './json-value.js';
export type { JsonValue } from './json-value.js';
export type { ValidationResult } from './validate.js';
export {
  fieldMessages,
  labelFor,
  messageForIssue,
  messagesByField,
  pathPattern,
  pathToString,
} from './field-messages.js';
export type { FieldMessage, IssueLike } from './field-messages.js';
export { screeningGaps } from './screening-gaps.js';
export type { GapKind, ScreeningGap } from './screening-gaps.js';
export {
  clearUnparsed,
  confirmField,
  keepUnparsed,
  markUnconfirmed,
  shiftPathsAfterRemoval,
} from './draft-fields.js';
export * as limits from './limits.js';
export { catalogues, en } from './messages.js';
export type {
  FieldLabel,
  GapMessages,
  MessageCatalogue,
  RuleInput,
  RuleMessages,
  StorageMessages,
} from './messages.js';
