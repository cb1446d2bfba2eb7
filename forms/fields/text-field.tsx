/**
 * A line or block of free text. Longer than the stored limit is refused with a sentence and
 * kept as typed (no `maxlength`, which would cut pasted text without a word).
 */
import { useRef, useState } from 'preact/hooks';
import { t } from '../../web/i18n/index.js';
import type { FieldChange } from './field-change.js';
import { fieldId } from './field-id.js';
import { FieldMessages, describedBy } from './field-messages.js';

export interface TextFieldProps {
  path: string;
  label: string;
  value: string;
  pending?: string | undefined;
  maxLength: number;
  multiline?: boolean;
  onChange: (change: FieldChange) => void;
  hint?: string | undefined;
  autocomplete?: string | undefined;
  placeholder?: string | undefined;
  /** Visually hidden words that make the label unique ("Photo 2:"). */
  labelPrefix?: string | undefined;
}

export function TextField(p: TextFieldProps) {
  const id = fieldId(p.path);
  const external = p.pending ?? p.value;
  const text = useRef(external);
  const recent = useRef<string[]>([]);
  const seen = useRef(external);
  const [, rerender] = useState(0);
  if (seen.current !== external) {
    seen.current = external;
    if (!recent.current.includes(external)) {
      text.current = external;
      recent.current = [];
    }
  }
  const tooLong = text.current.length > p.maxLength;
  const error = tooLong
    ? t('check.tooLong', { label: p.label, max: p.maxLength, length: text.current.length })
    : null;

  const onInput = (e: Event) => {
    const typed = (e.currentTarget as HTMLInputElement | HTMLTextAreaElement).value;
    text.current = typed;
    recent.current = [...recent.current.slice(-19), typed];
    rerender((n) => n + 1);
    p.onChange(
      typed.length > p.maxLength
        ? { path: p.path, kind: 'pending', text: typed }
        : { path: p.path, kind: 'value', value: typed, text: typed },
    );
  };
  const common = {
    id,
    value: text.current,
    onInput,
    placeholder: p.placeholder,
    'aria-invalid': error ? ('true' as const) : undefined,
    'aria-describedby': describedBy({ id, error, hint: p.hint }),
  };
  return (
    <div class={error ? 'field field--error' : 'field'}>
      <label for={id} class="field__label">
        {p.labelPrefix && <span class="visually-hidden">{p.labelPrefix} </span>}
        {p.label}
      </label>
      {p.multiline ? (
        <textarea {...common} rows={5} />
      ) : (
        <input {...common} type="text" autocomplete={p.autocomplete ?? 'off'} />
      )}
      <FieldMessages id={id} error={error} hint={p.hint} />
    </div>
  );
}
