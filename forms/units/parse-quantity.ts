/**
 * Reads what a person typed into a number field. It accepts what people really type on a
 * phone — a decimal comma (the decimal keypad of many locales has no point), a unit after the
 * number ("2.7 m" into a field shown in feet), feet and inches ("9' 6\"") — and says so, so
 * the form can show how the text was read. It never guesses: text with both a point and a
 * comma, grouping spaces or an unknown unit is refused with a reason, not "repaired".
 */
import { QUANTITIES, type Quantity } from './quantities.js';
import type { UnitSystem } from './unit-system.js';
import { UNITS, type UnitId } from './units.js';

export type ParseFailure =
  | { ok: false; reason: 'empty' }
  | { ok: false; reason: 'not-a-number' }
  /** Both "." and "," in one number: a grouping separator or a slip; refused, never guessed. */
  | { ok: false; reason: 'mixed-separators' }
  /** A unit after the number that this field does not take. */
  | { ok: false; reason: 'unknown-unit'; unit: string };

export interface ParseSuccess {
  ok: true;
  /** The value in SI. */
  valueSI: number;
  /** The value in the field's shown unit. */
  shownValue: number;
  /** The unit the number was typed in (the shown unit when none was typed). */
  unit: UnitId;
  /**
   * True when the text was not a plain number in the shown unit (decimal comma, another
   * unit, feet and inches): the form then says how it read it.
   */
  interpreted: boolean;
}

export type ParseResult = ParseSuccess | ParseFailure;

const NUMBER = String.raw`[+-]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+-]?\d+)?`;
const SIMPLE = new RegExp(String.raw`^(${NUMBER})\s*(.*)$`);
const FEET_INCHES = new RegExp(
  String.raw`^([+-]?\d+(?:[.,]\d+)?)\s*(?:'|’|ft|feet|foot)\s*(\d+(?:[.,]\d+)?)\s*(?:"|”|in|inch|inches)?$`,
  'i',
);

/** Reads a number typed with a point or a single decimal comma. */
function readNumber(raw: string): number | 'mixed' | null {
  const hasPoint = raw.includes('.');
  const commas = raw.split(',').length - 1;
  if (hasPoint && commas > 0) return 'mixed';
  if (commas > 1) return null;
  const n = Number(raw.replace(',', '.'));
  return Number.isFinite(n) ? n : null;
}

function unitFor(typed: string, accepted: readonly UnitId[]): UnitId | null {
  const key = typed.trim().toLowerCase().replace(/\s+/g, ' ');
  for (const id of accepted) {
    if (UNITS[id].typed.includes(key)) return id;
  }
  return null;
}

/**
 * Parses `text` as a value of `quantity` shown in `system`'s unit.
 * Leading and trailing spaces are ignored; nothing else is.
 */
export function parseQuantity(text: string, quantity: Quantity, system: UnitSystem): ParseResult {
  const def = QUANTITIES[quantity];
  const shown = def.shown[system];
  const trimmed = text.trim();
  if (trimmed === '') return { ok: false, reason: 'empty' };

  if (def.feetInches) {
    const fi = FEET_INCHES.exec(trimmed);
    if (fi) {
      const feet = readNumber(fi[1] ?? '');
      const inches = readNumber(fi[2] ?? '');
      if (feet === 'mixed' || inches === 'mixed') return { ok: false, reason: 'mixed-separators' };
      if (feet === null || inches === null) return { ok: false, reason: 'not-a-number' };
      const sign = feet < 0 || Object.is(feet, -0) ? -1 : 1;
      const valueSI = sign * (Math.abs(feet) * UNITS.ft.toSI + inches * UNITS.in.toSI);
      return {
        ok: true,
        valueSI,
        shownValue: valueSI / UNITS[shown].toSI,
        unit: 'ft',
        interpreted: true,
      };
    }
  }

  const digits = /^[+-]?[\d.,]+/.exec(trimmed)?.[0] ?? '';
  if (digits.includes('.') && digits.includes(','))
    return { ok: false, reason: 'mixed-separators' };
  const m = SIMPLE.exec(trimmed);
  if (!m) return { ok: false, reason: 'not-a-number' };
  const n = readNumber(m[1] ?? '');
  if (n === 'mixed') return { ok: false, reason: 'mixed-separators' };
  if (n === null) return { ok: false, reason: 'not-a-number' };
  const unitText = (m[2] ?? '').trim();
  let unit: UnitId = shown;
  if (unitText !== '') {
    const found = unitFor(unitText, def.accepted);
    if (found === null) {
      // Text that is not a unit at all ("3x", "2.7.1") is not a number; a word that
      // could be a unit is named back to the person.
      return /^[a-zA-Z°%'’"”²/ ]+$/.test(unitText)
        ? { ok: false, reason: 'unknown-unit', unit: unitText }
        : { ok: false, reason: 'not-a-number' };
    }
    unit = found;
  }
  const valueSI = n * UNITS[unit].toSI;
  return {
    ok: true,
    valueSI,
    shownValue: unit === shown ? n : valueSI / UNITS[shown].toSI,
    unit,
    interpreted: unit !== shown || m[1]?.includes(',') === true,
  };
}
