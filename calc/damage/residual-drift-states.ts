/**
 * What a residual (permanent) drift ratio says about damage, after the residual drift
 * damage states of FEMA P-58-1 (2012), Appendix C, Table C-1 (from memory, verify):
 *
 * | residual drift | FEMA P-58 state | meaning                                                   | our state |
 * | -------------- | --------------- | --------------------------------------------------------- | --------- |
 * | ≥ 0.2 %        | DS1             | doors and other drift-sensitive parts need adjustment     | slight    |
 * | ≥ 0.5 %        | DS2             | the structure needs realignment                           | moderate  |
 * | ≥ 1 %          | DS3             | major realignment; repair may not be economically feasible | extensive |
 *
 * DS4 of FEMA P-58 (a residual drift at which collapse in an aftershock is a danger)
 * depends on the system and is not set here: from 1 % on the building is sent to an engineer.
 * The link from the FEMA P-58 states to the Hazus state names is our own (common practice,
 * no source).
 *
 * About 0.5 % residual drift is also where owners found repair costing more than rebuilding
 * (McCormick, Aburano, Ikenaga & Nakashima 2008, 14th World Conference on Earthquake
 * Engineering; from memory, verify).
 */
import type { DamageState } from './damage-state.js';

/** One threshold of the residual drift table. */
export interface ResidualDriftThreshold {
  ratio: number;
  state: DamageState;
  /** The FEMA P-58 residual drift damage state it stands for. */
  femaState: 'DS1' | 'DS2' | 'DS3';
  meaning: string;
}

/** FEMA P-58-1 Appendix C Table C-1 residual drift thresholds (from memory, verify). */
export const RESIDUAL_DRIFT_THRESHOLDS: readonly ResidualDriftThreshold[] = [
  {
    ratio: 0.002,
    state: 'slight',
    femaState: 'DS1',
    meaning: 'doors, windows and other drift-sensitive parts need adjusting',
  },
  {
    ratio: 0.005,
    state: 'moderate',
    femaState: 'DS2',
    meaning: 'the structure needs realigning',
  },
  {
    ratio: 0.01,
    state: 'extensive',
    femaState: 'DS3',
    meaning: 'major realignment is needed and repair may not be economically feasible',
  },
];

/**
 * Residual drift at which repair often costs more than rebuilding: 0.5 % (McCormick et al.
 * 2008, 14WCEE; from memory, verify).
 */
export const REPAIR_VERSUS_REBUILD_RATIO = 0.005;

/**
 * Residual drift from which the building goes to an engineer for its stability in
 * aftershocks: 1 %, the FEMA P-58 DS3 threshold (FEMA P-58 DS4 is system-dependent and not
 * set; our choice, common practice, no source).
 */
export const RESIDUAL_STABILITY_RATIO = 0.01;

/** The damage state a residual drift ratio implies, with the threshold it passed (null below 0.2 %). */
export function residualDriftState(ratio: number): {
  state: DamageState;
  threshold: ResidualDriftThreshold | null;
} {
  if (typeof ratio !== 'number' || !Number.isFinite(ratio) || ratio < 0) {
    throw new RangeError(`ratio must be a finite number ≥ 0, got ${String(ratio)}`);
  }
  let passed: ResidualDriftThreshold | null = null;
  for (const t of RESIDUAL_DRIFT_THRESHOLDS) if (ratio >= t.ratio) passed = t;
  return { state: passed?.state ?? 'none', threshold: passed };
}
