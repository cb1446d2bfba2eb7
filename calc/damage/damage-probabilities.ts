import { DAMAGE_STATES, type DamageState } from './damage-state.js';
import { THRESHOLD_STATES, type PerState } from './hazus-wood-parameters.js';
import { lognormalFragility } from './lognormal-fragility.js';

/** Probabilities of reaching or exceeding each damage state above None. */
export interface ExceedanceProbabilities {
  slight: number;
  moderate: number;
  extensive: number;
  complete: number;
}

/** Probability of being in each damage state (they sum to 1). */
export interface DiscreteProbabilities {
  none: number;
  slight: number;
  moderate: number;
  extensive: number;
  complete: number;
}

export interface DamageProbabilities {
  exceedance: ExceedanceProbabilities;
  discrete: DiscreteProbabilities;
  /**
   * The worst state more likely reached than not (P(≥ state) ≥ 0.5), i.e. the last state
   * whose median the demand has passed; 'none' below the Slight median. It never goes down
   * when the demand goes up.
   */
  medianState: DamageState;
  /** The state with the largest discrete probability. */
  mostLikelyState: DamageState;
}

/**
 * Damage-state probabilities at demand x from four lognormal curves (Hazus: one median and
 * one β per state, Slight to Complete). Discrete probabilities are the differences of
 * successive exceedance curves (Hazus technical manual, chapter 5). Where two curves with
 * different β would cross (only far outside any real demand), the higher state's exceedance
 * is capped at the lower one's so no discrete probability is negative (common practice, no
 * source).
 *
 * @param x demand, finite ≥ 0, in the unit of the medians.
 * @throws RangeError when x, a median or a β is out of range (see lognormalFragility).
 */
export function damageProbabilities(
  x: number,
  medians: PerState,
  betas: PerState,
): DamageProbabilities {
  const p: number[] = [];
  let previous = 1;
  for (let i = 0; i < 4; i++) {
    const value = Math.min(previous, lognormalFragility(x, medians[i]!, betas[i]!));
    p.push(value);
    previous = value;
  }
  const [s, m, e, c] = p as [number, number, number, number];
  const discrete: DiscreteProbabilities = {
    none: 1 - s,
    slight: s - m,
    moderate: m - e,
    extensive: e - c,
    complete: c,
  };
  let medianState: DamageState = 'none';
  for (let i = 0; i < 4; i++) if (p[i]! >= 0.5) medianState = THRESHOLD_STATES[i]!;
  let mostLikelyState: DamageState = 'none';
  for (const state of DAMAGE_STATES) {
    if (discrete[state] > discrete[mostLikelyState]) mostLikelyState = state;
  }
  return {
    exceedance: { slight: s, moderate: m, extensive: e, complete: c },
    discrete,
    medianState,
    mostLikelyState,
  };
}
