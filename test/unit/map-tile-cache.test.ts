/**
 * The tile cache's rules (sw/tile-cache-policy.ts): which requests are tiles, freshness
 * from HTTP caching headers (RFC 9111 §5.2.2.1 max-age, §5.3 Expires), and the byte cap.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  DEFAULT_TILE_MAX_AGE_MS,
  TileBudget,
  isFresh,
  isTileRequest,
  maxAgeFrom,
} from '../../sw/tile-cache-policy.js';

const SELF = 'https://grainline.example';
const tile = (u: string, method = 'GET', dest = 'image') =>
  isTileRequest(new URL(u), method, dest, SELF);

describe('tile requests', () => {
  it('recognises slippy-map tiles of other origins', () => {
    expect(tile('https://tile.openstreetmap.org/15/17234/11721.png')).toBe(true);
    expect(tile('https://a.tiles.example/v1/3/4/2@2x.webp')).toBe(true);
    expect(tile('https://tiles.example/8/130/90.jpg?key=abc')).toBe(true);
  });

  it('leaves the app itself, other methods and non-tile paths alone', () => {
    expect(tile(`${SELF}/15/1/2.png`)).toBe(false);
    expect(tile('https://tile.openstreetmap.org/15/17234/11721.png', 'POST')).toBe(false);
    expect(tile('https://tile.openstreetmap.org/15/17234/11721.png', 'GET', 'script')).toBe(false);
    expect(tile('https://cdn.example/assets/logo.png')).toBe(false);
    expect(tile('https://tiles.example/15/1/2.pbf')).toBe(false);
  });
});

describe('tile freshness', () => {
  const now = Date.parse('2031-05-12T10:00:00Z');

  it('honours max-age, and no-cache / no-store as never fresh', () => {
    expect(maxAgeFrom('public, max-age=604800', null, null, now)).toBe(604_800_000);
    expect(maxAgeFrom('max-age="60"', null, null, now)).toBe(60_000);
    expect(maxAgeFrom('no-cache', null, null, now)).toBe(0);
    expect(maxAgeFrom('no-store, max-age=100', null, null, now)).toBe(0);
  });

  it('falls back to Expires relative to Date, then to the default', () => {
    expect(
      maxAgeFrom(null, 'Mon, 12 May 2031 11:00:00 GMT', 'Mon, 12 May 2031 10:00:00 GMT', now),
    ).toBe(3_600_000);
    expect(maxAgeFrom(null, null, null, now)).toBe(DEFAULT_TILE_MAX_AGE_MS);
    expect(maxAgeFrom('public', 'not a date', null, now)).toBe(DEFAULT_TILE_MAX_AGE_MS);
  });

  it('uses a tile only while it is younger than its lifetime', () => {
    expect(isFresh(now - 59_000, 60_000, now)).toBe(true);
    expect(isFresh(now - 60_000, 60_000, now)).toBe(false);
    expect(isFresh(now, 0, now)).toBe(false);
  });
});

describe('tile cache budget', () => {
  it('drops the least recently used tiles once over the byte cap', () => {
    const b = new TileBudget(100, 1000);
    expect(b.add('a', 40, 1)).toEqual([]);
    expect(b.add('b', 40, 2)).toEqual([]);
    b.touch('a', 3); // a is now newer than b
    expect(b.add('c', 40, 4)).toEqual(['b']);
    expect(b.totalBytes).toBe(80);
    expect(b.has('a') && b.has('c') && !b.has('b')).toBe(true);
  });

  it('drops tiles once over the entry cap', () => {
    const b = new TileBudget(1e9, 2);
    b.add('a', 1, 1);
    b.add('b', 1, 2);
    expect(b.add('c', 1, 3)).toEqual(['a']);
    expect(b.size).toBe(2);
  });

  it('counts a re-stored tile once', () => {
    const b = new TileBudget(100, 10);
    b.add('a', 30, 1);
    b.add('a', 50, 2);
    expect(b.totalBytes).toBe(50);
    expect(b.size).toBe(1);
  });

  it('never goes over its caps, whatever is added (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 10_000 }),
        fc.integer({ min: 1, max: 50 }),
        fc.array(fc.tuple(fc.integer({ min: 0, max: 30 }), fc.integer({ min: 0, max: 3_000 })), {
          maxLength: 200,
        }),
        (maxBytes, maxEntries, adds) => {
          const b = new TileBudget(maxBytes, maxEntries);
          adds.forEach(([key, bytes], t) => {
            b.add(`tile-${key}`, bytes, t);
            // A single tile larger than the cap is dropped at once, so the cap always holds.
            expect(b.totalBytes).toBeLessThanOrEqual(maxBytes);
            expect(b.size).toBeLessThanOrEqual(maxEntries);
          });
        },
      ),
    );
  });

  it('refuses bad sizes and caps with the bad value in the message', () => {
    expect(() => new TileBudget(0, 1)).toThrow(/0 bytes/);
    expect(() => new TileBudget(1, 1).add('a', Number.NaN, 0)).toThrow(/NaN/);
  });
});
