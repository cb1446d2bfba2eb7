#!/usr/bin/env node
/**
 * `npm start`: installs dependencies when they are missing, builds the app and serves the
 * production build (with its service worker) on localhost.
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';

/** @param {string[]} args */
function run(args) {
  const result = spawnSync(npm, args, { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) process.exit(result.status ?? 1);
}

const needsInstall = !existsSync(new URL('../node_modules/.bin/vite', import.meta.url));
if (needsInstall) {
  console.log('Installing dependencies (first run)…');
  run(existsSync(new URL('../package-lock.json', import.meta.url)) ? ['ci'] : ['install']);
}
console.log('Building…');
run(['run', 'build']);
await import('./serve.mjs');
