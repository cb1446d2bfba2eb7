/**
 * The export with photos: one zip (fflate) holding the GeoJSON, the CSV summary, a README
 * with the cautions, and the photos under `photos/<survey id>/<photo id>.<ext>`. Photo
 * metadata (caption, time, whether location EXIF was kept) stays in each record; the zip only
 * adds the image bytes. A photo the device cannot read is listed in the README, not skipped
 * without a word.
 *
 * Built with fflate's streaming `Zip` on the main thread: text is deflated, images (already
 * compressed) are stored as they are. No worker, so nothing needs eval or blob scripts.
 */
import { Zip, ZipDeflate, ZipPassThrough } from 'fflate';
import type { SurveyRecord } from '../../forms/index.js';
import { t } from '../i18n/index.js';
import { csvParts } from './csv-export.js';
import { exportCaution } from './export-cautions.js';
import { ZIP_MEDIA_TYPE, fileStamp } from './export-format.js';
import { geoJsonExport, type ExportContext } from './geojson-export.js';

/** Reads a photo's image by id; null when the device has none. */
export type PhotoReader = (photoId: string) => Promise<Blob | null>;

/** File names inside the zip. */
export const ZIP_ENTRIES = {
  geojson: 'surveys.geojson',
  csv: 'summary.csv',
  readme: 'README.txt',
  photosDir: 'photos/',
} as const;

const EXTENSIONS: Readonly<Record<string, string>> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
  'image/heic': 'heic',
  'image/avif': 'avif',
};

/** The extension for an image's media type ('bin' when unknown). */
export function photoExtension(type: string): string {
  return EXTENSIONS[type.toLowerCase().split(';')[0]?.trim() ?? ''] ?? 'bin';
}

export interface ZipExportResult {
  file: File;
  photosIncluded: number;
  /** Photos listed in records but unreadable on this device: "survey id / photo id". */
  photosMissing: string[];
}

/** Builds the zip export. `readPhoto` is null to leave photos out. */
export async function zipExport(
  records: readonly SurveyRecord[],
  context: ExportContext,
  readPhoto: PhotoReader | null,
): Promise<ZipExportResult> {
  const chunks: Uint8Array[] = [];
  let failure: Error | null = null;
  const zip = new Zip((err, data) => {
    if (err) failure = err;
    else chunks.push(data);
  });
  const encoder = new TextEncoder();
  const addText = (name: string, parts: readonly string[]) => {
    const entry = new ZipDeflate(name, { level: 6 });
    zip.add(entry);
    for (const part of parts) entry.push(encoder.encode(part));
    entry.push(new Uint8Array(0), true);
  };

  addText(ZIP_ENTRIES.geojson, geoJsonExport(records, context).parts);
  addText(ZIP_ENTRIES.csv, csvParts(records));

  let photosIncluded = 0;
  const photosMissing: string[] = [];
  if (readPhoto) {
    for (const record of records) {
      for (const photo of record.photos) {
        let blob: Blob | null = null;
        try {
          blob = await readPhoto(photo.id);
        } catch {
          blob = null;
        }
        if (!blob) {
          photosMissing.push(`${record.id} / ${photo.id}`);
          continue;
        }
        const entry = new ZipPassThrough(
          `${ZIP_ENTRIES.photosDir}${record.id}/${photo.id}.${photoExtension(blob.type)}`,
        );
        zip.add(entry);
        entry.push(new Uint8Array(await blob.arrayBuffer()), true);
        photosIncluded += 1;
      }
    }
  }

  const readme = [
    t('exchange.readme.title'),
    '',
    t('exchange.readme.caution', { caution: exportCaution() }),
    '',
    t('exchange.readme.files', {
      geojson: ZIP_ENTRIES.geojson,
      csv: ZIP_ENTRIES.csv,
      photos: ZIP_ENTRIES.photosDir,
    }),
    t('exchange.readme.written', {
      at: context.exportedAt.toISOString(),
      build: context.build,
      count: records.length,
    }),
    readPhoto
      ? t('exchange.readme.photos', { count: photosIncluded })
      : t('exchange.readme.noPhotos'),
    ...(photosMissing.length > 0
      ? [t('exchange.readme.missing', { count: photosMissing.length }), ...photosMissing]
      : []),
    '',
  ].join('\r\n');
  addText(ZIP_ENTRIES.readme, [readme]);
  zip.end();
  if (failure) throw failure;

  const file = new File(
    chunks as BlobPart[],
    `grainline-export-${fileStamp(context.exportedAt)}.zip`,
    { type: ZIP_MEDIA_TYPE },
  );
  return { file, photosIncluded, photosMissing };
}
