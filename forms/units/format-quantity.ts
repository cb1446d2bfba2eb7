/**
 * Numbers as text for people. Two uses, two rules:
 * - `formatForInput`: the text put back into a field for a stored value. It keeps enough
 *   digits that a value typed in this unit comes back as typed (9.75 ft stays 9.75, not
 *   9.7500000001), and never uses exponent notation.
 * - `formatQuantity`: a reading in results and plots, rounded to the unit's display decimals.
 */
import { QUANTITIES, type Quantity } from './quantities.js';
import type { UnitSystem } from './unit-system.js';
import { UNITS, type UnitId } from './units.js';

/** Extra decimals an input keeps beyond the display decimals (common practice, no source). */
const INPUT_EXTRA_DECIMALS = 3;

function trimZeros(fixed: string): string {
  if (!fixed.includes('.')) return fixed;
  const out = fixed.replace(/0+$/, '').replace(/\.$/, '');
  return out === '-0' ? '0' : out;
}

/** `value` (already in `unit`) as input text: up to display + 3 decimals, no trailing zeros. */
export function formatNumberForInput(value: number, unit: UnitId): string {
  if (!Number.isFinite(value)) {
    throw new RangeError(`value must be a finite number, got ${String(value)}`);
  }
  // toPrecision(12) first removes binary noise from the conversion (2.9718 / 0.3048).
  const clean = Number(value.toPrecision(12));
  return trimZeros(clean.toFixed(Math.min(20, UNITS[unit].decimals + INPUT_EXTRA_DECIMALS)));
}

/** A stored SI value as the text of a field shown in `system`. */
export function formatForInput(valueSI: number, quantity: Quantity, system: UnitSystem): string {
  const unit = QUANTITIES[quantity].shown[system];
  return formatNumberForInput(valueSI / UNITS[unit].toSI, unit);
}

/** `value` (already in `unit`) rounded to the unit's display decimals, or `decimals`. */
export function formatNumber(value: number, unit: UnitId, decimals?: number): string {
  if (!Number.isFinite(value)) {
    throw new RangeError(`value must be a finite number, got ${String(value)}`);
  }
  const fixed = value.toFixed(decimals ?? UNITS[unit].decimals);
  return /^-0(\.0+)?$/.test(fixed) ? fixed.slice(1) : fixed;
}

/** A stored SI value, rounded for display in `system` (the number only, no unit). */
export function formatQuantity(
  valueSI: number,
  quantity: Quantity,
  system: UnitSystem,
  decimals?: number,
): string {
  const unit = QUANTITIES[quantity].shown[system];
  return formatNumber(valueSI / UNITS[unit].toSI, unit, decimals);
}
