import { PLAUSIBLE as PLAUSIBLE_RANGES, plausible } from './plausible-ranges.js';
import type { WallContribution } from './wall-contribution.js';
import type { Direction, WallInput } from '../survey/survey-input.js';

/** Module-local alias: read once, not through an import binding in hot loops. */
const PLAUSIBLE = PLAUSIBLE_RANGES;

/**
 * Static eccentricity between the centre of rigidity of the walls along `direction` and the
 * centre of mass, as a signed fraction of the plan dimension perpendicular to the direction
 * (the lever arm of torsion), per storey.
 *
 * For walls along x, their `positionM` is their y coordinate; CRy = Σ ki·yi / Σ ki, and the
 * result is (CRy − CMy) / planY. The centre of mass is taken at the plan centre (uniform floor
 * mass). Definitions as in EN 1998-1:2004 §4.2.3.2(6) (e0 between centre of stiffness and
 * centre of mass) and ASCE 7-16 §12.8.4 (dimension perpendicular to the force).
 *
 * A storey's value is null when the plan dimension is unknown, any counted wall lacks a
 * position, or its shear-wall stiffness is not > 0.
 */
export function torsionalEccentricity(
  storeyCount: number,
  direction: Direction,
  contributions: readonly WallContribution[],
  walls: readonly WallInput[],
  planDimensionM: number | null,
): (number | null)[] {
  const sumK = new Float64Array(storeyCount);
  const sumKy = new Float64Array(storeyCount);
  const unknown = new Uint8Array(storeyCount);
  for (const c of contributions) {
    if (c.direction !== direction || c.treatment !== 'shear-wall') continue;
    const k = c.stiffnessNPerM ?? 0;
    const pos = walls[c.index]?.positionM ?? null;
    if (!plausible(pos, PLAUSIBLE.positionM)) {
      unknown[c.storey] = 1;
      continue;
    }
    sumK[c.storey] = sumK[c.storey]! + k;
    sumKy[c.storey] = sumKy[c.storey]! + k * pos;
  }
  const out: (number | null)[] = new Array<number | null>(storeyCount);
  const dim = planDimensionM;
  const usable = plausible(dim, PLAUSIBLE.planM);
  for (let i = 0; i < storeyCount; i++) {
    if (!usable || unknown[i] === 1 || !(sumK[i]! > 0)) {
      out[i] = null;
      continue;
    }
    const cr = sumKy[i]! / sumK[i]!;
    out[i] = (cr - dim / 2) / dim;
  }
  return out;
}
