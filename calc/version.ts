/**
 * Version of the calculation. Bump the minor number when a result can change for the same
 * input, the major number when an input's meaning changes. Exports carry it, so an engineer
 * can tell which rules produced a stored result.
 */
export const CALC_VERSION = '0.1.0';
