// Storey masses from floor areas and unit weights: mass = area × unit weight / g, with
// g = 9.81 m/s² (calc/units/gravity.ts; EN 1998-1 and ASCE 7 worked examples). Hand values.
import { describe, expect, it } from 'vitest';
import { buildingResponse } from '../../calc/index.js';
import house from '../fixtures/buildings/two-storey-house.json' with { type: 'json' };
import { storey, survey } from '../fixtures/buildings/survey-builder.js';
import type { SurveyInput } from '../../calc/index.js';

describe('storey masses', () => {
  it('lumps the upper floor on the ground storey and the roof on the top storey (fixture house)', () => {
    const r = buildingResponse(house as SurveyInput);
    // 96 m² × 1200 Pa (light timber default) / 9.81; 96 m² × 1300 Pa (heavy tile) / 9.81.
    expect(r.masses[0]!.massKg).toBeCloseTo((96 * 1200) / 9.81, 9);
    expect(r.masses[0]!.carrier).toBe('floor');
    expect(r.masses[0]!.basis).toBe('default');
    expect(r.masses[1]!.massKg).toBeCloseTo((96 * 1300) / 9.81, 9);
    expect(r.masses[1]!.carrier).toBe('roof');
    expect(r.totalMassKg).toBeCloseTo((96 * 2500) / 9.81, 9);
  });
  it('carries the source of each default and lists it among the assumptions', () => {
    const r = buildingResponse(house as SurveyInput);
    expect(r.masses[0]!.source).toMatch(/common practice/);
    const ids = r.assumptions.map((a) => a.id);
    expect(ids).toContain('mass.default.floor.light-timber');
    expect(ids).toContain('mass.default.roof.heavy-tile');
    for (const a of r.assumptions) expect(a.source.length).toBeGreaterThan(5);
  });
  it('uses an entered unit weight in place of the default and says so', () => {
    const s = survey({
      storeys: [
        storey({ floorConstruction: 'on-grade' }),
        storey({ floorAreaM2: 80, unitWeightPa: 1800 }),
      ],
    });
    s.building.roofUnitWeightPa = 500;
    const r = buildingResponse(s);
    expect(r.masses[0]!.massKg).toBeCloseTo((80 * 1800) / 9.81, 9);
    expect(r.masses[0]!.basis).toBe('entered');
    expect(r.masses[1]!.massKg).toBeCloseTo((80 * 500) / 9.81, 9);
    expect(r.masses[1]!.basis).toBe('entered');
  });
  it('does not crash on an unusable floor area: that mass is null and listed', () => {
    const s = survey({ storeys: [storey({ floorAreaM2: NaN, floorConstruction: 'on-grade' })] });
    const r = buildingResponse(s);
    expect(r.masses[0]!.massKg).toBeNull();
    expect(r.totalMassKg).toBeNull();
    expect(r.missingInputs.some((m) => m.field === 'building.storeys[0].floorAreaM2')).toBe(true);
    expect(r.x.demand).toBeNull();
  });
  it('does not crash on a floor on grade above the ground storey: zero mass is listed, no modes', () => {
    const s = survey({
      storeys: [
        storey({ floorConstruction: 'on-grade' }),
        storey({ floorConstruction: 'on-grade' }),
      ],
    });
    const r = buildingResponse(s);
    expect(r.masses[0]!.massKg).toBe(0);
    expect(r.x.modes).toBeNull();
    expect(r.missingInputs.some((m) => /no mass/.test(m.effect))).toBe(true);
  });
});
