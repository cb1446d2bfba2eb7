/**
 * Vibration benchmark: `npx tsx test/bench/vibration.bench.ts`.
 *
 * 1. identifyFundamental on one 120 s, 100 Hz record (12,000 samples of a seeded SDOF
 *    response with phone-like noise): median time per call.
 * 2. analyseAmbientRecord on the same record with three axes (what the worker runs).
 * 3. Side by side in the same run, the FFTs inside (1): our real FFT against fft.js 4.0.4
 *    (npm, radix-4) on the Welch segments (10 × 4096-point real transforms), and our exact
 *    12,000-point transform (Bluestein) against fft.js on 16,384 points (the nearest power of
 *    two fft.js accepts; not the same numbers, the same job). Ratios > 1 mean we are slower.
 */
import FFT from 'fft.js';
import {
  analyseAmbientRecord,
  identifyFundamental,
  realFft,
  realFftPlan,
  resampleToUniform,
} from '../../calc/index.js';
import { inputStdFor, PHONE, phoneRecord, sdofResponse } from '../reference/vibration-synthetic.js';

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[s.length >> 1] as number;
}

/** Median ms per call of `f` over `runs` runs after `warm` warm-up calls. */
function time(f: () => unknown, runs: number, warm = 3): number {
  for (let i = 0; i < warm; i++) f();
  const out: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    f();
    out.push(performance.now() - t0);
  }
  return median(out);
}

const SIM = 500;
const DURATION = 120;
const y = sdofResponse({
  frequencyHz: 3.7,
  dampingRatio: 0.03,
  simulationRateHz: SIM,
  durationS: DURATION,
  inputStd: inputStdFor(1, SIM),
  seed: 2026,
});
const rec = phoneRecord(
  { x: null, y, simulationRateHz: SIM, durationS: DURATION },
  { ...PHONE, seed: 7 },
);
const { record } = resampleToUniform(rec.timesS, [rec.y]);
if (!record) throw new Error('resampling failed');
const samples = record.channels[0] as Float64Array;
const fs = record.rateHz;

const estimate = identifyFundamental(samples, fs);
console.log(
  `record: ${samples.length} samples at ${fs.toFixed(2)} Hz; identified ${estimate?.frequencyHz.toFixed(3)} Hz ` +
    `(true 3.700), damping ${estimate?.dampingRatio === null || !estimate ? '–' : (100 * estimate.dampingRatio).toFixed(2)} % (true 3.00)`,
);

const tIdentify = time(() => identifyFundamental(samples, fs), 15);
const tAmbient = time(() => analyseAmbientRecord(rec), 5, 1);
console.log(`identifyFundamental, 120 s at 100 Hz: median ${tIdentify.toFixed(1)} ms`);
console.log(`analyseAmbientRecord, 3 axes + coherence: median ${tAmbient.toFixed(1)} ms`);

// The Welch FFTs: 10 segments of 2048 samples, zero-padded to 4096, real input.
const N = 4096;
const segs = Array.from({ length: 10 }, (_, s) => {
  const a = new Float64Array(N);
  for (let i = 0; i < 2048; i++) a[i] = samples[s * 1024 + i] as number;
  return a;
});
const plan = realFftPlan(N);
const re = new Float64Array(plan.bins);
const im = new Float64Array(plan.bins);
const ours = time(
  () => {
    for (const s of segs) plan.forward(s, re, im);
  },
  200,
  20,
);
const ref = new FFT(N);
const out = ref.createComplexArray() as number[];
const segArrays = segs.map((s) => Array.from(s));
const theirs = time(
  () => {
    for (const s of segArrays) ref.realTransform(out, s);
  },
  200,
  20,
);
console.log(
  `Welch FFTs (10 × 4096 real): ours ${(ours * 1000).toFixed(0)} µs, fft.js ${(theirs * 1000).toFixed(0)} µs, ratio ${(ours / theirs).toFixed(2)}`,
);

// The full-record transform of the likelihood fit.
const oursFull = time(() => realFft(samples), 30, 3);
const M = 16_384;
const big = new FFT(M);
const bigOut = big.createComplexArray() as number[];
const padded = new Array<number>(M).fill(0);
for (let i = 0; i < samples.length; i++) padded[i] = samples[i] as number;
const theirsFull = time(() => big.realTransform(bigOut, padded), 30, 3);
console.log(
  `Full record: ours exact 12,000 points (Bluestein) ${oursFull.toFixed(2)} ms, fft.js 16,384 points ${theirsFull.toFixed(2)} ms, ratio ${(oursFull / theirsFull).toFixed(2)}`,
);
console.log(
  `FFT share of identifyFundamental: ${(((ours + oursFull) / tIdentify) * 100).toFixed(1)} % (the rest: peak search and the SDOF fit)`,
);
