/**
 * A small plot of a recording's spectrum (the two horizontal phone axes, log scale), with
 * the identified peak marked. Drawn as SVG from numbers only; every word comes from the
 * catalogue.
 */
import type { DisplaySpectrum } from '../../calc/index.js';
import { t } from '../i18n/index.js';
import { fixed } from './format.js';

const W = 320;
const H = 120;

export function SpectrumPlot({
  spectrum,
  peakHz,
}: {
  spectrum: DisplaySpectrum;
  peakHz: number | null;
}) {
  const f = spectrum.frequenciesHz;
  if (f.length < 2) return null;
  const fMax = f[f.length - 1] as number;
  const fMin = f[0] as number;
  const all = [...spectrum.x, ...spectrum.y].filter((v) => v > 0);
  if (all.length === 0) return null;
  const lo = Math.log10(Math.min(...all));
  const hi = Math.log10(Math.max(...all));
  const span = hi > lo ? hi - lo : 1;
  const px = (hz: number) => ((hz - fMin) / (fMax - fMin)) * W;
  const py = (v: number) => H - ((Math.log10(Math.max(v, 10 ** lo)) - lo) / span) * (H - 4) - 2;
  const line = (values: number[]) =>
    values.map((v, i) => `${fixed(px(f[i] as number), 1)},${fixed(py(v), 1)}`).join(' ');
  return (
    <figure class="spectrum-plot">
      <svg
        viewBox={`0 0 ${W} ${H}`}
        role="img"
        aria-label={t('instruments.vib.spectrum', { max: fixed(fMax, 0) })}
        preserveAspectRatio="none"
      >
        <polyline class="spectrum-plot__x" points={line(spectrum.x)} />
        <polyline class="spectrum-plot__y" points={line(spectrum.y)} />
        {peakHz !== null && peakHz >= fMin && peakHz <= fMax && (
          <line class="spectrum-plot__peak" x1={px(peakHz)} x2={px(peakHz)} y1={0} y2={H} />
        )}
      </svg>
      <figcaption class="instrument__hint">
        {t('instruments.vib.spectrum', { max: fixed(fMax, 0) })}
      </figcaption>
    </figure>
  );
}
