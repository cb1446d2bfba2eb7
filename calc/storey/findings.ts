/**
 * What a calculation assumed and what it lacked, collected while it runs so the result can
 * say, next to every number, which defaults and gaps stand behind it.
 */

/** A default or modelling assumption the result rests on. */
export interface Assumption {
  /** Stable key, e.g. 'mass.default.light-timber'; each appears once per result. */
  id: string;
  /** What was assumed, in a sentence. */
  text: string;
  /** Where the value or method comes from: standard and clause, paper, or "common practice, no source". */
  source: string;
}

/** An input that was absent or unusable, and what the result had to do without it. */
export interface MissingInput {
  /** Path of the field in the survey, e.g. 'walls[3].positionM' or 'hazard'. */
  field: string;
  /** 'missing': absent (null or empty); 'invalid': present but out of range. */
  problem: 'missing' | 'invalid';
  /** What could not be computed, or how it was worked around. */
  effect: string;
}

/** Collects assumptions (once each) and missing inputs during one calculation. */
export class Findings {
  readonly assumptions: Assumption[] = [];
  readonly missingInputs: MissingInput[] = [];
  private readonly seen = new Set<string>();

  /** True once an assumption with this id has been recorded (lets callers skip building text). */
  has(id: string): boolean {
    return this.seen.has(id);
  }

  assume(id: string, text: string, source: string): void {
    if (this.seen.has(id)) return;
    this.seen.add(id);
    this.assumptions.push({ id, text, source });
  }

  missing(field: string, effect: string): void {
    this.missingInputs.push({ field, problem: 'missing', effect });
  }

  invalid(field: string, effect: string): void {
    this.missingInputs.push({ field, problem: 'invalid', effect });
  }
}
