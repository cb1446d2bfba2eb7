/**
 * Everything the result screen shows, computed from the record by calc/:
 * - when the survey is complete enough to screen: `screen(record)` — the verdict, evidence,
 *   directions, rocking walls, confidence and cautions;
 * - before that: the storey model's response (period, demand, drift) and a rocking
 *   assessment of every rocking wall, so the plots already say something; no verdict.
 * Pure; a calculation that throws is reported with its message, never shown as numbers.
 */
import {
  assessRockingWall,
  buildingResponse,
  rockingWallFromInput,
  screen,
  type BuildingResponse,
  type RockingWallAssessment,
  type ScreeningResult,
} from '../../../calc/index.js';
import type { SurveyRecord } from '../../../forms/index.js';

export interface ResultModel {
  screening: ScreeningResult | null;
  response: BuildingResponse | null;
  /** Why the calculation could not run (its message), or null. */
  error: string | null;
  /** Before screening: rocking walls assessed on their own. */
  rocking: RockingWallAssessment[];
}

const message = (e: unknown) => (e instanceof Error ? e.message : String(e));

/** The record's inputs, as one string: equal strings, equal results. */
export function inputsKey(record: SurveyRecord): string {
  const { notes: _notes, ...observations } = record.observations;
  return JSON.stringify([
    record.building,
    record.walls,
    observations,
    record.hazard,
    record.measured,
    record.unconfirmed,
    record.unparsed,
  ]);
}

export function computeResult(record: SurveyRecord, ready: boolean): ResultModel {
  if (ready) {
    try {
      const screening = screen(record);
      return { screening, response: null, error: null, rocking: [] };
    } catch (e) {
      return { screening: null, response: null, error: message(e), rocking: [] };
    }
  }
  let response: BuildingResponse | null = null;
  let error: string | null = null;
  try {
    response = buildingResponse(record);
  } catch (e) {
    error = message(e);
  }
  const rocking: RockingWallAssessment[] = [];
  for (const wall of record.walls) {
    if (wall.type !== 'rocking') continue;
    const storeyHeight = record.building.storeys[wall.storey]?.heightM;
    if (storeyHeight === undefined) continue;
    const gap = record.observations.uplift.find((u) => u.wallId === wall.id)?.gapM ?? null;
    try {
      rocking.push(assessRockingWall(rockingWallFromInput(wall, storeyHeight), record.hazard, gap));
    } catch (e) {
      error ??= `${wall.id}: ${message(e)}`;
    }
  }
  return { screening: null, response, error, rocking };
}
