// identifyFundamental against records whose answer is known: a damped single-degree-of-
// freedom oscillator (frequency 0.8–12 Hz, damping 1–10 %) driven at its base by seeded white
// noise, read by a phone-like sensor (150 µg/√Hz white noise, drift, 16-bit rounding, ±2 ms
// timestamp jitter, 1 % lost events), resampled by calc. The simulator steps the exact
// discrete-time solution (test/reference/vibration-synthetic.ts), so the true frequency and
// damping are the simulator's inputs.
//
// What "within 2 %" can mean is bounded by the record itself: a 120 s record of a resonance
// with damping ζ at frequency f pins f down only to a coefficient of variation of about
// √(ζ/(2π·f·T)) ("uncertainty law" of ambient modal identification, Au 2014, Mech. Syst.
// Signal Process. 48:15–33; from memory, verify). At 0.8 Hz and 10 % that is 1.3 % even with
// no sensor noise, so at that corner no method can promise 2 % on every record. The checks
// below say which region is held to 2 % on every record, and hold the corner to its own
// standard errors instead.
import { beforeAll, describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  analyseFundamental,
  identifyFundamental,
  quantizationStep,
  resampleToUniform,
} from '../../calc/index.js';
import type { FundamentalEstimate } from '../../calc/index.js';
import {
  inputStdFor,
  mulberry32,
  PHONE,
  phoneRecord,
  sdofResponse,
  type PhoneSensorOptions,
} from './vibration-synthetic.js';

const SIM_RATE = 500; // Hz; 40× the highest frequency tested

interface Case {
  f: number;
  zeta: number;
  durationS: number;
  law: number; // √(ζ/(2πfT)), Au 2014
  estimate: FundamentalEstimate | null;
}

function runCase(
  f: number,
  zeta: number,
  durationS: number,
  seed: number,
  ratio = 1,
  sensor: Omit<PhoneSensorOptions, 'seed'> = PHONE,
): FundamentalEstimate | null {
  const response = sdofResponse({
    frequencyHz: f,
    dampingRatio: zeta,
    simulationRateHz: SIM_RATE,
    durationS,
    inputStd: inputStdFor(ratio, SIM_RATE, sensor),
    seed,
  });
  const rec = phoneRecord(
    { x: null, y: response, simulationRateHz: SIM_RATE, durationS },
    { ...sensor, seed: seed + 77 },
  );
  const { record } = resampleToUniform(rec.timesS, [rec.y]);
  if (!record) throw new Error('resampling failed');
  return identifyFundamental(record.channels[0]!, record.rateHz);
}

function seededGrid(count: number, seed: number, durationS: number): Case[] {
  const rand = mulberry32(seed);
  const cases: Case[] = [];
  for (let c = 0; c < count; c++) {
    const f = 0.8 * 15 ** rand(); // log-uniform 0.8–12 Hz
    const zeta = 0.01 + 0.09 * rand(); // uniform 1–10 %
    cases.push({
      f,
      zeta,
      durationS,
      law: Math.sqrt(zeta / (2 * Math.PI * f * durationS)),
      estimate: runCase(f, zeta, durationS, seed * 1000 + c),
    });
  }
  return cases;
}

const relError = (c: Case) => ((c.estimate?.frequencyHz ?? NaN) - c.f) / c.f;
const describeCase = (c: Case) =>
  `f = ${c.f.toFixed(3)} Hz, ζ = ${(100 * c.zeta).toFixed(1)} %, T = ${c.durationS} s: ` +
  `got ${c.estimate?.frequencyHz.toFixed(3)} Hz (${(100 * relError(c)).toFixed(2)} %)`;

describe('identifyFundamental recovers a damped SDOF under phone-like noise (120 s records)', () => {
  let cases: Case[] = [];
  beforeAll(() => {
    cases = seededGrid(64, 9, 120);
  }, 300_000);

  it('finds a peak in every record (none is null)', () => {
    for (const c of cases) expect(c.estimate, describeCase(c)).not.toBeNull();
  });

  it('recovers the frequency within 2 % on every record where the uncertainty law is ≤ 0.55 %', () => {
    const held = cases.filter((c) => c.law <= 0.0055);
    expect(held.length).toBeGreaterThan(40);
    for (const c of held) expect(Math.abs(relError(c)), describeCase(c)).toBeLessThanOrEqual(0.02);
  });

  it('recovers at least 90 % of all records within 2 %, and every record within 3.5 %', () => {
    const within = cases.filter((c) => Math.abs(relError(c)) <= 0.02).length;
    expect(within / cases.length).toBeGreaterThanOrEqual(0.9);
    for (const c of cases)
      expect(Math.abs(relError(c)), describeCase(c)).toBeLessThanOrEqual(0.035);
  });

  it('reports a standard error that covers the true error (|error| ≤ 3 standard errors, median ratio near 0.67)', () => {
    const ratios: number[] = [];
    for (const c of cases) {
      const u = c.estimate?.frequencyUncertaintyHz;
      expect(u, describeCase(c)).toBeGreaterThan(0);
      const r = Math.abs((c.estimate?.frequencyHz ?? 0) - c.f) / (u as number);
      expect(r, describeCase(c)).toBeLessThanOrEqual(3);
      ratios.push(r);
    }
    ratios.sort((a, b) => a - b);
    // The median of |z| for a normal error is 0.674 (standard normal quantile, any table).
    const median = ratios[ratios.length >> 1]!;
    expect(median).toBeGreaterThan(0.4);
    expect(median).toBeLessThan(1.0);
  });

  it('recovers the half-power damping within ±40 % on 80 % of records (median error ≤ 20 %)', () => {
    const errors = cases
      .filter((c) => c.estimate?.dampingRatio != null)
      .map((c) => Math.abs((c.estimate!.dampingRatio as number) - c.zeta) / c.zeta)
      .sort((a, b) => a - b);
    expect(errors.length).toBeGreaterThanOrEqual(0.9 * cases.length);
    expect(errors[errors.length >> 1]!).toBeLessThanOrEqual(0.2);
    expect(errors.filter((e) => e <= 0.4).length / errors.length).toBeGreaterThanOrEqual(0.8);
  });

  it('gives a confidence in 0..1, higher for light than for heavy damping (taller peaks)', () => {
    const light = cases.filter((c) => c.zeta < 0.03).map((c) => c.estimate!.confidence);
    const heavy = cases.filter((c) => c.zeta > 0.08).map((c) => c.estimate!.confidence);
    for (const c of cases) {
      expect(c.estimate!.confidence).toBeGreaterThanOrEqual(0);
      expect(c.estimate!.confidence).toBeLessThanOrEqual(1);
    }
    const mean = (xs: number[]) => xs.reduce((s, v) => s + v, 0) / xs.length;
    expect(mean(light)).toBeGreaterThan(mean(heavy));
  });
});

describe('identifyFundamental on 60 s records (the recorder’s shortest)', () => {
  it('recovers 2–12 Hz at 1–5 % damping within 2 % on every record', () => {
    const rand = mulberry32(61);
    for (let c = 0; c < 16; c++) {
      const f = 2 * 6 ** rand();
      const zeta = 0.01 + 0.04 * rand();
      const e = runCase(f, zeta, 60, 61_000 + c);
      expect(e, `f = ${f}, ζ = ${zeta}`).not.toBeNull();
      expect(Math.abs(e!.frequencyHz - f) / f, `f = ${f}, ζ = ${zeta}`).toBeLessThanOrEqual(0.02);
    }
  }, 120_000);
});

describe('identifyFundamental returns null on noise alone', () => {
  it('gives null for 150 seeded sensor-noise records (white, drifting, rounded; 60–120 s; 60 and 100 Hz)', () => {
    for (let c = 0; c < 150; c++) {
      const durationS = [60, 90, 120][c % 3]!;
      const sensor = {
        ...PHONE,
        rateHz: c % 5 === 0 ? 60 : 100,
        driftStd: [0.003, 0.01, 0.03][(c % 7) % 3]!,
        stepMps2: c % 13 === 0 ? 0.1 : c % 4 === 0 ? 0 : 0.0012,
        seed: 555_000 + c,
      };
      const rec = phoneRecord({ x: null, y: null, simulationRateHz: SIM_RATE, durationS }, sensor);
      // The rounding step is read from the raw readings (resampling hides the lattice), as
      // analyseAmbientRecord does.
      const { record } = resampleToUniform(rec.timesS, [rec.y]);
      const a = analyseFundamental(record!.channels[0]!, record!.rateHz, {
        quantizationStep: quantizationStep(rec.y),
      });
      expect(a.estimate, `record ${c}: ${JSON.stringify(a.candidates)}`).toBeNull();
      expect(['no-clear-peak', 'below-resolution', 'no-signal']).toContain(a.reason);
    }
  }, 180_000);

  it('says "below-resolution" for a still phone behind a browser that rounds to 0.1 m/s²', () => {
    // The reading sits halfway between two rounding levels, so it flickers between them.
    const rec = phoneRecord(
      { x: null, y: null, simulationRateHz: SIM_RATE, durationS: 90 },
      { ...PHONE, stepMps2: 0.1, seed: 4 },
      { x: 0, y: 0.05, z: 9.81 },
    );
    expect(analyseFundamental(rec.y, 100).reason).toBe('below-resolution');
  });

  it('still finds strong shaking (about 0.25 m/s² RMS) through 0.1 m/s² rounding, within 2 %', () => {
    const sensor = { ...PHONE, stepMps2: 0.1 };
    const e = runCase(3.4, 0.03, 120, 808, 300, sensor);
    expect(e).not.toBeNull();
    expect(Math.abs(e!.frequencyHz - 3.4) / 3.4).toBeLessThanOrEqual(0.02);
  });
});

describe('identifyFundamental bad input', () => {
  it('does not crash on an empty record: null, reason too-short', () => {
    expect(identifyFundamental([], 100)).toBeNull();
    expect(analyseFundamental([], 100).reason).toBe('too-short');
  });
  it('does not crash on a too short record (0.5 s): null', () => {
    const x = Array.from({ length: 50 }, (_, i) => Math.sin(i));
    expect(identifyFundamental(x, 100)).toBeNull();
  });
  it('does not crash on a record too short for the band (10 s): null or an estimate, never NaN', () => {
    const x = Array.from({ length: 1000 }, (_, i) => Math.sin((2 * Math.PI * 5 * i) / 100));
    const e = identifyFundamental(x, 100);
    if (e) expect(Number.isFinite(e.frequencyHz)).toBe(true);
  });
  it('does not crash on a silent record: null, reason no-signal', () => {
    expect(analyseFundamental(new Array(6000).fill(9.81), 100).reason).toBe('no-signal');
  });
  it('does not crash on NaN: throws a RangeError naming the index', () => {
    const x = new Array(6000).fill(0).map((_, i) => Math.sin(i / 3));
    x[123] = Number.NaN;
    expect(() => identifyFundamental(x, 100)).toThrow(
      /samples\[123\] must be a finite number, got NaN/,
    );
  });
  it('rejects a bad sample rate or band with the value', () => {
    expect(() => identifyFundamental([1, 2, 3], -5)).toThrow(
      /sampleRateHz must be a finite number > 0, got -5/,
    );
    expect(() => identifyFundamental([1, 2, 3], 100, { bandHz: [5, 2] })).toThrow(/increasing/);
  });
  it('never returns NaN or a frequency outside the band, whatever finite samples it gets (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -50, max: 50, noNaN: true }), { minLength: 0, maxLength: 3000 }),
        fc.constantFrom(20, 60, 100),
        (xs, fs) => {
          const a = analyseFundamental(xs, fs);
          if (a.estimate === null) return a.reason !== null;
          const e = a.estimate;
          const [lo, hi] = a.bandHz!;
          return (
            e.frequencyHz >= lo * 0.99 &&
            e.frequencyHz <= hi * 1.01 &&
            Number.isFinite(e.confidence) &&
            (e.dampingRatio === null || Number.isFinite(e.dampingRatio))
          );
        },
      ),
      { numRuns: 40 },
    );
  });
});
