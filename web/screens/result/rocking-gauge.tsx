/**
 * θ/α gauge of one rocking wall: how much of its toppling angle the wall used (observed from
 * the uplift gap) or is estimated to use under the hazard. A bar from 0 to 1.2 with the band
 * limits marked and labelled; the observed value is a solid bar, the predicted one a hatched
 * bar, each with its number written out, so it reads in greyscale and without colour.
 */
import { t } from '../../i18n/index.js';
import { linear, tickLabel } from './plot-scale.js';

export interface RockingGaugeProps {
  id: string;
  wallId: string;
  observed: number | null;
  predicted: number | null;
  /** Band limits to mark (θ/α), with short labels. */
  limits: readonly { ratio: number; label: string }[];
  summary: string;
}

const W = 360;
const H = 112;
const M = { left: 16, right: 20 };
const TOP = 1.2;

export function RockingGauge(p: RockingGaugeProps) {
  const x = linear(0, TOP, M.left, W - M.right);
  const clamp = (v: number) => Math.min(TOP, Math.max(0, v));
  const titleId = `${p.id}-title`;
  const descId = `${p.id}-desc`;
  const bar = (v: number | null, y: number, cls: string, label: string, fill?: string) => {
    if (v === null) {
      return (
        <text x={M.left} y={y + 13} class="plot__label">
          {label}: {t('plot.notKnown')}
        </text>
      );
    }
    const end = x(clamp(v));
    const inside = end > W * 0.65;
    return (
      <g>
        <rect x={M.left} y={y} width={end - M.left} height={18} class={cls} fill={fill} />
        <rect x={M.left} y={y} width={W - M.left - M.right} height={18} class="plot__gauge-frame" />
        <text
          x={inside ? end - 6 : end + 6}
          y={y + 14}
          class="plot__label plot__label--strong plot__label--halo"
          text-anchor={inside ? 'end' : 'start'}
        >
          {label} {tickLabel(v, 2)}
          {v > TOP ? ' ▶' : ''}
        </text>
      </g>
    );
  };
  return (
    <figure class="plot-figure plot-figure--gauge">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        class="plot"
        role="img"
        aria-labelledby={`${titleId} ${descId}`}
      >
        <title id={titleId}>{t('plot.gaugeTitle', { id: p.wallId })}</title>
        <desc id={descId}>{p.summary}</desc>
        <defs>
          <pattern
            id={`${p.id}-hatch`}
            width="6"
            height="6"
            patternUnits="userSpaceOnUse"
            patternTransform="rotate(45)"
          >
            <line x1="0" y1="0" x2="0" y2="6" class="plot__hatch" />
          </pattern>
        </defs>
        {bar(p.observed, 10, 'plot__gauge-observed', t('plot.observed'))}
        {bar(p.predicted, 36, 'plot__gauge-predicted', t('plot.predicted'), `url(#${p.id}-hatch)`)}
        {p.limits.map((l) => (
          <g key={l.label}>
            <line
              x1={x(l.ratio)}
              x2={x(l.ratio)}
              y1={6}
              y2={62}
              class={l.ratio >= 1 ? 'plot__limit plot__limit--strong' : 'plot__limit'}
            />
            <text x={x(l.ratio)} y={78} class="plot__label plot__label--small" text-anchor="middle">
              {tickLabel(l.ratio, 2)}
            </text>
            <text x={x(l.ratio)} y={94} class="plot__label plot__label--small" text-anchor="middle">
              {l.label}
            </text>
          </g>
        ))}
      </svg>
      <figcaption class="plot-figure__caption">{p.summary}</figcaption>
    </figure>
  );
}
