/**
 * Fundamental period estimates: the empirical formulas of EN 1998-1 §4.3.3.2.2 and
 * ASCE 7-16 §12.8.2.1 (seconds), their height-range warnings, and the ASCE 7-16 Table 12.8-1
 * upper-limit coefficient Cu.
 */
export {
  ASCE7_CT_SI,
  ASCE7_ELF_MAX_HEIGHT_M,
  ASCE7_X,
  EC8_CT,
  EC8_MAX_HEIGHT_M,
  empiricalPeriod,
  empiricalPeriodRange,
} from './empirical-period.js';
export type { EmpiricalPeriodMethod } from './empirical-period.js';
export { upperLimitCoefficient } from './upper-limit-coefficient.js';
