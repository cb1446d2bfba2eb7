/**
 * Map tiles in the service worker: caches the tiles the map shows, within the rules of
 * tile-cache-policy.ts (viewed tiles only, caching headers honoured, a byte cap with least
 * recently used tiles dropped first, nothing fetched ahead). A cached tile answers when the
 * network is down, so streets seen once stay visible offline.
 *
 * Tiles are requested in CORS mode (the map sets crossOrigin), so the worker can read their
 * size; opaque responses, whose size is hidden, are passed through and not stored.
 */
import {
  MAX_AGE_HEADER,
  STORED_AT_HEADER,
  TILE_CACHE_CLEARED,
  TILE_CACHE_NAME,
  TileBudget,
  isFresh,
  isTileRequest,
  maxAgeFrom,
} from './tile-cache-policy.js';

declare const self: ServiceWorkerGlobalScope;

let budget: TileBudget | null = null;
let loading: Promise<TileBudget> | null = null;

/** Rebuilds the bookkeeping from the cache once per worker start. */
function loadBudget(cache: Cache): Promise<TileBudget> {
  if (budget) return Promise.resolve(budget);
  loading ??= (async () => {
    const b = new TileBudget();
    for (const request of await cache.keys()) {
      const response = await cache.match(request);
      if (!response) continue;
      const bytes = Number(response.headers.get('content-length') ?? '0');
      const storedAt = Number(response.headers.get(STORED_AT_HEADER) ?? '0');
      b.add(request.url, Number.isFinite(bytes) ? bytes : 0, storedAt);
    }
    budget = b;
    return b;
  })();
  return loading;
}

async function store(cache: Cache, request: Request, response: Response): Promise<void> {
  const body = await response.blob();
  const now = Date.now();
  const headers = new Headers(response.headers);
  headers.set('content-length', String(body.size));
  headers.set(STORED_AT_HEADER, String(now));
  headers.set(
    MAX_AGE_HEADER,
    String(
      maxAgeFrom(
        response.headers.get('cache-control'),
        response.headers.get('expires'),
        response.headers.get('date'),
        now,
      ),
    ),
  );
  const b = await loadBudget(cache);
  await cache.put(request.url, new Response(body, { status: 200, headers }));
  for (const url of b.add(request.url, body.size, now)) await cache.delete(url);
}

async function answer(event: FetchEvent): Promise<Response> {
  const cache = await caches.open(TILE_CACHE_NAME);
  const cached = await cache.match(event.request.url);
  const now = Date.now();
  if (cached) {
    const storedAt = Number(cached.headers.get(STORED_AT_HEADER) ?? '0');
    const maxAge = Number(cached.headers.get(MAX_AGE_HEADER) ?? '0');
    if (isFresh(storedAt, maxAge, now)) {
      void loadBudget(cache).then((b) => b.touch(event.request.url, now));
      return cached;
    }
  }
  try {
    const response = await fetch(event.request);
    if (response.ok && (response.type === 'cors' || response.type === 'basic')) {
      event.waitUntil(store(cache, event.request, response.clone()).catch(() => undefined));
    }
    return response;
  } catch (err) {
    // Offline (or the server is unreachable): a stale tile beats no tile.
    if (cached) return cached;
    throw err;
  }
}

/** Installs the tile route. Call once from the worker's top level. */
export function registerTileCache(): void {
  self.addEventListener('fetch', (event) => {
    const { request } = event;
    const url = new URL(request.url);
    if (!isTileRequest(url, request.method, request.destination, self.location.origin)) return;
    event.respondWith(answer(event));
  });
  self.addEventListener('message', (event) => {
    const data: unknown = event.data;
    if (
      typeof data === 'object' &&
      data !== null &&
      (data as { type?: unknown }).type === TILE_CACHE_CLEARED
    ) {
      budget = null;
      loading = null;
    }
  });
}
