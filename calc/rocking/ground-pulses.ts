import { G } from '../units/gravity.js';
import { requireFinite, requirePositive } from './guards.js';
import type { GroundAcceleration } from './rocking-integrator.js';

/** Shapes of the idealised ground-acceleration pulses. */
export type PulseShape = 'sine' | 'ricker';

/** A ground-acceleration pulse, ready for rockingTimeHistory. */
export interface GroundPulse {
  shape: PulseShape | 'rectangular';
  /** Peak ground acceleration of the pulse, in g (its sign sets the first direction). */
  amplitudeG: number;
  /** Pulse period in s (for 'rectangular': its duration). */
  periodS: number;
  /** The pulse is zero after this time, in s. */
  durationS: number;
  /** Times where the acceleration jumps or kinks, in s (pass to the integrator). */
  breakpointsS: number[];
  /** Ground acceleration in m/s². */
  acceleration: GroundAcceleration;
}

/**
 * Number of pulse periods either side of the Ricker wavelet's centre that are kept: at 1.5·Tp
 * the wavelet is below 1e-8 of its peak (derived: (1 − 2π²·2.25)·e^(−π²·2.25) ≈ −1e-8).
 */
const RICKER_HALF_SPAN = 1.5;

/**
 * A one-cycle ground-acceleration pulse of peak `amplitudeG` (g) and period `periodS` (s):
 *
 * - 'sine': üg = A·g·sin(2πt/Tp) for 0 ≤ t ≤ Tp, zero after; the ground velocity is a
 *   one-sided (1 − cos) pulse, the "type-A" cycloidal pulse of Zhang & Makris 2001
 *   (J. Eng. Mech. 127(5):473–483; from memory, verify) for near-fault forward directivity;
 * - 'ricker': the Ricker wavelet üg = A·g·(1 − 2π²τ²/Tp²)·e^(−π²τ²/Tp²), τ = t − 1.5·Tp,
 *   whose Fourier amplitude peaks at 1/Tp (Ricker 1953, Geophysics 18(1):10–40; used for
 *   rocking by Makris & Vassiliou 2012, from memory, verify), kept for 0 ≤ t ≤ 3·Tp.
 *
 * @throws RangeError unless the amplitude is finite and the period finite > 0.
 */
export function groundPulse(shape: PulseShape, amplitudeG: number, periodS: number): GroundPulse {
  requireFinite('amplitudeG', amplitudeG);
  requirePositive('periodS', periodS);
  const a = amplitudeG * G;
  if (shape === 'sine') {
    const w = (2 * Math.PI) / periodS;
    return {
      shape,
      amplitudeG,
      periodS,
      durationS: periodS,
      breakpointsS: [periodS],
      acceleration: (t) => (t >= 0 && t < periodS ? a * Math.sin(w * t) : 0),
    };
  }
  if (shape === 'ricker') {
    const centre = RICKER_HALF_SPAN * periodS;
    const end = 2 * centre;
    const k = (Math.PI * Math.PI) / (periodS * periodS);
    return {
      shape,
      amplitudeG,
      periodS,
      durationS: end,
      breakpointsS: [end],
      acceleration: (t) => {
        if (!(t >= 0 && t <= end)) return 0;
        const x = k * (t - centre) * (t - centre);
        return a * (1 - 2 * x) * Math.exp(-x);
      },
    };
  }
  throw new RangeError(`shape must be 'sine' or 'ricker', got ${String(shape)}`);
}

/**
 * A rectangular acceleration pulse üg = A·g for 0 ≤ t < t₁, zero after: the idealised pulse
 * for which the linearised rocking equation has a closed-form toppling condition
 * A ≥ α / (1 − e^(−p·t₁)) (derived from Housner 1963).
 */
export function rectangularPulse(amplitudeG: number, durationS: number): GroundPulse {
  requireFinite('amplitudeG', amplitudeG);
  requirePositive('durationS', durationS);
  const a = amplitudeG * G;
  return {
    shape: 'rectangular',
    amplitudeG,
    periodS: durationS,
    durationS,
    breakpointsS: [durationS],
    acceleration: (t) => (t >= 0 && t < durationS ? a : 0),
  };
}

/**
 * Period in s of the velocity pulse of near-fault ground motion expected for moment
 * magnitude `mw`: ln Tp = −6.45 + 1.11·Mw (Baker 2007, BSSA 97(5):1486–1501, regression on
 * NGA pulse-like records; from memory, verify). Mw 6 → 1.3 s, Mw 7 → 3.7 s. Median only; the
 * scatter is large (σ_lnTp ≈ 0.6, same source, from memory, verify).
 *
 * @throws RangeError unless 4 ≤ Mw ≤ 9 (outside the range the relation was fitted to, and
 *   far outside any sensible use).
 */
export function pulsePeriodFromMagnitude(mw: number): number {
  requireFinite('magnitude', mw);
  if (mw < 4 || mw > 9) throw new RangeError(`magnitude must be in [4, 9], got ${mw}`);
  // −6.45 and 1.11: Baker 2007, BSSA 97(5), pulse period regression (from memory, verify).
  return Math.exp(-6.45 + 1.11 * mw);
}
