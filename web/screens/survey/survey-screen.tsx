/**
 * One survey, step by step: Place, Building, Walls, Observations, Hazard, then the verdict.
 * Each step has its own address, so the step bar, a reload or a shared link opens it
 * directly. Every change goes to the draft saver at once (stored within 300 ms); the save
 * indicator says "Saved" only when the write has completed.
 */
import { useEffect, useMemo, useRef } from 'preact/hooks';
import '../../styles/screens.css';
import { useSurveyDraft, type SurveyDraft } from '../../storage/index.js';
import type { SurveyRecord } from '../../../forms/index.js';
import { backupUnsaved, dropBackup, takeBackup } from './unsaved-backup.js';
import { t } from '../../i18n/index.js';
import { paths } from '../../app/routes.js';
import { useUnits } from '../settings/preferences.js';
import { BuildingStep } from './building-step.js';
import { HazardStep } from './hazard-step.js';
import { IssueSummary } from './issue-summary.js';
import { ObservationsStep } from './observations-step.js';
import { PlaceStep } from './place-step.js';
import { SaveIndicator } from './save-indicator.js';
import { StepBar } from './step-bar.js';
import type { StepContext } from './step-context.js';
import { stepIssues } from './step-issues.js';
import { RESULT_STEP, STEPS, pageFromParam, stepLabels, type StepId } from './steps.js';
import { computeResult, inputsKey } from '../result/result-model.js';
import { ResultView } from '../result/result-view.js';
import { readyToScreen } from './step-issues.js';
import { CALC_VERSION } from '../../../calc/index.js';
import { WallsStep } from './walls-step.js';
import { DraftNotices } from './draft-notices.js';

/**
 * Keeps a synchronous copy of an unsaved change when the page goes away, and restores it
 * once when the survey is opened again (see unsaved-backup.ts).
 */
function useUnsavedBackup(draft: SurveyDraft): void {
  const latest = useRef(draft);
  latest.current = draft;
  const restored = useRef(false);
  useEffect(() => {
    const onHide = () => {
      const d = latest.current;
      if (d.record && d.saveState !== 'saved') backupUnsaved(d.record);
    };
    window.addEventListener('pagehide', onHide);
    return () => window.removeEventListener('pagehide', onHide);
  }, []);
  useEffect(() => {
    if (restored.current || draft.loading || !draft.record) return;
    restored.current = true;
    const copy = takeBackup(draft.record);
    if (copy && JSON.stringify(copy) !== JSON.stringify(draft.record)) draft.update(() => copy);
  }, [draft.loading, draft.record]);
  useEffect(() => {
    if (draft.record && draft.saveState === 'saved') dropBackup(draft.record.id);
  }, [draft.saveState]);
}

const STEP_COMPONENTS: Record<StepId, (p: { ctx: StepContext }) => preact.JSX.Element> = {
  place: PlaceStep,
  building: BuildingStep,
  walls: WallsStep,
  observations: ObservationsStep,
  hazard: HazardStep,
};

export function SurveyScreen(props: { params: { id?: string; step?: string } }) {
  const id = props.params.id ?? '';
  const page = pageFromParam(props.params.step);
  const draft = useSurveyDraft(id);
  const system = useUnits();
  const heading = useRef<HTMLHeadingElement>(null);
  const record = draft.record;
  useUnsavedBackup(draft);
  const issues = useMemo(() => (record ? stepIssues(record, system) : null), [record, system]);
  const ready = issues !== null && readyToScreen(issues);
  // The result depends on the inputs only: storing it must not run the calculation again.
  const key = record ? inputsKey(record) : '';
  const model = useMemo(
    () => (record && page === RESULT_STEP ? computeResult(record, ready) : null),
    [key, ready, page === RESULT_STEP],
  );

  // The verdict shown is the verdict stored: the building list, the map and the exports
  // read it from the record.
  useEffect(() => {
    const s = model?.screening;
    if (!record || !s || page !== RESULT_STEP) return;
    if (record.result && JSON.stringify(record.result.result) === JSON.stringify(s)) return;
    draft.update((r) => ({
      ...r,
      result: {
        calcVersion: CALC_VERSION,
        computedAt: new Date().toISOString(),
        result: s as unknown as NonNullable<typeof r.result>['result'],
      },
    }));
  }, [model]);

  // A new step starts at its heading: scrolled to the top, focus there for the keyboard.
  const firstRender = useRef(true);
  useEffect(() => {
    if (firstRender.current) {
      firstRender.current = false;
      return;
    }
    window.scrollTo(0, 0);
    heading.current?.focus({ preventScroll: true });
  }, [page]);

  if (draft.loading) {
    return (
      <main class="screen" id="main">
        <h1>{t('loading')}</h1>
      </main>
    );
  }
  if (!record || !issues) {
    return (
      <main class="screen" id="main">
        <h1>{t('survey.notFoundTitle')}</h1>
        <p>{draft.error?.message ?? t('survey.notFound')}</p>
        <p>
          <a class="button button--primary" href={paths.home}>
            {t('notFound.home')}
          </a>
        </p>
      </main>
    );
  }

  // Any change to an input makes a stored verdict stale: it is removed, so the list and
  // the exports never show a verdict the inputs no longer support (revisions keep it).
  const edit = (fn: (r: SurveyRecord) => SurveyRecord) =>
    draft.update((r) => {
      const next = fn(r);
      return next.result !== null && inputsKey(next) !== inputsKey(r)
        ? { ...next, result: null }
        : next;
    });
  const ctx: StepContext = { record, edit, system };
  const isResult = page === RESULT_STEP;
  const step: StepId = isResult ? 'hazard' : page;
  const index = isResult ? STEPS.length : STEPS.indexOf(step);
  const prev = isResult ? 'hazard' : STEPS[index - 1];
  const next = isResult ? undefined : STEPS[index + 1];
  const Step = STEP_COMPONENTS[step];
  const stepName = t(stepLabels[isResult ? RESULT_STEP : step]);

  return (
    <main class="screen survey" id="main">
      <div class="survey__top no-print">
        <p class="survey__address">
          {record.address.trim() === '' ? t('survey.untitled') : record.address}
        </p>
        <SaveIndicator
          state={draft.saveState}
          error={draft.error?.message ?? null}
          onRetry={() => void draft.retry()}
        />
      </div>
      <DraftNotices draft={draft} />
      <StepBar id={record.id} current={page} issues={issues} />
      <h1 ref={heading} tabIndex={-1} class="survey__heading">
        {!isResult && (
          <span class="survey__kicker">
            {t('survey.stepOf', { n: index + 1, total: STEPS.length })}
          </span>
        )}
        {stepName}
      </h1>
      {isResult && model ? (
        <ResultView record={record} model={model} issues={issues} ready={ready} system={system} />
      ) : (
        <>
          <IssueSummary issues={issues[step]} stepName={stepName} />
          <Step ctx={ctx} />
        </>
      )}
      <nav class="step-nav no-print" aria-label={t('steps.prevNext')}>
        {prev ? (
          <a class="button" href={paths.survey(record.id, prev)}>
            <span aria-hidden="true">← </span>
            {t(stepLabels[prev])}
          </a>
        ) : (
          <span />
        )}
        {next ? (
          <a class="button button--primary" href={paths.survey(record.id, next)}>
            {t('steps.next', { step: t(stepLabels[next]) })}
            <span aria-hidden="true"> →</span>
          </a>
        ) : isResult ? (
          <span />
        ) : (
          <a class="button button--primary" href={paths.result(record.id)}>
            {t('steps.toResult')}
            <span aria-hidden="true"> →</span>
          </a>
        )}
      </nav>
    </main>
  );
}
