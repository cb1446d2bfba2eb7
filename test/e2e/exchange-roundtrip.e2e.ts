/**
 * Round trip through two browsers, as two devices with no network: device A imports an
 * inspector's file and exports GeoJSON, CSV and the zip (downloads, since this Chromium has
 * no share sheet); device B, fresh, imports A's GeoJSON and exports it again. Every record
 * comes back exactly; the files pass an independent GeoJSON validator
 * (@placemarkio/check-geojson) and a general CSV parser (papaparse); the zip holds the
 * files and the caution.
 */
import { readFileSync } from 'node:fs';
import { getIssues } from '@placemarkio/check-geojson';
import { strFromU8, unzipSync } from 'fflate';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import type { SurveyRecord } from '../../forms/index.js';
import {
  distDir,
  freshProfileDir,
  launchContext,
  startServer,
  waitForServiceWorkerControl,
  type TestServer,
} from './support/index.js';
import { importThroughFiles, openFiles, town } from './support/map-app.js';

const TOWN = town(60, { seed: 21, withoutLocation: 0.1 });
const byId = (a: SurveyRecord, b: SurveyRecord) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0);

async function download(page: Page, button: string): Promise<{ name: string; bytes: Buffer }> {
  await openFiles(page);
  const [file] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: button }).click(),
  ]);
  const path = await file.path();
  return { name: file.suggestedFilename(), bytes: readFileSync(path) };
}

function recordsOf(geojson: string): SurveyRecord[] {
  const doc = JSON.parse(geojson) as { features: Array<{ properties: { record: SurveyRecord } }> };
  return doc.features.map((f) => f.properties.record).sort(byId);
}

describe('export and import round trip between two devices', () => {
  let server: TestServer | null = null;
  const contexts: BrowserContext[] = [];
  let origin = '';
  let exportedA = '';

  async function device(): Promise<Page> {
    const context = await launchContext({ userDataDir: freshProfileDir() });
    contexts.push(context);
    const page = await context.newPage();
    await page.goto(origin + '/');
    await waitForServiceWorkerControl(page);
    await context.setOffline(true);
    await page.goto(origin + '/map');
    return page;
  }

  beforeAll(async () => {
    server = await startServer(distDir);
    origin = server.url;
  });

  afterAll(async () => {
    for (const c of contexts) await c.close();
    await server?.close().catch(() => undefined);
  });

  it('exports from device A exactly the records it imported, as valid GeoJSON', async () => {
    const a = await device();
    await importThroughFiles(a, { name: 'inspector-a.geojson', text: TOWN.text });
    const file = await download(a, 'Export GeoJSON');
    expect(file.name).toMatch(/^grainline-surveys-\d{8}-\d{4}\.geojson$/);
    exportedA = file.bytes.toString('utf8');
    expect(getIssues(exportedA)).toEqual([]);
    expect(recordsOf(exportedA)).toEqual([...TOWN.records].sort(byId));
    const doc = JSON.parse(exportedA) as {
      grainline: { caution: string; withoutLocation: string[] };
    };
    expect(doc.grainline.caution).toMatch(/licensed engineer/);
    expect(doc.grainline.withoutLocation.sort()).toEqual(
      TOWN.records
        .filter((r) => r.location === null)
        .map((r) => r.id)
        .sort(),
    );
    expect(await a.locator('.gl-exchange__note').textContent()).toMatch(
      /Saved grainline-surveys-.*\(60 surveys\)\./,
    );

    const csv = await download(a, 'Export CSV summary');
    const rows = Papa.parse<Record<string, string>>(csv.bytes.toString('utf8'), {
      header: true,
      skipEmptyLines: true,
    });
    expect(rows.errors).toEqual([]);
    expect(rows.data.map((r) => r['survey_id']).sort()).toEqual(
      TOWN.records.map((r) => r.id).sort(),
    );

    const zip = await download(a, 'Export zip with photos');
    const entries = unzipSync(new Uint8Array(zip.bytes));
    expect(Object.keys(entries).sort()).toEqual(['README.txt', 'summary.csv', 'surveys.geojson']);
    // The first export marked the records exported (bookkeeping, no new revision).
    expect(recordsOf(strFromU8(entries['surveys.geojson']!))).toEqual(
      [...TOWN.records]
        .sort(byId)
        .map((r) => ({ ...r, lastExportedAt: expect.any(String) as string })),
    );
    expect(strFromU8(entries['README.txt']!)).toMatch(/CAUTION\. .*licensed engineer/);
  });

  it('reproduces the records exactly on a fresh device B, and merging twice adds nothing', async () => {
    const b = await device();
    await importThroughFiles(b, { name: 'from-a.geojson', text: exportedA }, { strict: true });
    expect(await b.locator('.gl-report').textContent()).toContain('New surveys: 60');
    const again = await download(b, 'Export GeoJSON');
    expect(recordsOf(again.bytes.toString('utf8'))).toEqual([...TOWN.records].sort(byId));
    await importThroughFiles(b, { name: 'from-a.geojson', text: exportedA });
    expect(await b.locator('.gl-report').textContent()).toContain(
      'Already on this device, skipped: 60',
    );
  });
});
