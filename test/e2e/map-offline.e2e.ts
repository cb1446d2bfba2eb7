/**
 * The team lead's map with no network at all: files imported on the map screen, clustered
 * markers drawn over a plain background with a coordinate grid and a scale bar, the summary
 * card, filters with counts, fit-to-data, surveys without location listed; at phone and
 * tablet sizes. Screenshots in test/output/screenshots/ (map-*.png).
 */
import { mkdirSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { facetCounts, NO_FILTER } from '../../web/map/map-filters.js';
import { toMapData } from '../../web/map/map-points.js';
import {
  distDir,
  freshProfileDir,
  launchContext,
  screenshotDir,
  startServer,
  waitForServiceWorkerControl,
  type TestServer,
} from './support/index.js';
import { closePanel, importThroughFiles, town, zoomToMarkers } from './support/map-app.js';

const TOWN = town(400, { seed: 5, withoutLocation: 0.04 });
const DATA = toMapData(TOWN.records);
const COUNTS = facetCounts([...DATA.points, ...DATA.unplaced], NO_FILTER);

describe('offline map', () => {
  let server: TestServer | null = null;
  let context: BrowserContext | null = null;
  let page: Page;
  let origin = '';
  const errors: string[] = [];

  beforeAll(async () => {
    mkdirSync(screenshotDir, { recursive: true });
    server = await startServer(distDir);
    origin = server.url;
    context = await launchContext({ userDataDir: freshProfileDir() });
    page = await context.newPage();
    page.on('pageerror', (e) => errors.push(e.message));
  });

  afterAll(async () => {
    await context?.close();
    await server?.close().catch(() => undefined);
  });

  it('starts empty, and imports an inspector file from the Files panel', async () => {
    await page.goto(origin + '/');
    await waitForServiceWorkerControl(page);
    await page.goto(origin + '/map');
    await page.getByText('No surveys on this device yet').waitFor();
    await importThroughFiles(page, { name: 'team-north.geojson', text: TOWN.text });
    const report = page.locator('.gl-report');
    expect(await report.textContent()).toContain('New surveys: 400');
    expect(await report.textContent()).toContain(
      `Without a location (listed beside the map): ${DATA.unplaced.length}`,
    );
    await closePanel(page);
    await page.locator('.gl-cluster-icon').first().waitFor();
  });

  it('renders the markers with no tile server and no network: plain background, grid, scale bar', async () => {
    if (!server || !context) throw new Error('setup failed');
    await server.close();
    server = null;
    await context.setOffline(true);
    await page.reload();
    await page.locator('.gl-cluster-icon').first().waitFor({ timeout: 20_000 });
    await page.waitForTimeout(500);
    await expect
      .poll(() => page.locator('[data-testid=map-status]').textContent())
      .toBe('Surveys: 400');
    expect(await page.locator('.gl-grid line').count()).toBeGreaterThan(3);
    expect(await page.locator('.gl-grid text').first().textContent()).toMatch(/° [NSEW]$/);
    expect(await page.locator('.leaflet-control-scale-line').first().textContent()).toMatch(
      /\d+ (m|km)$/,
    );
    expect(await page.locator('[data-testid=tile-note]').textContent()).toMatch(
      /grid and scale only/,
    );
    expect(await page.locator('img.leaflet-tile-loaded:not(.gl-tile-missing)').count()).toBe(0);
    // Every located survey is inside a cluster or a marker.
    const inView = await page.evaluate(
      () =>
        [...document.querySelectorAll('.gl-cluster__count')].reduce(
          (n, e) => n + Number(e.textContent),
          0,
        ) + document.querySelectorAll('.gl-marker-icon').length,
    );
    expect(inView).toBe(DATA.points.length);
    await page.screenshot({ path: `${screenshotDir}map-offline-phone.png` });
    expect(errors).toEqual([]);
  });

  it('shows each posting as colour, symbol and word, with counts, in the outcome chips', async () => {
    for (const [key, word] of [
      ['keep-out', 'Keep out'],
      ['limited', 'Limited entry'],
      ['open', 'Open'],
      ['unscreened', 'Not screened'],
    ] as const) {
      const chip = page.locator('.gl-chip', { hasText: word });
      expect(await chip.locator('.gl-chip__count').textContent()).toBe(
        String(COUNTS.posting.get(key) ?? 0),
      );
      expect(await chip.locator('svg').count()).toBe(1);
    }
  });

  it('opens a summary card from a marker, and the card opens the survey', async () => {
    const singles = await zoomToMarkers(page);
    expect(singles).toBeGreaterThan(0);
    const marker = page.locator('.gl-marker-icon').first();
    const title = (await marker.getAttribute('title')) ?? '';
    await marker.click();
    const card = page.locator('[data-testid=summary-card]');
    await card.waitFor();
    const address = (await card.locator('h2').textContent()) ?? '';
    expect(title.startsWith(address)).toBe(true);
    const record = TOWN.records.find((r) => r.address === address);
    expect(record).toBeTruthy();
    expect(await card.textContent()).toContain(`Revision${record!.revision}`);
    await page.screenshot({ path: `${screenshotDir}map-card-phone.png` });
    await card.getByRole('link', { name: 'Open survey' }).click();
    await page.waitForURL(`**/survey/${record!.id}`);
    await page.goBack();
    await page.locator('.gl-map').waitFor();
  });

  it('filters by outcome and damage state with the counts of the data, and fits to data', async () => {
    await page.locator('.gl-cluster-icon, .gl-marker-icon').first().waitFor();
    const keepOut = COUNTS.posting.get('keep-out') ?? 0;
    await page.locator('.gl-chip', { hasText: 'Keep out' }).click();
    await expect
      .poll(() => page.locator('[data-testid=map-status]').textContent())
      .toBe(`Showing ${keepOut} of 400 surveys`);
    await page.getByRole('button', { name: /^Filters/ }).click();
    const panel = page.locator('.gl-map-side.is-open');
    await panel.waitFor();
    // With keep-out chosen, each damage-state count is of keep-out surveys only.
    const expected = facetCounts([...DATA.points, ...DATA.unplaced], {
      ...NO_FILTER,
      posting: new Set(['keep-out']),
    });
    for (const [state, word] of [
      ['complete', 'Complete'],
      ['extensive', 'Extensive'],
    ] as const) {
      const row = panel.locator('.gl-facet__value', { hasText: word });
      expect(await row.locator('.gl-facet__count').textContent()).toBe(
        String(expected.damage.get(state) ?? 0),
      );
    }
    await page.screenshot({ path: `${screenshotDir}map-filters-phone.png` });
    await panel.getByRole('button', { name: /^Show/ }).click();
    await page.getByRole('button', { name: 'Fit', exact: true }).click();
    await page.waitForTimeout(500);
    const shown = await page.evaluate(
      () =>
        [...document.querySelectorAll('.gl-cluster__count')].reduce(
          (n, e) => n + Number(e.textContent),
          0,
        ) + document.querySelectorAll('.gl-marker-icon').length,
    );
    expect(shown).toBe(DATA.points.filter((p) => p.posting === 'keep-out').length);
    await page.locator('.gl-chip', { hasText: 'Keep out' }).click(); // clear again
  });

  it('lists the surveys without location instead of dropping them', async () => {
    await page.getByRole('button', { name: /^Without location/ }).click();
    const list = page.locator('.gl-unplaced__list li');
    expect(await list.count()).toBe(DATA.unplaced.length);
    const texts = (await list.allTextContents()).join('\n');
    for (const u of DATA.unplaced) expect(texts).toContain(u.address);
    await closePanel(page);
  });

  it('puts the filters beside the map at tablet and laptop sizes', async () => {
    for (const [name, size] of [
      ['tablet', { width: 1024, height: 768 }],
      ['laptop', { width: 1440, height: 900 }],
    ] as const) {
      await page.setViewportSize(size);
      await page.waitForTimeout(400);
      await page.getByRole('button', { name: 'Fit', exact: true }).click();
      await page.waitForTimeout(500);
      expect(await page.locator('.gl-map-side').isVisible()).toBe(true);
      const box = await page.locator('.gl-map').boundingBox();
      expect(box!.width).toBeGreaterThan(size.width - 400);
      await page.screenshot({ path: `${screenshotDir}map-offline-${name}.png` });
    }
    expect(errors).toEqual([]);
  });
});
