/**
 * The top of a step: what in this step is not valid yet (errors, each a link to its field)
 * and what is still missing for the screening. Nothing here blocks moving on: an inspector
 * may fill the steps in any order.
 */
import { t } from '../../i18n/index.js';
import type { StepIssue } from './step-issues.js';

function focusTarget(e: Event, target: string) {
  const el = document.getElementById(target);
  if (!el) return;
  e.preventDefault();
  // Open a closed <details> that holds the field, then bring it under the thumb.
  let parent = el.parentElement;
  while (parent) {
    if (parent instanceof HTMLDetailsElement) parent.open = true;
    parent = parent.parentElement;
  }
  el.scrollIntoView({ block: 'center' });
  const focusable = el.matches('input, select, textarea, button, a')
    ? el
    : el.querySelector<HTMLElement>('input, select, textarea, button');
  (focusable ?? el).focus({ preventScroll: true });
}

export function IssueSummary(props: { issues: readonly StepIssue[]; stepName: string }) {
  const errors = props.issues.filter((i) => i.kind === 'error');
  const gaps = props.issues.filter((i) => i.kind === 'gap');
  if (props.issues.length === 0) return null;
  return (
    <div class="issue-summary">
      {errors.length > 0 && (
        <section class="issue-summary__errors" aria-labelledby="issues-errors-title">
          <h2 id="issues-errors-title" class="issue-summary__title">
            <span aria-hidden="true">✖ </span>
            {t('issues.errorsTitle', { count: errors.length, step: props.stepName })}
          </h2>
          <ul>
            {errors.map((e) => (
              <li key={e.path}>
                <a href={`#${e.target}`} onClick={(ev) => focusTarget(ev, e.target)}>
                  {e.message}
                </a>
              </li>
            ))}
          </ul>
        </section>
      )}
      {gaps.length > 0 && (
        <details class="issue-summary__gaps">
          <summary>{t('issues.gapsTitle', { count: gaps.length })}</summary>
          <ul>
            {gaps.map((g, i) => (
              <li key={`${g.path}${i}`}>
                <a href={`#${g.target}`} onClick={(ev) => focusTarget(ev, g.target)}>
                  {g.message}
                </a>
              </li>
            ))}
          </ul>
        </details>
      )}
    </div>
  );
}
