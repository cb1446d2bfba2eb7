// EN 1998-1:2004 §3.2.2.2 elastic spectrum against hand values.
// Reference: EN 1998-1:2004 Tables 3.2 and 3.3 (recommended S, TB, TC, TD) and eqs. (3.2)–(3.6),
// retyped here from the standard rather than imported from calc/, so a wrong table row fails.
import { describe, expect, it } from 'vitest';
import { dampingCorrection, spectralAcceleration, spectralDisplacement } from '../../calc/index.js';
import type { Ec8Ground } from '../../calc/index.js';

type Row = [S: number, TB: number, TC: number, TD: number];
// EN 1998-1:2004 Table 3.2 (Type 1).
const TABLE_3_2: Record<Ec8Ground, Row> = {
  A: [1.0, 0.15, 0.4, 2.0],
  B: [1.2, 0.15, 0.5, 2.0],
  C: [1.15, 0.2, 0.6, 2.0],
  D: [1.35, 0.2, 0.8, 2.0],
  E: [1.4, 0.15, 0.5, 2.0],
};
// EN 1998-1:2004 Table 3.3 (Type 2).
const TABLE_3_3: Record<Ec8Ground, Row> = {
  A: [1.0, 0.05, 0.25, 1.2],
  B: [1.35, 0.05, 0.25, 1.2],
  C: [1.5, 0.1, 0.25, 1.2],
  D: [1.8, 0.1, 0.3, 1.2],
  E: [1.6, 0.05, 0.25, 1.2],
};
const GROUNDS: Ec8Ground[] = ['A', 'B', 'C', 'D', 'E'];

describe('EN 1998-1 elastic spectrum, every ground type and both types (Tables 3.2/3.3, eqs. 3.2–3.5)', () => {
  for (const type of [1, 2] as const) {
    for (const ground of GROUNDS) {
      const [S, TB, TC, TD] = (type === 1 ? TABLE_3_2 : TABLE_3_3)[ground];
      const ag = 0.3;
      const spec = { kind: 'ec8', type, ground, ag } as const;
      it(`type ${type} ground ${ground}: starts at ag·S at T = 0 (eq. 3.2)`, () => {
        expect(spectralAcceleration(spec, 0)).toBeCloseTo(ag * S, 12);
      });
      it(`type ${type} ground ${ground}: rises linearly to 1.75·ag·S at TB/2 (eq. 3.2, η = 1)`, () => {
        expect(spectralAcceleration(spec, TB / 2)).toBeCloseTo(1.75 * ag * S, 12);
      });
      it(`type ${type} ground ${ground}: returns the plateau 2.5·ag·S between TB and TC (eq. 3.3)`, () => {
        expect(spectralAcceleration(spec, TB)).toBeCloseTo(2.5 * ag * S, 12);
        expect(spectralAcceleration(spec, (TB + TC) / 2)).toBeCloseTo(2.5 * ag * S, 12);
        expect(spectralAcceleration(spec, TC)).toBeCloseTo(2.5 * ag * S, 12);
      });
      it(`type ${type} ground ${ground}: falls as TC/T between TC and TD (eq. 3.4)`, () => {
        const T = (TC + TD) / 2;
        expect(spectralAcceleration(spec, T)).toBeCloseTo((2.5 * ag * S * TC) / T, 12);
      });
      it(`type ${type} ground ${ground}: falls as TC·TD/T² between TD and 4 s (eq. 3.5)`, () => {
        const T = 3.0;
        expect(spectralAcceleration(spec, T)).toBeCloseTo((2.5 * ag * S * TC * TD) / (T * T), 12);
      });
    }
  }
});

describe('EN 1998-1 hand values, type 1, ground B, ag = 0.25 g, 5 % (method notes §1, derived from eqs. 3.2–3.5, 3.7)', () => {
  const spec = { kind: 'ec8', type: 1, ground: 'B', ag: 0.25 } as const;
  it('gives 0.300 g at T = 0 and 0.600 g at 0.10 s', () => {
    expect(spectralAcceleration(spec, 0)).toBeCloseTo(0.3, 10);
    expect(spectralAcceleration(spec, 0.1)).toBeCloseTo(0.6, 10);
  });
  it('gives the 0.750 g plateau from 0.15 to 0.50 s', () => {
    for (const T of [0.15, 0.2, 0.3, 0.4, 0.5])
      expect(spectralAcceleration(spec, T)).toBeCloseTo(0.75, 10);
  });
  it('gives 0.375 g at 1.0 s and 0.0833 g at 3.0 s', () => {
    expect(spectralAcceleration(spec, 1.0)).toBeCloseTo(0.375, 10);
    expect(spectralAcceleration(spec, 3.0)).toBeCloseTo(0.08333, 4);
  });
  it('gives SDe(1.0) = 0.09318 m and a constant 0.18637 m from 2 to 4 s (eq. 3.7, g = 9.81)', () => {
    expect(spectralDisplacement(spec, 1.0)).toBeCloseTo(0.09318, 5);
    for (const T of [2, 2.5, 3, 4]) expect(spectralDisplacement(spec, T)).toBeCloseTo(0.18637, 5);
  });
});

describe('EN 1998-1 damping correction η (eq. 3.6)', () => {
  it('is 1 at 5 % damping', () => {
    expect(dampingCorrection(0.05)).toBe(1);
  });
  it('is 0.8165 at 10 % (√(10/15), method notes §1)', () => {
    expect(dampingCorrection(0.1)).toBeCloseTo(0.8165, 4);
  });
  it('is 0.5505 at 28 %, just above the floor', () => {
    expect(dampingCorrection(0.28)).toBeCloseTo(0.5505, 4);
  });
  it('is held at the 0.55 floor at 30 % and above', () => {
    expect(dampingCorrection(0.3)).toBe(0.55);
    expect(dampingCorrection(0.6)).toBe(0.55);
  });
  it('scales the plateau and branches but not T = 0 at 10 % (eqs. 3.2–3.6)', () => {
    const spec = { kind: 'ec8', type: 1, ground: 'C', ag: 0.2, damping: 0.1 } as const;
    const eta = Math.sqrt(10 / 15);
    const S = 1.15;
    expect(spectralAcceleration(spec, 0)).toBeCloseTo(0.2 * S, 12);
    expect(spectralAcceleration(spec, 0.1)).toBeCloseTo(0.2 * S * (1 + 0.5 * (2.5 * eta - 1)), 12);
    expect(spectralAcceleration(spec, 0.4)).toBeCloseTo(2.5 * 0.2 * S * eta, 12);
    expect(spectralAcceleration(spec, 1.0)).toBeCloseTo((2.5 * 0.2 * S * eta * 0.6) / 1.0, 12);
  });
  it('uses the 0.55 floor on the plateau at 40 % damping', () => {
    const spec = { kind: 'ec8', type: 2, ground: 'A', ag: 0.1, damping: 0.4 } as const;
    expect(spectralAcceleration(spec, 0.1)).toBeCloseTo(2.5 * 0.1 * 0.55, 12);
  });
});

describe('EN 1998-1 national-annex values entered by the user', () => {
  it('uses the entered S, TB, TC, TD in place of the recommended ones', () => {
    // e.g. a national annex with TD = 2.5 s (method notes §1 mention such annexes).
    const spec = {
      kind: 'ec8',
      type: 1,
      ground: 'B',
      ag: 0.2,
      S: 1.3,
      TB: 0.1,
      TC: 0.6,
      TD: 2.5,
    } as const;
    expect(spectralAcceleration(spec, 0.3)).toBeCloseTo(2.5 * 0.2 * 1.3, 12);
    expect(spectralAcceleration(spec, 2.2)).toBeCloseTo((2.5 * 0.2 * 1.3 * 0.6) / 2.2, 12);
    expect(spectralAcceleration(spec, 3.0)).toBeCloseTo((2.5 * 0.2 * 1.3 * 0.6 * 2.5) / 9, 12);
  });
  it('does not accept corner periods out of order and names them', () => {
    const spec = { kind: 'ec8', type: 1, ground: 'B', ag: 0.2, TB: 0.7, TC: 0.6 } as const;
    expect(() => spectralAcceleration(spec, 1)).toThrow(/TB ≤ TC ≤ TD.*0\.7, 0\.6/);
  });
});
