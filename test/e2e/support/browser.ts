/**
 * Finds and launches the system Chromium for browser tests and scripts.
 *
 * Browser downloads do not work on our machines, so we never call `playwright install`:
 * we use playwright-core with Debian's Chromium. CHROME_PATH overrides the search.
 */
import { existsSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Browser, type BrowserContext, type LaunchOptions } from 'playwright-core';

/** Flags every launch uses: headless, no sandbox (root in CI), no background traffic. */
export const CHROMIUM_FLAGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-quic',
];

const CANDIDATES = [
  '/usr/bin/chromium',
  '/usr/bin/chromium-browser',
  '/usr/bin/google-chrome',
  '/usr/bin/google-chrome-stable',
  '/snap/bin/chromium',
];

/** The Chromium executable, or throws a message that says how to install one. */
export function findChromium(): string {
  const override = process.env.CHROME_PATH;
  if (override) {
    if (existsSync(override)) return override;
    throw new Error(`CHROME_PATH is set to ${override}, but no file is there.`);
  }
  const found = CANDIDATES.find((p) => existsSync(p));
  if (found) return found;
  throw new Error(
    'No Chromium found for the browser tests. Install one with `sudo apt-get install -y chromium` ' +
      '(Debian/Ubuntu), or set CHROME_PATH to a Chrome or Chromium executable. ' +
      `Looked in: ${CANDIDATES.join(', ')}.`,
  );
}

/** A fresh, empty profile directory, so no test sees another's storage. */
export function freshProfileDir(prefix = 'grainline-profile-'): string {
  return mkdtempSync(join(tmpdir(), prefix));
}

/**
 * Launches a persistent context in a fresh profile (service workers need a real profile to
 * survive a page reload reliably). Returns the context; close it to end the browser.
 */
export async function launchContext(
  options: { viewport?: { width: number; height: number }; userDataDir?: string } = {},
): Promise<BrowserContext> {
  return chromium.launchPersistentContext(options.userDataDir ?? freshProfileDir(), {
    executablePath: findChromium(),
    args: CHROMIUM_FLAGS,
    headless: true,
    viewport: options.viewport ?? { width: 412, height: 915 },
    deviceScaleFactor: 1,
    isMobile: false,
    hasTouch: true,
  });
}

/** Launches a plain browser (no persistent profile), for benchmarks and scripts. */
export async function launchBrowser(extra: Partial<LaunchOptions> = {}): Promise<Browser> {
  return chromium.launch({
    executablePath: findChromium(),
    args: CHROMIUM_FLAGS,
    headless: true,
    ...extra,
  });
}

/** Phone viewport used across tests and screenshots. */
export const PHONE = { width: 412, height: 915 } as const;
