/**
 * Accessibility at phone size: axe-core (injected through the browser's DevTools protocol,
 * since the Content Security Policy rightly refuses inline scripts) finds no serious or
 * critical violation on any screen of the field forms, in normal and high-contrast display;
 * every input has a label; and a whole survey can be entered from the keyboard alone.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
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

const require = createRequire(import.meta.url);
const AXE_SOURCE = readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

interface Violation {
  id: string;
  impact: string | null;
  help: string;
  targets: string[];
}

/** Runs axe on the page (WCAG 2.1 A/AA and best practice) and returns every violation. */
async function axe(page: Page): Promise<Violation[]> {
  const loaded = await page.evaluate(() => 'axe' in window);
  // page.evaluate runs through the DevTools protocol, which the page's CSP does not govern,
  // unlike page.addScriptTag (an inline <script>, refused by script-src 'self').
  if (!loaded) await page.evaluate(AXE_SOURCE);
  return page.evaluate(async () => {
    const w = window as unknown as {
      axe: {
        run(
          ctx: Document,
          opts: object,
        ): Promise<{
          violations: {
            id: string;
            impact: string | null;
            help: string;
            nodes: { target: string[] }[];
          }[];
        }>;
      };
    };
    const r = await w.axe.run(document, {
      runOnly: {
        type: 'tag',
        values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'best-practice'],
      },
    });
    return r.violations.map((v) => ({
      id: v.id,
      impact: v.impact,
      help: v.help,
      targets: v.nodes.map((n) => n.target.join(' ')),
    }));
  });
}

function serious(violations: readonly Violation[]): Violation[] {
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

/**
 * Inputs, selects and textareas without an accessible name. Inputs hidden from assistive
 * technology and from the tab order (a file input opened by its own labelled button) are
 * not fields a person fills in, and are skipped.
 */
async function unlabelledInputs(page: Page): Promise<string[]> {
  const fields = page.locator(
    'input:not([type="hidden"]):not([aria-hidden="true"]), select, textarea',
  );
  const out: string[] = [];
  for (let i = 0; i < (await fields.count()); i++) {
    const f = fields.nth(i);
    const name = await f.evaluate((el) => {
      const labels = (el as HTMLInputElement).labels;
      const byLabel = labels ? [...labels].map((l) => l.textContent ?? '').join(' ') : '';
      return (el.getAttribute('aria-label') ?? '') + byLabel;
    });
    if (name.trim() === '') {
      out.push(
        await f.evaluate((el) => `${el.tagName} id=${el.id} name=${el.getAttribute('name') ?? ''}`),
      );
    }
  }
  return out;
}

/**
 * Presses Tab until the focused element matches, at most `max` times. The predicate runs in
 * the page through the DevTools protocol (like page.evaluate), so it needs no eval there.
 */
async function tabTo(page: Page, matches: (el: Element) => boolean, max = 120): Promise<void> {
  for (let i = 0; i < max; i++) {
    await page.keyboard.press('Tab');
    const focused = await page.evaluateHandle(() => document.activeElement ?? document.body);
    const hit = await focused.evaluate(matches as (el: Element | Node) => boolean);
    await focused.dispose();
    if (hit) return;
  }
  throw new Error(`Tab never reached the element (${matches.toString()})`);
}

describe('accessibility of the field forms', () => {
  let server: TestServer;
  let context: BrowserContext;
  let page: Page;
  let surveyUrl = '';

  beforeAll(async () => {
    server = await startServer(distDir);
    context = await launchContext({ viewport: PHONE });
    page = await context.newPage();
    page.setDefaultTimeout(10_000);
    page.on('dialog', (d) => void d.accept());
    await page.goto(server.url);
    await page.getByRole('heading', { level: 1, name: 'Buildings' }).waitFor();
    await waitForServiceWorkerControl(page);
  });

  afterAll(async () => {
    await context?.close();
    await server?.close().catch(() => undefined);
  });

  it('injects axe-core under the app’s Content Security Policy without violating it', async () => {
    const cspErrors: string[] = [];
    page.on('console', (m) => {
      if (m.text().includes('Content Security Policy')) cspErrors.push(m.text());
    });
    const violations = await axe(page);
    expect(Array.isArray(violations)).toBe(true);
    expect(await page.evaluate(() => typeof (window as { axe?: unknown }).axe)).toBe('object');
    expect(cspErrors).toEqual([]);
  });

  it('builds a survey from the keyboard alone', async () => {
    await page.goto(server.url);
    await page.getByRole('heading', { level: 1, name: 'Buildings' }).waitFor();
    await tabTo(page, (el) => el.textContent?.includes('New survey') === true);
    await page.keyboard.press('Enter');
    await page.getByRole('textbox', { name: 'Address or description' }).waitFor();
    surveyUrl = page.url().replace(/\/place$/, '');
    await tabTo(page, (el) => el.id === 'f-address');
    await page.keyboard.type('3 Mill Steps (keyboard)');

    // Step bar → Building.
    await tabTo(page, (el) => el.getAttribute('href')?.endsWith('/building') === true);
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { level: 1, name: /Building/ }).waitFor();
    // The new step starts at its heading.
    expect(await page.evaluate(() => document.activeElement?.tagName)).toBe('H1');
    await tabTo(page, (el) => el.getAttribute('aria-label') === 'Add a storey');
    await page.keyboard.press('Enter');
    await tabTo(page, (el) => el.id === 'f-quick-heightM');
    await page.keyboard.type('3.1');
    await page.keyboard.press('Tab');
    await page.keyboard.type('80');
    await tabTo(page, (el) => el.textContent === 'Confirm all storeys');
    await page.keyboard.press('Enter');
    await page.keyboard.press('Shift+Tab');
    await tabTo(page, (el) => el.textContent === 'Confirm the defaults', 200);
    await page.keyboard.press('Enter');

    // Walls: one total per direction; the direction radio moves with the arrow keys.
    await page.goto(`${surveyUrl}/walls`);
    await page.getByRole('heading', { level: 1, name: /Walls/ }).waitFor();
    await tabTo(page, (el) => el.id === 'f-walls-1X-total-wsp-100-lengthM');
    await page.keyboard.type('9');
    await page.keyboard.press('Shift+Tab');
    await tabTo(
      page,
      (el) =>
        (el as HTMLInputElement).name === 'f-ui-direction' && (el as HTMLInputElement).checked,
    );
    await page.keyboard.press('ArrowRight');
    await tabTo(page, (el) => el.id.startsWith('f-walls-') && el.id.includes('wsp-100'));
    await page.keyboard.type('7');

    // Hazard: choose the event spectrum with the keyboard and type its three values.
    await page.goto(`${surveyUrl}/hazard`);
    await page.getByRole('heading', { level: 1, name: /Hazard/ }).waitFor();
    await tabTo(page, (el) => (el as HTMLInputElement).name === 'f-hazard-kind');
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('ArrowDown');
    await tabTo(page, (el) => el.id === 'f-hazard-pga');
    await page.keyboard.type('0.3');
    await page.keyboard.press('Tab');
    await page.keyboard.type('0.7');
    await page.keyboard.press('Tab');
    await page.keyboard.type('0.3');
    await tabTo(page, (el) => el.textContent?.includes('See the verdict') === true);
    await page.keyboard.press('Enter');
    await page.getByRole('heading', { level: 1, name: 'Verdict' }).waitFor();
    const period = await page.locator('.figures__row').first().textContent();
    expect(period).toMatch(/\d+\.\d\d s/);
    await page.screenshot({ path: `${screenshotDir}a11y-keyboard-result.png` });
  });

  const screens: { name: string; path: () => string; heading: RegExp }[] = [
    { name: 'home', path: () => '/', heading: /Buildings/ },
    {
      name: 'place',
      path: () => `${surveyUrl.replace(/^https?:\/\/[^/]+/, '')}/place`,
      heading: /Place/,
    },
    {
      name: 'building',
      path: () => `${surveyUrl.replace(/^https?:\/\/[^/]+/, '')}/building`,
      heading: /Building/,
    },
    {
      name: 'walls',
      path: () => `${surveyUrl.replace(/^https?:\/\/[^/]+/, '')}/walls`,
      heading: /Walls/,
    },
    {
      name: 'observations',
      path: () => `${surveyUrl.replace(/^https?:\/\/[^/]+/, '')}/observations`,
      heading: /Observations/,
    },
    {
      name: 'hazard',
      path: () => `${surveyUrl.replace(/^https?:\/\/[^/]+/, '')}/hazard`,
      heading: /Hazard/,
    },
    {
      name: 'result',
      path: () => `${surveyUrl.replace(/^https?:\/\/[^/]+/, '')}/result`,
      heading: /Verdict/,
    },
    { name: 'settings', path: () => '/settings', heading: /Settings/ },
  ];

  for (const contrast of ['normal', 'high'] as const) {
    it(`finds no serious or critical violation and no unlabelled input on any screen (${contrast} contrast)`, async () => {
      await page.goto(`${server.url}/settings`);
      await page.getByRole('heading', { level: 1, name: 'Settings' }).waitFor();
      const box = page.getByRole('checkbox', { name: 'High contrast, for bright sunlight' });
      if ((await box.isChecked()) !== (contrast === 'high')) await box.click();
      // A rocking wall, so the walls and result screens show their panel fields and gauge.
      await page.goto(`${surveyUrl}/walls`);
      await page.getByRole('heading', { level: 1, name: /Walls/ }).waitFor();
      if ((await page.getByRole('heading', { name: /^Wall 1X-/ }).count()) === 0) {
        await page.getByRole('button', { name: 'Add a rocking wall' }).click();
      }
      const found: Record<string, Violation[]> = {};
      const unlabelled: Record<string, string[]> = {};
      for (const s of screens) {
        await page.goto(server.url + s.path());
        await page.getByRole('heading', { level: 1, name: s.heading }).waitFor();
        await page.waitForTimeout(300);
        const v = serious(await axe(page));
        if (v.length > 0) found[s.name] = v;
        const u = await unlabelledInputs(page);
        if (u.length > 0) unlabelled[s.name] = u;
        await page.screenshot({ path: `${screenshotDir}a11y-${contrast}-${s.name}.png` });
      }
      expect(found).toEqual({});
      expect(unlabelled).toEqual({});
    });
  }
});
