// Field checks: impossible values refused with a sentence in the user's units, unusual
// values warned about and kept, interpreted text said back.
import { describe, expect, it } from 'vitest';
import { checkNumber, numberSpecFor, PANEL_LENGTH_SPEC } from '../../forms/fields/index.js';

const height = numberSpecFor('building.storeys.0.heightM')!;
const length = numberSpecFor('walls.4.lengthM')!;
const thickness = numberSpecFor('walls.0.rocking.thicknessM')!;

describe('checkNumber refuses impossible values with a sentence', () => {
  it('refuses a storey height of 0 and names the unit', () => {
    expect(checkNumber('0', height, 'si')).toEqual({
      state: 'invalid',
      message: 'Storey height must be more than 0 m.',
    });
    expect(checkNumber('0', height, 'us')).toEqual({
      state: 'invalid',
      message: 'Storey height must be more than 0 ft.',
    });
  });
  it('refuses a negative length', () => {
    expect(checkNumber('-3', length, 'si')).toEqual({
      state: 'invalid',
      message: 'Wall length cannot be negative.',
    });
  });
  it('refuses text that is not a number and gives an example in the shown unit', () => {
    const r = checkNumber('two', height, 'si');
    expect(r.state).toBe('invalid');
    expect(r.state === 'invalid' && r.message).toBe(
      'Storey height must be a number in m, for example 2.7.',
    );
  });
  it('says a required field is needed when it is cleared', () => {
    expect(checkNumber('', height, 'si')).toEqual({
      state: 'invalid',
      message: 'Storey height is needed. Type a number in m.',
    });
  });
  it('treats an optional empty field as unknown, not as an error', () => {
    expect(checkNumber('', numberSpecFor('building.planXM')!, 'si')).toEqual({ state: 'empty' });
  });
  it('refuses values above the stored limit, in the shown unit', () => {
    const r = checkNumber('31', height, 'si');
    expect(r.state === 'invalid' && r.message).toBe(
      'Storey height must be at most 30 m. Check the unit.',
    );
    const us = checkNumber('100', height, 'us');
    expect(us.state === 'invalid' && us.message).toBe(
      'Storey height must be at most 98.43 ft. Check the unit.',
    );
  });
  it('refuses a fraction where a count is asked', () => {
    const r = checkNumber('2.5', numberSpecFor('walls.0.connectors.holdDownCount')!, 'si');
    expect(r.state === 'invalid' && r.message).toBe('Hold-downs must be a whole number.');
  });
});

describe('checkNumber warns on unusual values and keeps them', () => {
  it('warns on a storey height outside about 2–6 m but returns the value', () => {
    const r = checkNumber('7.5', height, 'si');
    expect(r.state).toBe('valid');
    if (r.state !== 'valid') return;
    expect(r.valueSI).toBe(7.5);
    expect(r.warning).toBe(
      'Storey height: 7.5 m is more than usual (up to about 6 m). It is kept; check it.',
    );
    const low = checkNumber('1.8', height, 'si');
    expect(low.state === 'valid' && low.warning).toMatch(/less than usual .*\(2 to 6 m\)/);
  });
  it('warns in feet in the US system', () => {
    const r = checkNumber('22', height, 'us');
    expect(r.state === 'valid' && r.warning).toMatch(/up to about 19.69 ft/);
  });
  it('marks a CLT panel longer or thicker than usual and says where the limit comes from', () => {
    const r = checkNumber('16', PANEL_LENGTH_SPEC, 'si');
    expect(r.state === 'valid' && r.warning).toMatch(
      /up to about 15 m.*Common practice: CLT panels/,
    );
    const t = checkNumber('450', thickness, 'si');
    expect(t.state === 'valid' && t.valueSI).toBeCloseTo(0.45, 12);
    expect(t.state === 'valid' && t.warning).toMatch(/up to about 400 mm/);
  });
  it('gives no warning inside the usual range', () => {
    const r = checkNumber('2.7', height, 'si');
    expect(r).toEqual({ state: 'valid', valueSI: 2.7, warning: null, readAs: null });
  });
});

describe('checkNumber says how it read interpreted text', () => {
  it('reads a decimal comma and says so', () => {
    const r = checkNumber('2,7', height, 'si');
    expect(r.state === 'valid' && r.readAs).toBe('Read as 2.7 m.');
  });
  it('reads metres typed into a field shown in feet', () => {
    const r = checkNumber('3 m', height, 'us');
    expect(r.state === 'valid' && r.readAs).toBe('Read as 9.84252 ft.');
  });
  it('names a unit the field does not take', () => {
    const r = checkNumber('3 kg', height, 'si');
    expect(r.state === 'invalid' && r.message).toBe(
      'Storey height: “kg” is not a unit for this field. Type the number in m.',
    );
  });
});
