// The FFT in calc/vibration against two independent references:
// - fft.js 4.0.4 (npm, radix-4, general-purpose) for power-of-two lengths, complex and real input;
// - the DFT's definition X[k] = Σ x[n]·e^(−2πikn/N), summed directly in this file, for the
//   lengths fft.js cannot do (Bluestein's algorithm in calc).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import FFT from 'fft.js';
import { fft, inverseFft, realFft } from '../../calc/index.js';
import { mulberry32 } from '../bench/prng.js';

function randomSeries(n: number, seed: number): number[] {
  const rand = mulberry32(seed);
  return Array.from({ length: n }, () => 2 * rand() - 1);
}

/** The DFT by its definition, O(N²), angles reduced exactly (k·n mod N). */
function naiveDft(re: number[], im: number[]): { re: number[]; im: number[] } {
  const n = re.length;
  const outRe: number[] = [];
  const outIm: number[] = [];
  for (let k = 0; k < n; k++) {
    let sr = 0;
    let si = 0;
    for (let j = 0; j < n; j++) {
      const a = (-2 * Math.PI * ((k * j) % n)) / n;
      sr += re[j]! * Math.cos(a) - im[j]! * Math.sin(a);
      si += re[j]! * Math.sin(a) + im[j]! * Math.cos(a);
    }
    outRe.push(sr);
    outIm.push(si);
  }
  return { re: outRe, im: outIm };
}

function maxAbsDiff(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < a.length; i++) m = Math.max(m, Math.abs(a[i]! - b[i]!));
  return m;
}

describe('FFT against fft.js (power-of-two lengths)', () => {
  for (const n of [2, 4, 8, 64, 1024, 4096]) {
    it(`matches fft.js's complex transform at N = ${n} to 1e-12 relative`, () => {
      const re = randomSeries(n, n);
      const im = randomSeries(n, n + 1);
      const ref = new FFT(n);
      const input = ref.createComplexArray() as number[];
      for (let i = 0; i < n; i++) {
        input[2 * i] = re[i]!;
        input[2 * i + 1] = im[i]!;
      }
      const out = ref.createComplexArray() as number[];
      ref.transform(out, input);
      const mine = fft(re, im);
      const scale = Math.sqrt(n);
      for (let k = 0; k < n; k++) {
        expect(Math.abs(mine.re[k]! - out[2 * k]!)).toBeLessThan(1e-12 * scale * 10);
        expect(Math.abs(mine.im[k]! - out[2 * k + 1]!)).toBeLessThan(1e-12 * scale * 10);
      }
    });
    it(`matches fft.js's realTransform at N = ${n} on bins 0..N/2`, () => {
      const x = randomSeries(n, 7 * n);
      const ref = new FFT(n);
      const out = ref.createComplexArray() as number[];
      ref.realTransform(out, x);
      ref.completeSpectrum(out);
      const mine = realFft(x);
      expect(mine.re.length).toBe(n / 2 + 1);
      for (let k = 0; k <= n / 2; k++) {
        expect(Math.abs(mine.re[k]! - out[2 * k]!)).toBeLessThan(1e-11);
        expect(Math.abs(mine.im[k]! - out[2 * k + 1]!)).toBeLessThan(1e-11);
      }
    });
  }
});

describe('FFT of other lengths (Bluestein) against the DFT definition', () => {
  for (const n of [1, 3, 5, 7, 12, 100, 257, 1000]) {
    it(`matches the directly summed DFT at N = ${n}`, () => {
      const re = randomSeries(n, 3 * n);
      const im = randomSeries(n, 5 * n);
      const ref = naiveDft(re, im);
      const mine = fft(re, im);
      expect(maxAbsDiff(mine.re, ref.re)).toBeLessThan(1e-10 * Math.max(1, n));
      expect(maxAbsDiff(mine.im, ref.im)).toBeLessThan(1e-10 * Math.max(1, n));
    });
  }
  it('transforms real input of odd and even non-power-of-two length like the complex path', () => {
    for (const n of [9, 12000 / 8, 1001]) {
      const x = randomSeries(n, n);
      const full = fft(x);
      const half = realFft(x);
      expect(half.re.length).toBe(Math.floor(n / 2) + 1);
      expect(maxAbsDiff(half.re, full.re.subarray(0, half.re.length))).toBeLessThan(1e-9);
      expect(maxAbsDiff(half.im, full.im.subarray(0, half.im.length))).toBeLessThan(1e-9);
    }
  });
  it('zero-pads real input to the requested length', () => {
    const x = randomSeries(100, 1);
    const padded = [...x, ...new Array<number>(28).fill(0)];
    const a = realFft(x, 128);
    const b = realFft(padded);
    expect(maxAbsDiff(a.re, b.re)).toBeLessThan(1e-12);
    expect(maxAbsDiff(a.im, b.im)).toBeLessThan(1e-12);
  });
});

describe('FFT properties (fast-check)', () => {
  it('inverse(forward(x)) returns x for any length up to 300', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 1, maxLength: 300 }),
        (xs) => {
          const f = fft(xs);
          const back = inverseFft(f.re, f.im);
          return (
            maxAbsDiff(back.re, xs) < 1e-9 * 1e3 &&
            maxAbsDiff(back.im, new Array(xs.length).fill(0)) < 1e-9 * 1e3
          );
        },
      ),
      { numRuns: 60 },
    );
  });
  it("keeps Parseval's identity Σ|x|² = Σ|X|²/N", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -10, max: 10, noNaN: true }), { minLength: 1, maxLength: 500 }),
        (xs) => {
          const f = fft(xs);
          const energy = xs.reduce((s, v) => s + v * v, 0);
          let spectral = 0;
          for (let k = 0; k < xs.length; k++) spectral += f.re[k]! ** 2 + f.im[k]! ** 2;
          spectral /= xs.length;
          return Math.abs(energy - spectral) <= 1e-9 * Math.max(1, energy);
        },
      ),
      { numRuns: 60 },
    );
  });
  it('puts a unit cosine at bin k into bins k and N − k with height N/2', () => {
    const n = 90; // not a power of two
    const k = 7;
    const x = Array.from({ length: n }, (_, i) => Math.cos((2 * Math.PI * k * i) / n));
    const f = fft(x);
    expect(f.re[k]).toBeCloseTo(n / 2, 9);
    expect(f.re[n - k]).toBeCloseTo(n / 2, 9);
    expect(Math.abs(f.re[k + 1]!)).toBeLessThan(1e-9);
  });
});

describe('FFT bad input', () => {
  it('does not crash on an empty array: throws a RangeError naming the length', () => {
    expect(() => fft([])).toThrow(RangeError);
    expect(() => fft([])).toThrow(/re\.length/);
  });
  it('does not crash on NaN: throws a RangeError naming the index', () => {
    expect(() => fft([1, Number.NaN, 3])).toThrow(/re\[1\] must be a finite number, got NaN/);
    expect(() => realFft([1, 2, Infinity])).toThrow(/input\[2\]/);
  });
  it('rejects an imaginary part of another length', () => {
    expect(() => fft([1, 2, 3], [1, 2])).toThrow(/im must have length 3, got 2/);
  });
  it('rejects a padding length shorter than the input', () => {
    expect(() => realFft([1, 2, 3, 4], 2)).toThrow(RangeError);
  });
});
