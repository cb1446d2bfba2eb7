// Rigid-block rocking parameters and the wall → equivalent-block mapping.
// References: Housner 1963, BSSA 53(2):403–417 (α = atan(b/h), R = √(b²+h²), p = √(3g/(4R)),
// uplift at g·tanα, r = 1 − 1.5 sin²α, T = (4/p)·cosh⁻¹[1/(1 − θ₀/α)]), with the hand values of
// the method notes §6 (derived from those formulas, g = 9.81 m/s²).
import { describe, expect, it } from 'vitest';
import { freeRockingPeriod, rockingBlock, rockingWall } from '../../calc/index.js';

// Method notes §6 table: half-dims b × h (m) → R, α, p, r, g·tanα, T at θ₀ = α/2.
const HAND: Array<
  [b: number, h: number, R: number, alpha: number, p: number, r: number, gTan: number, T: number]
> = [
  [0.25, 1.0, 1.0308, 0.24498, 2.6717, 0.91176, 2.4525, 1.9717],
  [1.0, 4.0, 4.1231, 0.24498, 1.3358, 0.91176, 2.4525, 3.9435],
  [0.2, 2.0, 2.01, 0.09967, 1.9132, 0.98515, 0.981, 2.7534],
];

describe('rockingBlock against the Housner 1963 hand values (method notes §6)', () => {
  for (const [b, h, R, alpha, p, r, gTan, T] of HAND) {
    const block = rockingBlock(2 * b, 2 * h);
    it(`gives R = ${R} m and α = ${alpha} rad for half-dimensions ${b} × ${h} m`, () => {
      expect(block.R).toBeCloseTo(R, 4);
      expect(block.alpha).toBeCloseTo(alpha, 5);
    });
    it(`gives p = ${p} rad/s and r = ${r} for half-dimensions ${b} × ${h} m`, () => {
      expect(block.p).toBeCloseTo(p, 4);
      expect(block.restitution).toBeCloseTo(r, 5);
    });
    it(`lifts off at g·tanα = ${gTan} m/s² for half-dimensions ${b} × ${h} m`, () => {
      expect(block.upliftAccelerationG * 9.81).toBeCloseTo(gTan, 4);
    });
    it(`rocks freely with T = ${T} s from θ₀ = α/2 for half-dimensions ${b} × ${h} m`, () => {
      expect(freeRockingPeriod(2 * b, 2 * h, block.alpha / 2)).toBeCloseTo(T, 4);
    });
  }

  it('reports the full dimensions it was given', () => {
    const block = rockingBlock(0.5, 2);
    expect(block.widthM).toBe(0.5);
    expect(block.heightM).toBe(2);
  });
});

describe('rockingWall maps a wall onto an equivalent block (derived from Housner 1963)', () => {
  it('keeps the simple rigid block exact when there is no gravity load, post-tension or hold-down', () => {
    const wall = rockingWall({
      widthM: 1.2,
      heightM: 2.7,
      selfWeightN: 13_600,
      gravityLoadN: 0,
      postTensionN: 0,
      holdDownCapacityN: 0,
    });
    const block = rockingBlock(1.2, 2.7);
    expect(wall.alpha).toBeCloseTo(block.alpha, 14);
    expect(wall.p).toBeCloseTo(block.p, 13);
    expect(wall.R).toBeCloseTo(block.R, 14);
    expect(wall.restitution).toBeCloseTo(block.restitution, 14);
    expect(wall.upliftAccelerationG).toBeCloseTo(block.upliftAccelerationG, 14);
    expect(wall.panel).toEqual(block);
  });

  // Hand case, worked here from the lever arms (b = 0.6 m, h = 1.35 m):
  // W = 10 kN at b, N = 20 kN at b, P = 50 kN at b, F = 30 kN at 2b.
  // M_up = (10 + 20 + 50)·0.6 + 30·1.2 = 84 kN·m; W·h + N·2h = 13.5 + 54 = 67.5 kN·m per g.
  const wall = rockingWall({
    widthM: 1.2,
    heightM: 2.7,
    selfWeightN: 10_000,
    gravityLoadN: 20_000,
    postTensionN: 50_000,
    holdDownCapacityN: 30_000,
  });
  it('states the lever arms: b for weight, gravity load and tendon, 2b for the heel hold-down', () => {
    expect(wall.leverArmsM.selfWeight).toBeCloseTo(0.6, 12);
    expect(wall.leverArmsM.gravityLoad).toBeCloseTo(0.6, 12);
    expect(wall.leverArmsM.postTension).toBeCloseTo(0.6, 12);
    expect(wall.leverArmsM.holdDown).toBeCloseTo(1.2, 12);
  });
  it('gives the moment capacity (W + N + P)·b + F·2b = 84 kN·m', () => {
    expect(wall.momentCapacityNm).toBeCloseTo(84_000, 6);
  });
  it('gives the uplift acceleration λ = M / (W·h + N·2h) = 84/67.5 = 1.2444 g', () => {
    expect(wall.upliftAccelerationG).toBeCloseTo(84 / 67.5, 12);
    expect(wall.upliftBaseShearN).toBeCloseTo((84 / 67.5) * 30_000, 6);
  });
  it('rocks, hold-downs gone, with α_e = atan(48/67.5) and g·tanα_e the later uplift threshold', () => {
    expect(wall.alpha).toBeCloseTo(Math.atan(48 / 67.5), 12);
    expect(wall.rockingUpliftAccelerationG).toBeCloseTo(48 / 67.5, 12);
  });
  it('gives p_e² = (W·h + N·2h)/(I₀·cos α_e) with I₀ = (4/3)·m·R² + m_N·(b² + 4h²)', () => {
    const g = 9.81;
    const I0 =
      (4 / 3) * (10_000 / g) * (0.6 ** 2 + 1.35 ** 2) + (20_000 / g) * (0.36 + 4 * 1.35 ** 2);
    expect(wall.rotationalInertiaKgM2).toBeCloseTo(I0, 6);
    expect(wall.p).toBeCloseTo(Math.sqrt(67_500 / (I0 * Math.cos(Math.atan(48 / 67.5)))), 12);
    expect(wall.restitution).toBeCloseTo(1 - (2 * (30_000 / g) * 0.36) / I0, 12);
  });
});
