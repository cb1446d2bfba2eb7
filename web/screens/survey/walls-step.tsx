/**
 * Step 3, "Walls": per storey and direction. Light-frame walls need only the total length
 * per sheathing type (one field each); single walls and panels are added with one tap and
 * filled in below. A plan sketch shows the walls that have a position.
 */
import { useState } from 'preact/hooks';
import type { SurveyRecord } from '../../../forms/index.js';
import {
  ChoiceField,
  NumberField,
  numberSpecFor,
  type NumberSpec,
} from '../../../forms/fields/index.js';
import { formatQuantity, shownUnit } from '../../../forms/units/index.js';
import { t } from '../../i18n/index.js';
import { optionLabel } from './option-labels.js';
import { PlanSketch } from './plan-sketch.js';
import {
  SHEATHING_TYPES,
  addWall,
  copyWalls,
  pendingTotalKey,
  setSheathingTotal,
  totalWallId,
} from './record-edit.js';
import { keepUnparsed } from '../../../forms/index.js';
import type { StepProps } from './step-context.js';
import { WallCard } from './wall-card.js';

const LENGTH = numberSpecFor('walls.0.lengthM') as NumberSpec;
const TOTAL: NumberSpec = { ...LENGTH, label: 'field.totalLength', required: false };

function defaultType(record: SurveyRecord) {
  switch (record.building.system) {
    case 'mass-timber-panel':
      return 'clt-bracketed' as const;
    case 'rocking-wall':
      return 'rocking' as const;
    case 'heavy-timber-frame':
      return 'diagonal-boards' as const;
    default:
      return 'wsp-100' as const;
  }
}

function summary(
  record: SurveyRecord,
  storey: number,
  direction: 'x' | 'y',
): { count: number; length: number } {
  const ws = record.walls.filter((w) => w.storey === storey && w.direction === direction);
  return { count: ws.length, length: ws.reduce((s, w) => s + w.lengthM, 0) };
}

export function WallsStep({ ctx }: StepProps) {
  const { record, edit, system } = ctx;
  const n = record.building.storeys.length;
  const [storey, setStorey] = useState(0);
  const [direction, setDirection] = useState<'x' | 'y'>('x');
  const s = Math.min(storey, Math.max(0, n - 1));
  const lightFrame =
    record.building.system === 'light-frame' || record.building.system === 'heavy-timber-frame';

  if (n === 0) {
    return (
      <div class="step step--walls" id="section-walls">
        <p>{t('walls.needStoreys')}</p>
        <p>
          <a class="button" href="building">
            {t('walls.goBuilding')}
          </a>
        </p>
      </div>
    );
  }

  const here = record.walls
    .map((w, i) => ({ w, i }))
    .filter(({ w }) => w.storey === s && w.direction === direction);
  const singles = here.filter(({ w }) => !w.id.includes('-total-'));
  const below = s > 0 ? summary(record, s - 1, direction) : null;
  const lengthUnit = t(`unit.${shownUnit('length', system)}`);

  const add = (type: SurveyRecord['walls'][number]['type']) => {
    let newIndex = -1;
    edit((r) => {
      const out = addWall(r, s, direction, type);
      newIndex = out.index;
      return out.record;
    });
    // Bring the new wall's length field under the thumb.
    requestAnimationFrame(() => {
      document.getElementById(`f-walls-${newIndex}-lengthM`)?.focus();
    });
  };

  return (
    <div class="step step--walls" id="section-walls">
      {n > 1 && (
        <ChoiceField
          path="ui.storey"
          legend={t('walls.whichStorey')}
          layout="row"
          options={record.building.storeys.map((_x, i) => {
            const sm = summary(record, i, direction);
            return {
              value: String(i),
              label: t('building.storeyName', { n: i + 1 }),
              detail: t('walls.count', { count: sm.count }),
            };
          })}
          value={String(s)}
          onChoose={(v) => setStorey(Number(v))}
        />
      )}
      <ChoiceField
        path="ui.direction"
        legend={t('walls.whichDirection')}
        layout="row"
        options={(['x', 'y'] as const).map((d) => {
          const sm = summary(record, s, d);
          return {
            value: d,
            label: t(d === 'x' ? 'walls.alongX' : 'walls.alongY'),
            detail: t('walls.countLength', {
              count: sm.count,
              length: formatQuantity(sm.length, 'length', system, 1),
              unit: lengthUnit,
            }),
          };
        })}
        value={direction}
        onChoose={(v) => setDirection(v)}
      />

      {lightFrame && (
        <section class="card" aria-labelledby="totals-title">
          <h2 id="totals-title">
            {t('walls.totalsTitle', {
              storey: s + 1,
              direction: t(direction === 'x' ? 'walls.alongX' : 'walls.alongY'),
            })}
          </h2>
          <p class="field__hint">{t('walls.totalsHint')}</p>
          <div class="totals">
            {SHEATHING_TYPES.map((type) => {
              const id = totalWallId(s, direction, type);
              const index = record.walls.findIndex((w) => w.id === id);
              const path = index === -1 ? pendingTotalKey(id) : `walls.${index}.lengthM`;
              return (
                <NumberField
                  key={id}
                  path={path}
                  spec={TOTAL}
                  system={system}
                  label={optionLabel('wallType', type)}
                  value={index === -1 ? null : (record.walls[index]?.lengthM ?? null)}
                  pending={record.unparsed[path]}
                  onChange={(c) =>
                    edit((r) =>
                      c.kind === 'pending'
                        ? keepUnparsed(r, path, c.text)
                        : setSheathingTotal(r, s, direction, type, c.value as number | null),
                    )
                  }
                />
              );
            })}
          </div>
        </section>
      )}

      <section class="card" aria-labelledby="singles-title">
        <h2 id="singles-title">{t(lightFrame ? 'walls.singlesTitleLf' : 'walls.singlesTitle')}</h2>
        {singles.length === 0 && <p class="muted">{t('walls.noSingles')}</p>}
        <ol class="wall-list">
          {singles.map(({ i }) => (
            <WallCard key={record.walls[i]?.id} ctx={ctx} index={i} />
          ))}
        </ol>
        <div class="button-row">
          <button
            type="button"
            class="button button--primary"
            onClick={() => add(defaultType(record))}
          >
            <span aria-hidden="true">+</span>{' '}
            {t(
              record.building.system === 'mass-timber-panel'
                ? 'walls.addPanel'
                : record.building.system === 'rocking-wall'
                  ? 'walls.addRocking'
                  : 'walls.addWall',
            )}
          </button>
          {record.building.system !== 'rocking-wall' && (
            <button type="button" class="button" onClick={() => add('rocking')}>
              {t('walls.addRocking')}
            </button>
          )}
        </div>
        {below && below.count > 0 && here.length === 0 && (
          <button
            type="button"
            class="button button--wide"
            onClick={() => edit((r) => copyWalls(r, s - 1, s, direction))}
          >
            {t('walls.copyBelow', { count: below.count, storey: s })}
          </button>
        )}
      </section>

      {record.walls.some((w) => w.storey === s && w.positionM !== null) ? (
        <PlanSketch record={record} storey={s} direction={direction} />
      ) : (
        <p class="field__hint">{t('walls.sketchHint')}</p>
      )}
    </div>
  );
}
