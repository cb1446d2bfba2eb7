/**
 * The `data` of the survey record's instrument recordings (`instrumentRecords[].data`), for
 * kinds 'vibration' (ambient vibration) and 'tilt' (two-position tilt reading): zod schemas,
 * and the compact encoding that keeps a two-minute, three-axis record near 200 kB of JSON.
 *
 * Encoding, chosen to lose nothing a phone can resolve:
 * - timestamps as whole multiples of TIME_UNIT_MS (0.01 ms) after the first one, stored as
 *   differences between neighbours (browsers coarsen event times to 0.1 ms or more, W3C
 *   High Resolution Time, "clamping"; from memory, verify), negative when the phone
 *   delivered them out of order — they are kept as delivered;
 * - accelerations per axis as an offset (the axis mean, rounded to ACCEL_UNIT_MPS2) plus
 *   whole multiples of ACCEL_UNIT_MPS2 (0.1 mm/s²): a tenth of a typical phone's per-reading
 *   noise (≈ 0.01 m/s² at 100 Hz, from 150 µg/√Hz; derived from calc/vibration/sensor-limits.ts),
 *   so rounding adds less than 0.1 % to the noise power (derived: (1e-4)²/12 vs 1e-4 (m/s²)²).
 * Samples the phone delivered incomplete (a null axis) are never recorded, so the arrays hold
 * finite numbers only.
 */
import { z } from '../schema/zod-config.js';

/** Time unit of stored timestamps, ms. */
export const TIME_UNIT_MS = 0.01;
/** Acceleration unit of stored samples, m/s². */
export const ACCEL_UNIT_MPS2 = 1e-4;
/** Most samples in one vibration record: 120 s at 200 Hz with a quarter to spare. */
export const MAX_VIBRATION_SAMPLES = 30_000;
/** Most samples in one tilt position (about 10 s at 200 Hz). */
export const MAX_TILT_SAMPLES = 2_000;

const int = (limit: number) => z.number().int().min(-limit).max(limit);
/** Whole-unit steps: ±10⁹ × 0.01 ms = ±2.8 h between neighbours; ±10⁷ × 0.1 mm/s² = ±1000 m/s². */
const timeSteps = (max: number) => z.array(int(1e9)).min(1).max(max);
const accelSteps = (max: number) => z.array(int(1e7)).min(1).max(max);
const offsets = z.tuple([z.number(), z.number(), z.number()]);
const direction = z.enum(['x', 'y']).nullable();

/** One channel set: timestamps and three axes, encoded as described in the header. */
const samplesShape = (max: number) => ({
  dt: timeSteps(max),
  offsetMps2: offsets,
  x: accelSteps(max),
  y: accelSteps(max),
  z: accelSteps(max),
});

const sameLengths = (v: { dt: number[]; x: number[]; y: number[]; z: number[] }) =>
  v.x.length === v.dt.length && v.y.length === v.dt.length && v.z.length === v.dt.length;
/** Issue code (not a sentence: UI text lives in the catalogue). */
const SAME_LENGTHS = { message: 'instrument-axis-lengths' };

/** The analysis kept beside a vibration record (what the inspector saw). */
export const vibrationSummarySchema = z.strictObject({
  status: z.string().min(1).max(40),
  frequencyHz: z.number().positive().max(100).nullable(),
  frequencyUncertaintyHz: z.number().nonnegative().max(100).nullable(),
  dampingRatio: z.number().nonnegative().max(1).nullable(),
  confidence: z.number().min(0).max(1).nullable(),
  direction,
  stiffnessRatio: z.number().nonnegative().max(100).nullable(),
  stiffnessUncertainty: z.number().nonnegative().max(100).nullable(),
  caveats: z.array(z.string().min(1).max(40)).max(20),
  calcVersion: z.string().min(1).max(20),
});

export const vibrationDataSchema = z
  .strictObject({
    version: z.literal(1),
    ...samplesShape(MAX_VIBRATION_SAMPLES),
    /** `DeviceMotionEvent.interval` as the phone reported it, ms. */
    reportedIntervalMs: z.number().positive().max(10_000).nullable(),
    /** Plan direction the phone's long edge pointed along. */
    longEdgeAlong: direction,
    /** Storey the phone lay on, 0 = ground. */
    storey: z.number().int().min(0).max(200).nullable(),
    /** The expected period the result was compared with, s. */
    expectedPeriodS: z.number().positive().max(20).nullable(),
    analysis: vibrationSummarySchema.nullable(),
  })
  .refine(sameLengths, SAME_LENGTHS);

const tiltPositionSchema = z
  .strictObject({
    ...samplesShape(MAX_TILT_SAMPLES),
    angleRad: z
      .number()
      .min(-Math.PI / 2)
      .max(Math.PI / 2),
    uncertaintyRad: z.number().nonnegative().max(1),
    ok: z.boolean(),
  })
  .refine(sameLengths, SAME_LENGTHS);

export const tiltDataSchema = z.strictObject({
  version: z.literal(1),
  positions: z.tuple([tiltPositionSchema, tiltPositionSchema]),
  result: z.strictObject({
    tiltRad: z
      .number()
      .min(-Math.PI / 2)
      .max(Math.PI / 2),
    uncertaintyRad: z.number().nonnegative().max(1),
    offsetRad: z
      .number()
      .min(-Math.PI / 2)
      .max(Math.PI / 2),
    offsetPlausible: z.boolean(),
    driftRatio: z.number().nonnegative().max(100),
    driftUncertainty: z.number().nonnegative().max(100),
  }),
  storey: z.number().int().min(0).max(200).nullable(),
  direction,
  calcVersion: z.string().min(1).max(20),
});

export type VibrationData = z.infer<typeof vibrationDataSchema>;
export type TiltData = z.infer<typeof tiltDataSchema>;
export type VibrationSummary = z.infer<typeof vibrationSummarySchema>;

/** Instrument kinds this module defines. */
export type InstrumentKind = 'vibration' | 'tilt';

/** An entry of `instrumentRecords`, typed for the kinds defined here. */
export type InstrumentEntry =
  | { id: string; kind: 'vibration'; recordedAt: string; data: VibrationData }
  | { id: string; kind: 'tilt'; recordedAt: string; data: TiltData };

/** Timestamps (ms, any origin) and three axes (m/s²), as recorded. */
export interface RawSamples {
  timesMs: ArrayLike<number>;
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  z: ArrayLike<number>;
}

/** Decoded samples: times in s from the first sample, accelerations in m/s². */
export interface DecodedSamples {
  timesS: Float64Array;
  x: Float64Array;
  y: Float64Array;
  z: Float64Array;
}

/** Rounds to a multiple of `unit` without binary noise in the printed JSON (0.1234 not 0.12340000000000001). */
function roundTo(value: number, unit: number): number {
  const decimals = Math.max(0, Math.ceil(-Math.log10(unit)));
  return Number((Math.round(value / unit) * unit).toFixed(decimals));
}

/**
 * Encodes raw samples. Throws a RangeError for unequal lengths, no samples or a non-finite
 * value (the recorder never produces them; a caller that does has a bug).
 */
export function encodeSamples(raw: RawSamples): {
  dt: number[];
  offsetMps2: [number, number, number];
  x: number[];
  y: number[];
  z: number[];
} {
  const n = raw.timesMs.length;
  if (n === 0) throw new RangeError('samples must hold at least one sample, got 0');
  for (const [name, a] of [
    ['x', raw.x],
    ['y', raw.y],
    ['z', raw.z],
  ] as const) {
    if (a.length !== n) throw new RangeError(`${name} must have ${n} values, got ${a.length}`);
  }
  const check = (name: string, v: number, i: number) => {
    if (!Number.isFinite(v))
      throw new RangeError(`${name}[${i}] must be a finite number, got ${v}`);
    return v;
  };
  const t0 = check('timesMs', raw.timesMs[0] as number, 0);
  const dt: number[] = [];
  let previous = 0;
  for (let i = 0; i < n; i++) {
    const q = Math.round((check('timesMs', raw.timesMs[i] as number, i) - t0) / TIME_UNIT_MS);
    dt.push(q - previous);
    previous = q;
  }
  const axis = (name: string, a: ArrayLike<number>) => {
    let sum = 0;
    for (let i = 0; i < n; i++) sum += check(name, a[i] as number, i);
    const offset = roundTo(sum / n, ACCEL_UNIT_MPS2);
    const steps: number[] = [];
    for (let i = 0; i < n; i++)
      steps.push(Math.round(((a[i] as number) - offset) / ACCEL_UNIT_MPS2));
    return { offset, steps };
  };
  const ex = axis('x', raw.x);
  const ey = axis('y', raw.y);
  const ez = axis('z', raw.z);
  return {
    dt,
    offsetMps2: [ex.offset, ey.offset, ez.offset],
    x: ex.steps,
    y: ey.steps,
    z: ez.steps,
  };
}

/** Decodes stored samples (a parsed `dt`/`offsetMps2`/`x`/`y`/`z` set). */
export function decodeSamples(s: {
  dt: readonly number[];
  offsetMps2: readonly [number, number, number];
  x: readonly number[];
  y: readonly number[];
  z: readonly number[];
}): DecodedSamples {
  const n = s.dt.length;
  const timesS = new Float64Array(n);
  let q = 0;
  for (let i = 0; i < n; i++) {
    q += s.dt[i] as number;
    timesS[i] = (q * TIME_UNIT_MS) / 1000;
  }
  const axis = (a: readonly number[], offset: number) =>
    Float64Array.from(a, (v) => offset + v * ACCEL_UNIT_MPS2);
  return {
    timesS,
    x: axis(s.x, s.offsetMps2[0]),
    y: axis(s.y, s.offsetMps2[1]),
    z: axis(s.z, s.offsetMps2[2]),
  };
}

/** Rounding of stored result figures (our choice: far below what the instruments resolve). */
export const round = {
  angle: (v: number) => roundTo(v, 1e-7), // rad: 0.00001°
  ratio: (v: number) => roundTo(v, 1e-7),
  frequency: (v: number) => roundTo(v, 1e-5), // Hz
  confidence: (v: number) => roundTo(v, 1e-4),
};

export type ParseResult<T> =
  | { success: true; data: T }
  | {
      success: false;
      /** Where the first problem is, dot-separated ('' for the whole). */ path: string;
    };

/**
 * Checks the `data` of an instrument record of a known kind. Never throws. On failure the
 * caller keeps the record unchanged and shows the catalogue's sentence for a bad recording
 * ('instruments.data.invalid'); nothing is dropped.
 */
export function parseInstrumentData(kind: 'vibration', data: unknown): ParseResult<VibrationData>;
export function parseInstrumentData(kind: 'tilt', data: unknown): ParseResult<TiltData>;
export function parseInstrumentData(
  kind: InstrumentKind,
  data: unknown,
): ParseResult<VibrationData | TiltData> {
  const schema = kind === 'vibration' ? vibrationDataSchema : tiltDataSchema;
  const r = schema.safeParse(data);
  if (r.success) return { success: true, data: r.data };
  const first = r.error.issues[0];
  return { success: false, path: first ? first.path.map(String).join('.') : '' };
}
