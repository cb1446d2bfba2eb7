/**
 * Grainline service worker.
 *
 * - Precaches the whole app shell (the list is injected at build time), so the app opens
 *   with no network after one visit, even after the browser was restarted.
 * - Answers every app navigation with the cached index.html, so a cold start offline works
 *   on deep links too. Downloads and files are excluded (denylist).
 * - Removes caches left by older Workbox versions.
 * - Caches the map tiles people view, within a size cap (tile-cache.ts).
 * - Never takes over by itself once a version is running: a new worker waits until the page
 *   asks it to (after the page has flushed its drafts), so a half-filled form is never lost
 *   to a reload nobody asked for.
 */
import {
  cleanupOutdatedCaches,
  createHandlerBoundToURL,
  precacheAndRoute,
} from 'workbox-precaching';
import { NavigationRoute, registerRoute } from 'workbox-routing';
import { clientsClaim } from 'workbox-core';
import type { PrecacheEntry } from 'workbox-precaching';
import { isSkipWaitingMessage } from './messages.js';
import { navigationDenylist } from './navigation-denylist.js';
import { registerTileCache } from './tile-cache.js';

declare const self: ServiceWorkerGlobalScope & {
  __WB_MANIFEST: Array<PrecacheEntry | string>;
};

cleanupOutdatedCaches();
// Before Workbox's routes: tiles are cross-origin and never in the precache.
registerTileCache();
precacheAndRoute(self.__WB_MANIFEST);
registerRoute(
  new NavigationRoute(createHandlerBoundToURL('/index.html'), { denylist: navigationDenylist }),
);

self.addEventListener('message', (event) => {
  if (isSkipWaitingMessage(event.data)) void self.skipWaiting();
});

// First install: control the page that registered us at once, so it works offline from its
// first visit. On later updates this only runs after the page asked for skipWaiting.
clientsClaim();
