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

describe('the demo town, offline', () => {
  let server: TestServer | null = null;
  let context: BrowserContext | null = null;
  let page: Page;
  const problems: string[] = [];

  beforeAll(async () => {
    mkdirSync(screenshotDir, { recursive: true });
    server = await startServer(distDir);
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
});
