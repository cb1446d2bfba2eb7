#!/usr/bin/env node
/**
 * `npm run icons`: renders the SVG icon sources to the PNG sizes the manifest lists, using
 * the system Chromium (no image library needed). The PNGs are committed; run this after
 * changing an SVG.
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { launchBrowser } from '../test/e2e/support/browser.js';

const dir = fileURLToPath(new URL('../web/public/icons/', import.meta.url));
const jobs: Array<[string, string, number]> = [
  ['icon.svg', 'icon-192.png', 192],
  ['icon.svg', 'icon-512.png', 512],
  ['icon-maskable.svg', 'icon-maskable-512.png', 512],
];

const browser = await launchBrowser();
try {
  for (const [src, out, size] of jobs) {
    const page = await browser.newPage({ viewport: { width: size, height: size } });
    const svg = readFileSync(dir + src, 'utf8');
    await page.setContent(
      `<style>html,body{margin:0;background:transparent}svg{display:block;width:${size}px;height:${size}px}</style>${svg}`,
    );
    writeFileSync(dir + out, await page.screenshot({ omitBackground: true, type: 'png' }));
    await page.close();
    console.log(`wrote ${out} (${size}×${size})`);
  }
} finally {
  await browser.close();
}
