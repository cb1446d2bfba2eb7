/**
 * What every step component receives: the record, a way to change it, and the unit system,
 * plus helpers that bind a field to a record path.
 */
import { confirmField, type SurveyRecord } from '../../../forms/index.js';
import { numberSpecFor, type FieldChange, type NumberSpec } from '../../../forms/fields/index.js';
import type { UnitSystem } from '../../../forms/units/index.js';
import { applyFieldChange, getIn } from './record-edit.js';

export interface StepContext {
  record: SurveyRecord;
  /** Applies a pure edit to the current record (the draft saver stores it). */
  edit: (fn: (record: SurveyRecord) => SurveyRecord) => void;
  system: UnitSystem;
}

export interface StepProps {
  ctx: StepContext;
}

/** Props binding a NumberField to `path` (spec from the field table unless given). */
export function numberProps(ctx: StepContext, path: string, spec?: NumberSpec) {
  const s = spec ?? numberSpecFor(path);
  if (!s) throw new RangeError(`no number spec for path ${path}`);
  const raw = getIn(ctx.record, path);
  return {
    path,
    spec: s,
    system: ctx.system,
    value: typeof raw === 'number' ? raw : null,
    pending: ctx.record.unparsed[path],
    unconfirmed: ctx.record.unconfirmed.includes(path),
    onChange: (c: FieldChange) => ctx.edit((r) => applyFieldChange(r, c)),
    onConfirm: () => ctx.edit((r) => confirmField(r, path)),
  };
}

/** Whether `path` is listed as unconfirmed, and a confirm action for it. */
export function confirmProps(ctx: StepContext, path: string) {
  return {
    unconfirmed: ctx.record.unconfirmed.includes(path),
    onConfirm: () => ctx.edit((r) => confirmField(r, path)),
  };
}
