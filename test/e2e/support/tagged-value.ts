/**
 * A faithful text form of any value structured clone can store, for carrying fuzzed values
 * between Node and the page and comparing them exactly: undefined, NaN, -0, ±Infinity,
 * BigInt, invalid Dates, Maps, Sets, typed arrays, sparse arrays, objects with a null
 * prototype and own "__proto__" keys all survive, which JSON and Playwright's argument
 * passing do not promise.
 *
 * `taggedCodec` is self-contained (no imports, no outer variables) so that its source can
 * be run in the page as well: `await page.evaluate(taggedCodec)` defines
 * `globalThis.taggedCodec` there, with the same `encode` and `decode` as in Node.
 */

export interface TaggedCodec {
  /** The value as JSON text; equal texts mean structurally identical values. */
  encode(value: unknown): string;
  decode(text: string): unknown;
}

/** Installs the codec on `globalThis.taggedCodec` and returns it. */
export function taggedCodec(): TaggedCodec {
  type Node = [string, ...unknown[]];
  const typedNames = [
    'Int8Array',
    'Uint8Array',
    'Uint8ClampedArray',
    'Int16Array',
    'Uint16Array',
    'Int32Array',
    'Uint32Array',
    'Float32Array',
    'Float64Array',
    'BigInt64Array',
    'BigUint64Array',
  ];
  const num = (n: number): string => (Object.is(n, -0) ? '-0' : String(n));
  const toNode = (v: unknown): Node => {
    if (v === null) return ['null'];
    switch (typeof v) {
      case 'undefined':
        return ['undefined'];
      case 'boolean':
        return ['bool', v];
      case 'string':
        return ['str', v];
      case 'number':
        return ['num', num(v)];
      case 'bigint':
        return ['bigint', v.toString()];
      case 'object':
        break;
      default:
        return ['unstorable', typeof v];
    }
    if (v instanceof Date) return ['date', num(v.getTime())];
    if (v instanceof Map) return ['map', [...v].map(([k, x]) => [toNode(k), toNode(x)])];
    if (v instanceof Set) return ['set', [...v].map(toNode)];
    if (ArrayBuffer.isView(v) && !(v instanceof DataView)) {
      const name = Object.prototype.toString.call(v).slice(8, -1);
      return ['typed', name, Array.from(v as unknown as ArrayLike<number | bigint>, String)];
    }
    if (Array.isArray(v)) {
      const items: unknown[] = [];
      for (const key of Object.keys(v)) items.push([key, toNode((v as unknown[])[Number(key)])]);
      return ['array', v.length, items];
    }
    const proto = Object.getPrototypeOf(v) as unknown;
    const kind = proto === null ? 'null-proto' : proto === Object.prototype ? 'plain' : 'other';
    const entries = Object.keys(v).map((k) => [k, toNode((v as Record<string, unknown>)[k])]);
    return ['object', kind, entries];
  };
  const fromNode = (n: Node): unknown => {
    const [tag, a, b] = n;
    switch (tag) {
      case 'null':
        return null;
      case 'undefined':
        return undefined;
      case 'bool':
      case 'str':
        return a;
      case 'num':
        return a === '-0' ? -0 : Number(a);
      case 'bigint':
        return BigInt(a as string);
      case 'date':
        return new Date(a === '-0' ? -0 : Number(a));
      case 'map':
        return new Map((a as [Node, Node][]).map(([k, x]) => [fromNode(k), fromNode(x)]));
      case 'set':
        return new Set((a as Node[]).map(fromNode));
      case 'typed': {
        if (!typedNames.includes(a as string)) throw new Error(`unknown typed array ${String(a)}`);
        const Ctor = (globalThis as unknown as Record<string, new (n: number) => unknown[]>)[
          a as string
        ] as new (n: number) => unknown[];
        const text = b as string[];
        const out = new Ctor(text.length);
        const big = (a as string).startsWith('Big');
        text.forEach((s, i) => (out[i] = big ? BigInt(s) : Number(s)));
        return out;
      }
      case 'array': {
        const out: unknown[] = new Array(a as number);
        for (const [key, x] of b as [string, Node][]) {
          Object.defineProperty(out, key, {
            value: fromNode(x),
            enumerable: true,
            writable: true,
            configurable: true,
          });
        }
        return out;
      }
      case 'object': {
        const out: Record<string, unknown> = a === 'null-proto' ? Object.create(null) : {};
        for (const [key, x] of b as unknown as [string, Node][]) {
          Object.defineProperty(out, key, {
            value: fromNode(x),
            enumerable: true,
            writable: true,
            configurable: true,
          });
        }
        return out;
      }
      default:
        throw new Error(`cannot decode ${String(tag)}`);
    }
  };
  const codec: TaggedCodec = {
    encode: (value) => JSON.stringify(toNode(value)),
    decode: (text) => fromNode(JSON.parse(text) as Node),
  };
  (globalThis as unknown as { taggedCodec: TaggedCodec }).taggedCodec = codec;
  return codec;
}
