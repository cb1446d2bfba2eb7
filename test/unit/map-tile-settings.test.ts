/** Tile service settings: the default service and checks of a typed tile address. */
import { describe, expect, it } from 'vitest';
import {
  OSM_TILES,
  checkTileTemplate,
  readBasemapChoice,
  readTileService,
} from '../../web/map/tile-settings.js';

describe('tile settings', () => {
  it('defaults to OpenStreetMap standard tiles with their attribution', () => {
    expect(readTileService(undefined)).toEqual(OSM_TILES);
    expect(OSM_TILES.url).toBe('https://tile.openstreetmap.org/{z}/{x}/{y}.png');
    expect(OSM_TILES.attribution).toBe('© OpenStreetMap contributors');
    expect(OSM_TILES.attributionUrl).toBe('https://www.openstreetmap.org/copyright');
  });

  it('accepts https templates with z, x and y, and says what is wrong otherwise', () => {
    expect(checkTileTemplate('https://{s}.tiles.example/{z}/{x}/{y}.png')).toBeNull();
    expect(checkTileTemplate('http://tiles.example/{z}/{x}/{y}.png')).toBe('not-https');
    expect(checkTileTemplate('https://tiles.example/{z}/{x}.png')).toBe('placeholders');
    expect(checkTileTemplate('not a url')).toBe('not-url');
    expect(checkTileTemplate('javascript:alert(1)//{z}/{x}/{y}')).toBe('not-https');
  });

  it('falls back to the defaults for unusable stored values', () => {
    expect(readTileService({ url: 'http://x/{z}/{x}/{y}.png', attribution: 'x' })).toEqual(
      OSM_TILES,
    );
    const custom = readTileService({
      url: 'https://tiles.example/{z}/{x}/{y}.png',
      attribution: 'Example',
      attributionUrl: 'javascript:alert(1)',
      maxZoom: 99,
    });
    expect(custom).toEqual({
      url: 'https://tiles.example/{z}/{x}/{y}.png',
      attribution: 'Example',
      attributionUrl: '',
      maxZoom: 19,
    });
    expect(readBasemapChoice({ kind: 'archive', id: 'a' })).toEqual({ kind: 'archive', id: 'a' });
    expect(readBasemapChoice({ kind: 'archive' })).toEqual({ kind: 'online' });
    expect(readBasemapChoice('none')).toEqual({ kind: 'online' });
    expect(readBasemapChoice({ kind: 'none' })).toEqual({ kind: 'none' });
  });
});
