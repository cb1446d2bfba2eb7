/**
 * Two tabs on one survey, in real Chromium (one profile, so one IndexedDB and one
 * BroadcastChannel): each tab is told the other has the survey open; a save in one shows up
 * in the other; when both change it at once, the later writer is told, both versions are
 * kept in the revisions, and the inspector's choice becomes the current one.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { distDir, launchContext, startServer, type TestServer } from './support/index.js';
import { newSurvey, readRawStores, surveyIdOf, waitSaved } from './support/storage-db.js';

interface RevisionRow {
  surveyId: string;
  kind: string;
  record: { address: string };
}

describe('two tabs editing the same survey', () => {
  let server: TestServer;
  let context: BrowserContext;
  let a: Page;
  let b: Page;
  let id = '';
  const pageErrors: string[] = [];

  beforeAll(async () => {
    server = await startServer(distDir);
    context = await launchContext();
    a = await context.newPage();
    b = await context.newPage();
    for (const p of [a, b]) p.on('pageerror', (e) => pageErrors.push(e.message));
    const url = await newSurvey(a, server.url);
    id = surveyIdOf(url);
    await b.goto(url);
    await b.getByLabel('Address or description').waitFor();
  });

  afterAll(async () => {
    await context.close();
    await server.close();
  });

  const address = (p: Page) => p.getByLabel('Address or description');
  const revisions = async (p: Page) =>
    ((await readRawStores(p)).revisions as RevisionRow[]).filter((r) => r.surveyId === id);

  it('tells each tab that the survey is open in the other', async () => {
    for (const p of [a, b]) {
      await p.getByText('This survey is also open in another tab.').waitFor({ timeout: 10_000 });
    }
  });

  it('shows a save made in one tab in the other', async () => {
    await address(a).fill('12 Alder Row');
    await waitSaved(a);
    await expect.poll(() => address(b).inputValue(), { timeout: 10_000 }).toBe('12 Alder Row');
    await b.getByText('This survey was updated in another tab').waitFor();
  });

  it('tells the later writer of two simultaneous edits, keeps both, and keeps the chosen one', async () => {
    const before = (await revisions(a)).length;
    // Both tabs change the field within a few milliseconds: neither has seen the other.
    await Promise.all([address(b).fill('B: 14 Alder Row'), address(a).fill('A: 16 Alder Row')]);
    const alert = (p: Page) => p.getByRole('alert').filter({ hasText: 'Both versions are kept' });
    await expect
      .poll(async () => (await alert(a).count()) + (await alert(b).count()), { timeout: 10_000 })
      .toBe(1);
    const later = (await alert(a).count()) === 1 ? a : b;
    const earlier = later === a ? b : a;
    const laterText = later === a ? 'A: 16 Alder Row' : 'B: 14 Alder Row';
    const earlierText = later === a ? 'B: 14 Alder Row' : 'A: 16 Alder Row';

    // Nothing was overwritten: the current row is the earlier writer's, the later one's is
    // a conflict revision.
    await expect
      .poll(async () => (await revisions(a)).length, { timeout: 10_000 })
      .toBeGreaterThanOrEqual(before + 2);
    const revs = await revisions(a);
    expect(revs.some((r) => r.kind === 'save' && r.record.address === earlierText)).toBe(true);
    expect(revs.some((r) => r.kind === 'conflict' && r.record.address === laterText)).toBe(true);
    const current = (await readRawStores(a)).surveys as Array<{
      id: string;
      record: { address: string };
    }>;
    expect(current.find((r) => r.id === id)?.record.address).toBe(earlierText);
    expect(await address(later).inputValue()).toBe(laterText); // still on the later tab's screen

    // The later writer keeps its version: it becomes current and the other tab shows it.
    await later.getByRole('button', { name: 'Keep this version' }).click();
    await waitSaved(later);
    await expect.poll(() => address(earlier).inputValue(), { timeout: 10_000 }).toBe(laterText);
    const after = (await readRawStores(a)).surveys as Array<{
      id: string;
      record: { address: string };
    }>;
    expect(after.find((r) => r.id === id)?.record.address).toBe(laterText);
    const all = (await revisions(a)).map((r) => r.record.address);
    expect(all).toContain(earlierText);
    expect(all).toContain(laterText);
    expect(pageErrors).toEqual([]);
  });
});
