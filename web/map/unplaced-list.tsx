/** Surveys without a location: they cannot be drawn, so they are listed, never dropped. */
import { paths } from '../app/routes.js';
import { t } from '../i18n/index.js';
import type { UnplacedSurvey } from './map-points.js';
import { PostingBadge } from './summary-card.js';

export function UnplacedList({ surveys }: { surveys: readonly UnplacedSurvey[] }) {
  return (
    <div class="gl-unplaced">
      <p class="muted">{t('map.unplaced.why')}</p>
      <ul class="gl-unplaced__list">
        {surveys.slice(0, 500).map((s) => (
          <li key={s.id}>
            <a href={paths.survey(s.id)}>{s.address.trim() || t('map.card.noAddress')}</a>
            <PostingBadge posting={s.posting} />
          </li>
        ))}
      </ul>
      {surveys.length > 500 ? (
        <p class="muted">{t('map.unplaced.more', { count: surveys.length - 500 })}</p>
      ) : null}
    </div>
  );
}
