/**
 * Survey records → a GeoJSON FeatureCollection (RFC 7946).
 *
 * - Coordinates are WGS84 longitude, latitude in that order (RFC 7946 §3.1.1, §4); there is
 *   no `crs` member (removed by RFC 7946 §4).
 * - One Feature per survey. `properties.record` is the whole stored record, every input,
 *   result snapshot, version, revision and the inspector, so the file round-trips; the other
 *   properties are a flat summary for GIS attribute tables.
 * - A survey without a location is still exported, as a Feature with `geometry: null`
 *   (allowed by RFC 7946 §3.2), and listed in `grainline.withoutLocation`; nothing is dropped.
 * - The collection carries the caution in its `grainline` foreign member (RFC 7946 §6.1),
 *   and each Feature a short one.
 *
 * The text is produced as a list of parts (one per Feature) rather than one string, so a
 * very large export never has to fit in a single JavaScript string; `new Blob(parts)` joins
 * them.
 */
import { CALC_VERSION } from '../../calc/index.js';
import { SCHEMA_VERSION, type SurveyRecord } from '../../forms/index.js';
import { exportCaution, shortCaution } from './export-cautions.js';
import {
  EXPORT_FORMAT,
  EXPORT_FORMAT_VERSION,
  GEOJSON_MEDIA_TYPE,
  fileStamp,
} from './export-format.js';
import { readVerdict } from './survey-verdict.js';

export interface ExportContext {
  /** When the export was made. */
  exportedAt: Date;
  /** Which build of the app wrote it. */
  build: string;
}

/** A Point geometry, or null for a survey without location. */
export type SurveyGeometry = { type: 'Point'; coordinates: [number, number] } | null;

/** The flat summary beside the record, for GIS attribute tables. */
export interface SurveyFeatureProperties {
  surveyId: string;
  revision: number;
  schemaVersion: number;
  calcVersion: string | null;
  inspector: string;
  team: string;
  address: string;
  surveyedAt: string;
  updatedAt: string;
  posting: string | null;
  damageState: string | null;
  needsAssessment: boolean;
  locationSource: string | null;
  locationAccuracyM: number | null;
  caution: string;
  /** The stored record itself, exactly. */
  record: SurveyRecord;
}

export interface SurveyFeature {
  type: 'Feature';
  id: string;
  geometry: SurveyGeometry;
  properties: SurveyFeatureProperties;
}

/** The geometry of a record: [lon, lat] in WGS84, or null. */
export function surveyGeometry(record: SurveyRecord): SurveyGeometry {
  const loc = record.location;
  return loc === null ? null : { type: 'Point', coordinates: [loc.lon, loc.lat] };
}

/** One survey as a GeoJSON Feature. `caution` is passed in so a big export looks it up once. */
export function surveyFeature(record: SurveyRecord, caution = shortCaution()): SurveyFeature {
  const verdict = readVerdict(record);
  return {
    type: 'Feature',
    id: record.id,
    geometry: surveyGeometry(record),
    properties: {
      surveyId: record.id,
      revision: record.revision,
      schemaVersion: record.schemaVersion,
      calcVersion: record.result?.calcVersion ?? null,
      inspector: record.inspector,
      team: record.team,
      address: record.address,
      surveyedAt: record.createdAt,
      updatedAt: record.updatedAt,
      posting: verdict.posting,
      damageState: verdict.damageState,
      needsAssessment: verdict.needsAssessment,
      locationSource: record.location?.source ?? null,
      locationAccuracyM: record.location?.accuracyM ?? null,
      caution,
      record,
    },
  };
}

/** What the collection's `grainline` member says about the file. */
export interface ExportHeader {
  format: typeof EXPORT_FORMAT;
  formatVersion: number;
  schemaVersion: number;
  calcVersion: string;
  exportedAt: string;
  build: string;
  caution: string;
  count: number;
  /** Ids of the surveys exported with `geometry: null`. */
  withoutLocation: string[];
}

export interface GeoJsonExport {
  /** The file's text in parts; `parts.join('')` is the whole document. */
  parts: string[];
  header: ExportHeader;
  /** [west, south, east, north] of the located surveys, or null when none has a location. */
  bbox: [number, number, number, number] | null;
}

/** Builds the text of a FeatureCollection holding `records`. */
export function geoJsonExport(
  records: readonly SurveyRecord[],
  context: ExportContext,
): GeoJsonExport {
  const caution = shortCaution();
  const withoutLocation: string[] = [];
  let west = Infinity;
  let south = Infinity;
  let east = -Infinity;
  let north = -Infinity;
  const featureParts: string[] = [];
  for (let i = 0; i < records.length; i++) {
    const record = records[i] as SurveyRecord;
    const loc = record.location;
    if (loc === null) withoutLocation.push(record.id);
    else {
      if (loc.lon < west) west = loc.lon;
      if (loc.lon > east) east = loc.lon;
      if (loc.lat < south) south = loc.lat;
      if (loc.lat > north) north = loc.lat;
    }
    featureParts.push((i === 0 ? '' : ',\n') + JSON.stringify(surveyFeature(record, caution)));
  }
  const bbox: GeoJsonExport['bbox'] =
    withoutLocation.length === records.length ? null : [west, south, east, north];
  const header: ExportHeader = {
    format: EXPORT_FORMAT,
    formatVersion: EXPORT_FORMAT_VERSION,
    schemaVersion: SCHEMA_VERSION,
    calcVersion: CALC_VERSION,
    exportedAt: context.exportedAt.toISOString(),
    build: context.build,
    caution: exportCaution(),
    count: records.length,
    withoutLocation,
  };
  const head =
    '{"type":"FeatureCollection",' +
    (bbox ? `"bbox":${JSON.stringify(bbox)},` : '') +
    `"grainline":${JSON.stringify(header)},\n"features":[\n`;
  return { parts: [head, ...featureParts, '\n]}\n'], header, bbox };
}

/** The export as a File, named by the export time. */
export function geoJsonFile(records: readonly SurveyRecord[], context: ExportContext): File {
  const { parts } = geoJsonExport(records, context);
  return new File(parts, `grainline-surveys-${fileStamp(context.exportedAt)}.geojson`, {
    type: GEOJSON_MEDIA_TYPE,
  });
}
