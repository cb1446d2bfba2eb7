/**
 * Turns zod validation issues into sentences at fields: each issue becomes
 * `{ path, message }`, where `path` is the dot-separated field path the form binds to
 * (`building.storeys.0.heightM`) and the message comes from the catalogue (messages.ts).
 */
import { en, type FieldLabel, type MessageCatalogue, type RuleInput } from './messages.js';

/** One message for one field. `path` is '' for the record as a whole. */
export interface FieldMessage {
  path: string;
  message: string;
}

/** The parts of a zod 4 issue this module reads (zod's own type is a wide union). */
export interface IssueLike {
  code: string;
  path: readonly PropertyKey[];
  message?: string;
  minimum?: number | bigint;
  maximum?: number | bigint;
  inclusive?: boolean;
  origin?: string;
  expected?: string;
  format?: string;
  keys?: readonly string[];
  /** Set on invalid_type when zod saw NaN. */
  received?: string;
}

/** Joins a zod path into the form's field path. */
export function pathToString(path: readonly PropertyKey[]): string {
  return path.map((p) => String(p)).join('.');
}

/** The catalogue pattern of a path: list indices become `*`. */
export function pathPattern(path: readonly PropertyKey[]): string {
  return path
    .map((p) => (typeof p === 'number' || /^\d+$/.test(String(p)) ? '*' : String(p)))
    .join('.');
}

/**
 * The label of a field path. Falls back to the nearest enclosing field that has one (so an
 * issue deep inside free JSON is reported at the JSON field), then to the catalogue fallback.
 */
export function labelFor(
  path: readonly PropertyKey[] | string,
  catalogue: MessageCatalogue = en,
): FieldLabel {
  const parts =
    typeof path === 'string' ? (path === '' ? [] : path.split('.')) : path.map((p) => String(p));
  for (let n = parts.length; n >= 0; n--) {
    const key = pathPattern(parts.slice(0, n));
    const found = catalogue.fields[key];
    if (found !== undefined) return found;
  }
  return catalogue.fallbackField;
}

/** Fields checked by `jsonValueSchema`. */
const JSON_FIELDS = new Set(['result.result', 'instrumentRecords.*.data']);

function ruleInput(label: FieldLabel): RuleInput {
  return { label: label.label, unit: label.unit, hint: label.hint ?? '' };
}

/** The sentence for one issue. */
export function messageForIssue(issue: IssueLike, catalogue: MessageCatalogue = en): string {
  const r = catalogue.rules;
  const x = ruleInput(labelFor(issue.path, catalogue));
  const limit = (v: number | bigint | undefined) => Number(v ?? 0);
  switch (issue.code) {
    case 'too_small':
      if (issue.origin === 'string') return r.textEmpty(x);
      if (issue.origin === 'array' || issue.origin === 'set') {
        return r.tooFewEntries(x, limit(issue.minimum));
      }
      return issue.inclusive === false
        ? r.moreThan(x, limit(issue.minimum))
        : r.atLeast(x, limit(issue.minimum));
    case 'too_big':
      if (issue.origin === 'string') return r.textTooLong(x, limit(issue.maximum));
      if (issue.origin === 'array' || issue.origin === 'set') {
        return r.tooManyEntries(x, limit(issue.maximum));
      }
      return issue.inclusive === false
        ? r.lessThan(x, limit(issue.maximum))
        : r.atMost(x, limit(issue.maximum));
    case 'invalid_type':
      switch (issue.expected) {
        case 'int':
          return r.wholeNumber(x);
        case 'number':
          return r.number(x);
        case 'string':
          return r.text(x);
        case 'boolean':
          return r.yesNo(x);
        case 'array':
          return r.list(x);
        default:
          return r.missing(x);
      }
    case 'invalid_value':
      return r.choice(x);
    case 'invalid_format':
      return r.format(x, issue.format ?? '');
    case 'unrecognized_keys':
      return r.unexpectedFields(x, issue.keys ?? []);
    case 'invalid_union':
      // A discriminated union reports a bad discriminator at the `kind` field: a choice.
      if (issue.path[issue.path.length - 1] === 'kind') return r.choice(x);
      return r.invalid(x);
    case 'custom':
      // The in-place JSON checks (json-value.ts) are the only custom checks so far.
      if (JSON_FIELDS.has(pathPattern(issue.path))) return r.notJson(x);
      return r.invalid(x);
    default:
      return r.invalid(x);
  }
}

/** All issues as field messages, in the order zod reported them. */
export function fieldMessages(
  issues: readonly IssueLike[],
  catalogue: MessageCatalogue = en,
): FieldMessage[] {
  return issues.map((issue) => ({
    path: pathToString(issue.path),
    message: messageForIssue(issue, catalogue),
  }));
}

/** Messages grouped by field path, for a form that shows them at each field. */
export function messagesByField(
  issues: readonly IssueLike[],
  catalogue: MessageCatalogue = en,
): Map<string, string[]> {
  const out = new Map<string, string[]>();
  for (const m of fieldMessages(issues, catalogue)) {
    const list = out.get(m.path);
    if (list) list.push(m.message);
    else out.set(m.path, [m.message]);
  }
  return out;
}
