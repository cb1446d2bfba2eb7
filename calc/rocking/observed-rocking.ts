import { requireNonNegative, requirePositive } from './guards.js';

/**
 * Bands for reading a rocking ratio θ/α (observed or predicted). Names and limits are ours
 * (common practice, no source): a fraction of the toppling angle, the usual way rocking
 * response is expressed (Housner 1963; Makris & Konstantinidis 2003).
 */
export type RockingBand =
  | 'none' // no uplift
  | 'small' // θ/α < 0.15
  | 'moderate' // 0.15 ≤ θ/α < 0.4
  | 'large' // 0.4 ≤ θ/α < 0.7
  | 'near-toppling' // 0.7 ≤ θ/α < 1
  | 'beyond-stability'; // θ/α ≥ 1: a rigid wall standing after this is not consistent

/** Upper limits of the bands small, moderate, large, near-toppling, as θ/α (ours, no source). */
export const ROCKING_BAND_LIMITS = { small: 0.15, moderate: 0.4, large: 0.7, nearToppling: 1 };

const BAND_TEXT: Record<RockingBand, string> = {
  none: 'No uplift.',
  small: 'Small rocking: well within the stability of the wall.',
  moderate: 'Moderate rocking: the wall used a fair part of its stability.',
  large: 'Large rocking: more than 40 % of the toppling angle was reached.',
  'near-toppling':
    'Near toppling: the wall came within 30 % of its toppling angle; it needs a detailed assessment.',
  'beyond-stability':
    'Beyond stability: the rotation equals or exceeds the toppling angle of a rigid wall. ' +
    'Check the reading; the base may have crushed or slid, or the wall is leaning.',
};

/** The band of a rocking ratio θ/α (≥ 0). */
export function rockingBand(ratio: number): RockingBand {
  requireNonNegative('ratio', ratio);
  if (ratio === 0) return 'none';
  if (ratio < ROCKING_BAND_LIMITS.small) return 'small';
  if (ratio < ROCKING_BAND_LIMITS.moderate) return 'moderate';
  if (ratio < ROCKING_BAND_LIMITS.large) return 'large';
  if (ratio < ROCKING_BAND_LIMITS.nearToppling) return 'near-toppling';
  return 'beyond-stability';
}

/** A sentence describing a band, for display. */
export function rockingBandText(band: RockingBand): string {
  return BAND_TEXT[band];
}

/** What an uplift gap says about how far the wall rocked. */
export interface ObservedRocking {
  /** The gap read at the heel, in m. */
  upliftGapM: number;
  /** θobs = gap / width, in rad (small-angle reading of the heel lift). */
  thetaObserved: number;
  /** θobs / α. */
  ratio: number;
  band: RockingBand;
  text: string;
}

/**
 * Rotation implied by an uplift gap measured at the heel of a wall: the heel of a wall
 * rocking by θ about its toe rises by width·sin θ ≈ width·θ, so θobs = gap / width, compared
 * with the block's α (derived from the rigid-block geometry of Housner 1963). The reading is
 * taken to be the peak uplift (marks, crushed sealant, displaced finishes), not a residual gap.
 *
 * @param block anything with the wall's full width `widthM` and slenderness `alpha`
 *   (rockingBlock or rockingWall results).
 * @throws RangeError when the gap is not finite ≥ 0, or the block's width or α is bad.
 */
export function observedRocking(
  block: { widthM: number; alpha: number },
  upliftGapM: number,
): ObservedRocking {
  if (block === null || typeof block !== 'object') {
    throw new RangeError(`block must be an object, got ${String(block)}`);
  }
  const width = requirePositive('block.widthM', block.widthM);
  const alpha = requirePositive('block.alpha', block.alpha);
  const gap = requireNonNegative('upliftGapM', upliftGapM);
  const thetaObserved = gap / width;
  const ratio = thetaObserved / alpha;
  const band = rockingBand(ratio);
  return { upliftGapM: gap, thetaObserved, ratio, band, text: BAND_TEXT[band] };
}
