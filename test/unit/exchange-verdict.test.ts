/**
 * The verdict the map and the CSV read from a stored result matches what calc's `screen()`
 * returns (the result snapshot is the ScreeningResult as JSON).
 */
import { describe, expect, it } from 'vitest';
import { CALC_VERSION, screen } from '../../calc/index.js';
import type { SurveyRecord } from '../../forms/index.js';
import { readVerdict } from '../../web/exchange/survey-verdict.js';
import { toMapData } from '../../web/map/map-points.js';
import { makeTown } from '../fixtures/exchange/town.js';

describe('verdict of a stored screening result', () => {
  it('reads posting, damage state and the assessment flag of real screen() results', () => {
    const town = makeTown(40, { seed: 17 });
    const seen = new Set<string>();
    for (const r of town) {
      const result = screen(r);
      const stored: SurveyRecord = {
        ...r,
        result: {
          calcVersion: CALC_VERSION,
          computedAt: r.updatedAt,
          result: JSON.parse(JSON.stringify(result)) as never,
        },
      };
      expect(readVerdict(stored)).toEqual({
        posting: result.posting.level,
        damageState: result.damageState,
        needsAssessment: result.needsAssessment,
      });
      const [point] = toMapData([stored]).points;
      expect(point?.posting).toBe(result.posting.level);
      seen.add(result.posting.level);
    }
    expect(seen.size).toBeGreaterThan(0);
  });

  it('reads a record without a result as not screened, and never throws on odd results', () => {
    const [r] = makeTown(1, { seed: 1 }) as [SurveyRecord];
    expect(readVerdict({ result: null })).toEqual({
      posting: null,
      damageState: null,
      needsAssessment: false,
    });
    for (const odd of [42, 'keep-out', [], { posting: { level: 'closed' } }, { damageState: 7 }]) {
      expect(() => readVerdict({ result: { ...r.result!, result: odd as never } })).not.toThrow();
      expect(readVerdict({ result: { ...r.result!, result: odd as never } }).posting).toBeNull();
    }
  });
});
