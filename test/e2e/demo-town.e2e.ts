/**
 * "Load demo town" works with one tap on a device that is offline: the bundled demo file is
 * precached, imported through the normal import path, listed, and shown on the map.
 */
import { mkdirSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import {
  distDir,
  launchContext,
  PHONE,
  screenshotDir,
  startServer,
  waitForServiceWorkerControl,
  type TestServer,
} from './support/index.js';
import { readRawStores, surveyIdOf, waitSaved } from './support/storage-db.js';

describe('the demo town, offline', () => {
  let server: TestServer | null = null;
  let context: BrowserContext | null = null;
  let page: Page;
  let appUrl = '';
  const problems: string[] = [];

  beforeAll(async () => {
    mkdirSync(screenshotDir, { recursive: true });
    server = await startServer(distDir);
    appUrl = server.url;
    context = await launchContext({ viewport: PHONE });
    page = await context.newPage();
    page.on('pageerror', (e) => problems.push(e.message));
    await page.goto(server.url);
    await page.getByRole('heading', { level: 1, name: 'Buildings' }).waitFor();
    await waitForServiceWorkerControl(page);
    await server.close();
    server = null;
    await context.setOffline(true);
    await page.reload();
    await page.getByRole('heading', { level: 1, name: 'Buildings' }).waitFor();
  });

  afterAll(async () => {
    await context?.close();
    await server?.close().catch(() => undefined);
  });

  it('loads 48 invented buildings with one tap and lists them by address', async () => {
    await page.getByRole('button', { name: 'Load demo town' }).click();
    await page.getByText('Demo town loaded: 48 buildings.').waitFor({ timeout: 60_000 });
    await page.getByText('3 Millrace Lane, Corrow Vale').first().waitFor({ timeout: 30_000 });
    await page.screenshot({ path: `${screenshotDir}demo-town-list.png` });
  });

  it('shows the demo buildings on the map with no tiles and no network', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Map' }).click();
    await page.getByRole('heading', { level: 1 }).first().waitFor();
    await page.locator('.leaflet-container').waitFor({ timeout: 30_000 });
    await page.locator('.leaflet-marker-icon').first().waitFor({ timeout: 30_000 });
    expect(await page.locator('.leaflet-marker-icon').count()).toBeGreaterThan(0);
    await page.screenshot({ path: `${screenshotDir}demo-town-map.png` });
    expect(problems).toEqual([]);
  });

  it('places a new survey by a tap on the map, among the demo buildings, offline', async () => {
    await page.goto(appUrl);
    await page.getByRole('button', { name: 'New survey' }).click();
    await page.waitForURL(/\/survey\/[0-9a-f-]{36}\/place$/);
    const id = surveyIdOf(page.url());
    await page.getByRole('button', { name: 'Pick on the map' }).click();
    const map = page.getByTestId('location-picker-map');
    // With no position yet, the picker opens at the latest surveyed building, with the
    // others drawn as landmarks.
    await map.locator('.leaflet-marker-icon').first().waitFor({ timeout: 30_000 });
    const readout = page.getByTestId('picker-centre');
    await readout.getByText('Under the cross').waitFor();
    const before = await readout.textContent();
    const box = await map.boundingBox();
    if (!box) throw new Error('the picker map has no box');
    // A tap beside the centre, away from markers, brings that spot under the cross.
    await page.mouse.click(box.x + box.width / 2 + 70, box.y + box.height / 2 - 50);
    await page.waitForFunction(
      (old) => document.querySelector('[data-testid="picker-centre"]')?.textContent !== old,
      before,
    );
    await page.screenshot({ path: `${screenshotDir}location-picker.png` });
    await page.getByRole('button', { name: 'Use this point' }).click();
    await page.getByText('Picked on the map').waitFor();
    await waitSaved(page);

    const stored = (await readRawStores(page)).surveys.find((r) => r.record.id === id);
    const location = (stored?.record as { location?: Record<string, unknown> } | undefined)
      ?.location;
    expect(location?.source).toBe('map');
    expect(location?.accuracyM).toBeNull();
    // Inside the demo town's box (with a street's margin), east and north of where it began.
    expect(location?.lat as number).toBeGreaterThan(45.0);
    expect(location?.lat as number).toBeLessThan(45.04);
    expect(location?.lon as number).toBeGreaterThan(-123.64);
    expect(location?.lon as number).toBeLessThan(-123.6);
    const [lat0, lon0] = (before ?? '')
      .replace(/[^\d.,-]/g, '')
      .split(',')
      .map(Number);
    expect(location?.lon as number).toBeGreaterThan(lon0 as number);
    expect(location?.lat as number).toBeGreaterThan(lat0 as number);
    expect(problems).toEqual([]);
  });
});
