/**
 * The number fields of a survey, by field path pattern (list indices as `*`, as in the
 * schema's messages). Hard limits follow the stored schema exactly (forms/schema/limits.ts
 * and survey-record.ts), so a value the field accepts always stores. The usual ranges only
 * warn; their sources are beside them.
 */
import { limits as L, pathPattern } from '../schema/index.js';
import type { NumberSpec } from './number-spec.js';

const CM = 0.01;
const MM = 0.001;

/**
 * Usual storey height of timber buildings, 2–6 m: the screening brief ("outside
 * about 2–6 m"); common practice, no source.
 */
export const USUAL_STOREY_HEIGHT_M = { min: 2, max: 6 } as const;
/**
 * Usual largest CLT panel: about 15 m long and 0.4 m thick (press and transport sizes);
 * common practice, no source.
 */
export const USUAL_CLT_PANEL = { maxLengthM: 15, maxThicknessM: 0.4, minThicknessM: 0.06 } as const;

const length = (label: NumberSpec['label'], extra: Partial<NumberSpec> = {}): NumberSpec => ({
  label,
  quantity: 'length',
  min: 0,
  minExclusive: true,
  max: L.MAX_PLAN_M,
  ...extra,
});
const force = (label: NumberSpec['label']): NumberSpec => ({
  label,
  quantity: 'force',
  min: 0,
  max: L.MAX_FORCE_N,
});
const stiffness = (label: NumberSpec['label']): NumberSpec => ({
  label,
  quantity: 'stiffness',
  min: 0,
  max: L.MAX_STIFFNESS_N_PER_M,
});
const count = (label: NumberSpec['label']): NumberSpec => ({
  label,
  quantity: 'count',
  min: 0,
  max: L.MAX_CONNECTOR_COUNT,
  integer: true,
});
const accel = (label: NumberSpec['label'], extra: Partial<NumberSpec> = {}): NumberSpec => ({
  label,
  quantity: 'acceleration',
  min: 0,
  max: L.MAX_ACCELERATION_G,
  // Above 1.5 g a spectral value is rare even near a fault; a likely unit slip (%g typed
  // as g). Common practice, no source.
  usualMax: 1.5,
  example: 0.25,
  ...extra,
});
const period = (label: NumberSpec['label']): NumberSpec => ({
  label,
  quantity: 'period',
  min: 0,
  minExclusive: true,
  max: L.MAX_PERIOD_S,
  example: 0.5,
});

/** Specs by path pattern. */
export const NUMBER_SPECS: Readonly<Record<string, NumberSpec>> = {
  'location.lat': {
    label: 'field.lat',
    quantity: 'coordinate',
    min: -90,
    max: 90,
    required: true,
    example: 45.5,
  },
  'location.lon': {
    label: 'field.lon',
    quantity: 'coordinate',
    min: -180,
    max: 180,
    required: true,
    example: 7.25,
  },
  'building.planXM': length('field.planX', { usualMax: 100, example: 12 }),
  'building.planYM': length('field.planY', { usualMax: 100, example: 9 }),
  'building.storeys.*.heightM': length('field.storeyHeight', {
    max: L.MAX_HEIGHT_M,
    required: true,
    usualMin: USUAL_STOREY_HEIGHT_M.min,
    usualMax: USUAL_STOREY_HEIGHT_M.max,
    example: 2.7,
  }),
  'building.storeys.*.floorAreaM2': {
    label: 'field.floorArea',
    quantity: 'area',
    min: 0,
    minExclusive: true,
    max: L.MAX_AREA_M2,
    required: true,
    // Under 10 m² is a shed, over 10 000 m² per storey a very large timber building;
    // common practice, no source.
    usualMin: 10,
    usualMax: 10_000,
    example: 120,
  },
  'building.storeys.*.unitWeightPa': {
    label: 'field.floorUnitWeight',
    quantity: 'pressure',
    min: 0,
    minExclusive: true,
    max: L.MAX_UNIT_WEIGHT_PA,
    // 0.3–8 kPa spans a bare joist floor to a concrete-topped floor; common practice, no source.
    usualMin: 300,
    usualMax: 8000,
    example: 1500,
  },
  'building.roofUnitWeightPa': {
    label: 'field.roofUnitWeight',
    quantity: 'pressure',
    min: 0,
    minExclusive: true,
    max: L.MAX_UNIT_WEIGHT_PA,
    usualMin: 200,
    usualMax: 8000,
    example: 800,
  },
  'walls.*.lengthM': length('field.wallLength', { required: true, usualMax: 200, example: 6 }),
  'walls.*.heightM': length('field.wallHeight', {
    max: L.MAX_HEIGHT_M,
    usualMin: USUAL_STOREY_HEIGHT_M.min,
    usualMax: USUAL_CLT_PANEL.maxLengthM,
    example: 2.7,
  }),
  'walls.*.positionM': length('field.wallPosition', {
    min: -L.MAX_PLAN_M,
    minExclusive: false,
    example: 4,
  }),
  'walls.*.rocking.thicknessM': {
    label: 'field.thickness',
    quantity: 'smallLength',
    min: 0,
    minExclusive: true,
    max: L.MAX_THICKNESS_M,
    usualMin: USUAL_CLT_PANEL.minThicknessM,
    usualMax: USUAL_CLT_PANEL.maxThicknessM,
    usualNote: 'check.note.cltPanel',
    example: 0.12,
  },
  'walls.*.rocking.selfWeightN': force('field.selfWeight'),
  'walls.*.rocking.gravityLoadN': force('field.gravityLoad'),
  'walls.*.rocking.postTensionN': force('field.postTension'),
  'walls.*.connectors.holdDownCount': count('field.holdDownCount'),
  'walls.*.connectors.holdDownCapacityN': force('field.holdDownCapacity'),
  'walls.*.connectors.holdDownStiffnessNPerM': stiffness('field.holdDownStiffness'),
  'walls.*.connectors.bracketCount': count('field.bracketCount'),
  'walls.*.connectors.bracketCapacityN': force('field.bracketCapacity'),
  'walls.*.connectors.bracketStiffnessNPerM': stiffness('field.bracketStiffness'),
  'walls.*.userUnitShearNPerM': {
    label: 'field.userUnitShear',
    quantity: 'unitShear',
    min: 0,
    max: L.MAX_STIFFNESS_N_PER_M,
  },
  'walls.*.userUnitStiffnessNPerM2': {
    label: 'field.userUnitStiffness',
    quantity: 'unitStiffness',
    min: 0,
    max: L.MAX_STIFFNESS_N_PER_M,
  },
  'observations.uplift.*.gapM': {
    label: 'field.upliftGap',
    quantity: 'smallLength',
    min: 0,
    max: L.MAX_GAP_M,
    required: true,
    // A heel gap over 50 mm means a wall far into rocking or a failed hold-down: possible,
    // but worth a second look. Common practice, no source.
    usualMax: 50 * MM,
    example: 5 * MM,
  },
  'observations.residualDrift.*.offsetM': {
    label: 'field.driftOffset',
    quantity: 'smallLength',
    min: -L.MAX_HEIGHT_M,
    max: L.MAX_HEIGHT_M,
    required: true,
    // More than 20 cm of lean over one storey is rare in a standing building; common practice.
    usualMax: 20 * CM,
    example: 12 * MM,
  },
  'observations.residualDrift.*.overHeightM': length('field.driftOverHeight', {
    max: L.MAX_HEIGHT_M,
    required: true,
    usualMin: 0.5,
    usualMax: USUAL_STOREY_HEIGHT_M.max,
    example: 2.5,
  }),
  'observations.residualDrift.*.tiltRad': {
    label: 'field.driftTilt',
    quantity: 'angle',
    min: -L.MAX_TILT_RAD,
    max: L.MAX_TILT_RAD,
    required: true,
    // 5° of lean (8.7 % drift) is far beyond any residual drift state; common practice.
    usualMax: (5 * Math.PI) / 180,
    example: (0.5 * Math.PI) / 180,
  },
  'hazard.ag': accel('field.ag', { required: true }),
  'hazard.S': {
    label: 'field.soilFactor',
    quantity: 'factor',
    min: 0,
    minExclusive: true,
    max: 10,
    // EN 1998-1 Tables 3.2/3.3 recommend S from 1.0 to 1.8.
    usualMin: 1,
    usualMax: 2,
    example: 1.2,
  },
  'hazard.TB': period('field.TB'),
  'hazard.TC': period('field.TC'),
  'hazard.TD': period('field.TD'),
  'hazard.damping': {
    label: 'field.damping',
    quantity: 'percent',
    min: 0,
    max: L.MAX_DAMPING_RATIO,
    // 2–20 % spans what a timber building can plausibly have; common practice, no source.
    usualMin: 0.02,
    usualMax: 0.2,
    example: 0.05,
  },
  'hazard.SDS': accel('field.SDS', { minExclusive: true, required: true, example: 1.0 }),
  'hazard.SD1': accel('field.SD1', { required: true, example: 0.6 }),
  'hazard.TL': { ...period('field.TL'), required: true, example: 8 },
  'hazard.pga': accel('field.pga', { required: true, example: 0.3 }),
  'hazard.sa03': accel('field.sa03', { required: true, example: 0.7 }),
  'hazard.sa10': accel('field.sa10', { required: true, example: 0.3 }),
};

/** The spec of the number field at `path` (e.g. 'walls.3.lengthM'), or null. */
export function numberSpecFor(path: string): NumberSpec | null {
  return NUMBER_SPECS[pathPattern(path.split('.'))] ?? null;
}

/**
 * The spec of a wall length or height for a mass-timber or rocking panel: same limits,
 * but warns above the usual panel size.
 */
export const PANEL_LENGTH_SPEC: NumberSpec = {
  ...length('field.panelLength', { required: true, example: 3 }),
  usualMax: USUAL_CLT_PANEL.maxLengthM,
  usualNote: 'check.note.cltPanel',
};
export const PANEL_HEIGHT_SPEC: NumberSpec = {
  ...length('field.panelHeight', { max: L.MAX_HEIGHT_M, example: 2.7 }),
  usualMax: USUAL_CLT_PANEL.maxLengthM,
  usualNote: 'check.note.cltPanel',
};
