/**
 * Helpers for the map and exchange browser tests: an invented town as GeoJSON text, and
 * importing a file through the map screen's Files panel as a user would.
 */
import type { Page } from 'playwright-core';
import type { SurveyRecord } from '../../../forms/index.js';
import { geoJsonExport } from '../../../web/exchange/geojson-export.js';
import { makeTown, type TownOptions } from '../../fixtures/exchange/town.js';

export const EXPORTED_AT = new Date('2031-05-14T18:00:00.000Z');

/** The GeoJSON export of `records`, as the app writes it. */
export function exportText(records: readonly SurveyRecord[]): string {
  return geoJsonExport(records, { exportedAt: EXPORTED_AT, build: 'test' }).parts.join('');
}

/** An invented town and its GeoJSON. */
export function town(
  count: number,
  options: TownOptions = {},
): { records: SurveyRecord[]; text: string } {
  const records = makeTown(count, options);
  return { records, text: exportText(records) };
}

/** Opens the Files panel on the map screen (the page must be on /map). */
export async function openFiles(page: Page): Promise<void> {
  const files = page.getByRole('button', { name: 'Files', exact: true });
  if ((await files.getAttribute('aria-expanded')) !== 'true') await files.click();
  await page.getByRole('button', { name: 'Import GeoJSON or zip' }).waitFor();
}

/** Imports a file through the Files panel and waits for the import report. */
export async function importThroughFiles(
  page: Page,
  file: { name: string; text: string | Buffer; mimeType?: string },
  options: { strict?: boolean } = {},
): Promise<void> {
  await openFiles(page);
  const strict = page.getByRole('checkbox', { name: /All or nothing/ });
  if ((await strict.isChecked()) !== (options.strict ?? false)) await strict.click();
  await page.locator('[data-testid=import-file]').setInputFiles({
    name: file.name,
    mimeType: file.mimeType ?? 'application/geo+json',
    buffer: typeof file.text === 'string' ? Buffer.from(file.text, 'utf8') : file.text,
  });
  await page.locator('.gl-report').waitFor({ timeout: 30_000 });
}

/** Closes whatever panel is open on the map screen. */
export async function closePanel(page: Page): Promise<void> {
  const close = page.locator('.gl-sheet .gl-panel__close, .gl-map-side.is-open .gl-panel__close');
  if (await close.count()) await close.first().click();
}

/** Clicks clusters until single markers show; returns the number of single markers. */
export async function zoomToMarkers(page: Page, maxSteps = 8): Promise<number> {
  for (let i = 0; i < maxSteps; i++) {
    const singles = await page.locator('.gl-marker-icon').count();
    if (singles > 0) return singles;
    await page.locator('.gl-cluster-icon').first().click();
    await page.waitForTimeout(700);
  }
  return page.locator('.gl-marker-icon').count();
}
