/**
 * Step 5, "Hazard": the response spectrum to screen against — a code spectrum (EN 1998-1 or
 * ASCE 7-16 parameters) or this event's values at the site (PGA, Sa(0.3 s), Sa(1.0 s) read
 * off a shaking map). The team's hazard is remembered for the day: a new survey is prefilled
 * with it (marked unconfirmed), and any spectrum entered here becomes the team's hazard.
 */
import { useEffect } from 'preact/hooks';
import { confirmField, markUnconfirmed, type SurveyRecord } from '../../../forms/index.js';
import {
  ChoiceField,
  NumberField,
  UnconfirmedNote,
  numberSpecFor,
  type FieldChange,
  type NumberSpec,
} from '../../../forms/fields/index.js';
import { spectralAcceleration, type SpectrumSpec } from '../../../calc/index.js';
import { t } from '../../i18n/index.js';
import { useStore } from '../../app/store.js';
import { SpectrumPlot } from '../result/spectrum-plot.js';
import {
  rememberTeamHazard,
  teamHazardStore,
  loadTeamHazard,
  localDay,
} from '../settings/preferences.js';
import {
  HAZARD_FIELDS,
  applyHazardChange,
  chooseHazardKind,
  ec8Choices,
  hazardHasValues,
  hazardKind,
  setEc8Choice,
  type HazardKind,
} from './hazard-edit.js';
import type { StepProps } from './step-context.js';

/** Samples a spectrum for the plot: 0 to 4 s (the EN 1998-1 definition range), 121 points. */
export function sampleSpectrum(spec: SpectrumSpec, maxT = 4): { periodS: number; saG: number }[] {
  const out: { periodS: number; saG: number }[] = [];
  for (let i = 0; i <= 120; i++) {
    const T = (maxT * i) / 120;
    try {
      out.push({ periodS: T, saG: spectralAcceleration(spec, T) });
    } catch {
      return [];
    }
  }
  return out;
}

function hazardValue(record: SurveyRecord, field: string): number | null {
  const h = record.hazard as Record<string, unknown> | null;
  const v = h?.[field];
  return typeof v === 'number' ? v : null;
}

export function HazardStep({ ctx }: StepProps) {
  const { record, edit, system } = ctx;
  const team = useStore(teamHazardStore);
  const kind = hazardKind(record);
  const hazard = record.hazard;
  const hazardUnconfirmed = record.unconfirmed.includes('hazard');

  useEffect(() => {
    void loadTeamHazard();
  }, []);
  // Whatever the inspector settles on here becomes the team's hazard of the day.
  useEffect(() => {
    if (hazard && !hazardUnconfirmed) void rememberTeamHazard(hazard);
  }, [JSON.stringify(hazard), hazardUnconfirmed]);

  const choose = (k: HazardKind) => {
    if (k === kind) return;
    if (hazardHasValues(record) && !window.confirm(t('hazard.switchConfirm'))) return;
    edit((r) => chooseHazardKind(r, k));
  };
  const onNumber = (c: FieldChange) => edit((r) => applyHazardChange(r, c, system));
  const field = (name: string) => {
    const path = `hazard.${name}`;
    const spec = numberSpecFor(path) as NumberSpec;
    const required = kind !== null && HAZARD_FIELDS[kind].required.includes(name);
    return (
      <NumberField
        key={path}
        path={path}
        spec={{ ...spec, required }}
        system={system}
        value={hazardValue(record, name)}
        pending={record.unparsed[path]}
        onChange={onNumber}
        placeholder={required ? undefined : t('hazard.recommended')}
      />
    );
  };
  const todays = team !== null && team.day === localDay(new Date()) ? team : null;
  const sameAsTeam =
    todays !== null && hazard !== null && JSON.stringify(todays.hazard) === JSON.stringify(hazard);
  const choices = ec8Choices(record);

  return (
    <div class="step step--hazard" id="section-hazard">
      {todays && !sameAsTeam && (
        <div class="card card--note">
          <p>
            {t('hazard.teamAvailable', {
              time: new Date(todays.setAt).toLocaleTimeString([], {
                hour: '2-digit',
                minute: '2-digit',
              }),
            })}
          </p>
          <button
            type="button"
            class="button"
            onClick={() => {
              if (hazardHasValues(record) && !window.confirm(t('hazard.switchConfirm'))) return;
              edit((r) =>
                markUnconfirmed(
                  {
                    ...chooseHazardKind(r, todays.hazard.kind),
                    hazard: todays.hazard,
                    unparsed: withoutHazardDraft(r),
                  },
                  'hazard',
                ),
              );
            }}
          >
            {t('hazard.useTeam')}
          </button>
        </div>
      )}
      {hazard && hazardUnconfirmed && (
        <UnconfirmedNote
          id="hazard"
          label={t('step.hazard')}
          reason={t('field.teamHazard')}
          onConfirm={() => edit((r) => confirmField(r, 'hazard'))}
        />
      )}
      <ChoiceField
        path="hazard.kind"
        legend={t('field.hazardKind')}
        options={[
          { value: 'ec8', label: t('hazard.kind.ec8'), detail: t('hazard.kind.ec8.detail') },
          { value: 'asce7', label: t('hazard.kind.asce7'), detail: t('hazard.kind.asce7.detail') },
          { value: 'event', label: t('hazard.kind.event'), detail: t('hazard.kind.event.detail') },
        ]}
        value={kind}
        onChoose={choose}
      />
      {kind === 'ec8' && (
        <>
          <ChoiceField
            path="hazard.type"
            legend={t('field.ec8Type')}
            layout="row"
            options={[
              { value: '1', label: t('hazard.type1'), detail: t('hazard.type1.detail') },
              { value: '2', label: t('hazard.type2'), detail: t('hazard.type2.detail') },
            ]}
            value={String(choices.type) as '1' | '2'}
            onChoose={(v) => edit((r) => setEc8Choice(r, 'type', v, system))}
          />
          <ChoiceField
            path="hazard.ground"
            legend={t('field.ground')}
            layout="row"
            options={(['A', 'B', 'C', 'D', 'E'] as const).map((g) => ({ value: g, label: g }))}
            value={choices.ground}
            onChoose={(v) => edit((r) => setEc8Choice(r, 'ground', v, system))}
            hint={t('hazard.groundHint')}
          />
          {field('ag')}
          <details class="more">
            <summary>{t('hazard.annex')}</summary>
            <p class="field__hint">{t('hazard.annexHint')}</p>
            <div class="field-pair">
              {field('S')}
              {field('TB')}
            </div>
            <div class="field-pair">
              {field('TC')}
              {field('TD')}
            </div>
          </details>
        </>
      )}
      {kind === 'asce7' && (
        <>
          <div class="field-pair">
            {field('SDS')}
            {field('SD1')}
          </div>
          {field('TL')}
        </>
      )}
      {kind === 'event' && (
        <>
          <p class="field__hint">{t('hazard.eventHint')}</p>
          {field('pga')}
          <div class="field-pair">
            {field('sa03')}
            {field('sa10')}
          </div>
        </>
      )}
      {kind !== null && (
        <details class="more">
          <summary>{t('field.damping')}</summary>
          {field('damping')}
        </details>
      )}
      {hazard && (
        <SpectrumPlot
          id="hazard-preview"
          points={sampleSpectrum(hazard)}
          marks={[]}
          title={t('plot.spectrumTitle')}
          summary={t('hazard.previewSummary', {
            peak: Math.max(...sampleSpectrum(hazard).map((p) => p.saG)).toFixed(2),
          })}
        />
      )}
    </div>
  );
}

function withoutHazardDraft(r: SurveyRecord): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [k, v] of Object.entries(r.unparsed)) if (!k.startsWith('hazard.')) out[k] = v;
  return out;
}
