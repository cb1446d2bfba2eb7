// The Hazus wood table as stored (calc/damage/hazus-wood-parameters.ts) against the values of
// the Hazus-MH 2.1 Earthquake Model Technical Manual as copied in the method notes §7 (typed
// here again, independently), and the derived consistency Sd = drift × 0.75 × height.
import { describe, expect, it } from 'vitest';
import { HAZUS_WOOD, W1_MAX_FLOOR_AREA_M2, hazusWoodClass } from '../../calc/index.js';
import type { BuildingInput } from '../../calc/index.js';

const IN = 0.0254;

// Hazus-MH 2.1 Technical Manual, Tables 5.9a–d (method notes §7): Sd medians (in) and β.
const PUBLISHED = {
  W1: {
    high: { sd: [0.5, 1.51, 5.04, 12.6], beta: [0.8, 0.81, 0.85, 0.97] },
    moderate: { sd: [0.5, 1.25, 3.86, 9.45], beta: [0.84, 0.86, 0.89, 1.04] },
    low: { sd: [0.5, 1.25, 3.86, 9.45], beta: [0.93, 0.98, 1.02, 0.99] },
    'pre-code': { sd: [0.4, 1.0, 3.09, 7.56], beta: [1.01, 1.05, 1.07, 1.06] },
  },
  W2: {
    high: { sd: [0.86, 2.59, 8.64, 21.6], beta: [0.81, 0.88, 0.9, 0.83] },
    moderate: { sd: [0.86, 2.14, 6.62, 16.2], beta: [0.89, 0.95, 0.95, 0.92] },
    low: { sd: [0.86, 2.14, 6.62, 16.2], beta: [0.97, 0.9, 0.89, 0.99] },
    'pre-code': { sd: [0.69, 1.71, 5.29, 12.96], beta: [1.04, 0.97, 0.9, 0.99] },
  },
} as const;

const DRIFT = {
  high: [0.004, 0.012, 0.04, 0.1],
  moderate: [0.004, 0.0099, 0.0306, 0.075],
  low: [0.004, 0.0099, 0.0306, 0.075],
  'pre-code': [0.0032, 0.0079, 0.0245, 0.06],
} as const;

describe('Hazus wood fragility table', () => {
  for (const type of ['W1', 'W2'] as const) {
    for (const level of ['high', 'moderate', 'low', 'pre-code'] as const) {
      it(`holds the published ${type} ${level}-code medians, β and drift thresholds (Hazus-MH 2.1 Table 5.9, method notes §7)`, () => {
        const row = HAZUS_WOOD[type][level];
        const pub = PUBLISHED[type][level];
        row.spectralDisplacementMediansM.forEach((m, i) =>
          expect(m / IN).toBeCloseTo(pub.sd[i]!, 10),
        );
        expect([...row.betas]).toEqual([...pub.beta]);
        expect([...row.driftThresholds]).toEqual([...DRIFT[level]]);
      });

      it(`reproduces the ${type} ${level}-code Sd medians as drift × 0.75 × typical height to the published rounding (derived, method notes §7)`, () => {
        const row = HAZUS_WOOD[type][level];
        const heightIn = type === 'W1' ? 168 : 288;
        row.driftThresholds.forEach((d, i) => {
          const derived = d * 0.75 * heightIn;
          expect(Math.abs(derived - row.spectralDisplacementMediansM[i]! / IN)).toBeLessThanOrEqual(
            0.011,
          );
        });
      });
    }
  }
});

function building(over: Partial<BuildingInput>): BuildingInput {
  return {
    system: 'light-frame',
    codeLevel: 'high',
    occupancy: 'single-family',
    planXM: 10,
    planYM: 8,
    storeys: [{ heightM: 2.7, floorAreaM2: 80, floorConstruction: 'on-grade', unitWeightPa: null }],
    roofConstruction: 'light',
    roofUnitWeightPa: null,
    ...over,
  };
}

describe('mapping a survey onto a Hazus type and level', () => {
  it('puts light frame up to 5,000 sq ft (464.5 m², 1 ft = 0.3048 m) in W1 and larger in W2', () => {
    expect(W1_MAX_FLOOR_AREA_M2).toBeCloseTo(464.5152, 4);
    const storey = (a: number) => ({
      heightM: 2.7,
      floorAreaM2: a,
      floorConstruction: 'on-grade' as const,
      unitWeightPa: null,
    });
    expect(hazusWoodClass(building({ storeys: [storey(200), storey(200)] })).type).toBe('W1');
    expect(hazusWoodClass(building({ storeys: [storey(250), storey(250)] })).type).toBe('W2');
  });

  it('falls back on the use when the floor area is unknown', () => {
    expect(hazusWoodClass(building({ storeys: [] })).type).toBe('W1');
    expect(hazusWoodClass(building({ storeys: [], occupancy: 'commercial' })).type).toBe('W2');
  });

  it('maps heavy timber to W2 and mass timber and rocking walls to W2 as a stated proxy', () => {
    expect(hazusWoodClass(building({ system: 'heavy-timber-frame' }))).toMatchObject({
      type: 'W2',
      typeIsProxy: false,
    });
    expect(hazusWoodClass(building({ system: 'mass-timber-panel' }))).toMatchObject({
      type: 'W2',
      typeIsProxy: true,
    });
    expect(hazusWoodClass(building({ system: 'rocking-wall' }))).toMatchObject({
      type: 'W2',
      typeIsProxy: true,
    });
  });

  it('takes an unknown code level as pre-code for light frame and as moderate for mass timber, and says so', () => {
    const lf = hazusWoodClass(building({ codeLevel: 'unknown' }));
    expect(lf).toMatchObject({ level: 'pre-code', levelDefaulted: true });
    expect(lf.basis.join(' ')).toMatch(/not recorded/);
    expect(
      hazusWoodClass(building({ system: 'mass-timber-panel', codeLevel: 'unknown' })).level,
    ).toBe('moderate');
    expect(hazusWoodClass(building({ codeLevel: 'low' }))).toMatchObject({
      level: 'low',
      levelDefaulted: false,
    });
  });
});
