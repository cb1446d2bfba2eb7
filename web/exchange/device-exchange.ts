/**
 * Export and import against the page's own device storage (web/storage's default store):
 * what the buttons of the building list and the map call.
 */
import type { SurveyRecord } from '../../forms/index.js';
import { getDefaultStore } from '../storage/index.js';
import type { ExchangeStore } from './exchange-store.js';
import { csvFile } from './csv-export.js';
import { geoJsonFile, type ExportContext } from './geojson-export.js';
import {
  importFile as importInto,
  importText,
  type ImportOptions,
  type ImportReport,
} from './import-file.js';
import { zipExport, type ZipExportResult } from './zip-export.js';

/** The device store, as exchange sees it. */
export function deviceStore(): ExchangeStore {
  return getDefaultStore();
}

/** Export context for now, with this build's id. */
export function exportContext(now = new Date()): ExportContext {
  return { exportedAt: now, build: typeof __BUILD_ID__ === 'string' ? __BUILD_ID__ : 'unknown' };
}

/** Every current survey on the device (what an export holds by default). */
export function allSurveys(): Promise<SurveyRecord[]> {
  return deviceStore().listSurveys();
}

export function exportGeoJsonFile(records: readonly SurveyRecord[], now = new Date()): File {
  return geoJsonFile(records, exportContext(now));
}

export function exportCsvFile(records: readonly SurveyRecord[], now = new Date()): File {
  return csvFile(records, now);
}

/** The zip export, with the photos from the device (or without, when `withPhotos` is false). */
export function exportZipFile(
  records: readonly SurveyRecord[],
  withPhotos: boolean,
  now = new Date(),
): Promise<ZipExportResult> {
  const store = deviceStore();
  return zipExport(
    records,
    exportContext(now),
    withPhotos ? async (id) => (await store.getPhoto(id))?.blob ?? null : null,
  );
}

/** Marks the exported revisions (bookkeeping only; no revision is written). */
export async function markAsExported(records: readonly SurveyRecord[], at: Date): Promise<void> {
  const store = deviceStore();
  await store.markExported?.(
    records.map((r) => ({ id: r.id, revision: r.revision })),
    at,
  );
}

/**
 * Imports a file the user picked into this device: GeoJSON of any earlier schema version,
 * or a zip export. `strict`: all of the file or nothing. Never throws; the report says what
 * happened, feature by feature.
 */
export function importFile(
  file: Blob & { name?: string },
  options: ImportOptions,
): Promise<ImportReport> {
  return importInto(file, options, deviceStore());
}

/** Where the demo town comes from: a URL to fetch, or its GeoJSON text. */
export type DemoSource = { url: string } | { text: string };

/**
 * Imports the bundled demo town (an invented scenario) into this device, strictly: the demo
 * file is ours, so a bad feature in it is a bug, and nothing is half-loaded. Importing it
 * twice adds nothing (duplicates by survey id and revision).
 */
export async function importDemoTown(source: DemoSource): Promise<ImportReport> {
  let text: string;
  if ('text' in source) text = source.text;
  else {
    try {
      const response = await fetch(source.url);
      if (!response.ok) throw new Error(String(response.status));
      text = await response.text();
    } catch {
      return importText('', source.url, { strict: true }, deviceStore());
    }
  }
  return importText(text, 'demo-town.geojson', { strict: true }, deviceStore());
}
