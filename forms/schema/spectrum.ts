/**
 * The hazard input of a survey: which response spectrum it is screened against. Mirrors
 * calc/spectra/spectrum-spec.ts (checked at compile time in schema-contract.test.ts).
 * Accelerations in g, periods in s, damping as a ratio (0.05 = 5 %). Whether EC8 corner
 * periods are in order (TB ≤ TC ≤ TD) is a screening gap, not a storage error: a half-typed
 * national-annex set must still be savable.
 */
import { z } from './zod-config.js';
import { ec8GroundSchema } from './enums.js';
import { MAX_ACCELERATION_G, MAX_DAMPING_RATIO, MAX_PERIOD_S } from './limits.js';

// Limits follow what calc/spectra accepts (≥ 0 for ordinates and damping, > 0 for SDS and
// periods), capped by the plausibility bounds of limits.ts.
const accel = () => z.number().min(0).max(MAX_ACCELERATION_G);
const period = () => z.number().gt(0).max(MAX_PERIOD_S);
const damping = () => z.number().min(0).max(MAX_DAMPING_RATIO).optional();

export const ec8SpectrumSchema = z.strictObject({
  kind: z.literal('ec8'),
  type: z.union([z.literal(1), z.literal(2)]),
  ground: ec8GroundSchema,
  ag: accel(),
  damping: damping(),
  S: z.number().gt(0).max(10).optional(),
  TB: period().optional(),
  TC: period().optional(),
  TD: period().optional(),
});

export const asce7SpectrumSchema = z.strictObject({
  kind: z.literal('asce7'),
  SDS: z.number().gt(0).max(MAX_ACCELERATION_G),
  SD1: accel(),
  TL: period(),
  damping: damping(),
});

export const eventSpectrumSchema = z.strictObject({
  kind: z.literal('event'),
  pga: accel(),
  sa03: accel(),
  sa10: accel(),
  damping: damping(),
});

export const spectrumSpecSchema = z.discriminatedUnion('kind', [
  ec8SpectrumSchema,
  asce7SpectrumSchema,
  eventSpectrumSchema,
]);
