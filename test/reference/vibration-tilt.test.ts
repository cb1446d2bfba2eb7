// Tilt meter arithmetic against hand values (worked by hand here, from the geometry in
// calc/vibration/gravity-tilt.ts and the reversal algebra in reversal.ts), drift ratio from
// tilt (tan θ, GUM JCGM 100:2008 §5.1.2 first-order propagation), and the stiffness-loss
// indicator k/k_ref = (f/f_ref)² (SDOF relation, Chopra, Dynamics of Structures, ch. 2).
import { describe, expect, it } from 'vitest';
import {
  driftRatioFromTilt,
  G,
  measureTiltPosition,
  residualDriftFromTilt,
  reversalCalibration,
  SENSITIVITY_TOLERANCE,
  stiffnessLossIndicator,
  stiffnessRatio,
  tiltFromGravity,
} from '../../calc/index.js';
import { gaussian, mulberry32 } from './vibration-synthetic.js';

const deg = Math.PI / 180;

describe('tiltFromGravity (hand values)', () => {
  it('reads an upright phone as x 0, y 90°, z 0', () => {
    const t = tiltFromGravity(0, 9.81, 0);
    expect(t.xRad).toBe(0);
    expect(t.yRad).toBeCloseTo(Math.PI / 2, 15);
    expect(t.zRad).toBe(0);
    expect(t.magnitudeMps2).toBeCloseTo(9.81, 15);
  });
  it('reads a face-up phone (W3C: z ≈ +9.8) as z 90°', () => {
    expect(tiltFromGravity(0, 0, 9.8).zRad).toBeCloseTo(Math.PI / 2, 15);
  });
  it('reads g·(sin 1°, cos 1°, 0) as exactly 1° on x', () => {
    const t = tiltFromGravity(G * Math.sin(deg), G * Math.cos(deg), 0);
    expect(t.xRad / deg).toBeCloseTo(1, 12);
  });
  it('reads (0.1, 9.8, 0.2) m/s² as x = atan(0.1/√(9.8² + 0.2²)) = 0.0102016 rad', () => {
    expect(tiltFromGravity(0.1, 9.8, 0.2).xRad).toBeCloseTo(0.0102016034, 9);
  });
  it('gives the same x angle whatever the phone is turned to within the face (rotation about x)', () => {
    const lean = 0.4 * deg;
    for (const psi of [0, 10, 30, 60]) {
      const p = psi * deg;
      const t = tiltFromGravity(
        G * Math.sin(lean),
        G * Math.cos(lean) * Math.cos(p),
        G * Math.cos(lean) * Math.sin(p),
      );
      expect(t.xRad).toBeCloseTo(lean, 14);
    }
  });
  it('reads (1, 1, 0) as 45° on x and on y', () => {
    const t = tiltFromGravity(1, 1, 0);
    expect(t.xRad / deg).toBeCloseTo(45, 12);
    expect(t.yRad / deg).toBeCloseTo(45, 12);
  });
  it('does not crash on a zero or non-finite vector: throws a RangeError with the values', () => {
    expect(() => tiltFromGravity(0, 0, 0)).toThrow(/must not be zero, got \(0, 0, 0\)/);
    expect(() => tiltFromGravity(Number.NaN, 9.8, 0)).toThrow(
      /ax must be a finite number, got NaN/,
    );
  });
});

describe('two-position reversal (hand values)', () => {
  it('splits 0.8° and −0.2° into a 0.5° lean and a 0.3° offset', () => {
    const r = reversalCalibration(
      { angleRad: 0.8 * deg, uncertaintyRad: 0.01 },
      { angleRad: -0.2 * deg, uncertaintyRad: 0.01 },
    );
    expect(r.tiltRad / deg).toBeCloseTo(0.5, 12);
    expect(r.offsetRad / deg).toBeCloseTo(0.3, 12);
    // ½·√(0.01² + 0.01²) combined with 2 % of 0.5°: √(0.0070711² + 0.00017453²) = 0.0070732.
    expect(r.uncertaintyRad).toBeCloseTo(0.0070732215, 9);
    expect(r.offsetPlausible).toBe(true);
  });
  it('flags an offset over 5.7° as implausible (a handling error, not a sensor offset)', () => {
    const r = reversalCalibration(
      { angleRad: 7 * deg, uncertaintyRad: 0 },
      { angleRad: 6 * deg, uncertaintyRad: 0 },
    );
    expect(r.offsetPlausible).toBe(false);
  });
  it('cancels a 40 mg zero offset and a 1 % axis misalignment when turned about the long axis', () => {
    // Readings ax = g·sin θ·s + c·ay + b with s = 1.01 (scale), c = 0.01, b = 0.04 g; the turn
    // about y flips the true x component only (derived in reversal.ts).
    const lean = 0.3 * deg;
    const b = 0.04 * G;
    const c = 0.01;
    const s = 1.01;
    const ay = G * Math.cos(lean);
    const reading = (sign: number) => {
      const ax = s * sign * G * Math.sin(lean) + c * ay + b;
      return { angleRad: tiltFromGravity(ax, ay, 0).xRad, uncertaintyRad: 0 };
    };
    const r = reversalCalibration(reading(1), reading(-1));
    // Only the scale error remains: 1 % of the lean, inside the 2 % allowance.
    expect(Math.abs(r.tiltRad - lean) / lean).toBeLessThan(0.011);
    expect(r.uncertaintyRad).toBeCloseTo(SENSITIVITY_TOLERANCE * Math.abs(r.tiltRad), 12);
  });
});

describe('one averaged position', () => {
  function readings(n: number, seed: number, sigma: number, step = 0, lean = 0.2 * deg) {
    const g = gaussian(mulberry32(seed));
    const round = (v: number) => (step > 0 ? Math.round(v / step) * step : v);
    const x: number[] = [];
    const y: number[] = [];
    const z: number[] = [];
    for (let i = 0; i < n; i++) {
      x.push(round(G * Math.sin(lean) + sigma * g()));
      y.push(round(G * Math.cos(lean) + sigma * g()));
      z.push(round(0.05 + sigma * g()));
    }
    return { x, y, z };
  }
  it('averages 2 s at 100 Hz of a still phone to the lean, with a standard error near σ/(g√n)', () => {
    const sigma = 0.01;
    const p = measureTiltPosition(readings(200, 1, sigma));
    expect(p.ok).toBe(true);
    expect(Math.abs(p.angleRad - 0.2 * deg)).toBeLessThan(4 * p.uncertaintyRad);
    const expected = sigma / (G * Math.sqrt(200));
    expect(p.uncertaintyRad / expected).toBeGreaterThan(0.4);
    expect(p.uncertaintyRad / expected).toBeLessThan(2.5);
  });
  it('adds the rounding error step/(g·√12) = 0.00294 rad when 0.1 m/s² rounding leaves no scatter', () => {
    const p = measureTiltPosition(readings(200, 2, 0.001, 0.1));
    expect(p.quantizationStepMps2).toBeCloseTo(0.1, 9);
    expect(p.uncertaintyRad).toBeCloseTo(0.0029426619, 5);
  });
  it('says "not still" when the phone shook', () => {
    const r = readings(200, 3, 0.01);
    for (let i = 100; i < 120; i++) r.x[i] = (r.x[i] as number) + 0.8;
    const p = measureTiltPosition(r);
    expect(p.still).toBe(false);
    expect(p.ok).toBe(false);
  });
  it('says "not upright" for a phone lying flat', () => {
    const p = measureTiltPosition({
      x: new Array(50).fill(0.1),
      y: new Array(50).fill(0.2),
      z: new Array(50).fill(9.8),
    });
    expect(p.upright).toBe(false);
  });
  it('does not crash on no readings, unequal axes or NaN: throws a RangeError', () => {
    expect(() => measureTiltPosition({ x: [], y: [], z: [] })).toThrow(/at least one reading/);
    expect(() => measureTiltPosition({ x: [1], y: [1, 2], z: [1] })).toThrow(/same length/);
    expect(() => measureTiltPosition({ x: [Number.NaN], y: [9.8], z: [0] })).toThrow(
      /readings\.x\[0\]/,
    );
  });
});

describe('drift ratio from tilt (hand values)', () => {
  it('turns 0.5° ± 0.001 rad into tan 0.5° = 0.0087269 ± 0.0010001', () => {
    const d = driftRatioFromTilt(0.5 * deg, 0.001);
    expect(d.ratio).toBeCloseTo(0.0087268678, 9);
    expect(d.uncertainty).toBeCloseTo(0.0010000762, 9);
  });
  it('gives the same ratio for a lean either way', () => {
    expect(driftRatioFromTilt(-0.5 * deg, 0).ratio).toBeCloseTo(
      driftRatioFromTilt(0.5 * deg, 0).ratio,
      15,
    );
  });
  it('fills a residual-drift entry of method phone-tilt', () => {
    const r = residualDriftFromTilt({ tiltRad: -0.01, uncertaintyRad: 0.002 }, 1, 'y');
    expect(r).toEqual({
      storey: 1,
      direction: 'y',
      ratio: Math.tan(0.01),
      method: 'phone-tilt',
      offsetM: null,
      overHeightM: null,
      tiltRad: -0.01,
      uncertainty: 0.002 * (1 + Math.tan(0.01) ** 2),
    });
  });
  it('rejects a lean of 90° or a bad storey with the value', () => {
    expect(() => driftRatioFromTilt(Math.PI / 2, 0)).toThrow(/within ±π\/2/);
    expect(() => residualDriftFromTilt({ tiltRad: 0, uncertaintyRad: 0 }, -1, 'x')).toThrow(
      /storey/,
    );
  });
});

describe('stiffness-loss indicator (hand values)', () => {
  it('gives (2.7/3.0)² = 0.81 and a loss of 19 %', () => {
    expect(stiffnessRatio(2.7, 3)).toBeCloseTo(0.81, 14);
    const s = stiffnessLossIndicator({ frequencyHz: 2.7, referenceFrequencyHz: 3 });
    expect(s.lossFraction).toBeCloseTo(0.19, 14);
    expect(s.uncertainty).toBe(0);
  });
  it('propagates 1 % on f and 30 % on f_ref to ±0.486 on the ratio', () => {
    const s = stiffnessLossIndicator({
      frequencyHz: 2.7,
      frequencyUncertaintyHz: 0.027,
      referenceFrequencyHz: 3,
      referenceRelativeUncertainty: 0.3,
    });
    expect(s.uncertainty).toBeCloseTo(0.4862699, 6);
  });
  it('rejects a zero reference with the value', () => {
    expect(() => stiffnessRatio(2, 0)).toThrow(
      /referenceFrequencyHz must be a finite number > 0, got 0/,
    );
  });
});
