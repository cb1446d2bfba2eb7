import type { RockingOscillator } from './rocking-block.js';
import {
  runRocking,
  type GroundAcceleration,
  type RockingIntegrationOptions,
} from './rocking-integrator.js';

/** Response of a rocking block to a ground-acceleration history. Angles in rad, times in s. */
export interface RockingTimeHistory {
  /** max|θ| / α over the run; 1 when the block toppled. */
  peakRatio: number;
  /** True when |θ| reached α (the block toppled); the run stops there. */
  overturned: boolean;
  /** Times of the recorded points: every accepted step, impact, uplift and the end. */
  t: number[];
  /** θ at those times. */
  theta: number[];
  /** max|θ| in rad. */
  peakTheta: number;
  impacts: number;
  impactTimesS: number[];
  /** First lift-off, or null when the ground never exceeded the uplift threshold. */
  upliftTimeS: number | null;
  overturnTimeS: number | null;
  /** State at the end of the run (at the toppling instant if it toppled), to continue from. */
  final: { t: number; theta: number; thetaDot: number; atRest: boolean };
  /** False only if the step guard stopped the run early (the result then covers less). */
  completed: boolean;
  acceptedSteps: number;
  rejectedSteps: number;
}

/**
 * Rocking response of `block` (what rockingBlock or rockingWall returned, or any
 * RockingOscillator) to the ground acceleration `groundAcceleration(t)` in m/s², for
 * 0 ≤ t ≤ `durationS`. Integrates θ̈ = −p²·[sin(α·sgnθ − θ) + (üg/g)·cos(α·sgnθ − θ)]
 * (Housner 1963) with an adaptive Dormand–Prince 5(4) step:
 *
 * - the block starts at rest (unless `options.initialTheta`/`initialThetaDot` say otherwise)
 *   and lifts off only once |üg| exceeds g × `upliftAccelerationG` (later lift-offs: g·tan α);
 * - at every impact θ̇ is multiplied by the restitution r, the impact instant being located
 *   on the integrated trajectory;
 * - toppling is declared when |θ| reaches α (past α the block needs ground motion of the
 *   right sign to come back, the usual convention).
 *
 * Give the times where a record jumps in `options.breakpointsS` so steps land on them.
 * @throws RangeError for a bad block, a duration not finite > 0, a bad option, or a ground
 *   acceleration that is not a finite number.
 */
export function rockingTimeHistory(
  block: RockingOscillator,
  groundAcceleration: GroundAcceleration,
  durationS: number,
  options: RockingIntegrationOptions = {},
): RockingTimeHistory {
  const run = runRocking(block, groundAcceleration, durationS, options);
  return {
    peakRatio: run.peakAbsTheta / block.alpha,
    overturned: run.overturned,
    t: run.t,
    theta: run.theta,
    peakTheta: run.peakAbsTheta,
    impacts: run.impacts,
    impactTimesS: run.impactTimesS,
    upliftTimeS: run.upliftTimeS,
    overturnTimeS: run.overturnTimeS,
    final: run.final,
    completed: run.completed,
    acceptedSteps: run.acceptedSteps,
    rejectedSteps: run.rejectedSteps,
  };
}
