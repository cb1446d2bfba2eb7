/**
 * Schemas for free-form parts of a record that must come back exactly as they went in.
 *
 * Why not `z.json()` and `z.record()`: both build a new object by assignment, and an own
 * key named "__proto__" (which `JSON.parse` creates happily) is then silently lost. These
 * checks validate the value in place and return it untouched, so nothing is altered.
 */
import { z } from './zod-config.js';

/** JSON data: null, booleans, finite numbers, strings, arrays and plain objects of them. */
export type JsonValue =
  null | boolean | number | string | JsonValue[] | { [key: string]: JsonValue };

/** Deepest nesting accepted: deep enough for any result, shallow enough for any stack. */
export const MAX_JSON_DEPTH = 64;

function isPlainObject(v: object): boolean {
  const proto: unknown = Object.getPrototypeOf(v);
  return proto === Object.prototype || proto === null;
}

/** Most values visited in one check (a shared-reference value can be huge when unfolded). */
export const MAX_JSON_NODES = 1_000_000;

/**
 * True when `value` is JSON data (see `JsonValue`), checked without recursion. A cycle
 * exceeds the depth limit and is refused; shared references are fine (JSON repeats them).
 */
export function isJsonValue(value: unknown): value is JsonValue {
  const stack: Array<{ v: unknown; depth: number }> = [{ v: value, depth: 0 }];
  let visited = 0;
  while (stack.length > 0) {
    if (++visited > MAX_JSON_NODES) return false;
    const { v, depth } = stack.pop() as { v: unknown; depth: number };
    if (v === null || typeof v === 'boolean' || typeof v === 'string') continue;
    if (typeof v === 'number') {
      if (!Number.isFinite(v)) return false;
      continue;
    }
    if (typeof v !== 'object' || depth >= MAX_JSON_DEPTH) return false;
    if (Array.isArray(v)) {
      if (Object.keys(v).length !== v.length) return false; // holes or extra keys
      for (const item of v) stack.push({ v: item, depth: depth + 1 });
      continue;
    }
    if (!isPlainObject(v) || Object.getOwnPropertySymbols(v).length > 0) return false;
    for (const key of Object.keys(v)) {
      stack.push({ v: (v as Record<string, unknown>)[key], depth: depth + 1 });
    }
  }
  return true;
}

/** JSON data, validated in place and returned as it is. */
export const jsonValueSchema = z.custom<JsonValue>((v) => isJsonValue(v));

/**
 * A map from field path to typed text (the `unparsed` part of a record), validated in place.
 * Keys are 1–200 characters, values strings of at most `maxText` characters.
 */
export function fieldTextMapSchema(maxText: number) {
  return z.custom<Record<string, string>>((v) => {
    if (typeof v !== 'object' || v === null || Array.isArray(v) || !isPlainObject(v)) return false;
    if (Object.getOwnPropertySymbols(v).length > 0) return false;
    return Object.entries(v).every(
      ([k, text]) =>
        k.length >= 1 && k.length <= 200 && typeof text === 'string' && text.length <= maxText,
    );
  });
}
