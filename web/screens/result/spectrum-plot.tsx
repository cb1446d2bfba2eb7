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
  /** The periods the demand is read at (one per direction), with Sa there in g. */
  marks: readonly { label: string; periodS: number; saG: number }[];
  title: string;
  /** A sentence with the same content, for screen readers and print. */
  summary: string;
}

const W = 360;
const H = 250;
const M = { left: 46, right: 14, top: 14, bottom: 42 };

export function SpectrumPlot(p: SpectrumPlotProps) {
  const maxT = Math.max(...p.points.map((q) => q.periodS), ...p.marks.map((m) => m.periodS));
  const maxSa = Math.max(...p.points.map((q) => q.saG), ...p.marks.map((m) => m.saG));
  const xAxis = niceAxis(maxT, 4);
  const yAxis = niceAxis(maxSa * 1.08, 4);
  const x = linear(0, xAxis.top, M.left, W - M.right);
  const y = linear(0, yAxis.top, H - M.bottom, M.top);
  const path = p.points
    .map((q, i) => `${i === 0 ? 'M' : 'L'}${x(q.periodS).toFixed(1)},${y(q.saG).toFixed(1)}`)
    .join(' ');
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
        {p.marks.map((m, i) => {
          const mx = x(m.periodS);
          const my = y(m.saG);
          return (
            <g key={m.label} class="plot__mark">
              <line x1={mx} x2={mx} y1={H - M.bottom} y2={my} class="plot__guide" />
              <line x1={M.left} x2={mx} y1={my} y2={my} class="plot__guide" />
              <circle cx={mx} cy={my} r={6} class="plot__dot" />
              <text
                x={mx + (i === 0 ? -9 : 9)}
                y={my + 18}
                class="plot__label plot__label--strong plot__label--halo"
                text-anchor={i === 0 ? 'end' : 'start'}
              >
                {m.label}
              </text>
            </g>
          );
        })}
        {p.marks.map((m, i) => (
          <text
            key={`legend-${m.label}`}
            x={W - M.right}
            y={M.top + 14 + i * 18}
            class="plot__label plot__label--strong plot__label--halo"
            text-anchor="end"
          >
            {t('plot.markLabel', {
              label: m.label,
              period: tickLabel(m.periodS, 2),
              sa: tickLabel(m.saG, 3),
            })}
          </text>
        ))}
      </svg>
      <figcaption class="plot-figure__caption">{p.summary}</figcaption>
    </figure>
  );
}
