/**
 * Reads a large JSON document piece by piece: the elements of a top-level array, or of the
 * `features` array of a top-level object (a GeoJSON FeatureCollection), come out one at a
 * time as raw text while the bytes stream in, so a file of any size is never held whole.
 * Each element is then parsed on its own with `JSON.parse`, so one broken element is reported
 * by its index and the others still count.
 *
 * The scanner only follows JSON's structure: strings (with escapes), brackets and commas.
 * It works on bytes: every structural character is ASCII and the bytes of a multi-byte
 * UTF-8 character are all ≥ 0x80, so they never look like structure (RFC 8259 §8.1).
 */

/** What the scanner finds. */
export type JsonStreamEvent =
  /** The raw text of one array element, by index. */
  | { kind: 'element'; index: number; text: string }
  /** An element that could not be cut out (too large, or its brackets do not match). */
  | { kind: 'element-error'; index: number; reason: string }
  /** A member of the top-level object other than `features`, with its raw value text. */
  | { kind: 'member'; key: string; text: string }
  /** The document is not usable from here on: nothing after it is read. */
  | { kind: 'fatal'; reason: string };

export interface JsonStreamOptions {
  /** Largest element, in bytes (a bigger one is skipped and reported). */
  maxElementBytes: number;
  /** Largest value of another top-level member, in bytes. */
  maxMemberBytes: number;
}

/** Defaults: 64 MB per element, 1 MB per other member (our limits, no source). */
export const DEFAULT_JSON_STREAM_OPTIONS: JsonStreamOptions = {
  maxElementBytes: 64 * 1024 * 1024,
  maxMemberBytes: 1024 * 1024,
};

const QUOTE = 0x22;
const BACKSLASH = 0x5c;
const COMMA = 0x2c;
const COLON = 0x3a;
const OPEN_ARRAY = 0x5b;
const CLOSE_ARRAY = 0x5d;
const OPEN_OBJECT = 0x7b;
const CLOSE_OBJECT = 0x7d;

function isSpace(b: number): boolean {
  return b === 0x20 || b === 0x0a || b === 0x0d || b === 0x09;
}

/** Where the scanner is in the document's top level. */
type Phase =
  | 'start' // before the first byte that is not white space
  | 'array-value' // in the element array, expecting an element or `]`
  | 'array-after' // after an element, expecting `,` or `]`
  | 'object-key' // in the top-level object, expecting a key or `}`
  | 'object-colon' // after a key, expecting `:`
  | 'object-value' // expecting a member's value
  | 'object-after' // after a member, expecting `,` or `}`
  | 'value' // inside an element or member value (nested)
  | 'done' // the top-level value is closed
  | 'failed';

/**
 * A push scanner: `push()` bytes as they arrive and `end()` at the end; both return the
 * events found. Holds only the element being cut out.
 */
export class JsonArrayScanner {
  private phase: Phase = 'start';
  private readonly options: JsonStreamOptions;
  /** True when the element array is the top-level value; false when it is `features`. */
  private rootIsArray = false;
  private index = 0;
  // The value being cut out.
  private capturing: 'element' | 'member' | null = null;
  private parts: Buffer[] = [];
  private partStart = 0;
  private size = 0;
  private oversized = false;
  private mismatched = false;
  private stack: number[] = [];
  private inString = false;
  private escaped = false;
  /** A scalar value (number, true, false, null) being read: ends at , ] } or space. */
  private inScalar = false;
  // The key of the top-level member being read.
  private keyBytes: number[] = [];
  private readingKey = false;
  private keyEscaped = false;
  private key = '';
  private sawFirstByte = false;
  /** After a comma in the element array: a `]` now would be a trailing comma. */
  private afterComma = false;
  private foundFeatures = false;

  constructor(options: Partial<JsonStreamOptions> = {}) {
    this.options = { ...DEFAULT_JSON_STREAM_OPTIONS, ...options };
  }

  /** Scans the next chunk of bytes. */
  push(chunk: Buffer): JsonStreamEvent[] {
    const out: JsonStreamEvent[] = [];
    if (this.phase === 'failed') return out;
    let i = 0;
    // A UTF-8 byte order mark at the very start is allowed and skipped (RFC 8259 §8.1).
    if (!this.sawFirstByte && chunk.length > 0) {
      if (chunk.length >= 3 && chunk[0] === 0xef && chunk[1] === 0xbb && chunk[2] === 0xbf) i = 3;
    }
    if (this.capturing !== null) this.partStart = i;
    const n = chunk.length;
    while (i < n) {
      const b = chunk[i]!;
      switch (this.phase) {
        case 'value': {
          i = this.scanValue(chunk, i, out);
          continue;
        }
        case 'start':
          if (isSpace(b)) break;
          this.sawFirstByte = true;
          if (b === OPEN_ARRAY) {
            this.rootIsArray = true;
            this.phase = 'array-value';
          } else if (b === OPEN_OBJECT) {
            this.phase = 'object-key';
          } else {
            return this.fail(out, 'the file is not JSON: it does not start with [ or {');
          }
          break;
        case 'array-value':
          if (isSpace(b)) break;
          if (b === CLOSE_ARRAY && this.index === 0 && !this.afterComma) {
            this.closeArray();
            break;
          }
          if (b === COMMA || b === CLOSE_ARRAY || b === COLON || b === CLOSE_OBJECT) {
            return this.fail(
              out,
              `the list is broken before item ${this.index}: unexpected "${String.fromCharCode(b)}"`,
            );
          }
          this.begin('element', i);
          continue; // the value scanner reads this byte
        case 'array-after':
          if (isSpace(b)) break;
          if (b === COMMA) {
            this.afterComma = true;
            this.phase = 'array-value';
          } else if (b === CLOSE_ARRAY) this.closeArray();
          else {
            return this.fail(
              out,
              `the list is broken after item ${this.index - 1}: expected "," or "]"`,
            );
          }
          break;
        case 'object-key':
          if (this.readingKey) {
            this.readKeyByte(b);
            break;
          }
          if (isSpace(b) || b === COMMA) break;
          if (b === CLOSE_OBJECT) {
            this.phase = 'done';
            break;
          }
          if (b !== QUOTE) return this.fail(out, 'the top-level object is broken: expected a key');
          this.readingKey = true;
          this.keyBytes = [];
          break;
        case 'object-colon':
          if (isSpace(b)) break;
          if (b !== COLON)
            return this.fail(out, `the top-level object is broken after "${this.key}"`);
          this.phase = 'object-value';
          break;
        case 'object-value':
          if (isSpace(b)) break;
          if (this.key === 'features' && b === OPEN_ARRAY) {
            this.foundFeatures = true;
            this.phase = 'array-value';
            this.afterComma = false;
            break;
          }
          this.begin('member', i);
          continue;
        case 'object-after':
          if (isSpace(b)) break;
          if (b === COMMA) this.phase = 'object-key';
          else if (b === CLOSE_OBJECT) {
            this.phase = 'done';
          } else return this.fail(out, `the top-level object is broken after "${this.key}"`);
          break;
        case 'done':
          if (!isSpace(b))
            return this.fail(out, 'there is more text after the end of the JSON document');
          break;
        default:
          break;
      }
      i++;
    }
    if (this.capturing !== null) this.keep(chunk, this.partStart, n);
    return out;
  }

  /** Ends the document; reports an element or structure left open. */
  end(): JsonStreamEvent[] {
    const out: JsonStreamEvent[] = [];
    if (this.phase === 'failed') return out;
    if (!this.sawFirstByte) return this.fail(out, 'the file is empty');
    if (this.phase !== 'done') {
      if (this.capturing === 'element') {
        out.push({
          kind: 'element-error',
          index: this.index,
          reason: `the file ends inside item ${this.index}`,
        });
      }
      return this.fail(out, 'the file ends before the JSON document is closed (cut short?)');
    }
    return out;
  }

  /** True when the element array was the top-level value (a JSON array of surveys). */
  get topLevelArray(): boolean {
    return this.rootIsArray;
  }

  /** True when a `features` array was found in a top-level object. */
  get sawFeatures(): boolean {
    return this.foundFeatures;
  }

  private fail(out: JsonStreamEvent[], reason: string): JsonStreamEvent[] {
    this.phase = 'failed';
    this.capturing = null;
    this.parts = [];
    out.push({ kind: 'fatal', reason });
    return out;
  }

  private closeArray(): void {
    this.afterComma = false;
    if (this.rootIsArray) {
      this.phase = 'done';
    } else {
      this.phase = 'object-after';
    }
  }

  private readKeyByte(b: number): void {
    if (this.keyEscaped) {
      this.keyEscaped = false;
      this.keyBytes.push(b);
      return;
    }
    if (b === BACKSLASH) {
      this.keyEscaped = true;
      this.keyBytes.push(b);
      return;
    }
    if (b === QUOTE) {
      this.readingKey = false;
      try {
        this.key = JSON.parse(`"${Buffer.from(this.keyBytes).toString('utf8')}"`) as string;
      } catch {
        this.key = Buffer.from(this.keyBytes).toString('utf8');
      }
      this.phase = 'object-colon';
      return;
    }
    if (this.keyBytes.length < 1024) this.keyBytes.push(b);
  }

  private begin(what: 'element' | 'member', i: number): void {
    this.capturing = what;
    this.parts = [];
    this.partStart = i;
    this.size = 0;
    this.oversized = false;
    this.mismatched = false;
    this.stack = [];
    this.inString = false;
    this.escaped = false;
    this.inScalar = false;
    this.phase = 'value';
  }

  private keep(chunk: Buffer, from: number, to: number): void {
    if (to <= from) return;
    const limit =
      this.capturing === 'element' ? this.options.maxElementBytes : this.options.maxMemberBytes;
    this.size += to - from;
    if (this.size > limit) {
      this.oversized = true;
      this.parts = [];
      return;
    }
    if (!this.oversized) this.parts.push(chunk.subarray(from, to));
  }

  /** Scans inside a value from `i`; returns where to continue. Emits the value when it ends. */
  private scanValue(chunk: Buffer, i: number, out: JsonStreamEvent[]): number {
    const n = chunk.length;
    while (i < n) {
      const b = chunk[i]!;
      if (this.inString) {
        if (this.escaped) this.escaped = false;
        else if (b === BACKSLASH) this.escaped = true;
        else if (b === QUOTE) {
          this.inString = false;
          if (this.stack.length === 0) {
            // A top-level string value ends here.
            return this.finish(chunk, i + 1, out);
          }
        }
        i++;
        continue;
      }
      if (b === QUOTE) {
        if (this.inScalar) this.mismatched = true;
        this.inString = true;
      } else if (b === OPEN_ARRAY || b === OPEN_OBJECT) {
        this.stack.push(b === OPEN_ARRAY ? CLOSE_ARRAY : CLOSE_OBJECT);
      } else if (b === CLOSE_ARRAY || b === CLOSE_OBJECT) {
        if (this.stack.length === 0) {
          // Closes the enclosing array or object: a scalar value ended just before.
          return this.finish(chunk, i, out);
        }
        const expected = this.stack.pop();
        if (expected !== b) this.mismatched = true;
        if (this.stack.length === 0) return this.finish(chunk, i + 1, out);
      } else if (this.stack.length === 0) {
        if (b === COMMA) return this.finish(chunk, i, out);
        if (isSpace(b)) {
          if (this.inScalar) return this.finish(chunk, i, out);
        } else this.inScalar = true;
      }
      i++;
    }
    return i;
  }

  /** The value ends before byte `end` of `chunk`. */
  private finish(chunk: Buffer, end: number, out: JsonStreamEvent[]): number {
    this.keep(chunk, this.partStart, end);
    const what = this.capturing;
    const text = this.oversized ? '' : Buffer.concat(this.parts).toString('utf8');
    this.parts = [];
    this.capturing = null;
    if (what === 'element') {
      if (this.oversized) {
        out.push({
          kind: 'element-error',
          index: this.index,
          reason: `item ${this.index} is larger than ${Math.round(this.options.maxElementBytes / 1048576)} MB; skipped`,
        });
      } else if (this.mismatched) {
        out.push({
          kind: 'element-error',
          index: this.index,
          reason: `item ${this.index} is not valid JSON (its brackets do not match)`,
        });
      } else out.push({ kind: 'element', index: this.index, text });
      this.index++;
      this.phase = 'array-after';
      this.afterComma = false;
    } else {
      if (!this.oversized) out.push({ kind: 'member', key: this.key, text });
      this.phase = 'object-after';
    }
    return end;
  }
}

/**
 * Scans a stream of byte chunks (a file or stdin), yielding events as they are found.
 */
export async function* scanJsonArray(
  chunks: AsyncIterable<Buffer | string>,
  options: Partial<JsonStreamOptions> = {},
): AsyncGenerator<JsonStreamEvent, { topLevelArray: boolean; sawFeatures: boolean }> {
  const scanner = new JsonArrayScanner(options);
  for await (const chunk of chunks) {
    const events = scanner.push(typeof chunk === 'string' ? Buffer.from(chunk, 'utf8') : chunk);
    for (const e of events) {
      yield e;
      if (e.kind === 'fatal')
        return { topLevelArray: scanner.topLevelArray, sawFeatures: scanner.sawFeatures };
    }
  }
  for (const e of scanner.end()) yield e;
  return { topLevelArray: scanner.topLevelArray, sawFeatures: scanner.sawFeatures };
}
