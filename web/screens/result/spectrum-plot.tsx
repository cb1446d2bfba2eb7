/**
 * Response spectrum Sa(T) with the building's period and the demand read there marked.
 * Reads plain numbers (the caller samples the spectrum), so it works for any spectrum kind.
 * Sized for a phone: 360 × 250 user units, labels at 13 units or more.
 */
import { t } from '../../i18n/index.js';
import { linear, niceAxis, tickLabel } from './plot-scale.js';

export interface SpectrumPoint {
  periodS: number;
  saG: number;
}

export interface SpectrumPlotProps {
  id: string;
  points: readonly SpectrumPoint[];
  /** The period the demand is read at, s; null when there is none. */
  periodS: number | null;
  /** Sa at that period, g. */
  demandG: number | null;
  /** Other period estimates shown as thin ticks on the axis (e.g. empirical). */
  otherPeriods?: readonly { label: string; periodS: number }[];
  title: string;
  /** A sentence with the same content, for screen readers and print. */
  summary: string;
}

const W = 360;
const H = 250;
const M = { left: 46, right: 14, top: 14, bottom: 42 };

export function SpectrumPlot(p: SpectrumPlotProps) {
  const maxT = Math.max(...p.points.map((q) => q.periodS), p.periodS ?? 0);
  const maxSa = Math.max(...p.points.map((q) => q.saG), p.demandG ?? 0);
  const xAxis = niceAxis(maxT, 4);
  const yAxis = niceAxis(maxSa * 1.08, 4);
  const x = linear(0, xAxis.top, M.left, W - M.right);
  const y = linear(0, yAxis.top, H - M.bottom, M.top);
  const path = p.points
    .map((q, i) => `${i === 0 ? 'M' : 'L'}${x(q.periodS).toFixed(1)},${y(q.saG).toFixed(1)}`)
    .join(' ');
  const titleId = `${p.id}-title`;
  const descId = `${p.id}-desc`;
  const hasMark = p.periodS !== null && p.demandG !== null;
  const markX = hasMark ? x(p.periodS as number) : 0;
  const markY = hasMark ? y(p.demandG as number) : 0;
  // Keep the marker's label inside the plot on the right-hand side.
  const labelRight = markX > W * 0.6;
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
        {yAxis.ticks.map((v) => (
          <g key={`y${v}`}>
            <line x1={M.left} x2={W - M.right} y1={y(v)} y2={y(v)} class="plot__grid" />
            <text x={M.left - 6} y={y(v) + 4} class="plot__label" text-anchor="end">
              {tickLabel(v)}
            </text>
          </g>
        ))}
        {xAxis.ticks.map((v) => (
          <text
            key={`x${v}`}
            x={x(v)}
            y={H - M.bottom + 17}
            class="plot__label"
            text-anchor="middle"
          >
            {tickLabel(v)}
          </text>
        ))}
        <line x1={M.left} x2={W - M.right} y1={H - M.bottom} y2={H - M.bottom} class="plot__axis" />
        <line x1={M.left} x2={M.left} y1={M.top} y2={H - M.bottom} class="plot__axis" />
        <text x={(M.left + W - M.right) / 2} y={H - 6} class="plot__label" text-anchor="middle">
          {t('plot.periodAxis')}
        </text>
        <text
          x={12}
          y={M.top + 2}
          class="plot__label"
          transform={`rotate(-90 12 ${M.top + 2})`}
          text-anchor="end"
        >
          {t('plot.saAxis')}
        </text>
        <path d={path} class="plot__line" />
        {(p.otherPeriods ?? []).map((o) => (
          <g key={o.label}>
            <line
              x1={x(o.periodS)}
              x2={x(o.periodS)}
              y1={H - M.bottom}
              y2={H - M.bottom - 10}
              class="plot__tick-mark"
            />
          </g>
        ))}
        {hasMark && (
          <g class="plot__mark">
            <line x1={markX} x2={markX} y1={H - M.bottom} y2={markY} class="plot__guide" />
            <line x1={M.left} x2={markX} y1={markY} y2={markY} class="plot__guide" />
            <circle cx={markX} cy={markY} r={6} class="plot__dot" />
            <text
              x={labelRight ? markX - 10 : markX + 10}
              y={Math.max(M.top + 14, markY - 10)}
              class="plot__label plot__label--strong"
              text-anchor={labelRight ? 'end' : 'start'}
            >
              {t('plot.markLabel', {
                period: tickLabel(p.periodS as number, 2),
                sa: tickLabel(p.demandG as number, 3),
              })}
            </text>
          </g>
        )}
      </svg>
      <figcaption class="plot-figure__caption">{p.summary}</figcaption>
    </figure>
  );
}
