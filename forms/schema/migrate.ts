/**
 * Reading a stored record of any schema version: parse it with the schema of its own
 * version, lift it one version at a time to the current one, and parse the result again.
 *
 * Migrations are pure and lossless: every value of the old record is carried into the new
 * one, converted to SI (mm → m by dividing by 1000, % → ratio by dividing by 100, degrees →
 * radians). Where the old record cannot say something the new one needs, the new field gets
 * a stated default and its path is listed in `unconfirmed`; where an old value has no place
 * in the new shape (a latitude without a longitude), its text goes to `unparsed`.
 * A record that fails any step is not "repaired": the caller quarantines it as it is.
 */
import { fieldMessages, type FieldMessage } from './field-messages.js';
import { en, type MessageCatalogue } from './messages.js';
import { surveyRecordV1Schema, type SurveyRecordV1 } from './survey-record-v1.js';
import { SCHEMA_VERSION, surveyRecordSchema, type SurveyRecord } from './survey-record.js';
import { isSurveyRecord } from './validate.js';

/** Why a stored value could not be read. */
export type ParseFailureReason =
  | 'not-an-object' // not a plain object at all
  | 'no-version' // no numeric schemaVersion
  | 'newer-version' // written by a newer build of the app (keep it for that build)
  | 'unknown-version' // a version this build has never had
  | 'invalid'; // fails the schema of its version, or of a later one after migrating

export type StoredParseResult =
  | { ok: true; record: SurveyRecord; fromVersion: number }
  | {
      ok: false;
      reason: ParseFailureReason;
      /** The schemaVersion the value claimed, when it had one. */
      version: number | null;
      /** The version whose schema failed (the stored one, or a later one after migrating). */
      failedAt: number | null;
      messages: FieldMessage[];
    };

const MM_PER_M = 1000;
const PERCENT = 100;

/** Version 1 → 2. See survey-record-v1.ts for what changed. */
export function migrateV1toV2(v1: SurveyRecordV1): SurveyRecord {
  const unconfirmed: string[] = [];
  const unparsed: Record<string, string> = {};
  const mm = (v: number) => v / MM_PER_M;
  const mmOrNull = (v: number | null) => (v === null ? null : v / MM_PER_M);
  const pctOrNull = (v: number | null) => (v === null ? null : v / PERCENT);

  let location: SurveyRecord['location'] = null;
  if (v1.lat !== null && v1.lon !== null) {
    location = {
      lat: v1.lat,
      lon: v1.lon,
      accuracyM: v1.gpsAccuracyM,
      // Version 1 allowed no source; 'typed' is the least trusting choice, and it is flagged.
      source: v1.positionSource ?? 'typed',
    };
    if (v1.positionSource === null) unconfirmed.push('location.source');
  } else {
    // Half a position cannot be a location; keep what there is as text for the inspector.
    if (v1.lat !== null) unparsed['location.lat'] = String(v1.lat);
    if (v1.lon !== null) unparsed['location.lon'] = String(v1.lon);
    if (v1.gpsAccuracyM !== null) unparsed['location.accuracyM'] = String(v1.gpsAccuracyM);
  }

  return {
    schemaVersion: 2,
    id: v1.id,
    revision: v1.revision,
    deviceId: v1.deviceId,
    createdAt: v1.createdAt,
    updatedAt: v1.updatedAt,
    address: v1.address,
    location,
    inspector: v1.inspector,
    team: v1.team,
    inspectionKind: v1.reinspection ? 'reinspection' : 'first',
    building: {
      system: v1.building.system,
      codeLevel: v1.building.codeLevel,
      occupancy: v1.building.occupancy,
      planXM: mmOrNull(v1.building.planXMm),
      planYM: mmOrNull(v1.building.planYMm),
      storeys: v1.building.storeys.map((s) => ({
        heightM: mm(s.heightMm),
        floorAreaM2: s.floorAreaM2,
        floorConstruction: s.floorConstruction,
        unitWeightPa: s.unitWeightPa,
      })),
      roofConstruction: v1.building.roofConstruction,
      roofUnitWeightPa: v1.building.roofUnitWeightPa,
    },
    walls: v1.walls.map((w) => ({
      id: w.id,
      storey: w.storey,
      direction: w.direction,
      type: w.type,
      lengthM: mm(w.lengthMm),
      heightM: mmOrNull(w.heightMm),
      positionM: mmOrNull(w.positionMm),
      connectors: w.connectors === null ? null : { ...w.connectors },
      rocking:
        w.rocking === null
          ? null
          : {
              thicknessM: mmOrNull(w.rocking.thicknessMm),
              selfWeightN: w.rocking.selfWeightN,
              gravityLoadN: w.rocking.gravityLoadN,
              postTensionN: w.rocking.postTensionN,
            },
      devices: [...w.devices],
      userUnitShearNPerM: w.userUnitShearNPerM,
      userUnitStiffnessNPerM2: w.userUnitStiffnessNPerM2,
    })),
    observations: {
      uplift: v1.observations.uplift.map((u) => ({ wallId: u.wallId, gapM: mm(u.gapMm) })),
      residualDrift: v1.observations.residualDrift.map((d) => ({
        storey: d.storey,
        direction: d.direction,
        ratio: d.driftPercent / PERCENT,
        method: d.method,
        offsetM: mmOrNull(d.offsetMm),
        overHeightM: mmOrNull(d.overHeightMm),
        tiltRad: d.tiltDeg === null ? null : (d.tiltDeg * Math.PI) / 180,
        uncertainty: pctOrNull(d.uncertaintyPercent),
      })),
      checklist: v1.observations.checklist.map((c) => ({ ...c })),
      notes: v1.observations.notes,
    },
    hazard: v1.hazard === null ? null : { ...v1.hazard },
    measured: v1.measured === null ? null : { ...v1.measured },
    // Version 1 always stripped location EXIF from photos.
    photos: v1.photos.map((p) => ({ ...p, keptLocation: false })),
    result: v1.result === null ? null : { ...v1.result },
    lastExportedAt: v1.exportedAt,
    instrumentRecords: [],
    unconfirmed,
    unparsed,
  };
}

interface Step {
  /** Parses a stored value of this version. */
  parse(raw: unknown): { success: true; data: unknown } | { success: false; issues: unknown[] };
  /** Lifts a parsed value of this version to the next version. */
  up(parsed: unknown): unknown;
}

/** One entry per old version: its schema and the step to the next version. */
const steps: Readonly<Record<number, Step>> = {
  1: {
    parse: (raw) => {
      const r = surveyRecordV1Schema.safeParse(raw);
      return r.success
        ? { success: true, data: r.data }
        : { success: false, issues: r.error.issues };
    },
    up: (parsed) => migrateV1toV2(parsed as SurveyRecordV1),
  },
};

/** Versions this build can read. */
export const READABLE_VERSIONS: readonly number[] = [
  ...Object.keys(steps).map(Number),
  SCHEMA_VERSION,
];

function isPlainObject(v: unknown): v is Record<string, unknown> {
  if (typeof v !== 'object' || v === null || Array.isArray(v)) return false;
  const proto: unknown = Object.getPrototypeOf(v);
  return proto === Object.prototype || proto === null;
}

/**
 * Parses a stored value of any known version into a current record. Never throws for bad
 * data (only the catalogue's own bugs could); the failure says why, with field messages.
 */
export function parseStoredRecord(
  raw: unknown,
  catalogue: MessageCatalogue = en,
): StoredParseResult {
  try {
    return parseUnguarded(raw, catalogue);
  } catch {
    // A value built to break a parser (say, nesting deep enough to exhaust the stack) is
    // still only a bad record: report it, never throw at the caller.
    return {
      ok: false,
      reason: 'invalid',
      version: null,
      failedAt: null,
      messages: [
        {
          path: '',
          message: catalogue.rules.invalid(ruleFor(catalogue, '')),
        },
      ],
    };
  }
}

function parseUnguarded(raw: unknown, catalogue: MessageCatalogue): StoredParseResult {
  if (!isPlainObject(raw)) {
    return {
      ok: false,
      reason: 'not-an-object',
      version: null,
      failedAt: null,
      messages: [{ path: '', message: catalogue.rules.missing(ruleFor(catalogue, '')) }],
    };
  }
  const version = raw['schemaVersion'];
  if (typeof version !== 'number' || !Number.isInteger(version)) {
    return {
      ok: false,
      reason: 'no-version',
      version: null,
      failedAt: null,
      messages: [
        {
          path: 'schemaVersion',
          message: catalogue.rules.missing(ruleFor(catalogue, 'schemaVersion')),
        },
      ],
    };
  }
  if (version > SCHEMA_VERSION || (version < SCHEMA_VERSION && steps[version] === undefined)) {
    return {
      ok: false,
      reason: version > SCHEMA_VERSION ? 'newer-version' : 'unknown-version',
      version,
      failedAt: version,
      messages: [
        {
          path: 'schemaVersion',
          message: catalogue.rules.choice(ruleFor(catalogue, 'schemaVersion')),
        },
      ],
    };
  }
  // Current records are by far the most common: a fast in-place check, no copy.
  if (version === SCHEMA_VERSION && isSurveyRecord(raw))
    return { ok: true, record: raw, fromVersion: version };
  let value: unknown = raw;
  for (let v = version; v < SCHEMA_VERSION; v++) {
    const step = steps[v];
    if (step === undefined) throw new Error(`no migration from schema version ${v}`);
    const parsed = step.parse(value);
    if (!parsed.success) {
      return {
        ok: false,
        reason: 'invalid',
        version,
        failedAt: v,
        messages: fieldMessages(parsed.issues as Parameters<typeof fieldMessages>[0], catalogue),
      };
    }
    value = step.up(parsed.data);
  }
  const current = surveyRecordSchema.safeParse(value);
  if (!current.success) {
    return {
      ok: false,
      reason: 'invalid',
      version,
      failedAt: SCHEMA_VERSION,
      messages: fieldMessages(current.error.issues, catalogue),
    };
  }
  return { ok: true, record: current.data, fromVersion: version };
}

function ruleFor(catalogue: MessageCatalogue, key: string) {
  const label = catalogue.fields[key] ?? catalogue.fallbackField;
  return { label: label.label, unit: label.unit, hint: label.hint ?? '' };
}
