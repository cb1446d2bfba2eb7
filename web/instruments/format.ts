/** Number formatting for the instruments' readouts (fixed decimals, no "-0"). */
export function fixed(value: number, decimals: number): string {
  const s = value.toFixed(decimals);
  return /^-0(\.0+)?$/.test(s) ? s.slice(1) : s;
}

/** Radians to degrees (exact definition). */
export const toDegrees = (rad: number): number => (rad * 180) / Math.PI;
