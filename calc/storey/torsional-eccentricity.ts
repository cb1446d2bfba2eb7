import { PLAUSIBLE, plausible } from './plausible-ranges.js';
import type { StoreyLateral } from './storey-lateral.js';

/**
 * Static eccentricity between the centre of rigidity of the walls along one direction and
 * the centre of mass, as a signed fraction of the plan dimension perpendicular to that
 * direction (the lever arm of torsion), per storey.
 *
 * For walls along x, their `positionM` is their y coordinate; CRy = Σ ki·yi / Σ ki (see
 * {@link StoreyLateral.centreOfRigidityM}), and the result is (CRy − CMy) / planY. The centre
 * of mass is taken at the plan centre (uniform floor mass). Definitions as in EN 1998-1:2004
 * §4.2.3.2(6) (e0 between centre of stiffness and centre of mass) and ASCE 7-16 §12.8.4
 * (dimension perpendicular to the force).
 *
 * A storey's value is null when the plan dimension is unknown, any counted wall lacks a
 * position, or its shear-wall stiffness is not > 0.
 *
 * @param storeys storey stiffness results for the direction (from the storey model).
 * @param planDimensionM plan dimension perpendicular to the direction, in m.
 */
export function torsionalEccentricity(
  storeys: readonly StoreyLateral[],
  planDimensionM: number | null,
): (number | null)[] {
  const out: (number | null)[] = [];
  const dim = planDimensionM;
  const usable = plausible(dim, PLAUSIBLE.planM);
  for (const s of storeys) {
    const cr = s.centreOfRigidityM;
    out.push(usable && cr !== null ? (cr - dim / 2) / dim : null);
  }
  return out;
}
