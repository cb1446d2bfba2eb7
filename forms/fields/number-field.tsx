/**
 * A number with a unit. It shows exactly what was typed, checks it at the field as it is
 * typed, and reports either a valid SI value or the text to keep (never a silent fix):
 * - impossible values ("-2", a storey height of 0) are refused with a sentence, and the text
 *   stays in the field and in the record's `unparsed` list;
 * - unusual values warn and are saved;
 * - text read in a way that differs from a plain number (decimal comma, "2.7 m" in a field
 *   shown in feet) says how it was read.
 */
import { useRef, useState } from 'preact/hooks';
import { formatForInput, shownUnit, type UnitSystem } from '../units/index.js';
import { t } from '../../web/i18n/index.js';
import { checkNumber, unitSymbol } from './check-number.js';
import type { FieldChange } from './field-change.js';
import { fieldId } from './field-id.js';
import { FieldMessages, describedBy } from './field-messages.js';
import type { NumberSpec } from './number-spec.js';
import { UnconfirmedNote } from './unconfirmed-note.js';

export interface NumberFieldProps {
  /** The record path the value is stored at; also gives the element id. */
  path: string;
  spec: NumberSpec;
  system: UnitSystem;
  /** The stored value, SI; null when unknown. */
  value: number | null;
  /** Text kept from an earlier entry that was not valid (record.unparsed[path]). */
  pending?: string | undefined;
  /** True when the value was filled in by the app and awaits confirmation. */
  unconfirmed?: boolean | undefined;
  /** Why it is unconfirmed, when not the generic reason. */
  unconfirmedReason?: string | undefined;
  onChange: (change: FieldChange) => void;
  onConfirm?: (() => void) | undefined;
  /** Show only a short "not confirmed" mark (the confirm button is elsewhere). */
  compactUnconfirmed?: boolean | undefined;
  /** Label text instead of the spec's. */
  label?: string | undefined;
  /**
   * Words that make the label unique on the page ("Storey 2:"), read by screen readers but
   * not shown, because the card around the field already says it.
   */
  labelPrefix?: string | undefined;
  hint?: string | undefined;
  /** Extra error from elsewhere (e.g. a record-level check at this path). */
  error?: string | null | undefined;
  /** Placeholder text, e.g. "not measured". */
  placeholder?: string | undefined;
}

function keyOf(value: number | null, pending: string | undefined): string {
  return pending !== undefined ? `p:${pending}` : `v:${String(value)}`;
}

function externalText(p: NumberFieldProps): string {
  if (p.pending !== undefined) return p.pending;
  return p.value === null ? '' : formatForInput(p.value, p.spec.quantity, p.system);
}

export function NumberField(p: NumberFieldProps) {
  const id = fieldId(p.path);
  const text = useRef(externalText(p));
  // Keys of the values this field itself reported lately: when the record comes back with
  // one of them, it is our own echo and the typed text stays as it is ("2.70" is not
  // rewritten to "2.7" under the thumb).
  const recent = useRef<string[]>([]);
  const seen = useRef(`${p.system}|${keyOf(p.value, p.pending)}`);
  const [, rerender] = useState(0);

  const key = keyOf(p.value, p.pending);
  const seenKey = `${p.system}|${key}`;
  if (seen.current !== seenKey) {
    const systemChanged = !seen.current.startsWith(`${p.system}|`);
    seen.current = seenKey;
    if (systemChanged || !recent.current.includes(key)) {
      text.current = externalText(p);
      recent.current = [];
    }
  }

  const check = checkNumber(text.current, p.spec, p.system);
  const label = p.label ?? t(p.spec.label);
  const fullLabel = p.labelPrefix ? `${p.labelPrefix} ${label}` : label;
  const u = unitSymbol(shownUnit(p.spec.quantity, p.system));
  const error = check.state === 'invalid' ? check.message : (p.error ?? null);
  const warning = check.state === 'valid' ? check.warning : null;
  const note = check.state === 'valid' ? check.readAs : null;
  const signed = p.spec.min === undefined || p.spec.min < 0;

  const onInput = (e: Event) => {
    const typed = (e.currentTarget as HTMLInputElement).value;
    text.current = typed;
    const c = checkNumber(typed, p.spec, p.system);
    const change: FieldChange =
      c.state === 'valid'
        ? { path: p.path, kind: 'value', value: c.valueSI, text: typed }
        : c.state === 'empty'
          ? { path: p.path, kind: 'value', value: null, text: typed }
          : { path: p.path, kind: 'pending', text: typed };
    const k =
      change.kind === 'pending'
        ? keyOf(p.value, typed)
        : keyOf(change.value as number | null, undefined);
    recent.current = [...recent.current.slice(-19), k];
    rerender((n) => n + 1);
    p.onChange(change);
  };

  const classes = ['field', 'field--number'];
  if (error) classes.push('field--error');
  else if (warning) classes.push('field--warning');
  if (p.unconfirmed) classes.push('field--unconfirmed');

  return (
    <div class={classes.join(' ')}>
      <label for={id} class="field__label">
        {p.labelPrefix && <span class="visually-hidden">{p.labelPrefix} </span>}
        {label}
        {u && <span class="visually-hidden"> ({u})</span>}
      </label>
      <div class="field__control">
        <input
          id={id}
          type="text"
          inputMode={
            signed || (p.spec.quantity === 'length' && p.system === 'us') ? 'text' : 'decimal'
          }
          autocomplete="off"
          spellcheck={false}
          enterKeyHint="next"
          value={text.current}
          style={u ? { paddingRight: `${0.9 + 0.62 * u.length}em` } : undefined}
          placeholder={p.placeholder}
          aria-invalid={error ? 'true' : undefined}
          aria-describedby={describedBy({ id, error, warning, note, hint: p.hint })}
          onInput={onInput}
        />
        {u && (
          <span class="field__unit-tag" aria-hidden="true">
            {u}
          </span>
        )}
      </div>
      <FieldMessages id={id} error={error} warning={warning} note={note} hint={p.hint} />
      {p.unconfirmed && (
        <UnconfirmedNote
          id={id}
          label={fullLabel}
          reason={p.unconfirmedReason}
          compact={p.compactUnconfirmed}
          onConfirm={check.state === 'valid' ? p.onConfirm : undefined}
        />
      )}
    </div>
  );
}
