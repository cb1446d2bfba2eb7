/**
 * Typical connector values for CLT walls on hold-downs and angle brackets, used only when
 * the survey leaves a value blank; each use is listed as an assumption marked "typical".
 * Order of magnitude of tested steel connectors in CLT (Gavric, Fragiacomo & Ceccotti 2015,
 * Materials and Structures 48:1841–1857, from memory, verify); check the product's declared
 * values before relying on them.
 */
export const CLT_TYPICAL = {
  /** Tension capacity of one hold-down, in N. */
  holdDownCapacityN: 50_000,
  /** Axial slip modulus of one hold-down, in N/m (5 kN/mm). */
  holdDownStiffnessNPerM: 5e6,
  /** Shear (sliding) capacity of one angle bracket, in N. */
  bracketCapacityN: 20_000,
  /** Shear slip modulus of one angle bracket, in N/m (2.5 kN/mm). */
  bracketStiffnessNPerM: 2.5e6,
  /** Hold-downs per wall: one at each end. */
  holdDownCount: 2,
  /** One angle bracket per this length of wall, in m, and at least two. */
  bracketSpacingM: 1.0,
} as const;

export const CLT_TYPICAL_SOURCE =
  'typical value, common practice (order of Gavric, Fragiacomo & Ceccotti 2015, Mater. Struct. 48:1841, from memory, verify)';

/** Resolved connector values of one CLT wall. */
export interface CltConnectors {
  holdDownCount: number;
  holdDownCapacityN: number;
  holdDownStiffnessNPerM: number;
  bracketCount: number;
  bracketCapacityN: number;
  bracketStiffnessNPerM: number;
}

/**
 * Lateral strength (N) and stiffness (N/m) of a CLT wall of length L and height h governed
 * by its connectors, the panel taken as rigid (panel shear and bending neglected), gravity
 * load on the wall neglected (conservative for strength):
 *
 * - sliding: nb·Fb, stiffness nb·kb;
 * - rocking about the compressed toe: hold-downs at the tension end (half of them) with lever
 *   arm L: Fh·nt·L/h, stiffness nt·kh·L²/h²;
 * - strength is the lesser, stiffness the two in series.
 *
 * Mechanics of the rigid-panel connector model of Gavric, Fragiacomo & Ceccotti 2015
 * (Eur. J. Wood Prod.; from memory, verify) and common practice.
 */
export function cltWallResistance(
  c: CltConnectors,
  lengthM: number,
  heightM: number,
): { strengthN: number; stiffnessNPerM: number } {
  const tensionHoldDowns = c.holdDownCount / 2; // one end in tension at a time
  const slideStrength = c.bracketCount * c.bracketCapacityN;
  const rockStrength = (tensionHoldDowns * c.holdDownCapacityN * lengthM) / heightM;
  const slideStiffness = c.bracketCount * c.bracketStiffnessNPerM;
  const ratio = lengthM / heightM;
  const rockStiffness = tensionHoldDowns * c.holdDownStiffnessNPerM * ratio * ratio;
  const stiffness =
    slideStiffness > 0 && rockStiffness > 0 ? 1 / (1 / slideStiffness + 1 / rockStiffness) : 0;
  return { strengthN: Math.min(slideStrength, rockStrength), stiffnessNPerM: stiffness };
}
