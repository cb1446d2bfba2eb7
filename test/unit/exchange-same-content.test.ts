/**
 * The content comparison behind duplicate and conflict detection, checked against an
 * independent one written here differently: both values serialised by JSON.stringify with
 * keys sorted at every level, then compared as text.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sameJson, sameSurveyContent } from '../../web/exchange/same-content.js';
import { jsonArb, surveyRecordArb } from '../fixtures/records/arbitrary.js';

function sortedText(v: unknown): string {
  return JSON.stringify(v, (_k, value: unknown) =>
    value && typeof value === 'object' && !Array.isArray(value)
      ? Object.fromEntries(
          Object.keys(value)
            .sort()
            .map((k) => [
              k === '__proto__' ? '\u0000proto' : k,
              (value as Record<string, unknown>)[k],
            ]),
        )
      : value,
  );
}

/** The same data with object keys in reverse order (own keys kept, "__proto__" included). */
function reordered(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(reordered);
  if (v && typeof v === 'object') {
    const out: Record<string, unknown> = {};
    for (const k of Object.keys(v).reverse()) {
      Object.defineProperty(out, k, {
        value: reordered((v as Record<string, unknown>)[k]),
        enumerable: true,
        writable: true,
        configurable: true,
      });
    }
    return out;
  }
  return v;
}

describe('same content', () => {
  it('agrees with a sorted-keys text comparison on any pair of JSON values (fast-check)', () => {
    fc.assert(
      fc.property(jsonArb, jsonArb, (a, b) => {
        expect(sameJson(a, b)).toBe(sortedText(a) === sortedText(b));
        expect(sameJson(a, reordered(a))).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it('tells records apart by any field but lastExportedAt (fast-check)', () => {
    fc.assert(
      fc.property(surveyRecordArb, surveyRecordArb, (a, b) => {
        expect(sameSurveyContent(a, reordered(a) as object)).toBe(true);
        expect(sameSurveyContent(a, { ...a, lastExportedAt: '2031-01-01T00:00:00.000Z' })).toBe(
          true,
        );
        const expected =
          sortedText({ ...a, lastExportedAt: null }) === sortedText({ ...b, lastExportedAt: null });
        expect(sameSurveyContent(a, b)).toBe(expected);
      }),
      { numRuns: 200 },
    );
  });

  it('compares an own "__proto__" key like any other', () => {
    const a = JSON.parse('{"__proto__":{"x":1},"y":2}') as unknown;
    const b = JSON.parse('{"__proto__":{"x":2},"y":2}') as unknown;
    const c = JSON.parse('{"y":2}') as unknown;
    expect(sameJson(a, b)).toBe(false);
    expect(sameJson(a, c)).toBe(false);
    expect(sameJson(a, JSON.parse('{"y":2,"__proto__":{"x":1}}'))).toBe(true);
  });

  it('refuses values nested beyond any record, with the limit in the message', () => {
    let deep: unknown = 1;
    for (let i = 0; i < 300; i++) deep = [deep];
    expect(() => sameJson(deep, structuredClone(deep))).toThrow(/200 levels/);
  });
});
