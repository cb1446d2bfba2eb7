// Axis arithmetic for the plots.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { linear, niceAxis, niceStep, tickLabel } from '../../web/screens/result/plot-scale.js';

describe('plot axes', () => {
  it('picks 1, 2, 2.5 or 5 times a power of ten', () => {
    expect(niceStep(4)).toBe(1);
    expect(niceStep(0.8)).toBe(0.2);
    expect(niceStep(0.9)).toBe(0.25);
    expect(niceStep(17)).toBe(5);
  });
  it('covers the data with a few ticks from 0 (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-4, max: 1e4, noNaN: true }), (max) => {
        const a = niceAxis(max);
        expect(a.top).toBeGreaterThanOrEqual(max * (1 - 1e-9));
        expect(a.ticks[0]).toBe(0);
        expect(a.ticks.length).toBeGreaterThanOrEqual(2);
        expect(a.ticks.length).toBeLessThanOrEqual(12);
      }),
    );
  });
  it('does not crash on zero, negative or NaN maxima', () => {
    expect(niceAxis(0).top).toBe(1);
    expect(niceAxis(-3).top).toBe(1);
    expect(niceAxis(NaN).top).toBe(1);
  });
  it('maps linearly and labels without trailing zeros', () => {
    const f = linear(0, 4, 40, 360);
    expect(f(2)).toBe(200);
    expect(linear(1, 1, 0, 10)(5)).toBe(0);
    expect(tickLabel(0.25)).toBe('0.25');
    expect(tickLabel(2)).toBe('2');
  });
});
