/**
 * The phone as an instrument, in the page.
 *
 * Components (every word from the catalogue, section instruments.*):
 * - `<TiltMeter onResult={(r) => …} storey? direction? />` — two-position tilt reading;
 *   `r` is a `TiltMeterResult` (tilt, uncertainty, offset, drift ratio ± uncertainty, and the
 *   raw readings as an instrument-record entry).
 * - `<VibrationRecorder expectedPeriodS={…} onResult={(measured, rawRecord) => …} />` —
 *   60–120 s ambient recording analysed in a Web Worker; `measured` is the
 *   `MeasuredFrequencyInput` the verdict reads (null without a clear peak).
 *
 * Framework-free parts: `subscribeMotion` / `requestMotionAccess` (the sensor and its
 * permission), `TiltSession` and `VibrationSession` (the procedures), `analyseRecording`
 * (worker with fallback), `tiltEntry` / `vibrationEntry` (stored records), and the draft
 * adapters `withPhoneTilt`, `withVibration`, `expectedPeriodFor`.
 */
export { TiltMeter } from './tilt-meter.js';
export type { TiltMeterProps } from './tilt-meter.js';
export { VibrationRecorder } from './vibration-recorder.js';
export type { VibrationRecorderProps } from './vibration-recorder.js';
export {
  motionNeedsPermission,
  requestMotionAccess,
  sampleFromEvent,
  subscribeMotion,
} from './motion-source.js';
export type { MotionAccess, MotionSample } from './motion-source.js';
export { AVERAGING_S, SETTLE_S, SETTLE_TIMEOUT_S, TiltSession } from './tilt-session.js';
export type { MeasuredPosition, TiltIssue, TiltOutcome, TiltView } from './tilt-session.js';
export {
  clampDuration,
  DEFAULT_DURATION_S,
  MAX_DURATION_S,
  MIN_DURATION_S,
  VibrationSession,
} from './vibration-session.js';
export type { VibrationProgress } from './vibration-session.js';
export { analyseRecording } from './vibration-analysis.js';
export type { AnalysisRequest } from './vibration-analysis.js';
export { summaryOf, tiltEntry, vibrationEntry } from './instrument-entries.js';
export {
  expectedPeriodFor,
  MAX_INSTRUMENT_ENTRIES,
  withPhoneTilt,
  withVibration,
} from './survey-adapters.js';
export type { TiltMeterResult } from './survey-adapters.js';
