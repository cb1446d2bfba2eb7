// Soft and weak storeys. Reference: ASCE 7-16 Table 12.3-2, types 1a (stiffness < 70 % of the
// storey above or < 80 % of the average of the three above), 1b (< 60 % or < 70 %), 5a
// (strength < 80 % of the storey above) and 5b (< 65 %).
import { describe, expect, it } from 'vitest';
import { storeyIrregularities } from '../../calc/index.js';

describe('ASCE 7-16 Table 12.3-2 storey flags', () => {
  it('flags 1a but not 1b at 65 % of the storey above', () => {
    const [g] = storeyIrregularities([65, 100], [100, 100]);
    expect(g!.soft1a).toBe(true);
    expect(g!.extremeSoft1b).toBe(false);
  });
  it('flags 1a and 1b at 55 % of the storey above', () => {
    const [g] = storeyIrregularities([55, 100], [100, 100]);
    expect(g!.soft1a).toBe(true);
    expect(g!.extremeSoft1b).toBe(true);
  });
  it('does not flag at 75 % of the storey above with fewer than three storeys above', () => {
    const [g] = storeyIrregularities([75, 100, 100], [1, 1, 1]);
    expect(g!.soft1a).toBe(false);
    expect(g!.stiffnessRatioToThreeAbove).toBeNull();
  });
  it('flags 1a by the three-storey average (75 % of 100 above, but < 80 % of the average 120)', () => {
    // storey above 100 → 0.75 ≥ 0.70; average of 100, 130, 130 = 120 → 90/120 = 0.75 < 0.80.
    const [g] = storeyIrregularities([90, 100, 130, 130], [1, 1, 1, 1]);
    expect(g!.stiffnessRatioToAbove).toBeCloseTo(0.9, 12);
    expect(g!.stiffnessRatioToThreeAbove).toBeCloseTo(0.75, 12);
    expect(g!.soft1a).toBe(true);
    expect(g!.extremeSoft1b).toBe(false);
  });
  it('flags 1b by the three-storey average below 70 %', () => {
    const [g] = storeyIrregularities([80, 100, 130, 130], [1, 1, 1, 1]); // 80/120 = 0.667
    expect(g!.extremeSoft1b).toBe(true);
  });
  it('flags 5a at 79 % and 5b at 64 % of the strength above, neither at 81 %', () => {
    expect(storeyIrregularities([1, 1], [79, 100])[0]!.weak5a).toBe(true);
    expect(storeyIrregularities([1, 1], [79, 100])[0]!.extremeWeak5b).toBe(false);
    expect(storeyIrregularities([1, 1], [64, 100])[0]!.extremeWeak5b).toBe(true);
    expect(storeyIrregularities([1, 1], [81, 100])[0]!.weak5a).toBe(false);
  });
  it('leaves the flags null (not false) where a value is unknown or there is no storey above', () => {
    const r = storeyIrregularities([null, 100, 100], [50, null, 100]);
    expect(r[0]!.soft1a).toBeNull();
    expect(r[0]!.weak5a).toBeNull();
    expect(r[2]!.soft1a).toBeNull();
    expect(r[2]!.weak5a).toBeNull();
    expect(r[1]!.soft1a).toBe(false);
  });
});
