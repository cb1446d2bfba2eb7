import type { Direction, WallInput } from '../survey/survey-input.js';
import { Findings } from './findings.js';
import { PLAUSIBLE as PLAUSIBLE_RANGES, plausible } from './plausible-ranges.js';
import type { WallContribution } from './wall-contribution.js';
import { storeyName } from './storey-name.js';

/** Module-local alias: read once, not through an import binding in hot loops. */
const PLAUSIBLE = PLAUSIBLE_RANGES;

/** Lateral stiffness and strength of one storey in one direction. */
export interface StoreyLateral {
  storey: number;
  /** Sum of the shear walls' stiffnesses, in N/m; null when no shear wall values are known. */
  stiffnessNPerM: number | null;
  /** Sum of the shear walls' strengths, in N; null when no shear wall values are known. */
  strengthN: number | null;
  /** Shear walls counted. */
  shearWallCount: number;
  /** Rocking walls in this storey and direction (not counted in the values above). */
  rockingWallCount: number;
  /** False when some walls had to be left out for missing values: the sums are then lower bounds. */
  complete: boolean;
  /** Distinct sources of the values summed. */
  sources: string[];
  /**
   * Centre of rigidity Σki·pi / Σki of the shear walls, as a plan coordinate perpendicular
   * to the direction (y for walls along x), in m; null when a wall lacks a position or the
   * stiffness is not > 0.
   */
  centreOfRigidityM: number | null;
}

/**
 * Storey stiffness and strength per storey for one direction: the walls along that direction
 * act as parallel springs (rigid diaphragm) and all reach their strength together (ductile
 * nailed walls). A storey without any usable wall along the direction is unknown (null),
 * not zero: record bare walls as 'unsheathed' to say a storey really has no bracing.
 */
export function storeyLateral(
  storeyCount: number,
  direction: Direction,
  walls: readonly WallContribution[],
  surveyWalls: readonly WallInput[],
  findings: Findings,
): StoreyLateral[] {
  const out: StoreyLateral[] = new Array<StoreyLateral>(storeyCount);
  for (let i = 0; i < storeyCount; i++) {
    out[i] = {
      storey: i,
      stiffnessNPerM: null,
      strengthN: null,
      shearWallCount: 0,
      rockingWallCount: 0,
      complete: true,
      sources: [],
      centreOfRigidityM: null,
    };
  }
  // Σk·position per storey, NaN once a counted wall has no usable position.
  const moment: number[] = [];
  for (let i = 0; i < storeyCount; i++) moment.push(0);
  let anyWall = false;
  for (const w of walls) {
    if (w.direction !== direction) continue; // callers may pass both directions' walls
    const s = out[w.storey];
    if (s === undefined) continue; // invalid storey, already listed
    if (w.treatment === 'excluded-rocking') {
      s.rockingWallCount++;
      anyWall = true;
    } else if (w.treatment === 'excluded-unknown') {
      s.complete = false;
      anyWall = true;
    } else if (w.treatment === 'shear-wall') {
      anyWall = true;
      s.shearWallCount++;
      s.stiffnessNPerM = (s.stiffnessNPerM ?? 0) + (w.stiffnessNPerM ?? 0);
      s.strengthN = (s.strengthN ?? 0) + (w.strengthN ?? 0);
      if (!s.sources.includes(w.source)) s.sources.push(w.source);
      const pos = surveyWalls[w.index]?.positionM ?? null;
      moment[w.storey] = plausible(pos, PLAUSIBLE.positionM)
        ? moment[w.storey]! + (w.stiffnessNPerM ?? 0) * pos
        : NaN;
    }
  }
  for (let i = 0; i < storeyCount; i++) {
    const s = out[i]!;
    const k = s.stiffnessNPerM;
    const m = moment[i]!;
    if (k !== null && k > 0 && !Number.isNaN(m)) s.centreOfRigidityM = m / k;
  }
  if (!anyWall) {
    findings.missing(
      `walls (${direction})`,
      `no walls along ${direction}: the period along ${direction} is empirical, storey stiffness and strength are unknown`,
    );
    return out;
  }
  findings.assume(
    'storey.parallel-walls',
    'Walls along a direction act in parallel under a rigid diaphragm, and all reach their strength together.',
    'common practice for rigid-diaphragm storey models (ASCE 7-16 §12.3.1 idealisation)',
  );
  for (const s of out) {
    if (s.shearWallCount === 0) {
      const why =
        s.rockingWallCount > 0
          ? 'only rocking walls (assessed by the rocking module)'
          : 'no usable walls recorded (record bare walls as "unsheathed")';
      findings.missing(
        `storeys[${s.storey}].walls.${direction}`,
        `${why}, so its shear-wall stiffness and strength are unknown`,
      );
    } else if (!s.complete) {
      findings.assume(
        `storey.partial.${direction}.${s.storey}`,
        `${capitalStorey(s.storey)} along ${direction}: some walls lack values; stiffness and strength are lower bounds.`,
        'walls with missing values left out (modelling choice)',
      );
    }
  }
  return out;
}

/** "Storey 1 (ground)", for the start of a sentence. */
function capitalStorey(index: number): string {
  const name = storeyName(index);
  return name[0]!.toUpperCase() + name.slice(1);
}
