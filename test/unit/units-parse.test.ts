// Reading typed numbers: what is accepted, how it is read, and what is refused (never repaired).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseQuantity, formatForInput, type ParseResult } from '../../forms/units/index.js';

function si(r: ParseResult): number {
  if (!r.ok) throw new Error(`expected a value, got ${r.reason}`);
  return r.valueSI;
}

describe('parseQuantity reads what people type', () => {
  it('reads a plain number in the shown unit without marking it as interpreted', () => {
    const r = parseQuantity('2.7', 'length', 'si');
    expect(r).toEqual({ ok: true, valueSI: 2.7, shownValue: 2.7, unit: 'm', interpreted: false });
  });
  it('reads feet in the US system and stores metres', () => {
    expect(si(parseQuantity('9', 'length', 'us'))).toBeCloseTo(2.7432, 12);
  });
  it('reads a decimal comma and says it interpreted the text', () => {
    const r = parseQuantity('2,7', 'length', 'si');
    expect(r.ok && r.valueSI).toBe(2.7);
    expect(r.ok && r.interpreted).toBe(true);
  });
  it('reads an explicit unit typed after the number, in either system', () => {
    const r = parseQuantity('2.7 m', 'length', 'us');
    expect(r.ok && r.unit).toBe('m');
    expect(r.ok && r.shownValue).toBeCloseTo(8.858267716535, 9);
    expect(si(parseQuantity('12 in', 'length', 'si'))).toBeCloseTo(0.3048, 12);
    expect(si(parseQuantity('25 mm', 'smallLength', 'us'))).toBeCloseTo(0.025, 12);
    expect(si(parseQuantity('50 kN', 'force', 'us'))).toBe(50_000);
  });
  it('reads feet and inches (9\' 6") as 9.5 ft', () => {
    for (const text of ['9\'6"', "9' 6", '9 ft 6 in', '9ft6in']) {
      expect(si(parseQuantity(text, 'length', 'us')), text).toBeCloseTo(9.5 * 0.3048, 12);
    }
  });
  it('keeps the sign of a negative number (the field decides whether it is allowed)', () => {
    expect(si(parseQuantity('-0.5', 'length', 'si'))).toBe(-0.5);
    expect(si(parseQuantity('-1\'6"', 'length', 'us'))).toBeCloseTo(-1.5 * 0.3048, 12);
  });
  it('ignores spaces around the text', () => {
    expect(si(parseQuantity('  3  ', 'length', 'si'))).toBe(3);
  });
});

describe('parseQuantity refuses text it would have to guess at', () => {
  it('reports empty text as empty', () => {
    expect(parseQuantity('   ', 'length', 'si')).toEqual({ ok: false, reason: 'empty' });
  });
  it('refuses a number with both a point and a comma', () => {
    expect(parseQuantity('1,200.5', 'length', 'si')).toEqual({
      ok: false,
      reason: 'mixed-separators',
    });
  });
  it('refuses two commas, two points, grouping spaces and letters', () => {
    for (const text of ['1,2,3', '2.7.1', '1 200', 'abc', '--3', '.']) {
      const r = parseQuantity(text, 'length', 'si');
      expect(r.ok, text).toBe(false);
    }
  });
  it('names a unit the field does not take', () => {
    expect(parseQuantity('3 kg', 'length', 'si')).toEqual({
      ok: false,
      reason: 'unknown-unit',
      unit: 'kg',
    });
  });
  it('does not crash on any string (fast-check)', () => {
    fc.assert(
      fc.property(fc.string(), (text) => {
        const r = parseQuantity(text, 'length', 'us');
        if (r.ok) expect(Number.isFinite(r.valueSI)).toBe(true);
      }),
    );
  });
});

describe('a stored value comes back into the field as it was typed', () => {
  it('round-trips decimal text typed in feet through SI storage (fast-check)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 99_999 }), (hundredths) => {
        const typed = (hundredths / 100).toString();
        const stored = si(parseQuantity(typed, 'length', 'us'));
        expect(formatForInput(stored, 'length', 'us')).toBe(typed);
      }),
    );
  });
  it('round-trips millimetres and kips', () => {
    expect(
      formatForInput(si(parseQuantity('12.5', 'smallLength', 'si')), 'smallLength', 'si'),
    ).toBe('12.5');
    expect(formatForInput(si(parseQuantity('3.25', 'force', 'us')), 'force', 'us')).toBe('3.25');
  });
});
