/**
 * Byte-level JPEG work for photos: find the EXIF block (APP1 "Exif"), tell whether it has a
 * GPS position, reset its orientation, and put it into (or take it out of) a JPEG. Pure,
 * no DOM; every function is safe on any bytes (bad input gives null or the input back).
 *
 * Why this exists: photos are downscaled by drawing them on a canvas and encoding a new
 * JPEG, and a canvas never writes EXIF, so the new image has no location. That is the
 * default. When the inspector chooses to keep the location, the original EXIF block is
 * copied into the new JPEG, with its orientation set to 1 (the pixels were already turned
 * upright when decoded, so the old orientation would turn them again).
 *
 * Formats: JPEG markers per ITU-T T.81 (ISO/IEC 10918-1) Annex B; EXIF 2.32 (CIPA DC-008)
 * APP1 with a TIFF 6.0 header; tags 0x0112 Orientation and 0x8825 GPS IFD pointer.
 */

const SOI = 0xd8;
const SOS = 0xda;
const EOI = 0xd9;
const APP0 = 0xe0;
const APP1 = 0xe1;
const TAG_ORIENTATION = 0x0112;
const TAG_GPS_IFD = 0x8825;
const EXIF_HEADER = [0x45, 0x78, 0x69, 0x66, 0x00, 0x00]; // "Exif\0\0"

/** A marker segment before the image data: marker byte and the whole segment's byte range. */
export interface JpegSegment {
  marker: number;
  start: number;
  end: number;
}

/** The header segments of a JPEG (up to the start of scan), or null if it is not a JPEG. */
export function jpegSegments(bytes: Uint8Array): JpegSegment[] | null {
  if (bytes.length < 4 || bytes[0] !== 0xff || bytes[1] !== SOI) return null;
  const out: JpegSegment[] = [];
  let i = 2;
  while (i + 4 <= bytes.length) {
    if (bytes[i] !== 0xff) return null;
    const marker = bytes[i + 1] as number;
    if (marker === 0xff) {
      i++; // fill byte
      continue;
    }
    if (marker === EOI) return out;
    const length = ((bytes[i + 2] as number) << 8) | (bytes[i + 3] as number);
    if (length < 2 || i + 2 + length > bytes.length) return null;
    out.push({ marker, start: i, end: i + 2 + length });
    if (marker === SOS) return out; // entropy-coded data follows; no more headers
    i += 2 + length;
  }
  return null;
}

function isExif(bytes: Uint8Array, seg: JpegSegment): boolean {
  if (seg.marker !== APP1 || seg.end - seg.start < 4 + EXIF_HEADER.length) return false;
  return EXIF_HEADER.every((b, k) => bytes[seg.start + 4 + k] === b);
}

/** The whole EXIF APP1 segment (marker included), or null when there is none. */
export function findExifSegment(jpeg: Uint8Array): Uint8Array | null {
  const segs = jpegSegments(jpeg);
  const seg = segs?.find((s) => isExif(jpeg, s));
  return seg ? jpeg.slice(seg.start, seg.end) : null;
}

/** The JPEG without any EXIF segment (the input itself when it has none or is not a JPEG). */
export function stripExif(jpeg: Uint8Array): Uint8Array {
  const segs = jpegSegments(jpeg);
  if (segs === null) return jpeg;
  const drop = segs.filter((s) => isExif(jpeg, s));
  if (drop.length === 0) return jpeg;
  const parts: Uint8Array[] = [];
  let at = 0;
  for (const s of drop) {
    parts.push(jpeg.subarray(at, s.start));
    at = s.end;
  }
  parts.push(jpeg.subarray(at));
  return concat(parts);
}

/**
 * The JPEG with `exif` (a whole APP1 segment) as its EXIF: any existing EXIF is removed and
 * the new one goes after SOI and a JFIF APP0, where readers look for it. Returns null when
 * `jpeg` is not a JPEG or `exif` is not an EXIF segment.
 */
export function insertExif(jpeg: Uint8Array, exif: Uint8Array): Uint8Array | null {
  if (!isExifSegment(exif)) return null;
  const clean = stripExif(jpeg);
  const segs = jpegSegments(clean);
  if (segs === null) return null;
  const first = segs[0];
  const at = first !== undefined && first.marker === APP0 ? first.end : 2;
  return concat([clean.subarray(0, at), exif, clean.subarray(at)]);
}

/** True when `bytes` is exactly one well-formed EXIF APP1 segment. */
export function isExifSegment(bytes: Uint8Array): boolean {
  if (bytes.length < 4 || bytes[0] !== 0xff || bytes[1] !== APP1) return false;
  const length = ((bytes[2] as number) << 8) | (bytes[3] as number);
  return (
    length + 2 === bytes.length && isExif(bytes, { marker: APP1, start: 0, end: bytes.length })
  );
}

/** Reads the TIFF structure inside an EXIF segment; null when it is malformed. */
function tiff(
  exif: Uint8Array,
): { view: DataView; base: number; little: boolean; ifd0: number } | null {
  const base = 4 + EXIF_HEADER.length; // marker (2) + length (2) + "Exif\0\0"
  if (exif.length < base + 8) return null;
  const view = new DataView(exif.buffer, exif.byteOffset, exif.byteLength);
  const order = view.getUint16(base);
  const little = order === 0x4949; // "II"
  if (!little && order !== 0x4d4d) return null; // "MM"
  if (view.getUint16(base + 2, little) !== 42) return null;
  const ifd0 = view.getUint32(base + 4, little);
  if (base + ifd0 + 2 > exif.length) return null;
  return { view, base, little, ifd0 };
}

/** Byte offset (in the segment) of IFD0's entry with `tag`, or -1. */
function findEntry(exif: Uint8Array, tag: number): number {
  const t = tiff(exif);
  if (t === null) return -1;
  const start = t.base + t.ifd0;
  const count = t.view.getUint16(start, t.little);
  for (let k = 0; k < count; k++) {
    const entry = start + 2 + k * 12;
    if (entry + 12 > exif.length) return -1;
    if (t.view.getUint16(entry, t.little) === tag) return entry;
  }
  return -1;
}

/** True when the EXIF segment points to a GPS block (the photo carries a position). */
export function exifHasGps(exif: Uint8Array): boolean {
  return findEntry(exif, TAG_GPS_IFD) >= 0;
}

/** The EXIF orientation (1–8), or null when absent. */
export function exifOrientation(exif: Uint8Array): number | null {
  const entry = findEntry(exif, TAG_ORIENTATION);
  const t = tiff(exif);
  if (entry < 0 || t === null) return null;
  return t.view.getUint16(entry + 8, t.little);
}

/** A copy of the EXIF segment with orientation 1 (upright); unchanged copy without one. */
export function withUprightOrientation(exif: Uint8Array): Uint8Array {
  const copy = exif.slice();
  const entry = findEntry(copy, TAG_ORIENTATION);
  const t = tiff(copy);
  if (entry >= 0 && t !== null) t.view.setUint16(entry + 8, 1, t.little);
  return copy;
}

function concat(parts: Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}
