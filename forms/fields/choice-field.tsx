/**
 * One choice out of a few, as large radio buttons in a fieldset (each option is a 48 px
 * target with its words beside it; the chosen one is marked by a filled dot and a thick
 * border, not by colour alone). Arrow keys move between options, as for any radio group.
 */
import { fieldId } from './field-id.js';
import { UnconfirmedNote } from './unconfirmed-note.js';

export interface ChoiceOption<T extends string> {
  value: T;
  label: string;
  /** A second line under the label. */
  detail?: string | undefined;
}

export interface ChoiceFieldProps<T extends string> {
  path: string;
  legend: string;
  options: readonly ChoiceOption<T>[];
  value: T | null;
  onChoose: (value: T) => void;
  unconfirmed?: boolean | undefined;
  onConfirm?: (() => void) | undefined;
  /** Show only a short "not confirmed" mark (the confirm button is elsewhere). */
  compactUnconfirmed?: boolean | undefined;
  /** 'row' puts short options side by side (two or three words each). */
  layout?: 'row' | 'column';
  hint?: string | undefined;
}

export function ChoiceField<T extends string>(p: ChoiceFieldProps<T>) {
  const id = fieldId(p.path);
  const classes = ['choice', p.layout === 'row' ? 'choice--row' : 'choice--column'];
  if (p.unconfirmed) classes.push('field--unconfirmed');
  return (
    <fieldset
      class={classes.join(' ')}
      id={id}
      aria-describedby={p.hint ? `${id}-hint` : undefined}
    >
      <legend class="field__label">{p.legend}</legend>
      {p.hint && (
        <p class="field__hint" id={`${id}-hint`}>
          {p.hint}
        </p>
      )}
      <div class="choice__options">
        {p.options.map((o) => (
          <label key={o.value} class="choice__option">
            <input
              type="radio"
              name={id}
              value={o.value}
              checked={p.value === o.value}
              onChange={() => p.onChoose(o.value)}
              // A tap on the option already chosen (an app default) confirms it too;
              // browsers send no change event for it.
              onClick={() => p.value === o.value && p.onChoose(o.value)}
            />
            <span class="choice__text">
              <span class="choice__label">{o.label}</span>
              {o.detail && <span class="choice__detail">{o.detail}</span>}
            </span>
          </label>
        ))}
      </div>
      {p.unconfirmed && (
        <UnconfirmedNote
          id={id}
          label={p.legend}
          onConfirm={p.onConfirm}
          compact={p.compactUnconfirmed}
        />
      )}
    </fieldset>
  );
}
