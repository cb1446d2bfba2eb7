/**
 * The identity of Grainline's exchange files, shared by the writer and the reader.
 *
 * A GeoJSON export is an RFC 7946 FeatureCollection with one foreign member, `grainline`,
 * that says what the file is (`format`, `formatVersion`), which versions wrote it and the
 * caution. Each Feature carries the whole stored record in `properties.record`; the other
 * properties are a flat summary for GIS tables and are re-derived, never read, on import.
 */

/** Value of `grainline.format` in every export. */
export const EXPORT_FORMAT = 'grainline-surveys';

/**
 * Version of the file layout (not of the record inside, which carries its own
 * `schemaVersion`). Bump it when the layout changes, and keep the reader for older ones.
 */
export const EXPORT_FORMAT_VERSION = 1;

/** Media types (IANA: application/geo+json from RFC 7946 §12; text/csv from RFC 4180 §3). */
export const GEOJSON_MEDIA_TYPE = 'application/geo+json';
export const CSV_MEDIA_TYPE = 'text/csv';
export const ZIP_MEDIA_TYPE = 'application/zip';

/** A file name stamp from a date, in UTC: 20250314-0905. */
export function fileStamp(at: Date): string {
  const iso = at.toISOString(); // 2025-03-14T09:05:00.000Z
  return `${iso.slice(0, 4)}${iso.slice(5, 7)}${iso.slice(8, 10)}-${iso.slice(11, 13)}${iso.slice(14, 16)}`;
}
