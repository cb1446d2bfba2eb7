// Empirical fundamental period and the ASCE 7-16 upper-limit coefficient.
// References: EN 1998-1:2004 §4.3.3.2.2 eq. (4.6) with Ct = 0.050; ASCE 7-16 eq. (12.8-7) with
// Table 12.8-2 (Ct = 0.02 in ft units, 0.0488 in m, x = 0.75); ASCE 7-16 Table 12.8-1 (Cu).
// Hand values derived from those formulas (method notes §3).
import { describe, expect, it } from 'vitest';
import { empiricalPeriod, empiricalPeriodRange, upperLimitCoefficient } from '../../calc/index.js';

describe('EN 1998-1 empirical period T1 = 0.050·H^0.75 (eq. 4.6)', () => {
  it('gives 0.1917 s for H = 6 m and 0.2812 s for H = 10 m (derived)', () => {
    expect(empiricalPeriod(6, 'ec8')).toBeCloseTo(0.1917, 4);
    expect(empiricalPeriod(10, 'ec8')).toBeCloseTo(0.2812, 4);
  });
  it('has no range warning up to 40 m and warns, without refusing, above it', () => {
    expect(empiricalPeriodRange(40, 'ec8')).toEqual([]);
    const w = empiricalPeriodRange(45, 'ec8');
    expect(w).toHaveLength(1);
    expect(w[0]).toMatch(/40 m/);
    expect(empiricalPeriod(45, 'ec8')).toBeCloseTo(0.05 * 45 ** 0.75, 12);
  });
});

describe('ASCE 7-16 approximate period Ta = Ct·hn^x (eq. 12.8-7, Table 12.8-2)', () => {
  it('gives Ta = 0.2169 s for hn = 24 ft (derived, method notes §3) to the rounding of Ct = 0.0488', () => {
    // 0.0488 is 0.02·(1/0.3048)^0.75 = 0.048755 rounded up, so the SI form gives 0.21706 s.
    expect(empiricalPeriod(24 * 0.3048, 'asce7')).toBeCloseTo(0.2169, 3);
    expect(empiricalPeriod(24 * 0.3048, 'asce7')).toBeCloseTo(0.0488 * (24 * 0.3048) ** 0.75, 14);
  });
  it('agrees with the feet form Ct = 0.02·hn(ft)^0.75 to within the rounding of 0.0488', () => {
    for (const hFt of [10, 24, 35, 60, 120]) {
      const feet = 0.02 * hFt ** 0.75; // ASCE 7-16 Table 12.8-2, hn in ft
      expect(Math.abs(empiricalPeriod(hFt * 0.3048, 'asce7') / feet - 1)).toBeLessThan(1e-3); // 0.0488 / 0.048755 = 1.0009
    }
  });
  it('returns seconds as a plain number', () => {
    expect(typeof empiricalPeriod(8, 'asce7')).toBe('number');
  });
  it('warns above 160 ft (48.8 m) but still returns the period', () => {
    expect(empiricalPeriodRange(48, 'asce7')).toEqual([]);
    expect(empiricalPeriodRange(50, 'asce7')[0]).toMatch(/160 ft/);
  });
});

describe('empirical period refuses bad heights and names them', () => {
  for (const h of [0, -3, NaN, Infinity]) {
    it(`does not accept a height of ${h}`, () => {
      expect(() => empiricalPeriod(h, 'ec8')).toThrow(new RegExp(`heightM .* got ${h}`));
      expect(() => empiricalPeriodRange(h, 'asce7')).toThrow(/heightM/);
    });
  }
  it('does not accept an unknown method', () => {
    expect(() => empiricalPeriod(5, 'nzs' as 'ec8')).toThrow(/method .* got nzs/);
  });
});

describe('ASCE 7-16 Table 12.8-1 upper-limit coefficient Cu', () => {
  it('returns the table rows: 1.4 at SD1 ≥ 0.4 and 0.3, 1.5 at 0.2, 1.6 at 0.15, 1.7 at ≤ 0.1', () => {
    expect(upperLimitCoefficient(0.6)).toBe(1.4);
    expect(upperLimitCoefficient(0.4)).toBe(1.4);
    expect(upperLimitCoefficient(0.3)).toBeCloseTo(1.4, 12);
    expect(upperLimitCoefficient(0.2)).toBeCloseTo(1.5, 12);
    expect(upperLimitCoefficient(0.15)).toBeCloseTo(1.6, 12);
    expect(upperLimitCoefficient(0.1)).toBe(1.7);
    expect(upperLimitCoefficient(0.02)).toBe(1.7);
  });
  it('interpolates linearly between rows: 1.45 at 0.25, 1.65 at 0.125', () => {
    expect(upperLimitCoefficient(0.25)).toBeCloseTo(1.45, 12);
    expect(upperLimitCoefficient(0.125)).toBeCloseTo(1.65, 12);
  });
  it('does not accept a negative or NaN SD1', () => {
    expect(() => upperLimitCoefficient(-0.1)).toThrow(/sd1G .* got -0\.1/);
    expect(() => upperLimitCoefficient(NaN)).toThrow(/got NaN/);
  });
});
