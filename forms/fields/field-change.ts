/**
 * What a field reports when its text changes. A field never writes the record itself: the
 * screen applies the change (see web/screens/survey/record-edit.ts), so the same field works
 * for any record path.
 */
export type FieldChange =
  /** The text is a valid value (or, for an optional field, empty: `null`). */
  | { path: string; kind: 'value'; value: unknown; text: string }
  /** The text is not a valid value yet: keep it as typed, leave the stored value alone. */
  | { path: string; kind: 'pending'; text: string };
