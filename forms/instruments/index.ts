/**
 * Instrument recordings stored with a survey: the `data` schemas of kinds 'vibration' and
 * 'tilt', the compact sample encoding (`encodeSamples` / `decodeSamples`), rounding of stored
 * figures, and `parseInstrumentData` (never throws).
 */
export {
  ACCEL_UNIT_MPS2,
  decodeSamples,
  encodeSamples,
  MAX_TILT_SAMPLES,
  MAX_VIBRATION_SAMPLES,
  parseInstrumentData,
  round,
  tiltDataSchema,
  TIME_UNIT_MS,
  vibrationDataSchema,
  vibrationSummarySchema,
} from './instrument-data.js';
export type {
  DecodedSamples,
  InstrumentEntry,
  InstrumentKind,
  ParseResult,
  RawSamples,
  TiltData,
  VibrationData,
  VibrationSummary,
} from './instrument-data.js';
