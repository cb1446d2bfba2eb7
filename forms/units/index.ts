/**
 * Units at the edges of the app: the SI and US customary systems, the unit each kind of
 * field shows, exact conversions to and from the SI values that are stored, reading typed
 * text (decimal comma, explicit units, feet and inches) and formatting numbers for fields
 * and results. Storage and calc/ never see anything but SI.
 */
export { UNIT_SYSTEMS, isUnitSystem, type UnitSystem } from './unit-system.js';
export { FOOT_M, INCH_M, POUND_FORCE_N, UNITS, type UnitDef, type UnitId } from './units.js';
export { QUANTITIES, shownUnit, type Quantity, type QuantityDef } from './quantities.js';
export { fromSI, toSI, unitFromSI, unitToSI } from './convert.js';
export {
  parseQuantity,
  type ParseFailure,
  type ParseResult,
  type ParseSuccess,
} from './parse-quantity.js';
export {
  formatForInput,
  formatNumber,
  formatNumberForInput,
  formatQuantity,
} from './format-quantity.js';
