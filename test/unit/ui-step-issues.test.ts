// What each step still has to fix: kept texts become the field's own sentence, located in
// words, in the step they belong to; typed coordinates become a location only when both are valid.
import { describe, expect, it } from 'vitest';
import { emptySurvey, type SurveyRecord } from '../../forms/index.js';
import { applyCoordinateChange } from '../../web/screens/survey/location-edit.js';
import { addStorey, addWall, applyFieldChange } from '../../web/screens/survey/record-edit.js';
import { readyToScreen, stepIssues, whereOf } from '../../web/screens/survey/step-issues.js';
import { stepFromParam, stepOfPath } from '../../web/screens/survey/steps.js';

const fresh = (): SurveyRecord =>
  emptySurvey('d', new Date('2025-01-01T00:00:00Z'), '0b6f3a52-9a3e-4a36-8d1e-3c5a7c2e9f10');

describe('step issues', () => {
  it('lists a kept text as an error of its step, in the unit shown, with where it is', () => {
    let r = addStorey(addStorey(fresh()));
    r = applyFieldChange(r, { path: 'building.storeys.1.heightM', kind: 'pending', text: '0' });
    const us = stepIssues(r, 'us').building.filter((i) => i.kind === 'error');
    expect(us).toEqual([
      {
        kind: 'error',
        path: 'building.storeys.1.heightM',
        target: 'f-building-storeys-1-heightM',
        message: 'Storey 2: Storey height must be more than 0 ft.',
      },
    ]);
  });
  it('names the wall of a kept text in the walls step', () => {
    let r = addWall(addStorey(fresh()), 0, 'y', 'rocking').record;
    r = applyFieldChange(r, { path: 'walls.0.rocking.thicknessM', kind: 'pending', text: '-5' });
    expect(stepIssues(r, 'si').walls[0]?.message).toBe(
      'Wall 1Y-1: Panel thickness cannot be negative.',
    );
    expect(whereOf(r, 'walls.1X-total-gypsum.lengthM')).toBe('Storey 1, along x, Gypsum board');
  });
  it('puts gaps after errors and is ready only when nothing is left', () => {
    const r = fresh();
    const issues = stepIssues(r, 'si');
    expect(issues.building.some((i) => i.kind === 'gap')).toBe(true);
    expect(issues.hazard.map((i) => i.message)).toEqual([
      'Choose the hazard: the response spectrum to screen against.',
    ]);
    expect(readyToScreen(issues)).toBe(false);
    // No storeys: the walls step is not done either.
    expect(issues.walls.map((i) => i.message)).toEqual([
      'Add the storeys first, in the Building step.',
    ]);
  });
  it('maps record paths to steps and unknown step names to the first step', () => {
    expect(stepOfPath('observations.uplift.0.gapM')).toBe('observations');
    expect(stepOfPath('photos.2.caption')).toBe('observations');
    expect(stepOfPath('location.lat')).toBe('place');
    expect(stepOfPath('result')).toBeNull();
    expect(stepFromParam('walls')).toBe('walls');
    expect(stepFromParam('../../etc')).toBe('place');
    expect(stepFromParam(undefined)).toBe('place');
  });
});

describe('typed coordinates', () => {
  it('become a location only when latitude and longitude are both valid', () => {
    let r = applyCoordinateChange(
      fresh(),
      { path: 'location.lat', kind: 'value', value: 46.2, text: '46.2' },
      'si',
    );
    expect(r.location).toBeNull();
    expect(r.unparsed['location.lat']).toBe('46.2');
    r = applyCoordinateChange(
      r,
      { path: 'location.lon', kind: 'value', value: 7.35, text: '7,35' },
      'si',
    );
    expect(r.location).toEqual({ lat: 46.2, lon: 7.35, accuracyM: null, source: 'typed' });
    expect(r.unparsed).toEqual({});
  });
  it('turns a GPS position into a typed one when a coordinate is edited (no accuracy then)', () => {
    const gps: SurveyRecord = {
      ...fresh(),
      location: { lat: 46.2, lon: 7.35, accuracyM: 6, source: 'gps' },
    };
    const r = applyCoordinateChange(
      gps,
      { path: 'location.lon', kind: 'value', value: 7.36, text: '7.36' },
      'si',
    );
    expect(r.location).toEqual({ lat: 46.2, lon: 7.36, accuracyM: null, source: 'typed' });
  });
});
