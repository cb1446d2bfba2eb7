/**
 * The building list: the first screen an inspector sees. Search, filter by outcome, a marker
 * on every building not yet exported, "New survey" in thumb reach, the demo town, and the
 * Import / Export buttons of web/exchange in the header slot.
 */
import { useEffect, useState } from 'preact/hooks';
import type { ComponentType } from 'preact';
import { useLocation } from 'preact-iso';
import type { SurveyRecord } from '../../../forms/index.js';
import { t, type MessageKey } from '../../i18n/index.js';
import '../../styles/screens.css';
import { CautionNote } from '../../app/caution-note.js';
import { paths } from '../../app/routes.js';
import { BuildingItem } from './building-item.js';
import { LIST_FILTERS, filterBuildings, type ListFilter } from './building-filter.js';
import type { ExchangeActionsProps } from '../../exchange/exchange-actions.js';

// Storage, the demo town and the exchange buttons load after the first render, so the
// screen is usable at once (a lazy() component would hold the whole route back instead).
const data = () => import('./home-data.js');

/**
 * Buildings drawn at a time. A team lead's merged device can hold thousands of surveys;
 * drawing them all makes the list (and leaving it) slow on a phone, so it grows on request.
 */
const PAGE = 50;

const filterLabels: Record<ListFilter, MessageKey> = {
  all: 'home.filter.all',
  open: 'posting.open',
  limited: 'posting.limited',
  'keep-out': 'posting.keepOut',
  unscreened: 'home.filter.unscreened',
  'not-exported': 'home.filter.notExported',
};

type Status = { kind: 'idle' } | { kind: 'busy'; text: string } | { kind: 'message'; text: string };

export function HomeScreen() {
  const { route } = useLocation();
  const [records, setRecords] = useState<SurveyRecord[] | null>(null);
  const [loadError, setLoadError] = useState<string | null>(null);
  const [query, setQuery] = useState('');
  const [filter, setFilter] = useState<ListFilter>('all');
  const [limit, setLimit] = useState(PAGE);
  // A new search or filter starts again from the first page.
  useEffect(() => setLimit(PAGE), [query, filter]);
  const [status, setStatus] = useState<Status>({ kind: 'idle' });

  const [Exchange, setExchange] = useState<ComponentType<ExchangeActionsProps> | null>(null);
  const reload = () =>
    data()
      .then((m) => m.listSurveys())
      .then((list) => {
        setRecords(list);
        setLoadError(null);
      })
      .catch((e: unknown) => setLoadError(t('home.loadFailed', { reason: String(e) })));
  useEffect(() => {
    void reload();
    void import('../../exchange/exchange-actions.js')
      .then((m) => setExchange(() => m.ExchangeActions))
      .catch(() => undefined);
  }, []);

  const newSurvey = async () => {
    setStatus({ kind: 'busy', text: t('home.creating') });
    try {
      const record = await (await data()).createSurveyNow();
      route(paths.survey(record.id, 'place'));
    } catch (e) {
      setStatus({ kind: 'message', text: t('home.createFailed', { reason: String(e) }) });
    }
  };
  const demo = async () => {
    setStatus({ kind: 'busy', text: t('home.demoLoading') });
    const outcome = await (await data()).loadDemoTown();
    setStatus({ kind: 'message', text: outcome });
    void reload();
  };

  const shown = records ? filterBuildings(records, query, filter) : [];
  const now = new Date();
  return (
    <main class="screen home" id="main">
      <header class="home__header">
        <h1>{t('home.title')}</h1>
        <button
          type="button"
          class="button button--primary button--wide button--big"
          onClick={() => void newSurvey()}
          disabled={status.kind === 'busy'}
        >
          <span aria-hidden="true">+ </span>
          {t('nav.newSurvey')}
        </button>
      </header>

      <p class="home__status" role="status" aria-live="polite">
        {status.kind !== 'idle' && status.text}
      </p>

      {records !== null && records.length > 0 && (
        <div class="home__tools">
          <div class="field">
            <label for="building-search" class="field__label">
              {t('home.search')}
            </label>
            <input
              id="building-search"
              type="search"
              value={query}
              placeholder={t('home.searchHint')}
              autocomplete="off"
              onInput={(e) => setQuery((e.currentTarget as HTMLInputElement).value)}
            />
          </div>
          <fieldset class="choice choice--row filter">
            <legend class="field__label">{t('home.filter')}</legend>
            <div class="choice__options">
              {LIST_FILTERS.map((f) => (
                <label key={f} class="choice__option">
                  <input
                    type="radio"
                    name="building-filter"
                    value={f}
                    checked={filter === f}
                    onChange={() => setFilter(f)}
                  />
                  <span class="choice__text">
                    <span class="choice__label">{t(filterLabels[f])}</span>
                  </span>
                </label>
              ))}
            </div>
          </fieldset>
          <p class="muted" aria-live="polite">
            {t('home.count', { shown: shown.length, total: records.length })}
          </p>
        </div>
      )}

      {loadError && (
        <p class="field__error" role="alert">
          {loadError}
        </p>
      )}
      {records !== null && records.length === 0 && (
        <div class="home__empty">
          <p>{t('home.empty')}</p>
          <p class="muted">{t('home.emptyHint')}</p>
        </div>
      )}
      {records !== null && records.length > 0 && shown.length === 0 && (
        <p class="muted">{t('home.noMatch')}</p>
      )}
      <ul class="building-list">
        {shown.slice(0, limit).map((r) => (
          <BuildingItem key={r.id} record={r} now={now} />
        ))}
      </ul>
      {shown.length > limit && (
        <p>
          <button type="button" class="button button--wide" onClick={() => setLimit(limit + PAGE)}>
            {t('home.showMore', {
              count: Math.min(PAGE, shown.length - limit),
              left: shown.length - limit,
            })}
          </button>
        </p>
      )}

      <section class="card home__exchange" aria-labelledby="exchange-title">
        <h2 id="exchange-title">{t('home.exchangeSlot')}</h2>
        {Exchange ? (
          <Exchange
            actions={['import', 'geojson', 'csv', 'zip']}
            onImported={() => void reload()}
          />
        ) : (
          <p class="muted">{t('loading')}</p>
        )}
      </section>
      <p>
        <button
          type="button"
          class="button button--wide"
          onClick={() => void demo()}
          disabled={status.kind === 'busy'}
        >
          {t('home.loadDemo')}
        </button>
      </p>
      <CautionNote compact />
    </main>
  );
}
