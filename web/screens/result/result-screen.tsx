/**
 * The result of a survey ("Verdict"): the recommended posting and damage state with their
 * evidence, the response-spectrum plot with the period and the demand marked, the drift
 * profile, θ/α gauges for rocking walls, what was assumed or defaulted, and the cautions.
 * Printing this screen gives a one-page building report (print.css).
 *
 * The damage state, its probabilities and the posting come from `screen()` in calc/screening.
 * Until that lands this screen says plainly that no verdict is computed, and shows what the
 * calculation already offers.
 */
import { useMemo } from 'preact/hooks';
import '../../styles/screens.css';
import { CALC_VERSION, ROCKING_BAND_LIMITS, spectralAcceleration } from '../../../calc/index.js';
import { formatQuantity, shownUnit } from '../../../forms/units/index.js';
import { useSurveyDraft } from '../../storage/index.js';
import { CautionNote } from '../../app/caution-note.js';
import { paths } from '../../app/routes.js';
import { t } from '../../i18n/index.js';
import { useUnits } from '../settings/preferences.js';
import { StepBar } from '../survey/step-bar.js';
import { readyToScreen, stepIssues } from '../survey/step-issues.js';
import { STEPS, stepLabels } from '../survey/steps.js';
import { SaveIndicator } from '../survey/save-indicator.js';
import { sampleSpectrum } from '../survey/hazard-step.js';
import { DriftProfilePlot, type DriftSeries } from './drift-profile-plot.js';
import { RockingGauge } from './rocking-gauge.js';
import { SpectrumPlot } from './spectrum-plot.js';
import { computeResult } from './result-model.js';
import { EvidenceTable, type EvidenceRow } from './evidence-table.js';
import { PrintHeader } from './print-header.js';

const PERIOD_KIND_KEYS = {
  measured: 'result.period.measured',
  modal: 'result.period.modal',
  empirical: 'result.period.empirical',
} as const;

export function ResultScreen(props: { params: { id?: string } }) {
  const id = props.params.id ?? '';
  const draft = useSurveyDraft(id);
  const system = useUnits();
  const record = draft.record;
  const model = useMemo(() => (record ? computeResult(record) : null), [record]);
  const issues = useMemo(() => (record ? stepIssues(record, system) : null), [record, system]);

  if (draft.loading) {
    return (
      <main class="screen" id="main">
        <h1>{t('loading')}</h1>
      </main>
    );
  }
  if (!record || !model || !issues) {
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

  const ready = readyToScreen(issues);
  const r = model.response;
  const hazard = record.hazard;
  const dirs = (['x', 'y'] as const).map((d) => ({ d, resp: r?.[d] ?? null }));
  const usedPeriods = dirs
    .map(({ d, resp }) => ({ d, T: resp?.period.usedS ?? null, kind: resp?.period.kind ?? null }))
    .filter(
      (p): p is { d: 'x' | 'y'; T: number; kind: 'measured' | 'modal' | 'empirical' } =>
        p.T !== null && p.kind !== null,
    );
  const main = usedPeriods[0] ?? null;
  const n = record.building.storeys.length;

  // Drift profile: observed residual drift, and the estimated peak elastic drift.
  const observed = (d: 'x' | 'y') =>
    record.building.storeys.map(
      (_s, i) =>
        record.observations.residualDrift.find((x) => x.storey === i && x.direction === d)?.ratio ??
        null,
    );
  const series: DriftSeries[] = [
    { key: 'ox', label: t('result.drift.observedX'), marker: 'circle', ratios: observed('x') },
    { key: 'oy', label: t('result.drift.observedY'), marker: 'square', ratios: observed('y') },
  ];
  for (const { d, resp } of dirs) {
    if (resp?.demand) {
      series.push({
        key: `e${d}`,
        label: t(d === 'x' ? 'result.drift.estimatedX' : 'result.drift.estimatedY'),
        marker: d === 'x' ? 'diamond' : 'cross',
        ratios: resp.demand.driftRatios,
      });
    }
  }

  // Evidence available before screen(): storey demand over capacity, rocking θ/α.
  const evidence: EvidenceRow[] = [];
  for (const { d, resp } of dirs) {
    resp?.demandToCapacity?.forEach((dc, i) => {
      if (dc === null) return;
      evidence.push({
        key: `dc-${d}-${i}`,
        label: t('result.evidence.dc', {
          storey: i + 1,
          direction: t(d === 'x' ? 'walls.alongX' : 'walls.alongY'),
        }),
        value: dc.toFixed(2),
        threshold: '1.00',
        exceeds: dc > 1,
        note: evidence.length === 0 ? t('result.evidence.dcNote') : undefined,
      });
    });
  }
  for (const a of model.rocking) {
    const ratio = a.observed?.ratio ?? null;
    if (ratio !== null) {
      evidence.push({
        key: `rock-obs-${a.wallId}`,
        label: t('result.evidence.rockingObserved', { id: a.wallId }),
        value: ratio.toFixed(2),
        threshold: ROCKING_BAND_LIMITS.large.toFixed(2),
        exceeds: ratio >= ROCKING_BAND_LIMITS.large,
        note: evidence.some((e) => e.key.startsWith('rock-'))
          ? undefined
          : t('result.evidence.rockingNote'),
      });
    }
  }

  const lengthUnit = t(`unit.${shownUnit('length', system)}`);
  const assumptions = [
    ...(r?.assumptions.map((a) => ({ key: a.id, text: a.text, source: a.source })) ?? []),
    ...model.rocking.flatMap((a) =>
      a.assumptions.map((text, i) => ({
        key: `${a.wallId}-${i}`,
        text: `${t('walls.wallName', { id: a.wallId })}: ${text}`,
        source: '',
      })),
    ),
  ];
  const missing = r?.missingInputs ?? [];
  const rockingCautions = [...new Set(model.rocking.flatMap((a) => a.cautions))];
  const unconfirmedCount = record.unconfirmed.length;

  return (
    <main class="screen survey result" id="main">
      <PrintHeader record={record} system={system} />
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
      <StepBar id={record.id} current="result" issues={issues} />
      <h1 class="survey__heading">{t('step.result')}</h1>

      <section class="card verdict" aria-labelledby="verdict-title">
        <h2 id="verdict-title">{t('result.verdictTitle')}</h2>
        <div class="verdict__pending">
          <p class="verdict__label">
            <span aria-hidden="true">◌ </span>
            {t('posting.unscreened')}
          </p>
          <p>{t('result.noScreenYet')}</p>
        </div>
        {!ready && (
          <div class="verdict__gaps">
            <p>{t('result.notReady')}</p>
            <ul>
              {STEPS.map((s) =>
                issues[s].length === 0 ? null : (
                  <li key={s}>
                    <a href={paths.survey(record.id, s)}>
                      {t('result.gapsIn', { step: t(stepLabels[s]), count: issues[s].length })}
                    </a>
                  </li>
                ),
              )}
            </ul>
          </div>
        )}
        {unconfirmedCount > 0 && (
          <p class="muted">{t('result.unconfirmed', { count: unconfirmedCount })}</p>
        )}
      </section>

      <section class="card" aria-labelledby="period-title">
        <h2 id="period-title">{t('result.periodTitle')}</h2>
        {model.responseError && (
          <p class="field__error" role="alert">
            {t('result.calcFailed', { reason: model.responseError })}
          </p>
        )}
        {!hazard && <p class="muted">{t('result.noHazard')}</p>}
        <dl class="figures">
          {dirs.map(({ d, resp }) => {
            const p = resp?.period;
            return (
              <div key={d} class="figures__row">
                <dt>{t(d === 'x' ? 'result.periodX' : 'result.periodY')}</dt>
                <dd>
                  {p?.usedS != null && p.kind ? (
                    <>
                      <strong>{p.usedS.toFixed(2)} s</strong> {t(PERIOD_KIND_KEYS[p.kind])}
                      {p.kind !== 'empirical' && p.empiricalS !== null && (
                        <span class="muted">
                          {' '}
                          · {t('result.period.empiricalBeside', { T: p.empiricalS.toFixed(2) })}
                        </span>
                      )}
                      {resp?.demand && (
                        <span class="muted">
                          {' '}
                          · {t('result.saAt', { sa: resp.demand.spectralAccelerationG.toFixed(3) })}
                        </span>
                      )}
                    </>
                  ) : (
                    t('result.notComputed')
                  )}
                </dd>
              </div>
            );
          })}
          {r?.totalHeightM != null && (
            <div class="figures__row">
              <dt>{t('result.height')}</dt>
              <dd>
                {formatQuantity(r.totalHeightM, 'length', system)} {lengthUnit}
              </dd>
            </div>
          )}
        </dl>
        {hazard && (
          <SpectrumPlot
            id="result-spectrum"
            points={sampleSpectrum(hazard, Math.max(4, (main?.T ?? 0) * 1.3))}
            marks={usedPeriods.map((q) => ({
              label: q.d,
              periodS: q.T,
              saG: spectralAcceleration(hazard, q.T),
            }))}
            title={t('plot.spectrumTitle')}
            summary={
              usedPeriods.length > 0
                ? usedPeriods
                    .map((q) =>
                      t('result.spectrumSummary', {
                        direction: q.d,
                        T: q.T.toFixed(2),
                        sa: spectralAcceleration(hazard, q.T).toFixed(3),
                      }),
                    )
                    .join(' ')
                : t('result.spectrumNoPeriod')
            }
          />
        )}
      </section>

      {n > 0 && (
        <section class="card" aria-labelledby="drift-title">
          <h2 id="drift-title">{t('result.driftTitle')}</h2>
          <DriftProfilePlot
            id="result-drift"
            storeys={n}
            series={series}
            title={t('result.driftTitle')}
            summary={driftSummary(series)}
          />
          <p class="field__hint">{t('result.driftNote')}</p>
        </section>
      )}

      {model.rocking.length > 0 && (
        <section class="card" aria-labelledby="rocking-title">
          <h2 id="rocking-title">{t('result.rockingTitle')}</h2>
          {model.rocking.map((a) => (
            <div key={a.wallId} class="rocking-wall">
              <RockingGauge
                id={`gauge-${a.wallId.replace(/[^A-Za-z0-9-]/g, '-')}`}
                wallId={a.wallId}
                observed={a.observed?.ratio ?? null}
                predicted={a.predictedRatio}
                limits={[
                  { ratio: ROCKING_BAND_LIMITS.moderate, label: t('result.band.large') },
                  { ratio: ROCKING_BAND_LIMITS.large, label: t('result.band.near') },
                  { ratio: ROCKING_BAND_LIMITS.nearToppling, label: t('result.band.topple') },
                ]}
                summary={t('result.gaugeSummary', {
                  id: a.wallId,
                  observed: a.observed ? a.observed.ratio.toFixed(2) : t('plot.notKnown'),
                  predicted:
                    a.predictedRatio !== null ? a.predictedRatio.toFixed(2) : t('plot.notKnown'),
                })}
              />
              {a.observed && <p>{a.observed.text}</p>}
              {a.reasons.length > 0 && (
                <ul class="flags">
                  {a.reasons.map((reason) => (
                    <li key={reason}>
                      <span aria-hidden="true">⚑ </span>
                      {reason}
                    </li>
                  ))}
                </ul>
              )}
            </div>
          ))}
          {model.rockingErrors.map((e) => (
            <p key={e.wallId} class="field__error">
              {t('result.rockingFailed', { id: e.wallId, reason: e.message })}
            </p>
          ))}
        </section>
      )}

      {evidence.length > 0 && (
        <section class="card" aria-labelledby="evidence-title">
          <h2 id="evidence-title">{t('result.evidenceTitle')}</h2>
          <EvidenceTable rows={evidence} />
        </section>
      )}

      <section class="card" aria-labelledby="assumed-title">
        <h2 id="assumed-title">{t('result.assumedTitle')}</h2>
        {assumptions.length === 0 && missing.length === 0 && (
          <p class="muted">{t('result.nothingAssumed')}</p>
        )}
        {missing.length > 0 && (
          <>
            <h3 class="subhead">{t('result.missingTitle')}</h3>
            <ul class="assumptions">
              {missing.map((m, i) => (
                <li key={`${m.field}${i}`}>
                  <span aria-hidden="true">{m.problem === 'invalid' ? '✖ ' : '○ '}</span>
                  <code>{m.field}</code>: {m.effect}
                </li>
              ))}
            </ul>
          </>
        )}
        {assumptions.length > 0 && (
          <details class="more" open>
            <summary>{t('result.assumptionsTitle', { count: assumptions.length })}</summary>
            <ul class="assumptions">
              {assumptions.map((a) => (
                <li key={a.key}>
                  {a.text}
                  {a.source && <span class="muted"> ({a.source})</span>}
                </li>
              ))}
            </ul>
          </details>
        )}
      </section>

      <section class="card" aria-labelledby="cautions-title">
        <h2 id="cautions-title">{t('result.cautionsTitle')}</h2>
        <ul class="assumptions">
          {rockingCautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
          <li>{t('result.elasticCaution')}</li>
        </ul>
      </section>
      <CautionNote />

      <p class="no-print">
        <button type="button" class="button button--wide" onClick={() => window.print()}>
          {t('result.print')}
        </button>
      </p>
      <p class="muted print-footer">
        {t('result.versions', { calc: CALC_VERSION, build: __BUILD_ID__ })}
      </p>
      <nav class="step-nav no-print" aria-label={t('steps.prevNext')}>
        <a class="button" href={paths.survey(record.id, 'hazard')}>
          <span aria-hidden="true">← </span>
          {t('step.hazard')}
        </a>
        <a class="button" href={paths.home}>
          {t('result.toList')}
        </a>
      </nav>
    </main>
  );
}

function driftSummary(series: readonly DriftSeries[]): string {
  const parts = series
    .map((s) => {
      const values = s.ratios
        .map((r, i) =>
          r === null ? null : t('result.driftPart', { storey: i + 1, pct: (r * 100).toFixed(2) }),
        )
        .filter((x): x is string => x !== null);
      return values.length > 0 ? `${s.label}: ${values.join(', ')}` : null;
    })
    .filter((x): x is string => x !== null);
  return parts.length > 0 ? `${parts.join('. ')}.` : t('result.driftNone');
}
