// Lognormal fragility curves and the normal CDF under them, against jstat's normal.cdf (a
// general-purpose statistics library from the registry) and the Hazus check values of the
// method notes (§7, derived there from the published medians and β).
import fc from 'fast-check';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import {
  HAZUS_WOOD,
  damageProbabilities,
  erfc,
  lognormalFragility,
  standardNormalCdf,
} from '../../calc/index.js';

/** The part of jstat 1.9 used here (its docs: jStat.normal.cdf, jStat.lognormal.cdf); untyped package. */
const jStat = createRequire(import.meta.url)('jstat') as {
  normal: { cdf(x: number, mean: number, sd: number): number };
  lognormal: { cdf(x: number, mu: number, sigma: number): number };
};

const IN = 0.0254; // 1 in = 0.0254 m exactly (NIST SP 811)

describe('standard normal CDF', () => {
  it('agrees with jstat normal.cdf to 1e-14 from z = −8 to 8', () => {
    for (let z = -8; z <= 8; z += 0.01) {
      expect(Math.abs(standardNormalCdf(z) - jStat.normal.cdf(z, 0, 1))).toBeLessThan(1e-14);
    }
  });

  it('gives the printed table values Φ(1.96) = 0.9750021 and Φ(−1) = 0.1586553 (Abramowitz & Stegun Table 26.1)', () => {
    expect(standardNormalCdf(1.96)).toBeCloseTo(0.9750021048517795, 12);
    expect(standardNormalCdf(-1)).toBeCloseTo(0.15865525393145707, 12);
    expect(standardNormalCdf(0)).toBe(0.5);
  });

  it('keeps its relative precision deep in the lower tail, where 1 − Φ(−z) would round to 0 (reference values from mpmath at 30 digits)', () => {
    // mpmath (arbitrary-precision library): erfc(5) = 1.53745979442803485e-12,
    // ncdf(−10) = 7.61985302416052607e-24.
    expect(erfc(5) / 1.537459794428035e-12).toBeCloseTo(1, 12);
    expect(standardNormalCdf(-10) / 7.619853024160525e-24).toBeCloseTo(1, 12);
  });

  it('throws on NaN and is 0 and 1 at the infinities', () => {
    expect(() => standardNormalCdf(NaN)).toThrow(RangeError);
    expect(standardNormalCdf(-Infinity)).toBe(0);
    expect(standardNormalCdf(Infinity)).toBe(1);
  });
});

describe('lognormalFragility', () => {
  it('equals jstat normal.cdf(ln(x/median)/β) for any demand, median and β (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-6, max: 10, noNaN: true }),
        fc.double({ min: 1e-4, max: 1, noNaN: true }),
        fc.double({ min: 0.1, max: 1.5, noNaN: true }),
        (x, median, beta) => {
          const ours = lognormalFragility(x, median, beta);
          const ref = jStat.normal.cdf(Math.log(x / median) / beta, 0, 1);
          expect(Math.abs(ours - ref)).toBeLessThan(1e-13);
        },
      ),
    );
  });

  it('also equals jstat lognormal.cdf(x, ln median, β)', () => {
    for (const [x, m, b] of [
      [0.01, 0.012, 0.81],
      [0.05, 0.04, 0.85],
      [0.2, 0.1, 0.97],
    ] as const) {
      expect(lognormalFragility(x, m, b)).toBeCloseTo(jStat.lognormal.cdf(x, Math.log(m), b), 12);
    }
  });

  it('is one half at the median, 0 at zero demand, and rises with the demand', () => {
    expect(lognormalFragility(0.012, 0.012, 0.8)).toBe(0.5);
    expect(lognormalFragility(0, 0.012, 0.8)).toBe(0);
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (a, b) => {
          const [lo, hi] = a <= b ? [a, b] : [b, a];
          expect(lognormalFragility(lo, 0.04, 0.9)).toBeLessThanOrEqual(
            lognormalFragility(hi, 0.04, 0.9),
          );
        },
      ),
    );
  });

  it('does not crash on bad arguments: it throws a RangeError naming them', () => {
    expect(() => lognormalFragility(-1, 0.01, 0.8)).toThrow(/x must be/);
    expect(() => lognormalFragility(NaN, 0.01, 0.8)).toThrow(/x must be/);
    expect(() => lognormalFragility(Infinity, 0.01, 0.8)).toThrow(/x must be/);
    expect(() => lognormalFragility(0.01, 0, 0.8)).toThrow(/median must be/);
    expect(() => lognormalFragility(0.01, 0.01, 0)).toThrow(/beta must be/);
    expect(() => lognormalFragility(0.01, 0.01, NaN)).toThrow(/beta must be/);
  });
});

describe('Hazus wood damage-state probabilities', () => {
  it('gives P(≥Slight) 0.8069, P(≥Moderate) 0.3055, P(≥Extensive) 0.0285, P(≥Complete) 0.0045 for W1 high code at Sd = 1.0 in (method notes §7 check, Hazus medians and β)', () => {
    const p = HAZUS_WOOD.W1.high;
    const r = damageProbabilities(1.0 * IN, p.spectralDisplacementMediansM, p.betas);
    expect(r.exceedance.slight).toBeCloseTo(0.8069, 4);
    expect(r.exceedance.moderate).toBeCloseTo(0.3055, 4);
    expect(r.exceedance.extensive).toBeCloseTo(0.0285, 4);
    expect(r.exceedance.complete).toBeCloseTo(0.0045, 4);
    // the same from jstat with the medians and β typed from the Hazus table (0.50 in, β 0.80 …)
    expect(r.exceedance.slight).toBeCloseTo(jStat.normal.cdf(Math.log(1.0 / 0.5) / 0.8, 0, 1), 12);
    expect(r.exceedance.moderate).toBeCloseTo(
      jStat.normal.cdf(Math.log(1.0 / 1.51) / 0.81, 0, 1),
      12,
    );
    expect(r.medianState).toBe('slight');
    expect(r.mostLikelyState).toBe('slight');
  });

  it('gives discrete probabilities that sum to 1 and are never negative, for every type and level (fast-check)', () => {
    const rows = Object.values(HAZUS_WOOD).flatMap((t) => Object.values(t));
    fc.assert(
      fc.property(
        fc.constantFrom(...rows),
        fc.double({ min: 0, max: 2, noNaN: true }),
        (row, sd) => {
          const r = damageProbabilities(sd, row.spectralDisplacementMediansM, row.betas);
          const d = Object.values(r.discrete);
          for (const v of d) expect(v).toBeGreaterThanOrEqual(0);
          expect(d.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
        },
      ),
    );
  });

  it('never lowers the median state when the demand grows (fast-check)', () => {
    const ranks = ['none', 'slight', 'moderate', 'extensive', 'complete'];
    const p = HAZUS_WOOD.W2.moderate;
    fc.assert(
      fc.property(
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        (a, b) => {
          const [lo, hi] = a <= b ? [a, b] : [b, a];
          const s1 = damageProbabilities(lo, p.driftThresholds, p.betas).medianState;
          const s2 = damageProbabilities(hi, p.driftThresholds, p.betas).medianState;
          expect(ranks.indexOf(s2)).toBeGreaterThanOrEqual(ranks.indexOf(s1));
        },
      ),
    );
  });
});
