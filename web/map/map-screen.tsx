/**
 * The team lead's map: every screened building as a marker (posting colour, symbol and
 * word; damage-state tag; flags), clustered when there are many; filters with faceted
 * counts; fit-to-data; a summary card per building that opens the survey; the surveys
 * without a location listed; files in and out (ExchangeActions).
 *
 * Works with no network at all: a plain background, a coordinate grid and a scale bar, plus
 * any offline basemap archive loaded onto the device. Leaflet (and its stylesheet) loads
 * only when this screen opens.
 */
import { useCallback, useEffect, useMemo, useRef, useState } from 'preact/hooks';
import '../styles/map.css';
import { ExchangeActions, deviceStore } from '../exchange/index.js';
import type { SurveyRecord } from '../../forms/index.js';
import { t } from '../i18n/index.js';
import { basemapLayerFor, loadBasemapSettings } from './basemap-layer.js';
import { BasemapPanel } from './basemap-panel.js';
import { ClusterClient } from './cluster-client.js';
import { deleteBasemap, listBasemaps, putBasemap, type StoredBasemap } from './basemap-store.js';
import { FilterPanel } from './filter-panel.js';
import type { MapView, TileStatus } from './leaflet-view.js';
import { loadMapData } from './map-data.js';
import {
  NO_FILTER,
  applyFilter,
  dataRange,
  facetCounts,
  isUnfiltered,
  toggleValue,
  type FacetCounts,
  type MapFilter,
} from './map-filters.js';
import { POSTING_KEYS, type MapData, type MapPoint, type UnplacedSurvey } from './map-points.js';
import { postingStyle } from './marker-style.js';
import { BasemapArchive } from './pmtiles-archive.js';
import { PostingSwatch } from './posting-swatch.js';
import { SummaryCard } from './summary-card.js';
import {
  BASEMAP_SETTING,
  OSM_TILES,
  TILES_SETTING,
  type BasemapChoice,
  type TileService,
} from './tile-settings.js';
import { UnplacedList } from './unplaced-list.js';

/** A performance mark (the map benchmark reads them); never fails. */
function mark(name: string): void {
  try {
    performance.mark(name);
  } catch {
    // Marks are diagnostics only.
  }
}

type Panel = null | 'filters' | 'basemap' | 'files' | 'unplaced';

function useOnline(): boolean {
  const [online, setOnline] = useState(typeof navigator === 'undefined' ? true : navigator.onLine);
  useEffect(() => {
    const update = () => setOnline(navigator.onLine);
    window.addEventListener('online', update);
    window.addEventListener('offline', update);
    return () => {
      window.removeEventListener('online', update);
      window.removeEventListener('offline', update);
    };
  }, []);
  return online;
}

function activeFilters(filter: MapFilter): number {
  return (
    filter.posting.size +
    filter.damage.size +
    filter.system.size +
    filter.inspector.size +
    filter.assessment.size +
    (filter.from ? 1 : 0) +
    (filter.to ? 1 : 0)
  );
}

export function MapScreen() {
  const mapEl = useRef<HTMLDivElement>(null);
  const view = useRef<MapView | null>(null);
  const fitted = useRef(false);
  const [viewReady, setViewReady] = useState(false);
  const [viewError, setViewError] = useState(false);
  const [data, setData] = useState<MapData | null>(null);
  const [loadError, setLoadError] = useState<string | null>(null);
  /** True while the surveys are being checked against a cached view. */
  const [checking, setChecking] = useState(false);
  const [filter, setFilter] = useState<MapFilter>(NO_FILTER);
  const [panel, setPanel] = useState<Panel>(null);
  const [selected, setSelected] = useState<MapPoint | UnplacedSurvey | null>(null);
  const [tileStatus, setTileStatus] = useState<TileStatus>('none');
  const [choice, setChoice] = useState<BasemapChoice>({ kind: 'online' });
  const [service, setService] = useState<TileService>(OSM_TILES);
  const [archives, setArchives] = useState<StoredBasemap[]>([]);
  const [basemapMessage, setBasemapMessage] = useState<string | null>(null);
  const [basemapBusy, setBasemapBusy] = useState(false);
  const online = useOnline();

  const reload = useCallback(() => {
    setChecking(true);
    loadMapData((d, phase) => {
      mark('grainline:map-data');
      setData(d);
      setLoadError(null);
      if (phase === 'checked') setChecking(false);
    }).catch((err: unknown) => {
      setLoadError(
        typeof err === 'object' && err !== null && 'userMessage' in err
          ? String((err as { userMessage: unknown }).userMessage)
          : t('map.loadFailed'),
      );
      setChecking(false);
    });
  }, []);

  // Data, settings and the Leaflet module load side by side.
  useEffect(() => {
    mark('grainline:map-open');
    reload();
    void loadBasemapSettings().then((b) => {
      setChoice(b.choice);
      setService(b.service);
      setArchives(b.archives);
    });
    let cancelled = false;
    // The clustering worker starts now, so its code is loaded by the time the surveys are.
    const clusters = new ClusterClient();
    import('./leaflet-view.js')
      .then(({ createMapView }) => {
        if (cancelled || !mapEl.current) {
          clusters.dispose();
          return;
        }
        view.current = createMapView(
          mapEl.current,
          {
            onSelect: (p) => setSelected(p),
            onTileStatus: setTileStatus,
            onRendered: (n) => {
              // For the benchmark and the browser tests: when the first markers were drawn.
              if (n > 0 && mapEl.current && !mapEl.current.dataset.rendered) {
                mark('grainline:map-rendered');
                mapEl.current.dataset.rendered = String(performance.now());
              }
            },
          },
          clusters,
        );
        mark('grainline:map-view');
        setViewReady(true);
      })
      .catch(() => {
        clusters.dispose();
        setViewError(true);
      });
    return () => {
      cancelled = true;
      view.current?.destroy();
      view.current = null;
    };
  }, [reload]);

  const filtered = useMemo(() => (data ? applyFilter(data.points, filter) : []), [data, filter]);
  const unplacedShown = useMemo(
    () => (data ? applyFilter(data.unplaced, filter) : []),
    [data, filter],
  );
  const allSummaries = useMemo(() => (data ? [...data.points, ...data.unplaced] : []), [data]);
  // Counts and the date range are computed just after the markers are drawn (a pass over
  // every survey each), so they never hold up the map's first drawing.
  const [counts, setCounts] = useState<FacetCounts>(() => facetCounts([], NO_FILTER));
  const [range, setRange] = useState<ReturnType<typeof dataRange>>(() => dataRange([]));
  useEffect(() => {
    const timer = setTimeout(() => setCounts(facetCounts(allSummaries, filter)), 0);
    return () => clearTimeout(timer);
  }, [allSummaries, filter]);
  useEffect(() => {
    const timer = setTimeout(() => setRange(dataRange(allSummaries)), 0);
    return () => clearTimeout(timer);
  }, [allSummaries]);

  useEffect(() => {
    if (!viewReady || !data || !view.current) return;
    // Fit once, when there is first something to fit (an empty device shows the world).
    const fit = !fitted.current && filtered.length > 0;
    view.current.setPoints(filtered, fit);
    if (fit) fitted.current = true;
  }, [viewReady, data, filtered]);

  useEffect(() => {
    view.current?.setSelected(selected && 'lat' in selected ? selected.id : null);
  }, [selected, viewReady]);

  // The basemap layer follows the choice; an archive is opened from the device.
  useEffect(() => {
    if (!viewReady || !view.current) return;
    view.current.setBasemap(basemapLayerFor(choice, service, archives));
  }, [viewReady, choice, service, archives]);

  // The map's size changes when a side panel opens on a wide screen.
  useEffect(() => {
    const el = mapEl.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    const ro = new ResizeObserver(() => view.current?.invalidateSize());
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

  const choose = (next: BasemapChoice) => {
    setChoice(next);
    setBasemapMessage(null);
    void deviceStore()
      .setSetting(BASEMAP_SETTING, next)
      .catch(() => undefined);
  };

  const saveService = (next: TileService) => {
    setService(next);
    void deviceStore()
      .setSetting(TILES_SETTING, next)
      .catch(() => undefined);
    setBasemapMessage(t('map.basemap.saved'));
  };

  const loadArchive = async (file: File) => {
    setBasemapBusy(true);
    setBasemapMessage(null);
    try {
      const id = crypto.randomUUID();
      const check = await new BasemapArchive(file, id).check();
      if (!check.ok) {
        setBasemapMessage(check.reason);
        return;
      }
      // Stored as its own Blob (a copy of the file's bytes), so it outlives the picked file.
      const blob = new Blob([await file.arrayBuffer()], { type: 'application/vnd.pmtiles' });
      const row: StoredBasemap = {
        id,
        fileName: file.name,
        blob,
        bytes: blob.size,
        addedAt: new Date().toISOString(),
        info: check.info,
      };
      await putBasemap(row);
      setArchives(await listBasemaps());
      choose({ kind: 'archive', id });
      setBasemapMessage(t('map.basemap.loaded', { name: check.info.name ?? file.name }));
    } catch {
      setBasemapMessage(t('map.basemap.storeFailed'));
    } finally {
      setBasemapBusy(false);
    }
  };

  const removeArchive = async (id: string) => {
    await deleteBasemap(id).catch(() => undefined);
    setArchives(await listBasemaps().catch(() => []));
    if (choice.kind === 'archive' && choice.id === id) choose({ kind: 'none' });
  };

  const exportRecords = useCallback(async (): Promise<SurveyRecord[]> => {
    const all = await deviceStore().listSurveys();
    if (isUnfiltered(filter) || !data) return all;
    const ids = new Set([...filtered, ...unplacedShown].map((p) => p.id));
    return all.filter((r) => ids.has(r.id));
  }, [filter, filtered, unplacedShown, data]);

  const total = allSummaries.length;
  const shown = filtered.length + unplacedShown.length;
  const nFilters = activeFilters(filter);

  let tileNote: string | null = null;
  if (choice.kind === 'online' && (!online || tileStatus === 'unavailable'))
    tileNote = t('map.tiles.unavailable');
  else if (choice.kind === 'none') tileNote = t('map.tiles.none');

  return (
    <main class={`gl-map-screen${panel === 'filters' ? ' has-filters' : ''}`} id="main">
      <header class="gl-map-head">
        <div class="gl-map-head__title">
          <h1>{t('nav.map')}</h1>
          <p class="gl-map-head__status" role="status" data-testid="map-status">
            {data
              ? `${
                  isUnfiltered(filter)
                    ? t('map.status.all', { total })
                    : t('map.status.some', { shown, total })
                }${checking ? ` · ${t('map.status.checking')}` : ''}`
              : (loadError ?? t('loading'))}
          </p>
        </div>
        <div class="gl-map-toolbar" role="toolbar" aria-label={t('map.toolbar')}>
          <button
            type="button"
            class={`button gl-map-toolbar__filters${panel === 'filters' ? ' is-active' : ''}`}
            aria-expanded={panel === 'filters'}
            onClick={() => setPanel(panel === 'filters' ? null : 'filters')}
          >
            {nFilters > 0
              ? t('map.filters.buttonActive', { count: nFilters })
              : t('map.filters.button')}
          </button>
          <button
            type="button"
            class="button"
            disabled={!viewReady}
            onClick={() => view.current?.fitToData()}
          >
            {t('map.fit')}
          </button>
          <button
            type="button"
            class={`button${panel === 'basemap' ? ' is-active' : ''}`}
            aria-expanded={panel === 'basemap'}
            onClick={() => setPanel(panel === 'basemap' ? null : 'basemap')}
          >
            {t('map.basemap.button')}
          </button>
          <button
            type="button"
            class={`button${panel === 'files' ? ' is-active' : ''}`}
            aria-expanded={panel === 'files'}
            onClick={() => setPanel(panel === 'files' ? null : 'files')}
          >
            {t('map.files.button')}
          </button>
        </div>
        <div class="gl-chips" role="group" aria-label={t('map.filter.posting')}>
          {POSTING_KEYS.map((key) => {
            const s = postingStyle(key);
            const on = filter.posting.has(key);
            return (
              <button
                type="button"
                key={key}
                class={`gl-chip${on ? ' is-on' : ''}`}
                aria-pressed={on}
                onClick={() => setFilter(toggleValue(filter, 'posting', key))}
              >
                <PostingSwatch posting={key} size={24} />
                <span class="gl-chip__word">{t(s.label)}</span>
                <span class="gl-chip__count">{counts.posting.get(key) ?? 0}</span>
              </button>
            );
          })}
        </div>
      </header>

      <div class="gl-map-body">
        <aside
          class={`gl-map-side${panel === 'filters' ? ' is-open' : ''}`}
          aria-labelledby="gl-filters-title"
        >
          <FilterPanel
            filter={filter}
            counts={counts}
            inspectors={range.inspectors}
            firstDay={range.firstDay}
            lastDay={range.lastDay}
            shown={shown}
            onChange={setFilter}
            onClose={() => setPanel(null)}
          />
        </aside>
        <div class="gl-map-wrap">
          <div
            ref={mapEl}
            class="gl-map"
            data-testid="map"
            aria-label={t('map.label')}
            role="region"
          />
          {viewError ? <p class="gl-map-note gl-map-note--error">{t('map.viewFailed')}</p> : null}
          {tileNote ? (
            <p class="gl-map-note" data-testid="tile-note">
              {tileNote}
            </p>
          ) : null}
          {data && data.unplaced.length > 0 && !selected ? (
            <button type="button" class="gl-unplaced-button" onClick={() => setPanel('unplaced')}>
              {t('map.unplaced.button', { count: unplacedShown.length })}
            </button>
          ) : null}
          {data && total === 0 ? (
            <div class="gl-map-empty">
              <p>{t('map.empty')}</p>
              <button
                type="button"
                class="button button--primary"
                onClick={() => setPanel('files')}
              >
                {t('map.empty.import')}
              </button>
            </div>
          ) : null}
          {selected ? <SummaryCard survey={selected} onClose={() => setSelected(null)} /> : null}
        </div>
        {panel === 'basemap' || panel === 'files' || panel === 'unplaced' ? (
          <section class="gl-sheet" aria-label={t(`map.sheet.${panel}`)}>
            {panel === 'basemap' ? (
              <BasemapPanel
                choice={choice}
                service={service}
                archives={archives}
                online={online}
                message={basemapMessage}
                busy={basemapBusy}
                onChoose={choose}
                onSaveService={saveService}
                onLoadArchive={(f) => void loadArchive(f)}
                onRemoveArchive={(id) => void removeArchive(id)}
                onClose={() => setPanel(null)}
              />
            ) : (
              <>
                <div class="gl-panel__head">
                  <h2>
                    {panel === 'files'
                      ? t('map.files.title')
                      : t('map.unplaced.title', { count: unplacedShown.length })}
                  </h2>
                  <button
                    type="button"
                    class="button gl-panel__close"
                    onClick={() => setPanel(null)}
                  >
                    {t('map.panel.close')}
                  </button>
                </div>
                {panel === 'files' ? (
                  <>
                    <p class="muted">
                      {isUnfiltered(filter)
                        ? t('map.files.scopeAll', { count: total })
                        : t('map.files.scopeShown', { count: shown })}
                    </p>
                    <ExchangeActions records={exportRecords} onImported={() => reload()} />
                  </>
                ) : (
                  <UnplacedList surveys={unplacedShown} />
                )}
              </>
            )}
          </section>
        ) : null}
      </div>
    </main>
  );
}
