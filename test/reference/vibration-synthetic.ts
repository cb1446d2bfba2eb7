/**
 * Synthetic phone records for the vibration tests and the benchmark: a damped single-
 * degree-of-freedom oscillator (the building's fundamental mode) shaken at its base by
 * seeded white noise, read by a phone-like sensor (white noise, slow drift, rounding),
 * sampled at jittered timestamps with the odd lost event.
 *
 * The oscillator is stepped with the exact discrete-time solution for an input held
 * constant over each step (zero-order hold), so no integration error enters at any
 * frequency: for ẍ + 2ζωẋ + ω²x = −a_g, the state [x, ẋ] advances by the matrix exponential
 * of the system matrix (closed form for ζ < 1; e.g. Chopra, Dynamics of Structures, ch. 5,
 * "exact" recurrence for piecewise-constant excitation). The absolute acceleration a phone
 * on the floor feels is ẍ + a_g = −2ζωẋ − ω²x.
 */
import { mulberry32 } from '../bench/prng.js';

export { mulberry32 };

/** Standard normal deviates from a uniform generator (Box–Muller). */
export function gaussian(rand: () => number): () => number {
  let spare: number | null = null;
  return () => {
    if (spare !== null) {
      const s = spare;
      spare = null;
      return s;
    }
    let u = 0;
    while (u <= Number.MIN_VALUE) u = rand();
    const v = rand();
    const r = Math.sqrt(-2 * Math.log(u));
    spare = r * Math.sin(2 * Math.PI * v);
    return r * Math.cos(2 * Math.PI * v);
  };
}

export interface SdofOptions {
  frequencyHz: number;
  dampingRatio: number;
  /** Simulation rate, Hz (well above the phone's rate). */
  simulationRateHz: number;
  durationS: number;
  /** Standard deviation of the white base acceleration per simulation step, m/s². */
  inputStd: number;
  seed: number;
}

/** Absolute floor acceleration of the SDOF at the simulation rate, m/s². */
export function sdofResponse(o: SdofOptions): Float64Array {
  const w = 2 * Math.PI * o.frequencyHz;
  const z = o.dampingRatio;
  const h = 1 / o.simulationRateHz;
  const wd = w * Math.sqrt(1 - z * z);
  const e = Math.exp(-z * w * h);
  const c = Math.cos(wd * h);
  const s = Math.sin(wd * h);
  const a11 = e * (c + ((z * w) / wd) * s);
  const a12 = (e * s) / wd;
  const a21 = (-w * w * e * s) / wd;
  const a22 = e * (c - ((z * w) / wd) * s);
  // B = F⁻¹(A − I)·[0, −1]ᵀ with F = [[0, 1], [−ω², −2ζω]] (derived).
  const b1 = (2 * z * w * a12 - 1 + a22) / (w * w);
  const b2 = -a12;
  const n = Math.round(o.durationS * o.simulationRateHz);
  const out = new Float64Array(n);
  const normal = gaussian(mulberry32(o.seed));
  // Start from the stationary state rather than rest: run 20 time constants first.
  const warm = Math.ceil((20 / (z * w)) * o.simulationRateHz);
  let x = 0;
  let v = 0;
  for (let i = -warm; i < n; i++) {
    const ag = o.inputStd * normal();
    const nx = a11 * x + a12 * v + b1 * ag;
    const nv = a21 * x + a22 * v + b2 * ag;
    x = nx;
    v = nv;
    if (i >= 0) out[i] = -2 * z * w * v - w * w * x;
  }
  return out;
}

export interface PhoneSensorOptions {
  /** Nominal phone rate, Hz. */
  rateHz: number;
  /** Uniform timestamp jitter, ± s. */
  jitterS: number;
  /** Probability that an event is lost. */
  dropProbability: number;
  /** White noise density, (m/s²)/√Hz. */
  noiseDensity: number;
  /** Standard deviation of the slow drift (a random walk, low-passed), m/s². */
  driftStd: number;
  /** Rounding step of the readings, m/s² (0: none). */
  stepMps2: number;
  seed: number;
}

export interface PhoneRecord {
  timesS: number[];
  x: number[];
  y: number[];
  z: number[];
}

/** Linear interpolation of a uniformly sampled series at time t. */
function at(series: Float64Array, rateHz: number, t: number): number {
  const u = t * rateHz;
  const i = Math.max(0, Math.min(series.length - 2, Math.floor(u)));
  const f = Math.min(1, Math.max(0, u - i));
  return (series[i] as number) * (1 - f) + (series[i + 1] as number) * f;
}

/**
 * Reads motion series (one per horizontal phone axis, at `simulationRateHz`; vertical
 * is gravity plus noise) the way a phone would: jittered times, lost events, sensor noise,
 * slow drift, rounding.
 */
export function phoneRecord(
  motion: {
    x: Float64Array | null;
    y: Float64Array | null;
    simulationRateHz: number;
    durationS: number;
  },
  s: PhoneSensorOptions,
  gravity = { x: 0.05, y: -0.08, z: 9.81 },
): PhoneRecord {
  const rand = mulberry32(s.seed);
  const normal = gaussian(mulberry32(s.seed ^ 0x9e3779b9));
  const sigma = s.noiseDensity * Math.sqrt(s.rateHz / 2);
  const record: PhoneRecord = { timesS: [], x: [], y: [], z: [] };
  const drift = { x: 0, y: 0, z: 0 };
  const n = Math.floor((motion.durationS - 0.01) * s.rateHz);
  const DRIFT_POLE = 0.999; // ~ 10 s correlation at 100 Hz (test choice)
  const round = (v: number) => (s.stepMps2 > 0 ? Math.round(v / s.stepMps2) * s.stepMps2 : v);
  for (let k = 0; k < n; k++) {
    for (const key of ['x', 'y', 'z'] as const) {
      drift[key] = DRIFT_POLE * drift[key] + s.driftStd * Math.sqrt(1 - DRIFT_POLE ** 2) * normal();
    }
    const t = k / s.rateHz + (2 * rand() - 1) * s.jitterS;
    if (rand() < s.dropProbability) continue;
    const tc = Math.max(0, Math.min(motion.durationS - 0.002, t));
    const mx = motion.x ? at(motion.x, motion.simulationRateHz, tc) : 0;
    const my = motion.y ? at(motion.y, motion.simulationRateHz, tc) : 0;
    record.timesS.push(t + 1000); // any clock origin
    record.x.push(round(gravity.x + mx + drift.x + sigma * normal()));
    record.y.push(round(gravity.y + my + drift.y + sigma * normal()));
    record.z.push(round(gravity.z + drift.z + sigma * normal()));
  }
  return record;
}

/** Phone-like sensor defaults: 150 µg/√Hz (see calc/vibration/sensor-limits.ts), 100 Hz, ±2 ms jitter. */
export const PHONE: Omit<PhoneSensorOptions, 'seed'> = {
  rateHz: 100,
  jitterS: 0.002,
  dropProbability: 0.01,
  noiseDensity: 150 * 9.80665e-6,
  driftStd: 0.003,
  stepMps2: 0.0012, // a 16-bit ±4 g sensor: 8·9.81/65536 (derived)
};

/**
 * Base-input standard deviation per simulation step that gives a white input PSD equal to
 * `ratio` times the phone's noise PSD (one-sided PSDs 2σ²/fs; derived).
 */
export function inputStdFor(ratio: number, simulationRateHz: number, sensor = PHONE): number {
  const sigmaSensor = sensor.noiseDensity * Math.sqrt(sensor.rateHz / 2);
  return sigmaSensor * Math.sqrt((ratio * simulationRateHz) / sensor.rateHz);
}
