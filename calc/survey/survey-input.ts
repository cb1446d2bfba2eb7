/**
 * What the calculation reads from a survey: the building, its walls, what the inspector
 * observed, the hazard and any on-site measurement. Plain data, SI units throughout
 * (m, m², N, Pa, kg, s, rad). The stored record (forms/) is a superset of this shape and is
 * checked against it at compile time, so the two cannot drift apart.
 *
 * Absent values are `null` (never NaN): the calculation then defaults them and lists the
 * default in its confidence statement.
 */
import type { SpectrumSpec } from '../spectra/spectrum-spec.js';

/** Plan direction a wall resists along (its length runs along this axis). */
export type Direction = 'x' | 'y';

/** The lateral system, as the inspector sees it. */
export type StructuralSystem =
  | 'light-frame' // studs with sheathing: houses, small apartments
  | 'mass-timber-panel' // CLT or other solid panels on hold-downs and angle brackets
  | 'rocking-wall' // walls designed to uplift: post-tensioned or free-standing mass timber
  | 'heavy-timber-frame'; // posts and beams (glulam or sawn) with braces or knee braces

/** Seismic design level of the era the building dates from (Hazus design levels). */
export type CodeLevel = 'pre-code' | 'low' | 'moderate' | 'high' | 'unknown';

/** Main use of the building. */
export type Occupancy =
  | 'single-family'
  | 'multi-family'
  | 'commercial'
  | 'industrial'
  | 'public-assembly'
  | 'essential-facility';

/** Construction of a floor (the one you stand on in that storey) or the roof. */
export type FloorConstruction =
  | 'light-timber' // joists with boards or panels
  | 'timber-concrete' // timber with a concrete topping
  | 'clt' // solid timber panels
  | 'on-grade'; // slab or floor on the ground: adds no storey mass

export type RoofConstruction = 'light' | 'heavy-tile' | 'clt' | 'green';

/** One storey, counted from the ground up. */
export interface StoreyInput {
  heightM: number;
  floorAreaM2: number;
  floorConstruction: FloorConstruction;
  /** Overrides the construction's default dead load, in Pa (N/m²). */
  unitWeightPa: number | null;
}

/**
 * How a wall resists lateral load. `wsp-*` are wood structural panel shear walls by panel
 * edge nail spacing in mm (150 / 100 / 75 / 50 ≈ 6 / 4 / 3 / 2 in).
 */
export type WallType =
  | 'wsp-150'
  | 'wsp-100'
  | 'wsp-75'
  | 'wsp-50'
  | 'gypsum'
  | 'diagonal-boards'
  | 'unsheathed' // bare studs, e.g. an unbraced cripple wall
  | 'clt-bracketed' // CLT panel on hold-downs and angle brackets
  | 'rocking' // a wall allowed to uplift and rock
  | 'user'; // per-length strength and stiffness typed by the user

/** Supplemental devices are recorded but not modelled; their presence sends the wall to detailed assessment. */
export type SupplementalDevice = 'viscous-damper' | 'inerter' | 'clutch' | 'friction' | 'other';

/** Hold-downs and angle brackets of a mass-timber or rocking wall. Capacities in N, stiffness in N/m. */
export interface ConnectorInput {
  holdDownCount: number | null;
  holdDownCapacityN: number | null;
  holdDownStiffnessNPerM: number | null;
  bracketCount: number | null;
  bracketCapacityN: number | null;
  bracketStiffnessNPerM: number | null;
}

/** Extra data of a rocking wall. */
export interface RockingInput {
  thicknessM: number | null;
  /** Self weight in N; when null it comes from the panel volume and a timber density default. */
  selfWeightN: number | null;
  /** Gravity load carried on top of the wall, in N. */
  gravityLoadN: number | null;
  /** Total post-tension force, in N (0 when none). */
  postTensionN: number | null;
}

/** One wall, or (for light frame) the total length of one sheathing type on one line. */
export interface WallInput {
  id: string;
  /** Storey index, 0 = ground storey. */
  storey: number;
  direction: Direction;
  type: WallType;
  /** Length, or total length when several walls are grouped, in m. */
  lengthM: number;
  /** Wall height in m; null means the storey height. */
  heightM: number | null;
  /** Plan coordinate of the wall line perpendicular to `direction`, from the plan's origin corner, in m. */
  positionM: number | null;
  connectors: ConnectorInput | null;
  rocking: RockingInput | null;
  devices: SupplementalDevice[];
  /** For type 'user': nominal unit shear strength (N/m) and unit stiffness (N/m per m of wall). */
  userUnitShearNPerM: number | null;
  userUnitStiffnessNPerM2: number | null;
}

/** How a residual drift was measured. */
export type DriftMethod = 'offset' | 'tilt' | 'phone-tilt' | 'estimate';

/** Residual (permanent) drift of one storey in one direction. */
export interface ResidualDriftInput {
  storey: number;
  direction: Direction;
  /** Drift ratio (dimensionless, 0.01 = 1 %), already derived from the raw reading. */
  ratio: number;
  method: DriftMethod;
  /** The raw reading behind the ratio, kept for the record: offset over height, or tilt. */
  offsetM: number | null;
  overHeightM: number | null;
  tiltRad: number | null;
  /** One standard uncertainty of the ratio, when the method gives one. */
  uncertainty: number | null;
}

/** Uplift gap measured at the heel of one wall, in m. */
export interface UpliftInput {
  wallId: string;
  gapM: number;
}

/** Items of the observed-damage checklist. */
export type ChecklistItem =
  | 'cracked-or-split-members'
  | 'fastener-withdrawal'
  | 'hold-down-or-bracket-damage'
  | 'sill-plate-sliding'
  | 'foundation-movement'
  | 'leaning-cripple-wall-or-soft-storey'
  | 'falling-hazard'
  | 'ground-failure';

export type Severity = 'minor' | 'severe';

export interface ChecklistEntry {
  item: ChecklistItem;
  severity: Severity;
}

export interface ObservationsInput {
  uplift: UpliftInput[];
  residualDrift: ResidualDriftInput[];
  checklist: ChecklistEntry[];
  notes: string;
}

/** A fundamental frequency measured on site (ambient vibration). */
export interface MeasuredFrequencyInput {
  frequencyHz: number;
  dampingRatio: number | null;
  /** 0..1, from peak prominence. */
  confidence: number;
  direction: Direction | null;
}

export interface BuildingInput {
  system: StructuralSystem;
  codeLevel: CodeLevel;
  occupancy: Occupancy;
  /** Plan dimensions of the footprint along x and y, in m; null when unknown. */
  planXM: number | null;
  planYM: number | null;
  storeys: StoreyInput[];
  roofConstruction: RoofConstruction;
  /** Overrides the roof's default dead load, in Pa. */
  roofUnitWeightPa: number | null;
}

/** Everything `screen()` reads. */
export interface SurveyInput {
  building: BuildingInput;
  walls: WallInput[];
  observations: ObservationsInput;
  hazard: SpectrumSpec | null;
  measured: MeasuredFrequencyInput | null;
}
