/**
 * Soft- and weak-storey flags of ASCE 7-16 Table 12.3-2 for one storey in one direction.
 * A flag is null when it cannot be judged: a value is unknown, or there is no storey above.
 */
export interface StoreyIrregularity {
  storey: number;
  /** Stiffness over the stiffness of the storey above. */
  stiffnessRatioToAbove: number | null;
  /** Stiffness over the average stiffness of the three storeys above (null with < 3 above). */
  stiffnessRatioToThreeAbove: number | null;
  /** Strength over the strength of the storey above. */
  strengthRatioToAbove: number | null;
  /** 1a soft storey: < 70 % of the storey above or < 80 % of the average of the three above. */
  soft1a: boolean | null;
  /** 1b extreme soft storey: < 60 % of the storey above or < 70 % of the three above. */
  extremeSoft1b: boolean | null;
  /** 5a weak storey: strength < 80 % of the storey above. */
  weak5a: boolean | null;
  /** 5b extreme weak storey: strength < 65 % of the storey above. */
  extremeWeak5b: boolean | null;
}

// Limits of ASCE 7-16 Table 12.3-2, types 1a, 1b, 5a, 5b.
const SOFT_ABOVE = 0.7;
const SOFT_THREE = 0.8;
const EXTREME_SOFT_ABOVE = 0.6;
const EXTREME_SOFT_THREE = 0.7;
const WEAK = 0.8;
const EXTREME_WEAK = 0.65;

function ratio(a: number | null, b: number | null): number | null {
  if (a === null || b === null || !(b > 0)) return null;
  const r = a / b;
  return Number.isFinite(r) ? r : null; // only a vanishing b overflows
}

/**
 * Vertical stiffness and strength irregularities by ASCE 7-16 Table 12.3-2 (types 1a, 1b,
 * 5a, 5b), storey by storey from the ground up. When the three-storey average is not
 * available (fewer than three storeys above) only the storey-above test is made.
 */
export function storeyIrregularities(
  stiffness: readonly (number | null)[],
  strength: readonly (number | null)[],
): StoreyIrregularity[] {
  const n = stiffness.length;
  const out: StoreyIrregularity[] = new Array<StoreyIrregularity>(n);
  for (let i = 0; i < n; i++) {
    const k = stiffness[i] ?? null;
    const kAbove = i + 1 < n ? (stiffness[i + 1] ?? null) : null;
    const rAbove = ratio(k, kAbove);
    let rThree: number | null = null;
    if (i + 3 < n) {
      const a = stiffness[i + 1] ?? null;
      const b = stiffness[i + 2] ?? null;
      const c = stiffness[i + 3] ?? null;
      if (a !== null && b !== null && c !== null) rThree = ratio(k, (a + b + c) / 3);
    }
    // A storey with no stiffness under a stiff one has ratio 0: flagged. Unknown stays null.
    const soft1a =
      rAbove === null ? null : rAbove < SOFT_ABOVE || (rThree !== null && rThree < SOFT_THREE);
    const extremeSoft1b =
      rAbove === null
        ? null
        : rAbove < EXTREME_SOFT_ABOVE || (rThree !== null && rThree < EXTREME_SOFT_THREE);
    const rStrength = ratio(strength[i] ?? null, i + 1 < n ? (strength[i + 1] ?? null) : null);
    out[i] = {
      storey: i,
      stiffnessRatioToAbove: rAbove,
      stiffnessRatioToThreeAbove: rThree,
      strengthRatioToAbove: rStrength,
      soft1a,
      extremeSoft1b,
      weak5a: rStrength === null ? null : rStrength < WEAK,
      extremeWeak5b: rStrength === null ? null : rStrength < EXTREME_WEAK,
    };
  }
  return out;
}
