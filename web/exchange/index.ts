/**
 * Exchange: files in and out of the device.
 *
 * Export
 * - `geoJsonExport(records, context)` / `geoJsonFile` — an RFC 7946 FeatureCollection, one
 *   Feature per survey (lon/lat, WGS84, no `crs`), carrying the whole record (every input,
 *   result, both versions, revision, inspector) and the cautions; a survey without location
 *   is a Feature with `geometry: null`, listed in `grainline.withoutLocation`.
 * - `csvParts(records)` / `csvFile` — an RFC 4180 summary for spreadsheets.
 * - `zipExport(records, context, readPhoto)` — GeoJSON + CSV + README + photos (fflate).
 * - `shareOrDownload(file)` — the Web Share API where it can share the file, else a download.
 *
 * Import
 * - `readExchangeText(text)` — validates every Feature (forms/ zod schemas, any earlier
 *   schema version migrated) and lists the bad ones with reasons.
 * - `planMerge(incoming, existing)` — the merge policy: duplicates by id and revision
 *   removed, every revision kept, newest current, conflicts kept side by side.
 * - `importFile(file, { strict })` / `importText(...)` — the whole import into a store, in
 *   one all-or-nothing write; `importDemoTown({ url } | { text })` loads the demo town.
 *
 * UI
 * - `ExchangeActions` — Import and Export buttons with the import report.
 * - `ImportReportView` — what an import did, feature by feature.
 */
export { readVerdict, type SurveyVerdict } from './survey-verdict.js';
export {
  geoJsonExport,
  geoJsonFile,
  surveyFeature,
  surveyGeometry,
  type ExportContext,
  type ExportHeader,
  type GeoJsonExport,
  type SurveyFeature,
} from './geojson-export.js';
export { CSV_COLUMNS, csvField, csvFile, csvParts, spreadsheetSafeText } from './csv-export.js';
export { zipExport, ZIP_ENTRIES, type PhotoReader, type ZipExportResult } from './zip-export.js';
export { canShareFile, downloadFile, shareOrDownload, type ShareOutcome } from './share-file.js';
export {
  EXPORT_FORMAT,
  EXPORT_FORMAT_VERSION,
  GEOJSON_MEDIA_TYPE,
  CSV_MEDIA_TYPE,
  ZIP_MEDIA_TYPE,
} from './export-format.js';
export {
  readExchangeText,
  readExchangeValue,
  readFeature,
  type AcceptedSurvey,
  type ParsedExchange,
  type RejectedFeature,
} from './geojson-import.js';
export {
  planMerge,
  type ConflictVariant,
  type ExistingSurvey,
  type MergePlan,
} from './merge-plan.js';
export {
  importText,
  MAX_IMPORT_MB,
  type ConflictNote,
  type ImportOptions,
  type ImportReport,
} from './import-file.js';
export {
  CONFLICTS_SETTING,
  IMPORT_STAMP_SETTING,
  readConflictFlags,
  type ConflictFlag,
  type ExchangeStore,
} from './exchange-store.js';
export {
  allSurveys,
  deviceStore,
  exportCsvFile,
  exportGeoJsonFile,
  exportZipFile,
  importDemoTown,
  importFile,
  markAsExported,
  type DemoSource,
} from './device-exchange.js';
export {
  ExchangeActions,
  type ExchangeAction,
  type ExchangeActionsProps,
} from './exchange-actions.js';
export { ImportReportView } from './import-report-view.js';
