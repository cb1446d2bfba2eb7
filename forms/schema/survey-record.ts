/**
 * The stored survey record, schema version 2 (current): every `SurveyInput` field the
 * calculation reads, plus the record's own metadata (identity, revision, people, place,
 * photos, results, export marker, draft bookkeeping). SI units throughout: m, m², Pa, N,
 * N/m, s, rad, Hz; ratios are plain numbers (0.01 = 1 %); accelerations in g.
 *
 * "Valid to store" is what this schema checks: each value has the right type and a
 * plausible range. A draft is saved while incomplete, so nothing here demands that a storey
 * or a wall exists; whether the record is complete enough to screen is a separate question
 * answered by `screeningGaps()` (screening-gaps.ts) as a list of missing things.
 *
 * Two draft fields keep the promise that nothing typed is lost or silently altered:
 * - `unconfirmed`: field paths whose value the app filled in (a default, or a value copied
 *   from the storey below) and the inspector has not confirmed yet;
 * - `unparsed`: text typed into a field that is not (yet) a valid value, keyed by field path;
 *   the value at that path keeps its last valid content meanwhile.
 * Objects are strict: an unknown key fails parsing (and the record is quarantined), rather
 * than being dropped without a word.
 */
import { z } from './zod-config.js';
import {
  checklistItemSchema,
  codeLevelSchema,
  directionSchema,
  driftMethodSchema,
  floorConstructionSchema,
  inspectionKindSchema,
  locationSourceSchema,
  occupancySchema,
  roofConstructionSchema,
  severitySchema,
  structuralSystemSchema,
  supplementalDeviceSchema,
  wallTypeSchema,
} from './enums.js';
import * as L from './limits.js';
import { fieldTextMapSchema, jsonValueSchema } from './json-value.js';
import { spectrumSpecSchema } from './spectrum.js';

/** The schema version this build writes. Older versions are migrated on read (migrate.ts). */
export const SCHEMA_VERSION = 2;

const positive = (max: number) => z.number().gt(0).max(max);
const nonNegative = (max: number) => z.number().min(0).max(max);
const count = (max: number) => z.number().int().min(0).max(max);
const shortText = z.string().max(L.MAX_SHORT_TEXT);
const isoTime = z.iso.datetime();

export const storeySchema = z.strictObject({
  heightM: positive(L.MAX_HEIGHT_M),
  floorAreaM2: positive(L.MAX_AREA_M2),
  floorConstruction: floorConstructionSchema,
  unitWeightPa: positive(L.MAX_UNIT_WEIGHT_PA).nullable(),
});

export const connectorSchema = z.strictObject({
  holdDownCount: count(L.MAX_CONNECTOR_COUNT).nullable(),
  holdDownCapacityN: nonNegative(L.MAX_FORCE_N).nullable(),
  holdDownStiffnessNPerM: nonNegative(L.MAX_STIFFNESS_N_PER_M).nullable(),
  bracketCount: count(L.MAX_CONNECTOR_COUNT).nullable(),
  bracketCapacityN: nonNegative(L.MAX_FORCE_N).nullable(),
  bracketStiffnessNPerM: nonNegative(L.MAX_STIFFNESS_N_PER_M).nullable(),
});

export const rockingSchema = z.strictObject({
  thicknessM: positive(L.MAX_THICKNESS_M).nullable(),
  selfWeightN: nonNegative(L.MAX_FORCE_N).nullable(),
  gravityLoadN: nonNegative(L.MAX_FORCE_N).nullable(),
  postTensionN: nonNegative(L.MAX_FORCE_N).nullable(),
});

export const wallSchema = z.strictObject({
  id: z.string().min(1).max(100),
  storey: count(L.MAX_STOREYS - 1),
  direction: directionSchema,
  type: wallTypeSchema,
  lengthM: positive(L.MAX_PLAN_M),
  heightM: positive(L.MAX_HEIGHT_M).nullable(),
  positionM: z.number().min(-L.MAX_PLAN_M).max(L.MAX_PLAN_M).nullable(),
  connectors: connectorSchema.nullable(),
  rocking: rockingSchema.nullable(),
  devices: z.array(supplementalDeviceSchema).max(supplementalDeviceSchema.options.length),
  userUnitShearNPerM: nonNegative(L.MAX_STIFFNESS_N_PER_M).nullable(),
  userUnitStiffnessNPerM2: nonNegative(L.MAX_STIFFNESS_N_PER_M).nullable(),
});

export const upliftSchema = z.strictObject({
  wallId: z.string().min(1).max(100),
  gapM: nonNegative(L.MAX_GAP_M),
});

export const residualDriftSchema = z.strictObject({
  storey: count(L.MAX_STOREYS - 1),
  direction: directionSchema,
  ratio: nonNegative(L.MAX_DRIFT_RATIO),
  method: driftMethodSchema,
  offsetM: z.number().min(-L.MAX_HEIGHT_M).max(L.MAX_HEIGHT_M).nullable(),
  overHeightM: positive(L.MAX_HEIGHT_M).nullable(),
  tiltRad: z.number().min(-L.MAX_TILT_RAD).max(L.MAX_TILT_RAD).nullable(),
  uncertainty: nonNegative(L.MAX_DRIFT_RATIO).nullable(),
});

export const checklistEntrySchema = z.strictObject({
  item: checklistItemSchema,
  severity: severitySchema,
});

export const observationsSchema = z.strictObject({
  uplift: z.array(upliftSchema).max(L.MAX_WALLS),
  residualDrift: z.array(residualDriftSchema).max(L.MAX_STOREYS * 2),
  checklist: z.array(checklistEntrySchema).max(checklistItemSchema.options.length),
  notes: z.string().max(L.MAX_NOTES),
});

export const measuredFrequencySchema = z.strictObject({
  frequencyHz: positive(L.MAX_FREQUENCY_HZ),
  dampingRatio: nonNegative(L.MAX_DAMPING_RATIO).nullable(),
  confidence: z.number().min(0).max(1),
  direction: directionSchema.nullable(),
});

export const buildingSchema = z.strictObject({
  system: structuralSystemSchema,
  codeLevel: codeLevelSchema,
  occupancy: occupancySchema,
  planXM: positive(L.MAX_PLAN_M).nullable(),
  planYM: positive(L.MAX_PLAN_M).nullable(),
  storeys: z.array(storeySchema).max(L.MAX_STOREYS),
  roofConstruction: roofConstructionSchema,
  roofUnitWeightPa: positive(L.MAX_UNIT_WEIGHT_PA).nullable(),
});

/** Where the building is: WGS84 degrees, with how the position was obtained. */
export const locationSchema = z.strictObject({
  lat: z.number().min(-90).max(90),
  lon: z.number().min(-180).max(180),
  accuracyM: nonNegative(L.MAX_ACCURACY_M).nullable(),
  source: locationSourceSchema,
});

/** A photo's metadata; the image itself is a Blob in the photos store, under the same id. */
export const photoMetaSchema = z.strictObject({
  id: z.uuid(),
  takenAt: isoTime.nullable(),
  caption: shortText,
  /** True when the inspector chose to keep the location EXIF in the stored image. */
  keptLocation: z.boolean(),
});

/**
 * The last screening result, kept as it was computed. Its shape is owned by calc/screening;
 * here it is only checked to be JSON (finite numbers, strings, booleans, null, arrays,
 * plain objects), so it can be stored and exported as it is (json-value.ts says why not
 * `z.json()`).
 */
export const resultSnapshotSchema = z.strictObject({
  calcVersion: z.string().min(1).max(50),
  computedAt: isoTime,
  result: jsonValueSchema,
});

/**
 * Raw instrument data (vibration or tilt samples). The shape is set by a later issue; until
 * then each entry is an identified, timestamped JSON payload.
 */
export const instrumentRecordSchema = z.strictObject({
  id: z.string().min(1).max(100),
  kind: z.string().min(1).max(40),
  recordedAt: isoTime,
  data: jsonValueSchema,
});

/** Field paths (dot-separated, indices as numbers) used by `unconfirmed` and `unparsed`. */
const fieldPath = z.string().min(1).max(200);

export const surveyRecordSchema = z.strictObject({
  schemaVersion: z.literal(SCHEMA_VERSION),
  id: z.uuid(),
  revision: z.number().int().min(1).max(Number.MAX_SAFE_INTEGER),
  deviceId: z.string().min(1).max(100),
  createdAt: isoTime,
  updatedAt: isoTime,
  address: shortText,
  location: locationSchema.nullable(),
  inspector: shortText,
  team: shortText,
  inspectionKind: inspectionKindSchema,
  building: buildingSchema,
  walls: z.array(wallSchema).max(L.MAX_WALLS),
  observations: observationsSchema,
  hazard: spectrumSpecSchema.nullable(),
  measured: measuredFrequencySchema.nullable(),
  photos: z.array(photoMetaSchema).max(L.MAX_PHOTOS),
  result: resultSnapshotSchema.nullable(),
  lastExportedAt: isoTime.nullable(),
  instrumentRecords: z.array(instrumentRecordSchema).max(1_000),
  unconfirmed: z.array(fieldPath).max(10_000),
  unparsed: fieldTextMapSchema(L.MAX_NOTES),
});

/** A stored survey record (schema version 2). Assignable to calc's `SurveyInput`. */
export type SurveyRecord = z.infer<typeof surveyRecordSchema>;
export type StoreyRecord = z.infer<typeof storeySchema>;
export type WallRecord = z.infer<typeof wallSchema>;
export type LocationRecord = z.infer<typeof locationSchema>;
export type PhotoMeta = z.infer<typeof photoMetaSchema>;
export type ResultSnapshot = z.infer<typeof resultSnapshotSchema>;
export type InstrumentRecord = z.infer<typeof instrumentRecordSchema>;
