/**
 * The body of the result step ("Verdict"): the verdict card, the evidence, the response
 * spectrum with the period and demand of each direction marked, the drift profile, θ/α
 * gauges for rocking walls, what was assumed or defaulted, and the cautions. Printing it
 * gives a one-page building report (print.css).
 *
 * The verdict is `screen()` of calc/screening, run only when the survey is complete enough
 * to screen (nothing missing, nothing to confirm, no entry kept as text). Before that the
 * plots show what the storey model already says, and the card says what is missing.
 */
import {
  CALC_VERSION,
  ROCKING_BAND_LIMITS,
  fieldLabel,
  spectralAcceleration,
} from '../../../calc/index.js';
import type { SurveyRecord } from '../../../forms/index.js';
import { formatQuantity, shownUnit, type UnitSystem } from '../../../forms/units/index.js';
import { CautionNote } from '../../app/caution-note.js';
import { paths } from '../../app/routes.js';
import { t } from '../../i18n/index.js';
import { sampleSpectrum } from '../survey/hazard-step.js';
import type { StepIssues } from '../survey/step-issues.js';
import { DriftProfilePlot, type DriftSeries } from './drift-profile-plot.js';
import { groupAlike } from './evidence-groups.js';
import { EvidenceTables } from './evidence-table.js';
import { PrintHeader } from './print-header.js';
import type { ResultModel } from './result-model.js';
import { RockingGauge } from './rocking-gauge.js';
import { SpectrumPlot } from './spectrum-plot.js';
import { VerdictCard } from './verdict-card.js';

const PERIOD_KIND_KEYS: Record<string, Parameters<typeof t>[0]> = {
  measured: 'result.period.measured',
  modal: 'result.period.modal',
  empirical: 'result.period.empirical',
};

interface DirectionFigures {
  d: 'x' | 'y';
  periodS: number | null;
  kind: string | null;
  saG: number | null;
  peakDrift: (number | null)[] | null;
}

interface GaugeFigures {
  wallId: string;
  observed: number | null;
  predicted: number | null;
  reasons: string[];
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

export function ResultView(props: {
  record: SurveyRecord;
  model: ResultModel;
  issues: StepIssues;
  ready: boolean;
  system: UnitSystem;
}) {
  const { record, model, issues, ready, system } = props;
  const s = model.screening;
  const r = model.response;
  const hazard = record.hazard;
  const n = record.building.storeys.length;

  const dirs: DirectionFigures[] = (['x', 'y'] as const).map((d) => {
    if (s) {
      const x = s.directions[d];
      return {
        d,
        periodS: x.periodS,
        kind: x.periodKind,
        saG: x.spectralAccelerationG,
        peakDrift: x.elasticDriftRatios.map((v) => (v === null ? null : v * x.inelasticFactor)),
      };
    }
    const x = r?.[d];
    return {
      d,
      periodS: x?.period.usedS ?? null,
      kind: x?.period.kind ?? null,
      saG: x?.demand?.spectralAccelerationG ?? null,
      peakDrift: x?.demand?.driftRatios ?? null,
    };
  });
  const marks = dirs
    .filter((x): x is DirectionFigures & { periodS: number } => x.periodS !== null)
    .map((x) => ({
      label: x.d,
      periodS: x.periodS,
      saG: x.saG ?? (hazard ? spectralAcceleration(hazard, x.periodS) : 0),
    }));

  const observed = (d: 'x' | 'y') =>
    record.building.storeys.map(
      (_st, i) =>
        record.observations.residualDrift.find((o) => o.storey === i && o.direction === d)?.ratio ??
        null,
    );
  const series: DriftSeries[] = [
    { key: 'ox', label: t('result.drift.observedX'), marker: 'circle', ratios: observed('x') },
    { key: 'oy', label: t('result.drift.observedY'), marker: 'square', ratios: observed('y') },
  ];
  for (const x of dirs) {
    if (x.peakDrift) {
      series.push({
        key: `e${x.d}`,
        label: t(x.d === 'x' ? 'result.drift.estimatedX' : 'result.drift.estimatedY'),
        marker: x.d === 'x' ? 'diamond' : 'cross',
        ratios: x.peakDrift,
      });
    }
  }

  const gauges: GaugeFigures[] = s
    ? s.rockingWalls
        .filter((w) => w.rockingWall || w.observedRatio !== null)
        .map((w) => ({
          wallId: w.wallId,
          observed: w.observedRatio,
          predicted: w.predictedRatio,
          reasons: w.reasons,
        }))
    : model.rocking.map((a) => ({
        wallId: a.wallId,
        observed: a.observed?.ratio ?? null,
        predicted: a.predictedRatio,
        reasons: a.reasons,
      }));

  // Walls with the same figures and reasons share one gauge (a CLT building often has a
  // dozen alike); each is still named.
  const gaugeGroups = groupAlike(gauges, (g) =>
    JSON.stringify([
      g.observed?.toFixed(2) ?? null,
      g.predicted?.toFixed(2) ?? null,
      g.reasons.map((r) => r.split(g.wallId).join('\u0000')),
    ]),
  );

  const missing = s ? s.missingInputs : (r?.missingInputs ?? []);
  const assumptions = s
    ? s.assumptions.map((a) => ({ key: a.id, text: a.text, source: a.source }))
    : (r?.assumptions.map((a) => ({ key: a.id, text: a.text, source: a.source })) ?? []);
  const cautions = s
    ? s.cautions
    : [...new Set(model.rocking.flatMap((a) => a.cautions)), t('result.elasticCaution')];
  const lengthUnit = t(`unit.${shownUnit('length', system)}`);
  const storedAt = !s && record.result ? new Date(record.result.computedAt).toLocaleString() : null;

  return (
    <div class="result">
      <PrintHeader record={record} system={system} />
      <VerdictCard id={record.id} screening={s} ready={ready} issues={issues} storedAt={storedAt} />
      {model.error && (
        <p class="field__error" role="alert">
          {t('result.calcFailed', { reason: model.error })}
        </p>
      )}

      {s && (
        <section class="card" aria-labelledby="evidence-title">
          <h2 id="evidence-title">{t('result.evidenceTitle')}</h2>
          <EvidenceTables
            predicted={s.evidence.predicted}
            observed={s.evidence.observed}
            system={system}
          />
        </section>
      )}

      <section class="card" aria-labelledby="period-title">
        <h2 id="period-title">{t('result.periodTitle')}</h2>
        {!hazard && <p class="muted">{t('result.noHazard')}</p>}
        <dl class="figures">
          {dirs.map((x) => (
            <div key={x.d} class="figures__row">
              <dt>{t(x.d === 'x' ? 'result.periodX' : 'result.periodY')}</dt>
              <dd>
                {x.periodS !== null ? (
                  <>
                    <strong>{x.periodS.toFixed(2)} s</strong>{' '}
                    {x.kind && PERIOD_KIND_KEYS[x.kind]
                      ? t(PERIOD_KIND_KEYS[x.kind] as Parameters<typeof t>[0])
                      : ''}
                    {x.saG !== null && (
                      <span class="muted"> · {t('result.saAt', { sa: x.saG.toFixed(3) })}</span>
                    )}
                  </>
                ) : (
                  t('result.notComputed')
                )}
              </dd>
            </div>
          ))}
          {r?.totalHeightM != null && (
            <div class="figures__row">
              <dt>{t('result.height')}</dt>
              <dd>
                {formatQuantity(r.totalHeightM, 'length', system)} {lengthUnit}
              </dd>
            </div>
          )}
          {s?.summary.governingDemandToCapacity != null && (
            <div class="figures__row">
              <dt>{t('result.governingDc')}</dt>
              <dd>
                <strong>{s.summary.governingDemandToCapacity.toFixed(2)}</strong>{' '}
                <span class="muted">{s.summary.governingDemandToCapacityAt}</span>
              </dd>
            </div>
          )}
        </dl>
        {hazard && (
          <SpectrumPlot
            id="result-spectrum"
            points={sampleSpectrum(hazard, Math.max(4, ...marks.map((m) => m.periodS * 1.3)))}
            marks={marks}
            title={t('plot.spectrumTitle')}
            summary={
              marks.length > 0
                ? marks
                    .map((m) =>
                      t('result.spectrumSummary', {
                        direction: m.label,
                        T: m.periodS.toFixed(2),
                        sa: m.saG.toFixed(3),
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
          <p class="field__hint">{t(s ? 'result.driftNoteC1' : 'result.driftNote')}</p>
        </section>
      )}

      {gauges.length > 0 && (
        <section class="card" aria-labelledby="rocking-title">
          <h2 id="rocking-title">{t('result.rockingTitle')}</h2>
          {gaugeGroups.map(({ first: g, members }) => (
            <div key={g.wallId} class="rocking-wall">
              <RockingGauge
                id={`gauge-${g.wallId.replace(/[^A-Za-z0-9-]/g, '-')}`}
                wallId={members.map((m) => m.wallId).join(', ')}
                observed={g.observed}
                predicted={g.predicted}
                limits={[
                  { ratio: ROCKING_BAND_LIMITS.moderate, label: t('result.band.large') },
                  { ratio: ROCKING_BAND_LIMITS.large, label: t('result.band.near') },
                  { ratio: ROCKING_BAND_LIMITS.nearToppling, label: t('result.band.topple') },
                ]}
                summary={t(
                  members.length > 1 ? 'result.gaugeSummaryAlike' : 'result.gaugeSummary',
                  {
                    id: members.map((m) => m.wallId).join(', '),
                    count: members.length,
                    observed: g.observed !== null ? g.observed.toFixed(2) : t('plot.notKnown'),
                    predicted: g.predicted !== null ? g.predicted.toFixed(2) : t('plot.notKnown'),
                  },
                )}
              />
              {g.reasons.length > 0 && (
                <ul class="flags">
                  {g.reasons.map((reason) => (
                    <li key={reason}>
                      <span aria-hidden="true">⚑ </span>
                      {reason}
                    </li>
                  ))}
                </ul>
              )}
            </div>
          ))}
        </section>
      )}

      <section class="card" aria-labelledby="assumed-title">
        <h2 id="assumed-title">{t('result.assumedTitle')}</h2>
        {s && s.confidence.defaulted.length > 0 && (
          <>
            <h3 class="subhead">{t('result.defaultedTitle')}</h3>
            <ul class="assumptions">
              {s.confidence.defaulted.map((d, i) => (
                <li key={i}>{d}</li>
              ))}
            </ul>
          </>
        )}
        {missing.length > 0 && (
          // In print the confidence statement of the verdict names the missing inputs.
          <div class={s ? 'print-skip' : undefined}>
            <h3 class="subhead">{t('result.missingTitle')}</h3>
            <ul class="assumptions">
              {missing.map((m, i) => (
                <li key={`${m.field}${i}`}>
                  <span aria-hidden="true">{m.problem === 'invalid' ? '✖ ' : '○ '}</span>
                  {/* Words first for the inspector; the raw path for the engineer. */}
                  <strong>{fieldLabel(m.field)}</strong>: {m.effect}{' '}
                  <code class="field-path">{m.field}</code>
                </li>
              ))}
            </ul>
          </div>
        )}
        {assumptions.length > 0 && (
          <details class="more">
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
        {assumptions.length === 0 && missing.length === 0 && (
          <p class="muted">{t('result.nothingAssumed')}</p>
        )}
      </section>

      <section class="card" aria-labelledby="cautions-title">
        <h2 id="cautions-title">{t('result.cautionsTitle')}</h2>
        <ul class="assumptions">
          {cautions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>
      <CautionNote />

      <p class="no-print">
        <button type="button" class="button button--wide" onClick={() => window.print()}>
          {t('result.print')}
        </button>
      </p>
      <p class="muted print-footer">
        {t('result.versions', { calc: s?.calcVersion ?? CALC_VERSION, build: __BUILD_ID__ })}
      </p>
      <p class="no-print">
        <a class="button button--wide" href={paths.home}>
          {t('result.toList')}
        </a>
      </p>
    </div>
  );
}
