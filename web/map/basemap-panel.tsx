/**
 * Choosing the basemap: plain background with the grid, the online tile service (URL and
 * attribution are settings), or an offline basemap archive (PMTiles) loaded onto the device.
 */
import { useEffect, useState } from 'preact/hooks';
import { t } from '../i18n/index.js';
import type { StoredBasemap } from './basemap-store.js';
import { clearTileCache, tileCacheUsage, type TileCacheUsage } from './tile-cache-status.js';
import {
  OSM_TILES,
  checkTileTemplate,
  type BasemapChoice,
  type TileService,
} from './tile-settings.js';

export interface BasemapPanelProps {
  choice: BasemapChoice;
  service: TileService;
  archives: readonly StoredBasemap[];
  online: boolean;
  message: string | null;
  busy: boolean;
  onChoose(choice: BasemapChoice): void;
  onSaveService(service: TileService): void;
  onLoadArchive(file: File): void;
  onRemoveArchive(id: string): void;
  onClose(): void;
}

const URL_PROBLEMS = {
  'not-https': 'map.basemap.url.notHttps',
  placeholders: 'map.basemap.url.placeholders',
  'not-url': 'map.basemap.url.notUrl',
} as const;

const mb = (bytes: number) => (bytes / (1024 * 1024)).toFixed(bytes < 10 * 1024 * 1024 ? 1 : 0);

export function BasemapPanel(props: BasemapPanelProps) {
  const [url, setUrl] = useState(props.service.url);
  const [attribution, setAttribution] = useState(props.service.attribution);
  const [usage, setUsage] = useState<TileCacheUsage | null>(null);
  const problem = checkTileTemplate(url);
  useEffect(() => {
    setUrl(props.service.url);
    setAttribution(props.service.attribution);
  }, [props.service]);
  useEffect(() => {
    void tileCacheUsage().then(setUsage);
  }, []);

  const radio = (choice: BasemapChoice, label: string, detail?: string) => {
    const checked =
      props.choice.kind === choice.kind &&
      (choice.kind !== 'archive' ||
        (props.choice.kind === 'archive' && props.choice.id === choice.id));
    return (
      <label class="gl-radio">
        <input
          type="radio"
          name="gl-basemap"
          checked={checked}
          onChange={() => props.onChoose(choice)}
        />
        <span>
          {label}
          {detail ? <span class="gl-check__hint">{detail}</span> : null}
        </span>
      </label>
    );
  };

  return (
    <div class="gl-basemap">
      <div class="gl-panel__head">
        <h2>{t('map.basemap.title')}</h2>
        <button type="button" class="button gl-panel__close" onClick={props.onClose}>
          {t('map.panel.close')}
        </button>
      </div>
      <fieldset class="gl-facet">
        <legend>{t('map.basemap.show')}</legend>
        {radio({ kind: 'none' }, t('map.basemap.none'), t('map.basemap.noneHint'))}
        {radio(
          { kind: 'online' },
          t('map.basemap.online'),
          props.online ? t('map.basemap.onlineHint') : t('map.basemap.onlineOffline'),
        )}
        {props.archives.map((a) =>
          radio(
            { kind: 'archive', id: a.id },
            t('map.basemap.archive', { name: a.info.name ?? a.fileName }),
            t('map.basemap.archiveHint', {
              mb: mb(a.bytes),
              min: a.info.minZoom,
              max: a.info.maxZoom,
            }),
          ),
        )}
      </fieldset>
      {props.message ? (
        <p class="gl-basemap__message" role="status">
          {props.message}
        </p>
      ) : null}

      <fieldset class="gl-facet">
        <legend>{t('map.basemap.offlineTitle')}</legend>
        <p class="muted">{t('map.basemap.offlineHint')}</p>
        <label class="button button--wide gl-file-button">
          {props.busy ? t('map.basemap.loading') : t('map.basemap.load')}
          <input
            type="file"
            class="visually-hidden"
            accept=".pmtiles,application/vnd.pmtiles"
            disabled={props.busy}
            data-testid="basemap-file"
            onChange={(e) => {
              const input = e.currentTarget as HTMLInputElement;
              const file = input.files?.[0];
              input.value = '';
              if (file) props.onLoadArchive(file);
            }}
          />
        </label>
        {props.archives.length > 0 ? (
          <ul class="gl-basemap__archives">
            {props.archives.map((a) => (
              <li key={a.id}>
                <span>{a.info.name ?? a.fileName}</span>
                <button type="button" class="button" onClick={() => props.onRemoveArchive(a.id)}>
                  {t('map.basemap.remove')}
                </button>
              </li>
            ))}
          </ul>
        ) : null}
      </fieldset>

      <fieldset class="gl-facet">
        <legend>{t('map.basemap.serviceTitle')}</legend>
        <label class="gl-field">
          <span>{t('map.basemap.url')}</span>
          <input
            type="url"
            inputMode="url"
            spellcheck={false}
            value={url}
            aria-invalid={problem !== null}
            aria-describedby="gl-url-problem"
            onInput={(e) => setUrl((e.currentTarget as HTMLInputElement).value)}
          />
        </label>
        {problem ? (
          <p id="gl-url-problem" class="gl-field__error">
            {t(URL_PROBLEMS[problem])}
          </p>
        ) : null}
        <label class="gl-field">
          <span>{t('map.basemap.attribution')}</span>
          <input
            type="text"
            value={attribution}
            onInput={(e) => setAttribution((e.currentTarget as HTMLInputElement).value)}
          />
        </label>
        <div class="gl-basemap__actions">
          <button
            type="button"
            class="button"
            disabled={problem !== null || attribution.trim() === ''}
            onClick={() =>
              props.onSaveService({
                url: url.trim(),
                attribution: attribution.trim(),
                attributionUrl: url.trim() === OSM_TILES.url ? OSM_TILES.attributionUrl : '',
                maxZoom: url.trim() === OSM_TILES.url ? OSM_TILES.maxZoom : props.service.maxZoom,
              })
            }
          >
            {t('map.basemap.save')}
          </button>
          <button type="button" class="button" onClick={() => props.onSaveService(OSM_TILES)}>
            {t('map.basemap.reset')}
          </button>
        </div>
        <p class="muted">{t('map.basemap.policy')}</p>
        {usage ? (
          <p class="muted">
            {t('map.basemap.cache', {
              tiles: usage.tiles,
              mb: mb(usage.bytes),
              max: mb(usage.maxBytes),
            })}{' '}
            <button
              type="button"
              class="button"
              disabled={usage.tiles === 0}
              onClick={() => void clearTileCache().then(() => tileCacheUsage().then(setUsage))}
            >
              {t('map.basemap.clearCache')}
            </button>
          </p>
        ) : null}
      </fieldset>
    </div>
  );
}
