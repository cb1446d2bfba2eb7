/**
 * The map's filters: outcome, damage state, needs-assessment, system, inspector and date,
 * each value with its faceted count (how many would show if it were chosen).
 */
import { t, type MessageKey } from '../i18n/index.js';
import {
  FACETS,
  isUnfiltered,
  toggleValue,
  type Facet,
  type FacetCounts,
  type MapFilter,
} from './map-filters.js';
import { DAMAGE_KEYS, POSTING_KEYS } from './map-points.js';
import { damageTag } from './marker-style.js';
import { PostingSwatch } from './posting-swatch.js';
import { ASSESSMENT, SYSTEMS, valueWord } from './option-words.js';

const FACET_TITLES: Record<Facet, MessageKey> = {
  posting: 'map.filter.posting',
  damage: 'map.filter.damage',
  assessment: 'map.filter.assessment',
  system: 'map.filter.system',
  inspector: 'map.filter.inspector',
};

export interface FilterPanelProps {
  filter: MapFilter;
  counts: FacetCounts;
  inspectors: readonly string[];
  firstDay: string | null;
  lastDay: string | null;
  shown: number;
  onChange(filter: MapFilter): void;
  onClose(): void;
}

function valuesOf(facet: Facet, inspectors: readonly string[]): readonly string[] {
  switch (facet) {
    case 'posting':
      return POSTING_KEYS;
    case 'damage':
      return DAMAGE_KEYS;
    case 'assessment':
      return ASSESSMENT;
    case 'system':
      return SYSTEMS;
    case 'inspector':
      return inspectors;
  }
}

function Marker({ facet, value }: { facet: Facet; value: string }) {
  if (facet === 'posting') {
    return <PostingSwatch posting={value as (typeof POSTING_KEYS)[number]} />;
  }
  if (facet === 'damage') {
    const tag = damageTag(value as (typeof DAMAGE_KEYS)[number]);
    return (
      <span class="gl-swatch gl-swatch--tag" aria-hidden="true">
        {tag || '–'}
      </span>
    );
  }
  if (facet === 'assessment' && value === 'needed') {
    return (
      <span class="gl-swatch gl-swatch--flag" aria-hidden="true">
        !
      </span>
    );
  }
  return null;
}

export function FilterPanel(props: FilterPanelProps) {
  const { filter, counts, onChange } = props;
  return (
    <div class="gl-filters">
      <div class="gl-panel__head">
        <h2 id="gl-filters-title">{t('map.filters.title')}</h2>
        <button type="button" class="button gl-panel__close" onClick={props.onClose}>
          {t('map.panel.close')}
        </button>
      </div>
      {FACETS.map((facet) => {
        const values = valuesOf(facet, props.inspectors);
        if (values.length === 0) return null;
        const chosen = filter[facet] as ReadonlySet<string>;
        return (
          <fieldset class="gl-facet" key={facet}>
            <legend>{t(FACET_TITLES[facet])}</legend>
            <div
              class={
                facet === 'inspector'
                  ? 'gl-facet__values gl-facet__values--scroll'
                  : 'gl-facet__values'
              }
            >
              {values.map((value) => {
                const n = counts[facet].get(value) ?? 0;
                return (
                  <label class="gl-facet__value" key={value}>
                    <input
                      type="checkbox"
                      checked={chosen.has(value)}
                      onChange={() => onChange(toggleValue(filter, facet, value))}
                    />
                    <Marker facet={facet} value={value} />
                    <span class="gl-facet__word">{valueWord(facet, value)}</span>
                    <span class="gl-facet__count">{n}</span>
                  </label>
                );
              })}
            </div>
          </fieldset>
        );
      })}
      <fieldset class="gl-facet">
        <legend>{t('map.filter.date')}</legend>
        <div class="gl-dates">
          <label>
            <span>{t('map.filter.from')}</span>
            <input
              type="date"
              value={filter.from ?? ''}
              min={props.firstDay ?? undefined}
              max={props.lastDay ?? undefined}
              onChange={(e) =>
                onChange({ ...filter, from: (e.currentTarget as HTMLInputElement).value || null })
              }
            />
          </label>
          <label>
            <span>{t('map.filter.to')}</span>
            <input
              type="date"
              value={filter.to ?? ''}
              min={props.firstDay ?? undefined}
              max={props.lastDay ?? undefined}
              onChange={(e) =>
                onChange({ ...filter, to: (e.currentTarget as HTMLInputElement).value || null })
              }
            />
          </label>
        </div>
      </fieldset>
      <div class="gl-filters__actions">
        <button
          type="button"
          class="button"
          disabled={isUnfiltered(filter)}
          onClick={() =>
            onChange({
              posting: new Set(),
              damage: new Set(),
              system: new Set(),
              inspector: new Set(),
              assessment: new Set(),
              from: null,
              to: null,
            })
          }
        >
          {t('map.filters.clear')}
        </button>
        <button
          type="button"
          class="button button--primary gl-filters__show"
          onClick={props.onClose}
        >
          {t('map.filters.show', { count: props.shown })}
        </button>
      </div>
    </div>
  );
}
