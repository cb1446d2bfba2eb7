import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import {
  compileInPlaceCheck,
  surveyRecordSchema,
  surveyRecordV1Schema,
} from '../../forms/schema/index.js';
import { brokenRecordArb, garbageArb, surveyRecordArb } from '../fixtures/records/arbitrary.js';
import v1 from '../fixtures/records/v1-two-storey-house.json' with { type: 'json' };

// Reference: zod itself. The in-place check must say yes exactly when zod's safeParse succeeds.
const check = compileInPlaceCheck(surveyRecordSchema);

describe('in-place record check', () => {
  it('covers every feature the record schema uses (no fallback needed)', () => {
    expect(check).not.toBeNull();
    expect(compileInPlaceCheck(surveyRecordV1Schema)).not.toBeNull();
  });

  it('agrees with zod on valid, broken and garbage values', () => {
    fc.assert(
      fc.property(fc.oneof(surveyRecordArb, brokenRecordArb, garbageArb), (value) => {
        expect(check?.(value)).toBe(surveyRecordSchema.safeParse(value).success);
      }),
      { numRuns: 2000 },
    );
  });

  it('agrees with zod on the version 1 schema', () => {
    const v1check = compileInPlaceCheck(surveyRecordV1Schema);
    const variants: unknown[] = [
      v1,
      { ...v1, lat: 'x' },
      { ...v1, extra: 1 },
      { ...v1, photos: [{}] },
    ];
    for (const v of variants) expect(v1check?.(v)).toBe(surveyRecordV1Schema.safeParse(v).success);
  });

  it('agrees with zod at every edge of the number and string rules', () => {
    const cases: Array<[z.ZodType, unknown[]]> = [
      [z.number().gt(0).max(5), [0, -0, 1e-300, 5, 5.000001, NaN, Infinity, '1', null]],
      [z.number().int().min(0), [0, 1, 1.5, -1, 2 ** 53, 2 ** 53 - 1, -0]],
      [z.string().min(1).max(3), ['', 'a', 'abc', 'abcd', 5]],
      [
        z.uuid(),
        ['00000000-0000-4000-8000-000000000000', 'x', '00000000-0000-4000-c000-000000000000'],
      ],
      [
        z.iso.datetime(),
        ['2024-02-29T00:00:00Z', '2023-02-29T00:00:00Z', '2024-01-01T00:00:00.123Z', '2024-01-01'],
      ],
      [
        z.array(z.number()).max(2),
        [[], [1, 2], [1, 2, 3], [1, undefined], new Array<number>(2).fill(1, 1)],
      ],
      [
        z.strictObject({ a: z.number().optional() }),
        [{}, { a: undefined }, { a: 1 }, { b: 1 }, JSON.parse('{"__proto__": 1}'), null, []],
      ],
      [
        z.discriminatedUnion('k', [
          z.strictObject({ k: z.literal('a') }),
          z.strictObject({ k: z.literal('b'), n: z.number() }),
        ]),
        [{ k: 'a' }, { k: 'b' }, { k: 'b', n: 1 }, { k: 'c' }],
      ],
    ];
    for (const [schema, values] of cases) {
      const c = compileInPlaceCheck(schema);
      for (const v of values) expect([v, c?.(v)]).toEqual([v, schema.safeParse(v).success]);
    }
  });

  it('declines (returns null) for schema features it does not cover', () => {
    expect(compileInPlaceCheck(z.string().transform((s) => s.length))).toBeNull();
    expect(compileInPlaceCheck(z.object({ a: z.number() }).catchall(z.string()))).toBeNull();
    expect(compileInPlaceCheck(z.number().multipleOf(2))).toBeNull();
  });
});
