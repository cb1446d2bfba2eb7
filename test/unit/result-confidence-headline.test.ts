import { describe, expect, it } from 'vitest';
import type { ScreeningResult } from '../../calc/index.js';
import { makeDemoTown } from '../../scripts/demo-town.js';
import { confidenceHeadline } from '../../web/screens/result/confidence-headline.js';

const results = makeDemoTown().map((r) => r.result?.result as unknown as ScreeningResult);

describe('confidenceHeadline', () => {
  it('stops every demo statement before its lists, which the screen shows below', () => {
    const withLists = results.filter((r) => r.confidence.missing.length > 0);
    expect(withLists.length).toBeGreaterThan(0);
    for (const r of results) {
      const head = confidenceHeadline(r.confidence.statement);
      expect(r.confidence.statement.startsWith(head)).toBe(true);
      expect(head).not.toMatch(/Missing or unusable:|Key defaults:/);
      expect(head).toMatch(/^Confidence (normal|reduced|low)/);
    }
    for (const r of withLists) {
      expect(confidenceHeadline(r.confidence.statement).length).toBeLessThan(
        r.confidence.statement.length,
      );
    }
  });

  it('returns a statement without lists as it is', () => {
    expect(confidenceHeadline('Confidence normal for a screening.')).toBe(
      'Confidence normal for a screening.',
    );
  });
});
