/**
 * Schema version 1: the team's first draft of the survey record, kept so records written by
 * early builds can still be read. Never written any more; migrate.ts lifts it to version 2.
 *
 * How it differs from version 2:
 * - flat `lat`, `lon`, `gpsAccuracyM`, `positionSource` instead of a `location` object;
 * - `reinspection: boolean` instead of `inspectionKind`;
 * - lengths in millimetres (`heightMm`, `lengthMm`, `gapMm`, ...), areas already in m²;
 * - residual drift in percent (`driftPercent`, `uncertaintyPercent`), tilt in degrees;
 * - photos without `keptLocation` (version 1 always stripped location EXIF);
 * - `exportedAt` instead of `lastExportedAt`; no instrument records, no draft bookkeeping.
 */
import { z } from './zod-config.js';
import {
  checklistItemSchema,
  codeLevelSchema,
  directionSchema,
  driftMethodSchema,
  floorConstructionSchema,
  locationSourceSchema,
  occupancySchema,
  roofConstructionSchema,
  severitySchema,
  structuralSystemSchema,
  supplementalDeviceSchema,
  wallTypeSchema,
} from './enums.js';
import * as L from './limits.js';
// The spectrum shape has not changed since version 1. When it does, freeze a copy here first.
import { spectrumSpecSchema } from './spectrum.js';
import { jsonValueSchema } from './json-value.js';

// Version 1 is frozen: it does not import version 2's parts, so changing version 2 cannot
// change what version 1 accepts. It used the same limits, expressed in its own units.
const MM = 1000;
const positive = (max: number) => z.number().gt(0).max(max);
const nonNegative = (max: number) => z.number().min(0).max(max);
const shortText = z.string().max(L.MAX_SHORT_TEXT);
const isoTime = z.iso.datetime();

const connectorV1Schema = z.strictObject({
  holdDownCount: z.number().int().min(0).max(L.MAX_CONNECTOR_COUNT).nullable(),
  holdDownCapacityN: nonNegative(L.MAX_FORCE_N).nullable(),
  holdDownStiffnessNPerM: nonNegative(L.MAX_STIFFNESS_N_PER_M).nullable(),
  bracketCount: z.number().int().min(0).max(L.MAX_CONNECTOR_COUNT).nullable(),
  bracketCapacityN: nonNegative(L.MAX_FORCE_N).nullable(),
  bracketStiffnessNPerM: nonNegative(L.MAX_STIFFNESS_N_PER_M).nullable(),
});

export const storeyV1Schema = z.strictObject({
  heightMm: positive(L.MAX_HEIGHT_M * MM),
  floorAreaM2: positive(L.MAX_AREA_M2),
  floorConstruction: floorConstructionSchema,
  unitWeightPa: positive(L.MAX_UNIT_WEIGHT_PA).nullable(),
});

export const wallV1Schema = z.strictObject({
  id: z.string().min(1).max(100),
  storey: z
    .number()
    .int()
    .min(0)
    .max(L.MAX_STOREYS - 1),
  direction: directionSchema,
  type: wallTypeSchema,
  lengthMm: positive(L.MAX_PLAN_M * MM),
  heightMm: positive(L.MAX_HEIGHT_M * MM).nullable(),
  positionMm: z
    .number()
    .min(-L.MAX_PLAN_M * MM)
    .max(L.MAX_PLAN_M * MM)
    .nullable(),
  connectors: connectorV1Schema.nullable(),
  rocking: z
    .strictObject({
      thicknessMm: positive(L.MAX_THICKNESS_M * MM).nullable(),
      selfWeightN: nonNegative(L.MAX_FORCE_N).nullable(),
      gravityLoadN: nonNegative(L.MAX_FORCE_N).nullable(),
      postTensionN: nonNegative(L.MAX_FORCE_N).nullable(),
    })
    .nullable(),
  devices: z.array(supplementalDeviceSchema).max(supplementalDeviceSchema.options.length),
  userUnitShearNPerM: nonNegative(L.MAX_STIFFNESS_N_PER_M).nullable(),
  userUnitStiffnessNPerM2: nonNegative(L.MAX_STIFFNESS_N_PER_M).nullable(),
});

export const residualDriftV1Schema = z.strictObject({
  storey: z
    .number()
    .int()
    .min(0)
    .max(L.MAX_STOREYS - 1),
  direction: directionSchema,
  driftPercent: nonNegative(L.MAX_DRIFT_RATIO * 100),
  method: driftMethodSchema,
  offsetMm: z
    .number()
    .min(-L.MAX_HEIGHT_M * MM)
    .max(L.MAX_HEIGHT_M * MM)
    .nullable(),
  overHeightMm: positive(L.MAX_HEIGHT_M * MM).nullable(),
  tiltDeg: z.number().min(-90).max(90).nullable(),
  uncertaintyPercent: nonNegative(L.MAX_DRIFT_RATIO * 100).nullable(),
});

export const surveyRecordV1Schema = z.strictObject({
  schemaVersion: z.literal(1),
  id: z.uuid(),
  revision: z.number().int().min(1).max(Number.MAX_SAFE_INTEGER),
  deviceId: z.string().min(1).max(100),
  createdAt: isoTime,
  updatedAt: isoTime,
  address: shortText,
  lat: z.number().min(-90).max(90).nullable(),
  lon: z.number().min(-180).max(180).nullable(),
  gpsAccuracyM: nonNegative(L.MAX_ACCURACY_M).nullable(),
  positionSource: locationSourceSchema.nullable(),
  inspector: shortText,
  team: shortText,
  reinspection: z.boolean(),
  building: z.strictObject({
    system: structuralSystemSchema,
    codeLevel: codeLevelSchema,
    occupancy: occupancySchema,
    planXMm: positive(L.MAX_PLAN_M * MM).nullable(),
    planYMm: positive(L.MAX_PLAN_M * MM).nullable(),
    storeys: z.array(storeyV1Schema).max(L.MAX_STOREYS),
    roofConstruction: roofConstructionSchema,
    roofUnitWeightPa: positive(L.MAX_UNIT_WEIGHT_PA).nullable(),
  }),
  walls: z.array(wallV1Schema).max(L.MAX_WALLS),
  observations: z.strictObject({
    uplift: z
      .array(
        z.strictObject({
          wallId: z.string().min(1).max(100),
          gapMm: nonNegative(L.MAX_GAP_M * MM),
        }),
      )
      .max(L.MAX_WALLS),
    residualDrift: z.array(residualDriftV1Schema).max(L.MAX_STOREYS * 2),
    checklist: z
      .array(z.strictObject({ item: checklistItemSchema, severity: severitySchema }))
      .max(checklistItemSchema.options.length),
    notes: z.string().max(L.MAX_NOTES),
  }),
  hazard: spectrumSpecSchema.nullable(),
  measured: z
    .strictObject({
      frequencyHz: positive(L.MAX_FREQUENCY_HZ),
      dampingRatio: nonNegative(L.MAX_DAMPING_RATIO).nullable(),
      confidence: z.number().min(0).max(1),
      direction: directionSchema.nullable(),
    })
    .nullable(),
  photos: z
    .array(z.strictObject({ id: z.uuid(), takenAt: isoTime.nullable(), caption: shortText }))
    .max(L.MAX_PHOTOS),
  result: z
    .strictObject({
      calcVersion: z.string().min(1).max(50),
      computedAt: isoTime,
      result: jsonValueSchema,
    })
    .nullable(),
  exportedAt: isoTime.nullable(),
});

/** A version 1 record. */
export type SurveyRecordV1 = z.infer<typeof surveyRecordV1Schema>;
