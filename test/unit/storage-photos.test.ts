import 'fake-indexeddb/auto';
import fc from 'fast-check';
import { IDBFactory } from 'fake-indexeddb';
import { describe, expect, it } from 'vitest';
import { photoMetaSchema } from '../../forms/schema/index.js';
import {
  PHOTO_MAX_EDGE_PX,
  SurveyStore,
  exifHasGps,
  exifOrientation,
  findExifSegment,
  fitWithin,
  insertExif,
  photoMetaFor,
  savePhoto,
  stripExif,
  withUprightOrientation,
} from '../../web/storage/index.js';

/**
 * Builds a small JPEG byte stream by the marker layout of ITU-T T.81 Annex B, with an EXIF
 * APP1 laid out per EXIF 2.32 / TIFF 6.0: IFD0 with Orientation (0x0112) and, optionally,
 * a GPS IFD pointer (0x8825).
 */
function jpeg(options: {
  exif?: { little: boolean; orientation: number; gps: boolean } | null;
  jfif?: boolean;
}) {
  const bytes: number[] = [0xff, 0xd8];
  if (options.jfif !== false) {
    bytes.push(0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00, 1, 1, 0, 0, 1, 0, 1, 0, 0);
  }
  if (options.exif) bytes.push(...exifSegment(options.exif));
  bytes.push(0xff, 0xdb, 0x00, 0x04, 0x00, 0x00); // a (dummy) quantisation table segment
  bytes.push(0xff, 0xda, 0x00, 0x08, 0x01, 0x01, 0x00, 0x00, 0x3f, 0x00); // start of scan
  bytes.push(0x12, 0x34, 0x56, 0xff, 0x00, 0x78); // entropy-coded data (with a stuffed 0xFF)
  bytes.push(0xff, 0xd9);
  return new Uint8Array(bytes);
}

function exifSegment(o: { little: boolean; orientation: number; gps: boolean }): number[] {
  const u16 = (v: number) => (o.little ? [v & 0xff, v >> 8] : [v >> 8, v & 0xff]);
  const u32 = (v: number) =>
    o.little
      ? [v & 0xff, (v >> 8) & 0xff, (v >> 16) & 0xff, v >>> 24]
      : [v >>> 24, (v >> 16) & 0xff, (v >> 8) & 0xff, v & 0xff];
  const entries: number[][] = [[...u16(0x0112), ...u16(3), ...u32(1), ...u16(o.orientation), 0, 0]];
  if (o.gps) entries.push([...u16(0x8825), ...u16(4), ...u32(1), ...u32(8 + 2 + 12 * 2 + 4)]);
  const ifd = [...u16(entries.length), ...entries.flat(), ...u32(0)];
  const gpsIfd = o.gps ? [...u16(0), ...u32(0)] : [];
  const tiff = [
    ...(o.little ? [0x49, 0x49] : [0x4d, 0x4d]),
    ...u16(42),
    ...u32(8),
    ...ifd,
    ...gpsIfd,
  ];
  const body = [0x45, 0x78, 0x69, 0x66, 0x00, 0x00, ...tiff];
  const length = body.length + 2;
  return [0xff, 0xe1, length >> 8, length & 0xff, ...body];
}

describe('photo size', () => {
  it('fits the longest edge within the limit, keeps the aspect, never enlarges', () => {
    expect(fitWithin(4000, 3000)).toEqual({ width: PHOTO_MAX_EDGE_PX, height: 1200 });
    expect(fitWithin(3000, 4000, 1000)).toEqual({ width: 750, height: 1000 });
    expect(fitWithin(800, 600)).toEqual({ width: 800, height: 600 });
    expect(fitWithin(10_000, 1, 100)).toEqual({ width: 100, height: 1 });
  });

  it('throws with the bad value for sizes that are not positive numbers', () => {
    expect(() => fitWithin(0, 10)).toThrow('width must be a finite number > 0, got 0');
    expect(() => fitWithin(10, NaN)).toThrow('height must be a finite number > 0, got NaN');
  });
});

describe('EXIF in JPEG bytes', () => {
  for (const little of [true, false]) {
    const order = little ? 'little-endian (II)' : 'big-endian (MM)';
    it(`finds the EXIF block, its GPS pointer and orientation (${order})`, () => {
      const withGps = jpeg({ exif: { little, orientation: 6, gps: true } });
      const exif = findExifSegment(withGps);
      expect(exif).not.toBeNull();
      expect(exifHasGps(exif as Uint8Array)).toBe(true);
      expect(exifOrientation(exif as Uint8Array)).toBe(6);
      const noGps = findExifSegment(jpeg({ exif: { little, orientation: 1, gps: false } }));
      expect(exifHasGps(noGps as Uint8Array)).toBe(false);
    });

    it(`resets the orientation to upright without touching anything else (${order})`, () => {
      const exif = findExifSegment(
        jpeg({ exif: { little, orientation: 8, gps: true } }),
      ) as Uint8Array;
      const upright = withUprightOrientation(exif);
      expect(exifOrientation(upright)).toBe(1);
      expect(exifOrientation(exif)).toBe(8); // the argument is not changed
      const differing = [...upright].flatMap((b, i) => (b === exif[i] ? [] : [i]));
      expect(differing).toHaveLength(1);
    });
  }

  it('strips EXIF and leaves every other byte in order', () => {
    const plain = jpeg({ exif: null });
    const withExif = jpeg({ exif: { little: true, orientation: 1, gps: true } });
    expect(stripExif(withExif)).toEqual(plain);
    expect(findExifSegment(stripExif(withExif))).toBeNull();
    expect(stripExif(plain)).toBe(plain);
  });

  it('puts a kept EXIF block after the JFIF header of a re-encoded JPEG', () => {
    const original = jpeg({ exif: { little: false, orientation: 3, gps: true } });
    const reencoded = jpeg({ exif: null });
    const kept = insertExif(
      reencoded,
      withUprightOrientation(findExifSegment(original) as Uint8Array),
    );
    expect(kept).not.toBeNull();
    const exif = findExifSegment(kept as Uint8Array) as Uint8Array;
    expect(exifHasGps(exif)).toBe(true);
    expect(exifOrientation(exif)).toBe(1);
    expect(stripExif(kept as Uint8Array)).toEqual(reencoded);
    // JFIF APP0 stays first (bytes 2–3 are its marker).
    expect([kept?.[2], kept?.[3]]).toEqual([0xff, 0xe0]);
    expect(insertExif(reencoded, new Uint8Array([1, 2, 3]))).toBeNull();
  });

  it('does not crash on bytes that are not a JPEG, or a JPEG cut short', () => {
    const good = jpeg({ exif: { little: true, orientation: 6, gps: true } });
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 200 }), fc.nat({ max: good.length }), (junk, cut) => {
        for (const bytes of [
          junk,
          good.slice(0, cut),
          new Uint8Array([...good.slice(0, cut), ...junk]),
        ]) {
          const exif = findExifSegment(bytes);
          if (exif !== null) {
            exifHasGps(exif);
            exifOrientation(exif);
            withUprightOrientation(exif);
          }
          stripExif(bytes);
          insertExif(bytes, findExifSegment(good) as Uint8Array);
        }
      }),
    );
  });
});

describe('photo metadata and storage', () => {
  it('makes a metadata entry the record schema accepts', () => {
    const meta = photoMetaFor(
      crypto.randomUUID(),
      { keptLocation: true },
      new Date('2025-03-01T10:00:00Z'),
      'Hold-down, north-east',
    );
    expect(photoMetaSchema.safeParse(meta).success).toBe(true);
    expect(meta).toMatchObject({ takenAt: '2025-03-01T10:00:00.000Z', keptLocation: true });
  });

  it('stores the Blob first and returns the metadata for the record', async () => {
    const store = new SurveyStore({
      indexedDB: new IDBFactory(),
      storage: null,
      broadcast: false,
      isInstalled: () => false,
    });
    try {
      const blob = new Blob([jpeg({ exif: null })], { type: 'image/jpeg' });
      const meta = await savePhoto(
        store,
        'survey-1',
        { blob, width: 1, height: 1, keptLocation: false },
        { takenAt: null, caption: '' },
      );
      const row = await store.getPhoto(meta.id);
      expect(row).toMatchObject({ surveyId: 'survey-1', bytes: blob.size, type: 'image/jpeg' });
      expect(findExifSegment(new Uint8Array(await (row?.blob as Blob).arrayBuffer()))).toBeNull();
    } finally {
      store.close();
    }
  });
});
