// Single-event spectrum from shaking-map values. The shape is the two-parameter ASCE 7-16
// §11.4.6 shape (T0 = 0.2·TS, TS = Sa1/plateau) anchored at the map's PGA; the expected
// values below are worked by hand from that definition.
import { describe, expect, it } from 'vitest';
import { spectralAcceleration } from '../../calc/index.js';

const spec = { kind: 'event', pga: 0.3, sa03: 0.8, sa10: 0.4 } as const;

describe('event spectrum built from PGA, Sa(0.3 s), Sa(1.0 s)', () => {
  it('returns the map PGA at T = 0', () => {
    expect(spectralAcceleration(spec, 0)).toBe(0.3);
  });
  it('passes through the map value at 0.3 s (the plateau, TS = 0.5 s)', () => {
    expect(spectralAcceleration(spec, 0.3)).toBeCloseTo(0.8, 12);
    expect(spectralAcceleration(spec, 0.5)).toBeCloseTo(0.8, 12);
  });
  it('passes through the map value at 1.0 s and falls as 1/T beyond (ASCE 7-16 eq. 11.4-6 form)', () => {
    expect(spectralAcceleration(spec, 1.0)).toBeCloseTo(0.4, 12);
    expect(spectralAcceleration(spec, 2.0)).toBeCloseTo(0.2, 12);
  });
  it('ramps linearly from PGA to the plateau over 0 … T0 = 0.1 s', () => {
    expect(spectralAcceleration(spec, 0.05)).toBeCloseTo(0.55, 12);
  });
  it('raises the plateau to Sa(1.0 s) on a long-period-rich site', () => {
    const soft = { kind: 'event', pga: 0.2, sa03: 0.4, sa10: 0.5 } as const;
    expect(spectralAcceleration(soft, 0.5)).toBeCloseTo(0.5, 12);
    expect(spectralAcceleration(soft, 1.0)).toBeCloseTo(0.5, 12);
    expect(spectralAcceleration(soft, 2.0)).toBeCloseTo(0.25, 12);
  });
  it('does not crash on a zero-shaking event and returns zero above T = 0', () => {
    const zero = { kind: 'event', pga: 0, sa03: 0, sa10: 0 } as const;
    expect(spectralAcceleration(zero, 0)).toBe(0);
    expect(spectralAcceleration(zero, 0.5)).toBe(0);
  });
  it('scales by η (EN 1998-1 eq. 3.6) at 10 % damping, except at T = 0', () => {
    const eta = Math.sqrt(10 / 15);
    expect(spectralAcceleration({ ...spec, damping: 0.1 }, 0)).toBe(0.3);
    expect(spectralAcceleration({ ...spec, damping: 0.1 }, 0.3)).toBeCloseTo(0.8 * eta, 12);
  });
});
