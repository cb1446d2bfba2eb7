// Random shear buildings against ml-matrix's EigenvalueDecomposition (a general-purpose
// eigen solver from the npm registry), applied to the full symmetric form M^-½ K M^-½ built
// here independently of calc/.
import fc from 'fast-check';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { shearBuildingModes } from '../../calc/index.js';

function reference(masses: number[], ks: number[]) {
  const n = masses.length;
  const K = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++) {
    K.set(i, i, ks[i]! + (i + 1 < n ? ks[i + 1]! : 0));
    if (i + 1 < n) {
      K.set(i, i + 1, -ks[i + 1]!);
      K.set(i + 1, i, -ks[i + 1]!);
    }
  }
  const A = Matrix.zeros(n, n);
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) A.set(i, j, K.get(i, j) / Math.sqrt(masses[i]! * masses[j]!));
  const e = new EigenvalueDecomposition(A, { assumeSymmetric: true });
  const order = e.realEigenvalues.map((v, i) => [v, i] as const).sort((a, b) => a[0] - b[0]);
  const V = e.eigenvectorMatrix;
  return order.map(([lambda, col]) => {
    const phi = masses.map((m, i) => V.get(i, col) / Math.sqrt(m));
    const roof = phi[n - 1]!;
    return { period: (2 * Math.PI) / Math.sqrt(lambda), shape: phi.map((p) => p / roof) };
  });
}

const building = fc
  .integer({ min: 1, max: 12 })
  .chain((n) =>
    fc.tuple(
      fc.array(fc.double({ min: 2e3, max: 2e5, noNaN: true }), { minLength: n, maxLength: n }),
      fc.array(fc.double({ min: 1e6, max: 1e8, noNaN: true }), { minLength: n, maxLength: n }),
    ),
  );

describe('shear-building modes against ml-matrix EigenvalueDecomposition', () => {
  it('agrees on every period of random 1–12 storey buildings to 1e-9 relative', () => {
    fc.assert(
      fc.property(building, ([m, k]) => {
        const ours = shearBuildingModes(m, k);
        const ref = reference(m, k);
        ref.forEach((r, j) => expect(Math.abs(ours.periods[j]! / r.period - 1)).toBeLessThan(1e-9));
      }),
      { numRuns: 300, seed: 20240613 },
    );
  });
  it('agrees on the roof-normalised shapes (first three modes) to 1e-7', () => {
    fc.assert(
      fc.property(building, ([m, k]) => {
        const ours = shearBuildingModes(m, k);
        const ref = reference(m, k);
        for (let j = 0; j < Math.min(3, m.length); j++) {
          const scale = Math.max(...ref[j]!.shape.map(Math.abs));
          ref[j]!.shape.forEach((p, i) =>
            expect(Math.abs(ours.shapes[j]![i]! - p)).toBeLessThan(1e-7 * scale),
          );
        }
      }),
      { numRuns: 300, seed: 7 },
    );
  });
  it('has effective mass ratios that sum to 1 and are each in [0, 1]', () => {
    fc.assert(
      fc.property(building, ([m, k]) => {
        const r = shearBuildingModes(m, k);
        const sum = r.effectiveMassRatios.reduce((a, b) => a + b, 0);
        expect(Math.abs(sum - 1)).toBeLessThan(1e-10);
        for (const x of r.effectiveMassRatios) expect(x >= -1e-15 && x <= 1 + 1e-12).toBe(true);
      }),
      { numRuns: 300, seed: 11 },
    );
  });
});
