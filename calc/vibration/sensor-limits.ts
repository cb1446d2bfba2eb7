/**
 * What a phone's accelerometer, read through a web browser, can and cannot resolve. These
 * figures drive the caveats the inspector sees; none of them is a calibration of any one
 * phone.
 */
import { requireFiniteSamples, requireNonNegative } from './checks.js';
import type { Samples } from './checks.js';

/**
 * Browsers may round motion-event accelerations to 0.1 m/s² to stop sites fingerprinting
 * the sensor's factory calibration. Source: W3C DeviceOrientation Event specification,
 * privacy considerations, change "limit precision to mitigate sensor calibration
 * fingerprinting" (w3c/deviceorientation pull request 86, 2020): acceleration no more
 * precise than 0.1 m/s². Chromium rounds to this step (from memory, verify per version).
 */
export const BROWSER_ACCELERATION_STEP_MPS2 = 0.1;

/**
 * Typical noise density of a phone MEMS accelerometer, (m/s²)/√Hz: about 150 µg/√Hz.
 * From memory, verify: Bosch BMI160 datasheet ~180 µg/√Hz, ST LSM6DSO ~70–110 µg/√Hz
 * (high-performance mode). 1 µg = 9.80665e-6 m/s² (standard gravity, CGPM 1901).
 */
export const PHONE_NOISE_DENSITY_MPS2_PER_SQRT_HZ = 150 * 9.80665e-6;

/**
 * RMS acceleration of the phone's own noise over a bandwidth, m/s² (white noise:
 * density × √bandwidth; derived).
 */
export function phoneNoiseRms(bandwidthHz: number): number {
  requireNonNegative('bandwidthHz', bandwidthHz);
  return PHONE_NOISE_DENSITY_MPS2_PER_SQRT_HZ * Math.sqrt(bandwidthHz);
}

/**
 * The step of a quantised channel: the smallest gap between distinct values, when the
 * distinct values sit on a lattice of that step (≥ 90 % of neighbouring gaps within 2 % of a
 * whole multiple, our choice). Null when the values look continuous or there are fewer than
 * two distinct values. Looks at most at the first 20,000 values.
 */
export function quantizationStep(values: Samples): number | null {
  requireFiniteSamples('values', values);
  const LIMIT = 20_000; // enough to see the lattice; bounds the sort (our choice)
  const n = Math.min(values.length, LIMIT);
  const sorted = Float64Array.from({ length: n }, (_, i) => values[i] as number).sort();
  const distinct: number[] = [];
  for (let i = 0; i < n; i++) {
    const v = sorted[i] as number;
    const last = distinct[distinct.length - 1];
    // Values that differ only by floating-point noise (e.g. 9.8 vs 9.800000000000001) are one level.
    if (last === undefined || v - last > 1e-9 * Math.max(1, Math.abs(v))) distinct.push(v);
  }
  if (distinct.length < 2) return null;
  let step = Infinity;
  for (let i = 1; i < distinct.length; i++) {
    step = Math.min(step, (distinct[i] as number) - (distinct[i - 1] as number));
  }
  let onLattice = 0;
  for (let i = 1; i < distinct.length; i++) {
    const ratio = ((distinct[i] as number) - (distinct[i - 1] as number)) / step;
    if (Math.abs(ratio - Math.round(ratio)) <= 0.02) onLattice += 1;
  }
  const LATTICE_SHARE = 0.9;
  // With many distinct values and a tiny smallest gap the data is simply continuous.
  const spread = (distinct[distinct.length - 1] as number) - (distinct[0] as number);
  const looksLattice = onLattice >= LATTICE_SHARE * (distinct.length - 1) && spread / step <= 1e6;
  return looksLattice ? step : null;
}
