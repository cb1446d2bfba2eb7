// The tridiagonal QL eigen solver on its own: A·v = λ·v, orthonormal vectors, ascending order.
// Reference: the definition of the symmetric eigenproblem, checked by residuals; and the
// closed-form eigenvalues of the tridiagonal Toeplitz matrix (a, b): a + 2b·cos(jπ/(n+1)).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { symmetricTridiagonalEigen } from '../../calc/index.js';

function solve(diag: number[], sub: number[]) {
  const n = diag.length;
  const d = Float64Array.from(diag);
  const e = new Float64Array(n);
  sub.forEach((x, i) => (e[i] = x));
  const v = new Float64Array(n * n);
  symmetricTridiagonalEigen(d, e, v);
  return { d, v };
}

describe('symmetricTridiagonalEigen', () => {
  it('returns the single value of a 1×1 matrix with the unit vector', () => {
    const { d, v } = solve([3.5], []);
    expect([...d]).toEqual([3.5]);
    expect([...v]).toEqual([1]);
  });
  it('matches the closed form a + 2b·cos(jπ/(n+1)) of a Toeplitz tridiagonal matrix', () => {
    const n = 9;
    const { d } = solve(Array<number>(n).fill(2), Array<number>(n - 1).fill(-1));
    const exact = Array.from(
      { length: n },
      (_, j) => 2 - 2 * Math.cos(((j + 1) * Math.PI) / (n + 1)),
    );
    exact.forEach((x, j) => expect(Math.abs(d[j]! - x)).toBeLessThan(1e-14));
  });
  it('gives ascending eigenvalues, residuals ‖Av − λv‖ ≈ 0 and orthonormal vectors (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 2, max: 12 }).chain((n) =>
          fc.tuple(
            fc.array(fc.double({ min: -10, max: 10, noNaN: true }), {
              minLength: n,
              maxLength: n,
            }),
            fc.array(fc.double({ min: -10, max: 10, noNaN: true }), {
              minLength: n - 1,
              maxLength: n - 1,
            }),
          ),
        ),
        ([diag, sub]) => {
          const n = diag.length;
          const { d, v } = solve(diag, sub);
          for (let j = 1; j < n; j++) expect(d[j]!).toBeGreaterThanOrEqual(d[j - 1]!);
          for (let j = 0; j < n; j++) {
            for (let i = 0; i < n; i++) {
              let av = diag[i]! * v[j * n + i]!;
              if (i > 0) av += sub[i - 1]! * v[j * n + i - 1]!;
              if (i < n - 1) av += sub[i]! * v[j * n + i + 1]!;
              expect(Math.abs(av - d[j]! * v[j * n + i]!)).toBeLessThan(1e-12 * 30);
            }
            for (let k = 0; k < n; k++) {
              let dot = 0;
              for (let i = 0; i < n; i++) dot += v[j * n + i]! * v[k * n + i]!;
              expect(Math.abs(dot - (j === k ? 1 : 0))).toBeLessThan(1e-12);
            }
          }
        },
      ),
      { numRuns: 300 },
    );
  });
});
