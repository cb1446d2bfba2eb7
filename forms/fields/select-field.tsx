/** One choice out of many, as a native select (the phone's own large picker). */
import { fieldId } from './field-id.js';
import { UnconfirmedNote } from './unconfirmed-note.js';
import type { ChoiceOption } from './choice-field.js';

export interface SelectFieldProps<T extends string> {
  path: string;
  label: string;
  options: readonly ChoiceOption<T>[];
  value: T | null;
  onChoose: (value: T) => void;
  unconfirmed?: boolean | undefined;
  onConfirm?: (() => void) | undefined;
  /** Show only a short "not confirmed" mark (the confirm button is elsewhere). */
  compactUnconfirmed?: boolean | undefined;
  hint?: string | undefined;
  /** Visually hidden words that make the label unique ("Storey 2:"). */
  labelPrefix?: string | undefined;
  /** Shown as the first, unselectable option when value is null. */
  placeholder?: string | undefined;
}

export function SelectField<T extends string>(p: SelectFieldProps<T>) {
  const id = fieldId(p.path);
  return (
    <div class={p.unconfirmed ? 'field field--unconfirmed' : 'field'}>
      <label for={id} class="field__label">
        {p.labelPrefix && <span class="visually-hidden">{p.labelPrefix} </span>}
        {p.label}
      </label>
      {p.hint && (
        <p class="field__hint" id={`${id}-hint`}>
          {p.hint}
        </p>
      )}
      <select
        id={id}
        aria-describedby={p.hint ? `${id}-hint` : undefined}
        value={p.value ?? ''}
        onChange={(e) => {
          const v = (e.currentTarget as HTMLSelectElement).value;
          const found = p.options.find((o) => o.value === v);
          if (found) p.onChoose(found.value);
        }}
      >
        {p.value === null && (
          <option value="" disabled>
            {p.placeholder ?? ''}
          </option>
        )}
        {p.options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {p.unconfirmed && (
        <UnconfirmedNote
          id={id}
          label={p.label}
          onConfirm={p.onConfirm}
          compact={p.compactUnconfirmed}
        />
      )}
    </div>
  );
}
