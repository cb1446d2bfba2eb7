/**
 * What a number field accepts and what it warns about. Hard limits refuse a value with a
 * sentence at the field (the text is kept, never dropped); the usual range only warns, and
 * the value is saved all the same. All limits are in SI; messages speak the user's units.
 */
import type { Quantity } from '../units/index.js';
import type { MessageKey } from '../../web/i18n/index.js';

export interface NumberSpec {
  /** Catalogue key of the field's label. */
  label: MessageKey;
  quantity: Quantity;
  /** Smallest allowed value, SI; with `minExclusive` the value must be strictly larger. */
  min?: number;
  minExclusive?: boolean;
  /** Largest allowed value, SI (inclusive). */
  max?: number;
  /** Only whole numbers (counts). */
  integer?: boolean;
  /** Whether an empty field is an error (the record has no "unknown" for this value). */
  required?: boolean;
  /** The usual range, SI: outside it the field warns but keeps the value. */
  usualMin?: number;
  usualMax?: number;
  /** A sentence said with the warning, e.g. where the usual range comes from. */
  usualNote?: MessageKey;
  /** An example value in SI for the "must be a number" sentence. */
  example?: number;
}
