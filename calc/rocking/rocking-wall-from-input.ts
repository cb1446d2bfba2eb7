import type { SupplementalDevice, WallInput } from '../survey/index.js';
import { requireNonNegative, requirePositive } from './guards.js';
import { rockingWall, type RockingWall, type RockingWallParams } from './rocking-wall.js';

/**
 * Unit weight of the panel timber when the survey gives no self weight: 4.2 kN/m³, softwood
 * strength class C24 (EN 1991-1-1:2002 Annex A, Table A.3; from memory, verify). CLT is
 * mostly made of C24 (or T14) lamellae.
 */
export const CLT_UNIT_WEIGHT_N_PER_M3 = 4200;

/**
 * Panel thickness when the survey gives none: 0.1 m, a common three-layer CLT wall panel
 * (common practice, no source).
 */
export const DEFAULT_PANEL_THICKNESS_M = 0.1;

/** A survey wall turned into the rocking model, with every default it took listed. */
export interface RockingWallModel {
  wallId: string;
  wall: RockingWall;
  /** The values the model was built from (inputs, or defaults where the survey had none). */
  params: RockingWallParams;
  thicknessM: number;
  /** Hold-downs counted at the heel (half of those recorded, rounded down). */
  holdDownsAtHeel: number;
  /** Supplemental devices recorded on the wall (not modelled). */
  devices: SupplementalDevice[];
  /** One sentence per assumption or default taken. */
  assumptions: string[];
}

function kN(n: number): string {
  return `${(n / 1000).toFixed(1)} kN`;
}

/**
 * Builds the rocking model of a survey wall. Defaults (each listed in `assumptions`):
 * - height: the wall's height, else `storeyHeightM`;
 * - thickness: the recorded one, else {@link DEFAULT_PANEL_THICKNESS_M};
 * - self weight: the recorded one, else length × height × thickness ×
 *   {@link CLT_UNIT_WEIGHT_N_PER_M3};
 * - gravity load and post-tension: 0 when not recorded;
 * - hold-downs: recorded ones are split equally between the two ends and only those at one
 *   end (floor(count/2)) resist uplift, the model being symmetric; none when the count or the
 *   capacity is missing (conservative for uplift).
 *
 * @throws RangeError naming the field when the wall's length or the height is not finite > 0
 *   (survey data is checked at the form; here that is a programmer error).
 */
export function rockingWallFromInput(wall: WallInput, storeyHeightM: number): RockingWallModel {
  if (wall === null || typeof wall !== 'object') {
    throw new RangeError(`wall must be a WallInput, got ${String(wall)}`);
  }
  const assumptions: string[] = [];
  const widthM = requirePositive(`wall ${wall.id}: lengthM`, wall.lengthM);
  let heightM: number;
  if (wall.heightM !== null) {
    heightM = requirePositive(`wall ${wall.id}: heightM`, wall.heightM);
  } else {
    heightM = requirePositive('storeyHeightM', storeyHeightM);
    assumptions.push(`Wall height taken as the storey height, ${heightM.toFixed(2)} m.`);
  }
  const rk = wall.rocking;
  let thicknessM: number;
  if (rk?.thicknessM != null) {
    thicknessM = requirePositive(`wall ${wall.id}: rocking.thicknessM`, rk.thicknessM);
  } else {
    thicknessM = DEFAULT_PANEL_THICKNESS_M;
    assumptions.push(
      `Panel thickness not recorded: ${thicknessM.toFixed(3)} m assumed (typical three-layer CLT).`,
    );
  }
  let selfWeightN: number;
  if (rk?.selfWeightN != null) {
    selfWeightN = requirePositive(`wall ${wall.id}: rocking.selfWeightN`, rk.selfWeightN);
  } else {
    selfWeightN = widthM * heightM * thicknessM * CLT_UNIT_WEIGHT_N_PER_M3;
    assumptions.push(
      `Self weight not recorded: ${kN(selfWeightN)} from the panel volume at ` +
        `${(CLT_UNIT_WEIGHT_N_PER_M3 / 1000).toFixed(1)} kN/m³ (EN 1991-1-1 Table A.3, C24).`,
    );
  }
  let gravityLoadN = 0;
  if (rk?.gravityLoadN != null) {
    gravityLoadN = requireNonNegative(`wall ${wall.id}: rocking.gravityLoadN`, rk.gravityLoadN);
  } else {
    assumptions.push('Gravity load on the wall not recorded: taken as 0.');
  }
  let postTensionN = 0;
  if (rk?.postTensionN != null) {
    postTensionN = requireNonNegative(`wall ${wall.id}: rocking.postTensionN`, rk.postTensionN);
  } else {
    assumptions.push('Post-tension not recorded: taken as 0 (none).');
  }
  const c = wall.connectors;
  let holdDownsAtHeel = 0;
  let holdDownCapacityN = 0;
  if (c && c.holdDownCount != null && c.holdDownCount > 0) {
    if (c.holdDownCapacityN == null) {
      assumptions.push('Hold-down capacity not recorded: hold-downs not counted.');
    } else {
      holdDownsAtHeel = Math.floor(c.holdDownCount / 2);
      const each = requireNonNegative(
        `wall ${wall.id}: connectors.holdDownCapacityN`,
        c.holdDownCapacityN,
      );
      holdDownCapacityN = holdDownsAtHeel * each;
      assumptions.push(
        `${c.holdDownCount} hold-down(s) split between the two ends: ${holdDownsAtHeel} at the ` +
          `heel resist uplift (${kN(holdDownCapacityN)}); they are taken to let go at the first uplift.`,
      );
    }
  } else if (c && c.holdDownCount == null && c.holdDownCapacityN != null) {
    assumptions.push('Hold-down count not recorded: hold-downs not counted.');
  }
  assumptions.push(
    'Rigid panel on a rigid base rocking about its corners; the gravity load rides with the ' +
      'top of the wall; post-tension constant (tendon elongation and yield not modelled).',
  );
  assumptions.push(
    'The base of the wall is taken to move with the ground (for upper storeys the floor ' +
      'motion is larger).',
  );
  const params: RockingWallParams = {
    widthM,
    heightM,
    selfWeightN,
    gravityLoadN,
    postTensionN,
    holdDownCapacityN,
  };
  return {
    wallId: wall.id,
    wall: rockingWall(params),
    params,
    thicknessM,
    holdDownsAtHeel,
    devices: [...wall.devices],
    assumptions,
  };
}
