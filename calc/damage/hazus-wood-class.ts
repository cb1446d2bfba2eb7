/**
 * Which Hazus wood type and design level stand for a surveyed building.
 *
 * | structural system    | type                                                            |
 * | -------------------- | --------------------------------------------------------------- |
 * | light-frame          | W1 when the total floor area is ≤ 5,000 sq ft (464.5 m²), else W2 |
 * |                      | (area unknown: W1 for single-family use, else W2)               |
 * | heavy-timber-frame   | W2 (Hazus W2 covers glulam and heavy-timber beam-and-column frames) |
 * | mass-timber-panel    | W2, as the nearest type: Hazus has no CLT type                  |
 * | rocking-wall         | W2, as the nearest type; the rocking walls are assessed on their own |
 *
 * | code level recorded | design level                                                     |
 * | ------------------- | ---------------------------------------------------------------- |
 * | high / moderate / low / pre-code | the same                                          |
 * | unknown, light frame or heavy timber | pre-code: the lowest thresholds (conservative) |
 * | unknown, mass timber or rocking wall | moderate: such buildings date from recent codes |
 *
 * Type definitions: Hazus-MH 2.1 Earthquake Model Technical Manual (FEMA 2013), Table 3.1
 * and §5.2 model building type descriptions (W1 light frame ≤ 5,000 sq ft; W2 commercial and
 * industrial > 5,000 sq ft; table and section numbers from memory, verify). The proxies and
 * the defaults for an unknown code level are our own (common practice, no source).
 */
import type { BuildingInput, CodeLevel } from '../survey/survey-input.js';
import type { HazusDesignLevel, HazusWoodType } from './hazus-wood-parameters.js';

/** 5,000 sq ft in m² (1 ft = 0.3048 m exactly, NIST SP 811): the W1/W2 boundary of Hazus. */
export const W1_MAX_FLOOR_AREA_M2 = 5000 * 0.3048 * 0.3048;

/** The Hazus class of a building, with how it was chosen. */
export interface HazusWoodClass {
  type: HazusWoodType;
  level: HazusDesignLevel;
  /** True when the type stands in for a system Hazus does not have (CLT, rocking walls). */
  typeIsProxy: boolean;
  /** True when the code level was not recorded and a default was taken. */
  levelDefaulted: boolean;
  /** Total floor area used for W1/W2, in m² (null when unknown). */
  floorAreaM2: number | null;
  /** One sentence per decision, for the result. */
  basis: string[];
}

function totalFloorArea(building: BuildingInput): number | null {
  const storeys = Array.isArray(building.storeys) ? building.storeys : [];
  if (storeys.length === 0) return null;
  let sum = 0;
  for (const s of storeys) {
    const a = s?.floorAreaM2;
    if (typeof a !== 'number' || !Number.isFinite(a) || a <= 0) return null;
    sum += a;
  }
  return Number.isFinite(sum) ? sum : null;
}

const LEVELS: Record<Exclude<CodeLevel, 'unknown'>, HazusDesignLevel> = {
  high: 'high',
  moderate: 'moderate',
  low: 'low',
  'pre-code': 'pre-code',
};

/** Maps a surveyed building onto a Hazus wood type and design level; never throws. */
export function hazusWoodClass(building: BuildingInput): HazusWoodClass {
  const basis: string[] = [];
  const area = totalFloorArea(building);
  const areaText = area === null ? 'unknown' : `${area.toFixed(0)} m²`;
  let type: HazusWoodType;
  let typeIsProxy = false;
  switch (building.system) {
    case 'heavy-timber-frame':
      type = 'W2';
      basis.push('Heavy-timber frame: Hazus W2 (it covers glulam and heavy-timber frames).');
      break;
    case 'mass-timber-panel':
      type = 'W2';
      typeIsProxy = true;
      basis.push('Mass-timber panels: Hazus has no CLT type; W2 is used as the nearest.');
      break;
    case 'rocking-wall':
      type = 'W2';
      typeIsProxy = true;
      basis.push(
        'Rocking walls: Hazus has no such type; W2 is used as the nearest for the building, and each rocking wall is assessed on its own.',
      );
      break;
    default:
      if (area !== null) {
        type = area <= W1_MAX_FLOOR_AREA_M2 ? 'W1' : 'W2';
        basis.push(
          `Light frame with a total floor area of ${areaText} (${area <= W1_MAX_FLOOR_AREA_M2 ? 'at most' : 'over'} 5,000 sq ft = 464.5 m²): Hazus ${type}.`,
        );
      } else {
        type = building.occupancy === 'single-family' ? 'W1' : 'W2';
        basis.push(
          `Light frame, floor area unknown: Hazus ${type} from the ${building.occupancy} use.`,
        );
      }
  }
  let level: HazusDesignLevel;
  let levelDefaulted = false;
  if (building.codeLevel in LEVELS) {
    level = LEVELS[building.codeLevel as keyof typeof LEVELS];
    basis.push(`Design level: ${level} code, as recorded.`);
  } else if (building.system === 'mass-timber-panel' || building.system === 'rocking-wall') {
    level = 'moderate';
    levelDefaulted = true;
    basis.push(
      'Code level not recorded: moderate code assumed, since mass-timber and rocking-wall buildings date from recent codes.',
    );
  } else {
    level = 'pre-code';
    levelDefaulted = true;
    basis.push('Code level not recorded: pre-code assumed (the lowest thresholds, conservative).');
  }
  return { type, level, typeIsProxy, levelDefaulted, floorAreaM2: area, basis };
}
