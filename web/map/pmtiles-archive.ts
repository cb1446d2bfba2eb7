/**
 * Offline basemaps: a PMTiles archive (a single-file tile archive, open format, spec v3)
 * read with the `pmtiles` package from a Blob kept on the device. Only raster archives are
 * accepted (PNG, JPEG, WebP, AVIF tiles), since the map draws images; a vector archive is
 * refused with a sentence saying so.
 */
import { PMTiles, TileType, type Source, type RangeResponse } from 'pmtiles';
import { t } from '../i18n/index.js';

/** A pmtiles Source over a Blob: byte ranges are slices of the Blob (nothing is copied). */
export class BlobSource implements Source {
  constructor(
    private readonly blob: Blob,
    private readonly key: string,
  ) {}

  getKey(): string {
    return this.key;
  }

  async getBytes(offset: number, length: number): Promise<RangeResponse> {
    return { data: await this.blob.slice(offset, offset + length).arrayBuffer() };
  }
}

/** Media type of each raster tile type. */
const RASTER_TYPES: Partial<Record<TileType, string>> = {
  [TileType.Png]: 'image/png',
  [TileType.Jpeg]: 'image/jpeg',
  [TileType.Webp]: 'image/webp',
  [TileType.Avif]: 'image/avif',
};

export interface ArchiveInfo {
  minZoom: number;
  maxZoom: number;
  /** [west, south, east, north] in degrees. */
  bounds: [number, number, number, number];
  center: { lat: number; lon: number; zoom: number };
  mediaType: string;
  /** From the archive's metadata, when it has them (plain text, never markup). */
  name: string | null;
  attribution: string | null;
  tiles: number;
}

export type ArchiveCheck = { ok: true; info: ArchiveInfo } | { ok: false; reason: string };

/** Largest archive accepted, in MB (a town at street level is a few MB to a few hundred). */
export const MAX_ARCHIVE_MB = 2000;

function text(v: unknown): string | null {
  return typeof v === 'string' && v.trim().length > 0 ? v.trim().slice(0, 300) : null;
}

/** An open archive: its header facts and its tiles. */
export class BasemapArchive {
  readonly reader: PMTiles;

  constructor(
    readonly blob: Blob,
    readonly key: string,
  ) {
    this.reader = new PMTiles(new BlobSource(blob, key));
  }

  /** Reads and checks the header and metadata; never throws. */
  async check(): Promise<ArchiveCheck> {
    if (this.blob.size > MAX_ARCHIVE_MB * 1024 * 1024) {
      return { ok: false, reason: t('map.basemap.tooLarge', { max: MAX_ARCHIVE_MB }) };
    }
    try {
      const magic = new TextDecoder().decode(await this.blob.slice(0, 7).arrayBuffer());
      if (magic !== 'PMTiles') return { ok: false, reason: t('map.basemap.notPmtiles') };
      const h = await this.reader.getHeader();
      if (h.specVersion !== 3) {
        return { ok: false, reason: t('map.basemap.version', { version: h.specVersion }) };
      }
      const mediaType = RASTER_TYPES[h.tileType];
      if (!mediaType) return { ok: false, reason: t('map.basemap.vector') };
      let metadata: unknown = null;
      try {
        metadata = await this.reader.getMetadata();
      } catch {
        metadata = null; // metadata is optional: name and attribution stay unknown
      }
      const m =
        typeof metadata === 'object' && metadata !== null
          ? (metadata as Record<string, unknown>)
          : {};
      return {
        ok: true,
        info: {
          minZoom: h.minZoom,
          maxZoom: h.maxZoom,
          bounds: [h.minLon, h.minLat, h.maxLon, h.maxLat],
          center: { lat: h.centerLat, lon: h.centerLon, zoom: h.centerZoom },
          mediaType,
          name: text(m['name']),
          attribution: text(m['attribution']),
          tiles: h.numAddressedTiles,
        },
      };
    } catch {
      return { ok: false, reason: t('map.basemap.unreadable') };
    }
  }

  /** The image of tile z/x/y, or null when the archive has none there. */
  async tile(
    z: number,
    x: number,
    y: number,
    mediaType: string,
    signal?: AbortSignal,
  ): Promise<Blob | null> {
    const r = await this.reader.getZxy(z, x, y, signal);
    return r ? new Blob([r.data], { type: mediaType }) : null;
  }
}
