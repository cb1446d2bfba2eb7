/**
 * Map filters and their faceted counts, checked against a brute-force count (each value
 * chosen in turn and the filter applied from scratch), and the split of surveys into
 * points and surveys without location.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  FACETS,
  NO_FILTER,
  applyFilter,
  dataRange,
  facetCounts,
  isUnfiltered,
  toggleValue,
  type Facet,
  type MapFilter,
} from '../../web/map/map-filters.js';
import { DAMAGE_KEYS, POSTING_KEYS, toMapData, type MapPoint } from '../../web/map/map-points.js';
import { makeTown } from '../fixtures/exchange/town.js';

const SYSTEMS = ['light-frame', 'mass-timber-panel', 'rocking-wall', 'heavy-timber-frame'] as const;
const INSPECTORS = ['A', 'B', 'C'];
const DAYS = ['2025-05-12', '2025-05-13', '2025-05-14'];

const pointArb: fc.Arbitrary<MapPoint> = fc.record({
  id: fc.uuid(),
  lat: fc.double({ min: -80, max: 80, noNaN: true }),
  lon: fc.double({ min: -179, max: 179, noNaN: true }),
  posting: fc.constantFrom(...POSTING_KEYS),
  damage: fc.constantFrom(...DAMAGE_KEYS),
  system: fc.constantFrom(...SYSTEMS),
  inspector: fc.constantFrom(...INSPECTORS),
  day: fc.constantFrom(...DAYS),
  needsAssessment: fc.boolean(),
  address: fc.string(),
  revision: fc.integer({ min: 1, max: 9 }),
  updatedAt: fc.constant('2025-05-12T10:00:00.000Z'),
  conflict: fc.boolean(),
});

const VALUES: Record<Facet, readonly string[]> = {
  posting: POSTING_KEYS,
  damage: DAMAGE_KEYS,
  system: SYSTEMS,
  inspector: INSPECTORS,
  assessment: ['needed', 'not-needed'],
};

const filterArb: fc.Arbitrary<MapFilter> = fc.record({
  posting: fc.subarray([...POSTING_KEYS]).map((a) => new Set(a)),
  damage: fc.subarray([...DAMAGE_KEYS]).map((a) => new Set(a)),
  system: fc.subarray([...SYSTEMS]).map((a) => new Set(a)),
  inspector: fc.subarray(INSPECTORS).map((a) => new Set(a)),
  assessment: fc.subarray(['needed', 'not-needed'] as const).map((a) => new Set(a)),
  from: fc.option(fc.constantFrom(...DAYS), { nil: null }),
  to: fc.option(fc.constantFrom(...DAYS), { nil: null }),
});

describe('map filters', () => {
  it('gives each value the count that choosing it alone in its facet would show (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(pointArb, { maxLength: 60 }), filterArb, (points, filter) => {
        const counts = facetCounts(points, filter);
        for (const facet of FACETS) {
          for (const value of VALUES[facet]) {
            const only = { ...filter, [facet]: new Set([value]) } as MapFilter;
            const expected = applyFilter(points, only).length;
            expect(counts[facet].get(value) ?? 0).toBe(expected);
          }
        }
      }),
      { numRuns: 300 },
    );
  });

  it('shows everything with no filter, and a survey passes only when every facet lets it', () => {
    const { points } = toMapData(makeTown(200, { seed: 3 }));
    expect(applyFilter(points, NO_FILTER)).toHaveLength(200);
    expect(isUnfiltered(NO_FILTER)).toBe(true);
    const f = toggleValue(toggleValue(NO_FILTER, 'posting', 'keep-out'), 'assessment', 'needed');
    const shown = applyFilter(points, f);
    expect(shown.length).toBe(
      points.filter((p) => p.posting === 'keep-out' && p.needsAssessment).length,
    );
    expect(isUnfiltered(f)).toBe(false);
    // Toggling again removes the value.
    expect(toggleValue(f, 'posting', 'keep-out').posting.size).toBe(0);
  });

  it('filters by survey day, inclusive at both ends', () => {
    const { points } = toMapData(makeTown(300, { seed: 4 }));
    const { firstDay, lastDay } = dataRange(points);
    expect(firstDay).toBe('2025-05-12');
    expect(lastDay).toBe('2025-05-14');
    const day2 = applyFilter(points, { ...NO_FILTER, from: '2025-05-13', to: '2025-05-13' });
    expect(day2.length).toBe(points.filter((p) => p.day === '2025-05-13').length);
    expect(day2.length).toBeGreaterThan(0);
  });
});

describe('map points', () => {
  it('lists the surveys without location beside the map instead of dropping them', () => {
    const town = makeTown(100, { seed: 6, withoutLocation: 0.2 });
    const { points, unplaced } = toMapData(town);
    expect(points.length + unplaced.length).toBe(100);
    expect(unplaced.map((u) => u.id)).toEqual(
      town.filter((r) => r.location === null).map((r) => r.id),
    );
    expect(unplaced.length).toBeGreaterThan(5);
  });

  it('reads posting, damage state and the assessment flag from the result, and "unscreened" without one', () => {
    const town = makeTown(50, { seed: 7, unscreened: 0.3 });
    const { points } = toMapData(town, new Set([town[0]!.id]));
    points.forEach((p, i) => {
      const r = town[i]!;
      const res = r.result?.result as Record<string, unknown> | undefined;
      expect(p.posting).toBe(res ? res['posting'] : 'unscreened');
      expect(p.damage).toBe(res ? res['damageState'] : 'unknown');
      expect(p.needsAssessment).toBe(res ? res['needsAssessment'] : false);
    });
    expect(points[0]?.conflict).toBe(true);
    expect(points.slice(1).some((p) => p.conflict)).toBe(false);
  });
});
