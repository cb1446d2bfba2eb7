/**
 * The phone as an instrument. Pure signal processing and the arithmetic behind two field
 * measurements, SI units throughout (s, Hz, m/s², rad):
 *
 * - ambient vibration: FFT (radix-2 and Bluestein), resampling of irregular timestamps,
 *   detrending, windows, Welch PSD, cross-spectrum and coherence, peak prominence,
 *   half-power damping, `identifyFundamental` (null when no clear peak), the full record
 *   analysis with caveats, and the stiffness-loss indicator (f_now/f_ref)²;
 * - residual tilt: `tiltFromGravity`, one averaged position with a stillness check, the
 *   two-position reversal calibration, and tilt → drift ratio with its uncertainty.
 */
export { fft, inverseFft, realFft, realFftPlan } from './fft.js';
export type { ComplexArrays, RealFftPlan } from './fft.js';
export { windowCoefficients, windowProperties, WINDOW_KINDS } from './window.js';
export type { WindowKind, WindowProperties } from './window.js';
export { detrend } from './detrend.js';
export type { DetrendKind } from './detrend.js';
export { resampleToUniform } from './resample.js';
export type { ResampleOptions, ResampleReport, UniformRecord } from './resample.js';
export { defaultSegmentLength, welchCrossSpectrum, welchPsd, welchSegments } from './welch-psd.js';
export type { WelchCrossSpectrum, WelchOptions, WelchPsd, WelchSegments } from './welch-psd.js';
export { spectralScatterDb, trigamma } from './spectral-scatter.js';
export { findPeaks } from './peaks.js';
export type { Peak } from './peaks.js';
export { dampingFromBandwidth, halfPowerBand } from './half-power.js';
export { nelderMead } from './nelder-mead.js';
export type { NelderMeadOptions, NelderMeadResult } from './nelder-mead.js';
export { fitSdofPeak, periodogram, sdofAccelerationShape } from './sdof-fit.js';
export type { Periodogram, SdofFit } from './sdof-fit.js';
export type { HalfPowerBand } from './half-power.js';
export {
  analyseFundamental,
  DEFAULT_BAND_HZ,
  DETECTION_SIGMA,
  FULL_CONFIDENCE_SIGMA,
  SEPARATION_SIGMA,
  identifyFundamental,
  MIN_CYCLES_PER_SEGMENT,
  MIN_SAMPLES,
} from './fundamental.js';
export type {
  FundamentalAnalysis,
  FundamentalEstimate,
  FundamentalOptions,
  NoEstimateReason,
  PeakCandidate,
} from './fundamental.js';
export { analyseAmbientRecord, COHERENT, MIN_RATE_HZ, MIN_RECORD_S } from './ambient-record.js';
export type {
  AmbientAnalysis,
  AmbientCaveat,
  AmbientRecordInput,
  AmbientStatus,
  AxisSummary,
  DirectionalEstimate,
  DisplaySpectrum,
  PhoneAxis,
} from './ambient-record.js';
export {
  BROWSER_ACCELERATION_STEP_MPS2,
  PHONE_NOISE_DENSITY_MPS2_PER_SQRT_HZ,
  phoneNoiseRms,
  quantizationStep,
} from './sensor-limits.js';
export {
  EMPIRICAL_REFERENCE_SCATTER,
  stiffnessLossIndicator,
  stiffnessRatio,
} from './stiffness-indicator.js';
export type { StiffnessIndicator, StiffnessIndicatorInput } from './stiffness-indicator.js';
export { tiltFromGravity } from './gravity-tilt.js';
export type { GravityTilt } from './gravity-tilt.js';
export {
  MAGNITUDE_TOLERANCE,
  measureTiltPosition,
  MIN_POSITION_SAMPLES,
  STILL_RANGE_MPS2,
  STILL_STD_MPS2,
  UPRIGHT_LIMIT_RAD,
} from './tilt-position.js';
export type { GravityReadings, TiltPosition } from './tilt-position.js';
export {
  MAX_PLAUSIBLE_OFFSET_RAD,
  reversalCalibration,
  SENSITIVITY_TOLERANCE,
} from './reversal.js';
export type { AngleReading, ReversalResult } from './reversal.js';
export {
  driftRatioFromTilt,
  MAX_MEASURABLE_TILT_RAD,
  residualDriftFromTilt,
} from './tilt-drift.js';
export type { DriftFromTilt } from './tilt-drift.js';
