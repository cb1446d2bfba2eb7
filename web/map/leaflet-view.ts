/**
 * The Leaflet part of the map screen, loaded lazily (with leaflet and its stylesheet) when
 * the map opens, so the app's first load stays small.
 *
 * Layers, bottom to top: the plain background (CSS), a basemap (online tiles, an offline
 * archive, or none), the coordinate grid, and the clustered markers. Controls: zoom, scale
 * bar (metric and imperial), and an attribution line built from text nodes (Leaflet's own
 * control writes attribution strings as HTML, so it is not used).
 */
import * as L from 'leaflet';
import 'leaflet/dist/leaflet.css';
import { t } from '../i18n/index.js';
import { CLUSTER_MAX_ZOOM, type ClusterItem } from './cluster-index.js';
import { ClusterClient } from './cluster-client.js';
import { CoordinateGrid } from './coordinate-grid.js';
import type { MapPoint } from './map-points.js';
import {
  clusterElement,
  clusterLabel,
  clusterSize,
  markerElement,
  markerLabel,
} from './marker-element.js';
import { archiveLayer } from './pmtiles-layer.js';
import type { ArchiveInfo, BasemapArchive } from './pmtiles-archive.js';
import type { TileService } from './tile-settings.js';

export type BasemapLayer =
  | { kind: 'none' }
  | { kind: 'online'; service: TileService }
  | { kind: 'archive'; archive: BasemapArchive; info: ArchiveInfo };

/** What the tiles are doing, for the status line. */
export type TileStatus = 'none' | 'loading' | 'ok' | 'unavailable';

export interface MapViewCallbacks {
  onSelect(point: MapPoint): void;
  onTileStatus(status: TileStatus): void;
  /** After markers were drawn for a view (the benchmark waits for the first). */
  onRendered?(markers: number): void;
  /** A tap on the map itself (not on a marker); the location picker uses it. */
  onMapTap?(lat: number, lon: number): void;
  /** After the view stopped moving, with its centre (the location picker shows it). */
  onMoved?(centre: MapCentre): void;
}

/** The centre of the view and its zoom level. */
export interface MapCentre {
  lat: number;
  lon: number;
  zoom: number;
}

export interface MapView {
  setPoints(points: readonly MapPoint[], fit: boolean): void;
  setSelected(id: string | null): void;
  fitToData(): void;
  setBasemap(layer: BasemapLayer): void;
  /** Centres the view on a point; with `zoom` omitted the zoom level stays. */
  centreOn(lat: number, lon: number, zoom?: number): void;
  centre(): MapCentre;
  invalidateSize(): void;
  destroy(): void;
}

/** Default view with no data: the whole world, zoomed out. */
const WORLD: L.LatLngExpression = [20, 0];

class TextAttribution extends L.Control {
  private box: HTMLElement | null = null;
  private text = '';
  private url = '';

  override onAdd(): HTMLElement {
    this.box = L.DomUtil.create('div', 'gl-attribution leaflet-control');
    L.DomEvent.disableClickPropagation(this.box);
    this.render();
    return this.box;
  }

  set(text: string, url: string): void {
    this.text = text;
    this.url = url;
    this.render();
  }

  private render(): void {
    const box = this.box;
    if (!box) return;
    box.replaceChildren();
    box.hidden = this.text === '';
    if (this.text === '') return;
    if (/^https:\/\//.test(this.url)) {
      const a = document.createElement('a');
      a.href = this.url;
      a.target = '_blank';
      a.rel = 'noopener noreferrer';
      a.textContent = this.text;
      box.append(a);
    } else {
      box.textContent = this.text;
    }
  }
}

/**
 * Creates the map in `container`. `clusters` may be passed in already started (the screen
 * starts the clustering worker while the surveys and Leaflet are still loading).
 */
export function createMapView(
  container: HTMLElement,
  callbacks: MapViewCallbacks,
  clusters: ClusterClient = new ClusterClient(),
): MapView {
  const map = L.map(container, {
    center: WORLD,
    zoom: 2,
    minZoom: 2,
    maxZoom: 20,
    zoomControl: false,
    attributionControl: false,
    worldCopyJump: false,
    // Markers are DOM elements (text nodes, focusable); vectors are not used.
    preferCanvas: false,
  });
  L.control
    .zoom({ position: 'topright', zoomInTitle: t('map.zoomIn'), zoomOutTitle: t('map.zoomOut') })
    .addTo(map);
  L.control
    .scale({ position: 'bottomleft', metric: true, imperial: true, maxWidth: 140 })
    .addTo(map);
  const attribution = new TextAttribution({ position: 'bottomright' });
  attribution.addTo(map);
  new CoordinateGrid().addTo(map);

  const markers = L.layerGroup().addTo(map);
  let points: readonly MapPoint[] = [];
  let renderSeq = 0;
  let selected: string | null = null;
  let basemap: L.Layer | null = null;

  const keyOf = (item: ClusterItem) =>
    item.kind === 'point' ? `p:${item.point.id}` : `c:${item.clusterId}`;
  const shown = new Map<string, L.Marker>();

  function markerFor(item: ClusterItem): L.Marker {
    if (item.kind === 'point') {
      const html = markerElement(item.point, item.point.id === selected);
      const m = L.marker([item.lat, item.lon], {
        icon: L.divIcon({
          html,
          className: 'gl-marker-icon',
          iconSize: [44, 44],
          iconAnchor: [22, 22],
        }),
        title: markerLabel(item.point),
        keyboard: true,
        riseOnHover: true,
        zIndexOffset:
          item.point.posting === 'keep-out' ? 300 : item.point.posting === 'limited' ? 200 : 0,
      });
      const point = item.point;
      m.on('click', () => callbacks.onSelect(point));
      return m;
    }
    const size = clusterSize(item.count);
    const m = L.marker([item.lat, item.lon], {
      icon: L.divIcon({
        html: clusterElement(item.count, item.counts),
        className: 'gl-cluster-icon',
        iconSize: [size, size],
        iconAnchor: [size / 2, size / 2],
      }),
      title: clusterLabel(item.count, item.counts),
      keyboard: true,
      zIndexOffset: 500,
    });
    const clusterId = item.clusterId;
    const at = L.latLng(item.lat, item.lon);
    m.on('click', () => {
      void clusters.expansionZoom(clusterId).then((z) => {
        map.flyTo(at, Math.min(z ?? map.getZoom() + 2, CLUSTER_MAX_ZOOM + 1), { duration: 0.4 });
      });
    });
    return m;
  }

  async function render(): Promise<void> {
    const seq = ++renderSeq;
    if (points.length === 0) {
      markers.clearLayers();
      shown.clear();
      callbacks.onRendered?.(0);
      return;
    }
    const b = map.getBounds().pad(0.25);
    const zoom = map.getZoom();
    const items = await clusters.itemsIn(
      [
        Math.max(-180, b.getWest()),
        Math.max(-85, b.getSouth()),
        Math.min(180, b.getEast()),
        Math.min(85, b.getNorth()),
      ],
      zoom,
    );
    // A newer view or a new set of points came meanwhile: its own render draws it.
    if (items === null || seq !== renderSeq || zoom !== map.getZoom()) return;
    // Keep markers that are still shown (no flicker, focus stays), add new, drop old.
    const next = new Set<string>();
    for (const item of items) {
      const key = keyOf(item);
      next.add(key);
      if (!shown.has(key)) {
        const m = markerFor(item);
        shown.set(key, m);
        markers.addLayer(m);
      }
    }
    for (const [key, m] of shown) {
      if (!next.has(key)) {
        markers.removeLayer(m);
        shown.delete(key);
      }
    }
    callbacks.onRendered?.(items.length);
  }

  /** From this zoom on, each marker also shows its posting word (a street fits the view). */
  const STREET_ZOOM = 17;
  const markStreetZoom = () =>
    container.classList.toggle('gl-zoom-street', map.getZoom() >= STREET_ZOOM);
  // Cluster ids are per zoom level: redraw from scratch after a zoom.
  map.on('zoomend', () => {
    markers.clearLayers();
    shown.clear();
    markStreetZoom();
  });
  markStreetZoom();
  map.on('moveend', () => {
    void render();
    const c = map.getCenter();
    callbacks.onMoved?.({ lat: c.lat, lon: c.lng, zoom: map.getZoom() });
  });
  // Marker clicks do not bubble to the map (Leaflet's default for markers), so this is a
  // tap on the background.
  map.on('click', (e: L.LeafletMouseEvent) => callbacks.onMapTap?.(e.latlng.lat, e.latlng.lng));

  function dataBounds(): L.LatLngBounds | null {
    if (points.length === 0) return null;
    let s = 90;
    let w = 180;
    let n = -90;
    let e = -180;
    for (const p of points) {
      if (p.lat < s) s = p.lat;
      if (p.lat > n) n = p.lat;
      if (p.lon < w) w = p.lon;
      if (p.lon > e) e = p.lon;
    }
    return L.latLngBounds([s, w], [n, e]);
  }

  function fitToData(): void {
    const b = dataBounds();
    if (b) map.fitBounds(b, { padding: [32, 32], maxZoom: 17, animate: false });
    else map.setView(WORLD, 2, { animate: false });
  }

  let tileLoads = 0;
  let tileErrors = 0;
  function watchTiles(layer: L.GridLayer): void {
    layer.on('loading', () => {
      tileLoads = 0;
      tileErrors = 0;
      callbacks.onTileStatus('loading');
    });
    layer.on('tileload', () => {
      tileLoads += 1;
    });
    layer.on('tileerror', (e: L.TileErrorEvent) => {
      tileErrors += 1;
      // A failed tile stays transparent (no broken-image icon): the grid shows through.
      (e.tile as HTMLElement).classList.add('gl-tile-missing');
    });
    layer.on('load', () => {
      callbacks.onTileStatus(tileLoads === 0 && tileErrors > 0 ? 'unavailable' : 'ok');
    });
  }

  return {
    setPoints(next, fit) {
      points = next;
      markers.clearLayers();
      shown.clear();
      // Load first: the worker answers in order, so the renders below see the new points.
      void clusters.load(next);
      if (fit) fitToData();
      void render();
    },
    setSelected(id) {
      if (id === selected) return;
      // Keep the chosen marker in sight above the summary card (a bottom sheet on phones).
      const point = id ? points.find((p) => p.id === id) : undefined;
      if (point) {
        const at = map.latLngToContainerPoint([point.lat, point.lon]);
        const h = map.getSize().y;
        if (at.y > h * 0.35) map.panBy([0, at.y - h * 0.25], { animate: true, duration: 0.3 });
      }
      const before = selected;
      selected = id;
      for (const key of [before, id]) {
        if (!key) continue;
        const m = shown.get(`p:${key}`);
        m?.getElement()
          ?.querySelector('.gl-marker')
          ?.classList.toggle('is-selected', key === id);
      }
    },
    fitToData,
    setBasemap(layer) {
      if (basemap) map.removeLayer(basemap);
      basemap = null;
      if (layer.kind === 'none') {
        attribution.set('', '');
        callbacks.onTileStatus('none');
        return;
      }
      if (layer.kind === 'online') {
        const tiles = L.tileLayer(layer.service.url, {
          maxZoom: 20,
          maxNativeZoom: layer.service.maxZoom,
          subdomains: 'abc',
          // CORS requests, so the service worker can measure and cache what was viewed.
          crossOrigin: 'anonymous',
          // Only the view and one ring of tiles around it: nothing is fetched in bulk.
          keepBuffer: 1,
        });
        watchTiles(tiles);
        basemap = tiles.addTo(map);
        attribution.set(layer.service.attribution, layer.service.attributionUrl);
        return;
      }
      const tiles = archiveLayer(layer.archive, layer.info);
      watchTiles(tiles);
      basemap = tiles.addTo(map);
      attribution.set(layer.info.attribution ?? layer.info.name ?? '', '');
    },
    centreOn(lat, lon, zoom) {
      map.setView([lat, lon], zoom ?? map.getZoom(), { animate: zoom === undefined });
    },
    centre() {
      const c = map.getCenter();
      return { lat: c.lat, lon: c.lng, zoom: map.getZoom() };
    },
    invalidateSize() {
      map.invalidateSize();
    },
    destroy() {
      clusters.dispose();
      map.remove();
    },
  };
}
