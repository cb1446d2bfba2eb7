#!/usr/bin/env node
/**
 * `npm run size`: the bytes the first load fetches — index.html and the scripts, module
 * preloads and stylesheets it references — minified (Vite already minifies) and gzipped.
 * Fails above the budget. Lazily loaded screens (map, survey steps) are not part of it.
 */
import { readFileSync, existsSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { fileURLToPath } from 'node:url';
import { join } from 'node:path';

/** First-load budget in bytes after gzip (issue: 150 kB). */
const BUDGET = 150 * 1000;
const dist = fileURLToPath(new URL('../dist/', import.meta.url));
const indexPath = join(dist, 'index.html');
if (!existsSync(indexPath)) {
  console.error('No build in dist/. Run `npm run build` first.');
  process.exit(1);
}

const html = readFileSync(indexPath, 'utf8');
const refs = new Set(['index.html']);
const attr = /<(?:script|link)\b[^>]*?\b(?:src|href)="([^"]+)"[^>]*>/g;
for (const m of html.matchAll(attr)) {
  const tag = m[0];
  const url = m[1] ?? '';
  const isScript = tag.startsWith('<script');
  const isCss = /rel="stylesheet"/.test(tag);
  const isPreload = /rel="modulepreload"/.test(tag);
  if ((isScript || isCss || isPreload) && url.startsWith('/') && !url.startsWith('//')) {
    refs.add(url.replace(/^\//, ''));
  }
}

/** Also count static imports of the entry chunks (Vite lists them as modulepreload, but be sure). */
const queue = [...refs].filter((f) => f.endsWith('.js'));
while (queue.length > 0) {
  const file = queue.pop();
  if (!file) break;
  const code = readFileSync(join(dist, file), 'utf8');
  for (const m of code.matchAll(
    /(?:^|[;\s}])import\s*(?:[\w*{}\s,$]+from\s*)?["'](\.{0,2}\/[^"']+\.js)["']/g,
  )) {
    const spec = m[1] ?? '';
    const resolved = new URL(spec, `file:///${file}`).pathname.replace(/^\//, '');
    if (!refs.has(resolved)) {
      refs.add(resolved);
      queue.push(resolved);
    }
  }
}

let total = 0;
/** @type {Array<[string, number, number]>} */
const rows = [];
for (const file of [...refs].sort()) {
  const buf = readFileSync(join(dist, file));
  const gz = gzipSync(buf, { level: 9 }).length;
  total += gz;
  rows.push([file, buf.length, gz]);
}
/** @param {string | number} s @param {number} n */
const pad = (s, n) => String(s).padStart(n);
console.log('First load (min + gzip):');
for (const [file, raw, gz] of rows)
  console.log(`  ${pad(gz, 8)} B  (${pad(raw, 8)} B raw)  ${file}`);
console.log(
  `  ${pad(total, 8)} B total; budget ${BUDGET} B (${((100 * total) / BUDGET).toFixed(1)} %)`,
);
if (total > BUDGET) {
  console.error(`Over budget by ${total - BUDGET} B. Load heavy parts lazily.`);
  process.exit(1);
}
