/**
 * One building in the list: its address or description, the recommended posting (symbol +
 * word + colour, never colour alone), whether it still has to be exported, and when it last
 * changed. The whole card is one link, a large target.
 */
import type { SurveyRecord } from '../../../forms/index.js';
import { readVerdict } from '../../exchange/survey-verdict.js';
import { needsExport } from '../../storage/derived.js';
import { postingStyles } from '../../app/posting-style.js';
import { paths } from '../../app/routes.js';
import { t } from '../../i18n/index.js';

function when(iso: string, now: Date): string {
  const d = new Date(iso);
  const sameDay = d.toDateString() === now.toDateString();
  return sameDay
    ? d.toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' })
    : d.toLocaleDateString([], { day: 'numeric', month: 'short' });
}

export function PostingBadge({ record }: { record: SurveyRecord }) {
  const verdict = readVerdict(record);
  if (verdict.posting === null) {
    return (
      <span class="badge badge--unscreened">
        <span aria-hidden="true">◌ </span>
        {t('posting.unscreened')}
      </span>
    );
  }
  const s = postingStyles[verdict.posting];
  return (
    <span class="badge" style={{ background: s.fill, borderColor: s.border, color: s.ink }}>
      <span aria-hidden="true">{s.symbol} </span>
      {t(s.label)}
    </span>
  );
}

export function BuildingItem({ record, now }: { record: SurveyRecord; now: Date }) {
  const address = record.address.trim() === '' ? t('home.untitled') : record.address;
  const unexported = needsExport(record);
  return (
    <li class="building">
      <a class="building__link" href={paths.survey(record.id, 'place')}>
        <span class="building__address">{address}</span>
        <span class="building__meta">
          <PostingBadge record={record} />
          {unexported ? (
            <span class="badge badge--export">
              <span aria-hidden="true">⇪ </span>
              {t('home.notExported')}
            </span>
          ) : (
            <span class="badge badge--quiet">
              <span aria-hidden="true">✓ </span>
              {t('home.exported')}
            </span>
          )}
        </span>
        <span class="building__detail">
          {t('home.updated', { when: when(record.updatedAt, now) })}
          {record.building.storeys.length > 0 &&
            ` · ${
              record.building.storeys.length === 1
                ? t('home.storeyOne')
                : t('home.storeys', { count: record.building.storeys.length })
            }`}
          {record.inspector && ` · ${record.inspector}`}
        </span>
      </a>
    </li>
  );
}
