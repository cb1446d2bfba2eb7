/**
 * Step 2, "Building": system, era, use, plan size and storeys. Quick entry first: the number
 * of storeys with a stepper (each new storey copies the one below), then one typical height
 * and floor area for all; per-storey edits below. Values the app filled in are marked until
 * confirmed ("Confirm all storeys" takes one tap).
 */
import { useState } from 'preact/hooks';
import {
  DEFAULTED_BUILDING_FIELDS,
  confirmField,
  type SurveyRecord,
} from '../../../forms/index.js';
import {
  ChoiceField,
  NumberField,
  SelectField,
  numberSpecFor,
  type FieldChange,
  type NumberSpec,
} from '../../../forms/fields/index.js';
import { t, type MessageKey } from '../../i18n/index.js';
import { CODE_LEVELS, FLOORS, OCCUPANCIES, ROOFS, SYSTEMS, options } from './option-labels.js';
import {
  addStorey,
  removeTopStorey,
  setAllStoreys,
  setAllStoreysPending,
  setValue,
  storeyRemovalBlock,
} from './record-edit.js';
import { confirmProps, numberProps, type StepProps } from './step-context.js';

const HEIGHT = numberSpecFor('building.storeys.0.heightM') as NumberSpec;
const AREA = numberSpecFor('building.storeys.0.floorAreaM2') as NumberSpec;
// Not required: clearing the quick field leaves every storey as it is.
const TYPICAL_HEIGHT: NumberSpec = { ...HEIGHT, label: 'field.typicalHeight', required: false };
const TYPICAL_AREA: NumberSpec = { ...AREA, label: 'field.typicalArea', required: false };

/** The value all storeys share, or null; and the text all of them keep, if the same. */
function common(record: SurveyRecord, field: 'heightM' | 'floorAreaM2') {
  const storeys = record.building.storeys;
  const paths = storeys.map((_s, i) => `building.storeys.${i}.${field}`);
  const texts = paths.map((p) => record.unparsed[p]);
  const first = texts[0];
  const pending = first !== undefined && texts.every((x) => x === first) ? first : undefined;
  const v = storeys[0]?.[field];
  const value = v !== undefined && storeys.every((s) => s[field] === v) ? v : null;
  return { value, pending };
}

const DEFAULT_LABELS: Record<(typeof DEFAULTED_BUILDING_FIELDS)[number], MessageKey> = {
  'building.system': 'field.system',
  'building.codeLevel': 'field.codeLevel',
  'building.occupancy': 'field.occupancy',
  'building.roofConstruction': 'field.roof',
};

function storeyPaths(record: SurveyRecord): string[] {
  return record.unconfirmed.filter((p) => p.startsWith('building.storeys.'));
}

export function BuildingStep({ ctx }: StepProps) {
  const { record, edit, system } = ctx;
  const b = record.building;
  const n = b.storeys.length;
  const [blocked, setBlocked] = useState<string | null>(null);
  const choose =
    <K extends 'system' | 'codeLevel' | 'occupancy' | 'roofConstruction'>(key: K) =>
    (v: SurveyRecord['building'][K]) =>
      edit((r) => setValue(r, `building.${key}`, v));

  const add = () => {
    setBlocked(null);
    edit(addStorey);
  };
  const remove = () => {
    const block = storeyRemovalBlock(record);
    if (block) {
      setBlocked(
        t('building.removeBlocked', { storey: n, walls: block.walls, readings: block.readings }),
      );
      return;
    }
    setBlocked(null);
    edit(removeTopStorey);
  };
  const quick = (field: 'heightM' | 'floorAreaM2') => (c: FieldChange) => {
    if (c.kind === 'value' && c.value === null) return;
    edit((r) =>
      c.kind === 'value' && typeof c.value === 'number'
        ? setAllStoreys(r, field, c.value)
        : setAllStoreysPending(r, field, c.text),
    );
  };
  const height = common(record, 'heightM');
  const area = common(record, 'floorAreaM2');
  const unconfirmedStoreys = storeyPaths(record);

  const defaulted = DEFAULTED_BUILDING_FIELDS.filter((p) => record.unconfirmed.includes(p));
  return (
    <div class="step step--building">
      {defaulted.length > 0 && (
        <div class="unconfirmed unconfirmed--banner">
          <p class="unconfirmed__text">
            <span aria-hidden="true">◌ </span>
            {t('building.defaultsUnconfirmed', {
              fields: defaulted.map((p) => t(DEFAULT_LABELS[p])).join(', '),
            })}
          </p>
          <button
            type="button"
            class="button button--small"
            onClick={() => edit((r) => defaulted.reduce((acc, p) => confirmField(acc, p), r))}
          >
            {t('building.confirmDefaults')}
          </button>
        </div>
      )}
      <ChoiceField
        path="building.system"
        legend={t('field.system')}
        options={options(SYSTEMS, 'system', true)}
        value={b.system}
        onChoose={choose('system')}
        {...confirmProps(ctx, 'building.system')}
        compactUnconfirmed
      />
      <SelectField
        path="building.codeLevel"
        label={t('field.codeLevel')}
        hint={t('building.codeLevelHint')}
        options={options(CODE_LEVELS, 'codeLevel')}
        value={b.codeLevel}
        onChoose={choose('codeLevel')}
        {...confirmProps(ctx, 'building.codeLevel')}
        compactUnconfirmed
      />
      <SelectField
        path="building.occupancy"
        label={t('field.occupancy')}
        options={options(OCCUPANCIES, 'occupancy')}
        value={b.occupancy}
        onChoose={choose('occupancy')}
        {...confirmProps(ctx, 'building.occupancy')}
        compactUnconfirmed
      />

      <section class="card" aria-labelledby="storeys-title" id="section-building">
        <h2 id="storeys-title">{t('building.storeys')}</h2>
        <div class="stepper" role="group" aria-labelledby="storey-count-label">
          <span id="storey-count-label" class="field__label">
            {t('field.storeyCount')}
          </span>
          <div class="stepper__controls">
            <button
              type="button"
              class="button stepper__button"
              onClick={remove}
              disabled={n === 0}
              aria-label={t('building.removeStorey')}
            >
              −
            </button>
            <output class="stepper__value" aria-live="polite" aria-labelledby="storey-count-label">
              {n}
            </output>
            <button
              type="button"
              class="button stepper__button"
              onClick={add}
              aria-label={t('building.addStorey')}
            >
              +
            </button>
          </div>
        </div>
        {blocked && (
          <p class="field__error" role="alert">
            <span aria-hidden="true">✖ </span>
            {blocked}
          </p>
        )}
        {n === 0 ? (
          <p class="muted">{t('building.noStoreys')}</p>
        ) : (
          <>
            <p class="field__hint">{t('building.quickHint', { n })}</p>
            <div class="field-pair">
              <NumberField
                path="quick.heightM"
                spec={TYPICAL_HEIGHT}
                system={system}
                value={height.value}
                pending={height.pending}
                placeholder={height.value === null ? t('building.varies') : undefined}
                onChange={quick('heightM')}
              />
              <NumberField
                path="quick.floorAreaM2"
                spec={TYPICAL_AREA}
                system={system}
                value={area.value}
                pending={area.pending}
                placeholder={area.value === null ? t('building.varies') : undefined}
                onChange={quick('floorAreaM2')}
              />
            </div>
            {unconfirmedStoreys.length > 0 && (
              <div class="unconfirmed">
                <p class="unconfirmed__text">
                  <span aria-hidden="true">◌ </span>
                  {t('building.storeysUnconfirmed', { count: unconfirmedStoreys.length })}
                </p>
                <button
                  type="button"
                  class="button button--small"
                  onClick={() =>
                    edit((r) => unconfirmedStoreys.reduce((acc, p) => confirmField(acc, p), r))
                  }
                >
                  {t('building.confirmStoreys')}
                </button>
              </div>
            )}
            <ol class="storey-list">
              {b.storeys.map((s, i) => {
                const base = `building.storeys.${i}`;
                const name = t('building.storeyName', { n: i + 1 });
                return (
                  <li key={i} class="storey-card">
                    <h3 class="storey-card__title">
                      {i === 0 ? t('building.groundStorey', { name }) : name}
                    </h3>
                    <div class="field-pair">
                      <NumberField
                        {...numberProps(ctx, `${base}.heightM`)}
                        labelPrefix={`${name}:`}
                        compactUnconfirmed
                      />
                      <NumberField
                        {...numberProps(ctx, `${base}.floorAreaM2`)}
                        labelPrefix={`${name}:`}
                        compactUnconfirmed
                      />
                    </div>
                    <SelectField
                      path={`${base}.floorConstruction`}
                      label={t('field.floorConstruction')}
                      labelPrefix={`${name}:`}
                      options={options(FLOORS, 'floor')}
                      value={s.floorConstruction}
                      onChoose={(v) => edit((r) => setValue(r, `${base}.floorConstruction`, v))}
                      {...confirmProps(ctx, `${base}.floorConstruction`)}
                      compactUnconfirmed
                    />
                    <details class="more">
                      <summary>{t('building.moreStorey')}</summary>
                      <NumberField
                        {...numberProps(ctx, `${base}.unitWeightPa`)}
                        labelPrefix={`${name}:`}
                        hint={t('building.unitWeightHint')}
                        placeholder={t('building.defaultByFloor')}
                      />
                    </details>
                  </li>
                );
              })}
            </ol>
          </>
        )}
      </section>

      <section class="card" aria-labelledby="plan-title">
        <h2 id="plan-title">{t('building.plan')}</h2>
        <p class="field__hint">{t('building.planHint')}</p>
        <div class="field-pair">
          <NumberField {...numberProps(ctx, 'building.planXM')} placeholder={t('field.unknown')} />
          <NumberField {...numberProps(ctx, 'building.planYM')} placeholder={t('field.unknown')} />
        </div>
      </section>

      <section class="card" aria-labelledby="roof-title">
        <h2 id="roof-title">{t('field.roof')}</h2>
        <SelectField
          path="building.roofConstruction"
          label={t('field.roofType')}
          options={options(ROOFS, 'roof')}
          value={b.roofConstruction}
          onChoose={choose('roofConstruction')}
          {...confirmProps(ctx, 'building.roofConstruction')}
          compactUnconfirmed
        />
        <NumberField
          {...numberProps(ctx, 'building.roofUnitWeightPa')}
          hint={t('building.unitWeightHint')}
          placeholder={t('building.defaultByRoof')}
        />
      </section>
    </div>
  );
}
