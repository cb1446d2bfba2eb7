/**
 * The service worker's map-tile cache as the page sees it: how much it holds, and emptying
 * it on request (the worker is told, so it recounts).
 */
import {
  TILE_CACHE_CLEARED,
  TILE_CACHE_MAX_BYTES,
  TILE_CACHE_NAME,
} from '../../sw/tile-cache-policy.js';

export interface TileCacheUsage {
  tiles: number;
  bytes: number;
  maxBytes: number;
}

export async function tileCacheUsage(): Promise<TileCacheUsage | null> {
  if (typeof caches === 'undefined') return null;
  try {
    if (!(await caches.has(TILE_CACHE_NAME)))
      return { tiles: 0, bytes: 0, maxBytes: TILE_CACHE_MAX_BYTES };
    const cache = await caches.open(TILE_CACHE_NAME);
    const keys = await cache.keys();
    let bytes = 0;
    for (const key of keys) {
      const r = await cache.match(key);
      bytes += Number(r?.headers.get('content-length') ?? 0) || 0;
    }
    return { tiles: keys.length, bytes, maxBytes: TILE_CACHE_MAX_BYTES };
  } catch {
    return null;
  }
}

export async function clearTileCache(): Promise<void> {
  if (typeof caches === 'undefined') return;
  await caches.delete(TILE_CACHE_NAME);
  navigator.serviceWorker?.controller?.postMessage({ type: TILE_CACHE_CLEARED });
}
