/**
 * A canonical JSON text of a value: object keys sorted, no spaces. Two records have the same
 * content exactly when their canonical texts are equal, whatever order their keys came in
 * (a file written by another tool may order them differently).
 *
 * Written straight to a string rather than by building sorted copies: copying by assignment
 * would lose an own key named "__proto__", which `JSON.parse` creates and a record may hold
 * in its free-form parts.
 */

/** The canonical text of JSON data. Throws a TypeError for values JSON cannot hold. */
export function canonicalJson(value: unknown): string {
  const out: string[] = [];
  write(value, out, 0);
  return out.join('');
}

/** Deeper than any record the schema accepts (its JSON parts stop at 64 levels). */
const MAX_DEPTH = 200;

function write(value: unknown, out: string[], depth: number): void {
  if (depth > MAX_DEPTH) throw new TypeError(`value nests deeper than ${MAX_DEPTH} levels`);
  if (value === null) {
    out.push('null');
    return;
  }
  switch (typeof value) {
    case 'boolean':
      out.push(value ? 'true' : 'false');
      return;
    case 'number':
      if (!Number.isFinite(value)) throw new TypeError(`not a finite number: ${value}`);
      out.push(JSON.stringify(value));
      return;
    case 'string':
      out.push(JSON.stringify(value));
      return;
    case 'object':
      break;
    default:
      throw new TypeError(`not JSON data: ${typeof value}`);
  }
  if (Array.isArray(value)) {
    out.push('[');
    for (let i = 0; i < value.length; i++) {
      if (i > 0) out.push(',');
      write(value[i], out, depth + 1);
    }
    out.push(']');
    return;
  }
  const obj = value as Record<string, unknown>;
  const keys = Object.keys(obj).sort();
  out.push('{');
  let first = true;
  for (const key of keys) {
    const v = obj[key];
    if (v === undefined) continue; // as JSON.stringify does
    if (!first) out.push(',');
    first = false;
    out.push(JSON.stringify(key), ':');
    write(v, out, depth + 1);
  }
  out.push('}');
}
