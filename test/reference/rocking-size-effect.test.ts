// The size effect of rocking: of two geometrically similar walls the larger is the more stable.
// References: Housner 1963, BSSA 53(2):403–417 (the larger of two similar blocks survives motions
// that topple the smaller; a fact of the trade); Kounadis 2015, Meccanica 50:2219 (same
// conclusion); the rectangular-pulse closed form of the method notes §6 (derived) makes it
// explicit: A = α/(1 − e^(−p·t₁)) grows as p = √(3g/4R) falls.
import { describe, expect, it } from 'vitest';
import {
  groundPulse,
  pulseOverturningCheck,
  rockingBlock,
  rockingTimeHistory,
} from '../../calc/index.js';

describe('size effect: the larger of two similar walls survives a pulse that topples the smaller', () => {
  // Same slenderness (α = 0.245 rad), heights 2 m and 8 m (method notes §6 table rows 1 and 2).
  const small = rockingBlock(0.5, 2.0);
  const large = rockingBlock(2.0, 8.0);

  for (const shape of ['sine', 'ricker'] as const) {
    for (const Tp of [0.5, 1.0]) {
      it(`${shape} pulse, Tp = ${Tp} s: the smallest toppling amplitude is larger for the larger wall`, () => {
        const s = pulseOverturningCheck(small, { pga: 0.3, pulsePeriod: Tp, shape });
        const l = pulseOverturningCheck(large, { pga: 0.3, pulsePeriod: Tp, shape });
        expect(s.overturningAmplitudeG).not.toBeNull();
        expect(l.overturningAmplitudeG ?? Infinity).toBeGreaterThan(
          (s.overturningAmplitudeG as number) * 1.2,
        );
      });
      it(`${shape} pulse, Tp = ${Tp} s: a pulse 3 % above the small wall's toppling amplitude topples it, not the large one`, () => {
        const s = pulseOverturningCheck(small, { pga: 0.3, pulsePeriod: Tp, shape });
        const pulse = groundPulse(shape, 1.03 * (s.overturningAmplitudeG as number), Tp);
        const opts = { breakpointsS: pulse.breakpointsS };
        const rs = rockingTimeHistory(small, pulse.acceleration, pulse.durationS + 10, opts);
        const rl = rockingTimeHistory(large, pulse.acceleration, pulse.durationS + 10, opts);
        expect(rs.overturned).toBe(true);
        expect(rl.overturned).toBe(false);
      });
    }
  }

  it('holds for the rectangular-pulse closed form: larger R, smaller p, larger toppling amplitude', () => {
    const A = (b: { alpha: number; p: number }) => b.alpha / (1 - Math.exp(-b.p * 0.5));
    expect(large.p).toBeCloseTo(small.p / 2, 12); // p ∝ R^(-1/2), R four times larger
    expect(A(large)).toBeGreaterThan(A(small));
  });
});
