/**
 * Reading an exchange file: our GeoJSON of any earlier schema version (and any earlier file
 * layout), from any inspector. Every Feature is checked on its own:
 *
 * 1. it is a GeoJSON Feature with a Grainline record in `properties.record` (an object, or
 *    the same object as JSON text, which is how some GIS tools re-save nested values);
 * 2. the record parses with the schema of its own version and is migrated to the current
 *    one (`parseStoredRecord` from forms/, the same zod schemas the device storage uses);
 * 3. its geometry agrees with the record's location: `null` when the survey has no
 *    location, else a Point at [lon, lat].
 *
 * A Feature that fails is listed with its reasons and never "repaired". The flat summary
 * properties beside the record are derived from it on export and are not read back.
 */
import { parseStoredRecord, type FieldMessage, type SurveyRecord } from '../../forms/index.js';
import { t } from '../i18n/index.js';
import { EXPORT_FORMAT, EXPORT_FORMAT_VERSION } from './export-format.js';

/** A Feature that passed every check. */
export interface AcceptedSurvey {
  /** Position of the Feature in its file, from 0. */
  index: number;
  record: SurveyRecord;
  /** The schema version the record was written with (migrated when older). */
  fromVersion: number;
}

/** A Feature that failed, with every reason found. */
export interface RejectedFeature {
  index: number;
  /** The survey id, when the Feature carried a readable one. */
  surveyId: string | null;
  /** The address, when readable: helps a person find the building. Plain text. */
  address: string | null;
  reasons: string[];
}

export type ParsedExchange =
  | {
      ok: true;
      accepted: AcceptedSurvey[];
      rejected: RejectedFeature[];
      /** The file's format version (1 when the file did not say). */
      formatVersion: number;
    }
  | { ok: false; reason: string };

/**
 * Tolerance when comparing a Point with the record's location, in degrees (1e-7° is about
 * 1 cm on the ground): GIS tools that re-save a file may round coordinates in their last
 * digits. Common practice, no source.
 */
export const POSITION_TOLERANCE_DEG = 1e-7;

/** Most Features read from one file, so a hostile file cannot exhaust memory. */
export const MAX_FEATURES = 1_000_000;

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function own(obj: Record<string, unknown>, key: string): unknown {
  return Object.prototype.hasOwnProperty.call(obj, key) ? obj[key] : undefined;
}

function describeMessage(m: FieldMessage): string {
  return m.path === ''
    ? m.message
    : t('exchange.reason.atField', { message: m.message, path: m.path });
}

function checkGeometry(geometry: unknown, record: SurveyRecord): string | null {
  const loc = record.location;
  if (geometry === null || geometry === undefined) {
    return loc === null ? null : t('exchange.reason.geometryMissing');
  }
  if (!isObject(geometry) || own(geometry, 'type') !== 'Point') {
    return t('exchange.reason.geometryNotPoint');
  }
  const coords = own(geometry, 'coordinates');
  if (
    !Array.isArray(coords) ||
    coords.length < 2 ||
    typeof coords[0] !== 'number' ||
    typeof coords[1] !== 'number'
  ) {
    return t('exchange.reason.geometryNotPoint');
  }
  if (loc === null) return t('exchange.reason.geometryWithoutLocation');
  const [lon, lat] = coords as [number, number];
  if (
    Math.abs(lon - loc.lon) > POSITION_TOLERANCE_DEG ||
    Math.abs(lat - loc.lat) > POSITION_TOLERANCE_DEG
  ) {
    return t('exchange.reason.geometryMismatch', {
      point: `${lon}, ${lat}`,
      location: `${loc.lon}, ${loc.lat}`,
    });
  }
  return null;
}

function textOrNull(v: unknown, max = 200): string | null {
  return typeof v === 'string' && v.length > 0 ? v.slice(0, max) : null;
}

/** Checks one Feature; never throws. */
export function readFeature(feature: unknown, index: number): AcceptedSurvey | RejectedFeature {
  const reject = (reasons: string[], raw?: Record<string, unknown>): RejectedFeature => ({
    index,
    surveyId: raw ? textOrNull(own(raw, 'id'), 100) : null,
    address: raw ? textOrNull(own(raw, 'address')) : null,
    reasons,
  });
  if (!isObject(feature) || own(feature, 'type') !== 'Feature') {
    return reject([t('exchange.reason.notFeature')]);
  }
  const properties = own(feature, 'properties');
  let raw = isObject(properties) ? own(properties, 'record') : undefined;
  if (typeof raw === 'string') {
    try {
      raw = JSON.parse(raw) as unknown;
    } catch {
      return reject([t('exchange.reason.recordNotJson')]);
    }
  }
  if (!isObject(raw)) return reject([t('exchange.reason.noRecord')]);
  const parsed = parseStoredRecord(raw);
  if (!parsed.ok) {
    if (parsed.reason === 'newer-version') {
      return reject([t('exchange.reason.newerVersion', { version: parsed.version ?? '?' })], raw);
    }
    const reasons = parsed.messages.map(describeMessage);
    return reject(reasons.length > 0 ? reasons : [t('exchange.reason.invalid')], raw);
  }
  const geometryProblem = checkGeometry(own(feature, 'geometry'), parsed.record);
  if (geometryProblem) return reject([geometryProblem], raw);
  return { index, record: parsed.record, fromVersion: parsed.fromVersion };
}

/** Reads a parsed JSON value: a FeatureCollection of ours (or a single Feature). */
export function readExchangeValue(value: unknown): ParsedExchange {
  if (!isObject(value)) return { ok: false, reason: t('exchange.file.notGeoJson') };
  let features: unknown[];
  let formatVersion = EXPORT_FORMAT_VERSION;
  const type = own(value, 'type');
  if (type === 'FeatureCollection') {
    const list = own(value, 'features');
    if (!Array.isArray(list)) return { ok: false, reason: t('exchange.file.noFeatures') };
    features = list;
    const header = own(value, 'grainline');
    if (isObject(header)) {
      const format = own(header, 'format');
      const version = own(header, 'formatVersion');
      if (format !== undefined && format !== EXPORT_FORMAT) {
        return { ok: false, reason: t('exchange.file.otherFormat') };
      }
      if (typeof version === 'number' && Number.isInteger(version)) {
        if (version > EXPORT_FORMAT_VERSION) {
          return { ok: false, reason: t('exchange.file.newerFormat', { version }) };
        }
        formatVersion = version;
      }
    }
  } else if (type === 'Feature') {
    features = [value];
  } else {
    return { ok: false, reason: t('exchange.file.notGeoJson') };
  }
  if (features.length > MAX_FEATURES) {
    return { ok: false, reason: t('exchange.file.tooMany', { max: MAX_FEATURES }) };
  }
  const accepted: AcceptedSurvey[] = [];
  const rejected: RejectedFeature[] = [];
  for (let i = 0; i < features.length; i++) {
    const r = readFeature(features[i], i);
    if ('record' in r) accepted.push(r);
    else rejected.push(r);
  }
  return { ok: true, accepted, rejected, formatVersion };
}

/** Reads the text of an exchange file. */
export function readExchangeText(text: string): ParsedExchange {
  let value: unknown;
  try {
    value = JSON.parse(text) as unknown;
  } catch {
    return { ok: false, reason: t('exchange.file.notJson') };
  }
  return readExchangeValue(value);
}
