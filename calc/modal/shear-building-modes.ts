import { symmetricTridiagonalEigen } from './tridiagonal-eigen.js';

/** Natural modes of a fixed-base shear building, longest period first. */
export interface ShearBuildingModes {
  /** Natural periods Tn = 2π/ωn, in s, longest first. */
  periods: number[];
  /** Natural (cyclic) frequencies fn = ωn/2π, in Hz, same order. */
  frequencies: number[];
  /** Circular frequencies ωn, in rad/s, same order. */
  circularFrequencies: number[];
  /**
   * shapes[n][i]: mode n at storey i (ground storey first), normalised to 1 at the roof
   * (see `roofNormalised` for the one exception).
   */
  shapes: number[][];
  /**
   * True for every mode normalised to 1 at the roof. False only for a mode whose roof
   * amplitude is numerically nil (below 1e-9 of its largest component, which takes storey
   * properties spanning many orders of magnitude): that shape is normalised to +1 at its
   * largest component instead. Γn·φn, effective masses and responses do not depend on it.
   */
  roofNormalised: boolean[];
  /** Γn = φnᵀM1 / φnᵀMφn for the roof-normalised shapes (dimensionless). */
  participationFactors: number[];
  /** Effective modal mass over total mass, Γn²·φnᵀMφn / Σm; they sum to 1. */
  effectiveMassRatios: number[];
}

function checkArray(name: string, a: readonly number[]): void {
  if (!Array.isArray(a)) throw new TypeError(`${name} must be an array, got ${String(a)}`);
  for (let i = 0; i < a.length; i++) {
    const x = a[i];
    if (typeof x !== 'number' || !Number.isFinite(x) || x <= 0) {
      throw new RangeError(`${name}[${i}] must be a finite number > 0, got ${String(x)}`);
    }
  }
}

/**
 * All natural modes of a fixed-base shear building (one lateral degree of freedom per
 * floor, rigid floors, massless storeys). Solves Kφ = ω²Mφ with K tridiagonal
 * (Kii = ki + ki+1, Ki,i+1 = −ki+1) and M diagonal through the symmetric standard form
 * A = M^-½ K M^-½, which is itself tridiagonal, by implicit QL (EISPACK tql2); then
 * φ = M^-½ v. Formulation: Chopra, Dynamics of Structures, ch. 10 and 13 (shear-building
 * stiffness matrix and modal participation, common textbook material).
 *
 * @param masses storey masses in kg, ground storey first (mass lumped at the floor above it).
 * @param stiffnesses storey lateral stiffnesses in N/m, ground storey first.
 * @throws RangeError naming the bad value for empty, mismatched, zero, negative or
 *   non-finite input, or when the spread of values is beyond double precision
 *   (ω²max/ω1² > 1e12, i.e. periods spread by more than 10⁶).
 */
export function shearBuildingModes(
  masses: readonly number[],
  stiffnesses: readonly number[],
): ShearBuildingModes {
  checkArray('masses', masses);
  checkArray('stiffnesses', stiffnesses);
  const n = masses.length;
  if (n === 0) throw new RangeError('masses must not be empty, got []');
  if (stiffnesses.length !== n) {
    throw new RangeError(
      `stiffnesses must have one value per storey: got ${stiffnesses.length} stiffnesses for ${n} masses`,
    );
  }

  // Symmetric form A = M^-½ K M^-½: diagonal (ki + ki+1)/mi, off-diagonal −ki+1/√(mi·mi+1).
  const d = new Float64Array(n);
  const e = new Float64Array(n);
  const invSqrtM = new Float64Array(n);
  for (let i = 0; i < n; i++) invSqrtM[i] = 1 / Math.sqrt(masses[i]!);
  let scale = 0;
  for (let i = 0; i < n; i++) {
    const above = i + 1 < n ? stiffnesses[i + 1]! : 0;
    d[i] = (stiffnesses[i]! + above) * invSqrtM[i]! * invSqrtM[i]!;
    if (i + 1 < n) e[i] = -above * invSqrtM[i]! * invSqrtM[i + 1]!;
    scale = Math.max(scale, d[i]!);
  }
  if (!Number.isFinite(scale) || scale <= 0) {
    throw new RangeError(
      `stiffness-to-mass ratios are beyond double precision (max k/m = ${scale})`,
    );
  }
  // Scale to O(1) so no square in the QL sweep can overflow or underflow.
  for (let i = 0; i < n; i++) {
    d[i] = d[i]! / scale;
    e[i] = e[i]! / scale;
  }
  const v = new Float64Array(n * n);
  symmetricTridiagonalEigen(d, e, v);
  // QL gives each ω² to about eps·ω²max, so ω1² is trustworthy only while ω²max/ω1² stays far
  // below 1/eps. Beyond 1e12 (periods spread by 1e6, far outside any building) refuse.
  if (!(d[0]! > 1e-12 * d[n - 1]!)) {
    throw new RangeError(
      `masses and stiffnesses span too wide a range for double precision: ω²max/ω1² = ${d[n - 1]! / d[0]!} exceeds 1e12`,
    );
  }

  let totalMass = 0;
  for (let i = 0; i < n; i++) totalMass += masses[i]!;

  const periods: number[] = new Array<number>(n);
  const frequencies: number[] = new Array<number>(n);
  const circularFrequencies: number[] = new Array<number>(n);
  const shapes: number[][] = new Array<number[]>(n);
  const participationFactors: number[] = new Array<number>(n);
  const effectiveMassRatios: number[] = new Array<number>(n);
  const roofNormalised: boolean[] = new Array<boolean>(n);
  for (let j = 0; j < n; j++) {
    // Ascending ω² is descending period: mode j is column j.
    const omega = Math.sqrt(d[j]! * scale);
    let roof = v[j * n + n - 1]! * invSqrtM[n - 1]!;
    let peak = 0;
    for (let i = 0; i < n; i++) {
      const x = v[j * n + i]! * invSqrtM[i]!;
      if (Math.abs(x) > Math.abs(peak)) peak = x;
    }
    // Below 1e-9 of the peak the roof value is round-off: normalise to the peak instead.
    const atRoof = Math.abs(roof) >= 1e-9 * Math.abs(peak);
    if (!atRoof) roof = peak;
    roofNormalised[j] = atRoof;
    const shape: number[] = new Array<number>(n);
    let mPhi = 0;
    let mPhi2 = 0;
    let finite = true;
    for (let i = 0; i < n; i++) {
      const phi = (v[j * n + i]! * invSqrtM[i]!) / roof;
      shape[i] = phi;
      if (!Number.isFinite(phi)) finite = false;
      const mp = masses[i]! * phi;
      mPhi += mp;
      mPhi2 += mp * phi;
    }
    const gamma = mPhi / mPhi2;
    const period = (2 * Math.PI) / omega;
    // ω² ≤ 0 or overflow only arise from values at the edge of double range.
    if (!finite || !(period > 0) || !Number.isFinite(period) || !Number.isFinite(gamma)) {
      throw new RangeError(
        `masses and stiffnesses span too wide a range for double precision (mode ${j + 1} is not finite)`,
      );
    }
    circularFrequencies[j] = omega;
    frequencies[j] = omega / (2 * Math.PI);
    periods[j] = period;
    shapes[j] = shape;
    participationFactors[j] = gamma;
    effectiveMassRatios[j] = (gamma * mPhi) / totalMass;
  }
  return {
    periods,
    frequencies,
    circularFrequencies,
    shapes,
    roofNormalised,
    participationFactors,
    effectiveMassRatios,
  };
}
