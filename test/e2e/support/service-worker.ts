/** Waits for the service worker to control a page (after which the app works offline). */
import type { Page } from 'playwright-core';

export async function waitForServiceWorkerControl(page: Page, timeoutMs = 30_000): Promise<void> {
  await page.waitForFunction(
    async () => {
      await navigator.serviceWorker.ready;
      return navigator.serviceWorker.controller !== null;
    },
    undefined,
    { timeout: timeoutMs },
  );
}
