/**
 * Each piece of evidence with its value against its threshold, predicted and observed in
 * two lists. The value is shown in the chosen units; the sentence of the calculation says
 * what follows from it. An item that sets a damage state names it; one past its threshold
 * is marked with a symbol and words, not by colour alone.
 */
import type { EvidenceItem } from '../../../calc/index.js';
import { formatQuantity, shownUnit, type UnitSystem } from '../../../forms/units/index.js';
import { damageStateLabels } from '../../app/posting-style.js';
import { t } from '../../i18n/index.js';
import { groupEvidence } from './evidence-groups.js';

function valueText(item: EvidenceItem, system: UnitSystem): string {
  if (item.value === null) return item.valueText;
  if (
    item.unit === 'ratio' &&
    (item.kind === 'residual-drift' || item.kind.startsWith('fragility'))
  ) {
    return `${formatQuantity(item.value, 'percent', 'si')} %`;
  }
  if (item.unit === 'm') {
    const q = Math.abs(item.value) < 0.1 ? 'smallLength' : 'length';
    return `${formatQuantity(item.value, q, system)} ${t(`unit.${shownUnit(q, system)}`)}`;
  }
  return item.valueText;
}

function passed(item: EvidenceItem): boolean {
  return item.value !== null && item.threshold !== null && item.value >= item.threshold;
}

/** One list per side: on a phone a three-column table of long sentences does not fit. */
function List(props: {
  items: readonly EvidenceItem[];
  system: UnitSystem;
  title: string;
  id: string;
}) {
  return (
    <div class="evidence">
      <h3 class="subhead" id={props.id}>
        {props.title}
      </h3>
      <ul class="evidence__list" aria-labelledby={props.id}>
        {groupEvidence(props.items).map(({ item: e, places }) => (
          <li key={e.id} class={passed(e) ? 'ev ev--over' : 'ev'}>
            <p class="ev__head">
              {e.label}
              {places.length === 1 && <span class="ev__where"> · {places[0]}</span>}
              {places.length > 1 && (
                <span class="ev__where">
                  {' '}
                  · {t('result.evidence.samePlaces', { count: places.length })}
                  {places.map((p) => p.split(' ').pop()).join(', ')}
                </span>
              )}
            </p>
            <p class="ev__value">
              <strong>{valueText(e, props.system)}</strong>
              {passed(e) && (
                <span class="ev__over">
                  {' '}
                  <span aria-hidden="true">▲ </span>
                  {t('result.evidence.over')}
                </span>
              )}
              {e.state !== null && e.state !== 'none' && (
                <span class="ev__state"> → {t(damageStateLabels[e.state])}</span>
              )}
            </p>
            <p class="ev__limit">
              {t('result.evidence.threshold')}: {e.thresholdText}
            </p>
            <p class="ev__text">
              {e.text}
              {places.length > 1 && ` ${t('result.evidence.sameForAll', { count: places.length })}`}
            </p>
          </li>
        ))}
      </ul>
    </div>
  );
}

export function EvidenceTables(props: {
  predicted: readonly EvidenceItem[];
  observed: readonly EvidenceItem[];
  system: UnitSystem;
}) {
  return (
    <>
      {props.observed.length > 0 ? (
        <List
          items={props.observed}
          system={props.system}
          title={t('result.evidence.observed')}
          id="evidence-observed"
        />
      ) : (
        <p class="muted">{t('result.evidence.noneObserved')}</p>
      )}
      {props.predicted.length > 0 ? (
        <List
          items={props.predicted}
          system={props.system}
          title={t('result.evidence.predicted')}
          id="evidence-predicted"
        />
      ) : (
        <p class="muted">{t('result.evidence.nonePredicted')}</p>
      )}
    </>
  );
}
