/**
 * Published fragility parameters of the Hazus earthquake model for wood buildings, in one
 * place: the model building types W1 and W2 at the four seismic design levels.
 *
 * Source of every number below: FEMA, Hazus-MH 2.1 Earthquake Model Technical Manual (2013),
 * chapter 5, tables of building capacity curves (Tables 5.7a–5.7d) and of structural
 * fragility curve parameters (Tables 5.9a–5.9d: average inter-storey drift ratio at the
 * threshold of each damage state, median spectral displacement and β). Values as given in
 * the team's method notes (§7, marked published); the table numbers are from memory, verify.
 * Spectral displacements are published in inches and converted here with 1 in = 0.0254 m
 * (exact, NIST SP 811 Appendix B).
 *
 * The published medians satisfy Sd = drift × 0.75 × height (typical heights 14 ft for W1,
 * 24 ft for W2), which test/reference/damage-hazus-table.test.ts checks (derived).
 */

/** The Hazus model building types for wood. */
export type HazusWoodType = 'W1' | 'W2';

/** The Hazus seismic design levels. */
export type HazusDesignLevel = 'high' | 'moderate' | 'low' | 'pre-code';

/** The four damage states above None, in order. */
export type ThresholdState = 'slight' | 'moderate' | 'extensive' | 'complete';

export const THRESHOLD_STATES: readonly ThresholdState[] = [
  'slight',
  'moderate',
  'extensive',
  'complete',
];

/** Four values, one per damage state Slight, Moderate, Extensive, Complete. */
export type PerState = readonly [number, number, number, number];

/** What Hazus publishes for one type at one design level, in SI. */
export interface HazusWoodParameters {
  type: HazusWoodType;
  level: HazusDesignLevel;
  /** Typical height of the type, in m (W1 14 ft, W2 24 ft). */
  typicalHeightM: number;
  /** Typical fundamental period of the type, in s (W1 0.35 s, W2 0.40 s). */
  typicalPeriodS: number;
  /** Capacity curve: yield and ultimate spectral displacement (m) and acceleration (g). */
  capacity: {
    yieldDisplacementM: number;
    yieldAccelerationG: number;
    ultimateDisplacementM: number;
    ultimateAccelerationG: number;
  };
  /** Average inter-storey drift ratio at the threshold of each state. */
  driftThresholds: PerState;
  /** Median spectral displacement of each state, in m. */
  spectralDisplacementMediansM: PerState;
  /** Lognormal standard deviation β of each state. */
  betas: PerState;
  source: string;
}

/** Inches to metres, exact (NIST SP 811, Appendix B). */
const IN = 0.0254;
/** Feet to metres, exact (NIST SP 811, Appendix B). */
const FT = 0.3048;

const TABLE_SOURCE = 'Hazus-MH 2.1 Earthquake Model Technical Manual (FEMA 2013)';

/** Drift ratios at the thresholds, the same for W1 and W2 (Hazus Tables 5.9a–5.9d). */
const DRIFT: Record<HazusDesignLevel, PerState> = {
  high: [0.004, 0.012, 0.04, 0.1],
  moderate: [0.004, 0.0099, 0.0306, 0.075],
  low: [0.004, 0.0099, 0.0306, 0.075],
  'pre-code': [0.0032, 0.0079, 0.0245, 0.06],
};

const TABLES: Record<HazusDesignLevel, string> = {
  high: 'Table 5.7a (capacity), Table 5.9a (fragility), high code',
  moderate: 'Table 5.7b (capacity), Table 5.9b (fragility), moderate code',
  low: 'Table 5.7c (capacity), Table 5.9c (fragility), low code',
  'pre-code': 'Table 5.7d (capacity), Table 5.9d (fragility), pre-code',
};

function row(
  type: HazusWoodType,
  level: HazusDesignLevel,
  capacityIn: [dy: number, ay: number, du: number, au: number],
  sdMediansIn: PerState,
  betas: PerState,
): HazusWoodParameters {
  return {
    type,
    level,
    // Hazus typical building: W1 one storey, 14 ft; W2 two storeys, 24 ft.
    typicalHeightM: (type === 'W1' ? 14 : 24) * FT,
    // Hazus typical elastic period: W1 0.35 s, W2 0.40 s.
    typicalPeriodS: type === 'W1' ? 0.35 : 0.4,
    capacity: {
      yieldDisplacementM: capacityIn[0] * IN,
      yieldAccelerationG: capacityIn[1],
      ultimateDisplacementM: capacityIn[2] * IN,
      ultimateAccelerationG: capacityIn[3],
    },
    driftThresholds: DRIFT[level],
    spectralDisplacementMediansM: sdMediansIn.map((d) => d * IN) as unknown as PerState,
    betas,
    source: `${TABLE_SOURCE}, ${TABLES[level]}, ${type} (table numbers from memory, verify)`,
  };
}

/**
 * Hazus wood fragility parameters by type and design level. Capacity as Dy (in), Ay (g),
 * Du (in), Au (g); Sd medians in inches (converted); β per state.
 */
export const HAZUS_WOOD: Readonly<
  Record<HazusWoodType, Readonly<Record<HazusDesignLevel, HazusWoodParameters>>>
> = {
  W1: {
    high: row(
      'W1',
      'high',
      [0.48, 0.4, 11.51, 1.2],
      [0.5, 1.51, 5.04, 12.6],
      [0.8, 0.81, 0.85, 0.97],
    ),
    moderate: row(
      'W1',
      'moderate',
      [0.36, 0.3, 6.48, 0.9],
      [0.5, 1.25, 3.86, 9.45],
      [0.84, 0.86, 0.89, 1.04],
    ),
    low: row(
      'W1',
      'low',
      [0.24, 0.2, 4.32, 0.6],
      [0.5, 1.25, 3.86, 9.45],
      [0.93, 0.98, 1.02, 0.99],
    ),
    'pre-code': row(
      'W1',
      'pre-code',
      [0.24, 0.2, 4.32, 0.6],
      [0.4, 1.0, 3.09, 7.56],
      [1.01, 1.05, 1.07, 1.06],
    ),
  },
  W2: {
    high: row(
      'W2',
      'high',
      [0.63, 0.4, 12.53, 1.0],
      [0.86, 2.59, 8.64, 21.6],
      [0.81, 0.88, 0.9, 0.83],
    ),
    moderate: row(
      'W2',
      'moderate',
      [0.31, 0.2, 4.7, 0.5],
      [0.86, 2.14, 6.62, 16.2],
      [0.89, 0.95, 0.95, 0.92],
    ),
    low: row(
      'W2',
      'low',
      [0.16, 0.1, 2.35, 0.25],
      [0.86, 2.14, 6.62, 16.2],
      [0.97, 0.9, 0.89, 0.99],
    ),
    'pre-code': row(
      'W2',
      'pre-code',
      [0.16, 0.1, 2.35, 0.25],
      [0.69, 1.71, 5.29, 12.96],
      [1.04, 0.97, 0.9, 0.99],
    ),
  },
};

/** The parameters of one type and level. */
export function hazusWoodParameters(
  type: HazusWoodType,
  level: HazusDesignLevel,
): HazusWoodParameters {
  const p = HAZUS_WOOD[type]?.[level];
  if (p === undefined) {
    throw new RangeError(
      `no Hazus wood parameters for type ${String(type)}, level ${String(level)}`,
    );
  }
  return p;
}
