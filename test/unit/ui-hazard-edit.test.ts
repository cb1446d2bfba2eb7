// Entering the hazard: a spectrum exists only once its required values are valid; until
// then the kind and the typed texts are kept.
import { describe, expect, it } from 'vitest';
import { emptySurvey, validateRecord, type SurveyRecord } from '../../forms/index.js';
import type { FieldChange } from '../../forms/fields/index.js';
import {
  applyHazardChange,
  chooseHazardKind,
  hazardHasValues,
  hazardKind,
  setEc8Choice,
} from '../../web/screens/survey/hazard-edit.js';

const fresh = (): SurveyRecord =>
  emptySurvey('d', new Date('2025-01-01T00:00:00Z'), '0b6f3a52-9a3e-4a36-8d1e-3c5a7c2e9f10');
const typed = (path: string, text: string, value: number | null): FieldChange =>
  value === null ? { path, kind: 'pending', text } : { path, kind: 'value', value, text };

describe('hazard drafts', () => {
  it('keeps the chosen kind and typed values until the spectrum is complete', () => {
    let r = chooseHazardKind(fresh(), 'asce7');
    expect(hazardKind(r)).toBe('asce7');
    expect(r.hazard).toBeNull();
    r = applyHazardChange(r, typed('hazard.SDS', '1,0', 1), 'si');
    r = applyHazardChange(r, typed('hazard.SD1', '0.6', 0.6), 'si');
    expect(r.hazard).toBeNull();
    expect(r.unparsed['hazard.SDS']).toBe('1,0');
    r = applyHazardChange(r, typed('hazard.TL', '8', 8), 'si');
    expect(r.hazard).toEqual({ kind: 'asce7', SDS: 1, SD1: 0.6, TL: 8 });
    expect(Object.keys(r.unparsed)).toEqual([]);
    const v = validateRecord(r);
    expect(v.ok).toBe(true);
  });
  it('builds an EN 1998-1 spectrum with the chosen type and ground, damping from %', () => {
    let r = chooseHazardKind(fresh(), 'ec8');
    r = setEc8Choice(r, 'type', '2', 'si');
    r = setEc8Choice(r, 'ground', 'D', 'si');
    r = applyHazardChange(r, typed('hazard.damping', '7', 0.07), 'si');
    expect(r.hazard).toBeNull();
    r = applyHazardChange(r, typed('hazard.ag', '0.2', 0.2), 'si');
    expect(r.hazard).toEqual({ kind: 'ec8', type: 2, ground: 'D', ag: 0.2, damping: 0.07 });
  });
  it('does not build a spectrum while a typed value is not valid', () => {
    let r = chooseHazardKind(fresh(), 'event');
    r = applyHazardChange(r, typed('hazard.pga', '0.3', 0.3), 'si');
    r = applyHazardChange(r, typed('hazard.sa03', '-1', null), 'si');
    r = applyHazardChange(r, typed('hazard.sa10', '0.3', 0.3), 'si');
    expect(r.hazard).toBeNull();
    expect(r.unparsed['hazard.sa03']).toBe('-1');
  });
  it('edits a stored spectrum in place, drops a cleared optional value, keeps bad text aside', () => {
    let r: SurveyRecord = {
      ...fresh(),
      hazard: { kind: 'ec8', type: 1, ground: 'B', ag: 0.25, S: 1.3 },
    };
    r = applyHazardChange(r, typed('hazard.ag', '0.3', 0.3), 'si');
    r = applyHazardChange(r, { path: 'hazard.S', kind: 'value', value: null, text: '' }, 'si');
    expect(r.hazard).toEqual({ kind: 'ec8', type: 1, ground: 'B', ag: 0.3 });
    r = applyHazardChange(r, typed('hazard.ag', 'x', null), 'si');
    expect(r.hazard).toMatchObject({ ag: 0.3 });
    expect(r.unparsed['hazard.ag']).toBe('x');
  });
  it('confirms a prefilled team hazard when it is edited', () => {
    let r: SurveyRecord = {
      ...fresh(),
      hazard: { kind: 'event', pga: 0.2, sa03: 0.5, sa10: 0.2 },
      unconfirmed: ['hazard'],
    };
    r = applyHazardChange(r, typed('hazard.pga', '0.25', 0.25), 'si');
    expect(r.unconfirmed).toEqual([]);
  });
  it('knows whether switching the kind would remove entered values', () => {
    expect(hazardHasValues(chooseHazardKind(fresh(), 'ec8'))).toBe(false);
    const r = applyHazardChange(
      chooseHazardKind(fresh(), 'ec8'),
      typed('hazard.ag', '0.1', 0.1),
      'si',
    );
    expect(hazardHasValues(r)).toBe(true);
    expect(chooseHazardKind(r, 'asce7').hazard).toBeNull();
  });
});
