/**
 * The card a tap on a marker opens: what the team lead needs at a glance (posting, damage
 * state, engineer needed, who and when), and the way into the survey itself. Imported text
 * (address, inspector) is shown as text.
 */
import { paths } from '../app/routes.js';
import { t } from '../i18n/index.js';
import type { MapPoint, UnplacedSurvey } from './map-points.js';
import { damageLabel, damageTag, postingStyle } from './marker-style.js';
import { valueWord } from './option-words.js';
import { PostingSymbol } from './posting-swatch.js';

export function PostingBadge({ posting }: { posting: MapPoint['posting'] }) {
  const s = postingStyle(posting);
  return (
    <span
      class="gl-posting"
      style={{ backgroundColor: s.fill, borderColor: s.border, color: s.ink }}
    >
      <PostingSymbol posting={posting} size={18} />
      {t(s.label)}
    </span>
  );
}

function day(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime())
    ? iso
    : d.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}

export function SummaryCard({
  survey,
  onClose,
}: {
  survey: MapPoint | UnplacedSurvey;
  onClose(): void;
}) {
  const tag = damageTag(survey.damage);
  return (
    <section class="gl-card" aria-labelledby="gl-card-title" data-testid="summary-card">
      <div class="gl-card__head">
        <h2 id="gl-card-title" class="gl-card__title">
          {survey.address.trim() || t('map.card.noAddress')}
        </h2>
        <button
          type="button"
          class="button gl-card__close"
          onClick={onClose}
          aria-label={t('map.card.close')}
        >
          ✕
        </button>
      </div>
      <div class="gl-card__verdict">
        <PostingBadge posting={survey.posting} />
        <span class="gl-card__damage">
          {tag ? (
            <span class="gl-swatch gl-swatch--tag" aria-hidden="true">
              {tag}
            </span>
          ) : null}
          {t('map.card.damage', { state: t(damageLabel(survey.damage)) })}
        </span>
      </div>
      {survey.needsAssessment ? (
        <p class="gl-card__flag">
          <span class="gl-swatch gl-swatch--flag" aria-hidden="true">
            !
          </span>{' '}
          {t('map.card.assessment')}
        </p>
      ) : null}
      {survey.conflict ? <p class="gl-card__conflict">{t('map.card.conflict')}</p> : null}
      <dl class="gl-card__facts">
        <div>
          <dt>{t('map.card.system')}</dt>
          <dd>{valueWord('system', survey.system)}</dd>
        </div>
        <div>
          <dt>{t('map.card.inspector')}</dt>
          <dd>{valueWord('inspector', survey.inspector)}</dd>
        </div>
        <div>
          <dt>{t('map.card.updated')}</dt>
          <dd>{day(survey.updatedAt)}</dd>
        </div>
        <div>
          <dt>{t('map.card.revision')}</dt>
          <dd>{survey.revision}</dd>
        </div>
      </dl>
      <a class="button button--primary button--wide" href={paths.survey(survey.id)}>
        {t('map.card.open')}
      </a>
      <p class="gl-card__caution muted">{t('exchange.caution.short')}</p>
    </section>
  );
}
