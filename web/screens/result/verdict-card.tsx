/**
 * The verdict: the recommended posting (symbol + word + colour, and what it means), the
 * governing damage state with its probabilities as labelled bars, whether it was set by what
 * was seen or by the prediction, the flags that call for a detailed assessment, and the
 * confidence statement. Before the survey can be screened it says so, and what is missing.
 */
import type { DamageState, ScreeningResult } from '../../../calc/index.js';
import { DAMAGE_STATES } from '../../../calc/index.js';
import { damageStateLabels, postingStyles } from '../../app/posting-style.js';
import { paths } from '../../app/routes.js';
import { t } from '../../i18n/index.js';
import type { StepIssues } from '../survey/step-issues.js';
import { STEPS, stepLabels } from '../survey/steps.js';
import { confidenceHeadline } from './confidence-headline.js';

function Probabilities({ s }: { s: ScreeningResult }) {
  const p = s.damage.probabilities;
  if (!p) return <p class="muted">{t('verdict.noProbabilities')}</p>;
  return (
    <div class="probabilities">
      <h3 class="subhead">{t('verdict.probabilities')}</h3>
      <ul class="prob-list">
        {DAMAGE_STATES.map((state: DamageState) => {
          const v = p.discrete[state];
          const pct = Math.round(v * 100);
          const governing = state === s.damage.state;
          return (
            <li key={state} class={governing ? 'prob prob--governing' : 'prob'}>
              <span class="prob__label">
                {governing && <span aria-hidden="true">◆ </span>}
                {t(damageStateLabels[state])}
              </span>
              <span class="prob__bar" aria-hidden="true">
                <span class="prob__fill" style={{ width: `${Math.max(v * 100, 0.5)}%` }} />
              </span>
              <span class="prob__value">{pct < 1 && v > 0 ? '<1' : pct} %</span>
            </li>
          );
        })}
      </ul>
      <p class="field__hint">{t(p.basis === 'drift' ? 'verdict.basisDrift' : 'verdict.basisSd')}</p>
    </div>
  );
}

export function VerdictCard(props: {
  id: string;
  screening: ScreeningResult | null;
  ready: boolean;
  issues: StepIssues;
  storedAt: string | null;
}) {
  const s = props.screening;
  if (!s) {
    return (
      <section class="card verdict" aria-labelledby="verdict-title">
        <h2 id="verdict-title">{t('result.verdictTitle')}</h2>
        <div class="verdict__pending">
          <p class="verdict__label">
            <span aria-hidden="true">◌ </span>
            {t('posting.unscreened')}
          </p>
          <p>{t(props.ready ? 'verdict.failed' : 'verdict.notReady')}</p>
        </div>
        {!props.ready && (
          <ul class="verdict__gaps">
            {STEPS.map((step) =>
              props.issues[step].length === 0 ? null : (
                <li key={step}>
                  <a href={paths.survey(props.id, step)}>
                    {t('result.gapsIn', {
                      step: t(stepLabels[step]),
                      count: props.issues[step].length,
                    })}
                  </a>
                </li>
              ),
            )}
          </ul>
        )}
        {props.storedAt && (
          <p class="muted">{t('verdict.storedNotShown', { when: props.storedAt })}</p>
        )}
      </section>
    );
  }
  const style = postingStyles[s.posting.level];
  return (
    <section class="card verdict" aria-labelledby="verdict-title">
      <h2 id="verdict-title">{t('result.verdictTitle')}</h2>
      <div
        class="posting"
        style={{ background: style.fill, borderColor: style.border, color: style.ink }}
      >
        <p class="posting__word">
          <span class="posting__symbol" aria-hidden="true">
            {style.symbol}
          </span>{' '}
          {t(style.label)}
        </p>
        <p class="posting__meaning">{t(`${style.label}.meaning` as Parameters<typeof t>[0])}</p>
      </div>
      <p class="damage">
        {t('verdict.damage')} <strong>{t(damageStateLabels[s.damage.state])}</strong>
        <span class="muted">
          {' '}
          ·{' '}
          {t(`verdict.governed.${s.damage.governedBy}` as Parameters<typeof t>[0], {
            predicted: s.damage.predicted ? t(damageStateLabels[s.damage.predicted]) : '—',
            observed: t(damageStateLabels[s.damage.observed]),
          })}
        </span>
      </p>
      {s.needsAssessment && (
        <div class="assessment" role="note">
          <p class="assessment__title">
            <span aria-hidden="true">⚑ </span>
            {t('verdict.assessment')}
          </p>
          <ul class="flags">
            {s.flags.map((f) => (
              <li key={f.id}>{f.reasons.join(' ')}</li>
            ))}
          </ul>
        </div>
      )}
      <Probabilities s={s} />
      <details class="more">
        <summary>{t('verdict.why')}</summary>
        <ul class="assumptions">
          {s.reasons.map((r, i) => (
            <li key={i}>{r}</li>
          ))}
        </ul>
      </details>
      <p class={`confidence confidence--${s.confidence.level}`}>
        {/* On screen the lists follow under "Assumed, defaulted or missing"; a print skips
            those lists, so the page keeps the whole statement. */}
        <span class="print-skip">
          {confidenceHeadline(s.confidence.statement)}
          {confidenceHeadline(s.confidence.statement) !== s.confidence.statement &&
            ` ${t('verdict.confidenceListed')}`}
        </span>
        <span class="print-only">{s.confidence.statement}</span>
      </p>
    </section>
  );
}
