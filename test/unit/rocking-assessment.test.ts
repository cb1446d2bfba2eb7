// The per-wall entry points: survey wall → rocking model (defaults listed), observed uplift
// bands, and the assessment's flags. Geometry checks use Housner 1963 (BSSA 53(2):403–417);
// the corner periods are EN 1998-1:2004 Table 3.2 (TC) and ASCE 7-16 §11.4.6 (TS = SD1/SDS).
import { describe, expect, it } from 'vitest';
import {
  CLT_UNIT_WEIGHT_N_PER_M3,
  assessRockingWall,
  observedRocking,
  rockingBand,
  rockingBlock,
  rockingWallFromInput,
  spectrumCornerPeriod,
} from '../../calc/index.js';
import type { WallInput } from '../../calc/index.js';

const baseWall: WallInput = {
  id: 'R1',
  storey: 0,
  direction: 'y',
  type: 'rocking',
  lengthM: 1.2,
  heightM: null,
  positionM: 3,
  connectors: null,
  rocking: null,
  devices: [],
  userUnitShearNPerM: null,
  userUnitStiffnessNPerM2: null,
};

describe('rockingWallFromInput', () => {
  it('takes the storey height, the default thickness and the CLT unit weight, and lists each', () => {
    const m = rockingWallFromInput(baseWall, 2.7);
    expect(m.params.heightM).toBe(2.7);
    expect(m.thicknessM).toBe(0.1);
    expect(m.params.selfWeightN).toBeCloseTo(1.2 * 2.7 * 0.1 * CLT_UNIT_WEIGHT_N_PER_M3, 9);
    expect(m.params.gravityLoadN).toBe(0);
    expect(m.params.postTensionN).toBe(0);
    expect(m.params.holdDownCapacityN).toBe(0);
    const text = m.assumptions.join(' ');
    expect(text).toMatch(/storey height/);
    expect(text).toMatch(/thickness not recorded/);
    expect(text).toMatch(/EN 1991-1-1/);
    expect(text).toMatch(/Post-tension not recorded: taken as 0/);
    expect(text).toMatch(/Gravity load/);
  });

  it('uses recorded values and counts half of the hold-downs (at the heel)', () => {
    const m = rockingWallFromInput(
      {
        ...baseWall,
        heightM: 3,
        rocking: {
          thicknessM: 0.16,
          selfWeightN: 9000,
          gravityLoadN: 25_000,
          postTensionN: 60_000,
        },
        connectors: {
          holdDownCount: 3,
          holdDownCapacityN: 40_000,
          holdDownStiffnessNPerM: null,
          bracketCount: null,
          bracketCapacityN: null,
          bracketStiffnessNPerM: null,
        },
      },
      2.7,
    );
    expect(m.params).toEqual({
      widthM: 1.2,
      heightM: 3,
      selfWeightN: 9000,
      gravityLoadN: 25_000,
      postTensionN: 60_000,
      holdDownCapacityN: 40_000, // floor(3/2) = 1 at the heel
    });
    expect(m.holdDownsAtHeel).toBe(1);
    expect(m.assumptions.join(' ')).not.toMatch(/not recorded/);
  });

  it('keeps a bare wall identical to the rigid block of its panel', () => {
    const m = rockingWallFromInput({ ...baseWall, heightM: 2.7 }, 3);
    const b = rockingBlock(1.2, 2.7);
    expect(m.wall.alpha).toBeCloseTo(b.alpha, 14);
    expect(m.wall.p).toBeCloseTo(b.p, 13);
  });
});

describe('observed rocking', () => {
  it('reads θobs = gap / width and compares it with α', () => {
    const block = rockingBlock(1.2, 2.7);
    const o = observedRocking(block, 0.012);
    expect(o.thetaObserved).toBeCloseTo(0.01, 14);
    expect(o.ratio).toBeCloseTo(0.01 / block.alpha, 14);
    expect(o.band).toBe('small');
  });
  it('bands ratios at 0.15, 0.4, 0.7 and 1', () => {
    expect(rockingBand(0)).toBe('none');
    expect(rockingBand(0.149)).toBe('small');
    expect(rockingBand(0.15)).toBe('moderate');
    expect(rockingBand(0.4)).toBe('large');
    expect(rockingBand(0.7)).toBe('near-toppling');
    expect(rockingBand(1)).toBe('beyond-stability');
  });
});

describe('spectrumCornerPeriod', () => {
  it('is TC for EN 1998-1 (type 1 ground C: 0.6 s) and SD1/SDS for ASCE 7 (0.6 s)', () => {
    expect(spectrumCornerPeriod({ kind: 'ec8', type: 1, ground: 'C', ag: 0.3 })).toBeCloseTo(
      0.6,
      2,
    );
    expect(spectrumCornerPeriod({ kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 })).toBeCloseTo(0.6, 2);
  });
});

describe('assessRockingWall', () => {
  const slender = rockingWallFromInput({ ...baseWall, lengthM: 0.6, heightM: 3 }, 3);
  const spec = { kind: 'ec8', type: 1, ground: 'C', ag: 0.3 } as const;

  it('sends a wall with supplemental devices to detailed assessment and says they are not modelled', () => {
    const m = rockingWallFromInput({ ...baseWall, heightM: 2.7, devices: ['viscous-damper'] }, 2.7);
    const a = assessRockingWall(m, spec, null);
    expect(a.flags).toContain('devices-not-modelled');
    expect(a.needsDetailedAssessment).toBe(true);
    expect(a.cautions.join(' ')).toMatch(/not modelled/);
  });

  it('gives spectral and pulse predictions, the Makris & Konstantinidis caution and the screening caution', () => {
    const a = assessRockingWall(slender, spec, 0.02);
    expect(a.spectral).not.toBeNull();
    expect(a.pulse).not.toBeNull();
    expect(a.pulse?.pulsePeriodS).toBeCloseTo(0.6, 2);
    expect(a.predictedRatio).toBeGreaterThan(0);
    expect(a.observed?.thetaObserved).toBeCloseTo(0.02 / 0.6, 12);
    expect(a.cautions.join(' ')).toMatch(/Makris & Konstantinidis 2003/);
    expect(a.cautions.join(' ')).toMatch(/licensed engineer/);
  });

  it('flags predicted toppling and sends the wall to detailed assessment', () => {
    const a = assessRockingWall(slender, { kind: 'ec8', type: 1, ground: 'D', ag: 0.6 }, null);
    expect(a.flags).toContain('pulse-topples-at-pga');
    expect(a.needsDetailedAssessment).toBe(true);
  });

  it('flags observed uplift near α and uplift on a wall with hold-downs', () => {
    const held = rockingWallFromInput(
      {
        ...baseWall,
        heightM: 2.7,
        connectors: {
          holdDownCount: 2,
          holdDownCapacityN: 30_000,
          holdDownStiffnessNPerM: null,
          bracketCount: null,
          bracketCapacityN: null,
          bracketStiffnessNPerM: null,
        },
      },
      2.7,
    );
    const gap = 0.8 * held.wall.alpha * 1.2; // θobs/α = 0.8
    const a = assessRockingWall(held, null, gap);
    expect(a.flags).toEqual(
      expect.arrayContaining(['no-hazard', 'observed-near-toppling', 'hold-downs-engaged']),
    );
    expect(a.spectral).toBeNull();
    expect(a.predictedRatio).toBeNull();
  });

  it('runs without the time history when asked, and takes a pulse period from the magnitude', () => {
    expect(assessRockingWall(slender, spec, null, { timeHistory: false }).pulse).toBeNull();
    const a = assessRockingWall(slender, spec, null, { magnitude: 6.5 });
    expect(a.pulse?.pulsePeriodSource).toBe('magnitude');
    expect(a.pulse?.pulsePeriodS).toBeCloseTo(Math.exp(-6.45 + 1.11 * 6.5), 12);
  });
});
