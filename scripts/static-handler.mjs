/**
 * The request handler that serves a production build: static files via sirv, every unknown
 * path answered with index.html (the app's router takes it from there), the same Content
 * Security Policy the page declares, and no long caching of the worker or the shell, so a
 * new deployment is seen at the next update check.
 */
import sirv from 'sirv';

export const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self'",
  "img-src 'self' data: blob: https:",
  "connect-src 'self' blob: https:",
  "worker-src 'self' blob:",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'none'",
].join('; ');

/**
 * @param {string} root directory of the build
 * @returns {(req: import('node:http').IncomingMessage, res: import('node:http').ServerResponse) => void}
 */
export function createStaticHandler(root) {
  const serve = sirv(root, {
    single: true,
    etag: true,
    dev: false,
    setHeaders(res, pathname) {
      res.setHeader('Content-Security-Policy', CONTENT_SECURITY_POLICY);
      res.setHeader('X-Content-Type-Options', 'nosniff');
      if (
        pathname === '/sw.js' ||
        pathname.endsWith('.html') ||
        pathname.endsWith('.webmanifest')
      ) {
        res.setHeader('Cache-Control', 'no-cache');
      } else if (pathname.startsWith('/assets/')) {
        // Hashed file names: safe to cache for a year.
        res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
      }
      if (pathname.endsWith('.webmanifest'))
        res.setHeader('Content-Type', 'application/manifest+json');
    },
  });
  return (req, res) =>
    serve(req, res, () => {
      res.statusCode = 404;
      res.end('Not found');
    });
}
