// The building blocks of the vibration pipeline, each against an outside or analytic reference:
// - resampling: a sine sampled at jittered times, against the sine itself;
// - detrending: exact straight lines;
// - peak prominence: hand-worked arrays (definition as in scipy.signal.peak_prominences);
// - half-power bandwidth: a Lorentzian, whose half-power points are exactly f₀ ± γ, and the
//   displacement response of an SDOF, whose bandwidth is 2ζf_n to first order (Chopra,
//   Dynamics of Structures, half-power method);
// - Nelder–Mead: Rosenbrock's function, minimum 0 at (1, 1) (Rosenbrock 1960, Comput. J. 3(3));
// - the SDOF likelihood fit: periodogram values drawn as the model times exponential noise
//   (the distribution Whittle's likelihood assumes), so the answer is the model's.
import { describe, expect, it } from 'vitest';
import {
  detrend,
  fitSdofPeak,
  findPeaks,
  halfPowerBand,
  nelderMead,
  resampleToUniform,
  sdofAccelerationShape,
} from '../../calc/index.js';
import type { Periodogram } from '../../calc/index.js';
import { mulberry32 } from './vibration-synthetic.js';

describe('resampleToUniform', () => {
  it('recovers a 2 Hz sine from 100 Hz timestamps with ±3 ms jitter within 0.51 % of its amplitude', () => {
    const rand = mulberry32(1);
    const t: number[] = [];
    const v: number[] = [];
    for (let k = 0; k < 3000; k++) {
      const tk = 50 + k / 100 + (2 * rand() - 1) * 0.003;
      t.push(tk);
      v.push(Math.sin(2 * Math.PI * 2 * tk));
    }
    const { record } = resampleToUniform(t, [v], { rateHz: 100 });
    expect(record).not.toBeNull();
    const r = record!;
    let worst = 0;
    for (let k = 0; k < r.channels[0]!.length; k++) {
      const tk = r.startS + k / 100;
      worst = Math.max(worst, Math.abs(r.channels[0]![k]! - Math.sin(2 * Math.PI * 2 * tk)));
    }
    // Linear interpolation error ≤ Δt²·max|x''|/8 = Δt²·(2πf)²/8 ≈ 0.0051 for Δt up to 16 ms
    // (interpolation remainder theorem).
    expect(worst).toBeLessThan(0.0051);
    expect(r.rateHz).toBe(100);
  });
  it('uses the median interval as the rate when none is given', () => {
    const t = Array.from({ length: 500 }, (_, k) => k / 60);
    const { record } = resampleToUniform(t, [t.map(() => 1)]);
    expect(record!.rateHz).toBeCloseTo(60, 9);
  });
  it('does not crash on NaN, repeated and out-of-order samples: drops and sorts them, and says so', () => {
    const t = [0, 0.01, 0.02, 0.02, 0.05, 0.03, 0.04, Number.NaN, 0.06, 0.07];
    const v = [0, 1, 2, 9, 5, 3, 4, 7, Number.NaN, 7];
    const { record, report } = resampleToUniform(t, [v], { rateHz: 100 });
    expect(report.droppedNonFinite).toBe(2);
    expect(report.droppedDuplicate).toBe(1);
    expect(report.reordered).toBe(true);
    expect(Array.from(record!.channels[0]!).map((x) => Math.round(x * 1e9) / 1e9)).toEqual([
      0, 1, 2, 3, 4, 5, 6, 7,
    ]);
  });
  it('keeps the longest stretch between gaps and reports the gap', () => {
    const t = [
      ...Array.from({ length: 100 }, (_, k) => k / 100),
      ...Array.from({ length: 300 }, (_, k) => 5 + k / 100),
    ];
    const { record, report } = resampleToUniform(t, [t.map(() => 0)]);
    expect(report.gapCount).toBe(1);
    expect(report.largestGapS).toBeCloseTo(4.01, 9);
    expect(report.keptFromS).toBeCloseTo(5, 9);
    expect(record!.channels[0]!.length).toBe(300);
  });
  it('does not crash on empty or single-sample input: null record', () => {
    expect(resampleToUniform([], [[]]).record).toBeNull();
    expect(resampleToUniform([1], [[2]]).record).toBeNull();
    expect(resampleToUniform([1, 1], [[2, 3]]).record).toBeNull();
  });
  it('throws for channels of another length than the timestamps', () => {
    expect(() => resampleToUniform([0, 1], [[1]])).toThrow(/channels\[0\] must have 2 values/);
  });
});

describe('detrend', () => {
  it('removes a straight line exactly and a constant exactly', () => {
    const line = Array.from({ length: 1001 }, (_, i) => 3 + 0.25 * i);
    expect(Math.max(...Array.from(detrend(line, 'linear')).map(Math.abs))).toBeLessThan(1e-9);
    expect(Math.max(...Array.from(detrend([5, 5, 5], 'constant')).map(Math.abs))).toBe(0);
  });
  it('does not crash on an empty record', () => {
    expect(detrend([], 'linear').length).toBe(0);
  });
});

describe('findPeaks prominence (hand-worked)', () => {
  it('gives [0, 2, 1, 3, 0] a peak at 1 of prominence 1 and a peak at 3 of prominence 3', () => {
    const peaks = findPeaks([0, 2, 1, 3, 0]);
    expect(peaks.map((p) => [p.index, p.prominence])).toEqual([
      [1, 1],
      [3, 3],
    ]);
    expect(peaks[0]!.rightBase).toBe(2);
  });
  it('counts a flat top once, at its middle, and never the end points', () => {
    expect(findPeaks([5, 1, 4, 4, 4, 1, 6]).map((p) => p.index)).toEqual([3]);
  });
  it('judges a bump on a slope by its own valley, not by its height', () => {
    const peaks = findPeaks([0, 1, 2, 3, 2.5, 4, 5, 6, 5, 0]);
    const bump = peaks.find((p) => p.index === 3)!;
    expect(bump.prominence).toBeCloseTo(0.5, 12);
  });
});

describe('half-power bandwidth', () => {
  it('finds a Lorentzian’s half-power points at f₀ ± γ', () => {
    const f0 = 4;
    const g = 0.1;
    const f = Array.from({ length: 40001 }, (_, i) => 3 + i * 5e-5);
    const p = f.map((x) => 1 / ((x - f0) ** 2 + g * g));
    const top = Math.round((f0 - 3) / 5e-5);
    const band = halfPowerBand(f, p, top, p[top]!, 0)!;
    expect(band.lowerHz).toBeCloseTo(f0 - g, 6);
    expect(band.upperHz).toBeCloseTo(f0 + g, 6);
  });
  it('gives an SDOF displacement response a bandwidth of 2ζf_n within 0.1 % at ζ = 2 % (Chopra)', () => {
    const fn = 2;
    const z = 0.02;
    const f = Array.from({ length: 200001 }, (_, i) => 1.5 + i * 5e-6);
    const p = f.map((x) => 1 / ((1 - (x / fn) ** 2) ** 2 + (2 * z * (x / fn)) ** 2));
    let top = 0;
    for (let i = 0; i < p.length; i++) if (p[i]! > p[top]!) top = i;
    const band = halfPowerBand(f, p, top, p[top]!, 0)!;
    expect(band.bandwidthHz / (2 * z * fn)).toBeCloseTo(1, 3);
  });
  it('measures half power above a background, not above zero', () => {
    const f = [0, 1, 2, 3, 4];
    const p = [1, 2, 5, 2, 1];
    // Background 1: half power at 3; crossings halfway between bins 1–2 and 2–3.
    const band = halfPowerBand(f, p, 2, 5, 1)!;
    expect(band.level).toBe(3);
    expect(band.lowerHz).toBeCloseTo(1 + 1 / 3, 12);
    expect(band.upperHz).toBeCloseTo(3 - 1 / 3, 12);
  });
});

describe('Nelder–Mead', () => {
  it('finds the minimum of Rosenbrock’s function at (1, 1)', () => {
    const r = nelderMead((x) => 100 * (x[1]! - x[0]! ** 2) ** 2 + (1 - x[0]!) ** 2, [-1.2, 1], {
      steps: [0.5, 0.5],
      tolerance: 1e-16,
      maxIterations: 5000,
    });
    expect(r.x[0]).toBeCloseTo(1, 4);
    expect(r.x[1]).toBeCloseTo(1, 4);
    expect(r.value).toBeLessThan(1e-8);
  });
});

describe('SDOF likelihood fit', () => {
  it('peaks the acceleration shape at (1 + 4ζ²)/(4ζ²) at resonance', () => {
    expect(sdofAccelerationShape(3, 3, 0.05)).toBeCloseTo((1 + 0.01) / 0.01, 10);
  });
  it('recovers f_n and ζ from model-times-exponential periodogram values, within its standard errors', () => {
    const rand = mulberry32(3);
    const T = 120;
    const bins = 3000;
    const frequencies = Float64Array.from({ length: bins }, (_, k) => k / T);
    const fn = 3.7;
    const z = 0.03;
    const A = 2e-6;
    const B = 1e-6;
    const psd = Float64Array.from(frequencies, (f) => {
      const m = A * sdofAccelerationShape(Math.max(f, 1e-9), fn, z) + B;
      return -m * Math.log(1 - rand());
    });
    const pg: Periodogram = { frequencies, psd, durationS: T };
    const fit = fitSdofPeak(pg, { frequencyHz: 3.65, dampingRatio: 0.05 }, [2.7, 4.7])!;
    expect(fit).not.toBeNull();
    expect(Math.abs(fit.frequencyHz - fn)).toBeLessThan(3 * fit.frequencyUncertaintyHz!);
    expect(Math.abs(fit.modelDampingRatio - z)).toBeLessThan(3 * fit.dampingUncertainty!);
    expect(fit.frequencyUncertaintyHz! / fn).toBeLessThan(0.01);
    expect(fit.halfPowerDampingRatio!).toBeCloseTo(fit.modelDampingRatio, 2);
  });
  it('gives null when the band holds too few bins', () => {
    const frequencies = Float64Array.from({ length: 100 }, (_, k) => k);
    const pg: Periodogram = { frequencies, psd: new Float64Array(100).fill(1), durationS: 1 };
    expect(fitSdofPeak(pg, { frequencyHz: 10, dampingRatio: 0.02 }, [9, 11])).toBeNull();
  });
});
