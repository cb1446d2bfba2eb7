/**
 * The steps of a survey, in the order an inspector walks a building, and which record fields
 * belong to each. Every step has its own address (/survey/:id/<step>), so any step can be
 * opened directly from the step bar, a link or a reload.
 */
import type { MessageKey } from '../../i18n/index.js';

export const STEPS = ['place', 'building', 'walls', 'observations', 'hazard'] as const;
export type StepId = (typeof STEPS)[number];

/** The result screen's step id (it lives at /survey/:id/result). */
export const RESULT_STEP = 'result';

export const stepLabels: Record<StepId | typeof RESULT_STEP, MessageKey> = {
  place: 'step.place',
  building: 'step.building',
  walls: 'step.walls',
  observations: 'step.observations',
  hazard: 'step.hazard',
  result: 'step.result',
};

/** The step for a URL segment; unknown segments open the first step. */
export function stepFromParam(param: string | undefined): StepId {
  return (STEPS as readonly string[]).includes(param ?? '') ? (param as StepId) : 'place';
}

/** The step or the result for a URL segment. */
export function pageFromParam(param: string | undefined): StepId | typeof RESULT_STEP {
  return param === RESULT_STEP ? RESULT_STEP : stepFromParam(param);
}

/** Which step a record field path belongs to ('' and unknown paths: null). */
export function stepOfPath(path: string): StepId | null {
  const head = path.split('.')[0] ?? '';
  switch (head) {
    case 'address':
    case 'location':
    case 'inspector':
    case 'team':
    case 'inspectionKind':
      return 'place';
    case 'building':
      return 'building';
    case 'walls':
      return 'walls';
    case 'observations':
    case 'photos':
    case 'measured':
      return 'observations';
    case 'hazard':
      return 'hazard';
    default:
      return null;
  }
}
