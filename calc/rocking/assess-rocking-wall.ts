import { spectralAcceleration, type SpectrumSpec } from '../spectra/index.js';
import { requirePositive } from './guards.js';
import type { PulseShape } from './ground-pulses.js';
import {
  observedRocking,
  rockingBand,
  type ObservedRocking,
  type RockingBand,
} from './observed-rocking.js';
import { pulseOverturningCheck, type PulseOverturningCheck } from './pulse-overturning.js';
import {
  DEVICES_CAUTION,
  SCREENING_CAUTION,
  SPECTRAL_ROCKING_CAUTION,
} from './rocking-cautions.js';
import { rockingDemand, type RockingDemand } from './rocking-demand.js';
import type { RockingWallModel } from './rocking-wall-from-input.js';

/** Why a rocking wall result needs attention. Our own names. */
export type RockingFlag =
  | 'devices-not-modelled' // supplemental devices present: not modelled, detailed assessment
  | 'no-hazard' // no spectrum: nothing predicted
  | 'spectral-not-converged' // the equivalent-SDOF iteration did not settle
  | 'spectral-predicts-toppling' // the equivalent-SDOF iteration reached θ ≥ α
  | 'pulse-topples-at-pga' // the pulse at the site's PGA topples the wall
  | 'pulse-toppling-amplitude-reached' // the smallest toppling amplitude is ≤ the site's PGA
  | 'observed-near-toppling' // observed θ/α ≥ 0.7
  | 'observed-beyond-stability' // observed θ/α ≥ 1: check the reading
  | 'observed-above-prediction' // observed rocking well above what the hazard predicts
  | 'hold-downs-engaged'; // uplift observed on a wall with hold-downs: they have yielded

/** Options of {@link assessRockingWall}. */
export interface RockingAssessmentOptions {
  /** Shape of the check pulse (default 'sine'). */
  pulseShape?: PulseShape | undefined;
  /** Pulse period in s; default: the spectrum's corner period (see spectrumCornerPeriod). */
  pulsePeriodS?: number | null | undefined;
  /** Moment magnitude to estimate the pulse period from, when no period is given. */
  magnitude?: number | null | undefined;
  /** Run the pulse time-history check (default true; a few ms per wall). */
  timeHistory?: boolean | undefined;
}

/** Everything the screening reads about one rocking wall. Angles in rad. */
export interface RockingWallAssessment {
  wallId: string;
  model: RockingWallModel;
  /** Equivalent-SDOF estimate on the displacement spectrum (null without a spectrum). */
  spectral: RockingDemand | null;
  /** Pulse check: a pulse at the site's PGA with a period consistent with the spectrum. */
  pulse: PulseOverturningCheck | null;
  /** Larger of the spectral ratio and the pulse's peak ratio at PGA (null without a spectrum). */
  predictedRatio: number | null;
  predictedBand: RockingBand | null;
  /** What the recorded uplift gap says (null when no gap was recorded). */
  observed: ObservedRocking | null;
  observedBand: RockingBand | null;
  flags: RockingFlag[];
  needsDetailedAssessment: boolean;
  /** One sentence per reason for a detailed assessment. */
  reasons: string[];
  /** Defaults and modelling assumptions, from the model and from this assessment. */
  assumptions: string[];
  /** Cautions to show with the result. */
  cautions: string[];
}

/** Observed rocking this much (as θ/α) above the prediction raises a flag (ours, no source). */
const ABOVE_PREDICTION_MARGIN = 0.2;

/**
 * Corner period of a spectrum, in s: Tc = max(Sa·T) / max(Sa) over 0.02–4 s, where the
 * constant-acceleration branch meets the constant-velocity branch (EN 1998-1: TC; ASCE 7: TS;
 * derived from the spectra's shape). Used as the period of a pulse consistent with the
 * spectrum: a pulse at that period carries its energy where the spectrum turns from
 * acceleration- to velocity-controlled (common practice, no source).
 */
export function spectrumCornerPeriod(spec: SpectrumSpec): number {
  let maxSa = 0;
  let maxSaT = 0;
  const n = 200;
  for (let i = 0; i <= n; i++) {
    // Log-spaced grid from 0.02 s to 4 s (4 s: end of the EN 1998-1 spectrum definition).
    const T = 0.02 * Math.pow(200, i / n);
    const sa = spectralAcceleration(spec, T);
    if (sa > maxSa) maxSa = sa;
    if (sa * T > maxSaT) maxSaT = sa * T;
  }
  // A spectrum of zeros has no corner; 0.5 s (EN 1998-1 Table 3.2, ground B, TC) stands in.
  return maxSa > 0 ? maxSaT / maxSa : 0.5;
}

/**
 * Screening assessment of one rocking wall: predicted rocking (equivalent-SDOF estimate on
 * the displacement spectrum, and a time-history check under a one-cycle pulse at the site's
 * PGA with the spectrum's corner period), observed rocking from the uplift gap, bands, flags
 * and assumptions. Supplemental devices are recorded but not modelled: the wall is then sent
 * to detailed assessment. A few milliseconds per wall.
 *
 * @param model from rockingWallFromInput.
 * @param spec the hazard, or null (then nothing is predicted).
 * @param upliftGapM the gap read at the heel in m, or null when none was recorded.
 */
export function assessRockingWall(
  model: RockingWallModel,
  spec: SpectrumSpec | null,
  upliftGapM: number | null,
  options: RockingAssessmentOptions = {},
): RockingWallAssessment {
  const wall = model.wall;
  const flags: RockingFlag[] = [];
  const reasons: string[] = [];
  const assumptions = [...model.assumptions];
  const cautions = [SCREENING_CAUTION];

  if (model.devices.length > 0) {
    flags.push('devices-not-modelled');
    reasons.push(`Supplemental devices recorded (${model.devices.join(', ')}): not modelled.`);
    cautions.push(DEVICES_CAUTION);
  }

  let spectral: RockingDemand | null = null;
  let pulse: PulseOverturningCheck | null = null;
  if (spec === null) {
    flags.push('no-hazard');
  } else {
    spectral = rockingDemand(wall, spec);
    cautions.push(SPECTRAL_ROCKING_CAUTION);
    if (!spectral.converged) {
      flags.push('spectral-not-converged');
      reasons.push('The spectral rocking estimate did not converge.');
    }
    if (spectral.overturning) {
      flags.push('spectral-predicts-toppling');
      reasons.push('The spectral rocking estimate predicts toppling (θ ≥ α).');
    }
    if (options.timeHistory ?? true) {
      const shape = options.pulseShape ?? 'sine';
      let periodS: number | null = null;
      if (options.pulsePeriodS != null) {
        periodS = requirePositive('pulsePeriodS', options.pulsePeriodS);
      } else if (options.magnitude == null) {
        periodS = spectrumCornerPeriod(spec);
        assumptions.push(
          `Check pulse: one-cycle ${shape} at the spectrum's PGA (${spectral.pga.toFixed(3)} g) ` +
            `with the spectrum's corner period, ${periodS.toFixed(2)} s.`,
        );
      }
      pulse = pulseOverturningCheck(wall, {
        pga: spectral.pga,
        pulsePeriod: periodS,
        magnitude: options.magnitude ?? null,
        shape,
      });
      if (pulse.pulsePeriodSource === 'magnitude') {
        assumptions.push(
          `Check pulse period ${pulse.pulsePeriodS.toFixed(2)} s from the magnitude (Baker 2007).`,
        );
      }
      if (pulse.atPga.overturned) {
        flags.push('pulse-topples-at-pga');
        reasons.push('A pulse at the site PGA topples the wall in the time-history check.');
      }
      if (!pulse.ratioIsUpperBound && pulse.ratio >= 1) {
        flags.push('pulse-toppling-amplitude-reached');
        reasons.push(
          `The smallest toppling pulse (${(pulse.overturningAmplitudeG ?? 0).toFixed(3)} g) ` +
            'is within the site PGA.',
        );
      }
    }
  }
  let predictedRatio: number | null = null;
  if (spectral !== null) {
    predictedRatio = Math.max(spectral.ratio, pulse?.atPga.peakRatio ?? 0);
  }

  let observed: ObservedRocking | null = null;
  if (upliftGapM !== null) {
    observed = observedRocking(wall, upliftGapM);
    if (observed.band === 'near-toppling') {
      flags.push('observed-near-toppling');
      reasons.push(`Observed uplift reached ${(observed.ratio * 100).toFixed(0)} % of α.`);
    } else if (observed.band === 'beyond-stability') {
      flags.push('observed-beyond-stability');
      reasons.push('Observed uplift is at or beyond the toppling angle: check the reading.');
    }
    if (predictedRatio !== null && observed.ratio > predictedRatio + ABOVE_PREDICTION_MARGIN) {
      flags.push('observed-above-prediction');
      reasons.push(
        'The wall rocked more than the hazard predicts: the shaking or the model differ.',
      );
    }
    if (observed.ratio > 0 && wall.restoringMomentsNm.holdDown > 0) {
      flags.push('hold-downs-engaged');
      reasons.push('Uplift on a wall with hold-downs: they have yielded or let go; inspect them.');
    }
  }

  return {
    wallId: model.wallId,
    model,
    spectral,
    pulse,
    predictedRatio,
    predictedBand: predictedRatio === null ? null : rockingBand(predictedRatio),
    observed,
    observedBand: observed?.band ?? null,
    flags,
    needsDetailedAssessment: reasons.length > 0,
    reasons,
    assumptions,
    cautions,
  };
}
