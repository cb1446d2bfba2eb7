/**
 * Crash safety in real Chromium: type into the first step's "Address or description", wait
 * 400 ms, SIGKILL the browser's whole process group (no unload, no flush: what a crash, a
 * dead battery's last moment or the phone's memory killer does), start it again on the same
 * profile, and the typed value is there. Ten rounds, each with new random text (seeded, so
 * a failure can be replayed).
 */
import { mkdirSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { mulberry32 } from '../bench/prng.js';
import {
  distDir,
  freshProfileDir,
  screenshotDir,
  startServer,
  type TestServer,
} from './support/index.js';
import { spawnChromium, type SpawnedBrowser } from './support/spawned-browser.js';

const ROUNDS = 10;
const SEED = 0x5eed_0006;
/** Letters, digits, punctuation, accents, CJK, an emoji: what an address or note may hold. */
const ALPHABET = [
  ...'abcdefghijklmnopqrstuvwxyzABCDEFGHIJKLMNOPQRSTUVWXYZ0123456789 ,.-/#&()\'"',
  ...'éèàüöçñøåßłž',
  ...'東京大阪',
  '🏠',
];

function randomText(rand: () => number): string {
  const length = 3 + Math.floor(rand() * 40);
  let s = '';
  for (let i = 0; i < length; i++) s += ALPHABET[Math.floor(rand() * ALPHABET.length)];
  // The field keeps what was typed; leading and trailing spaces included. Start with a
  // letter so the text never looks empty.
  return `R${s}`;
}

async function openPlace(page: Page, url: string): Promise<void> {
  await page.goto(url);
  await page.getByRole('textbox', { name: 'Address or description' }).waitFor({ timeout: 30_000 });
}

describe('crash safety: a typed value survives SIGKILL of the browser', () => {
  let server: TestServer;
  let running: SpawnedBrowser | null = null;
  const profile = freshProfileDir('grainline-crash-');
  let placeUrl = '';

  beforeAll(async () => {
    mkdirSync(screenshotDir, { recursive: true });
    server = await startServer(distDir);
    running = await spawnChromium(profile);
    const page = running.context.pages()[0] ?? (await running.context.newPage());
    await page.goto(server.url);
    await page.getByRole('button', { name: 'New survey' }).click();
    await page.getByRole('textbox', { name: 'Address or description' }).waitFor();
    placeUrl = page.url();
    expect(placeUrl).toMatch(/\/survey\/[0-9a-f-]{36}\/place$/);
    await page.locator('[data-save-state="saved"]').waitFor();
  });

  afterAll(async () => {
    await running?.close();
    await server?.close();
  });

  it(`keeps the value typed 400 ms before the kill, ${ROUNDS} times with random text`, async () => {
    const rand = mulberry32(SEED);
    const seen: string[] = [];
    for (let round = 0; round < ROUNDS; round++) {
      const browser = running as SpawnedBrowser;
      const page = browser.context.pages()[0] ?? (await browser.context.newPage());
      await openPlace(page, placeUrl);
      const field = page.getByRole('textbox', { name: 'Address or description' });
      const text = randomText(rand);
      await field.fill('');
      await field.pressSequentially(text, { delay: 5 });
      await page.waitForTimeout(400);
      await browser.kill();
      running = null;

      running = await spawnChromium(profile);
      const again = running.context.pages()[0] ?? (await running.context.newPage());
      await openPlace(again, placeUrl);
      const value = await again
        .getByRole('textbox', { name: 'Address or description' })
        .inputValue();
      if (round === 0) await again.screenshot({ path: `${screenshotDir}storage-crash-after.png` });
      seen.push(value);
      expect(value, `round ${round + 1}: typed ${JSON.stringify(text)}`).toBe(text);
    }
    expect(seen).toHaveLength(ROUNDS);
  });
});
