/**
 * Looks up a message and fills `{name}` placeholders. Parameters are inserted as plain text;
 * the result is always rendered as text, never as HTML.
 */
import { en, type Catalogue, type MessageKey } from './catalogue.js';

let current: Catalogue = en;

/** Switches the active catalogue (for a second language). */
export function setCatalogue(catalogue: Catalogue): void {
  current = catalogue;
}

/** The text for `key`, with `{param}` placeholders replaced. Unknown placeholders stay visible. */
export function t(key: MessageKey, params?: Record<string, string | number>): string {
  const text = current[key] ?? en[key];
  if (!params) return text;
  return text.replace(/\{(\w+)\}/g, (whole, name: string) =>
    name in params ? String(params[name]) : whole,
  );
}
