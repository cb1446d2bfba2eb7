// Unit conversion at the edges of the forms. Reference: NIST Special Publication 811 (2008),
// "Guide for the Use of the International System of Units", Appendix B.8 (factors for units
// listed alphabetically) and B.9 (by kind of quantity). Each check names the entry it uses.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  FOOT_M,
  INCH_M,
  POUND_FORCE_N,
  QUANTITIES,
  UNITS,
  fromSI,
  toSI,
  unitFromSI,
  unitToSI,
  type Quantity,
} from '../../forms/units/index.js';

describe('unit factors agree with NIST SP 811 Appendix B', () => {
  it('uses the exact foot and inch (NIST SP 811 B.8: foot = 3.048 E-01 m, inch = 2.54 E-02 m)', () => {
    expect(FOOT_M).toBe(0.3048);
    expect(INCH_M).toBe(0.0254);
    expect(unitToSI(12, 'in')).toBeCloseTo(unitToSI(1, 'ft'), 15);
  });
  it('uses the pound-force of NIST SP 811 B.8 (4.448 222 E+00 N)', () => {
    expect(POUND_FORCE_N).toBeCloseTo(4.448222, 6);
    expect(unitToSI(1, 'kip')).toBeCloseTo(4.448222e3, 3); // B.8: kip = 4.448 222 E+03 N
  });
  it('converts square feet, psf and plf like NIST SP 811 B.8', () => {
    expect(unitToSI(1, 'ft2')).toBeCloseTo(9.290304e-2, 10); // B.8: square foot
    expect(unitToSI(1, 'psf')).toBeCloseTo(4.788026e1, 5); // B.8: pound-force per square foot
    expect(unitToSI(1, 'plf')).toBeCloseTo(1.45939e1, 5); // B.8: pound-force per foot
    expect(unitToSI(1, 'kip/in')).toBeCloseTo(1.751268e5, 0); // B.8: pound-force per inch ×1000
  });
  it('converts degrees to radians (NIST SP 811 B.8: degree = 1.745 329 E-02 rad)', () => {
    expect(unitToSI(1, 'deg')).toBeCloseTo(1.745329e-2, 8);
  });
  it('shows lengths in metres or feet and small lengths in millimetres or inches', () => {
    expect(QUANTITIES.length.shown).toEqual({ si: 'm', us: 'ft' });
    expect(QUANTITIES.smallLength.shown).toEqual({ si: 'mm', us: 'in' });
    expect(toSI(10, 'length', 'us')).toBeCloseTo(3.048, 12);
    expect(fromSI(0.0254, 'smallLength', 'us')).toBeCloseTo(1, 12);
    expect(fromSI(0.0254, 'smallLength', 'si')).toBeCloseTo(25.4, 12);
    expect(toSI(2.5, 'percent', 'si')).toBeCloseTo(0.025, 15);
  });
  it('matches a worked example: a 9 ft storey is 2.7432 m; 4 psf is 191.52 Pa', () => {
    // 9 × 0.3048 = 2.7432 exactly; 4 × 47.880 26 = 191.521 (NIST SP 811 B.8).
    expect(toSI(9, 'length', 'us')).toBeCloseTo(2.7432, 12);
    expect(toSI(4, 'pressure', 'us')).toBeCloseTo(191.521, 2);
    expect(fromSI(1000, 'pressure', 'si')).toBe(1);
  });
});

describe('conversions round-trip (fast-check properties)', () => {
  const quantities = Object.keys(QUANTITIES) as Quantity[];
  it('fromSI(toSI(x)) returns x for every quantity and both systems', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...quantities),
        fc.constantFrom('si' as const, 'us' as const),
        fc.double({ min: -1e9, max: 1e9, noNaN: true }),
        (q, sys, x) => {
          const back = fromSI(toSI(x, q, sys), q, sys);
          expect(Math.abs(back - x)).toBeLessThanOrEqual(Math.abs(x) * 1e-12 + 1e-300);
        },
      ),
    );
  });
  it('every accepted unit converts with a positive finite factor', () => {
    for (const [id, def] of Object.entries(UNITS)) {
      expect(def.toSI, id).toBeGreaterThan(0);
      expect(Number.isFinite(def.toSI), id).toBe(true);
    }
  });
});

describe('conversions refuse bad input and name it', () => {
  it('does not accept NaN or Infinity', () => {
    expect(() => toSI(NaN, 'length', 'si')).toThrow(/value must be a finite number, got NaN/);
    expect(() => fromSI(Infinity, 'length', 'us')).toThrow(/got Infinity/);
  });
  it('does not accept an unknown unit id', () => {
    expect(() => unitToSI(1, 'furlong' as 'm')).toThrow(
      /unit must be a known unit id, got furlong/,
    );
    expect(() => unitFromSI(1, 'furlong' as 'm')).toThrow(/got furlong/);
  });
});
