/**
 * Axis arithmetic for the small SVG plots: "nice" tick steps (1, 2, 2.5 or 5 × 10ⁿ) and a
 * linear map from data to the plot box. Pure numbers in, numbers out.
 */

/** A tick step near `range / targetCount` that is 1, 2, 2.5 or 5 times a power of ten. */
export function niceStep(range: number, targetCount = 4): number {
  if (!(range > 0) || !Number.isFinite(range)) return 1;
  const raw = range / targetCount;
  const power = Math.pow(10, Math.floor(Math.log10(raw)));
  const f = raw / power;
  const m = f <= 1 ? 1 : f <= 2 ? 2 : f <= 2.5 ? 2.5 : f <= 5 ? 5 : 10;
  return m * power;
}

/** The axis top: the first multiple of a nice step at or above `max`, and the ticks 0..top. */
export function niceAxis(max: number, targetCount = 4): { top: number; ticks: number[] } {
  const m = max > 0 && Number.isFinite(max) ? max : 1;
  const step = niceStep(m, targetCount);
  const top = Math.ceil(m / step - 1e-9) * step;
  const ticks: number[] = [];
  for (let v = 0; v <= top + step * 1e-6; v += step) ticks.push(Number(v.toPrecision(12)));
  return { top, ticks };
}

/** Linear map from [d0, d1] to [r0, r1]. */
export function linear(d0: number, d1: number, r0: number, r1: number): (v: number) => number {
  const k = d1 === d0 ? 0 : (r1 - r0) / (d1 - d0);
  return (v) => r0 + (v - d0) * k;
}

/** A tick label: no trailing zeros, at most `decimals` decimals. */
export function tickLabel(v: number, decimals = 2): string {
  return Number(v.toFixed(decimals)).toString();
}
