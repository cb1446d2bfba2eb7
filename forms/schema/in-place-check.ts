/**
 * A fast yes/no answer to "does this value pass the schema?", read off the zod schema itself
 * so the two cannot disagree on purpose. It walks the value in place and allocates almost
 * nothing, where zod builds a full copy; reading 100,000 records is then a few times
 * quicker. It only ever says yes or no: when it says no, or meets a schema feature it does
 * not know, the caller runs zod for the messages (and zod has the last word).
 *
 * Supported zod 4 kinds: number (finite; gt/gte/lt/lte; safe integer), string (length,
 * format patterns such as uuid and ISO datetime), boolean, enum, literal, array (length),
 * object (strict or not), nullable, optional, union (plain and discriminated), custom.
 * test/unit/schema-in-place-check.test.ts checks it against zod on valid, broken and
 * garbage values.
 */
import type { z } from './zod-config.js';

type Check = (v: unknown) => boolean;

interface Def {
  type: string;
  checks?: Array<{ _zod: { def: CheckDef } }>;
  [key: string]: unknown;
}

interface CheckDef {
  check: string;
  value?: number;
  inclusive?: boolean;
  format?: string;
  minimum?: number;
  maximum?: number;
  length?: number;
  pattern?: RegExp;
}

/** Thrown at compile time for a schema feature this checker does not cover. */
export class UnsupportedSchemaError extends Error {}

function defOf(schema: unknown): Def {
  return (schema as { _zod: { def: Def } })._zod.def;
}

function patternCheck(pattern: unknown): Check {
  if (!(pattern instanceof RegExp))
    throw new UnsupportedSchemaError('string format without a pattern');
  if (pattern.global || pattern.sticky) throw new UnsupportedSchemaError('stateful pattern');
  return (v) => pattern.test(v as string);
}

function lengthChecks(def: Def): Check[] {
  return (def.checks ?? []).map(({ _zod: { def: c } }) => {
    switch (c.check) {
      case 'min_length':
        return (v: unknown) => (v as { length: number }).length >= (c.minimum as number);
      case 'max_length':
        return (v: unknown) => (v as { length: number }).length <= (c.maximum as number);
      case 'length_equals':
        return (v: unknown) => (v as { length: number }).length === c.length;
      case 'string_format':
        return patternCheck(c.pattern);
      default:
        throw new UnsupportedSchemaError(`length check ${c.check}`);
    }
  });
}

function numberChecks(def: Def): Check[] {
  return (def.checks ?? []).map(({ _zod: { def: c } }) => {
    const value = c.value as number;
    switch (c.check) {
      case 'greater_than':
        return c.inclusive
          ? (v: unknown) => (v as number) >= value
          : (v: unknown) => (v as number) > value;
      case 'less_than':
        return c.inclusive
          ? (v: unknown) => (v as number) <= value
          : (v: unknown) => (v as number) < value;
      case 'number_format':
        if (c.format !== 'safeint') throw new UnsupportedSchemaError(`number format ${c.format}`);
        return (v: unknown) => Number.isSafeInteger(v);
      default:
        throw new UnsupportedSchemaError(`number check ${c.check}`);
    }
  });
}

const all = (checks: Check[]): Check =>
  checks.length === 0
    ? () => true
    : (v) => {
        for (const c of checks) if (!c(v)) return false;
        return true;
      };

function compile(schema: unknown): Check {
  const def = defOf(schema);
  switch (def.type) {
    case 'number': {
      const rest = all(numberChecks(def));
      return (v) => typeof v === 'number' && Number.isFinite(v) && rest(v);
    }
    case 'string': {
      const checks = lengthChecks(def);
      if (def['pattern'] !== undefined) checks.unshift(patternCheck(def['pattern']));
      const rest = all(checks);
      return (v) => typeof v === 'string' && rest(v);
    }
    case 'boolean':
      if (def.checks?.length) throw new UnsupportedSchemaError('boolean checks');
      return (v) => typeof v === 'boolean';
    case 'enum': {
      const values = new Set(Object.values(def['entries'] as Record<string, unknown>));
      return (v) => values.has(v);
    }
    case 'literal': {
      const values = new Set(def['values'] as unknown[]);
      return (v) => values.has(v);
    }
    case 'nullable': {
      const inner = compile(def['innerType']);
      return (v) => v === null || inner(v);
    }
    case 'optional': {
      const inner = compile(def['innerType']);
      return (v) => v === undefined || inner(v);
    }
    case 'array': {
      const element = compile(def['element']);
      const rest = all(lengthChecks(def));
      return (v) => {
        if (!Array.isArray(v) || !rest(v)) return false;
        for (let i = 0; i < v.length; i++) if (!element(v[i])) return false;
        return true;
      };
    }
    case 'object': {
      if (def.checks?.length) throw new UnsupportedSchemaError('object checks');
      const shape = def['shape'] as Record<string, unknown>;
      const keys = Object.keys(shape);
      const checks = keys.map((k) => compile(shape[k]));
      const catchall = def['catchall'];
      const strict = catchall !== undefined && defOf(catchall).type === 'never';
      if (catchall !== undefined && !strict) throw new UnsupportedSchemaError('object catchall');
      const known = new Set(keys);
      return (v) => {
        if (typeof v !== 'object' || v === null || Array.isArray(v)) return false;
        const o = v as Record<string, unknown>;
        for (let i = 0; i < keys.length; i++) {
          if (!(checks[i] as Check)(o[keys[i] as string])) return false;
        }
        if (strict) {
          for (const k in o) {
            if (Object.prototype.hasOwnProperty.call(o, k) && !known.has(k)) return false;
          }
        }
        return true;
      };
    }
    case 'union': {
      const options = (def['options'] as unknown[]).map(compile);
      return (v) => options.some((c) => c(v));
    }
    case 'custom': {
      const fn = def['fn'] as (v: unknown) => unknown;
      return (v) => Boolean(fn(v));
    }
    default:
      throw new UnsupportedSchemaError(`zod type ${def.type}`);
  }
}

/**
 * Compiles a yes/no check for `schema`, or returns null when the schema uses something
 * this checker does not cover (then always use zod).
 */
export function compileInPlaceCheck(schema: z.ZodType): Check | null {
  try {
    return compile(schema);
  } catch (error) {
    if (error instanceof UnsupportedSchemaError) return null;
    throw error;
  }
}
