/**
 * Conversion between what a field shows and what is stored (SI). Pure multiplication by the
 * exact factors of units.ts: no rounding here; rounding is only ever done for display.
 */
import { QUANTITIES, type Quantity } from './quantities.js';
import type { UnitSystem } from './unit-system.js';
import { UNITS, type UnitId } from './units.js';

function requireFinite(name: string, value: number): void {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number, got ${String(value)}`);
  }
}

/** A value in `unit` expressed in SI. */
export function unitToSI(value: number, unit: UnitId): number {
  requireFinite('value', value);
  const def = UNITS[unit];
  if (!def) throw new RangeError(`unit must be a known unit id, got ${String(unit)}`);
  return value * def.toSI;
}

/** An SI value expressed in `unit`. */
export function unitFromSI(valueSI: number, unit: UnitId): number {
  requireFinite('valueSI', valueSI);
  const def = UNITS[unit];
  if (!def) throw new RangeError(`unit must be a known unit id, got ${String(unit)}`);
  return valueSI / def.toSI;
}

/** A value as shown in `system` for `quantity`, expressed in SI. */
export function toSI(value: number, quantity: Quantity, system: UnitSystem): number {
  return unitToSI(value, QUANTITIES[quantity].shown[system]);
}

/** An SI value as shown in `system` for `quantity`. */
export function fromSI(valueSI: number, quantity: Quantity, system: UnitSystem): number {
  return unitFromSI(valueSI, QUANTITIES[quantity].shown[system]);
}
