/** The coordinate grid's spacing and labels (web/map/grid-lines.ts). */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  MIN_GRID_SPACING_PX,
  decimalsFor,
  formatDegrees,
  gridFor,
  roundStep,
} from '../../web/map/grid-lines.js';

describe('coordinate grid', () => {
  it('rounds a spacing up to 1, 2 or 5 times a power of ten', () => {
    expect(roundStep(0.0013)).toBe(0.002);
    expect(roundStep(0.002)).toBe(0.002);
    expect(roundStep(0.0031)).toBe(0.005);
    expect(roundStep(0.1)).toBe(0.1);
    expect(roundStep(7)).toBe(10);
    expect(roundStep(0.6)).toBe(1);
  });

  it('labels with hemisphere letters and just enough decimals', () => {
    expect(decimalsFor(0.002)).toBe(3);
    expect(decimalsFor(0.1)).toBe(1);
    expect(decimalsFor(5)).toBe(0);
    expect(formatDegrees(44.512, 'lat', 3)).toBe('44.512° N');
    expect(formatDegrees(-33.9, 'lat', 1)).toBe('33.9° S');
    expect(formatDegrees(-0.0001, 'lon', 2)).toBe('0.00°');
    expect(formatDegrees(11.35, 'lon', 2)).toBe('11.35° E');
    expect(formatDegrees(-122.5, 'lon', 1)).toBe('122.5° W');
  });

  it('keeps lines at least the minimum spacing apart and covers the view (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -80, max: 79, noNaN: true }),
        fc.double({ min: -179, max: 178, noNaN: true }),
        fc.double({ min: 1e-4, max: 1, noNaN: true }),
        fc.integer({ min: 200, max: 2000 }),
        fc.integer({ min: 200, max: 2000 }),
        (south, west, span, widthPx, heightPx) => {
          const view = {
            south,
            west,
            north: Math.min(85, south + span),
            east: west + span,
            widthPx,
            heightPx,
          };
          const g = gridFor(view);
          const degPerPx = Math.max(span / widthPx, (view.north - south) / heightPx);
          expect(g.stepDeg / degPerPx).toBeGreaterThanOrEqual(MIN_GRID_SPACING_PX * (1 - 1e-9));
          for (const m of g.meridians) {
            expect(m.value).toBeGreaterThanOrEqual(west - 1e-9);
            expect(m.value).toBeLessThanOrEqual(view.east + 1e-9);
          }
          // Consecutive lines are one step apart.
          for (let i = 1; i < g.parallels.length; i++) {
            expect(g.parallels[i]!.value - g.parallels[i - 1]!.value).toBeCloseTo(g.stepDeg, 9);
          }
        },
      ),
    );
  });

  it('does not crash on a degenerate view', () => {
    const g = gridFor({ south: 10, west: 10, north: 10, east: 10, widthPx: 0, heightPx: 0 });
    expect(g.parallels.length).toBeLessThanOrEqual(500);
    expect(() => roundStep(0)).toThrow(/0/);
    expect(() => roundStep(Number.NaN)).toThrow(/NaN/);
  });
});
