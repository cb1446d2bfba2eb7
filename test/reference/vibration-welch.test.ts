// Welch PSD, windows, cross-spectrum and the scatter model, against independent references:
// - fft.js 4.0.4 (npm): a Welch estimate assembled here from fft.js transforms, retyped from
//   Welch 1967 (IEEE Trans. Audio Electroacoust. AU-15(2):70–73) with the one-sided density
//   scaling 2|X|²/(fs·Σw²);
// - Harris 1978 (Proc. IEEE 66(1):51–83) Table 1, published window figures;
// - Abramowitz & Stegun 6.4.2 and 6.4.4: ψ₁(1) = π²/6, ψ₁(½) = π²/2;
// - analytic facts: a sine of amplitude A carries A²/2 of power; white noise of variance σ²
//   sampled at fs has a one-sided density 2σ²/fs.
import { describe, expect, it } from 'vitest';
import FFT from 'fft.js';
import {
  defaultSegmentLength,
  spectralScatterDb,
  trigamma,
  welchCrossSpectrum,
  welchPsd,
  windowProperties,
} from '../../calc/index.js';
import { gaussian, mulberry32 } from './vibration-synthetic.js';

function noise(n: number, seed: number, sigma = 1): number[] {
  const g = gaussian(mulberry32(seed));
  return Array.from({ length: n }, () => sigma * g());
}

/** Welch 1967 with fft.js transforms: Hann (periodic), mean removed per segment, half overlap. */
function referenceWelch(x: number[], fs: number, L: number, nfft: number): number[] {
  const ref = new FFT(nfft);
  const w = Array.from({ length: L }, (_, i) => 0.5 - 0.5 * Math.cos((2 * Math.PI * i) / L));
  const u = w.reduce((s, v) => s + v * v, 0);
  const step = L / 2;
  const acc = new Array<number>(nfft / 2 + 1).fill(0);
  let count = 0;
  for (let start = 0; start + L <= x.length; start += step) {
    const seg = x.slice(start, start + L);
    const mean = seg.reduce((s, v) => s + v, 0) / L;
    const input = new Array<number>(nfft).fill(0);
    for (let i = 0; i < L; i++) input[i] = (seg[i]! - mean) * w[i]!;
    const out = ref.createComplexArray() as number[];
    ref.realTransform(out, input);
    for (let k = 0; k <= nfft / 2; k++) acc[k]! += out[2 * k]! ** 2 + out[2 * k + 1]! ** 2;
    count += 1;
  }
  return acc.map((v, k) => ((k === 0 || k === nfft / 2 ? 1 : 2) * v) / (fs * u * count));
}

describe('Welch PSD against a Welch estimate built on fft.js', () => {
  for (const [n, L, pad] of [
    [12_000, 2048, 1],
    [6000, 1024, 2],
    [777, 64, 4],
  ] as const) {
    it(`agrees bin by bin to 1e-10 relative (n = ${n}, segment ${L}, nfft ${L * pad})`, () => {
      const x = noise(n, n);
      const fs = 100;
      const mine = welchPsd(x, fs, { segmentLength: L, nfft: L * pad });
      const ref = referenceWelch(x, fs, L, L * pad);
      expect(mine.psd.length).toBe(ref.length);
      expect(mine.segmentCount).toBe(Math.floor((n - L) / (L / 2)) + 1);
      for (let k = 0; k < ref.length; k++) {
        expect(Math.abs(mine.psd[k]! - ref[k]!)).toBeLessThanOrEqual(1e-10 * ref[k]! + 1e-300);
      }
      expect(mine.frequencies[1]! - mine.frequencies[0]!).toBeCloseTo(fs / (L * pad), 12);
    });
  }
  it('uses the default segment: the largest power of two leaving at least 8 segments', () => {
    expect(defaultSegmentLength(12_000)).toBe(2048); // 12000/4.5 = 2667
    expect(defaultSegmentLength(6000)).toBe(1024);
    expect(welchPsd(noise(12_000, 2), 100).segmentCount).toBe(10);
  });
});

describe('Welch PSD levels (analytic references)', () => {
  it('gives white noise of variance σ² the density 2σ²/fs, on average over the band', () => {
    const fs = 100;
    const sigma = 0.3;
    const w = welchPsd(noise(60_000, 5, sigma), fs);
    let mean = 0;
    let count = 0;
    for (let k = 5; k < w.psd.length - 5; k++) {
      mean += w.psd[k]!;
      count += 1;
    }
    mean /= count;
    expect(mean / ((2 * sigma * sigma) / fs)).toBeCloseTo(1, 1);
  });
  it('integrates a sine of amplitude A to A²/2 (the sine sits between bins)', () => {
    const fs = 100;
    const A = 0.02;
    const f = 3.3217;
    const x = Array.from({ length: 12_000 }, (_, i) => A * Math.sin((2 * Math.PI * f * i) / fs));
    const w = welchPsd(x, fs);
    const df = w.binSpacingHz;
    let power = 0;
    for (let k = 0; k < w.psd.length; k++) {
      if (Math.abs(w.frequencies[k]! - f) < 0.5) power += w.psd[k]! * df;
    }
    expect(power / ((A * A) / 2)).toBeCloseTo(1, 3);
  });
  it('equals the mean square of the segments in total (Parseval, rectangular window, no overlap)', () => {
    const x = noise(4096, 9);
    const w = welchPsd(x, 50, { segmentLength: 4096, window: 'rectangular', detrend: 'none' });
    const total = w.psd.reduce((s, v) => s + v, 0) * w.binSpacingHz;
    const meanSquare = x.reduce((s, v) => s + v * v, 0) / x.length;
    expect(total / meanSquare).toBeCloseTo(1, 10);
  });
});

describe('windows against Harris 1978, Table 1', () => {
  const rows = [
    // kind, coherent gain, ENBW (bins), 3-dB bandwidth (bins), overlap correlation at 50 %, at 75 %
    ['rectangular', 1.0, 1.0, 0.89, 0.5, 0.75],
    ['hann', 0.5, 1.5, 1.44, 0.167, 0.659],
    ['hamming', 0.54, 1.36, 1.3, 0.235, 0.707],
  ] as const;
  for (const [kind, cg, enbw, bw3, oc50, oc75] of rows) {
    it(`gives the ${kind} window Harris's coherent gain, ENBW, 3-dB width and overlap correlation`, () => {
      const n = 1024;
      const p = windowProperties(kind, n);
      expect(p.coherentGain).toBeCloseTo(cg, 2);
      expect(p.enbwBins).toBeCloseTo(enbw, 2);
      expect(Math.abs(p.halfPowerWidthBins - bw3)).toBeLessThan(0.006);
      expect(p.overlapCorrelation(n / 2)).toBeCloseTo(oc50, 2);
      expect(p.overlapCorrelation(n / 4)).toBeCloseTo(oc75, 2);
    });
  }
});

describe('scatter of a Welch value on the dB scale', () => {
  it('computes trigamma at A&S check values ψ₁(1) = π²/6 and ψ₁(½) = π²/2', () => {
    expect(trigamma(1)).toBeCloseTo(Math.PI ** 2 / 6, 10);
    expect(trigamma(0.5)).toBeCloseTo(Math.PI ** 2 / 2, 10);
    // Recurrence ψ₁(x+1) = ψ₁(x) − 1/x² (A&S 6.4.6) at a point on each side of the switch at 6.
    expect(trigamma(10.5)).toBeCloseTo(trigamma(9.5) - 1 / 9.5 ** 2, 12);
  });
  it('predicts the scatter of white-noise Welch values within 10 %', () => {
    const w = welchPsd(noise(12_000, 21), 100);
    const db: number[] = [];
    for (let k = 10; k < w.psd.length - 10; k++) db.push(10 * Math.log10(w.psd[k]!));
    const mean = db.reduce((s, v) => s + v, 0) / db.length;
    const sd = Math.sqrt(db.reduce((s, v) => s + (v - mean) ** 2, 0) / (db.length - 1));
    const predicted = spectralScatterDb(w.degreesOfFreedom);
    expect(sd / predicted).toBeGreaterThan(0.9);
    expect(sd / predicted).toBeLessThan(1.1);
    // Welch 1967 variance for K = 10 half-overlapped Hann segments: ν = 2K/(1 + 2·(K−1)/K·ρ²), ρ = 0.167.
    expect(w.degreesOfFreedom).toBeCloseTo(20 / (1 + 2 * 0.9 * 0.1667 ** 2), 0);
  });
});

describe('cross-spectrum and coherence', () => {
  it('gives the auto-spectrum when a channel is crossed with itself, and coherence 1', () => {
    const x = noise(8000, 4);
    const c = welchCrossSpectrum(x, x, 100);
    const p = welchPsd(x, 100);
    for (let k = 1; k < p.psd.length - 1; k += 37) {
      expect(c.pxyRe[k]! / p.psd[k]!).toBeCloseTo(1, 10);
      expect(Math.abs(c.pxyIm[k]!)).toBeLessThan(1e-12 * p.psd[k]!);
      expect(c.coherence[k]!).toBeCloseTo(1, 10);
    }
  });
  it('gives independent noise a coherence near 1/K (Bendat & Piersol bias of the estimate)', () => {
    const c = welchCrossSpectrum(noise(12_000, 1), noise(12_000, 2), 100);
    const mean = c.coherence.reduce((s, v) => s + v, 0) / c.coherence.length;
    expect(mean).toBeGreaterThan(0.5 / c.segmentCount);
    expect(mean).toBeLessThan(2 / c.segmentCount);
  });
  it('gives a delayed, scaled copy plus a little noise a coherence near 1', () => {
    const x = noise(12_000, 3);
    const extra = noise(12_000, 4, 0.05);
    const y = x.map((_, i) => 0.7 * (x[i - 3] ?? 0) + extra[i]!);
    const c = welchCrossSpectrum(x, y, 100);
    const k = Math.round(5 / (c.frequencies[1]! - c.frequencies[0]!));
    expect(c.coherence[k]!).toBeGreaterThan(0.95);
  });
});

describe('Welch PSD bad input', () => {
  it('does not crash on an empty or too short record: throws a RangeError with the count', () => {
    expect(() => welchPsd([], 100)).toThrow(/at least 4 values, got 0/);
    expect(() => welchPsd([1, 2, 3], 100)).toThrow(RangeError);
  });
  it('does not crash on NaN samples: names the index', () => {
    const x = noise(100, 1);
    x[42] = Number.NaN;
    expect(() => welchPsd(x, 100)).toThrow(/samples\[42\]/);
  });
  it('rejects a bad sample rate, overlap or segment length with the value', () => {
    const x = noise(100, 1);
    expect(() => welchPsd(x, 0)).toThrow(/sampleRateHz must be a finite number > 0, got 0/);
    expect(() => welchPsd(x, 100, { overlap: 1 })).toThrow(/overlap/);
    expect(() => welchPsd(x, 100, { segmentLength: 500 })).toThrow(/segmentLength/);
    expect(() => welchCrossSpectrum(x, x.slice(1), 100)).toThrow(/same length/);
  });
});
