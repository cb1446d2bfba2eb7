/**
 * Reads a number as typed in a field: digits with a decimal point or a decimal comma (both
 * are common on phones), an optional sign and exponent; spaces around it are ignored.
 * Text that is not such a number is reported as such, never guessed at.
 */

export type ParsedNumber =
  { kind: 'empty' } | { kind: 'number'; value: number } | { kind: 'invalid'; text: string };

const NUMBER = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/;

/** Parses one typed number. "1,5" and "1.5" are both 1.5; "1,000.5" is invalid. */
export function parseTypedNumber(text: string): ParsedNumber {
  const t = text.trim();
  if (t === '') return { kind: 'empty' };
  if (!NUMBER.test(t)) return { kind: 'invalid', text };
  const value = Number(t.replace(',', '.'));
  return Number.isFinite(value) ? { kind: 'number', value } : { kind: 'invalid', text };
}
