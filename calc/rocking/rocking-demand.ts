import { spectralAcceleration, spectralDisplacement } from '../spectra/index.js';
import type { SpectrumSpec } from '../spectra/index.js';
import { checkOscillator, effectiveHeight, type RockingOscillator } from './rocking-block.js';
import { SPECTRAL_ROCKING_CAUTION } from './rocking-cautions.js';

/** Result of {@link rockingDemand}. Angles in rad. */
export interface RockingDemand {
  /** Peak rotation θ at the fixed point (α when toppling is predicted, 0 with no uplift). */
  thetaDemand: number;
  /** θ/α (1 when toppling is predicted). */
  ratio: number;
  /** False when the iteration had not settled after the maximum number of iterations. */
  converged: boolean;
  iterations: number;
  /** True when the spectrum's PGA exceeds the uplift acceleration (else no rocking). */
  uplifts: boolean;
  /** True when the iteration reached θ ≥ α: toppling predicted. */
  overturning: boolean;
  /** Free-rocking period at the final amplitude, in s (null with no uplift or toppling). */
  periodS: number | null;
  /** Equivalent viscous damping ratio from the restitution, ξ = −ln(r)/π. */
  dampingRatio: number;
  /** Height of the equivalent oscillator, in m: Δ = θ·h_e. */
  effectiveHeightM: number;
  /** Spectral displacement at the final period, in m (0 with no uplift). */
  displacementM: number;
  /** The spectrum's acceleration at T = 0 (its PGA), in g. */
  pga: number;
  /** This estimate is known to be unreliable in some cases: show this beside it. */
  caution: string;
}

/** Starting amplitude of the iteration, × α (ours: small, so it grows from rest). */
const START = 0.05;
/** Convergence: successive amplitudes within this × α (ours). */
const TOLERANCE = 1e-6;
/** Below this × α the rocking is negligible and the iteration stops (ours). */
const NEGLIGIBLE = 1e-4;
/** Iteration limit (ours): convergence is linear, and slow only near a tangency. */
const MAX_ITERATIONS = 500;
/**
 * Cap on the equivalent damping ratio (ours): r → 0 gives ξ → ∞, and the spectra's damping
 * correction already stops at η = 0.55 (ξ ≈ 28 %, EN 1998-1 eq. 3.6).
 */
const MAX_DAMPING = 0.5;

/**
 * Equivalent viscous damping ratio of a rocking block from its restitution r, derived here:
 * each impact keeps r² of the kinetic energy, a cycle has two impacts, so a cycle keeps r⁴;
 * a lightly damped linear oscillator keeps e^(−4πξ) per cycle; equating, ξ = −ln(r)/π.
 */
export function rockingDampingRatio(restitution: number): number {
  if (restitution <= 0) return MAX_DAMPING;
  return Math.min(MAX_DAMPING, -Math.log(restitution) / Math.PI);
}

/**
 * Peak rocking rotation from the displacement spectrum, by the equivalent single-degree-of-
 * freedom method (Priestley, Evison & Carr 1978, Bull. NZSEE 11(3):141–150):
 *
 * 1. no rocking unless the spectrum's PGA, Sa(0), exceeds the uplift acceleration;
 * 2. at amplitude θ the block rocks with the free-rocking period
 *    T(θ) = (4/p)·cosh⁻¹[1/(1 − θ/α)] (Housner 1963);
 * 3. impacts damp it like viscous damping ξ = −ln(r)/π (see rockingDampingRatio), which is
 *    passed to the spectrum as its damping;
 * 4. the displacement Sd(T(θ), ξ) is taken at the effective height h_e = g/(p²·cos α), so the
 *    next amplitude is Sd/h_e; this is iterated from θ = 0.05·α to a fixed point.
 *
 * Because Sd(T) and T(θ) both increase, the iteration moves monotonically: it settles on the
 * smallest consistent amplitude above its start, or passes α (toppling predicted: reported as
 * θ = α, ratio 1, `overturning` true). `converged` is false if 500 iterations did not settle.
 *
 * This estimate is known to be unreliable in some cases (Makris & Konstantinidis 2003,
 * EESD 32(2):265–289); keep the time-history check beside it (see `caution`).
 * @throws RangeError for a bad block or spectrum.
 */
export function rockingDemand(wall: RockingOscillator, spec: SpectrumSpec): RockingDemand {
  checkOscillator(wall);
  if (spec === null || typeof spec !== 'object') {
    throw new RangeError(`spec must be a spectrum specification, got ${String(spec)}`);
  }
  const { alpha, p } = wall;
  const xi = rockingDampingRatio(wall.restitution);
  const damped: SpectrumSpec = { ...spec, damping: xi };
  const he = effectiveHeight(wall);
  const pga = spectralAcceleration(spec, 0);
  const base = {
    dampingRatio: xi,
    effectiveHeightM: he,
    pga,
    caution: SPECTRAL_ROCKING_CAUTION,
  };
  const uplift = Math.max(wall.upliftAccelerationG, Math.tan(alpha));
  if (!(pga > uplift)) {
    return {
      ...base,
      thetaDemand: 0,
      ratio: 0,
      converged: true,
      iterations: 0,
      uplifts: false,
      overturning: false,
      periodS: null,
      displacementM: 0,
    };
  }
  const periodAt = (theta: number): number => (4 / p) * Math.acosh(1 / (1 - theta / alpha));
  let theta = START * alpha;
  let T = periodAt(theta);
  let sd = 0;
  for (let k = 1; k <= MAX_ITERATIONS; k++) {
    T = periodAt(theta);
    sd = spectralDisplacement(damped, T);
    const next = sd / he;
    if (next >= alpha) {
      return {
        ...base,
        thetaDemand: alpha,
        ratio: 1,
        converged: true,
        iterations: k,
        uplifts: true,
        overturning: true,
        periodS: null,
        displacementM: sd,
      };
    }
    const settled = Math.abs(next - theta) <= TOLERANCE * alpha || next < NEGLIGIBLE * alpha;
    theta = next;
    if (settled) {
      return {
        ...base,
        thetaDemand: theta,
        ratio: theta / alpha,
        converged: true,
        iterations: k,
        uplifts: true,
        overturning: false,
        periodS: periodAt(theta),
        displacementM: sd,
      };
    }
  }
  return {
    ...base,
    thetaDemand: theta,
    ratio: theta / alpha,
    converged: false,
    iterations: MAX_ITERATIONS,
    uplifts: true,
    overturning: false,
    periodS: periodAt(theta),
    displacementM: sd,
  };
}
