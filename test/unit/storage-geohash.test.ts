import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cellOf, decodeGeohash, encodeGeohash } from '../../web/storage/index.js';

describe('geohash cells for the location index', () => {
  // Reference: the worked examples of the Geohash article (Wikipedia, "Geohash"), which
  // follow G. Niemeyer's geohash.org: ezs42 ↔ 42.6, −5.6 and u4pruydqqvj ↔ 57.64911, 10.40744.
  it('encodes the published examples', () => {
    expect(encodeGeohash(42.6, -5.6, 5)).toBe('ezs42');
    expect(encodeGeohash(57.64911, 10.40744, 11)).toBe('u4pruydqqvj');
  });

  it('decodes ezs42 to the published cell centre 42.605, −5.603', () => {
    const b = decodeGeohash('ezs42');
    expect((b.south + b.north) / 2).toBeCloseTo(42.605, 3);
    expect((b.west + b.east) / 2).toBeCloseTo(-5.603, 3);
  });

  it('puts every position inside its own cell, and every prefix cell contains it', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -90, max: 90, noNaN: true }),
        fc.double({ min: -180, max: 180, noNaN: true }),
        (lat, lon) => {
          const h = encodeGeohash(lat, lon);
          expect(h).toHaveLength(9);
          for (let n = 1; n <= 9; n++) {
            const b = decodeGeohash(h.slice(0, n));
            expect(lat >= b.south && lat <= b.north && lon >= b.west && lon <= b.east).toBe(true);
          }
        },
      ),
    );
  });

  it('throws with the bad value for positions off the globe or bad precision', () => {
    expect(() => encodeGeohash(91, 0)).toThrow('lat must be a finite number in [-90, 90], got 91');
    expect(() => encodeGeohash(0, NaN)).toThrow(
      'lon must be a finite number in [-180, 180], got NaN',
    );
    expect(() => encodeGeohash(0, 0, 0)).toThrow('precision must be an integer in [1, 12], got 0');
    expect(() => decodeGeohash('ab!')).toThrow('not a geohash character: "a" in "ab!"');
  });

  it('gives a record without a location no cell (so the index leaves it out)', () => {
    expect(cellOf({ location: null })).toBeUndefined();
    expect(
      cellOf({ location: { lat: 42.6, lon: -5.6, accuracyM: null, source: 'map' } })?.slice(0, 5),
    ).toBe('ezs42');
  });
});
