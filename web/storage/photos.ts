/**
 * Photos: downscaled on the device before they are stored (store `photos`, see db.ts), with
 * the location EXIF removed unless the inspector keeps it.
 *
 * How location is removed: the photo is decoded (`createImageBitmap`, turned upright from
 * its EXIF orientation), drawn on a canvas at the reduced size and encoded as a new JPEG.
 * Canvas encoders write no EXIF at all, so the stored image carries no position, camera
 * serial or time stamp. To keep the location, the original EXIF block is copied into the
 * new JPEG with its orientation reset (jpeg-exif.ts).
 *
 * The pure part (`fitWithin`, `photoMetaFor`, `photoRowFor`) is tested in Node;
 * `preparePhoto` needs a browser (createImageBitmap, OffscreenCanvas or canvas).
 *
 * Order of writes when adding a photo: `savePhoto()` stores the Blob first, then the
 * caller adds the returned metadata to the record through the DraftSaver. A crash between
 * the two leaves an unused Blob (harmless, listable by survey), never a record pointing at
 * a missing image.
 */
import type { PhotoMeta } from '../../forms/index.js';
import type { PhotoRow } from './db.js';
import { exifHasGps, findExifSegment, insertExif, withUprightOrientation } from './jpeg-exif.js';
import type { SurveyStore } from './survey-store.js';

/**
 * Longest edge of a stored photo, px: enough to see cracks and connectors on a phone or a
 * laptop, about 0.3–0.6 MB as JPEG. Source: common practice, no source.
 */
export const PHOTO_MAX_EDGE_PX = 1600;
/** JPEG quality for stored photos (0–1). Source: common practice, no source. */
export const PHOTO_JPEG_QUALITY = 0.82;

/** The size to draw an image at: within `maxEdge`, same aspect, never enlarged. */
export function fitWithin(
  width: number,
  height: number,
  maxEdge: number = PHOTO_MAX_EDGE_PX,
): {
  width: number;
  height: number;
} {
  for (const [name, v] of [
    ['width', width],
    ['height', height],
    ['maxEdge', maxEdge],
  ] as const) {
    if (!(Number.isFinite(v) && v > 0))
      throw new RangeError(`${name} must be a finite number > 0, got ${v}`);
  }
  const scale = Math.min(1, maxEdge / Math.max(width, height));
  return {
    width: Math.max(1, Math.round(width * scale)),
    height: Math.max(1, Math.round(height * scale)),
  };
}

/** A photo ready to store. */
export interface PreparedPhoto {
  blob: Blob;
  width: number;
  height: number;
  /** True only when location EXIF was asked for, present in the original, and kept. */
  keptLocation: boolean;
}

export interface PrepareOptions {
  keepLocation: boolean;
  maxEdge?: number;
  quality?: number;
}

/**
 * Downscales and re-encodes a photo (browser only). Without `keepLocation` the result has
 * no EXIF at all. Throws when the image cannot be decoded (say so with
 * `catalogue.storage.photoUnreadable`).
 */
export async function preparePhoto(file: Blob, options: PrepareOptions): Promise<PreparedPhoto> {
  const bitmap = await createImageBitmap(file, { imageOrientation: 'from-image' });
  try {
    const size = fitWithin(bitmap.width, bitmap.height, options.maxEdge ?? PHOTO_MAX_EDGE_PX);
    const quality = options.quality ?? PHOTO_JPEG_QUALITY;
    let encoded: Blob;
    if (typeof OffscreenCanvas === 'function') {
      const canvas = new OffscreenCanvas(size.width, size.height);
      const ctx = canvas.getContext('2d');
      if (!ctx) throw new Error('no 2d canvas context');
      ctx.drawImage(bitmap, 0, 0, size.width, size.height);
      encoded = await canvas.convertToBlob({ type: 'image/jpeg', quality });
    } else {
      const canvas = document.createElement('canvas');
      canvas.width = size.width;
      canvas.height = size.height;
      const ctx = canvas.getContext('2d');
      if (!ctx) throw new Error('no 2d canvas context');
      ctx.drawImage(bitmap, 0, 0, size.width, size.height);
      encoded = await new Promise<Blob>((resolve, reject) =>
        canvas.toBlob(
          (b) => (b ? resolve(b) : reject(new Error('canvas encoding failed'))),
          'image/jpeg',
          quality,
        ),
      );
    }
    if (!options.keepLocation) return { blob: encoded, ...size, keptLocation: false };
    const exif = findExifSegment(new Uint8Array(await file.arrayBuffer()));
    if (exif === null || !exifHasGps(exif)) return { blob: encoded, ...size, keptLocation: false };
    const withExif = insertExif(
      new Uint8Array(await encoded.arrayBuffer()),
      withUprightOrientation(exif),
    );
    if (withExif === null) return { blob: encoded, ...size, keptLocation: false };
    return {
      blob: new Blob([withExif.buffer as ArrayBuffer], { type: 'image/jpeg' }),
      ...size,
      keptLocation: true,
    };
  } finally {
    bitmap.close();
  }
}

/** The row stored for a prepared photo. */
export function photoRowFor(id: string, surveyId: string, p: PreparedPhoto, now: Date): PhotoRow {
  return {
    id,
    surveyId,
    blob: p.blob,
    type: p.blob.type || 'image/jpeg',
    width: p.width,
    height: p.height,
    bytes: p.blob.size,
    storedAt: now.toISOString(),
  };
}

/** The record's metadata entry for a stored photo. */
export function photoMetaFor(
  id: string,
  p: Pick<PreparedPhoto, 'keptLocation'>,
  takenAt: Date | null,
  caption: string,
): PhotoMeta {
  return { id, takenAt: takenAt?.toISOString() ?? null, caption, keptLocation: p.keptLocation };
}

/**
 * Stores a prepared photo's Blob and returns the metadata to add to the record
 * (`saver.update((r) => ({ ...r, photos: [...r.photos, meta] }))`).
 */
export async function savePhoto(
  store: SurveyStore,
  surveyId: string,
  prepared: PreparedPhoto,
  info: { takenAt: Date | null; caption: string; now?: Date },
): Promise<PhotoMeta> {
  const id = crypto.randomUUID();
  await store.putPhoto(photoRowFor(id, surveyId, prepared, info.now ?? new Date()));
  return photoMetaFor(id, prepared, info.takenAt, info.caption);
}
