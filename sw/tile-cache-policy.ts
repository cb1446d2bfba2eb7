/**
 * The rules of the map-tile cache, kept apart from the worker so they can be tested in Node:
 * which requests are map tiles, how long a cached tile stays fresh, and which tiles to drop
 * when the cache is over its size cap.
 *
 * Why these rules: public tile services (OpenStreetMap's among them) ask apps to cache the
 * tiles people view, to honour the caching headers, and never to download areas in bulk.
 * So only tiles the map actually requested are stored; nothing is fetched ahead; a cached
 * tile is used while its headers say it is fresh, and after that only when the network
 * fails; and the cache has a byte cap, dropping the least recently used tiles first.
 */

/** Cache Storage name of the tile cache. */
export const TILE_CACHE_NAME = 'grainline-map-tiles-v1';

/**
 * Size cap of the tile cache: 60 MB, or 5000 tiles, whichever comes first (a town at street
 * zoom levels is a few thousand 10–30 kB tiles). Common practice, no source.
 */
export const TILE_CACHE_MAX_BYTES = 60 * 1024 * 1024;
export const TILE_CACHE_MAX_ENTRIES = 5000;

/**
 * Freshness when a tile response carries no usable caching header: 7 days, the least time
 * OpenStreetMap's tile usage policy asks clients to keep tiles. From memory, verify against
 * https://operations.osmfoundation.org/policies/tiles/.
 */
export const DEFAULT_TILE_MAX_AGE_MS = 7 * 24 * 3600 * 1000;

/** Message the page sends after it emptied the tile cache, so the worker recounts. */
export const TILE_CACHE_CLEARED = 'GRAINLINE_TILE_CACHE_CLEARED';

/** Headers added to a stored tile, so the cache's index can be rebuilt after a restart. */
export const STORED_AT_HEADER = 'x-grainline-stored-at';
export const MAX_AGE_HEADER = 'x-grainline-max-age';

/** Path of a slippy-map tile: …/{z}/{x}/{y}.{png|jpg|jpeg|webp|avif}, optional @2x. */
const TILE_PATH = /\/\d{1,2}\/\d{1,8}\/\d{1,8}(@2x)?\.(png|jpe?g|webp|avif)$/i;

/**
 * True for a cross-origin GET of an image whose path looks like a tile. Same-origin requests
 * are the app itself (precached elsewhere); the offline basemap never goes through fetch.
 */
export function isTileRequest(
  url: URL,
  method: string,
  destination: string,
  selfOrigin: string,
): boolean {
  if (method !== 'GET') return false;
  if (url.protocol !== 'https:' && url.protocol !== 'http:') return false;
  if (url.origin === selfOrigin) return false;
  if (destination !== '' && destination !== 'image') return false;
  return TILE_PATH.test(url.pathname);
}

/** Freshness lifetime from Cache-Control (max-age, no-store/no-cache) and Expires. */
export function maxAgeFrom(
  cacheControl: string | null,
  expires: string | null,
  date: string | null,
  now: number,
): number {
  if (cacheControl) {
    const cc = cacheControl.toLowerCase();
    // Asked not to reuse without checking: still keep it for offline use, but never fresh.
    if (/\bno-store\b|\bno-cache\b/.test(cc)) return 0;
    const m = /\bmax-age\s*=\s*"?(\d+)"?/.exec(cc);
    if (m) return Number(m[1]) * 1000;
  }
  if (expires) {
    const at = Date.parse(expires);
    const base = date ? Date.parse(date) : now;
    if (Number.isFinite(at)) return Math.max(0, at - (Number.isFinite(base) ? base : now));
  }
  return DEFAULT_TILE_MAX_AGE_MS;
}

/** True while a tile stored at `storedAt` with lifetime `maxAgeMs` may be used without asking. */
export function isFresh(storedAt: number, maxAgeMs: number, now: number): boolean {
  return now - storedAt < maxAgeMs;
}

interface Entry {
  bytes: number;
  usedAt: number;
}

/**
 * The cache's bookkeeping: bytes per tile and when each was last used. Adding a tile returns
 * the tiles to delete to get back under the caps, least recently used first (never the one
 * just added, unless it alone is over the cap).
 */
export class TileBudget {
  private readonly entries = new Map<string, Entry>();
  private bytes = 0;

  constructor(
    readonly maxBytes = TILE_CACHE_MAX_BYTES,
    readonly maxEntries = TILE_CACHE_MAX_ENTRIES,
  ) {
    if (!(maxBytes > 0) || !(maxEntries > 0)) {
      throw new RangeError(`caps must be > 0, got ${maxBytes} bytes, ${maxEntries} entries`);
    }
  }

  get totalBytes(): number {
    return this.bytes;
  }

  get size(): number {
    return this.entries.size;
  }

  has(url: string): boolean {
    return this.entries.has(url);
  }

  /** Records a use (a cache hit). */
  touch(url: string, now: number): void {
    const e = this.entries.get(url);
    if (e) e.usedAt = now;
  }

  /** Forgets a tile (deleted from the cache). */
  remove(url: string): void {
    const e = this.entries.get(url);
    if (!e) return;
    this.bytes -= e.bytes;
    this.entries.delete(url);
  }

  /** Records a stored tile; returns the urls to delete, oldest use first. */
  add(url: string, bytes: number, now: number): string[] {
    if (!(bytes >= 0) || !Number.isFinite(bytes)) {
      throw new RangeError(`bytes must be a finite number >= 0, got ${bytes}`);
    }
    this.remove(url);
    this.entries.set(url, { bytes, usedAt: now });
    this.bytes += bytes;
    if (this.bytes <= this.maxBytes && this.entries.size <= this.maxEntries) return [];
    const byAge = [...this.entries.entries()].sort((a, b) => a[1].usedAt - b[1].usedAt);
    const evict: string[] = [];
    for (const [key] of byAge) {
      if (this.bytes <= this.maxBytes && this.entries.size <= this.maxEntries) break;
      if (key === url && this.entries.size > 1) continue;
      evict.push(key);
      this.remove(key);
    }
    return evict;
  }
}
