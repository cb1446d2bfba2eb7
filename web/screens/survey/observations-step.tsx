/**
 * Step 4, "Observations": uplift gap per wall, residual drift per storey and direction (an
 * offset over a height, or a tilt), the damage checklist, notes and photos.
 */
import { useState } from 'preact/hooks';
import { keepUnparsed, limits, type SurveyRecord } from '../../../forms/index.js';
import {
  ChoiceField,
  NumberField,
  TextField,
  checkNumber,
  numberSpecFor,
  type FieldChange,
  type NumberSpec,
} from '../../../forms/fields/index.js';
import { formatNumber, formatQuantity, shownUnit } from '../../../forms/units/index.js';
import type { ChecklistItem } from '../../../calc/index.js';
import { t } from '../../i18n/index.js';
import { CHECKLIST, optionLabel } from './option-labels.js';
import {
  driftIndex,
  driftPath,
  driftPendingKey,
  removeDriftReading,
  setDriftField,
  setDriftMethod,
  type DriftField,
} from './drift-edit.js';
import { applyFieldChange, isPanelType, setUplift, upliftPendingKey } from './record-edit.js';
import type { StepProps } from './step-context.js';
import { PhotoSection } from './photo-section.js';
// Phone instruments (web/instruments, owned by the instruments area).
import * as phone from '../../instruments/index.js';

const GAP = numberSpecFor('observations.uplift.0.gapM') as NumberSpec;
const OFFSET = numberSpecFor('observations.residualDrift.0.offsetM') as NumberSpec;
const OVER = numberSpecFor('observations.residualDrift.0.overHeightM') as NumberSpec;
const TILT = numberSpecFor('observations.residualDrift.0.tiltRad') as NumberSpec;
// The offset and tilt of a reading are alternatives: leaving one empty is fine.
const OFFSET_OPT: NumberSpec = { ...OFFSET, required: false };
const TILT_OPT: NumberSpec = { ...TILT, required: false };
// Before there is a reading an empty height is fine: the storey height will be used.
const OVER_OPT: NumberSpec = { ...OVER, required: false };

function UpliftSection({ ctx }: StepProps) {
  const { record, edit, system } = ctx;
  const [showAll, setShowAll] = useState(false);
  const panels = record.walls.filter((w) => isPanelType(w.type) || w.devices.length > 0);
  const listed = showAll ? record.walls : panels;
  const others = record.walls.length - panels.length;
  return (
    <section class="card" aria-labelledby="uplift-title">
      <h2 id="uplift-title">{t('obs.uplift')}</h2>
      <p class="field__hint">{t('obs.upliftHint')}</p>
      {record.walls.length === 0 && <p class="muted">{t('obs.noWalls')}</p>}
      {listed.map((w) => {
        const index = record.observations.uplift.findIndex((u) => u.wallId === w.id);
        const path = index === -1 ? upliftPendingKey(w.id) : `observations.uplift.${index}.gapM`;
        return (
          <NumberField
            key={w.id}
            path={path}
            spec={{ ...GAP, required: false }}
            system={system}
            label={t('obs.upliftAt', { id: w.id, type: optionLabel('wallType', w.type) })}
            value={index === -1 ? null : (record.observations.uplift[index]?.gapM ?? null)}
            pending={record.unparsed[path]}
            placeholder={t('obs.notMeasured')}
            onChange={(c) =>
              edit((r) =>
                c.kind === 'pending'
                  ? keepUnparsed(r, path, c.text)
                  : setUplift(r, w.id, c.value as number | null),
              )
            }
          />
        );
      })}
      {!showAll && others > 0 && (
        <button type="button" class="button button--wide" onClick={() => setShowAll(true)}>
          {t('obs.showAllWalls', { count: others })}
        </button>
      )}
    </section>
  );
}

function DriftReading(props: StepProps & { storey: number; direction: 'x' | 'y' }) {
  const { ctx, storey, direction } = props;
  const { record, edit, system } = ctx;
  const [tooLarge, setTooLarge] = useState<string | null>(null);
  const index = driftIndex(record, storey, direction);
  const reading = index === -1 ? null : record.observations.residualDrift[index];
  const storeyHeight = record.building.storeys[storey]?.heightM ?? null;
  const name = t('obs.driftName', {
    storey: storey + 1,
    direction: t(direction === 'x' ? 'walls.alongX' : 'walls.alongY'),
  });
  const heightText = (r: SurveyRecord) => {
    const text = r.unparsed[driftPendingKey(storey, direction, 'overHeightM')];
    const c = text === undefined ? null : checkNumber(text, OVER, system);
    return c !== null && c.state === 'valid' ? c.valueSI : null;
  };
  const apply = (r: SurveyRecord, field: DriftField, c: FieldChange) => {
    const path = driftPath(r, storey, direction, field);
    // Pending text, and a height typed before there is a reading, are kept as typed.
    if (
      c.kind === 'pending' ||
      (field === 'overHeightM' && driftIndex(r, storey, direction) === -1)
    ) {
      return { ok: true as const, record: keepUnparsed(r, path, c.text) };
    }
    const out = setDriftField(r, storey, direction, field, c.value as number | null, heightText(r));
    return out.ok
      ? out
      : { ok: false as const, ratio: out.ratio, record: keepUnparsed(r, path, c.text) };
  };
  const onField = (field: DriftField) => (c: FieldChange) => {
    const probe = apply(record, field, c);
    setTooLarge(
      probe.ok
        ? null
        : t('obs.driftTooLarge', { percent: formatNumber(probe.ratio * 100, 'pct', 0) }),
    );
    edit((r) => apply(r, field, c).record);
  };
  const bind = (field: DriftField) => {
    const path = driftPath(record, storey, direction, field);
    const stored = reading ? reading[field] : null;
    return {
      path,
      system,
      value: stored,
      pending: record.unparsed[path],
      unconfirmed: record.unconfirmed.includes(path),
      onChange: onField(field),
      onConfirm: () =>
        edit((r) => applyFieldChange(r, { path, kind: 'value', value: stored, text: '' })),
    };
  };
  return (
    <li class="drift-card">
      <h3 class="drift-card__title">{name}</h3>
      <div class="field-pair">
        <NumberField
          {...bind('offsetM')}
          spec={OFFSET_OPT}
          labelPrefix={`${name}:`}
          placeholder={t('obs.notMeasured')}
        />
        <NumberField
          {...bind('overHeightM')}
          spec={reading ? OVER : OVER_OPT}
          labelPrefix={`${name}:`}
          unconfirmedReason={t('obs.overHeightDefault')}
        />
      </div>
      {!reading && storeyHeight !== null && (
        <p class="field__hint">
          {t('obs.overHeightHint', {
            height: formatQuantity(storeyHeight, 'length', system),
            unit: t(`unit.${shownUnit('length', system)}`),
          })}
        </p>
      )}
      <NumberField
        {...bind('tiltRad')}
        spec={TILT_OPT}
        label={t('obs.orTilt')}
        labelPrefix={`${name}:`}
        placeholder={t('obs.notMeasured')}
      />
      <phone.TiltMeter
        storey={storey}
        direction={direction}
        context={name}
        onResult={(m) => edit((r) => phone.withPhoneTilt(r, storey, direction, m))}
      />
      {tooLarge && (
        <p class="field__error" role="alert">
          <span aria-hidden="true">✖ </span>
          {tooLarge}
        </p>
      )}
      {reading && reading.offsetM !== null && reading.tiltRad !== null && (
        <ChoiceField
          path={`observations.residualDrift.${index}.method`}
          legend={t('obs.useWhich')}
          layout="row"
          options={[
            { value: 'offset', label: t('obs.useOffset') },
            { value: 'tilt', label: t('obs.useTilt') },
          ]}
          value={reading.method === 'tilt' ? 'tilt' : 'offset'}
          onChoose={(m) =>
            edit((r) => {
              const out = setDriftMethod(r, index, m);
              return out.ok ? out.record : r;
            })
          }
        />
      )}
      {reading && (
        <div class="drift-card__result">
          <p class="reading" aria-live="polite">
            {reading.method === 'phone-tilt'
              ? t('obs.driftFromPhone', {
                  percent: formatNumber(reading.ratio * 100, 'pct'),
                  uncertainty: formatNumber((reading.uncertainty ?? 0) * 100, 'pct'),
                })
              : t(reading.method === 'tilt' ? 'obs.driftFromTilt' : 'obs.driftFromOffset', {
                  percent: formatNumber(reading.ratio * 100, 'pct'),
                })}
          </p>
          <button
            type="button"
            class="button button--small button--quiet"
            onClick={() => {
              if (window.confirm(t('obs.removeDriftConfirm', { name }))) {
                edit((r) => removeDriftReading(r, storey, direction));
              }
            }}
          >
            {t('obs.removeDrift')}
          </button>
        </div>
      )}
    </li>
  );
}

const SEVERITIES = ['none', 'minor', 'severe'] as const;

function Checklist({ ctx }: StepProps) {
  const { record, edit } = ctx;
  const severityOf = (item: ChecklistItem) =>
    record.observations.checklist.find((c) => c.item === item)?.severity ?? 'none';
  const set = (item: ChecklistItem, sev: (typeof SEVERITIES)[number]) =>
    edit((r: SurveyRecord) => {
      const rest = r.observations.checklist.filter((c) => c.item !== item);
      const checklist = sev === 'none' ? rest : [...rest, { item, severity: sev }];
      return { ...r, observations: { ...r.observations, checklist } };
    });
  return (
    <section class="card" aria-labelledby="checklist-title">
      <h2 id="checklist-title">{t('obs.checklist')}</h2>
      <p class="field__hint">{t('obs.checklistHint')}</p>
      {CHECKLIST.map((item) => (
        <ChoiceField
          key={item}
          path={`observations.checklist.${item}`}
          legend={optionLabel('damageCheck', item)}
          layout="row"
          options={SEVERITIES.map((s) => ({ value: s, label: t(`severity.${s}`) }))}
          value={severityOf(item)}
          onChoose={(s) => set(item, s)}
        />
      ))}
    </section>
  );
}

export function ObservationsStep({ ctx }: StepProps) {
  const { record, edit } = ctx;
  const n = record.building.storeys.length;
  return (
    <div class="step step--observations" id="section-observations">
      <section class="card" aria-labelledby="drift-title">
        <h2 id="drift-title">{t('obs.drift')}</h2>
        <p class="field__hint">{t('obs.driftHint')}</p>
        {n === 0 ? (
          <p class="muted">{t('walls.needStoreys')}</p>
        ) : (
          <ol class="drift-list">
            {record.building.storeys.map((_s, i) =>
              (['x', 'y'] as const).map((d) => (
                <DriftReading key={`${i}${d}`} ctx={ctx} storey={i} direction={d} />
              )),
            )}
          </ol>
        )}
      </section>
      <section class="card" aria-label={t('instruments.vib.title')}>
        <phone.VibrationRecorder
          storey={Math.max(0, n - 1)}
          expectedPeriodS={phone.expectedPeriodFor(record)}
          onResult={(m, raw) => edit((r) => phone.withVibration(r, m, raw))}
        />
      </section>
      <UpliftSection ctx={ctx} />
      <Checklist ctx={ctx} />
      <section class="card" aria-labelledby="notes-title">
        <h2 id="notes-title">{t('field.notes')}</h2>
        <TextField
          path="observations.notes"
          label={t('field.notes')}
          multiline
          value={record.observations.notes}
          pending={record.unparsed['observations.notes']}
          maxLength={limits.MAX_NOTES}
          onChange={(c) => edit((r) => applyFieldChange(r, c))}
        />
      </section>
      <PhotoSection ctx={ctx} />
    </div>
  );
}
