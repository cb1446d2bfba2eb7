// Wall stiffness and strength per storey.
// References: AWC SDPWS-2015 Table 4.3A (Structural I, 8d, blocked: vs = 560 / 860 / 1100 / 1460
// plf and Ga (OSB) = 14 / 18 / 24 / 37 kips/in, method notes §5, = 8.17 / 12.55 / 16.05 /
// 21.31 kN/m); SDPWS eq. (4.3-1) shear term δ = vh/(1000·Ga); NIST SP 811 for 1 lbf =
// 4.4482216152605 N, 1 ft = 0.3048 m, 1 in = 0.0254 m. CLT values worked by hand from the
// rigid-panel connector model (sliding on brackets, rocking on the tension hold-downs).
import { describe, expect, it } from 'vitest';
import { buildingResponse, WALL_UNIT_VALUES } from '../../calc/index.js';
import { storey, survey, wall } from '../fixtures/buildings/survey-builder.js';

const kipPerIn = 4448.2216152605 / 0.0254; // N/m

describe('SDPWS Table 4.3A values in SI', () => {
  it('gives vs = 8.17 / 12.55 / 16.05 / 21.31 kN/m for 150 / 100 / 75 / 50 mm edge spacing', () => {
    expect(WALL_UNIT_VALUES['wsp-150']!.unitShearNPerM / 1000).toBeCloseTo(8.17, 2);
    expect(WALL_UNIT_VALUES['wsp-100']!.unitShearNPerM / 1000).toBeCloseTo(12.55, 2);
    expect(WALL_UNIT_VALUES['wsp-75']!.unitShearNPerM / 1000).toBeCloseTo(16.05, 2);
    expect(WALL_UNIT_VALUES['wsp-50']!.unitShearNPerM / 1000).toBeCloseTo(21.31, 2);
  });
  it('gives Ga = 14 / 18 / 24 / 37 kips/in in N/m', () => {
    expect(WALL_UNIT_VALUES['wsp-150']!.apparentShearStiffnessNPerM / kipPerIn).toBeCloseTo(14, 10);
    expect(WALL_UNIT_VALUES['wsp-100']!.apparentShearStiffnessNPerM / kipPerIn).toBeCloseTo(18, 10);
    expect(WALL_UNIT_VALUES['wsp-75']!.apparentShearStiffnessNPerM / kipPerIn).toBeCloseTo(24, 10);
    expect(WALL_UNIT_VALUES['wsp-50']!.apparentShearStiffnessNPerM / kipPerIn).toBeCloseTo(37, 10);
  });
});

describe('storey stiffness and strength from the wall layout', () => {
  it('gives a wood panel wall k = Ga·L/h and strength vs·L, and sums a storey’s walls', () => {
    // SDPWS eq. 4.3-1 shear term in US units: 6 m = 19.685 ft wall, 2.8 m = 9.186 ft high, 1000 lb
    // load: v = 1000/19.685 plf, δ = v·h/(1000·Ga) in → k = 1000 lb / δ, converted to N/m.
    const Lft = 6 / 0.3048;
    const hft = 2.8 / 0.3048;
    const delta = ((1000 / Lft) * hft) / (1000 * 14); // in
    const kSdpws = ((1000 * 4.4482216152605) / delta) * (1 / 0.0254); // N/m
    const s = survey({
      walls: [
        wall({ storey: 0, direction: 'x', lengthM: 6 }),
        wall({ storey: 0, direction: 'x', lengthM: 4, type: 'wsp-50' }),
      ],
    });
    const r = buildingResponse(s);
    expect(r.x.walls[0]!.stiffnessNPerM).toBeCloseTo(kSdpws, 3);
    expect(r.x.walls[0]!.strengthN).toBeCloseTo(6 * 560 * (4.4482216152605 / 0.3048), 6);
    const k2 = (37 * kipPerIn * 4) / 2.8;
    expect(r.x.storeys[0]!.stiffnessNPerM).toBeCloseTo(kSdpws + k2, 3);
    expect(r.x.storeys[0]!.strengthN).toBeCloseTo(
      (6 * 560 + 4 * 1460) * (4.4482216152605 / 0.3048),
      6,
    );
    expect(r.x.storeys[0]!.sources).toHaveLength(2);
  });
  it('uses a wall’s own height when given', () => {
    const r = buildingResponse(
      survey({ walls: [wall({ storey: 0, direction: 'y', lengthM: 3, heightM: 2.4 })] }),
    );
    expect(r.y.walls[0]!.stiffnessNPerM).toBeCloseTo((14 * kipPerIn * 3) / 2.4, 6);
  });
  it('uses the entered unit values of a user wall times its length', () => {
    const r = buildingResponse(
      survey({
        walls: [
          wall({
            storey: 0,
            direction: 'x',
            type: 'user',
            lengthM: 2.5,
            userUnitShearNPerM: 9000,
            userUnitStiffnessNPerM2: 1.2e6,
          }),
        ],
      }),
    );
    expect(r.x.walls[0]!.basis).toBe('entered');
    expect(r.x.walls[0]!.strengthN).toBeCloseTo(22_500, 9);
    expect(r.x.walls[0]!.stiffnessNPerM).toBeCloseTo(3.0e6, 3);
  });
  it('does not crash on a user wall without values: it is left out and listed', () => {
    const r = buildingResponse(
      survey({
        walls: [
          wall({ storey: 0, direction: 'x', lengthM: 5 }),
          wall({ storey: 0, direction: 'x', type: 'user', userUnitShearNPerM: null }),
        ],
      }),
    );
    expect(r.x.walls[1]!.treatment).toBe('excluded-unknown');
    expect(r.x.storeys[0]!.complete).toBe(false);
    expect(r.missingInputs.map((m) => m.field)).toContain('walls[1].userUnitShearNPerM');
  });
  it('gives a CLT wall strength min(sliding, rocking) and stiffness in series from its connectors', () => {
    // L = 3 m, h = 2.8 m; 2 hold-downs 60 kN, 8 kN/mm (1 in tension); 4 brackets 25 kN, 3 kN/mm.
    // Sliding 4 × 25 = 100 kN; rocking 60 × 3 / 2.8 = 64.29 kN → 64.29 kN.
    // k: sliding 12e6; rocking 8e6 × (3/2.8)² = 9.184e6; series 5.2023e6 N/m.
    const r = buildingResponse(
      survey({
        walls: [
          wall({
            storey: 0,
            direction: 'x',
            type: 'clt-bracketed',
            lengthM: 3,
            connectors: {
              holdDownCount: 2,
              holdDownCapacityN: 60_000,
              holdDownStiffnessNPerM: 8e6,
              bracketCount: 4,
              bracketCapacityN: 25_000,
              bracketStiffnessNPerM: 3e6,
            },
          }),
        ],
      }),
    );
    const w = r.x.walls[0]!;
    expect(w.basis).toBe('connectors');
    expect(w.strengthN).toBeCloseTo((60_000 * 3) / 2.8, 6);
    const kr = 8e6 * (3 / 2.8) ** 2;
    expect(w.stiffnessNPerM).toBeCloseTo(1 / (1 / 12e6 + 1 / kr), 3);
    expect(r.assumptions.some((a) => a.id.startsWith('wall.clt-typical'))).toBe(false);
  });
  it('fills blank CLT connector values with typical ones and marks them as typical', () => {
    const r = buildingResponse(
      survey({
        walls: [
          wall({
            storey: 0,
            direction: 'x',
            type: 'clt-bracketed',
            lengthM: 2.4,
            connectors: null,
          }),
        ],
      }),
    );
    expect(r.x.walls[0]!.source).toMatch(/typical values used/);
    const a = r.assumptions.find((x) => x.id.startsWith('wall.clt-typical'));
    expect(a?.source).toMatch(/typical/);
    expect(r.x.walls[0]!.strengthN).toBeGreaterThan(0);
  });
  it('leaves rocking walls out of stiffness and strength, and says so', () => {
    const r = buildingResponse(
      survey({
        walls: [
          wall({ storey: 0, direction: 'x', lengthM: 5 }),
          wall({ storey: 0, direction: 'x', type: 'rocking', lengthM: 3 }),
        ],
      }),
    );
    expect(r.x.walls[1]!.treatment).toBe('excluded-rocking');
    expect(r.x.storeys[0]!.shearWallCount).toBe(1);
    expect(r.x.storeys[0]!.rockingWallCount).toBe(1);
    expect(r.x.storeys[0]!.stiffnessNPerM).toBeCloseTo((14 * kipPerIn * 5) / 2.8, 3);
    expect(r.assumptions.map((a) => a.id)).toContain('wall.rocking-excluded');
  });
  it('treats bare studs as zero stiffness and strength: no modes, empirical period, no capacity', () => {
    const r = buildingResponse(
      survey({
        storeys: [storey({ floorConstruction: 'on-grade' }), storey()],
        walls: [
          wall({ storey: 0, direction: 'x', type: 'unsheathed' }),
          wall({ storey: 1, direction: 'x' }),
        ],
      }),
    );
    expect(r.x.storeys[0]!.stiffnessNPerM).toBe(0);
    expect(r.x.modes).toBeNull();
    expect(r.x.period.kind).toBe('empirical');
    expect(r.x.demandToCapacity![0]).toBeNull();
    expect(r.x.irregularities[0]!.extremeSoft1b).toBe(true);
    expect(r.x.irregularities[0]!.extremeWeak5b).toBe(true);
  });
  it('does not crash on walls in storeys that do not exist, or with zero length', () => {
    const r = buildingResponse(
      survey({
        walls: [
          wall({ storey: 4, direction: 'x' }),
          wall({ storey: 0, direction: 'x', lengthM: 0 }),
        ],
      }),
    );
    expect(r.x.walls.map((w) => w.treatment)).toEqual(['excluded-invalid', 'excluded-invalid']);
    expect(r.missingInputs.map((m) => m.field)).toEqual(
      expect.arrayContaining(['walls[0].storey', 'walls[1].lengthM']),
    );
  });
});
