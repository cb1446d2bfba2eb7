// Toppling under a rectangular ground-acceleration pulse.
// Reference: closed form from the linearised Housner (1963, BSSA 53(2):403–417) equation — a block
// hit by üg = A·g for 0 ≤ t < t₁ topples iff A ≥ α / (1 − e^(−p·t₁)) (method notes §6, derived;
// for α = 0.1, p = 2: A/α = 1.5820 at t₁ = 0.5 s and 1.1565 at t₁ = 1.0 s).
import { describe, expect, it } from 'vitest';
import { G, rectangularPulse, rockingBlock, rockingTimeHistory } from '../../calc/index.js';
import type { RockingOscillator } from '../../calc/index.js';

const critical = (alpha: number, p: number, t1: number): number => alpha / (1 - Math.exp(-p * t1));

function topples(
  block: RockingOscillator,
  amplitudeG: number,
  t1: number,
): { overturned: boolean; peakRatio: number } {
  const pulse = rectangularPulse(-amplitudeG, t1); // negative üg pushes the block onto θ > 0
  return rockingTimeHistory(block, pulse.acceleration, t1 + 20, {
    breakpointsS: pulse.breakpointsS,
  });
}

describe('the closed-form toppling amplitude of the method notes (§6, derived)', () => {
  it('gives A/α = 1.5820 at t₁ = 0.5 s and 1.1565 at t₁ = 1.0 s for α = 0.1, p = 2', () => {
    expect(critical(0.1, 2, 0.5) / 0.1).toBeCloseTo(1.582, 4);
    expect(critical(0.1, 2, 1.0) / 0.1).toBeCloseTo(1.1565, 4);
  });
});

describe('the time history under a rectangular pulse brackets the closed-form amplitude', () => {
  // α = 0.1 and p = 2 exactly: a block with R = 3g/(4p²) and b/h = tan 0.1 (Housner's p).
  const alpha = 0.1;
  const R = (3 * G) / (4 * 2 * 2);
  const slender = rockingBlock(2 * R * Math.sin(alpha), 2 * R * Math.cos(alpha));
  // The 0.2 × 2.0 m half-dimension block of the method notes table (α = 0.09967, p = 1.9132).
  const table = rockingBlock(0.4, 4.0);
  const CASES: Array<[name: string, block: RockingOscillator, t1: number]> = [
    ['α = 0.1, p = 2', slender, 0.5],
    ['α = 0.1, p = 2', slender, 1.0],
    ['0.4 × 4.0 m block', table, 0.5],
    ['0.4 × 4.0 m block', table, 1.0],
  ];
  for (const [name, block, t1] of CASES) {
    const A = critical(block.alpha, block.p, t1);
    it(`${name}, t₁ = ${t1} s: survives 0.97× the toppling amplitude`, () => {
      const r = topples(block, 0.97 * A, t1);
      expect(r.overturned).toBe(false);
      expect(r.peakRatio).toBeGreaterThan(0.3);
      expect(r.peakRatio).toBeLessThan(1);
    });
    it(`${name}, t₁ = ${t1} s: topples at 1.03× the toppling amplitude`, () => {
      const r = topples(block, 1.03 * A, t1);
      expect(r.overturned).toBe(true);
      expect(r.peakRatio).toBe(1);
    });
  }
  it('confirms the check block has α = 0.1 and p = 2', () => {
    expect(slender.alpha).toBeCloseTo(0.1, 14);
    expect(slender.p).toBeCloseTo(2, 13);
  });
});
