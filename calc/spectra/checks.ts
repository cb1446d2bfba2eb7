/**
 * Guards shared by the calculation core: programmer errors throw a RangeError that names the
 * argument and shows the bad value, so a caller can see at once what went wrong.
 */

/** Throws unless `value` is a finite number. */
export function requireFinite(name: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new RangeError(`${name} must be a finite number, got ${String(value)}`);
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

/** Throws unless `value` is a finite number > 0. */
export function requirePositive(name: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw new RangeError(`${name} must be a finite number > 0, got ${String(value)}`);
  }
  return value;
}
