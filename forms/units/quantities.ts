/**
 * What kind of value a field holds, and which unit it shows in each unit system. A quantity
 * also lists the other units a person may type explicitly (e.g. "2.7 m" in a field shown
 * in feet), so a value read off a tape in the other system needs no mental arithmetic.
 */
import type { UnitSystem } from './unit-system.js';
import type { UnitId } from './units.js';

export type Quantity =
  | 'length' // storey and wall heights, wall lengths and positions, plan sizes
  | 'smallLength' // uplift gaps, drift offsets, panel thickness
  | 'area' // floor area
  | 'force' // loads, capacities, post-tension
  | 'stiffness' // connector slip stiffness
  | 'unitShear' // shear strength per length of wall
  | 'unitStiffness' // shear stiffness per length of wall
  | 'pressure' // dead load per area
  | 'acceleration' // spectral ordinates, in g
  | 'period' // spectrum corner periods
  | 'angle' // tilt
  | 'percent' // damping and drift ratios, shown in %
  | 'frequency'
  | 'coordinate' // latitude, longitude in decimal degrees
  | 'factor' // a plain number such as the soil factor S
  | 'count';

export interface QuantityDef {
  /** The unit shown in each system. */
  shown: Readonly<Record<UnitSystem, UnitId>>;
  /** Every unit accepted when typed after the number. */
  accepted: readonly UnitId[];
  /** Whether "9' 6"" style feet-and-inches is accepted. */
  feetInches?: boolean;
}

export const QUANTITIES: Readonly<Record<Quantity, QuantityDef>> = {
  length: {
    shown: { si: 'm', us: 'ft' },
    accepted: ['m', 'cm', 'mm', 'ft', 'in'],
    feetInches: true,
  },
  smallLength: { shown: { si: 'mm', us: 'in' }, accepted: ['mm', 'cm', 'm', 'in'] },
  area: { shown: { si: 'm2', us: 'ft2' }, accepted: ['m2', 'ft2'] },
  force: { shown: { si: 'kN', us: 'kip' }, accepted: ['kN', 'N', 'kip', 'lbf'] },
  stiffness: { shown: { si: 'kN/mm', us: 'kip/in' }, accepted: ['kN/mm', 'kip/in'] },
  unitShear: { shown: { si: 'kN/m', us: 'plf' }, accepted: ['kN/m', 'plf'] },
  unitStiffness: {
    shown: { si: 'kN/mm/m', us: 'kip/in/ft' },
    accepted: ['kN/mm/m', 'kip/in/ft'],
  },
  pressure: { shown: { si: 'kPa', us: 'psf' }, accepted: ['kPa', 'psf'] },
  acceleration: { shown: { si: 'g', us: 'g' }, accepted: ['g'] },
  period: { shown: { si: 's', us: 's' }, accepted: ['s'] },
  angle: { shown: { si: 'deg', us: 'deg' }, accepted: ['deg'] },
  percent: { shown: { si: 'pct', us: 'pct' }, accepted: ['pct'] },
  frequency: { shown: { si: 'Hz', us: 'Hz' }, accepted: ['Hz'] },
  coordinate: { shown: { si: 'coord', us: 'coord' }, accepted: ['coord'] },
  factor: { shown: { si: 'factor', us: 'factor' }, accepted: [] },
  count: { shown: { si: 'count', us: 'count' }, accepted: [] },
};

/** The unit a quantity is shown in under a unit system. */
export function shownUnit(quantity: Quantity, system: UnitSystem): UnitId {
  return QUANTITIES[quantity].shown[system];
}
