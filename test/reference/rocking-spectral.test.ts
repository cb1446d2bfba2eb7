// Equivalent-SDOF estimate of peak rocking on the displacement spectrum.
// References: Priestley, Evison & Carr 1978, Bull. NZSEE 11(3):141–150 (the method: amplitude-
// dependent period, damping from restitution, displacement spectrum, iterated); Housner 1963,
// BSSA 53(2):403–417 (free-rocking period, restitution); EN 1998-1:2004 §3.2.2.2 eqs. (3.2)–(3.6)
// and ASCE 7-16 §11.4.6, retyped here, with a different solver (grid scan + bisection for the
// first consistent amplitude) as the independent reference. Makris & Konstantinidis 2003
// (EESD 32(2):265–289) show the method can be unreliable, so the result carries a caution.
import { describe, expect, it } from 'vitest';
import { G, rockingBlock, rockingDampingRatio, rockingDemand } from '../../calc/index.js';
import type { RockingBlock, SpectrumSpec } from '../../calc/index.js';

/** EN 1998-1 eqs. (3.2)–(3.5), η from (3.6) with its 0.55 floor; ground B type 1 / C type 2. */
function ec8Sd(
  ag: number,
  S: number,
  TB: number,
  TC: number,
  TD: number,
  xi: number,
  T: number,
): number {
  const eta = Math.max(0.55, Math.sqrt(10 / (5 + 100 * xi)));
  let sa: number;
  if (T <= TB) sa = ag * S * (1 + (T / TB) * (2.5 * eta - 1));
  else if (T <= TC) sa = 2.5 * ag * S * eta;
  else if (T <= TD) sa = (2.5 * ag * S * eta * TC) / T;
  else sa = (2.5 * ag * S * eta * TC * TD) / (T * T);
  return sa * G * (T / (2 * Math.PI)) ** 2;
}

/** ASCE 7-16 §11.4.6 with the same η extension (ordinates above T = 0 scaled). */
function asceSd(SDS: number, SD1: number, TL: number, xi: number, T: number): number {
  const eta = Math.max(0.55, Math.sqrt(10 / (5 + 100 * xi)));
  const T0 = (0.2 * SD1) / SDS;
  const TS = SD1 / SDS;
  let sa: number;
  if (T < T0) sa = SDS * (0.4 + ((eta - 0.4) * T) / T0);
  else if (T <= TS) sa = eta * SDS;
  else if (T <= TL) sa = (eta * SD1) / T;
  else sa = (eta * SD1 * TL) / (T * T);
  return sa * G * (T / (2 * Math.PI)) ** 2;
}

/** First θ above 0.05α where Sd(T(θ))/h_e = θ (grid scan then bisection), or null if none below α. */
function firstFixedPoint(block: RockingBlock, sd: (T: number) => number): number | null {
  const { alpha, p } = block;
  const b = block.widthM / 2;
  const h = block.heightM / 2;
  const he = (4 * (b * b + h * h)) / (3 * h); // I₀/(m·h) of a rectangle about its corner
  const gap = (th: number) => sd((4 / p) * Math.acosh(1 / (1 - th / alpha))) / he - th;
  let lo = 0.05 * alpha;
  if (gap(lo) <= 0) return null;
  const n = 20_000;
  for (let i = 1; i < n; i++) {
    const hi = 0.05 * alpha + (0.95 * alpha * i) / n;
    if (gap(hi) <= 0) {
      let a = lo;
      let c = hi;
      for (let k = 0; k < 80; k++) {
        const m = 0.5 * (a + c);
        if (gap(m) > 0) a = m;
        else c = m;
      }
      return 0.5 * (a + c);
    }
    lo = hi;
  }
  return null;
}

describe('rockingDemand against an independent solution of the same fixed point', () => {
  const CASES: Array<
    [
      name: string,
      widthM: number,
      heightM: number,
      spec: SpectrumSpec,
      sd: (xi: number, T: number) => number,
    ]
  > = [
    [
      'EC8 type 1 B, ag 0.4 g, 0.5 × 2 m',
      0.5,
      2,
      { kind: 'ec8', type: 1, ground: 'B', ag: 0.4 },
      (xi, T) => ec8Sd(0.4, 1.2, 0.15, 0.5, 2.0, xi, T),
    ],
    [
      'EC8 type 2 C, ag 0.3 g, 0.5 × 2 m',
      0.5,
      2,
      { kind: 'ec8', type: 2, ground: 'C', ag: 0.3 },
      (xi, T) => ec8Sd(0.3, 1.5, 0.1, 0.25, 1.2, xi, T),
    ],
    [
      'EC8 type 1 B, ag 0.3 g, 2 × 8 m',
      2,
      8,
      { kind: 'ec8', type: 1, ground: 'B', ag: 0.3 },
      (xi, T) => ec8Sd(0.3, 1.2, 0.15, 0.5, 2.0, xi, T),
    ],
    [
      'ASCE 7 SDS 1.0, SD1 0.6, 2 × 8 m',
      2,
      8,
      { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8 },
      (xi, T) => asceSd(1.0, 0.6, 8, xi, T),
    ],
    [
      'EC8 type 1 B, ag 0.4 g, 1.2 × 2.7 m',
      1.2,
      2.7,
      { kind: 'ec8', type: 1, ground: 'B', ag: 0.4 },
      (xi, T) => ec8Sd(0.4, 1.2, 0.15, 0.5, 2.0, xi, T),
    ],
  ];
  for (const [name, w, hgt, spec, sd] of CASES) {
    it(`finds the same amplitude as a grid-and-bisection solution (${name})`, () => {
      const block = rockingBlock(w, hgt);
      const xi = -Math.log(block.restitution) / Math.PI;
      const ref = firstFixedPoint(block, (T) => sd(xi, T));
      const d = rockingDemand(block, spec);
      expect(ref).not.toBeNull();
      expect(d.converged).toBe(true);
      expect(d.overturning).toBe(false);
      expect(Math.abs(d.thetaDemand - (ref as number)) / block.alpha).toBeLessThan(1e-4);
      expect(d.ratio).toBeCloseTo(d.thetaDemand / block.alpha, 14);
      expect(d.caution).toMatch(/Makris & Konstantinidis 2003/);
    });
  }

  it('predicts toppling when no amplitude below α is consistent (EC8 type 1 B, 0.4 g, 0.4 × 4 m)', () => {
    const block = rockingBlock(0.4, 4);
    const xi = -Math.log(block.restitution) / Math.PI;
    expect(firstFixedPoint(block, (T) => ec8Sd(0.4, 1.2, 0.15, 0.5, 2.0, xi, T))).toBeNull();
    const d = rockingDemand(block, { kind: 'ec8', type: 1, ground: 'B', ag: 0.4 });
    expect(d.overturning).toBe(true);
    expect(d.ratio).toBe(1);
    expect(d.thetaDemand).toBe(block.alpha);
  });

  it('predicts no rocking when the PGA is below the uplift acceleration g·tanα', () => {
    const block = rockingBlock(1.2, 2.7); // tan α = 0.444
    const d = rockingDemand(block, { kind: 'ec8', type: 1, ground: 'B', ag: 0.3 }); // PGA 0.36 g
    expect(d.uplifts).toBe(false);
    expect(d.ratio).toBe(0);
    expect(d.iterations).toBe(0);
  });
});

describe('equivalent damping from restitution (derived: a cycle keeps r⁴ of its energy)', () => {
  it('is −ln(r)/π: 2.94 % for α = 0.245 (r = 0.91176) and 0.476 % for α = 0.0997 (r = 0.98515)', () => {
    expect(rockingDampingRatio(0.91176)).toBeCloseTo(-Math.log(0.91176) / Math.PI, 12);
    expect(rockingDampingRatio(0.91176)).toBeCloseTo(0.0294, 4);
    expect(rockingDampingRatio(0.98515)).toBeCloseTo(0.00476, 5);
  });
  it('matches e^(−4πξ) = r⁴ per cycle exactly', () => {
    const r = 0.8;
    expect(Math.exp(-4 * Math.PI * rockingDampingRatio(r))).toBeCloseTo(r ** 4, 12);
  });
});
