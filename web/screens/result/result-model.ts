/**
 * Everything the result screen shows, computed from the record with what calc/ offers:
 * the storey model and its response (period, demand, drift, demand-to-capacity), and a
 * rocking assessment of every rocking wall (θ/α observed from the uplift gap and estimated
 * under the hazard). Pure; failures are caught and reported, never shown as numbers.
 */
import {
  assessRockingWall,
  buildingResponse,
  rockingWallFromInput,
  type BuildingResponse,
  type RockingWallAssessment,
} from '../../../calc/index.js';
import type { SurveyRecord } from '../../../forms/index.js';

export interface ResultModel {
  response: BuildingResponse | null;
  /** Why the response could not be computed (a calc error message), or null. */
  responseError: string | null;
  rocking: RockingWallAssessment[];
  rockingErrors: { wallId: string; message: string }[];
}

export function computeResult(record: SurveyRecord): ResultModel {
  let response: BuildingResponse | null = null;
  let responseError: string | null = null;
  try {
    response = buildingResponse(record);
  } catch (e) {
    responseError = e instanceof Error ? e.message : String(e);
  }
  const rocking: RockingWallAssessment[] = [];
  const rockingErrors: { wallId: string; message: string }[] = [];
  for (const wall of record.walls) {
    if (wall.type !== 'rocking') continue;
    const storeyHeight = record.building.storeys[wall.storey]?.heightM;
    if (storeyHeight === undefined) continue;
    const gap = record.observations.uplift.find((u) => u.wallId === wall.id)?.gapM ?? null;
    try {
      const model = rockingWallFromInput(wall, storeyHeight);
      rocking.push(assessRockingWall(model, record.hazard, gap));
    } catch (e) {
      rockingErrors.push({ wallId: wall.id, message: e instanceof Error ? e.message : String(e) });
    }
  }
  return { response, responseError, rocking, rockingErrors };
}
