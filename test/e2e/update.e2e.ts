/**
 * A new deployment while a page is open: the update notice appears, the page does not
 * reload by itself, and the new version takes over only when the user accepts.
 */
import { cpSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { execFileSync } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import {
  distDir,
  launchContext,
  repoRoot,
  screenshotDir,
  startServer,
  waitForServiceWorkerControl,
  type TestServer,
} from './support/index.js';

const SECOND_BUILD_ID = 'e2e-second-build';

describe('update flow', () => {
  let server: TestServer | null = null;
  let context: BrowserContext | null = null;
  const firstDir = mkdtempSync(join(tmpdir(), 'grainline-v1-'));
  const secondDir = mkdtempSync(join(tmpdir(), 'grainline-v2-'));

  beforeAll(async () => {
    cpSync(distDir, firstDir, { recursive: true });
    // A real second build, differing only in its build id (as a new release would).
    execFileSync(
      process.execPath,
      [
        join(repoRoot, 'node_modules/vite/bin/vite.js'),
        'build',
        '--outDir',
        secondDir,
        '--emptyOutDir',
        '--logLevel',
        'error',
      ],
      {
        cwd: repoRoot,
        env: { ...process.env, NODE_ENV: 'production', GRAINLINE_BUILD_ID: SECOND_BUILD_ID },
        stdio: 'inherit',
      },
    );
    server = await startServer(firstDir);
    context = await launchContext();
  }, 120_000);

  afterAll(async () => {
    await context?.close();
    await server?.close();
  });

  it('shows the notice and waits for the user before reloading', async () => {
    if (!server || !context) throw new Error('setup failed');
    const page = await context.newPage();
    await page.goto(server.url);
    await waitForServiceWorkerControl(page);

    let navigations = 0;
    page.on('framenavigated', (frame) => {
      if (frame === page.mainFrame()) navigations += 1;
    });
    await page.evaluate(() => {
      (window as unknown as { unsavedMarker: string }).unsavedMarker = 'still here';
    });

    server.setRoot(secondDir);
    await page.evaluate(async () => {
      const registration = await navigator.serviceWorker.getRegistration();
      await registration?.update();
    });

    const notice = page.getByText('A new version of Grainline is ready.');
    await notice.waitFor({ timeout: 30_000 });
    await page.screenshot({ path: `${screenshotDir}update-notice.png` });

    // Give a self-reloading app every chance to misbehave: the waiting worker is installed,
    // so any automatic takeover would happen now.
    await page.waitForTimeout(3_000);
    expect(navigations).toBe(0);
    expect(
      await page.evaluate(() => (window as unknown as { unsavedMarker?: string }).unsavedMarker),
    ).toBe('still here');
    expect(await notice.isVisible()).toBe(true);

    const reloaded = page.waitForEvent('load', { timeout: 30_000 });
    await page.getByRole('button', { name: 'Update now' }).click();
    await reloaded;
    expect(
      await page.evaluate(() => (window as unknown as { unsavedMarker?: string }).unsavedMarker),
    ).toBe(undefined);

    await page.goto(new URL('/settings', server.url).href);
    await page.getByText(`Build ${SECOND_BUILD_ID}`).waitFor({ timeout: 15_000 });
  });
});
