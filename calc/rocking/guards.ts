/**
 * Argument guards of the rocking module: programmer errors throw a RangeError that names the
 * argument and shows the bad value, so no NaN can enter (and none can leave) the calculation.
 */

/** Throws unless `value` is a finite number. */
export function requireFinite(name: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number, got ${String(value)}`);
  }
  return value;
}

/** Throws unless `value` is a finite number > 0. */
export function requirePositive(name: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a finite number > 0, got ${String(value)}`);
  }
  return value;
}

/** Throws unless `value` is a finite number ≥ 0. */
export function requireNonNegative(name: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    throw new RangeError(`${name} must be a finite number ≥ 0, got ${String(value)}`);
  }
  return value;
}

/** Throws unless `value` is a finite number in [lo, hi]. */
export function requireInRange(name: string, value: number, lo: number, hi: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < lo || value > hi) {
    throw new RangeError(`${name} must be a finite number in [${lo}, ${hi}], got ${String(value)}`);
  }
  return value;
}
