import type { ConnectorInput, Direction, WallInput, WallType } from '../survey/survey-input.js';
import {
  CLT_TYPICAL,
  CLT_TYPICAL_SOURCE,
  cltWallResistance,
  type CltConnectors,
} from './clt-connectors.js';
import { Findings } from './findings.js';
import { plausible, rangeText, type PlausibleKey } from './plausible-ranges.js';
import { WALL_UNIT_VALUES } from './wall-unit-values.js';

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
const CONNECTOR_RANGE: Record<keyof ConnectorInput, PlausibleKey> = {
  holdDownCount: 'connectorCount',
  bracketCount: 'connectorCount',
  holdDownCapacityN: 'connectorCapacityN',
  bracketCapacityN: 'connectorCapacityN',
  holdDownStiffnessNPerM: 'connectorStiffnessNPerM',
  bracketStiffnessNPerM: 'connectorStiffnessNPerM',
};

function connectorValue(
  connectors: ConnectorInput | null,
  key: keyof ConnectorInput,
  fallback: number,
  field: string,
  findings: Findings,
): { value: number; typical: boolean } {
  const v = connectors === null ? null : connectors[key];
  if (v === null || v === undefined) return { value: fallback, typical: true };
  if (plausible(v, CONNECTOR_RANGE[key])) return { value: v, typical: false };
  findings.invalid(
    `${field}.${key}`,
    `${String(v)} is not a number ${rangeText(CONNECTOR_RANGE[key])}; the typical value ${fallback} is used`,
  );
  return { value: fallback, typical: true };
}

function resolveConnectors(
  wall: WallInput,
  field: string,
  findings: Findings,
): { connectors: CltConnectors; typicalUsed: string[] } {
  const c = wall.connectors;
  const typicalUsed: string[] = [];
  const pick = (key: keyof ConnectorInput, fallback: number): number => {
    const r = connectorValue(c, key, fallback, `${field}.connectors`, findings);
    if (r.typical) typicalUsed.push(key);
    return r.value;
  };
  // One angle bracket per metre, at least two (common practice, no source).
  const bracketDefault = Math.max(2, Math.ceil(wall.lengthM / CLT_TYPICAL.bracketSpacingM));
  const connectors: CltConnectors = {
    holdDownCount: pick('holdDownCount', CLT_TYPICAL.holdDownCount),
    holdDownCapacityN: pick('holdDownCapacityN', CLT_TYPICAL.holdDownCapacityN),
    holdDownStiffnessNPerM: pick('holdDownStiffnessNPerM', CLT_TYPICAL.holdDownStiffnessNPerM),
    bracketCount: pick('bracketCount', bracketDefault),
    bracketCapacityN: pick('bracketCapacityN', CLT_TYPICAL.bracketCapacityN),
    bracketStiffnessNPerM: pick('bracketStiffnessNPerM', CLT_TYPICAL.bracketStiffnessNPerM),
  };
  return { connectors, typicalUsed };
}

/** The wall's values before the overflow guard of {@link wallContribution}. */
function wallContributionUnchecked(
  wall: WallInput,
  index: number,
  storeyHeights: readonly (number | null)[],
  findings: Findings,
): WallContribution {
  const field = `walls[${index}]`;
  const base = {
    wallId: String(wall.id),
    index,
    storey: wall.storey,
    direction: wall.direction,
    type: wall.type,
  };
  const excluded = (treatment: WallTreatment, source: string): WallContribution => ({
    ...base,
    treatment,
    stiffnessNPerM: null,
    strengthN: null,
    basis: 'none',
    source,
  });

  if (!Number.isInteger(wall.storey) || wall.storey < 0 || wall.storey >= storeyHeights.length) {
    findings.invalid(
      `${field}.storey`,
      `storey ${String(wall.storey)} does not exist; wall left out`,
    );
    return excluded('excluded-invalid', 'storey index out of range');
  }
  if (wall.direction !== 'x' && wall.direction !== 'y') {
    findings.invalid(
      `${field}.direction`,
      `direction ${String(wall.direction)} is not 'x' or 'y'; wall left out`,
    );
    return excluded('excluded-invalid', 'direction not x or y');
  }
  if (wall.devices !== undefined && wall.devices.length > 0) {
    findings.assume(
      `wall.devices.${index}`,
      `Wall ${base.wallId} has supplemental devices (${wall.devices.join(', ')}); they are not modelled and call for a detailed assessment.`,
      'scope of this screening model (common practice)',
    );
  }
  if (wall.type === 'rocking') {
    findings.assume(
      'wall.rocking-excluded',
      'Rocking walls are left out of the shear-wall storey stiffness, strength and centre of rigidity; the rocking assessment covers them.',
      'modelling choice: a wall that uplifts does not act as a linear shear spring (Housner 1963, BSSA 53(2):403)',
    );
    return excluded('excluded-rocking', 'rocking wall: assessed by the rocking module');
  }
  if (!plausible(wall.lengthM, 'wallLengthM')) {
    findings.invalid(
      `${field}.lengthM`,
      `length ${String(wall.lengthM)} m is not a number ${rangeText('wallLengthM')} m; wall left out`,
    );
    return excluded('excluded-invalid', 'length not > 0');
  }
  const L = wall.lengthM;

  if (wall.type === 'user') {
    const v = wall.userUnitShearNPerM;
    const k = wall.userUnitStiffnessNPerM2;
    let ok = true;
    for (const [name, x] of [
      ['userUnitShearNPerM', v],
      ['userUnitStiffnessNPerM2', k],
    ] as const) {
      if (x === null) {
        findings.missing(
          `${field}.${name}`,
          `wall ${base.wallId} has no ${name}; it is left out of its storey's stiffness and strength`,
        );
        ok = false;
      } else if (!plausible(x, name)) {
        findings.invalid(
          `${field}.${name}`,
          `${String(x)} is not a number ${rangeText(name)}; wall ${base.wallId} left out`,
        );
        ok = false;
      }
    }
    if (!ok) return excluded('excluded-unknown', 'user values missing');
    return {
      ...base,
      treatment: 'shear-wall',
      stiffnessNPerM: (k as number) * L,
      strengthN: (v as number) * L,
      basis: 'entered',
      source: 'unit shear and unit stiffness entered in the survey',
    };
  }

  // The remaining types need the wall height: its own, else the storey's.
  let h: number | null = null;
  if (wall.heightM !== null && plausible(wall.heightM, 'wallHeightM')) h = wall.heightM;
  else {
    if (wall.heightM !== null) {
      findings.invalid(
        `${field}.heightM`,
        `height ${String(wall.heightM)} m is not a number ${rangeText('wallHeightM')} m; the storey height is used`,
      );
    }
    h = storeyHeights[wall.storey] ?? null;
  }
  if (h === null) {
    findings.missing(
      `${field}.heightM`,
      `no usable wall or storey height; wall ${base.wallId} left out`,
    );
    return excluded('excluded-unknown', 'no usable height');
  }

  if (wall.type === 'clt-bracketed') {
    const { connectors, typicalUsed } = resolveConnectors(wall, field, findings);
    const r = cltWallResistance(connectors, L, h);
    let source =
      'CLT wall governed by hold-downs (rocking) and angle brackets (sliding), rigid panel, gravity neglected';
    if (typicalUsed.length > 0) {
      source += `; typical values used for ${typicalUsed.join(', ')}`;
      findings.assume(
        `wall.clt-typical.${index}`,
        `CLT wall ${base.wallId}: typical connector values used for ${typicalUsed.join(', ')} (not entered).`,
        CLT_TYPICAL_SOURCE,
      );
    }
    return {
      ...base,
      treatment: 'shear-wall',
      stiffnessNPerM: r.stiffnessNPerM,
      strengthN: r.strengthN,
      basis: 'connectors',
      source,
    };
  }

  const unit = WALL_UNIT_VALUES[wall.type];
  if (unit === undefined) {
    findings.invalid(`${field}.type`, `wall type ${String(wall.type)} is unknown; wall left out`);
    return excluded('excluded-invalid', 'unknown wall type');
  }
  findings.assume(
    'wall.sdpws-shear-term',
    'Sheathed wall stiffness is Ga·L/h, the shear term of SDPWS eq. (4.3-1); bending and hold-down slip are left out, so narrow wall segments come out too stiff.',
    'AWC SDPWS-2015 eq. (4.3-1), shear and nail-slip term only (modelling choice)',
  );
  return {
    ...base,
    treatment: 'shear-wall',
    stiffnessNPerM: (unit.apparentShearStiffnessNPerM * L) / h,
    strengthN: unit.unitShearNPerM * L,
    basis: 'table',
    source: unit.source,
  };
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
    return {
      ...c,
      treatment: 'excluded-invalid',
      stiffnessNPerM: null,
      strengthN: null,
      basis: 'none',
      source: 'values overflow',
    };
  }
  return c;
}
