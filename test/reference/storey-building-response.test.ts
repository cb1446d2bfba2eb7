// The whole storey model from a survey: which period is used, what is reported beside it,
// torsional eccentricity, and what happens when inputs are missing.
// References: hand values from the fixture geometry (centre of rigidity Σk·y/Σk, EN 1998-1
// §4.2.3.2; ASCE 7-16 §12.8.4); ASCE 7-16 eq. (12.8-7) and Table 12.8-1 (Cu·Ta); EN 1998-1
// eq. (4.6).
import { describe, expect, it } from 'vitest';
import { buildingResponse, shearBuildingModes } from '../../calc/index.js';
import type { SurveyInput } from '../../calc/index.js';
import house from '../fixtures/buildings/two-storey-house.json' with { type: 'json' };
import { storey, survey, wall } from '../fixtures/buildings/survey-builder.js';

const fixture = house as SurveyInput;

describe('period used and the estimates beside it', () => {
  it('uses the modal period when walls are entered, with both empirical values beside it', () => {
    const r = buildingResponse(fixture);
    expect(r.x.period.kind).toBe('modal');
    expect(r.x.period.usedS).toBe(r.x.modes!.periods[0]);
    expect(r.x.period.empiricalEc8S).toBeCloseTo(0.05 * 5.3 ** 0.75, 12);
    expect(r.x.period.empiricalAsce7S).toBeCloseTo(0.0488 * 5.3 ** 0.75, 12);
    expect(r.x.period.empiricalMethod).toBe('ec8');
    expect(r.x.period.measuredS).toBeNull();
  });
  it('has modes equal to shearBuildingModes of the reported masses and stiffnesses', () => {
    const r = buildingResponse(fixture);
    const direct = shearBuildingModes(
      r.masses.map((m) => m.massKg!),
      r.y.storeys.map((s) => s.stiffnessNPerM!),
    );
    expect(r.y.modes!.periods).toEqual(direct.periods);
  });
  it('uses a measured frequency first, scaling the wall model to it and keeping the modal period beside', () => {
    const s: SurveyInput = {
      ...fixture,
      measured: { frequencyHz: 4, dampingRatio: null, confidence: 0.8, direction: 'x' },
    };
    const r = buildingResponse(s);
    const plain = buildingResponse(fixture);
    expect(r.x.period.kind).toBe('measured');
    expect(r.x.period.usedS).toBe(0.25);
    expect(r.x.period.modalS).toBe(plain.x.period.modalS);
    expect(r.x.modes!.periods[0]).toBeCloseTo(0.25, 12);
    expect(r.x.stiffnessScaleToMeasured).toBeCloseTo((plain.x.period.modalS! / 0.25) ** 2, 12);
    expect(r.x.modes!.shapes).toEqual(plain.x.modes!.shapes);
    expect(r.x.demand!.periodS).toBeCloseTo(0.25, 12);
    // Direction y has no measurement: modal there.
    expect(r.y.period.kind).toBe('modal');
  });
  it('applies a measurement without a direction to both directions and says so', () => {
    const s: SurveyInput = {
      ...fixture,
      measured: { frequencyHz: 5, dampingRatio: 0.03, confidence: 0.5, direction: null },
    };
    const r = buildingResponse(s);
    expect(r.x.period.kind).toBe('measured');
    expect(r.y.period.kind).toBe('measured');
    expect(r.assumptions.map((a) => a.id)).toContain('period.measured-both');
  });
  it('reports Cu·Ta beside the other estimates under an ASCE 7 spectrum (Table 12.8-1, SD1 = 0.25 → Cu = 1.45)', () => {
    const s: SurveyInput = { ...fixture, hazard: { kind: 'asce7', SDS: 0.8, SD1: 0.25, TL: 6 } };
    const r = buildingResponse(s);
    expect(r.x.period.empiricalMethod).toBe('asce7');
    expect(r.x.period.upperLimitS).toBeCloseTo(1.45 * 0.0488 * 5.3 ** 0.75, 12);
    // The wall model is softer than Cu·Ta here: reported, not capped.
    expect(r.x.period.usedS).toBe(r.x.period.modalS);
    expect(r.x.period.warnings.some((w) => /Cu·Ta/.test(w))).toBe(true);
  });
  it('flags a height beyond the EN 1998-1 range without refusing it', () => {
    const tall = survey({
      storeys: Array.from({ length: 14 }, (_, i) =>
        storey({ heightM: 3, floorConstruction: i === 0 ? 'on-grade' : 'clt' }),
      ),
    });
    const r = buildingResponse(tall);
    expect(r.x.period.kind).toBe('empirical');
    expect(r.x.period.warnings[0]).toMatch(/40 m/);
  });
});

describe('torsional eccentricity from wall positions', () => {
  it('gives (CR − CM)/plan dimension: 0.01724 along x in the ground storey of the fixture', () => {
    // x walls at y = 0 (wsp-150, 6 m) and y = 8 (wsp-100, 5 m), same height: k ∝ Ga·L = 84 and 90.
    // CRy = 8·90/174 = 4.1379 m; CMy = 4 m; e = 0.1379/8 = 0.017241.
    const r = buildingResponse(fixture);
    expect(r.x.torsionalEccentricity[0]).toBeCloseTo((8 * 90) / 174 / 8 - 0.5, 12);
    expect(r.x.torsionalEccentricity[1]).toBeCloseTo(0, 12);
  });
  it('is null where a wall position is missing, and lists the position', () => {
    const r = buildingResponse(fixture);
    // y walls at x = 0 (wsp-150, 4 m: Ga·L ∝ 14·4) and x = 12 (gypsum, 4 m: 5·4); CM at x = 6.
    expect(r.y.torsionalEccentricity[0]).toBeCloseTo(
      (12 * (5 * 4)) / (14 * 4 + 5 * 4) / 12 - 0.5,
      12,
    );
    expect(r.y.torsionalEccentricity[1]).toBeNull();
    expect(r.missingInputs.some((m) => m.field.includes('walls[7].positionM'))).toBe(true);
  });
  it('is null when the plan dimension is unknown', () => {
    const s: SurveyInput = { ...fixture, building: { ...fixture.building, planYM: null } };
    const r = buildingResponse(s);
    expect(r.x.torsionalEccentricity).toEqual([null, null]);
    expect(r.missingInputs.map((m) => m.field)).toContain('building.planYM');
  });
});

describe('missing inputs never crash', () => {
  it('with no walls: empirical period only, strength unknown, listed', () => {
    const r = buildingResponse({ ...fixture, walls: [] });
    expect(r.x.period.kind).toBe('empirical');
    expect(r.x.modes).toBeNull();
    expect(r.x.storeys.every((s) => s.strengthN === null && s.stiffnessNPerM === null)).toBe(true);
    expect(r.x.demand!.method).toBe('elf');
    expect(r.missingInputs.map((m) => m.field)).toContain('walls');
    expect(r.x.irregularities.every((i) => i.soft1a === null)).toBe(true);
  });
  it('with no hazard: modes and period, but no demand, listed', () => {
    const r = buildingResponse({ ...fixture, hazard: null });
    expect(r.x.modes).not.toBeNull();
    expect(r.x.demand).toBeNull();
    expect(r.x.demandToCapacity).toBeNull();
    expect(r.missingInputs.map((m) => m.field)).toContain('hazard');
  });
  it('with an invalid hazard: no demand, the spectrum’s complaint listed', () => {
    const r = buildingResponse({
      ...fixture,
      hazard: { kind: 'ec8', type: 1, ground: 'B', ag: -0.2 },
    });
    expect(r.x.demand).toBeNull();
    expect(r.missingInputs.find((m) => m.field === 'hazard')?.effect).toMatch(/spec\.ag/);
  });
  it('with no storeys: nothing computed, listed', () => {
    const r = buildingResponse({
      ...fixture,
      building: { ...fixture.building, storeys: [] },
      walls: [],
    });
    expect(r.masses).toEqual([]);
    expect(r.x.period.usedS).toBeNull();
    expect(r.missingInputs.map((m) => m.field)).toContain('building.storeys');
  });
  it('with a storey that has only rocking walls along x: no shear-wall model along x, listed', () => {
    const s = survey({
      storeys: [storey({ floorConstruction: 'on-grade' }), storey()],
      walls: [
        wall({ storey: 0, direction: 'x', type: 'rocking' }),
        wall({ storey: 1, direction: 'x' }),
      ],
    });
    const r = buildingResponse(s);
    expect(r.x.storeys[0]!.stiffnessNPerM).toBeNull();
    expect(r.x.modes).toBeNull();
    expect(r.x.period.kind).toBe('empirical');
    expect(r.missingInputs.some((m) => /only rocking walls/.test(m.effect))).toBe(true);
  });
  it('with walls along x only: y has an empirical period and is listed', () => {
    const r = buildingResponse(survey({ walls: [wall({ storey: 0, direction: 'x' })] }));
    expect(r.x.period.kind).toBe('modal');
    expect(r.y.period.kind).toBe('empirical');
    expect(r.missingInputs.map((m) => m.field)).toContain('walls (y)');
  });
  it('with NaN storey height: no total height, drift ratio of that storey null', () => {
    const s = survey({
      storeys: [storey({ floorConstruction: 'on-grade' }), storey({ heightM: NaN })],
      walls: [
        wall({ storey: 0, direction: 'x', heightM: 2.8 }),
        wall({ storey: 1, direction: 'x', heightM: 2.8 }),
      ],
    });
    const r = buildingResponse(s);
    expect(r.totalHeightM).toBeNull();
    expect(r.x.period.kind).toBe('modal');
    expect(r.x.demand!.driftRatios[1]).toBeNull();
    expect(r.x.demand!.driftRatios[0]).not.toBeNull();
  });
});
