// Build of the page (web/) and the service worker (sw/). The manifest lives at the top of the
// repository and is emitted as-is; vite-plugin-pwa only compiles the worker and injects the
// precache list (injectManifest), so the app shell is cached whole on first visit.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { defineConfig, type Plugin } from 'vite';
import preact from '@preact/preset-vite';
import { VitePWA } from 'vite-plugin-pwa';

const here = (p: string): string => fileURLToPath(new URL(p, import.meta.url));

/** Emits ./manifest.webmanifest into the build and serves it in dev. */
function webManifest(): Plugin {
  const file = here('./manifest.webmanifest');
  return {
    name: 'grainline-web-manifest',
    configureServer(server) {
      server.middlewares.use('/manifest.webmanifest', (_req, res) => {
        res.setHeader('Content-Type', 'application/manifest+json');
        res.end(readFileSync(file));
      });
    },
    generateBundle() {
      this.emitFile({
        type: 'asset',
        fileName: 'manifest.webmanifest',
        source: readFileSync(file),
      });
    },
  };
}

export default defineConfig({
  root: here('./web'),
  publicDir: here('./web/public'),
  envDir: here('.'),
  define: {
    // A build id lets the update notice and the exports say which build produced them.
    __BUILD_ID__: JSON.stringify(process.env.GRAINLINE_BUILD_ID ?? new Date().toISOString()),
  },
  build: {
    outDir: here('./dist'),
    emptyOutDir: true,
    target: 'es2022',
    sourcemap: false,
  },
  server: { fs: { allow: [here('.')] } },
  plugins: [
    preact(),
    webManifest(),
    VitePWA({
      strategies: 'injectManifest',
      srcDir: here('./sw'),
      filename: 'sw.ts',
      injectRegister: false,
      manifest: false,
      injectManifest: {
        globPatterns: ['**/*.{html,js,css,svg,png,webmanifest,woff2,geojson}'],
        // Leaflet and the offline-map reader are large; precache them all the same, so
        // the map opens offline after one visit.
        maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
      },
      devOptions: { enabled: false },
    }),
  ],
});
