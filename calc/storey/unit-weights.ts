import type { FloorConstruction, RoofConstruction } from '../survey/survey-input.js';

/** A default seismic unit weight and where it comes from. */
export interface UnitWeightDefault {
  /** Seismic weight per m² of floor area, in Pa (N/m²). */
  pa: number;
  /** Id of the assumption that records this default's use. */
  id: string;
  source: string;
}

/**
 * Default seismic weight per m² of floor, including finishes, services, a partition allowance
 * and a share of the storey's walls (so the floor area alone gives the level's mass).
 * An entered `unitWeightPa` replaces the whole value.
 */
export const FLOOR_UNIT_WEIGHTS: Readonly<Record<FloorConstruction, UnitWeightDefault>> = {
  // Joists, boards or panels, finishes ≈ 0.5–0.7 kPa, plus the 0.48 kPa partition minimum of
  // ASCE 7-16 §12.7.2(2) and a share of light-frame walls.
  'light-timber': {
    pa: 1200,
    id: 'mass.default.floor.light-timber',
    source:
      'common practice, no source (light timber floor ≈ 0.6 kPa + partitions 0.48 kPa per ASCE 7-16 §12.7.2(2) + walls)',
  },
  // As light timber plus a ≈ 50 mm normal-weight concrete topping at 24 kN/m³
  // (EN 1991-1-1:2002 Table A.1) ≈ 1.2 kPa.
  'timber-concrete': {
    pa: 2500,
    id: 'mass.default.floor.timber-concrete',
    source:
      'common practice, no source (light timber floor + 50 mm concrete at 24 kN/m³, EN 1991-1-1 Table A.1, + partitions + walls)',
  },
  // ≈ 160 mm CLT at ≈ 4.5 kN/m³ ≈ 0.7 kPa, plus screed, finishes, partitions and walls.
  clt: {
    pa: 2000,
    id: 'mass.default.floor.clt',
    source:
      'common practice, no source (≈ 160 mm CLT ≈ 0.7 kPa + screed and finishes + partitions + walls)',
  },
  // A floor on the ground moves with the ground: no storey mass.
  'on-grade': {
    pa: 0,
    id: 'mass.default.floor.on-grade',
    source: 'a floor on grade moves with the ground and adds no storey mass',
  },
};

/** Default seismic weight per m² of roof (taken over the top storey's floor area), in Pa. */
export const ROOF_UNIT_WEIGHTS: Readonly<Record<RoofConstruction, UnitWeightDefault>> = {
  light: {
    pa: 700,
    id: 'mass.default.roof.light',
    source:
      'common practice, no source (rafters or trusses, sheathing, light roofing, ceiling, half the top-storey walls)',
  },
  'heavy-tile': {
    pa: 1300,
    id: 'mass.default.roof.heavy-tile',
    source:
      'common practice, no source (as a light roof with clay or concrete tiles ≈ 0.6 kPa added)',
  },
  clt: {
    pa: 1500,
    id: 'mass.default.roof.clt',
    source: 'common practice, no source (CLT roof panels, insulation, membrane, ceiling)',
  },
  green: {
    pa: 3000,
    id: 'mass.default.roof.green',
    source:
      'common practice, no source (extensive green roof, saturated substrate ≈ 1.5 kPa, on timber deck)',
  },
};
