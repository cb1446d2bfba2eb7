/**
 * Offline basemaps: a tiny PMTiles v3 archive written in the test (test/e2e/support's
 * writer, from the specification) and read back through the app's reader, which uses the
 * `pmtiles` package from the registry.
 */
import fc from 'fast-check';
import { zxyToTileId } from 'pmtiles';
import { describe, expect, it } from 'vitest';
import { BasemapArchive } from '../../web/map/pmtiles-archive.js';
import { basemapArchive } from '../e2e/support/basemap-archive.js';
import { encodePng } from '../e2e/support/png.js';
import {
  Compression,
  TileType,
  tileId,
  tileOf,
  writePmtiles,
} from '../e2e/support/pmtiles-writer.js';
import { TOWN_CENTRE } from '../fixtures/exchange/town.js';

const TOWN_BOX: [number, number, number, number] = [
  TOWN_CENTRE.lon - 0.02,
  TOWN_CENTRE.lat - 0.012,
  TOWN_CENTRE.lon + 0.02,
  TOWN_CENTRE.lat + 0.012,
];

const blobOf = (bytes: Uint8Array) => new Blob([bytes as BlobPart]);

describe('PMTiles tile ids', () => {
  it('numbers the first levels as the PMTiles v3 specification lists them', () => {
    expect(tileId(0, 0, 0)).toBe(0);
    expect(tileId(1, 0, 0)).toBe(1);
    expect(tileId(1, 0, 1)).toBe(2);
    expect(tileId(1, 1, 1)).toBe(3);
    expect(tileId(1, 1, 0)).toBe(4);
    expect(tileId(2, 0, 0)).toBe(5);
  });

  it('agrees with the pmtiles package on any tile (fast-check)', () => {
    fc.assert(
      fc.property(
        fc
          .integer({ min: 0, max: 20 })
          .chain((z) =>
            fc.tuple(
              fc.constant(z),
              fc.integer({ min: 0, max: 2 ** z - 1 }),
              fc.integer({ min: 0, max: 2 ** z - 1 }),
            ),
          ),
        ([z, x, y]) => {
          expect(tileId(z, x, y)).toBe(zxyToTileId(z, x, y));
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe('offline basemap archive', () => {
  it('reads the header, the metadata and every tile of an archive written in the test', async () => {
    const { bytes, tiles } = basemapArchive(TOWN_BOX, 12, 15, 64);
    const archive = new BasemapArchive(blobOf(bytes), 'town');
    const check = await archive.check();
    if (!check.ok) throw new Error(check.reason);
    expect(check.info).toMatchObject({
      minZoom: 12,
      maxZoom: 15,
      mediaType: 'image/png',
      name: 'Test basemap',
      attribution: 'Test tiles, generated in the test',
      tiles: tiles.length,
    });
    check.info.bounds.forEach((v, i) => expect(v).toBeCloseTo(TOWN_BOX[i]!, 6));
    for (const tile of tiles) {
      const blob = await archive.tile(tile.z, tile.x, tile.y, 'image/png');
      expect(blob?.type).toBe('image/png');
      expect(new Uint8Array(await blob!.arrayBuffer())).toEqual(tile.data);
    }
  });

  it('answers null for a tile the archive does not hold, inside and outside its zooms', async () => {
    const { bytes } = basemapArchive(TOWN_BOX, 13, 14, 32);
    const archive = new BasemapArchive(blobOf(bytes), 'town');
    const far = tileOf(-33.9, 151.2, 13);
    expect(await archive.tile(13, far.x, far.y, 'image/png')).toBeNull();
    const inside = tileOf(TOWN_CENTRE.lat, TOWN_CENTRE.lon, 16);
    expect(await archive.tile(16, inside.x, inside.y, 'image/png')).toBeNull();
  });

  it('reads an archive whose directory is not compressed', async () => {
    const data = encodePng(8, 8, () => [10, 20, 30]);
    const t = tileOf(TOWN_CENTRE.lat, TOWN_CENTRE.lon, 10);
    const bytes = writePmtiles([{ z: 10, ...t, data }], {
      bounds: TOWN_BOX,
      internalCompression: Compression.none,
    });
    const archive = new BasemapArchive(blobOf(bytes), 'plain');
    expect((await archive.check()).ok).toBe(true);
    expect(
      new Uint8Array(await (await archive.tile(10, t.x, t.y, 'image/png'))!.arrayBuffer()),
    ).toEqual(data);
  });

  it('refuses a file that is not PMTiles, a vector archive and another spec version', async () => {
    const notArchive = await new BasemapArchive(
      new Blob(['{"type":"FeatureCollection"}']),
      'a',
    ).check();
    expect(notArchive).toEqual({
      ok: false,
      reason: expect.stringMatching(/not a PMTiles archive/) as string,
    });
    const t = tileOf(TOWN_CENTRE.lat, TOWN_CENTRE.lon, 10);
    const vector = writePmtiles([{ z: 10, ...t, data: new Uint8Array([1, 2, 3]) }], {
      bounds: TOWN_BOX,
      tileType: 1, // MVT in the specification
    });
    const v = await new BasemapArchive(blobOf(vector), 'v').check();
    expect(v.ok === false && v.reason).toMatch(/vector tiles/);
    const v2 = writePmtiles([{ z: 10, ...t, data: new Uint8Array([1]) }], {
      bounds: TOWN_BOX,
      tileType: TileType.png,
    });
    v2[7] = 2;
    const old = await new BasemapArchive(blobOf(v2), 'o').check();
    expect(old.ok).toBe(false);
  });

  it('does not crash on truncated or random bytes (fast-check)', async () => {
    const { bytes } = basemapArchive(TOWN_BOX, 12, 12, 16);
    await fc.assert(
      fc.asyncProperty(
        fc.integer({ min: 0, max: bytes.length - 1 }),
        fc.uint8Array({ maxLength: 300 }),
        async (cut, junk) => {
          const r1 = await new BasemapArchive(blobOf(bytes.slice(0, cut)), 'cut').check();
          const r2 = await new BasemapArchive(blobOf(junk), 'junk').check();
          expect(typeof r1.ok).toBe('boolean');
          expect(r2.ok).toBe(false);
        },
      ),
      { numRuns: 60 },
    );
  });
});
