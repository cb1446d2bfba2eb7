/**
 * From a measured lean to a residual drift ratio. A straight wall or column leaning by θ
 * moves its top sideways by h·tan θ over its height h, so the drift ratio is tan θ and its
 * standard uncertainty u_θ·(1 + tan²θ) (first-order propagation, GUM JCGM 100:2008 §5.1.2).
 * A bowed member leans differently at different heights: measure near mid-height or at
 * several heights (a caution the meter shows).
 */
import type { Direction, ResidualDriftInput } from '../survey/survey-input.js';
import { requireFinite, requireIntegerIn, requireNonNegative } from './checks.js';

/** Leans at or beyond this are not residual drift but a collapse hazard; the meter refuses them. 15°, our choice. */
export const MAX_MEASURABLE_TILT_RAD = (15 * Math.PI) / 180;

export interface DriftFromTilt {
  /** Drift ratio, dimensionless (0.01 = 1 %), ≥ 0. */
  ratio: number;
  /** One standard uncertainty of the ratio. */
  uncertainty: number;
}

/** Drift ratio tan|θ| and its uncertainty from a tilt and its standard uncertainty (rad). */
export function driftRatioFromTilt(tiltRad: number, uncertaintyRad: number): DriftFromTilt {
  requireFinite('tiltRad', tiltRad);
  requireNonNegative('uncertaintyRad', uncertaintyRad);
  if (Math.abs(tiltRad) >= Math.PI / 2) {
    throw new RangeError(`tiltRad must be within ±π/2, got ${tiltRad}`);
  }
  const t = Math.tan(Math.abs(tiltRad));
  return { ratio: t, uncertainty: uncertaintyRad * (1 + t * t) };
}

/**
 * The residual-drift entry a phone tilt reading fills in (method 'phone-tilt'), for the
 * given storey (0 = ground) and plan direction.
 */
export function residualDriftFromTilt(
  tilt: { tiltRad: number; uncertaintyRad: number },
  storey: number,
  direction: Direction,
): ResidualDriftInput {
  requireIntegerIn('storey', storey, 0, 1000);
  if (direction !== 'x' && direction !== 'y') {
    throw new RangeError(`direction must be 'x' or 'y', got ${String(direction)}`);
  }
  const { ratio, uncertainty } = driftRatioFromTilt(tilt.tiltRad, tilt.uncertaintyRad);
  return {
    storey,
    direction,
    ratio,
    method: 'phone-tilt',
    offsetM: null,
    overHeightM: null,
    tiltRad: tilt.tiltRad,
    uncertainty,
  };
}
