/**
 * Response spectra: Sa(T) in g and Sd(T) in m for the EN 1998-1 elastic spectrum, the
 * ASCE 7-16 design spectrum and a single-event spectrum from shaking-map values, with the
 * EN 1998-1 damping correction η. Also the spectrum specification types (the contract).
 */
export type * from './spectrum-spec.js';
export {
  resolveSpectrum,
  spectralAcceleration,
  spectralDisplacement,
} from './spectral-acceleration.js';
export { resolvedSpectralAcceleration } from './resolved-spectrum.js';
export type { ResolvedSpectrum } from './resolved-spectrum.js';
export { dampingCorrection, ETA_MIN, REFERENCE_DAMPING } from './damping-correction.js';
export {
  EC8_TYPE1,
  EC8_TYPE2,
  ec8Parameters,
  ec8SpectralAcceleration,
  resolveEc8,
} from './ec8-spectrum.js';
export type { Ec8Parameters } from './ec8-spectrum.js';
export { asce7Corners, asce7SpectralAcceleration, resolveAsce7 } from './asce7-spectrum.js';
export type { Asce7Corners } from './asce7-spectrum.js';
export { eventShape, eventSpectralAcceleration, resolveEvent } from './event-spectrum.js';
export type { EventShape } from './event-spectrum.js';
