/**
 * Which basemap layer to draw, from the team's settings: none, the online tile service, or
 * an archive stored on the device. Shared by the map screen and the location picker, so
 * both show the same background.
 */
import { deviceStore } from '../exchange/index.js';
import { listBasemaps, type StoredBasemap } from './basemap-store.js';
import type { BasemapLayer } from './leaflet-view.js';
import { BasemapArchive } from './pmtiles-archive.js';
import {
  BASEMAP_SETTING,
  TILES_SETTING,
  readBasemapChoice,
  readTileService,
  type BasemapChoice,
  type TileService,
} from './tile-settings.js';

/** The layer for a choice; an archive that is no longer stored falls back to none. */
export function basemapLayerFor(
  choice: BasemapChoice,
  service: TileService,
  archives: readonly StoredBasemap[],
): BasemapLayer {
  if (choice.kind === 'none') return { kind: 'none' };
  if (choice.kind === 'online') return { kind: 'online', service };
  const stored = archives.find((a) => a.id === choice.id);
  if (!stored) return { kind: 'none' };
  return {
    kind: 'archive',
    archive: new BasemapArchive(stored.blob, stored.id),
    info: stored.info,
  };
}

/** The team's basemap settings and the archives stored on the device. */
export interface BasemapSettings {
  choice: BasemapChoice;
  service: TileService;
  archives: StoredBasemap[];
}

/** Reads the settings; any read that fails counts as "not set". Never rejects. */
export async function loadBasemapSettings(): Promise<BasemapSettings> {
  const store = deviceStore();
  const [c, s, a] = await Promise.all([
    store.getSetting(BASEMAP_SETTING).catch(() => undefined),
    store.getSetting(TILES_SETTING).catch(() => undefined),
    listBasemaps().catch(() => [] as StoredBasemap[]),
  ]);
  return { choice: readBasemapChoice(c), service: readTileService(s), archives: a };
}

/** Reads the settings and returns the layer to draw. */
export async function loadBasemapLayer(): Promise<BasemapLayer> {
  const { choice, service, archives } = await loadBasemapSettings();
  return basemapLayerFor(choice, service, archives);
}
