/**
 * The phone instruments in the real app, in Chromium: real `devicemotion` events
 * (DeviceMotionEvent with accelerationIncludingGravity) are dispatched on the page at 100 Hz,
 * in real time, with the page's own clock stamping them.
 *
 * 1. Tilt meter on the Observations step: a face leaning 0.30° read by a phone with a
 *    0.3 m/s² zero offset, in the two positions of the reversal; the meter must show the lean
 *    and the drift ratio tan 0.30° = 0.52 %, and fill the storey's residual drift.
 * 2. Vibration recorder: 60 s of a damped oscillator at 3.6 Hz, 3 % damping, driven by seeded
 *    white noise (the exact discrete-time solution, as in test/reference/vibration-synthetic.ts),
 *    along the phone's long edge; the estimate must appear within 2 % and be saved.
 * Screenshots: test/output/screenshots/instruments-*.png.
 */
import { mkdirSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import {
  PHONE,
  distDir,
  launchContext,
  screenshotDir,
  startServer,
  type TestServer,
} from './support/index.js';

const LEAN_DEG = 0.3;
const F_HZ = 3.6;

/** Installs `window.__motion` in the page: a 100 Hz devicemotion source with three modes. */
async function installInjector(page: Page): Promise<void> {
  await page.evaluate(
    ({ leanDeg, fHz }) => {
      const G = 9.81;
      // mulberry32 (test/bench/prng.ts) and Box–Muller, seeded.
      let a = 20260101;
      const rand = () => {
        a = (a + 0x6d2b79f5) >>> 0;
        let t = a;
        t = Math.imul(t ^ (t >>> 15), t | 1);
        t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
        return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
      };
      const normal = () =>
        Math.sqrt(-2 * Math.log(rand() || 1e-12)) * Math.cos(2 * Math.PI * rand());
      // SDOF absolute acceleration at 1 kHz, 80 s, exact zero-order-hold recurrence.
      const fsim = 1000;
      const w = 2 * Math.PI * fHz;
      const z = 0.03;
      const h = 1 / fsim;
      const wd = w * Math.sqrt(1 - z * z);
      const e = Math.exp(-z * w * h);
      const c = Math.cos(wd * h);
      const s = Math.sin(wd * h);
      const a11 = e * (c + ((z * w) / wd) * s);
      const a12 = (e * s) / wd;
      const a21 = (-w * w * e * s) / wd;
      const a22 = e * (c - ((z * w) / wd) * s);
      const b1 = (2 * z * w * a12 - 1 + a22) / (w * w);
      const b2 = -a12;
      const n = 80 * fsim;
      const series = new Float64Array(n);
      let x = 0;
      let v = 0;
      const inputStd = 0.05;
      for (let i = -20 * fsim; i < n; i++) {
        const ag = inputStd * normal();
        const nx = a11 * x + a12 * v + b1 * ag;
        const nv = a21 * x + a22 * v + b2 * ag;
        x = nx;
        v = nv;
        if (i >= 0) series[i] = -2 * z * w * v - w * w * x;
      }
      const lean = (leanDeg * Math.PI) / 180;
      const offset = 0.3;
      let mode: 'tilt1' | 'tilt2' | 'vibration' | 'off' = 'off';
      let t0 = 0;
      const reading = (now: number) => {
        const noise = () => 0.004 * normal();
        if (mode === 'tilt1' || mode === 'tilt2') {
          // Turning about the long axis flips x (and z); y stays up.
          const sign = mode === 'tilt1' ? 1 : -1;
          return {
            x: sign * G * Math.sin(lean) + offset + noise(),
            y: G * Math.cos(lean) + noise(),
            z: sign * 0.1 + noise(),
          };
        }
        const u = Math.min(n - 2, ((now - t0) / 1000) * fsim);
        const k = Math.floor(u);
        const r = series[k]! + (series[k + 1]! - series[k]!) * (u - k);
        return {
          x: 0.02 + 0.01 * normal(),
          y: -0.05 + r + 0.01 * normal(),
          z: G + 0.01 * normal(),
        };
      };
      let timer: ReturnType<typeof setInterval> | null = null;
      (window as unknown as { __motion: unknown }).__motion = {
        set(m: typeof mode) {
          mode = m;
          t0 = performance.now();
          if (timer === null) {
            timer = setInterval(() => {
              if (mode === 'off') return;
              const g = reading(performance.now());
              window.dispatchEvent(
                new DeviceMotionEvent('devicemotion', {
                  accelerationIncludingGravity: g,
                  interval: 10,
                }),
              );
            }, 10);
          }
        },
        count: () => 0,
      };
    },
    { leanDeg: LEAN_DEG, fHz: F_HZ },
  );
}

const setMode = (page: Page, mode: string) =>
  page.evaluate(
    (m) => (window as unknown as { __motion: { set(m: string): void } }).__motion.set(m),
    mode,
  );

describe('phone instruments on the Observations step', () => {
  let server: TestServer | null = null;
  let context: BrowserContext | null = null;
  let page: Page;
  const pageErrors: string[] = [];

  beforeAll(async () => {
    mkdirSync(screenshotDir, { recursive: true });
    server = await startServer(distDir);
    context = await launchContext({ viewport: PHONE });
    page = await context.newPage();
    page.setDefaultTimeout(15_000);
    page.on('pageerror', (e) => pageErrors.push(e.message));
    page.on('dialog', (d) => void d.accept());
    await page.goto(server.url);
    await page.getByRole('button', { name: 'New survey' }).click();
    await page.getByRole('textbox', { name: 'Address or description' }).waitFor();
    await page
      .getByRole('navigation', { name: 'Survey steps' })
      .getByRole('link', { name: /Building/ })
      .click();
    await page.getByRole('button', { name: 'Add a storey' }).click();
    await page.getByLabel('Typical storey height').fill('3');
    await page.getByLabel('Floor area of each storey').fill('90');
    await page.getByRole('button', { name: 'Confirm all storeys' }).click();
    await page
      .getByRole('navigation', { name: 'Survey steps' })
      .getByRole('link', { name: /Observations/ })
      .click();
    await page.getByRole('heading', { level: 1, name: /Observations/ }).waitFor();
    await installInjector(page);
  });

  afterAll(async () => {
    await context?.close();
    await server?.close().catch(() => undefined);
  });

  it('measures a 0.30° lean by reversal and fills the residual drift with 0.52 %', async () => {
    await page
      .getByRole('button', { name: /Measure the lean with this phone \(Storey 1, along x\)/ })
      .click();
    const meter = page.locator('section.instrument').first();
    await setMode(page, 'tilt1');
    await meter.getByText(/Live reading: 2\.0\d°/).waitFor(); // 0.30° + the 0.3 m/s² offset ≈ 2.05°
    await meter.getByRole('button', { name: 'Measure position 1' }).click();
    await meter.getByText(/Position 2: turn the phone/).waitFor({ timeout: 20_000 });
    await page.screenshot({ path: `${screenshotDir}instruments-tilt-position2.png` });
    await setMode(page, 'tilt2');
    await page.waitForTimeout(600);
    await meter.getByRole('button', { name: 'Measure position 2' }).click();
    const lean = meter.getByText(/^Lean \d+\.\d\d° ± \d+\.\d\d°$/);
    await lean.waitFor({ timeout: 20_000 });
    const text = (await lean.textContent()) ?? '';
    const degrees = Number(/Lean (\d+\.\d+)°/.exec(text)?.[1]);
    expect(Math.abs(degrees - LEAN_DEG)).toBeLessThanOrEqual(0.02);
    await meter.getByText(/^Drift ratio 0\.5[123] % ± /).waitFor();
    await meter.getByText(/Sensor offset found and removed: 1\.7\d°/).waitFor();
    await page.screenshot({ path: `${screenshotDir}instruments-tilt-result.png` });
    await setMode(page, 'off');
    await meter.getByRole('button', { name: 'Use this drift ratio' }).click();
    await meter.getByText('Drift ratio entered from the phone tilt meter.').waitFor();
    // The survey's own reading now carries the phone's value.
    await page
      .getByText(/Residual drift 0\.5[123] %/)
      .first()
      .waitFor();
    await page.locator('[data-save-state="saved"]').waitFor({ timeout: 10_000 });
    expect(pageErrors).toEqual([]);
  }, 90_000);

  it('records 60 s of ambient vibration and shows the building frequency within 2 %', async () => {
    await page.getByRole('button', { name: 'Record the building’s own vibration' }).click();
    const rec = page.locator('section.instrument', { hasText: 'Building frequency' });
    await rec.getByText('plan x', { exact: true }).click();
    await rec.getByText('60 s', { exact: true }).click();
    await rec.screenshot({ path: `${screenshotDir}instruments-vibration-setup.png` });
    await setMode(page, 'vibration');
    await rec.getByRole('button', { name: 'Start recording' }).click();
    await rec.getByText(/Recording… \d+ of 60 s/).waitFor();
    await page.waitForTimeout(5_000);
    await page.screenshot({ path: `${screenshotDir}instruments-vibration-recording.png` });
    const estimate = rec.getByTestId('vibration-estimate');
    await estimate.waitFor({ timeout: 90_000 });
    await setMode(page, 'off');
    const text = (await estimate.textContent()) ?? '';
    const f = Number(/Fundamental frequency (\d+\.\d+) Hz/.exec(text)?.[1]);
    expect(Math.abs(f - F_HZ) / F_HZ).toBeLessThanOrEqual(0.02);
    await rec.getByText('Direction: plan x').waitFor();
    await rec.getByText(/Stiffness indicator k\/k_ref = /).waitFor();
    await expect(
      rec.getByRole('img', { name: /Spectrum of the recording/ }).isVisible(),
    ).resolves.toBe(true);
    await rec.getByText('What this measurement can and cannot tell').click();
    await rec.screenshot({ path: `${screenshotDir}instruments-vibration-result.png` });
    await rec.getByRole('button', { name: 'Save with the survey' }).click();
    await rec.getByText('Saved with the survey.').waitFor();
    await page.locator('[data-save-state="saved"]').waitFor({ timeout: 10_000 });
    expect(pageErrors).toEqual([]);
  }, 150_000);
});
