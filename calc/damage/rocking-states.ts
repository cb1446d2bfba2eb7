/**
 * What rocking says about damage: the band of θ/α (how much of its toppling angle a wall
 * used, see calc/rocking observed-rocking.ts) mapped to the least damage state, and what
 * uplift of a wall that is not meant to rock says. Tables of our own (common practice, no
 * source): the nearer a wall comes to toppling, the more its toes crush, its connectors
 * yield and its stability is in doubt.
 */
import type { RockingBand } from '../rocking/observed-rocking.js';
import type { DamageState } from './damage-state.js';

/** Least damage state of a rocking band, for a prediction and for an observation. */
export const ROCKING_BAND_STATES: Readonly<
  Record<RockingBand, { predicted: DamageState; observed: DamageState }>
> = {
  none: { predicted: 'none', observed: 'none' },
  small: { predicted: 'none', observed: 'none' },
  moderate: { predicted: 'slight', observed: 'slight' },
  large: { predicted: 'moderate', observed: 'moderate' },
  'near-toppling': { predicted: 'extensive', observed: 'extensive' },
  // A predicted θ ≥ α means the wall topples. An observed θ ≥ α on a standing wall does not
  // fit a rigid wall: the reading, a crushed base or a lean; treated as Extensive and sent
  // to an engineer.
  'beyond-stability': { predicted: 'complete', observed: 'extensive' },
};

/**
 * Uplift measured under a wall that is not a rocking wall (a shear wall or a bracketed CLT
 * panel): its hold-downs or anchorage have yielded or let go. Least state Moderate (our
 * own, common practice, no source; Hazus calls slip and separation at connections Moderate).
 */
export const SHEAR_WALL_UPLIFT_STATE: DamageState = 'moderate';

/**
 * Uplift on a rocking wall that has hold-downs: they have yielded or let go and need
 * replacing. Least state Moderate (our own, common practice, no source).
 */
export const ENGAGED_HOLD_DOWN_STATE: DamageState = 'moderate';

/**
 * Smallest gap under a shear wall or a rocking wall's hold-downs read as yielding: 3 mm,
 * about the hold-down slip a design allows, so smaller gaps are within normal slip and
 * reading error (our own, common practice, no source).
 */
export const UPLIFT_YIELD_GAP_M = 0.003;
