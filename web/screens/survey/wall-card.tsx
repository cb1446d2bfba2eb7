/**
 * One wall (or panel) with its own fields. Mass-timber and rocking panels open their
 * dimensions, loads, post-tension and connectors; 'user' walls take strength and stiffness
 * per length; any wall can list supplemental devices (recorded, not modelled).
 */
import { useState } from 'preact/hooks';
import type { SurveyRecord, WallRecord } from '../../../forms/index.js';
import {
  NumberField,
  PANEL_HEIGHT_SPEC,
  PANEL_LENGTH_SPEC,
  SelectField,
} from '../../../forms/fields/index.js';
import { t } from '../../i18n/index.js';
import { DEVICES, WALL_TYPES, optionLabel, options } from './option-labels.js';
import { isPanelType, removeWall, setValue, setWallType } from './record-edit.js';
import { numberProps, type StepContext } from './step-context.js';

function upliftCount(record: SurveyRecord, wall: WallRecord): number {
  return record.observations.uplift.filter((u) => u.wallId === wall.id).length;
}

export function WallCard(props: { ctx: StepContext; index: number }) {
  const { ctx, index } = props;
  const { record, edit } = ctx;
  const wall = record.walls[index];
  // Open or closed is the inspector's choice: decided once, never flipped by typing.
  const [panelOpen, setPanelOpen] = useState(wall?.rocking?.thicknessM === null);
  const [devicesOpen, setDevicesOpen] = useState((wall?.devices.length ?? 0) > 0);
  if (!wall) return null;
  const base = `walls.${index}`;
  const panel = isPanelType(wall.type);
  const name = t('walls.wallName', { id: wall.id });
  const lbl = (key: Parameters<typeof t>[0]) => t(key);
  const prefix = `${name}:`;

  const remove = () => {
    const readings = upliftCount(record, wall);
    const ok = window.confirm(
      readings > 0
        ? t('walls.removeWithUplift', { id: wall.id, count: readings })
        : t('walls.removeConfirm', { id: wall.id }),
    );
    if (ok) edit((r) => removeWall(r, index));
  };

  const toggleDevice = (device: WallRecord['devices'][number], on: boolean) =>
    edit((r) => {
      const w = r.walls[index];
      if (!w) return r;
      const devices = on
        ? [...w.devices.filter((d) => d !== device), device]
        : w.devices.filter((d) => d !== device);
      return setValue(r, `${base}.devices`, devices);
    });

  return (
    <li class="wall-card" id={`wall-${wall.id}`}>
      <div class="wall-card__head">
        <h3 class="wall-card__title">{name}</h3>
        <button
          type="button"
          class="button button--small button--quiet"
          onClick={remove}
          aria-label={t('walls.removeLabel', { id: wall.id })}
        >
          {t('walls.remove')}
        </button>
      </div>
      <SelectField
        path={`${base}.type`}
        label={lbl('field.wallType')}
        labelPrefix={prefix}
        options={options(WALL_TYPES, 'wallType')}
        value={wall.type}
        onChoose={(v) => edit((r) => setWallType(r, index, v))}
      />
      <div class="field-pair">
        <NumberField
          {...numberProps(ctx, `${base}.lengthM`, panel ? PANEL_LENGTH_SPEC : undefined)}
          label={lbl(panel ? 'field.panelLength' : 'field.wallLength')}
          labelPrefix={prefix}
        />
        <NumberField
          {...numberProps(ctx, `${base}.positionM`)}
          label={lbl('field.wallPosition')}
          labelPrefix={prefix}
          placeholder={t('field.unknown')}
        />
      </div>
      <p class="field__hint">
        {t(wall.direction === 'x' ? 'walls.positionHintX' : 'walls.positionHintY')}
      </p>
      <NumberField
        {...numberProps(ctx, `${base}.heightM`, panel ? PANEL_HEIGHT_SPEC : undefined)}
        label={lbl(panel ? 'field.panelHeight' : 'field.wallHeight')}
        labelPrefix={prefix}
        placeholder={t('walls.storeyHeight')}
      />
      {wall.type === 'user' && (
        <div class="field-pair">
          <NumberField
            {...numberProps(ctx, `${base}.userUnitShearNPerM`)}
            label={lbl('field.userUnitShear')}
            labelPrefix={prefix}
          />
          <NumberField
            {...numberProps(ctx, `${base}.userUnitStiffnessNPerM2`)}
            label={lbl('field.userUnitStiffness')}
            labelPrefix={prefix}
          />
        </div>
      )}
      {panel && (
        <details
          class="more"
          open={panelOpen}
          onToggle={(e) => setPanelOpen((e.currentTarget as HTMLDetailsElement).open)}
        >
          <summary>{t('walls.panelDetails')}</summary>
          <NumberField
            {...numberProps(ctx, `${base}.rocking.thicknessM`)}
            label={lbl('field.thickness')}
            labelPrefix={prefix}
            placeholder={t('field.unknown')}
          />
          <div class="field-pair">
            <NumberField
              {...numberProps(ctx, `${base}.rocking.selfWeightN`)}
              label={lbl('field.selfWeight')}
              labelPrefix={prefix}
              placeholder={t('walls.fromVolume')}
            />
            <NumberField
              {...numberProps(ctx, `${base}.rocking.gravityLoadN`)}
              label={lbl('field.gravityLoad')}
              labelPrefix={prefix}
              placeholder={t('field.unknown')}
            />
          </div>
          {wall.type === 'rocking' && (
            <NumberField
              {...numberProps(ctx, `${base}.rocking.postTensionN`)}
              label={lbl('field.postTension')}
              labelPrefix={prefix}
              hint={t('walls.postTensionHint')}
              placeholder={t('field.unknown')}
            />
          )}
          <h4 class="subhead">{t('walls.connectors')}</h4>
          <div class="field-trio">
            <NumberField
              {...numberProps(ctx, `${base}.connectors.holdDownCount`)}
              label={lbl('field.holdDownCount')}
              labelPrefix={prefix}
              placeholder={t('field.unknown')}
            />
            <NumberField
              {...numberProps(ctx, `${base}.connectors.holdDownCapacityN`)}
              label={lbl('field.holdDownCapacity')}
              labelPrefix={prefix}
              placeholder={t('walls.typical')}
            />
            <NumberField
              {...numberProps(ctx, `${base}.connectors.holdDownStiffnessNPerM`)}
              label={lbl('field.holdDownStiffness')}
              labelPrefix={prefix}
              placeholder={t('walls.typical')}
            />
          </div>
          <div class="field-trio">
            <NumberField
              {...numberProps(ctx, `${base}.connectors.bracketCount`)}
              label={lbl('field.bracketCount')}
              labelPrefix={prefix}
              placeholder={t('field.unknown')}
            />
            <NumberField
              {...numberProps(ctx, `${base}.connectors.bracketCapacityN`)}
              label={lbl('field.bracketCapacity')}
              labelPrefix={prefix}
              placeholder={t('walls.typical')}
            />
            <NumberField
              {...numberProps(ctx, `${base}.connectors.bracketStiffnessNPerM`)}
              label={lbl('field.bracketStiffness')}
              labelPrefix={prefix}
              placeholder={t('walls.typical')}
            />
          </div>
        </details>
      )}
      <details
        class="more"
        open={devicesOpen}
        onToggle={(e) => setDevicesOpen((e.currentTarget as HTMLDetailsElement).open)}
      >
        <summary>
          {t('field.devices')}
          {wall.devices.length > 0 && ` (${wall.devices.length})`}
        </summary>
        <fieldset class="checks">
          <legend class="visually-hidden">{`${prefix} ${t('field.devices')}`}</legend>
          <p class="field__hint">{t('walls.devicesHint')}</p>
          {DEVICES.map((d) => (
            <label key={d} class="check">
              <input
                type="checkbox"
                checked={wall.devices.includes(d)}
                aria-label={`${prefix} ${optionLabel('device', d)}`}
                onChange={(e) => toggleDevice(d, (e.currentTarget as HTMLInputElement).checked)}
              />
              <span>{optionLabel('device', d)}</span>
            </label>
          ))}
        </fieldset>
      </details>
    </li>
  );
}
