/**
 * The inspector's day at phone size, offline from the start: create a survey through every
 * step, see the result, reload mid-flow with nothing lost, find the building in the list,
 * switch to US units. Every screen is saved as a screenshot (test/output/screenshots/flow-*)
 * to be looked at.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import {
  PHONE,
  distDir,
  launchContext,
  screenshotDir,
  startServer,
  waitForServiceWorkerControl,
  type TestServer,
} from './support/index.js';

/** Screenshots of a whole screen, one viewport at a time (what the inspector scrolls through). */
async function shoot(page: Page, name: string): Promise<void> {
  await page.waitForTimeout(300);
  const height = await page.evaluate(() => document.documentElement.scrollHeight);
  const step = PHONE.height - 140;
  for (let i = 0, y = 0; y < height; i++, y += step) {
    await page.evaluate((top) => window.scrollTo(0, top), y);
    await page.screenshot({ path: `${screenshotDir}flow-${name}-${i}.png` });
    if (y + PHONE.height >= height) break;
  }
  await page.evaluate(() => window.scrollTo(0, 0));
}

/** Waits until the save indicator says the last change reached IndexedDB. */
async function waitSaved(page: Page): Promise<void> {
  await page.locator('[data-save-state="saved"]').waitFor({ timeout: 10_000 });
}

async function goToStep(page: Page, name: RegExp): Promise<void> {
  await page.getByRole('navigation', { name: 'Survey steps' }).getByRole('link', { name }).click();
}

describe('a survey from arrival to verdict, at phone size, offline', () => {
  let server: TestServer | null = null;
  let context: BrowserContext | null = null;
  let page: Page;
  let surveyUrl = '';
  const pageErrors: string[] = [];

  beforeAll(async () => {
    mkdirSync(screenshotDir, { recursive: true });
    server = await startServer(distDir);
    context = await launchContext({ viewport: PHONE });
    page = await context.newPage();
    page.setDefaultTimeout(10_000);
    page.on('pageerror', (e) => pageErrors.push(e.message));
    page.on('console', (m) => {
      if (m.type() === 'error') {
        pageErrors.push(m.text());
      }
    });
    page.on('dialog', (d) => void d.accept());
    await page.goto(server.url);
    await page.getByRole('heading', { level: 1, name: 'Buildings' }).waitFor();
    await waitForServiceWorkerControl(page);
    // From here on there is no network at all.
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

  it('shows an empty building list with the main actions', async () => {
    await expect(page.getByRole('button', { name: 'New survey' }).isVisible()).resolves.toBe(true);
    await expect(page.getByRole('button', { name: 'Load demo town' }).isVisible()).resolves.toBe(
      true,
    );
    await expect(page.getByRole('navigation', { name: 'Main' }).isVisible()).resolves.toBe(true);
    await shoot(page, '01-home-empty');
  });

  it('starts a survey and records the place', async () => {
    await page.getByRole('button', { name: 'New survey' }).click();
    const address = page.getByRole('textbox', { name: 'Address or description' });
    await address.waitFor();
    surveyUrl = page.url().replace(/\/place$/, '');
    expect(surveyUrl).toMatch(/\/survey\/[0-9a-f-]{36}$/);
    await address.fill('7 Quarry Row, Upper Fennick');
    // A GPS fix shows its accuracy; typed coordinates then replace it.
    await context?.grantPermissions(['geolocation']);
    await context?.setGeolocation({ latitude: 46.20395, longitude: 7.36011, accuracy: 12 });
    await page.getByRole('button', { name: 'Use GPS position' }).click();
    await page.getByText('GPS, accurate to about ±12 m').waitFor();
    await shoot(page, '02-place-gps');
    await page.getByLabel('Latitude').fill('46.2041');
    await page.getByLabel('Longitude').fill('7,3602');
    await page.getByText('Read as 7.3602').waitFor();
    await page.getByLabel('Inspector', { exact: true }).fill('R. Okafor');
    await waitSaved(page);
    await expect(page.getByText('46.20410, 7.36020').isVisible()).resolves.toBe(true);
    await shoot(page, '02-place');
  });

  it('enters the building: quick storeys, a refused height, an unusual one, then the real values', async () => {
    await goToStep(page, /Building/);
    await page.getByRole('heading', { level: 1, name: /Building/ }).waitFor();
    await page.getByText('Light frame', { exact: true }).click();
    await page.getByLabel('Era of design (seismic code level)').selectOption('moderate');
    await page.getByLabel('Main use').selectOption('multi-family');
    await page.getByLabel('Kind of roof').selectOption('light');
    // Each of the four defaults was chosen (one of them was already the default): none is
    // left to confirm.
    await page.getByRole('button', { name: 'Confirm the defaults' }).waitFor({ state: 'detached' });
    await page.getByRole('button', { name: 'Add a storey' }).click();
    await page.getByRole('button', { name: 'Add a storey' }).click();
    await expect(page.locator('.stepper__value').textContent()).resolves.toBe('2');

    const typical = page.getByLabel('Typical storey height');
    await typical.fill('0');
    await page.getByText('Typical storey height must be more than 0 m.').first().waitFor();
    await typical.fill('7.5');
    await page.getByText(/Typical storey height: 7.5 m is more than usual/).waitFor();
    await typical.fill('2,8');
    await page.getByText('Read as 2.8 m.').first().waitFor();
    await page.getByLabel('Floor area of each storey').fill('95');
    await page.getByRole('button', { name: 'Confirm all storeys' }).click();
    await page.getByLabel('Plan length along x').fill('11.5');
    await page.getByLabel('Plan length along y').fill('8.3');

    // A per-storey edit below the quick entry.
    const second = page.getByLabel('Storey 2: Storey height');
    await second.fill('-1');
    await page.getByText('Storey height cannot be negative.').first().waitFor();
    await expect(
      page.getByRole('link', { name: /Storey 2: Storey height cannot be negative/ }).isVisible(),
    ).resolves.toBe(true);
    await second.fill('2.6');
    await waitSaved(page);
    await shoot(page, '03-building');
  });

  it('keeps everything after a reload in the middle of the flow', async () => {
    // Reload at once, before the autosave's quarter second is over.
    await page.getByLabel('Storey 1: Floor area').fill('abc');
    await page.reload();
    await page.getByRole('heading', { level: 1, name: /Building/ }).waitFor();
    await expect(page.locator('.stepper__value').textContent()).resolves.toBe('2');
    await expect(page.getByLabel('Storey 2: Storey height').inputValue()).resolves.toBe('2.6');
    await expect(page.getByLabel('Plan length along x').inputValue()).resolves.toBe('11.5');
    // The invalid text is still there, as typed, with its sentence.
    await expect(page.getByLabel('Storey 1: Floor area').inputValue()).resolves.toBe('abc');
    await page.getByText('Floor area must be a number in m², for example 120.').first().waitFor();
    await page.getByLabel('Storey 1: Floor area').fill('95');
    await waitSaved(page);
    await expect(page.getByLabel('Storey 1: Storey height').inputValue()).resolves.toBe('2.8');
  });

  it('adds walls quickly: totals per sheathing, and one rocking wall with its details', async () => {
    await page.getByRole('link', { name: /Next: Walls/ }).click();
    await page.getByRole('heading', { level: 1, name: /Walls/ }).waitFor();
    const wsp100 = page.getByLabel('Wood panels, nails at 100 mm (4 in)', { exact: false });
    await wsp100.fill('14');
    await page.getByLabel('Gypsum board', { exact: false }).fill('9.5');
    await page.getByText('along y', { exact: true }).click();
    await wsp100.fill('11');
    await page.getByText('Storey 2', { exact: true }).click();
    await wsp100.fill('10');
    await page.getByText('along x', { exact: true }).click();
    await wsp100.fill('12');

    await page.getByRole('button', { name: 'Add a rocking wall' }).click();
    const length = page.getByRole('textbox', { name: /Wall 2X-1: Panel length/ });
    await length.waitFor();
    await length.fill('-3');
    await page.getByText('Panel length cannot be negative.').first().waitFor();
    await length.fill('16');
    await page
      .getByText(/Panel length: 16 m is more than usual/)
      .first()
      .waitFor();
    await length.fill('2.4');
    await page.getByRole('textbox', { name: /Wall 2X-1: Wall line position/ }).fill('4');
    await page.getByRole('textbox', { name: /Wall 2X-1: Panel thickness/ }).fill('140');
    await page.getByRole('textbox', { name: /Wall 2X-1: Gravity load on top/ }).fill('30');
    await page.getByRole('textbox', { name: /Wall 2X-1: Post-tension force/ }).fill('0');
    await waitSaved(page);
    await expect(
      page.getByRole('img', { name: /Plan sketch of storey 2/ }).isVisible(),
    ).resolves.toBe(true);
    await shoot(page, '04-walls');
  });

  it('records observations: a lean as an offset, an uplift gap, damage seen, notes', async () => {
    await goToStep(page, /Observations/);
    await page.getByRole('heading', { level: 1, name: /Observations/ }).waitFor();
    await page.getByLabel('Storey 1, along x: Offset').fill('14');
    await page.getByText('Residual drift 0.50 % (from the offset)').waitFor();
    await page
      .getByRole('button', { name: /Confirm Storey 1, along x: Height measured over/ })
      .click();
    await page.getByLabel('Storey 2, along y: Or: tilt').fill('0.3');
    await page.getByText('Residual drift 0.52 % (from the tilt)').waitFor();
    await page.getByLabel(/Wall 2X-1 \(Rocking wall\): uplift gap/).fill('6');
    await page
      .getByRole('group', { name: 'Nails or screws pulled out' })
      .getByText('Minor', { exact: true })
      .click();
    await page
      .getByRole('textbox', { name: 'Notes' })
      .fill('Stair cracked at landing; rear door binds.');
    await waitSaved(page);
    await shoot(page, '05-observations');
  });

  it('sets the hazard from a code spectrum', async () => {
    await goToStep(page, /Hazard/);
    await page.getByRole('heading', { level: 1, name: /Hazard/ }).waitFor();
    await page.getByText('Code spectrum: EN 1998-1').click();
    await page.getByText('C', { exact: true }).click();
    await page.getByLabel('Design ground acceleration ag').fill('0.28');
    await page.getByRole('img', { name: /Response spectrum/ }).waitFor();
    await waitSaved(page);
    await shoot(page, '06-hazard');
  });

  it('shows the result with the period, the spectrum, the drift profile and the rocking gauge', async () => {
    await page.getByRole('link', { name: /See the verdict/ }).click();
    await page.getByRole('heading', { level: 1, name: 'Verdict' }).waitFor();
    await page.getByRole('heading', { name: 'Recommended posting and damage state' }).waitFor();
    // Complete survey: a verdict, with its posting word and damage state, and the evidence.
    const posting = await page.locator('.posting__word').textContent();
    expect(posting).toMatch(/Open|Limited entry|Keep out/);
    await expect(page.locator('.damage').textContent()).resolves.toMatch(
      /Damage state:\s*(None|Slight|Moderate|Extensive|Complete)/,
    );
    await page.getByRole('list', { name: 'Seen on site' }).waitFor();
    await page.getByRole('list', { name: 'Predicted from the hazard and the walls' }).waitFor();
    await page.getByRole('img', { name: /Response spectrum/ }).waitFor();
    await page.getByRole('img', { name: /Drift per storey/ }).waitFor();
    await page.getByRole('img', { name: /Rocking of wall 2X-1/ }).waitFor();
    const period = await page.locator('.figures__row').first().textContent();
    expect(period).toMatch(/Period along x\s*\d+\.\d\d s/);
    await expect(page.getByText('Screening estimate only').first().isVisible()).resolves.toBe(true);
    await shoot(page, '07-result');
  });

  it('prints the result as a one-page building report', async () => {
    const pdf = await page.pdf({ format: 'A4', printBackground: true });
    writeFileSync(`${screenshotDir}flow-report.pdf`, pdf);
    const pages = pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g) ?? [];
    expect(pages.length).toBe(1);
    await page.emulateMedia({ media: 'print' });
    await page.screenshot({ path: `${screenshotDir}flow-07-report-print.png`, fullPage: true });
    await page.emulateMedia({ media: 'screen' });
  });

  it('lists the building with its address and the not-exported marker, and finds it by search', async () => {
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Buildings' })
      .click();
    await page.getByRole('heading', { level: 1, name: 'Buildings' }).waitFor();
    const item = page.getByRole('link', { name: /7 Quarry Row, Upper Fennick/ });
    await item.waitFor();
    await expect(item.textContent()).resolves.toMatch(/Not exported/);
    // The stored verdict shows in the list.
    await expect(item.textContent()).resolves.toMatch(/Open|Limited entry|Keep out/);
    await page.getByLabel('Search buildings').fill('quarry fennick');
    await expect(item.isVisible()).resolves.toBe(true);
    await page.getByLabel('Search buildings').fill('harbour');
    await page.getByText('No building matches').waitFor();
    await page.getByLabel('Search buildings').fill('');
    await page.getByRole('radio', { name: 'Not exported' }).check();
    await expect(item.isVisible()).resolves.toBe(true);
    await shoot(page, '08-home-list');
  });

  it('switches to US customary units: the same stored values appear in feet', async () => {
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Settings' })
      .click();
    await page.getByRole('heading', { level: 1, name: 'Settings' }).waitFor();
    await page.getByText('US customary', { exact: true }).click();
    await page.getByText('High contrast, for bright sunlight').click();
    await shoot(page, '09-settings');
    await page.goto(`${surveyUrl}/building`);
    await page.getByRole('heading', { level: 1, name: /Building/ }).waitFor();
    // 2.6 m = 8.530 ft; stored SI, shown in feet.
    await expect(page.getByLabel('Storey 2: Storey height').inputValue()).resolves.toBe('8.53018');
    await expect(page.locator('.field__unit-tag').first().textContent()).resolves.toBe('ft');
    await shoot(page, '10-building-us-contrast');
    await page.goto(`${surveyUrl}/result`);
    await page.getByRole('heading', { level: 1, name: 'Verdict' }).waitFor();
    await shoot(page, '11-result-us-contrast');
  });

  it('raised no page errors or CSP violations along the way', () => {
    expect(pageErrors).toEqual([]);
  });
});
