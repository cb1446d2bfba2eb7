/**
 * Form field components for the survey screens, phone-first (48 px targets, 16 px text):
 * - `NumberField` — a number with a unit: shows what was typed, refuses impossible values
 *   with a sentence (text kept), warns on unusual ones, says how interpreted text was read;
 * - `TextField`, `ChoiceField` (radio group), `SelectField`, `UnconfirmedNote`;
 * - `checkNumber` — the same check as a pure function, for step summaries;
 * - `NUMBER_SPECS` / `numberSpecFor(path)` — limits and usual ranges of every number field;
 * - `fieldId(path)` — the element id of a field, for links from summaries.
 * Fields report a `FieldChange`; the screen applies it to the record.
 */
export type { NumberSpec } from './number-spec.js';
export { checkNumber, unitSymbol, type NumberCheck } from './check-number.js';
export {
  NUMBER_SPECS,
  PANEL_HEIGHT_SPEC,
  PANEL_LENGTH_SPEC,
  USUAL_CLT_PANEL,
  USUAL_STOREY_HEIGHT_M,
  numberSpecFor,
} from './field-specs.js';
export { fieldId } from './field-id.js';
export type { FieldChange } from './field-change.js';
export { FieldMessages, describedBy } from './field-messages.js';
export { UnconfirmedNote } from './unconfirmed-note.js';
export { NumberField, type NumberFieldProps } from './number-field.js';
export { TextField, type TextFieldProps } from './text-field.js';
export { ChoiceField, type ChoiceFieldProps, type ChoiceOption } from './choice-field.js';
export { SelectField, type SelectFieldProps } from './select-field.js';
