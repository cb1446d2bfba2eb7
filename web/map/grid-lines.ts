/**
 * Where to draw the coordinate grid: lines of latitude and longitude at a "round" spacing
 * (1, 2 or 5 times a power of ten, in degrees) chosen so that lines are at least a set
 * number of pixels apart, with labels that show just enough decimals for that spacing.
 * Pure, so it can be checked without a map.
 */

export interface GridView {
  south: number;
  west: number;
  north: number;
  east: number;
  /** Width and height of the view in CSS pixels. */
  widthPx: number;
  heightPx: number;
}

export interface GridLine {
  /** Degrees: latitude for a parallel, longitude for a meridian. */
  value: number;
  label: string;
}

export interface Grid {
  stepDeg: number;
  parallels: GridLine[];
  meridians: GridLine[];
}

/** Least distance between grid lines, in CSS pixels (readable labels on a phone). */
export const MIN_GRID_SPACING_PX = 90;

/** The smallest round step (1, 2, 5 × 10^k degrees) at least `minDeg` wide. */
export function roundStep(minDeg: number): number {
  if (!(minDeg > 0) || !Number.isFinite(minDeg)) {
    throw new RangeError(`minDeg must be a finite number > 0, got ${minDeg}`);
  }
  const power = 10 ** Math.floor(Math.log10(minDeg));
  for (const m of [1, 2, 5, 10]) {
    // A tiny tolerance keeps 0.1 from rounding up to 0.2 through float error.
    if (m * power >= minDeg * (1 - 1e-9)) return m * power;
  }
  return 10 * power;
}

/** Decimals that show a multiple of `step` exactly. */
export function decimalsFor(step: number): number {
  return Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
}

/** "44.50° N", "11.35° E", "0°". */
export function formatDegrees(value: number, axis: 'lat' | 'lon', decimals: number): string {
  const rounded = Number(value.toFixed(decimals));
  if (rounded === 0) return `${(0).toFixed(decimals)}°`;
  const hemisphere = axis === 'lat' ? (rounded > 0 ? 'N' : 'S') : rounded > 0 ? 'E' : 'W';
  return `${Math.abs(rounded).toFixed(decimals)}° ${hemisphere}`;
}

function lines(from: number, to: number, step: number, axis: 'lat' | 'lon'): GridLine[] {
  const decimals = decimalsFor(step);
  const out: GridLine[] = [];
  const first = Math.ceil(from / step - 1e-9);
  const last = Math.floor(to / step + 1e-9);
  // At most a few hundred lines whatever the input, so a bad view cannot hang the page.
  for (let i = first; i <= last && out.length < 500; i++) {
    const value = Number((i * step).toFixed(decimals + 2));
    out.push({ value, label: formatDegrees(value, axis, decimals) });
  }
  return out;
}

/** The grid for a view. Latitude is clamped to ±85 (the Web Mercator limit). */
export function gridFor(view: GridView): Grid {
  const south = Math.max(-85, Math.min(view.south, view.north));
  const north = Math.min(85, Math.max(view.south, view.north));
  const spanLon = Math.max(1e-9, view.east - view.west);
  const spanLat = Math.max(1e-9, north - south);
  const degPerPx = Math.max(
    spanLon / Math.max(1, view.widthPx),
    spanLat / Math.max(1, view.heightPx),
  );
  const stepDeg = Math.min(30, roundStep(degPerPx * MIN_GRID_SPACING_PX));
  return {
    stepDeg,
    parallels: lines(south, north, stepDeg, 'lat'),
    meridians: lines(view.west, view.east, stepDeg, 'lon'),
  };
}
