/**
 * A small plan of one storey drawn from the entered wall positions: the footprint (from the
 * plan size, else the extent of the walls), each positioned wall as a thick line on its wall
 * line, the chosen direction drawn darker. Only a line position is recorded, not where along
 * the line a wall sits, so walls are drawn centred on the footprint: the sketch shows which
 * lines carry walls and how long they are, not their exact place.
 */
import type { SurveyRecord } from '../../../forms/index.js';
import { t } from '../../i18n/index.js';

const W = 320;
const H = 220;
const PAD = 28;

export function PlanSketch(props: { record: SurveyRecord; storey: number; direction: 'x' | 'y' }) {
  const { record, storey, direction } = props;
  const walls = record.walls.filter((w) => w.storey === storey);
  const placed = walls.filter((w) => w.positionM !== null);
  const unplaced = walls.length - placed.length;
  let sx = record.building.planXM;
  let sy = record.building.planYM;
  // Without a plan size, the extent of what was entered.
  const xs = placed.filter((w) => w.direction === 'y').map((w) => w.positionM as number);
  const ys = placed.filter((w) => w.direction === 'x').map((w) => w.positionM as number);
  const longestX = Math.max(0, ...placed.filter((w) => w.direction === 'x').map((w) => w.lengthM));
  const longestY = Math.max(0, ...placed.filter((w) => w.direction === 'y').map((w) => w.lengthM));
  const known = sx !== null && sy !== null;
  sx = sx ?? Math.max(1, longestX, ...xs.map((v) => Math.abs(v)));
  sy = sy ?? Math.max(1, longestY, ...ys.map((v) => Math.abs(v)));
  const scale = Math.min((W - 2 * PAD) / sx, (H - 2 * PAD) / sy);
  const ox = (W - sx * scale) / 2;
  const oy = H - (H - sy * scale) / 2; // y grows upwards in the plan
  const px = (x: number) => ox + x * scale;
  const py = (y: number) => oy - y * scale;

  const titleId = `plan-title-${storey}`;
  const descId = `plan-desc-${storey}`;
  return (
    <figure class="plan-sketch">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        role="img"
        aria-labelledby={`${titleId} ${descId}`}
        class="plot plan-sketch__svg"
      >
        <title id={titleId}>{t('plan.title', { storey: storey + 1 })}</title>
        <desc id={descId}>{t('plan.desc', { placed: placed.length, unplaced })}</desc>
        <rect
          x={px(0)}
          y={py(sy)}
          width={sx * scale}
          height={sy * scale}
          class={
            known
              ? 'plan-sketch__footprint'
              : 'plan-sketch__footprint plan-sketch__footprint--guess'
          }
        />
        {placed.map((w) => {
          const pos = w.positionM as number;
          const half = (w.lengthM * scale) / 2;
          const strong = w.direction === direction;
          const cls = `plan-sketch__wall${strong ? ' plan-sketch__wall--current' : ''}`;
          if (w.direction === 'x') {
            const cx = px((sx as number) / 2);
            return (
              <g key={w.id}>
                <line x1={cx - half} x2={cx + half} y1={py(pos)} y2={py(pos)} class={cls} />
                <text x={cx + half + 3} y={py(pos) + 4} class="plot__label plot__label--small">
                  {w.id}
                </text>
              </g>
            );
          }
          const cy = py((sy as number) / 2);
          return (
            <g key={w.id}>
              <line x1={px(pos)} x2={px(pos)} y1={cy - half} y2={cy + half} class={cls} />
              <text x={px(pos) + 3} y={cy - half - 3} class="plot__label plot__label--small">
                {w.id}
              </text>
            </g>
          );
        })}
        <text x={W - PAD} y={H - 6} class="plot__label" text-anchor="end">
          x →
        </text>
        <text x={6} y={PAD - 10} class="plot__label">
          ↑ y
        </text>
      </svg>
      <figcaption class="plan-sketch__caption">
        {unplaced > 0 ? t('plan.unplaced', { count: unplaced }) : t('plan.caption')}
      </figcaption>
    </figure>
  );
}
