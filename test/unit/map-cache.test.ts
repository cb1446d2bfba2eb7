/**
 * The map's cache of survey summaries (web/map/map-cache.ts): columns decode to exactly what
 * was encoded, damaged rows are refused, changed surveys replace their old summaries, and
 * the cache round-trips through IndexedDB (fake-indexeddb).
 */
import 'fake-indexeddb/auto';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  applyChanges,
  decodeMapCache,
  encodeMapCache,
  readMapCache,
  writeMapCache,
} from '../../web/map/map-cache.js';
import { toMapData } from '../../web/map/map-points.js';
import { surveyRecordArb } from '../fixtures/records/arbitrary.js';
import { makeTown } from '../fixtures/exchange/town.js';

describe('map cache', () => {
  it('decodes exactly what was encoded, for any records (fast-check)', () => {
    fc.assert(
      fc.property(fc.array(surveyRecordArb, { maxLength: 8 }), (records) => {
        const data = toMapData(records, new Set(records.slice(0, 1).map((r) => r.id)));
        const back = decodeMapCache(
          structuredClone(encodeMapCache(data, '2025-01-01T00:00:00.000Z', 'x')),
        );
        expect(back).toEqual({ data, builtAt: '2025-01-01T00:00:00.000Z', importStamp: 'x' });
      }),
      { numRuns: 150 },
    );
  });

  it('refuses a damaged or foreign row instead of drawing nonsense', () => {
    const row = encodeMapCache(toMapData(makeTown(5, { seed: 1 })), 'now', null);
    expect(decodeMapCache({ ...row, format: 99 })).toBeNull();
    expect(decodeMapCache({ ...row, ids: row.ids.slice(1) })).toBeNull();
    expect(decodeMapCache({ ...row, posting: new Uint8Array([9, 9, 9, 9, 9]) })).toBeNull();
    expect(decodeMapCache('garbage')).toBeNull();
    expect(decodeMapCache(null)).toBeNull();
  });

  it('replaces the summaries of changed surveys, moves one that lost its location, sets flags', () => {
    const town = makeTown(20, { seed: 2 });
    const data = toMapData(town);
    const moved = { ...town[3]!, location: null };
    const edited = { ...town[4]!, address: 'edited' };
    const added = makeTown(1, { seed: 99 })[0]!;
    const next = applyChanges(data, toMapData([moved, edited, added]), new Set([town[5]!.id]));
    expect(next.points.length + next.unplaced.length).toBe(21);
    expect(next.unplaced.some((u) => u.id === moved.id)).toBe(true);
    expect(next.points.some((p) => p.id === moved.id)).toBe(false);
    expect(next.points.find((p) => p.id === edited.id)?.address).toBe('edited');
    expect(next.points.find((p) => p.id === town[5]!.id)?.conflict).toBe(true);
  });

  it('round-trips 20 000 summaries through IndexedDB', async () => {
    const data = toMapData(makeTown(20_000, { seed: 3, withoutLocation: 0.02 }));
    await writeMapCache(data, '2025-05-20T10:00:00.000Z', 'stamp');
    const back = await readMapCache();
    expect(back?.data).toEqual(data);
    expect(back?.importStamp).toBe('stamp');
  });
});
