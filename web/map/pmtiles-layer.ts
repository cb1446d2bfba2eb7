/**
 * A Leaflet grid layer whose tiles come from an offline basemap archive on the device
 * (pmtiles-archive.ts). Each tile image is an object URL of the archive's bytes, revoked
 * when the tile leaves the map. Beyond the archive's deepest zoom, Leaflet scales its
 * deepest tiles up (maxNativeZoom), so the map can still zoom in on a street.
 */
import * as L from 'leaflet';
import type { ArchiveInfo, BasemapArchive } from './pmtiles-archive.js';

interface ArchiveTile extends HTMLImageElement {
  _abort?: AbortController;
}

export function archiveLayer(archive: BasemapArchive, info: ArchiveInfo): L.GridLayer {
  const [west, south, east, north] = info.bounds;
  const Layer = L.GridLayer.extend({
    createTile(coords: L.Coords, done: L.DoneCallback): HTMLElement {
      const img = document.createElement('img') as ArchiveTile;
      img.alt = '';
      img.setAttribute('role', 'presentation');
      const abort = new AbortController();
      img._abort = abort;
      archive
        .tile(coords.z, coords.x, coords.y, info.mediaType, abort.signal)
        .then((blob) => {
          if (!blob) {
            img.classList.add('gl-tile-missing');
            done(undefined, img);
            return;
          }
          img.onload = () => done(undefined, img);
          img.onerror = () => {
            img.classList.add('gl-tile-missing');
            done(new Error('tile image unreadable'), img);
          };
          img.src = URL.createObjectURL(blob);
        })
        .catch((err: unknown) => {
          if (err instanceof DOMException && err.name === 'AbortError') return;
          img.classList.add('gl-tile-missing');
          done(err instanceof Error ? err : new Error(String(err)), img);
        });
      return img;
    },
  });
  const layer = new (Layer as unknown as new (o: L.GridLayerOptions) => L.GridLayer)({
    minZoom: 0,
    maxZoom: 22,
    maxNativeZoom: info.maxZoom,
    minNativeZoom: info.minZoom,
    bounds: L.latLngBounds([south, west], [north, east]),
    keepBuffer: 1,
  });
  layer.on('tileunload', (e: L.TileEvent) => {
    const img = e.tile as ArchiveTile;
    img._abort?.abort();
    if (img.src.startsWith('blob:')) URL.revokeObjectURL(img.src);
  });
  return layer;
}
