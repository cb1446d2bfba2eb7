/**
 * Picking a building's position on the map, for the place step. The map moves under a fixed
 * cross in its middle: drag the map, or tap a spot to bring it under the cross, then use
 * the point. A cross that stays put is steadier with gloves than a marker that must be hit.
 *
 * It shows the same basemap as the map screen (online tiles, an offline archive, or the
 * plain background with grid and scale bar) and the buildings already surveyed, which are
 * the landmarks when there are no tiles. Leaflet loads only when the picker opens.
 */
import { useEffect, useRef, useState } from 'preact/hooks';
import '../styles/map.css';
import { formatNumber } from '../../forms/units/index.js';
import { t } from '../i18n/index.js';
import { loadBasemapLayer } from './basemap-layer.js';
import type { MapCentre, MapView, TileStatus } from './leaflet-view.js';
import { loadMapData } from './map-data.js';
import type { MapPoint } from './map-points.js';

/** Zoom for a known position: a building fills a good part of a phone screen (no source). */
const BUILDING_ZOOM = 18;
/** Zoom near the last surveyed building: the street around it (common practice, no source). */
const STREET_ZOOM = 17;

export interface LocationPickerProps {
  /** Where to start: the survey's current position, if it has one. */
  start: { lat: number; lon: number } | null;
  /** The survey being placed; its own marker is left out of the landmarks. */
  surveyId: string;
  onUse(lat: number, lon: number): void;
  onCancel(): void;
}

/** The most recently updated surveyed building, where the inspector most likely is. */
function latest(points: readonly MapPoint[]): MapPoint | null {
  let best: MapPoint | null = null;
  for (const p of points) if (!best || p.updatedAt > best.updatedAt) best = p;
  return best;
}

export function LocationPicker({ start, surveyId, onUse, onCancel }: LocationPickerProps) {
  const rootEl = useRef<HTMLDivElement>(null);
  const mapEl = useRef<HTMLDivElement>(null);
  const view = useRef<MapView | null>(null);
  const [centre, setCentre] = useState<MapCentre | null>(
    start ? { ...start, zoom: BUILDING_ZOOM } : null,
  );
  const [failed, setFailed] = useState(false);
  const [tiles, setTiles] = useState<TileStatus>('none');

  // The picker opens below the position buttons: bring it into sight on a phone.
  useEffect(() => rootEl.current?.scrollIntoView({ block: 'start' }), []);

  useEffect(() => {
    let cancelled = false;
    let placed = start !== null;
    void import('./leaflet-view.js')
      .then(({ createMapView }) => {
        if (cancelled || !mapEl.current) return;
        const v = createMapView(mapEl.current, {
          onSelect: (p) => v.centreOn(p.lat, p.lon),
          onTileStatus: setTiles,
          onMapTap: (lat, lon) => v.centreOn(lat, lon),
          onMoved: setCentre,
        });
        view.current = v;
        if (start) v.centreOn(start.lat, start.lon, BUILDING_ZOOM);
        setCentre(v.centre());
        void loadBasemapLayer().then((layer) => {
          if (!cancelled) v.setBasemap(layer);
        });
        // Landmarks: the other surveyed buildings. Without a position yet, start at the
        // latest of them.
        void loadMapData((data) => {
          if (cancelled) return;
          const others = data.points.filter((p) => p.id !== surveyId);
          v.setPoints(others, false);
          const near = latest(others);
          if (!placed && near) {
            placed = true;
            v.centreOn(near.lat, near.lon, STREET_ZOOM);
          }
        }).catch(() => {
          // Landmarks are a help only: the picker works without them.
        });
      })
      .catch(() => {
        if (!cancelled) setFailed(true);
      });
    return () => {
      cancelled = true;
      view.current?.destroy();
      view.current = null;
    };
    // The picker starts once per opening; later changes of `start` are its own doing.
  }, []);

  const worldView = centre === null || centre.zoom < 10;
  return (
    <div ref={rootEl} class="location-picker" role="group" aria-labelledby="picker-title">
      <h3 id="picker-title" class="subhead">
        {t('place.picker.title')}
      </h3>
      <p class="field__hint">{t('place.picker.hint')}</p>
      <div class="location-picker__frame">
        <div
          ref={mapEl}
          class="gl-map location-picker__map"
          data-testid="location-picker-map"
          role="region"
          aria-label={t('place.picker.mapLabel')}
        />
        <span class="location-picker__cross" aria-hidden="true" />
      </div>
      {failed && (
        <p class="field__error" role="alert">
          {t('place.picker.failed')}
        </p>
      )}
      <p class="location-picker__readout" aria-live="polite" data-testid="picker-centre">
        {centre
          ? t('place.picker.centre', {
              lat: formatNumber(centre.lat, 'coord'),
              lon: formatNumber(centre.lon, 'coord'),
            })
          : t('place.picker.loading')}
      </p>
      {tiles !== 'ok' && tiles !== 'loading' && (
        <p class="field__hint">{t('place.picker.noTiles')}</p>
      )}
      {worldView && centre !== null && (
        <p class="field__warning">
          <span aria-hidden="true">⚠ </span>
          {t('place.picker.zoomIn')}
        </p>
      )}
      <div class="button-row">
        <button
          type="button"
          class="button button--primary"
          disabled={centre === null || worldView}
          onClick={() => {
            const c = view.current?.centre() ?? centre;
            // Six decimals are about 0.1 m: finer than any pick by finger, so more digits
            // would only pretend to precision (common practice, no source).
            if (c) onUse(Math.round(c.lat * 1e6) / 1e6, Math.round(c.lon * 1e6) / 1e6);
          }}
        >
          {t('place.picker.use')}
        </button>
        <button type="button" class="button" onClick={onCancel}>
          {t('place.picker.cancel')}
        </button>
      </div>
    </div>
  );
}
