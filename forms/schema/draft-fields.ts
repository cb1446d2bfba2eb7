/**
 * Small, pure edits of a record's draft bookkeeping (`unconfirmed`, `unparsed`), so forms
 * never lose what was typed and never pass off an app default as the inspector's answer.
 * Each returns a new record and leaves the argument unchanged.
 */
import type { SurveyRecord } from './survey-record.js';

/** The inspector has confirmed (or set) the value at `path`: it is no longer a default. */
export function confirmField(record: SurveyRecord, path: string): SurveyRecord {
  if (!record.unconfirmed.includes(path)) return record;
  return { ...record, unconfirmed: record.unconfirmed.filter((p) => p !== path) };
}

/** Marks the value at `path` as filled in by the app, to be confirmed before screening. */
export function markUnconfirmed(record: SurveyRecord, path: string): SurveyRecord {
  if (record.unconfirmed.includes(path)) return record;
  return { ...record, unconfirmed: [...record.unconfirmed, path] };
}

/**
 * Keeps text typed at `path` that is not a valid value (yet). The value at `path` itself is
 * left as it was, so the record stays valid to store and the text is saved with it.
 */
export function keepUnparsed(record: SurveyRecord, path: string, text: string): SurveyRecord {
  if (record.unparsed[path] === text) return record;
  return { ...record, unparsed: { ...record.unparsed, [path]: text } };
}

/** The text at `path` became a valid value (or was cleared): forget the kept text. */
export function clearUnparsed(record: SurveyRecord, path: string): SurveyRecord {
  if (!(path in record.unparsed)) return record;
  const unparsed = { ...record.unparsed };
  delete unparsed[path];
  return { ...record, unparsed };
}

/**
 * Renumbers bookkeeping paths after the item at `removed` was taken out of the list at
 * `listPath` (e.g. 'building.storeys'): paths inside the removed item are dropped, paths of
 * later items move down by one. Use it for `unconfirmed` and the keys of `unparsed`.
 */
export function shiftPathsAfterRemoval(
  paths: readonly string[],
  listPath: string,
  removed: number,
): string[] {
  const prefix = `${listPath}.`;
  const out: string[] = [];
  for (const p of paths) {
    if (!p.startsWith(prefix)) {
      out.push(p);
      continue;
    }
    const rest = p.slice(prefix.length);
    const dot = rest.indexOf('.');
    const indexText = dot === -1 ? rest : rest.slice(0, dot);
    const index = Number(indexText);
    if (!/^\d+$/.test(indexText)) out.push(p);
    else if (index < removed) out.push(p);
    else if (index > removed) out.push(`${prefix}${index - 1}${dot === -1 ? '' : rest.slice(dot)}`);
  }
  return out;
}
