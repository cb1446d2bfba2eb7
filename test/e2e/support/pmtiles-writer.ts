/**
 * A minimal PMTiles version 3 writer for tests: builds a small single-file tile archive in
 * memory, following the PMTiles v3 specification (github.com/protomaps/PMTiles, spec/v3):
 * 127-byte little-endian header, root directory of varint-encoded entries (tile id deltas,
 * run lengths, lengths, offsets with 0 meaning "right after the previous tile"), JSON
 * metadata, then tile data. Everything fits in the root directory (no leaf directories),
 * which the specification allows for small archives. Test support code, never shipped.
 */
import { gzipSync } from 'node:zlib';

/** Compression ids of the specification. */
export const Compression = { none: 1, gzip: 2 } as const;
/** Tile type ids of the specification. */
export const TileType = { png: 2, jpeg: 3, webp: 4 } as const;

/**
 * Tile id of z/x/y: the number of tiles on all lower zoom levels, plus the tile's position
 * along the Hilbert curve of its level (spec v3, "Tile IDs"). Written here from the
 * specification, independently of the pmtiles package, so tests can compare the two.
 */
export function tileId(z: number, x: number, y: number): number {
  if (!Number.isInteger(z) || z < 0 || z > 26) throw new RangeError(`z must be 0..26, got ${z}`);
  const n = 2 ** z;
  if (x < 0 || y < 0 || x >= n || y >= n)
    throw new RangeError(`x, y must be 0..${n - 1}, got ${x}, ${y}`);
  let acc = 0;
  for (let i = 0; i < z; i++) acc += 4 ** i;
  let tx = x;
  let ty = y;
  let d = 0;
  for (let s = n / 2; s >= 1; s /= 2) {
    const rx = (tx & s) > 0 ? 1 : 0;
    const ry = (ty & s) > 0 ? 1 : 0;
    d += s * s * ((3 * rx) ^ ry);
    if (ry === 0) {
      if (rx === 1) {
        tx = n - 1 - tx;
        ty = n - 1 - ty;
      }
      [tx, ty] = [ty, tx];
    }
  }
  return acc + d;
}

function varint(out: number[], value: number): void {
  let v = value;
  while (v >= 0x80) {
    out.push((v % 0x80) | 0x80);
    v = Math.floor(v / 0x80);
  }
  out.push(v);
}

export interface ArchiveTile {
  z: number;
  x: number;
  y: number;
  data: Uint8Array;
}

export interface ArchiveOptions {
  tileType?: number;
  internalCompression?: number;
  /** [west, south, east, north] in degrees. */
  bounds: [number, number, number, number];
  center?: [number, number, number];
  metadata?: Record<string, unknown>;
}

/** Builds the archive bytes. */
export function writePmtiles(tiles: readonly ArchiveTile[], options: ArchiveOptions): Uint8Array {
  const internal = options.internalCompression ?? Compression.gzip;
  const compress = (b: Uint8Array) =>
    internal === Compression.gzip ? new Uint8Array(gzipSync(b)) : b;
  const sorted = tiles
    .map((t) => ({ ...t, id: tileId(t.z, t.x, t.y) }))
    .sort((a, b) => a.id - b.id);
  const entries: Array<{ id: number; offset: number; length: number }> = [];
  let offset = 0;
  for (const t of sorted) {
    entries.push({ id: t.id, offset, length: t.data.length });
    offset += t.data.length;
  }
  const dir: number[] = [];
  varint(dir, entries.length);
  let last = 0;
  for (const e of entries) {
    varint(dir, e.id - last);
    last = e.id;
  }
  for (let i = 0; i < entries.length; i++) varint(dir, 1); // run length: one tile each
  for (const e of entries) varint(dir, e.length);
  entries.forEach((e, i) => {
    const prev = entries[i - 1];
    varint(dir, i > 0 && prev && e.offset === prev.offset + prev.length ? 0 : e.offset + 1);
  });
  const root = compress(new Uint8Array(dir));
  const meta = compress(new TextEncoder().encode(JSON.stringify(options.metadata ?? {})));
  const tileBytes = offset;

  const HEADER = 127;
  const rootOffset = HEADER;
  const metaOffset = rootOffset + root.length;
  const leafOffset = metaOffset + meta.length;
  const dataOffset = leafOffset; // no leaf directories
  const out = new Uint8Array(dataOffset + tileBytes);
  const v = new DataView(out.buffer);
  'PMTiles'.split('').forEach((c, i) => (out[i] = c.charCodeAt(0)));
  out[7] = 3;
  const u64 = (at: number, value: number) => v.setBigUint64(at, BigInt(value), true);
  u64(8, rootOffset);
  u64(16, root.length);
  u64(24, metaOffset);
  u64(32, meta.length);
  u64(40, leafOffset);
  u64(48, 0);
  u64(56, dataOffset);
  u64(64, tileBytes);
  u64(72, entries.length); // addressed tiles
  u64(80, entries.length); // tile entries
  u64(88, entries.length); // tile contents
  out[96] = 1; // clustered: tiles are in tile-id order
  out[97] = internal;
  out[98] = Compression.none; // PNG is already compressed
  out[99] = options.tileType ?? TileType.png;
  const zooms = sorted.map((t) => t.z);
  out[100] = Math.min(...zooms);
  out[101] = Math.max(...zooms);
  const e7 = (deg: number) => Math.round(deg * 1e7);
  const [w, s, e, n] = options.bounds;
  v.setInt32(102, e7(w), true);
  v.setInt32(106, e7(s), true);
  v.setInt32(110, e7(e), true);
  v.setInt32(114, e7(n), true);
  const [cz, clon, clat] = options.center ?? [out[100], (w + e) / 2, (s + n) / 2];
  out[118] = cz;
  v.setInt32(119, e7(clon), true);
  v.setInt32(123, e7(clat), true);
  out.set(root, rootOffset);
  out.set(meta, metaOffset);
  let at = dataOffset;
  for (const t of sorted) {
    out.set(t.data, at);
    at += t.data.length;
  }
  return out;
}

/** Slippy-map tile x, y holding a point at zoom z (Web Mercator, as OSM tiles). */
export function tileOf(lat: number, lon: number, z: number): { x: number; y: number } {
  const n = 2 ** z;
  const x = Math.floor(((lon + 180) / 360) * n);
  const r = (lat * Math.PI) / 180;
  const y = Math.floor(((1 - Math.log(Math.tan(r) + 1 / Math.cos(r)) / Math.PI) / 2) * n);
  return { x: Math.min(n - 1, Math.max(0, x)), y: Math.min(n - 1, Math.max(0, y)) };
}
