/**
 * Turns any value IndexedDB can hold (structured-clone data: Dates, Maps, Sets, Blobs,
 * typed arrays, BigInts, NaN, undefined, cycles...) into JSON that says exactly what was
 * there, so a quarantined value can be exported and examined elsewhere.
 *
 * Plain JSON data comes out as itself. Anything else becomes a tagged object
 * `{ "$type": ..., ... }`; a plain object that itself has a "$type" key is written as
 * `{ "$type": "object", "entries": [[key, value], ...] }` so the two cannot be confused.
 * Keys named "__proto__" are kept as own keys.
 */
import type { JsonValue } from '../../forms/schema/json-value.js';

const MAX_DEPTH = 200;

function define(out: Record<string, JsonValue>, key: string, value: JsonValue): void {
  // Plain assignment would treat "__proto__" as the prototype, not a key.
  Object.defineProperty(out, key, { value, enumerable: true, writable: true, configurable: true });
}

function base64(bytes: Uint8Array): string {
  let bin = '';
  for (let i = 0; i < bytes.length; i += 0x8000) {
    bin += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
  }
  return btoa(bin);
}

/** The JSON form of `value` (see module doc). Reads Blob contents, hence async. */
export async function toJsonSafe(value: unknown): Promise<JsonValue> {
  const ancestors = new Set<object>();
  async function walk(v: unknown, depth: number): Promise<JsonValue> {
    if (v === null || typeof v === 'boolean' || typeof v === 'string') return v;
    if (typeof v === 'number') {
      if (Number.isFinite(v)) return Object.is(v, -0) ? { $type: 'number', value: '-0' } : v;
      return { $type: 'number', value: String(v) };
    }
    if (v === undefined) return { $type: 'undefined' };
    if (typeof v === 'bigint') return { $type: 'bigint', value: v.toString() };
    if (typeof v !== 'object') return { $type: typeof v };
    if (depth > MAX_DEPTH) return { $type: 'too-deep' };
    if (ancestors.has(v)) return { $type: 'cycle' };
    ancestors.add(v);
    try {
      if (v instanceof Date) {
        return {
          $type: 'date',
          value: Number.isNaN(v.getTime()) ? 'Invalid Date' : v.toISOString(),
        };
      }
      if (typeof Blob !== 'undefined' && v instanceof Blob) {
        const bytes = new Uint8Array(await v.arrayBuffer());
        return { $type: 'blob', mime: v.type, size: v.size, base64: base64(bytes) };
      }
      if (ArrayBuffer.isView(v)) {
        const bytes = new Uint8Array(v.buffer, v.byteOffset, v.byteLength);
        return { $type: v.constructor.name, base64: base64(bytes) };
      }
      if (v instanceof ArrayBuffer)
        return { $type: 'ArrayBuffer', base64: base64(new Uint8Array(v)) };
      if (v instanceof Map) {
        const entries: JsonValue[] = [];
        for (const [k, item] of v)
          entries.push([await walk(k, depth + 1), await walk(item, depth + 1)]);
        return { $type: 'map', entries };
      }
      if (v instanceof Set) {
        const items: JsonValue[] = [];
        for (const item of v) items.push(await walk(item, depth + 1));
        return { $type: 'set', items };
      }
      if (v instanceof RegExp) return { $type: 'regexp', source: v.source, flags: v.flags };
      if (v instanceof Error) return { $type: 'error', name: v.name, message: v.message };
      if (Array.isArray(v)) {
        const out: JsonValue[] = [];
        for (let i = 0; i < v.length; i++) {
          out.push(i in v ? await walk(v[i], depth + 1) : { $type: 'hole' });
        }
        const extra = Object.keys(v).filter((k) => !/^\d+$/.test(k));
        if (extra.length === 0) return out;
        const props: Record<string, JsonValue> = {};
        for (const k of extra)
          define(props, k, await walk((v as unknown as Record<string, unknown>)[k], depth + 1));
        return { $type: 'array', items: out, props };
      }
      const keys = Object.keys(v);
      const proto: unknown = Object.getPrototypeOf(v);
      const plain = proto === Object.prototype || proto === null;
      if (plain && !keys.includes('$type')) {
        const out: Record<string, JsonValue> = {};
        for (const k of keys)
          define(out, k, await walk((v as Record<string, unknown>)[k], depth + 1));
        return out;
      }
      const entries: JsonValue[] = [];
      for (const k of keys)
        entries.push([k, await walk((v as Record<string, unknown>)[k], depth + 1)]);
      return plain
        ? { $type: 'object', entries }
        : {
            $type: 'object',
            className: String((v.constructor as { name?: unknown } | undefined)?.name ?? ''),
            entries,
          };
    } finally {
      ancestors.delete(v);
    }
  }
  return walk(value, 0);
}
