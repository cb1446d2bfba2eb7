/**
 * Whether two records hold the same content, for spotting duplicates and conflicts when
 * merging. A structural comparison of JSON data: object keys in any order (a file written
 * by another tool may order them differently), arrays in order, numbers by value. It walks
 * both values side by side and stops at the first difference, so comparing two equal
 * records costs one pass and building no strings.
 *
 * Own keys only, read with `Object.keys`: an own key named "__proto__" (which JSON.parse
 * creates) is compared like any other, never resolved to a prototype.
 */

/** Deeper than any record the schema accepts (its JSON parts stop at 64 levels). */
const MAX_DEPTH = 200;

const has = Object.prototype.hasOwnProperty;

/** True when `a` and `b` are equal JSON data. Throws a TypeError past MAX_DEPTH. */
export function sameJson(a: unknown, b: unknown, depth = 0): boolean {
  if (a === b) return true;
  if (depth > MAX_DEPTH) throw new TypeError(`value nests deeper than ${MAX_DEPTH} levels`);
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return false;
  const aArray = Array.isArray(a);
  if (aArray !== Array.isArray(b)) return false;
  if (aArray) {
    const x = a as unknown[];
    const y = b as unknown[];
    if (x.length !== y.length) return false;
    for (let i = 0; i < x.length; i++) if (!sameJson(x[i], y[i], depth + 1)) return false;
    return true;
  }
  const x = a as Record<string, unknown>;
  const y = b as Record<string, unknown>;
  const keys = Object.keys(x);
  if (keys.length !== Object.keys(y).length) return false;
  for (const key of keys) {
    if (!has.call(y, key)) return false;
    if (!sameJson(x[key], y[key], depth + 1)) return false;
  }
  return true;
}

/**
 * True when two revisions of a survey hold the same content for merging: every field
 * except `lastExportedAt`, which is bookkeeping of the exporting device (storage writes no
 * revision for it). Without this, a survey exported twice from the same device would look
 * like a conflict.
 */
export function sameSurveyContent(a: object, b: object): boolean {
  const x = a as Record<string, unknown>;
  const y = b as Record<string, unknown>;
  const keys = Object.keys(x).filter((k) => k !== 'lastExportedAt');
  if (keys.length !== Object.keys(y).filter((k) => k !== 'lastExportedAt').length) return false;
  for (const key of keys) {
    if (!has.call(y, key) || !sameJson(x[key], y[key], 1)) return false;
  }
  return true;
}
