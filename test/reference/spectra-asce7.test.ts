// ASCE 7-16 §11.4.6 design spectrum: every branch against hand values.
// Reference: ASCE 7-16 §11.4.6, eqs. (11.4-5)–(11.4-8); the check values SDS = 1.0, SD1 = 0.6,
// TL = 8 are derived by hand from those equations (method notes §2).
import { describe, expect, it } from 'vitest';
import { spectralAcceleration, spectralDisplacement } from '../../calc/index.js';

const spec = { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 } as const;

describe('ASCE 7-16 design spectrum (§11.4.6)', () => {
  it('starts at 0.4·SDS at T = 0 (eq. 11.4-5)', () => {
    expect(spectralAcceleration(spec, 0)).toBeCloseTo(0.4, 12);
  });
  it('rises linearly to 0.70 g at 0.06 s, half of T0 = 0.12 s (eq. 11.4-5)', () => {
    expect(spectralAcceleration(spec, 0.06)).toBeCloseTo(0.7, 12);
  });
  it('returns SDS between T0 = 0.12 s and TS = 0.60 s', () => {
    for (const T of [0.12, 0.3, 0.6]) expect(spectralAcceleration(spec, T)).toBeCloseTo(1.0, 12);
  });
  it('returns SD1/T between TS and TL: 0.60 g at 1.0 s, 0.15 g at 4 s (eq. 11.4-6)', () => {
    expect(spectralAcceleration(spec, 1.0)).toBeCloseTo(0.6, 12);
    expect(spectralAcceleration(spec, 4.0)).toBeCloseTo(0.15, 12);
    expect(spectralAcceleration(spec, 8.0)).toBeCloseTo(0.075, 12);
  });
  it('returns SD1·TL/T² beyond TL: 0.048 g at 10 s (eq. 11.4-7)', () => {
    expect(spectralAcceleration(spec, 10)).toBeCloseTo(0.048, 12);
  });
  it('gives Sd = Sa·g·(T/2π)² in metres: 0.14910 m at 1 s (g = 9.81, derived)', () => {
    expect(spectralDisplacement(spec, 1)).toBeCloseTo((0.6 * 9.81) / (4 * Math.PI * Math.PI), 12);
    expect(spectralDisplacement(spec, 1)).toBeCloseTo(0.1491, 4);
  });
  it('scales by the EN 1998-1 eq. (3.6) factor at 10 % damping, but not at T = 0', () => {
    const damped = { ...spec, damping: 0.1 };
    const eta = Math.sqrt(10 / 15); // EN 1998-1:2004 eq. (3.6)
    expect(spectralAcceleration(damped, 0)).toBeCloseTo(0.4, 12);
    expect(spectralAcceleration(damped, 0.3)).toBeCloseTo(eta, 12);
    expect(spectralAcceleration(damped, 2)).toBeCloseTo((eta * 0.6) / 2, 12);
    expect(spectralAcceleration(damped, 10)).toBeCloseTo(eta * 0.048, 12);
  });
  it('uses the 0.55 floor at 50 % damping (EN 1998-1 eq. 3.6)', () => {
    expect(spectralAcceleration({ ...spec, damping: 0.5 }, 0.3)).toBeCloseTo(0.55, 12);
  });
});
