import type { ConnectorInput, Direction, WallInput, WallType } from '../survey/survey-input.js';
import {
  CLT_TYPICAL,
  CLT_TYPICAL_SOURCE,
  cltWallResistance,
  type CltConnectors,
} from './clt-connectors.js';
import { Findings } from './findings.js';
import {
  PLAUSIBLE as PLAUSIBLE_RANGES,
  plausible,
  rangeText,
  type PlausibleRange,
} from './plausible-ranges.js';
import { WALL_UNIT_VALUES } from './wall-unit-values.js';

/** Module-local alias: read once, not through an import binding in hot loops. */
const PLAUSIBLE = PLAUSIBLE_RANGES;

/** How a wall entered the storey model. */
export type WallTreatment =
  /** Counted as a shear wall in storey stiffness and strength. */
  | 'shear-wall'
  /** A rocking wall: left out of the shear-wall stiffness and strength (see calc/rocking). */
  | 'excluded-rocking'
  /** Storey, direction, length or type out of range: left out, listed as invalid. */
  | 'excluded-invalid'
  /** Values needed (user values, a usable height) are missing: left out, listed. */
  | 'excluded-unknown';

/** One wall's share of its storey's lateral stiffness and strength. */
export interface WallContribution {
  wallId: string;
  /** Index of the wall in `survey.walls`. */
  index: number;
  storey: number;
  direction: Direction;
  type: WallType;
  treatment: WallTreatment;
  /** Lateral stiffness in N/m; null unless treatment is 'shear-wall'. */
  stiffnessNPerM: number | null;
  /** Lateral strength in N; null unless treatment is 'shear-wall'. */
  strengthN: number | null;
  /** 'table' (published per-length values), 'entered' (user values), 'connectors' (CLT), 'none'. */
  basis: 'table' | 'entered' | 'connectors' | 'none';
  source: string;
}

/** Plausible range of each connector field. */
const CONNECTOR_RANGE: Record<keyof ConnectorInput, PlausibleRange> = {
  holdDownCount: PLAUSIBLE.connectorCount,
  bracketCount: PLAUSIBLE.connectorCount,
  holdDownCapacityN: PLAUSIBLE.connectorCapacityN,
  bracketCapacityN: PLAUSIBLE.connectorCapacityN,
  holdDownStiffnessNPerM: PLAUSIBLE.connectorStiffnessNPerM,
  bracketStiffnessNPerM: PLAUSIBLE.connectorStiffnessNPerM,
};

/** An entered connector value, or null (typical value to be used), listing a bad entry. */
function connectorValue(
  connectors: ConnectorInput | null,
  key: keyof ConnectorInput,
  fallback: number,
  index: number,
  findings: Findings,
): number | null {
  const v = connectors === null ? null : connectors[key];
  if (v === null || v === undefined) return null;
  if (plausible(v, CONNECTOR_RANGE[key])) return v;
  findings.invalid(
    `walls[${index}].connectors.${key}`,
    `${String(v)} is not a number ${rangeText(CONNECTOR_RANGE[key])}; the typical value ${fallback} is used`,
  );
  return null;
}

/** Resolves one connector field into `out`, noting when the typical value was used. */
function resolveOne(
  c: ConnectorInput | null,
  key: keyof ConnectorInput,
  fallback: number,
  index: number,
  findings: Findings,
  typicalUsed: string[],
): number {
  const v = connectorValue(c, key, fallback, index, findings);
  if (v !== null) return v;
  typicalUsed.push(key);
  return fallback;
}

function resolveConnectors(
  wall: WallInput,
  index: number,
  findings: Findings,
  typicalUsed: string[],
): CltConnectors {
  const c = wall.connectors;
  // One angle bracket per metre, at least two (common practice, no source).
  const bracketDefault = Math.max(2, Math.ceil(wall.lengthM / CLT_TYPICAL.bracketSpacingM));
  return {
    holdDownCount: resolveOne(
      c,
      'holdDownCount',
      CLT_TYPICAL.holdDownCount,
      index,
      findings,
      typicalUsed,
    ),
    holdDownCapacityN: resolveOne(
      c,
      'holdDownCapacityN',
      CLT_TYPICAL.holdDownCapacityN,
      index,
      findings,
      typicalUsed,
    ),
    holdDownStiffnessNPerM: resolveOne(
      c,
      'holdDownStiffnessNPerM',
      CLT_TYPICAL.holdDownStiffnessNPerM,
      index,
      findings,
      typicalUsed,
    ),
    bracketCount: resolveOne(c, 'bracketCount', bracketDefault, index, findings, typicalUsed),
    bracketCapacityN: resolveOne(
      c,
      'bracketCapacityN',
      CLT_TYPICAL.bracketCapacityN,
      index,
      findings,
      typicalUsed,
    ),
    bracketStiffnessNPerM: resolveOne(
      c,
      'bracketStiffnessNPerM',
      CLT_TYPICAL.bracketStiffnessNPerM,
      index,
      findings,
      typicalUsed,
    ),
  };
}

/** One result object, always with the same shape (keeps the hot loop monomorphic). */
function contribution(
  wall: WallInput,
  index: number,
  treatment: WallTreatment,
  stiffnessNPerM: number | null,
  strengthN: number | null,
  basis: WallContribution['basis'],
  source: string,
): WallContribution {
  return {
    wallId: typeof wall.id === 'string' ? wall.id : String(wall.id),
    index,
    storey: wall.storey,
    direction: wall.direction,
    type: wall.type,
    treatment,
    stiffnessNPerM,
    strengthN,
    basis,
    source,
  };
}

/** Checks one user-entered unit value; false (and listed) when it is missing or out of range. */
function userValueOk(
  x: number | null,
  name: 'userUnitShearNPerM' | 'userUnitStiffnessNPerM2',
  wall: WallInput,
  index: number,
  findings: Findings,
): boolean {
  if (x === null) {
    findings.missing(
      `walls[${index}].${name}`,
      `wall ${wall.id} has no ${name}; it is left out of its storey's stiffness and strength`,
    );
    return false;
  }
  if (!plausible(x, PLAUSIBLE[name])) {
    findings.invalid(
      `walls[${index}].${name}`,
      `${String(x)} is not a number ${rangeText(PLAUSIBLE[name])}; wall ${wall.id} left out`,
    );
    return false;
  }
  return true;
}

const SHEAR_TERM_TEXT =
  'Sheathed wall stiffness is Ga·L/h, the shear term of SDPWS eq. (4.3-1); bending and hold-down slip are left out, so narrow wall segments come out too stiff.';
const SHEAR_TERM_SOURCE =
  'AWC SDPWS-2015 eq. (4.3-1), shear and nail-slip term only (modelling choice)';
const ROCKING_TEXT =
  'Rocking walls are left out of the shear-wall storey stiffness, strength and centre of rigidity; the rocking assessment covers them.';
const ROCKING_SOURCE =
  'modelling choice: a wall that uplifts does not act as a linear shear spring (Housner 1963, BSSA 53(2):403)';
const CLT_SOURCE =
  'CLT wall governed by hold-downs (rocking) and angle brackets (sliding), rigid panel, gravity neglected';

/** The wall's values before the overflow guard of {@link wallContribution}. */
function wallContributionUnchecked(
  wall: WallInput,
  index: number,
  storeyHeights: readonly (number | null)[],
  findings: Findings,
): WallContribution {
  const storey = wall.storey;
  if (!Number.isInteger(storey) || storey < 0 || storey >= storeyHeights.length) {
    findings.invalid(
      `walls[${index}].storey`,
      `storey index ${String(storey)} does not exist (the building has ${storeyHeights.length} ${storeyHeights.length === 1 ? 'storey' : 'storeys'}); wall left out`,
    );
    return contribution(
      wall,
      index,
      'excluded-invalid',
      null,
      null,
      'none',
      'storey index out of range',
    );
  }
  if (wall.direction !== 'x' && wall.direction !== 'y') {
    findings.invalid(
      `walls[${index}].direction`,
      `direction ${String(wall.direction)} is not 'x' or 'y'; wall left out`,
    );
    return contribution(
      wall,
      index,
      'excluded-invalid',
      null,
      null,
      'none',
      'direction not x or y',
    );
  }
  if (Array.isArray(wall.devices) && wall.devices.length > 0) {
    findings.assume(
      `wall.devices.${index}`,
      `Wall ${wall.id} has supplemental devices (${wall.devices.join(', ')}); they are not modelled and call for a detailed assessment.`,
      'scope of this screening model (common practice)',
    );
  }
  if (wall.type === 'rocking') {
    return contribution(
      wall,
      index,
      'excluded-rocking',
      null,
      null,
      'none',
      'rocking wall: assessed by the rocking module',
    );
  }
  if (!plausible(wall.lengthM, PLAUSIBLE.wallLengthM)) {
    findings.invalid(
      `walls[${index}].lengthM`,
      `length ${String(wall.lengthM)} m is not a number ${rangeText(PLAUSIBLE.wallLengthM)} m; wall left out`,
    );
    return contribution(wall, index, 'excluded-invalid', null, null, 'none', 'length out of range');
  }
  const L = wall.lengthM;

  if (wall.type === 'user') {
    const v = wall.userUnitShearNPerM;
    const k = wall.userUnitStiffnessNPerM2;
    const okV = userValueOk(v, 'userUnitShearNPerM', wall, index, findings);
    const okK = userValueOk(k, 'userUnitStiffnessNPerM2', wall, index, findings);
    if (!okV || !okK) {
      return contribution(
        wall,
        index,
        'excluded-unknown',
        null,
        null,
        'none',
        'user values missing',
      );
    }
    return contribution(
      wall,
      index,
      'shear-wall',
      (k as number) * L,
      (v as number) * L,
      'entered',
      'unit shear and unit stiffness entered in the survey',
    );
  }

  // The remaining types need the wall height: its own, else the storey's.
  let h: number | null;
  if (wall.heightM !== null && plausible(wall.heightM, PLAUSIBLE.wallHeightM)) h = wall.heightM;
  else {
    if (wall.heightM !== null) {
      findings.invalid(
        `walls[${index}].heightM`,
        `height ${String(wall.heightM)} m is not a number ${rangeText(PLAUSIBLE.wallHeightM)} m; the storey height is used`,
      );
    }
    h = storeyHeights[storey] ?? null;
  }
  if (h === null) {
    findings.missing(
      `walls[${index}].heightM`,
      `no usable wall or storey height; wall ${wall.id} left out`,
    );
    return contribution(wall, index, 'excluded-unknown', null, null, 'none', 'no usable height');
  }

  if (wall.type === 'clt-bracketed') {
    const typicalUsed: string[] = [];
    const connectors = resolveConnectors(wall, index, findings, typicalUsed);
    const r = cltWallResistance(connectors, L, h);
    let source = CLT_SOURCE;
    if (typicalUsed.length > 0) {
      const list = typicalUsed.join(', ');
      source = `${CLT_SOURCE}; typical values used for ${list}`;
      findings.assume(
        `wall.clt-typical.${index}`,
        `CLT wall ${wall.id}: typical connector values used for ${list} (not entered).`,
        CLT_TYPICAL_SOURCE,
      );
    }
    return contribution(
      wall,
      index,
      'shear-wall',
      r.stiffnessNPerM,
      r.strengthN,
      'connectors',
      source,
    );
  }

  const unit = WALL_UNIT_VALUES[wall.type];
  if (unit === undefined) {
    findings.invalid(
      `walls[${index}].type`,
      `wall type ${String(wall.type)} is unknown; wall left out`,
    );
    return contribution(wall, index, 'excluded-invalid', null, null, 'none', 'unknown wall type');
  }
  return contribution(
    wall,
    index,
    'shear-wall',
    (unit.apparentShearStiffnessNPerM * L) / h,
    unit.unitShearNPerM * L,
    'table',
    unit.source,
  );
}

/**
 * Lateral stiffness and strength of one wall, with their basis:
 *
 * - `wsp-*`, `gypsum`, `diagonal-boards`, `unsheathed`: strength vs·L and stiffness Ga·L/h
 *   from {@link WALL_UNIT_VALUES} (shear term of AWC SDPWS eq. 4.3-1; the bending and
 *   hold-down terms are left out because grouped lengths hide each segment's aspect ratio,
 *   so slender segments are stiffer here than in reality);
 * - `user`: the entered unit shear × L and unit stiffness × L;
 * - `clt-bracketed`: from the connectors ({@link cltWallResistance}), blanks filled with
 *   typical values that are listed as such;
 * - `rocking`: excluded from the shear-wall model (the rocking module assesses it).
 *
 * Never throws; unusable walls are excluded and listed in `findings`.
 */
export function wallContribution(
  wall: WallInput,
  index: number,
  storeyHeights: readonly (number | null)[],
  findings: Findings,
): WallContribution {
  const c = wallContributionUnchecked(wall, index, storeyHeights, findings);
  if (
    c.treatment === 'shear-wall' &&
    !(Number.isFinite(c.stiffnessNPerM) && Number.isFinite(c.strengthN))
  ) {
    findings.invalid(`walls[${index}]`, `wall ${c.wallId} values overflow; wall left out`);
    c.treatment = 'excluded-invalid';
    c.stiffnessNPerM = null;
    c.strengthN = null;
    c.basis = 'none';
    c.source = 'values overflow';
  }
  return c;
}

/**
 * Lists, once per result, the modelling assumptions behind a set of wall contributions: the
 * SDPWS shear-term stiffness of sheathed walls, and the exclusion of rocking walls.
 */
export function noteWallAssumptions(
  contributions: readonly WallContribution[],
  findings: Findings,
): void {
  let table = false;
  let rocking = false;
  for (const c of contributions) {
    if (c.basis === 'table') table = true;
    else if (c.treatment === 'excluded-rocking') rocking = true;
  }
  if (table) findings.assume('wall.sdpws-shear-term', SHEAR_TERM_TEXT, SHEAR_TERM_SOURCE);
  if (rocking) findings.assume('wall.rocking-excluded', ROCKING_TEXT, ROCKING_SOURCE);
}
