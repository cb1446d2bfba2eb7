/**
 * Which basemap the map draws, and the online tile service it uses. Stored in the app's
 * settings (web/storage) under `map.tiles` and `map.basemap`.
 *
 * Default online service: OpenStreetMap's standard tiles, with its required attribution
 * ("© OpenStreetMap contributors", linking to its copyright page). Its tile usage policy
 * asks for that attribution, for caching of the tiles viewed, and forbids bulk downloads;
 * the service worker's tile cache keeps to that (sw/tile-cache-policy.ts). Heavy use needs
 * another service: the URL is a setting.
 */

export interface TileService {
  /** Template with {z}, {x}, {y} (and optionally {s} for subdomains a, b, c). https only. */
  url: string;
  /** Plain text shown on the map. */
  attribution: string;
  /** Link behind the attribution, or '' for none. */
  attributionUrl: string;
  maxZoom: number;
}

export const OSM_TILES: TileService = {
  url: 'https://tile.openstreetmap.org/{z}/{x}/{y}.png',
  attribution: '© OpenStreetMap contributors',
  attributionUrl: 'https://www.openstreetmap.org/copyright',
  // OpenStreetMap's standard layer serves zoom 0–19.
  maxZoom: 19,
};

/** 'none': plain background with grid; 'online': the tile service; or a stored archive id. */
export type BasemapChoice = { kind: 'none' } | { kind: 'online' } | { kind: 'archive'; id: string };

export const TILES_SETTING = 'map.tiles';
export const BASEMAP_SETTING = 'map.basemap';

export type TemplateProblem = 'not-https' | 'placeholders' | 'not-url';

/** Checks a tile URL template the user typed. The page's CSP only loads images over https. */
export function checkTileTemplate(url: string): TemplateProblem | null {
  const trimmed = url.trim();
  let parsed: URL;
  try {
    parsed = new URL(trimmed.replace(/\{[sxyz]\}/g, '0'));
  } catch {
    return 'not-url';
  }
  if (parsed.protocol !== 'https:') return 'not-https';
  if (!['{z}', '{x}', '{y}'].every((p) => trimmed.includes(p))) return 'placeholders';
  return null;
}

/** Reads the stored tile service; anything unusable falls back to the default. */
export function readTileService(value: unknown): TileService {
  if (typeof value !== 'object' || value === null) return OSM_TILES;
  const v = value as Record<string, unknown>;
  const url = typeof v['url'] === 'string' ? v['url'] : '';
  if (checkTileTemplate(url) !== null) return OSM_TILES;
  const attribution = typeof v['attribution'] === 'string' ? v['attribution'].slice(0, 300) : '';
  const attributionUrl =
    typeof v['attributionUrl'] === 'string' && /^https:\/\//.test(v['attributionUrl'])
      ? v['attributionUrl']
      : '';
  const maxZoom =
    typeof v['maxZoom'] === 'number' &&
    Number.isInteger(v['maxZoom']) &&
    v['maxZoom'] >= 1 &&
    v['maxZoom'] <= 22
      ? v['maxZoom']
      : 19;
  return { url: url.trim(), attribution, attributionUrl, maxZoom };
}

/** Reads the stored basemap choice; default 'online' (falls back to the grid offline). */
export function readBasemapChoice(value: unknown): BasemapChoice {
  if (typeof value !== 'object' || value === null) return { kind: 'online' };
  const v = value as Record<string, unknown>;
  if (v['kind'] === 'none') return { kind: 'none' };
  if (v['kind'] === 'archive' && typeof v['id'] === 'string')
    return { kind: 'archive', id: v['id'] };
  return { kind: 'online' };
}
