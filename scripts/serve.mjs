#!/usr/bin/env node
/**
 * Serves the production build in dist/ on localhost (default port 4173; PORT overrides).
 * Service workers need a secure context; localhost counts as one.
 */
import { createServer } from 'node:http';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { createStaticHandler } from './static-handler.mjs';

const dist = fileURLToPath(new URL('../dist/', import.meta.url));
if (!existsSync(new URL('index.html', `file://${dist}`))) {
  console.error(
    'No build found in dist/. Run `npm run build` first (or `npm start`, which builds).',
  );
  process.exit(1);
}

const port = Number(process.env.PORT ?? 4173);
const handler = createStaticHandler(dist);
const server = createServer(handler);
server.on('error', (err) => {
  console.error(`Could not start the server on port ${port}: ${err.message}`);
  console.error('Set another port, e.g. `PORT=5000 npm start`.');
  process.exit(1);
});
server.listen(port, '127.0.0.1', () => {
  console.log(`\nGrainline is running at  http://localhost:${port}/\n`);
  console.log('Open it once while this server runs; after that it works offline.');
  console.log('On the first screen, tap "Load demo town" to explore an invented town.');
  console.log('Press Ctrl+C to stop.\n');
});
