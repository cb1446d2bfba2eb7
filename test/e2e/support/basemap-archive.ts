/**
 * A tiny raster basemap archive for map tests: PNG tiles (pale, with a darker edge and a
 * diagonal, so a screenshot shows where tiles are) covering a box on a few zoom levels.
 */
import { encodePng } from './png.js';
import { tileOf, writePmtiles, type ArchiveTile } from './pmtiles-writer.js';

/** Builds tiles for every zoom in [minZoom, maxZoom] over [west, south, east, north]. */
export function basemapArchive(
  bounds: [number, number, number, number],
  minZoom: number,
  maxZoom: number,
  tileSize = 256,
): { bytes: Uint8Array; tiles: ArchiveTile[] } {
  const [w, s, e, n] = bounds;
  const tiles: ArchiveTile[] = [];
  for (let z = minZoom; z <= maxZoom; z++) {
    const a = tileOf(n, w, z);
    const b = tileOf(s, e, z);
    for (let x = a.x; x <= b.x; x++) {
      for (let y = a.y; y <= b.y; y++) {
        const shade = 200 + ((x + y + z) % 3) * 15;
        const data = encodePng(tileSize, tileSize, (px, py) => {
          const edge = px < 2 || py < 2;
          const diagonal = Math.abs(px - py) < 2;
          if (edge) return [120, 140, 120];
          if (diagonal) return [170, 190, 170];
          return [shade, Math.min(255, shade + 20), shade];
        });
        tiles.push({ z, x, y, data });
      }
    }
  }
  const bytes = writePmtiles(tiles, {
    bounds,
    metadata: { name: 'Test basemap', attribution: 'Test tiles, generated in the test' },
  });
  return { bytes, tiles };
}
