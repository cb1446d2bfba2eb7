/**
 * Offline basemap: a tiny PMTiles archive built in the test (spec v3 writer in
 * test/e2e/support) is loaded through the Basemap panel with no network, stored on the
 * device, drawn under the markers, and still there after a reload. A file that is not an
 * archive is refused with a sentence.
 */
import { mkdirSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { TOWN_CENTRE } from '../fixtures/exchange/town.js';
import { basemapArchive } from './support/basemap-archive.js';
import {
  distDir,
  freshProfileDir,
  launchContext,
  screenshotDir,
  startServer,
  waitForServiceWorkerControl,
  type TestServer,
} from './support/index.js';
import { closePanel, importThroughFiles, town } from './support/map-app.js';

const BOX: [number, number, number, number] = [
  TOWN_CENTRE.lon - 0.03,
  TOWN_CENTRE.lat - 0.02,
  TOWN_CENTRE.lon + 0.03,
  TOWN_CENTRE.lat + 0.02,
];

/** Tiles drawn from the archive: loaded images with object-URL sources. */
async function archiveTilesShown(page: Page): Promise<number> {
  return page.evaluate(
    () =>
      [...document.querySelectorAll<HTMLImageElement>('img.leaflet-tile')].filter(
        (img) => img.src.startsWith('blob:') && img.complete && img.naturalWidth === 256,
      ).length,
  );
}

describe('offline basemap', () => {
  let server: TestServer | null = null;
  let context: BrowserContext | null = null;
  let page: Page;
  const errors: string[] = [];

  beforeAll(async () => {
    mkdirSync(screenshotDir, { recursive: true });
    server = await startServer(distDir);
    context = await launchContext({ userDataDir: freshProfileDir() });
    page = await context.newPage();
    page.on('pageerror', (e) => errors.push(e.message));
    await page.goto(server.url + '/');
    await waitForServiceWorkerControl(page);
    await page.goto(server.url + '/map');
    await importThroughFiles(page, { name: 'town.geojson', text: town(120, { seed: 8 }).text });
    await closePanel(page);
    // From here on there is no network and no server.
    await server.close();
    server = null;
    await context.setOffline(true);
  });

  afterAll(async () => {
    await context?.close();
    await server?.close().catch(() => undefined);
  });

  it('refuses a file that is not a PMTiles archive, with a sentence', async () => {
    await page.getByRole('button', { name: 'Basemap', exact: true }).click();
    await page.locator('[data-testid=basemap-file]').setInputFiles({
      name: 'not-a-map.pmtiles',
      mimeType: 'application/octet-stream',
      buffer: Buffer.from('{"type":"FeatureCollection","features":[]}'),
    });
    await page.getByText('This file is not a PMTiles archive.').waitFor();
  });

  it('loads an archive built in the test and draws its tiles under the markers, offline', async () => {
    const { bytes } = basemapArchive(BOX, 12, 16);
    await page.locator('[data-testid=basemap-file]').setInputFiles({
      name: 'hollin-vale.pmtiles',
      mimeType: 'application/octet-stream',
      buffer: Buffer.from(bytes),
    });
    await page
      .getByText('Offline basemap “Test basemap” stored on this device and shown.')
      .waitFor();
    expect(
      await page.getByRole('radio', { name: /Offline basemap: Test basemap/ }).isChecked(),
    ).toBe(true);
    await closePanel(page);
    await page.getByRole('button', { name: 'Fit', exact: true }).click();
    await expect.poll(() => archiveTilesShown(page), { timeout: 10_000 }).toBeGreaterThan(3);
    expect(await page.locator('.gl-attribution').textContent()).toBe(
      'Test tiles, generated in the test',
    );
    expect(await page.locator('.gl-cluster-icon, .gl-marker-icon').count()).toBeGreaterThan(0);
    await page.screenshot({ path: `${screenshotDir}map-basemap-phone.png` });
  });

  it('keeps the archive on the device: after a reload it is still shown, offline', async () => {
    await page.reload();
    await page.locator('.gl-cluster-icon, .gl-marker-icon').first().waitFor({ timeout: 20_000 });
    await expect.poll(() => archiveTilesShown(page), { timeout: 10_000 }).toBeGreaterThan(3);
    // Zooming past the archive's deepest level scales its tiles up rather than going blank.
    for (let i = 0; i < 4; i++) {
      await page.locator('.leaflet-control-zoom-in').click();
      await page.waitForTimeout(350);
    }
    await expect.poll(() => archiveTilesShown(page), { timeout: 10_000 }).toBeGreaterThan(0);
    await page.screenshot({ path: `${screenshotDir}map-basemap-zoomed-phone.png` });
    expect(errors).toEqual([]);
  });

  it('switches back to the plain background with grid', async () => {
    await page.getByRole('button', { name: 'Basemap', exact: true }).click();
    await page.getByRole('radio', { name: /Plain background/ }).check();
    await closePanel(page);
    await expect.poll(() => archiveTilesShown(page)).toBe(0);
    expect(await page.locator('.gl-grid line').count()).toBeGreaterThan(0);
  });
});
