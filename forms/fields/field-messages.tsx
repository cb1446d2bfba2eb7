/**
 * The lines under a field: an error (refused, with the sentence), a warning (kept, but
 * unusual), how the text was read, and a hint. Each starts with a symbol so it does not rely
 * on colour; the symbol is hidden from screen readers, which hear the sentence.
 */
export interface FieldMessagesProps {
  id: string;
  error?: string | null | undefined;
  warning?: string | null | undefined;
  note?: string | null | undefined;
  hint?: string | null | undefined;
}

/** The id list for aria-describedby, or undefined when there is nothing to describe. */
export function describedBy(p: FieldMessagesProps): string | undefined {
  const ids = [
    p.error ? `${p.id}-error` : null,
    p.warning ? `${p.id}-warning` : null,
    p.note ? `${p.id}-note` : null,
    p.hint ? `${p.id}-hint` : null,
  ].filter((x): x is string => x !== null);
  return ids.length > 0 ? ids.join(' ') : undefined;
}

export function FieldMessages(p: FieldMessagesProps) {
  return (
    <>
      {p.hint && (
        <p id={`${p.id}-hint`} class="field__hint">
          {p.hint}
        </p>
      )}
      {p.error && (
        <p id={`${p.id}-error`} class="field__error">
          <span aria-hidden="true">✖ </span>
          {p.error}
        </p>
      )}
      {p.warning && (
        <p id={`${p.id}-warning`} class="field__warning">
          <span aria-hidden="true">⚠ </span>
          {p.warning}
        </p>
      )}
      {p.note && (
        <p id={`${p.id}-note`} class="field__note">
          <span aria-hidden="true">→ </span>
          {p.note}
        </p>
      )}
    </>
  );
}
