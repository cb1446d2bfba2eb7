import type { WallType } from '../survey/survey-input.js';

/** 1 lbf in N, exact by definition (NIST SP 811, Appendix B). */
const LBF_N = 4.4482216152605;
/** 1 ft and 1 in in m, exact by definition (NIST SP 811). */
const FT_M = 0.3048;
const IN_M = 0.0254;
/** plf (lb per ft) → N/m. */
export const PLF_TO_N_PER_M = LBF_N / FT_M;
/** kips/in → N/m. */
export const KIP_PER_IN_TO_N_PER_M = (1000 * LBF_N) / IN_M;

/**
 * Per-length values of a sheathed wall type. A wall of length L and height h has strength
 * vs·L and stiffness Ga·L/h, the shear term of AWC SDPWS eq. (4.3-1) (Ga is the apparent
 * shear stiffness: panel shear and nail slip together).
 */
export interface WallUnitValues {
  /** Nominal unit shear capacity vs, in N/m of wall length. */
  unitShearNPerM: number;
  /** Apparent shear stiffness Ga, in N/m (stiffness of a square wall). */
  apparentShearStiffnessNPerM: number;
  source: string;
}

const SDPWS_WSP =
  'AWC SDPWS-2015 Table 4.3A, Structural I 15/32 in, 8d nails, blocked, seismic vs; Ga for OSB (plywood is 20–40 % softer)';

/**
 * Per-length values by wall type, in SI. The wood structural panel rows are SDPWS
 * Table 4.3A (edge nail spacing 6 / 4 / 3 / 2 in ≈ 150 / 100 / 75 / 50 mm):
 * vs = 560 / 860 / 1100 / 1460 plf, Ga (OSB) = 14 / 18 / 24 / 37 kips/in.
 */
export const WALL_UNIT_VALUES: Readonly<Partial<Record<WallType, WallUnitValues>>> = {
  'wsp-150': {
    unitShearNPerM: 560 * PLF_TO_N_PER_M,
    apparentShearStiffnessNPerM: 14 * KIP_PER_IN_TO_N_PER_M,
    source: `${SDPWS_WSP}, 6 in edge spacing`,
  },
  'wsp-100': {
    unitShearNPerM: 860 * PLF_TO_N_PER_M,
    apparentShearStiffnessNPerM: 18 * KIP_PER_IN_TO_N_PER_M,
    source: `${SDPWS_WSP}, 4 in edge spacing`,
  },
  'wsp-75': {
    unitShearNPerM: 1100 * PLF_TO_N_PER_M,
    apparentShearStiffnessNPerM: 24 * KIP_PER_IN_TO_N_PER_M,
    source: `${SDPWS_WSP}, 3 in edge spacing`,
  },
  'wsp-50': {
    unitShearNPerM: 1460 * PLF_TO_N_PER_M,
    apparentShearStiffnessNPerM: 37 * KIP_PER_IN_TO_N_PER_M,
    source: `${SDPWS_WSP}, 2 in edge spacing`,
  },
  // 1/2 in gypsum wallboard, unblocked, 7 in fastener spacing: ASD allowable ≈ 100 plf
  // (WFCM Table 3B / IBC), nominal ≈ 2 × ASD = 200 plf; Ga ≈ 5 kips/in.
  gypsum: {
    unitShearNPerM: 200 * PLF_TO_N_PER_M,
    apparentShearStiffnessNPerM: 5 * KIP_PER_IN_TO_N_PER_M,
    source:
      'AWC SDPWS Table 4.3C, 1/2 in gypsum wallboard, unblocked, 7 in spacing: vs ≈ 200 plf, Ga ≈ 5 kips/in (from memory, verify)',
  },
  // Single diagonal lumber sheathing.
  'diagonal-boards': {
    unitShearNPerM: 600 * PLF_TO_N_PER_M,
    apparentShearStiffnessNPerM: 6 * KIP_PER_IN_TO_N_PER_M,
    source:
      'AWC SDPWS Table 4.3D, single diagonal lumber sheathing: vs ≈ 600 plf, Ga ≈ 6 kips/in (from memory, verify)',
  },
  // Bare studs (e.g. an unbraced cripple wall) have no dependable racking resistance.
  unsheathed: {
    unitShearNPerM: 0,
    apparentShearStiffnessNPerM: 0,
    source: 'bare studs: no dependable racking strength or stiffness (common practice, no source)',
  },
};
