/** Helpers for browser tests: find and launch Chromium, serve the build, output paths. */
export * from './browser.js';
export * from './static-server.js';
export * from './paths.js';
export * from './service-worker.js';
