/**
 * Drift profile: one row per storey (ground at the bottom), drift ratio in % along the
 * axis. Observed residual drift and the estimated peak drift under the hazard are drawn with
 * different marker shapes (and words in the legend), never colour alone; reference lines
 * (e.g. damage-state thresholds) carry their own labels.
 */
import { t } from '../../i18n/index.js';
import { linear, niceAxis, tickLabel } from './plot-scale.js';

export interface DriftSeries {
  key: string;
  label: string;
  /** Marker shape: filled circle, hollow square, diamond or cross. */
  marker: 'circle' | 'square' | 'diamond' | 'cross';
  /** Drift ratio per storey (0.01 = 1 %), ground storey first; null where not known. */
  ratios: readonly (number | null)[];
}

export interface DriftProfileProps {
  id: string;
  storeys: number;
  series: readonly DriftSeries[];
  references?: readonly { label: string; ratio: number }[];
  title: string;
  summary: string;
}

const W = 360;
const M = { left: 70, right: 16, top: 18, bottom: 40 };
const ROW = 38;

function Marker(props: { kind: DriftSeries['marker']; x: number; y: number }) {
  const { kind, x, y } = props;
  switch (kind) {
    case 'circle':
      return <circle cx={x} cy={y} r={6} class="plot__marker plot__marker--filled" />;
    case 'square':
      return (
        <rect
          x={x - 6}
          y={y - 6}
          width={12}
          height={12}
          class="plot__marker plot__marker--hollow"
        />
      );
    case 'diamond':
      return (
        <path
          d={`M${x},${y - 7} L${x + 7},${y} L${x},${y + 7} L${x - 7},${y} Z`}
          class="plot__marker plot__marker--filled-alt"
        />
      );
    default:
      return (
        <path
          d={`M${x - 6},${y - 6} L${x + 6},${y + 6} M${x + 6},${y - 6} L${x - 6},${y + 6}`}
          class="plot__marker plot__marker--cross"
        />
      );
  }
}

export function DriftProfilePlot(p: DriftProfileProps) {
  const n = Math.max(1, p.storeys);
  const H = M.top + M.bottom + n * ROW;
  const all = p.series.flatMap((s) => s.ratios.filter((r): r is number => r !== null));
  const refs = p.references ?? [];
  const maxPct = Math.max(0.5, ...all.map((r) => r * 100), ...refs.map((r) => r.ratio * 100));
  const axis = niceAxis(maxPct * 1.05, 4);
  const x = linear(0, axis.top, M.left, W - M.right);
  const rowY = (i: number) => H - M.bottom - (i + 0.5) * ROW;
  const titleId = `${p.id}-title`;
  const descId = `${p.id}-desc`;
  return (
    <figure class="plot-figure">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        class="plot"
        role="img"
        aria-labelledby={`${titleId} ${descId}`}
      >
        <title id={titleId}>{p.title}</title>
        <desc id={descId}>{p.summary}</desc>
        {axis.ticks.map((v) => (
          <g key={v}>
            <line x1={x(v)} x2={x(v)} y1={M.top} y2={H - M.bottom} class="plot__grid" />
            <text x={x(v)} y={H - M.bottom + 17} class="plot__label" text-anchor="middle">
              {tickLabel(v)}
            </text>
          </g>
        ))}
        {Array.from({ length: n }, (_v, i) => (
          <g key={`row${i}`}>
            <line
              x1={M.left}
              x2={W - M.right}
              y1={rowY(i) + ROW / 2}
              y2={rowY(i) + ROW / 2}
              class="plot__floor"
            />
            <text x={M.left - 8} y={rowY(i) + 5} class="plot__label" text-anchor="end">
              {t('plot.storeyShort', { n: i + 1 })}
            </text>
          </g>
        ))}
        {refs.map((r) => (
          <g key={r.label}>
            <line
              x1={x(r.ratio * 100)}
              x2={x(r.ratio * 100)}
              y1={M.top - 4}
              y2={H - M.bottom}
              class="plot__reference"
            />
            <text x={x(r.ratio * 100) + 3} y={M.top + 8} class="plot__label plot__label--small">
              {r.label}
            </text>
          </g>
        ))}
        {p.series.map((s, si) =>
          s.ratios.map((r, i) =>
            r === null ? null : (
              <Marker
                key={`${s.key}${i}`}
                kind={s.marker}
                x={x(r * 100)}
                y={rowY(i) + (si - (p.series.length - 1) / 2) * 9}
              />
            ),
          ),
        )}
        <line x1={M.left} x2={W - M.right} y1={H - M.bottom} y2={H - M.bottom} class="plot__axis" />
        <line x1={M.left} x2={M.left} y1={M.top} y2={H - M.bottom} class="plot__axis" />
        <text x={(M.left + W - M.right) / 2} y={H - 6} class="plot__label" text-anchor="middle">
          {t('plot.driftAxis')}
        </text>
      </svg>
      <ul class="plot-legend">
        {p.series.map((s) => (
          <li key={s.key}>
            <svg viewBox="0 0 20 20" width="20" height="20" aria-hidden="true" class="plot">
              <Marker kind={s.marker} x={10} y={10} />
            </svg>
            {s.label}
            {s.ratios.every((r) => r === null) && (
              <span class="muted"> · {t('plot.noValues')}</span>
            )}
          </li>
        ))}
      </ul>
      <figcaption class="plot-figure__caption">{p.summary}</figcaption>
    </figure>
  );
}
