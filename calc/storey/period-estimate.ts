import type { EmpiricalPeriodMethod } from '../period/empirical-period.js';

/** Which estimate of the fundamental period the demand used. */
export type PeriodKind = 'measured' | 'modal' | 'empirical';

/**
 * The fundamental period used in one direction and the other estimates beside it, in s.
 * Order of preference: measured on site, else modal (storey model from the walls), else
 * empirical.
 */
export interface PeriodEstimate {
  /** Period the demand was read at; null when no estimate was possible. */
  usedS: number | null;
  kind: PeriodKind | null;
  /** 1 / measured frequency, when a measurement applies to this direction. */
  measuredS: number | null;
  /** First-mode period of the storey model, before any scaling to a measurement. */
  modalS: number | null;
  /** Empirical period by `empiricalMethod`. */
  empiricalS: number | null;
  /** Method matching the hazard: 'ec8' for an EN 1998-1 spectrum, else 'asce7'. */
  empiricalMethod: EmpiricalPeriodMethod;
  /** Both empirical values, for comparison. */
  empiricalEc8S: number | null;
  empiricalAsce7S: number | null;
  /** Cu·Ta, ASCE 7-16 §12.8.2 upper limit (only with an ASCE 7 spectrum). Reported, not applied. */
  upperLimitS: number | null;
  /** Range warnings and remarks on the estimates. */
  warnings: string[];
}
