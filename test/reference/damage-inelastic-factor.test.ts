// The displacement modification factor C1 of ASCE 41-17 eq. (7-29) (FEMA 440 eq. 5-1; from
// memory, verify), against values worked by hand from the formula.
import { describe, expect, it } from 'vitest';
import { C1_SITE_CONSTANT, inelasticDisplacementFactor } from '../../calc/index.js';

describe('C1', () => {
  it('is 1 + (μ − 1)/(a·Te²): μ = 3, Te = 0.5 s, a = 90 gives 1.0889 (hand value: 1 + 2/22.5)', () => {
    expect(inelasticDisplacementFactor(3, 0.5, C1_SITE_CONSTANT.C)).toBeCloseTo(1 + 2 / 22.5, 12);
  });

  it('holds the 0.2 s value below 0.2 s: μ = 4, a = 60 gives 2.25 at 0.1 s and at 0.2 s (hand value: 1 + 3/2.4)', () => {
    expect(inelasticDisplacementFactor(4, 0.1, 60)).toBeCloseTo(2.25, 12);
    expect(inelasticDisplacementFactor(4, 0.2, 60)).toBeCloseTo(2.25, 12);
  });

  it('is 1 when the walls stay within their strength or the period is 1 s or more', () => {
    expect(inelasticDisplacementFactor(0.8, 0.3, 60)).toBe(1);
    expect(inelasticDisplacementFactor(1, 0.3, 60)).toBe(1);
    expect(inelasticDisplacementFactor(5, 1.0, 60)).toBe(1);
  });

  it('uses a = 130, 90, 60 for site classes A/B, C and D–F', () => {
    expect(C1_SITE_CONSTANT).toEqual({ AB: 130, C: 90, DEF: 60 });
  });

  it('does not crash on bad arguments: it throws a RangeError naming them', () => {
    expect(() => inelasticDisplacementFactor(NaN, 0.3, 60)).toThrow(/mu/);
    expect(() => inelasticDisplacementFactor(2, 0, 60)).toThrow(/periodS/);
    expect(() => inelasticDisplacementFactor(2, 0.3, -1)).toThrow(/siteConstant/);
  });
});
