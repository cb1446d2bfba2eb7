/**
 * The app opens with no network after one visit: on reload, on a deep link, in a new page,
 * and after the browser itself was restarted.
 */
import { mkdirSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import {
  distDir,
  freshProfileDir,
  launchContext,
  screenshotDir,
  startServer,
  waitForServiceWorkerControl,
  type TestServer,
} from './support/index.js';

async function expectHomeScreen(page: Page): Promise<void> {
  await page.getByRole('heading', { level: 1, name: 'Buildings' }).waitFor({ timeout: 15_000 });
  expect(await page.getByRole('button', { name: 'New survey' }).first().isVisible()).toBe(true);
}

async function expectAppShell(page: Page): Promise<void> {
  await page.getByRole('navigation', { name: 'Main' }).waitFor({ timeout: 15_000 });
  expect(await page.getByRole('heading', { level: 1 }).first().isVisible()).toBe(true);
}

describe('offline start', () => {
  let server: TestServer | null = null;
  let context: BrowserContext | null = null;
  const profile = freshProfileDir();
  let origin = '';

  beforeAll(async () => {
    mkdirSync(screenshotDir, { recursive: true });
    server = await startServer(distDir);
    context = await launchContext({ userDataDir: profile });
  });

  afterAll(async () => {
    await context?.close();
    await server?.close().catch(() => undefined);
  });

  it('renders the home screen from the cache once the server is gone and the network is off', async () => {
    if (!server || !context) throw new Error('setup failed');
    origin = server.url;
    const page = await context.newPage();
    await page.goto(server.url);
    await expectHomeScreen(page);
    await waitForServiceWorkerControl(page);

    await server.close();
    server = null;
    await context.setOffline(true);

    await page.reload();
    await expectHomeScreen(page);
    await page.screenshot({ path: `${screenshotDir}offline-reload.png` });
  });

  it('opens deep app URLs offline', async () => {
    if (!context) throw new Error('setup failed');
    const page = await context.newPage();
    for (const path of [
      '/settings',
      '/map',
      '/survey/00000000-0000-4000-8000-000000000000/walls',
    ]) {
      const response = await page.goto(origin + path);
      expect(response?.ok() ?? true).toBe(true);
      await expectAppShell(page);
    }
    await page.screenshot({ path: `${screenshotDir}offline-deep-link.png` });
  });

  it('opens a new page in the same context offline', async () => {
    if (!context) throw new Error('setup failed');
    const page = await context.newPage();
    await page.goto(origin + '/');
    await expectHomeScreen(page);
  });

  it('opens offline after the browser was closed and started again', async () => {
    if (!context) throw new Error('setup failed');
    await context.close();
    context = await launchContext({ userDataDir: profile });
    await context.setOffline(true);
    const page = context.pages()[0] ?? (await context.newPage());
    await page.goto(origin + '/');
    await expectHomeScreen(page);
    await page.screenshot({ path: `${screenshotDir}offline-after-restart.png` });
  });
});
