/**
 * Imported text is never interpreted as HTML: a file whose every string is an XSS payload
 * (addresses, names, notes, ids, captions, free-form result keys and values, the file name)
 * is imported and shown on the map, in the summary card, the filters, the list of surveys
 * without location and the import report. No script may run, no dialog may open, no
 * element may be created from the payloads, and the Content Security Policy must not even
 * have to block anything.
 */
import { mkdirSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import type { SurveyRecord } from '../../forms/index.js';
import { makeTown } from '../fixtures/exchange/town.js';
import {
  distDir,
  freshProfileDir,
  launchContext,
  screenshotDir,
  startServer,
  waitForServiceWorkerControl,
  type TestServer,
} from './support/index.js';
import { closePanel, exportText, importThroughFiles, zoomToMarkers } from './support/map-app.js';

const RUN = 'window.__xss=(window.__xss||0)+1';
const PAYLOADS = [
  `<img src=x onerror="${RUN}">`,
  `<script>${RUN}</script>`,
  `"><svg onload="${RUN}">`,
  `javascript:${RUN}`,
  `<a href="javascript:${RUN}">tap</a>`,
  '{{constructor.constructor("alert(1)")()}}',
  `<iframe srcdoc="<script>parent.__xss=1</script>"></iframe>`,
  '</title><script>alert(document.domain)</script>',
  "'-alert(1)-'",
  '<style>*{display:none}</style>',
  '<math><mtext><table><mglyph><style><img src=x onerror=alert(1)>',
  '<details open ontoggle="alert(1)">',
];
const p = (i: number) => PAYLOADS[i % PAYLOADS.length] as string;

/** Records whose every free string is a payload (ids and times must stay valid). */
function hostileRecords(): SurveyRecord[] {
  return makeTown(24, { seed: 13, withoutLocation: 0.25 }).map((r, i) => ({
    ...r,
    address: p(i),
    inspector: p(i + 1),
    team: p(i + 2),
    deviceId: p(i + 3),
    walls: r.walls.map((w, j) => ({ ...w, id: `${p(i + j)}#${j}` })),
    observations: { ...r.observations, notes: p(i + 4) },
    photos: [
      {
        id: `00000000-0000-4000-8000-${String(i).padStart(12, '0')}`,
        takenAt: null,
        caption: p(i + 5),
        keptLocation: false,
      },
    ],
    result:
      r.result === null
        ? null
        : {
            ...r.result,
            calcVersion: p(i + 6).slice(0, 50),
            result: {
              ...(r.result.result as Record<string, unknown>),
              [p(i + 7)]: p(i + 8),
              reasons: [p(i + 9), { [p(i + 10)]: p(i + 11) }],
            } as never,
          },
    unconfirmed: [p(i + 2).slice(0, 200)],
    unparsed: { [`note ${i}`]: p(i + 3) },
  }));
}

describe('imported text is never run as HTML', () => {
  let server: TestServer | null = null;
  let context: BrowserContext | null = null;
  let page: Page;
  const dialogs: string[] = [];
  const errors: string[] = [];
  const records = hostileRecords();

  async function expectNothingRan(): Promise<void> {
    const state = await page.evaluate(() => ({
      xss: (window as unknown as { __xss?: number }).__xss ?? 0,
      violations: (window as unknown as { __csp: string[] }).__csp,
      title: document.title,
      injected: document.querySelectorAll(
        '#app img[src="x"], #app iframe, #app svg[onload], #app details[ontoggle], #app script, #app style, #app math',
      ).length,
    }));
    expect(state).toEqual({ xss: 0, violations: [], title: 'Grainline', injected: 0 });
    expect(dialogs).toEqual([]);
  }

  beforeAll(async () => {
    mkdirSync(screenshotDir, { recursive: true });
    server = await startServer(distDir);
    context = await launchContext({ userDataDir: freshProfileDir() });
    // Record any CSP violation: a payload that became markup would trigger one.
    await context.addInitScript(() => {
      (window as unknown as { __csp: string[] }).__csp = [];
      document.addEventListener('securitypolicyviolation', (e) => {
        (window as unknown as { __csp: string[] }).__csp.push(
          `${e.violatedDirective} ${e.blockedURI}`,
        );
      });
    });
    page = await context.newPage();
    page.on('dialog', (d) => {
      dialogs.push(d.message());
      void d.dismiss();
    });
    page.on('pageerror', (e) => errors.push(e.message));
    await page.goto(server.url + '/');
    await waitForServiceWorkerControl(page);
    await page.goto(server.url + '/map');
  });

  afterAll(async () => {
    await context?.close();
    await server?.close().catch(() => undefined);
  });

  it('imports the hostile file and shows the payloads in the report as text', async () => {
    const doc = JSON.parse(exportText(records)) as {
      features: Array<
        Record<string, unknown> & { properties: { record: Record<string, unknown> } }
      >;
    };
    // Two bad features whose payloads end up in the list of reasons.
    doc.features.push({
      ...doc.features[0]!,
      properties: { record: { ...doc.features[0]!.properties.record, id: p(0), revision: 0 } },
    });
    doc.features.push({ type: p(1), properties: { record: p(2) } } as never);
    await importThroughFiles(page, {
      name: `${p(0)}.geojson`,
      text: JSON.stringify(doc),
    });
    const report = page.locator('.gl-report');
    expect(await report.locator('.gl-report__title').textContent()).toBe(
      `Imported ${p(0)}.geojson.`,
    );
    expect(await report.textContent()).toContain(`New surveys: ${records.length}`);
    expect(await report.textContent()).toContain('Not imported, with the reasons: 2');
    expect(await report.locator('.gl-report__id').first().textContent()).toBe(` ${p(0)}`);
    await page.screenshot({
      path: `${screenshotDir}exchange-xss-report-phone.png`,
      fullPage: true,
    });
    await expectNothingRan();
  });

  it('shows payload addresses in markers and the summary card as text', async () => {
    await closePanel(page);
    await page.locator('.gl-cluster-icon, .gl-marker-icon').first().waitFor();
    expect(await zoomToMarkers(page)).toBeGreaterThan(0);
    const marker = page.locator('.gl-marker-icon').first();
    await marker.click();
    const title = (await page.locator('[data-testid=summary-card] h2').textContent()) ?? '';
    expect(PAYLOADS).toContain(title);
    expect(await marker.getAttribute('title')).toContain(title);
    await page.screenshot({ path: `${screenshotDir}exchange-xss-card-phone.png` });
    await expectNothingRan();
  });

  it('shows payload inspector names in the filters and payload addresses in the list as text', async () => {
    await page.getByRole('button', { name: /^Filters/ }).click();
    const words = await page.locator('.gl-map-side.is-open .gl-facet__word').allTextContents();
    for (const r of records) expect(words).toContain(r.inspector);
    await closePanel(page);
    await page.getByRole('button', { name: 'Close the summary' }).click();
    await page.getByRole('button', { name: /^Without location/ }).click();
    const listed = await page.locator('.gl-unplaced__list a').allTextContents();
    expect(listed.length).toBe(records.filter((r) => r.location === null).length);
    for (const text of listed) expect(PAYLOADS).toContain(text);
    await closePanel(page);
    await expectNothingRan();
    expect(errors).toEqual([]);
  });
});
