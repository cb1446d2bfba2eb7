/**
 * Eigenvalues and eigenvectors of a real symmetric tridiagonal matrix by the implicit QL
 * algorithm with Wilkinson-type shifts: the EISPACK routine tql2 (Bowdler, Martin, Reinsch &
 * Wilkinson, Numer. Math. 11:293–306, 1968), in the form of the public-domain JAMA library
 * (NIST and MathWorks, 1998). Written here for flat typed arrays.
 */

/** Machine epsilon of IEEE 754 double precision, 2^-52. */
const EPS = 2 ** -52;

/**
 * √(a² + b²) without overflow or underflow: the plain formula when it is safely in range,
 * else the scaled form (as JAMA's hypot does).
 */
function hypot(a: number, b: number): number {
  const r = Math.sqrt(a * a + b * b);
  if (r > 1e-150 && r < 1e150) return r;
  const x = Math.abs(a);
  const y = Math.abs(b);
  const m = x > y ? x : y;
  if (m === 0) return 0;
  const u = x / m;
  const v = y / m;
  return m * Math.sqrt(u * u + v * v);
}

/** Smallest normal double, 2^-1022: squares below it are round-off (LAPACK's SAFMIN). */
const SAFMIN = 2 ** -1022;

/**
 * True when the sub-diagonal entry e[m] is negligible beside its diagonal neighbours:
 * e² ≤ eps²·|d[m]|·|d[m+1]| + safmin, the splitting test of LAPACK dsteqr (Anderson et al.,
 * LAPACK Users' Guide, 3rd ed., SIAM 1999), which keeps small eigenvalues of graded matrices
 * accurate and treats subnormal entries as zero.
 */
function negligible(d: Float64Array, e: Float64Array, m: number, shift: number): boolean {
  // Entries of the active block are held shifted by the accumulated shift: compare with the
  // unshifted diagonal.
  const em = e[m]!;
  return em * em <= EPS * EPS * Math.abs(d[m]! + shift) * Math.abs(d[m + 1]! + shift) + SAFMIN;
}

/** Iteration cap per eigenvalue; QL converges in 2–3 iterations typically (Wilkinson 1968). */
const MAX_ITERATIONS = 60;

/**
 * Diagonalises the symmetric tridiagonal matrix with diagonal `d` (length n) and
 * sub-diagonal `e` (e[i] = A[i+1][i], length ≥ n−1; e[n−1] is ignored). Both arrays are
 * overwritten: `d` receives the eigenvalues in ascending order, and `v` (length n², any
 * initial content) receives the orthonormal eigenvectors, each stored contiguously:
 * v[j·n + i] is component i of the eigenvector of d[j].
 *
 * @throws RangeError for non-finite entries, or when the iteration does not converge.
 */
export function symmetricTridiagonalEigen(d: Float64Array, e: Float64Array, v: Float64Array): void {
  const n = d.length;
  v.fill(0);
  for (let i = 0; i < n; i++) v[i * n + i] = 1;
  if (n === 1) return;
  e[n - 1] = 0;

  // Work on the matrix scaled to a largest entry of 1, so no product below can overflow or
  // sink into subnormals; the eigenvalues are scaled back at the end.
  let norm = 0;
  for (let i = 0; i < n; i++) norm = Math.max(norm, Math.abs(d[i]!), Math.abs(e[i]!));
  if (!Number.isFinite(norm)) {
    throw new RangeError(`tridiagonal matrix entries must be finite, got largest |entry| ${norm}`);
  }
  if (norm === 0) return; // the zero matrix: eigenvalues 0, eigenvectors the unit vectors
  for (let i = 0; i < n; i++) {
    d[i] = d[i]! / norm;
    e[i] = e[i]! / norm;
  }

  let f = 0;
  for (let l = 0; l < n; l++) {
    // Find a negligible sub-diagonal element.
    let m = l;
    while (m < n - 1 && !negligible(d, e, m, f)) m++;

    if (m > l) {
      let iter = 0;
      do {
        if (++iter > MAX_ITERATIONS) {
          throw new RangeError(`tridiagonal eigen solver did not converge at index ${l}`);
        }
        // Implicit shift from the leading 2×2 block.
        let g = d[l]!;
        let p = (d[l + 1]! - g) / (2 * e[l]!);
        let r = hypot(p, 1);
        if (p < 0) r = -r;
        d[l] = e[l]! / (p + r);
        d[l + 1] = e[l]! * (p + r);
        const dl1 = d[l + 1]!;
        let h = g - d[l]!;
        for (let i = l + 2; i < n; i++) d[i] = d[i]! - h;
        f += h;

        // Implicit QL sweep from m up to l.
        p = d[m]!;
        let c = 1;
        let c2 = 1;
        let c3 = 1;
        const el1 = e[l + 1]!;
        let s = 0;
        let s2 = 0;
        for (let i = m - 1; i >= l; i--) {
          c3 = c2;
          c2 = c;
          s2 = s;
          const ei = e[i]!;
          g = c * ei;
          h = c * p;
          r = hypot(p, ei);
          e[i + 1] = s * r;
          s = ei / r;
          c = p / r;
          p = c * d[i]! - s * g;
          d[i + 1] = h + s * (c * g + s * d[i]!);
          // Accumulate the rotation into eigenvectors i and i+1 (contiguous rows of v).
          const a = i * n;
          const b = a + n;
          for (let k = 0; k < n; k++) {
            const hk = v[b + k]!;
            const vk = v[a + k]!;
            v[b + k] = s * vk + c * hk;
            v[a + k] = c * vk - s * hk;
          }
        }
        p = (-s * s2 * c3 * el1 * e[l]!) / dl1;
        e[l] = s * p;
        d[l] = c * p;
      } while (!negligible(d, e, l, f));
    }
    d[l] = d[l]! + f;
    e[l] = 0;
  }

  for (let i = 0; i < n; i++) d[i] = d[i]! * norm;

  // Selection sort into ascending order, swapping eigenvector columns alongside.
  for (let i = 0; i < n - 1; i++) {
    let k = i;
    let p = d[i]!;
    for (let j = i + 1; j < n; j++) {
      if (d[j]! < p) {
        k = j;
        p = d[j]!;
      }
    }
    if (k !== i) {
      d[k] = d[i]!;
      d[i] = p;
      const a = i * n;
      const b = k * n;
      for (let j = 0; j < n; j++) {
        const t = v[a + j]!;
        v[a + j] = v[b + j]!;
        v[b + j] = t;
      }
    }
  }
}
