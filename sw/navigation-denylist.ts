/**
 * Navigations the app shell must not answer: files the user downloads or opens directly
 * (exports, tile archives, anything with a file extension) and reserved server paths.
 */
export const navigationDenylist: RegExp[] = [
  /^\/downloads\//,
  /^\/api\//,
  /\/[^/?]+\.[a-z0-9]{2,8}(\?.*)?$/i,
];
