/**
 * Number formatting for the sentences of a result: fixed rules, no locale, so the same
 * input gives the same text everywhere (the app formats its own figures for display).
 */

/** A ratio as a percentage with two significant figures: 0.0183 → "1.8 %". */
export function percent(ratio: number): string {
  if (!Number.isFinite(ratio)) return 'not known';
  const p = ratio * 100;
  if (p === 0) return '0 %';
  const abs = Math.abs(p);
  const digits = abs >= 10 ? 0 : abs >= 1 ? 1 : abs >= 0.1 ? 2 : 3;
  return `${p.toFixed(digits)} %`;
}

/** A number with `digits` decimals ("not known" when not finite). */
export function fixed(x: number, digits: number): string {
  return Number.isFinite(x) ? x.toFixed(digits) : 'not known';
}

/** A length in m, as mm below 0.1 m: 0.012 → "12 mm", 0.25 → "0.25 m". */
export function length(m: number): string {
  if (!Number.isFinite(m)) return 'not known';
  if (Math.abs(m) < 0.1) return `${(m * 1000).toFixed(m * 1000 < 10 ? 1 : 0)} mm`;
  return `${m.toFixed(2)} m`;
}

/** A storey for people (see calc/storey/storey-name.ts). */
export { storeyName } from '../storey/storey-name.js';

/** The sentence with its first letter in capitals. */
export function capital(text: string): string {
  return text.length === 0 ? text : text[0]!.toUpperCase() + text.slice(1);
}
