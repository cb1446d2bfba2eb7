/**
 * The step bar: every step (and the result) one tap away, in a 3 × 2 grid of 48 px targets
 * that fits 360 px. The current step is marked with aria-current and a thick frame; each
 * step says whether it has entries to fix (✖ n) or things still to do (• n), in words for
 * screen readers.
 */
import { t } from '../../i18n/index.js';
import { paths } from '../../app/routes.js';
import { STEPS, stepLabels, type StepId } from './steps.js';
import type { StepIssues } from './step-issues.js';

export function StepBar(props: { id: string; current: StepId | 'result'; issues: StepIssues }) {
  const items = [...STEPS, 'result'] as const;
  return (
    <nav class="step-bar no-print" aria-label={t('steps.label')}>
      <ol class="step-bar__list">
        {items.map((step, i) => {
          const list = step === 'result' ? [] : props.issues[step];
          const errors = list.filter((x) => x.kind === 'error').length;
          const gaps = list.length - errors;
          const current = props.current === step;
          const status =
            step === 'result'
              ? ''
              : errors > 0
                ? t('steps.errors', { count: errors })
                : gaps > 0
                  ? t('steps.todo', { count: gaps })
                  : t('steps.done');
          return (
            <li key={step}>
              <a
                class={`step-bar__item${errors > 0 ? ' step-bar__item--error' : ''}`}
                href={step === 'result' ? paths.result(props.id) : paths.survey(props.id, step)}
                aria-current={current ? 'step' : undefined}
              >
                <span class="step-bar__num" aria-hidden="true">
                  {step === 'result' ? '◆' : i + 1}
                </span>
                <span class="step-bar__label">{t(stepLabels[step])}</span>
                {step !== 'result' && (
                  <span class="step-bar__status" aria-hidden="true">
                    {errors > 0 ? `✖${errors}` : gaps > 0 ? `•${gaps}` : '✓'}
                  </span>
                )}
                {status && <span class="visually-hidden">, {status}</span>}
              </a>
            </li>
          );
        })}
      </ol>
    </nav>
  );
}
