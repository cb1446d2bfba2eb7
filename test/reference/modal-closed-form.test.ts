// Modes of shear buildings against closed forms.
// References: uniform n-storey shear building, ωj = 2√(k/m)·sin((2j−1)π/(2(2n+1))) and
// φj,i = sin((2j−1)iπ/(2n+1)) (classical result for the fixed–free spring–mass chain, e.g.
// Chopra, Dynamics of Structures; method notes §4); two-storey textbook case m1 = 2m, m2 = m,
// k1 = 2k, k2 = k with ω² = k/(2m), 2k/m and φ1 = [½, 1], φ2 = [−1, 1] (exact algebra).
import { describe, expect, it } from 'vitest';
import { shearBuildingModes } from '../../calc/index.js';

const rel = (a: number, b: number) => Math.abs(a / b - 1);

describe('uniform n-storey shear building against the closed form', () => {
  const m = 12_000; // kg
  const k = 8.5e6; // N/m
  for (const n of [1, 2, 3, 5, 10]) {
    it(`matches every ωj for n = ${n} to a relative error below 1e-9`, () => {
      const r = shearBuildingModes(Array<number>(n).fill(m), Array<number>(n).fill(k));
      expect(r.periods).toHaveLength(n);
      for (let j = 1; j <= n; j++) {
        const omega = 2 * Math.sqrt(k / m) * Math.sin(((2 * j - 1) * Math.PI) / (2 * (2 * n + 1)));
        expect(rel(r.circularFrequencies[j - 1]!, omega)).toBeLessThan(1e-9);
        expect(rel(r.periods[j - 1]!, (2 * Math.PI) / omega)).toBeLessThan(1e-9);
        expect(rel(r.frequencies[j - 1]!, omega / (2 * Math.PI))).toBeLessThan(1e-9);
      }
    });
    it(`matches every roof-normalised shape for n = ${n} (φj,i = sin((2j−1)iπ/(2n+1)))`, () => {
      const r = shearBuildingModes(Array<number>(n).fill(m), Array<number>(n).fill(k));
      for (let j = 1; j <= n; j++) {
        const roof = Math.sin(((2 * j - 1) * n * Math.PI) / (2 * n + 1));
        for (let i = 1; i <= n; i++) {
          const phi = Math.sin(((2 * j - 1) * i * Math.PI) / (2 * n + 1)) / roof;
          expect(Math.abs(r.shapes[j - 1]![i - 1]! - phi)).toBeLessThan(
            1e-9 * Math.max(1, Math.abs(phi)),
          );
        }
        expect(r.shapes[j - 1]![n - 1]).toBe(1);
        expect(r.roofNormalised[j - 1]).toBe(true);
      }
    });
    it(`has effective mass ratios summing to 1 for n = ${n}`, () => {
      const r = shearBuildingModes(Array<number>(n).fill(m), Array<number>(n).fill(k));
      expect(r.effectiveMassRatios.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
    });
  }
  it('gives the tabulated √(k/m) multiples 0.61803, 1.61803 (n = 2); 0.44504, 1.24698, 1.80194 (n = 3); 0.14946 (n = 10)', () => {
    const w = (n: number) =>
      shearBuildingModes(Array<number>(n).fill(1), Array<number>(n).fill(1)).circularFrequencies;
    expect(w(2)[0]).toBeCloseTo(0.61803, 5);
    expect(w(2)[1]).toBeCloseTo(1.61803, 5);
    expect(w(3)[0]).toBeCloseTo(0.44504, 5);
    expect(w(3)[1]).toBeCloseTo(1.24698, 5);
    expect(w(3)[2]).toBeCloseTo(1.80194, 5);
    expect(w(10)[0]).toBeCloseTo(0.14946, 5);
  });
  it('sorts periods longest first', () => {
    const r = shearBuildingModes(Array<number>(6).fill(m), Array<number>(6).fill(k));
    for (let j = 1; j < 6; j++) expect(r.periods[j]!).toBeLessThan(r.periods[j - 1]!);
  });
});

describe('a mode with no roof motion to speak of', () => {
  it('is normalised to its largest component and says so (stiff base storey under soft ones)', () => {
    // Mode 6 lives in the stiff ground storey; its roof amplitude is ≈ (1000/381235)^5 ≈ 1e-13.
    const r = shearBuildingModes(
      Array<number>(6).fill(100),
      [381235, 1000, 1000, 1000, 1000, 1000],
    );
    expect(r.roofNormalised.slice(0, 5)).toEqual([true, true, true, true, true]);
    expect(r.roofNormalised[5]).toBe(false);
    expect(r.shapes[5]![0]).toBe(1);
    expect(r.effectiveMassRatios.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
  });
});

describe('two-storey textbook case m1 = 2m, m2 = m, k1 = 2k, k2 = k', () => {
  const m = 5_000;
  const k = 3e6;
  const r = shearBuildingModes([2 * m, m], [2 * k, k]);
  it('gives ω1² = k/(2m) and ω2² = 2k/m', () => {
    expect(rel(r.circularFrequencies[0]! ** 2, k / (2 * m))).toBeLessThan(1e-12);
    expect(rel(r.circularFrequencies[1]! ** 2, (2 * k) / m)).toBeLessThan(1e-12);
  });
  it('gives φ1 = [½, 1] and φ2 = [−1, 1]', () => {
    expect(r.shapes[0]![0]).toBeCloseTo(0.5, 12);
    expect(r.shapes[0]![1]).toBe(1);
    expect(r.shapes[1]![0]).toBeCloseTo(-1, 12);
    expect(r.shapes[1]![1]).toBe(1);
  });
  it('gives Γ1 = 4/3, Γ2 = −1/3 and effective mass ratios 8/9, 1/9 (hand algebra from φ and M)', () => {
    // Γ1 = (2m·½ + m)/(2m·¼ + m) = 2/1.5; Γ2 = (−2m + m)/(2m + m) = −1/3.
    expect(r.participationFactors[0]).toBeCloseTo(4 / 3, 12);
    expect(r.participationFactors[1]).toBeCloseTo(-1 / 3, 12);
    expect(r.effectiveMassRatios[0]).toBeCloseTo(8 / 9, 12);
    expect(r.effectiveMassRatios[1]).toBeCloseTo(1 / 9, 12);
  });
});
