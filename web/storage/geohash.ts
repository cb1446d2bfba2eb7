/**
 * Geohash cells for the location index: a short base-32 string naming a lat/lon rectangle,
 * where every prefix is a larger rectangle containing it. Stored at precision 9 (about
 * 5 m × 5 m); the map asks for every record whose cell starts with a coarser prefix, which
 * IndexedDB answers with one key range. Pure; no storage here.
 *
 * Algorithm: G. Niemeyer's public-domain geohash (2008): interleave longitude and latitude
 * bisection bits, longitude first, five bits per base-32 character.
 */

const BASE32 = '0123456789bcdefghjkmnpqrstuvwxyz';

/** Precision of the stored cell, in characters (≈ 4.8 m × 4.8 m at the equator). */
export const CELL_PRECISION = 9;

/** The geohash of a WGS84 position. Throws on values outside the globe. */
export function encodeGeohash(
  lat: number,
  lon: number,
  precision: number = CELL_PRECISION,
): string {
  if (!(Number.isFinite(lat) && lat >= -90 && lat <= 90)) {
    throw new RangeError(`lat must be a finite number in [-90, 90], got ${lat}`);
  }
  if (!(Number.isFinite(lon) && lon >= -180 && lon <= 180)) {
    throw new RangeError(`lon must be a finite number in [-180, 180], got ${lon}`);
  }
  if (!(Number.isInteger(precision) && precision >= 1 && precision <= 12)) {
    throw new RangeError(`precision must be an integer in [1, 12], got ${precision}`);
  }
  let latLo = -90;
  let latHi = 90;
  let lonLo = -180;
  let lonHi = 180;
  let out = '';
  let bits = 0;
  let value = 0;
  let evenBit = true; // longitude first
  while (out.length < precision) {
    if (evenBit) {
      const mid = (lonLo + lonHi) / 2;
      if (lon >= mid) {
        value = value * 2 + 1;
        lonLo = mid;
      } else {
        value *= 2;
        lonHi = mid;
      }
    } else {
      const mid = (latLo + latHi) / 2;
      if (lat >= mid) {
        value = value * 2 + 1;
        latLo = mid;
      } else {
        value *= 2;
        latHi = mid;
      }
    }
    evenBit = !evenBit;
    if (++bits === 5) {
      out += BASE32[value];
      bits = 0;
      value = 0;
    }
  }
  return out;
}

/** The rectangle a geohash names: south-west and north-east corners, in degrees. */
export function decodeGeohash(hash: string): {
  south: number;
  west: number;
  north: number;
  east: number;
} {
  let latLo = -90;
  let latHi = 90;
  let lonLo = -180;
  let lonHi = 180;
  let evenBit = true;
  for (const ch of hash) {
    const v = BASE32.indexOf(ch);
    if (v < 0)
      throw new RangeError(
        `not a geohash character: ${JSON.stringify(ch)} in ${JSON.stringify(hash)}`,
      );
    for (let b = 4; b >= 0; b--) {
      const bit = (v >> b) & 1;
      if (evenBit) {
        const mid = (lonLo + lonHi) / 2;
        if (bit) lonLo = mid;
        else lonHi = mid;
      } else {
        const mid = (latLo + latHi) / 2;
        if (bit) latLo = mid;
        else latHi = mid;
      }
      evenBit = !evenBit;
    }
  }
  return { south: latLo, west: lonLo, north: latHi, east: lonHi };
}

/** Key range bounds covering every cell that starts with `prefix`. */
export function prefixBounds(prefix: string): [string, string] {
  return [prefix, `${prefix}\uffff`];
}
