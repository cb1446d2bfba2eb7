import { G } from '../units/gravity.js';
import type { BuildingInput, FloorConstruction, RoofConstruction } from '../survey/survey-input.js';
import { Findings } from './findings.js';
import { PLAUSIBLE as PLAUSIBLE_RANGES, plausible, rangeText } from './plausible-ranges.js';
import { FLOOR_UNIT_WEIGHTS, ROOF_UNIT_WEIGHTS } from './unit-weights.js';
import { storeyName } from './storey-name.js';

/** Module-local alias: read once, not through an import binding in hot loops. */
const PLAUSIBLE = PLAUSIBLE_RANGES;
const g = G;

/**
 * The seismic mass lumped at the top of one storey: the floor of the storey above, or the
 * roof for the top storey, over its floor area.
 */
export interface StoreyMass {
  /** Storey index (0 = ground storey); the mass sits on top of this storey. */
  storey: number;
  /** Mass in kg; null when the area or construction is unusable. */
  massKg: number | null;
  /** Whose weight it is: the floor of storey `storey + 1`, or the roof. */
  carrier: 'floor' | 'roof';
  construction: FloorConstruction | RoofConstruction;
  /** Area the unit weight acts on, in m² (the roof takes the top storey's floor area). */
  areaM2: number | null;
  /** Unit weight used, in Pa. */
  unitWeightPa: number | null;
  /** 'entered': the survey's unit weight; 'default': the construction's default; 'unknown'. */
  basis: 'entered' | 'default' | 'unknown';
  /** Source of the unit weight (or why the mass is unknown). */
  source: string;
}

const ENTERED_SOURCE = 'unit weight entered in the survey';

function weightField(top: boolean, carrierIndex: number): string {
  return top ? 'building.roofUnitWeightPa' : `building.storeys[${carrierIndex}].unitWeightPa`;
}

/**
 * Seismic mass per storey from floor areas and unit weights (entered, else the construction
 * defaults of {@link FLOOR_UNIT_WEIGHTS} and {@link ROOF_UNIT_WEIGHTS}). Mass = area ×
 * unit weight / g. Never throws: unusable values give a null mass and a missing-input entry.
 */
export function storeyMasses(building: BuildingInput, findings: Findings): StoreyMass[] {
  const storeys = building.storeys;
  const n = storeys.length;
  const out: StoreyMass[] = new Array<StoreyMass>(n);
  if (n > 0 && storeys[0]!.floorConstruction !== 'on-grade') {
    findings.assume(
      'mass.ground-floor',
      'The ground storey’s own floor sits at the base of the model and adds no storey mass.',
      'fixed-base shear-building idealisation (common practice)',
    );
  }
  findings.assume(
    'mass.lumped',
    'Each storey’s mass is lumped at the floor (or roof) on top of it; the roof takes the top storey’s floor area.',
    'shear-building idealisation, EN 1998-1:2004 §4.3.1 and §4.3.3.2 (lumped floor masses)',
  );
  for (let i = 0; i < n; i++) {
    const top = i === n - 1;
    const carrierIndex = top ? i : i + 1;
    const carrierStorey = storeys[carrierIndex]!;
    const construction: FloorConstruction | RoofConstruction = top
      ? building.roofConstruction
      : carrierStorey.floorConstruction;
    const entered = top ? building.roofUnitWeightPa : carrierStorey.unitWeightPa;
    const table = top
      ? ROOF_UNIT_WEIGHTS[construction as RoofConstruction]
      : FLOOR_UNIT_WEIGHTS[construction as FloorConstruction];

    let unitWeightPa: number | null = null;
    let basis: StoreyMass['basis'] = 'unknown';
    let source: string;
    if (entered !== null && plausible(entered, PLAUSIBLE.unitWeightPa)) {
      unitWeightPa = entered;
      basis = 'entered';
      source = ENTERED_SOURCE;
    } else {
      if (entered !== null) {
        findings.invalid(
          weightField(top, carrierIndex),
          `unit weight ${String(entered)} Pa is not a number ${rangeText(PLAUSIBLE.unitWeightPa)} Pa; the default is used`,
        );
      }
      if (table === undefined) {
        source = `unknown construction '${String(construction)}'`;
        findings.invalid(
          top ? 'building.roofConstruction' : `building.storeys[${carrierIndex}].floorConstruction`,
          `construction '${String(construction)}' has no default unit weight; mass of ${storeyName(i)} unknown`,
        );
      } else {
        unitWeightPa = table.pa;
        basis = 'default';
        source = table.source;
        const id = table.id;
        if (!findings.has(id)) {
          findings.assume(
            id,
            `${top ? 'Roof' : 'Floor'} construction '${construction}' taken at ${table.pa} Pa seismic weight per m².`,
            table.source,
          );
        }
      }
    }

    const area = carrierStorey.floorAreaM2;
    let areaM2: number | null = null;
    if (plausible(area, PLAUSIBLE.floorAreaM2)) areaM2 = area;
    else {
      findings.invalid(
        `building.storeys[${carrierIndex}].floorAreaM2`,
        `floor area ${String(area)} m² is not a number ${rangeText(PLAUSIBLE.floorAreaM2)} m²; mass of ${storeyName(i)} unknown`,
      );
    }
    let massKg = areaM2 !== null && unitWeightPa !== null ? (areaM2 * unitWeightPa) / g : null;
    if (massKg !== null && !Number.isFinite(massKg)) {
      findings.invalid(
        weightField(top, carrierIndex),
        `area × unit weight overflows; mass of ${storeyName(i)} unknown`,
      );
      massKg = null;
    }
    if (massKg === 0) {
      findings.invalid(
        weightField(top, carrierIndex),
        `${storeyName(i)} carries no mass (unit weight 0 or a floor on grade above the ground storey); modal analysis needs every storey’s mass > 0`,
      );
    }
    out[i] = {
      storey: i,
      massKg,
      carrier: top ? 'roof' : 'floor',
      construction,
      areaM2,
      unitWeightPa,
      basis,
      source,
    };
  }
  return out;
}
