// Residual drift readings: offset over a height, or tilt; the ratio follows the reading
// typed last, and nothing typed is lost on the way.
import { describe, expect, it } from 'vitest';
import { emptySurvey, validateRecord, type SurveyRecord } from '../../forms/index.js';
import {
  driftPendingKey,
  ratioOf,
  removeDriftReading,
  setDriftField,
  setDriftMethod,
} from '../../web/screens/survey/drift-edit.js';
import { addStorey, setAllStoreys } from '../../web/screens/survey/record-edit.js';

const base = (): SurveyRecord =>
  setAllStoreys(
    addStorey(
      addStorey(
        emptySurvey('d', new Date('2025-01-01T00:00:00Z'), '0b6f3a52-9a3e-4a36-8d1e-3c5a7c2e9f10'),
      ),
    ),
    'heightM',
    2.8,
  );

function ok(e: ReturnType<typeof setDriftField>): SurveyRecord {
  if (!e.ok) throw new Error(`refused, ratio ${e.ratio}`);
  const v = validateRecord(e.record);
  expect(v.ok ? [] : v.messages).toEqual([]);
  return e.record;
}

describe('residual drift from an offset', () => {
  it('creates the reading over the storey height, marked for confirmation', () => {
    const r = ok(setDriftField(base(), 0, 'x', 'offsetM', 0.014));
    expect(r.observations.residualDrift).toEqual([
      {
        storey: 0,
        direction: 'x',
        method: 'offset',
        offsetM: 0.014,
        overHeightM: 2.8,
        tiltRad: null,
        ratio: 0.014 / 2.8,
        uncertainty: null,
      },
    ]);
    expect(r.unconfirmed).toContain('observations.residualDrift.0.overHeightM');
  });
  it('uses a height typed before the offset, and does not ask to confirm it', () => {
    const start = { ...base(), unparsed: { [driftPendingKey(1, 'y', 'overHeightM')]: '1.2' } };
    const r = ok(setDriftField(start, 1, 'y', 'offsetM', 0.006, 1.2));
    expect(r.observations.residualDrift[0]?.ratio).toBeCloseTo(0.005, 12);
    expect(r.unconfirmed.some((p) => p.includes('residualDrift'))).toBe(false);
    expect(r.unparsed).toEqual({});
  });
  it('recomputes the ratio when the height changes, and confirms the height', () => {
    let r = ok(setDriftField(base(), 0, 'x', 'offsetM', 0.014));
    r = ok(setDriftField(r, 0, 'x', 'overHeightM', 2.0));
    expect(r.observations.residualDrift[0]?.ratio).toBeCloseTo(0.007, 12);
    expect(r.unconfirmed.some((p) => p.includes('residualDrift'))).toBe(false);
  });
  it('takes the size of a negative offset (a lean the other way)', () => {
    const r = ok(setDriftField(base(), 0, 'x', 'offsetM', -0.028));
    expect(r.observations.residualDrift[0]?.ratio).toBeCloseTo(0.01, 12);
  });
  it('refuses a reading that would mean a drift above the stored limit (50 %)', () => {
    expect(setDriftField(base(), 0, 'x', 'offsetM', 2)).toEqual({ ok: false, ratio: 2 / 2.8 });
  });
});

describe('residual drift from a tilt', () => {
  it('derives the ratio as tan(tilt)', () => {
    const tilt = (0.3 * Math.PI) / 180;
    const r = ok(setDriftField(base(), 1, 'y', 'tiltRad', tilt));
    // tan(0.3°) = 0.0052360 (trigonometry; checked against Math.tan independently below).
    expect(r.observations.residualDrift[0]?.ratio).toBeCloseTo(0.005236, 6);
    expect(
      ratioOf({ method: 'tilt', tiltRad: -tilt, offsetM: null, overHeightM: null }),
    ).toBeCloseTo(Math.tan(tilt), 15);
  });
  it('reads a phone tilt-meter reading by its tilt, like a typed tilt', () => {
    // tan(0.4°) = 0.0069814 (trigonometry).
    const tiltRad = (0.4 * Math.PI) / 180;
    expect(
      ratioOf({ method: 'phone-tilt', tiltRad, offsetM: null, overHeightM: null }),
    ).toBeCloseTo(0.0069814, 7);
    expect(ratioOf({ method: 'phone-tilt', tiltRad: null, offsetM: null, overHeightM: null })).toBe(
      null,
    );
  });
  it('keeps both readings and switches which one is used', () => {
    let r = ok(setDriftField(base(), 0, 'x', 'offsetM', 0.014));
    r = ok(setDriftField(r, 0, 'x', 'tiltRad', (0.5 * Math.PI) / 180));
    expect(r.observations.residualDrift[0]).toMatchObject({ method: 'tilt', offsetM: 0.014 });
    const back = setDriftMethod(r, 0, 'offset');
    expect(back.ok && back.record.observations.residualDrift[0]?.ratio).toBeCloseTo(0.005, 12);
  });
  it('falls back to the offset when the tilt is cleared, and drops the reading when nothing is left', () => {
    let r = ok(setDriftField(base(), 0, 'x', 'offsetM', 0.014));
    r = ok(setDriftField(r, 0, 'x', 'tiltRad', 0.01));
    r = ok(setDriftField(r, 0, 'x', 'tiltRad', null));
    expect(r.observations.residualDrift[0]).toMatchObject({ method: 'offset', tiltRad: null });
    r = ok(setDriftField(r, 0, 'x', 'offsetM', null));
    expect(r.observations.residualDrift).toEqual([]);
  });
  it('removes a reading with everything kept for it', () => {
    let r = ok(setDriftField(base(), 0, 'x', 'offsetM', 0.014));
    r = { ...r, unparsed: { [driftPendingKey(0, 'x', 'tiltRad')]: 'abc' } };
    r = removeDriftReading(r, 0, 'x');
    expect(r.observations.residualDrift).toEqual([]);
    expect(r.unparsed).toEqual({});
    expect(r.unconfirmed.some((p) => p.includes('residualDrift'))).toBe(false);
  });
  it('refuses to clear a height to nothing (the text stays pending instead)', () => {
    const r = ok(setDriftField(base(), 0, 'x', 'offsetM', 0.014));
    expect(() => setDriftField(r, 0, 'x', 'overHeightM', null)).toThrow(
      /overHeightM cannot be cleared/,
    );
  });
});
