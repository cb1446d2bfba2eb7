// analyseAmbientRecord, the whole phone-record pipeline, on three-axis synthetic records with
// a known answer (the SDOF simulator of vibration-synthetic.ts): which axis, which plan
// direction, both axes and their coherence, two modes, the vertical check, the stiffness
// indicator (k/k_ref = (f/f_ref)², Chopra, Dynamics of Structures, ch. 2), and records that
// must not give a frequency.
import { describe, expect, it } from 'vitest';
import { analyseAmbientRecord } from '../../calc/index.js';
import { inputStdFor, PHONE, phoneRecord, sdofResponse } from './vibration-synthetic.js';

const SIM = 500;
const mode = (f: number, zeta: number, seed: number, durationS = 120, ratio = 1) =>
  sdofResponse({
    frequencyHz: f,
    dampingRatio: zeta,
    simulationRateHz: SIM,
    durationS,
    inputStd: inputStdFor(ratio, SIM),
    seed,
  });

describe('analyseAmbientRecord directions and axes', () => {
  it('finds a mode along the phone’s long edge and maps it to the plan direction noted', () => {
    const rec = phoneRecord(
      { x: null, y: mode(4.2, 0.03, 1), simulationRateHz: SIM, durationS: 120 },
      { ...PHONE, seed: 2 },
    );
    const a = analyseAmbientRecord({ ...rec, longEdgeAlong: 'x', referenceFrequencyHz: 4.5 });
    expect(a.status).toBe('estimate');
    expect(a.estimate!.axis).toBe('y');
    expect(a.measured!.direction).toBe('x');
    expect(Math.abs(a.measured!.frequencyHz - 4.2) / 4.2).toBeLessThan(0.02);
    expect(a.measured!.dampingRatio).not.toBeNull();
    expect(a.stiffness!.stiffnessRatio).toBeCloseTo((a.measured!.frequencyHz / 4.5) ** 2, 12);
    expect(Math.abs(a.stiffness!.stiffnessRatio - (4.2 / 4.5) ** 2)).toBeLessThan(0.04);
    expect(a.caveats).toContain('phone-noise');
    expect(a.sampleRateHz).toBeGreaterThan(99);
    expect(a.spectrum!.frequenciesHz.length).toBeLessThanOrEqual(200);
  });

  it('maps a mode across the phone to the other plan direction', () => {
    const rec = phoneRecord(
      { x: mode(6.1, 0.02, 3), y: null, simulationRateHz: SIM, durationS: 90 },
      { ...PHONE, seed: 4 },
    );
    const a = analyseAmbientRecord({ ...rec, longEdgeAlong: 'x' });
    expect(a.estimate!.axis).toBe('x');
    expect(a.measured!.direction).toBe('y');
  });

  it('sees a diagonal mode on both axes, coherent, with no single direction', () => {
    const m = mode(3.3, 0.025, 5);
    const half = m.map((v) => v * Math.SQRT1_2);
    const rec = phoneRecord(
      { x: half, y: half, simulationRateHz: SIM, durationS: 120 },
      { ...PHONE, seed: 6 },
    );
    const a = analyseAmbientRecord({ ...rec, longEdgeAlong: 'y' });
    expect(a.caveats).toContain('both-axes');
    expect(a.estimate!.axis).toBe('both');
    expect(a.measured!.direction).toBeNull();
    expect(a.estimate!.crossAxisCoherence!).toBeGreaterThan(0.5);
    expect(Math.abs(a.measured!.frequencyHz - 3.3) / 3.3).toBeLessThan(0.02);
    // Two coherent looks at one motion add their evidence (1 − (1 − c_x)(1 − c_y)).
    const cx = a.axes.x!.estimate!.confidence;
    const cy = a.axes.y!.estimate!.confidence;
    expect(a.measured!.confidence).toBeCloseTo(1 - (1 - cx) * (1 - cy), 12);
  });

  it('reports two modes, the lower as the fundamental and the other as secondary', () => {
    const rec = phoneRecord(
      { x: mode(2.9, 0.03, 7), y: mode(4.6, 0.03, 8), simulationRateHz: SIM, durationS: 120 },
      { ...PHONE, seed: 9 },
    );
    const a = analyseAmbientRecord({ ...rec, longEdgeAlong: 'x' });
    expect(a.caveats).toContain('two-modes');
    expect(Math.abs(a.measured!.frequencyHz - 2.9) / 2.9).toBeLessThan(0.02);
    expect(a.measured!.direction).toBe('y');
    expect(Math.abs(a.secondary!.frequencyHz - 4.6) / 4.6).toBeLessThan(0.02);
    expect(a.secondary!.direction).toBe('x');
  });

  it('warns and halves the confidence when the same peak is as strong vertically', () => {
    const m = mode(8, 0.02, 10);
    const rec = phoneRecord(
      { x: null, y: m, simulationRateHz: SIM, durationS: 90 },
      { ...PHONE, seed: 11 },
    );
    const plain = analyseAmbientRecord(rec);
    const z = rec.z.map((v, i) => v + 2 * (m[Math.round((rec.timesS[i]! - 1000) * SIM)] ?? 0));
    const a = analyseAmbientRecord({ ...rec, z });
    expect(a.caveats).toContain('vertical-dominant');
    expect(a.measured!.confidence).toBeCloseTo(plain.measured!.confidence / 2, 1);
  });
});

describe('analyseAmbientRecord records that must not give a frequency', () => {
  it('gives no-clear-peak, and no measured frequency, for sensor noise alone', () => {
    const rec = phoneRecord(
      { x: null, y: null, simulationRateHz: SIM, durationS: 120 },
      { ...PHONE, seed: 12 },
    );
    const a = analyseAmbientRecord(rec);
    expect(a.status).toBe('no-clear-peak');
    expect(a.measured).toBeNull();
  });
  it('gives below-resolution for faint motion behind 0.1 m/s² browser rounding, and says why', () => {
    const rec = phoneRecord(
      { x: null, y: mode(4, 0.02, 13), simulationRateHz: SIM, durationS: 90 },
      { ...PHONE, stepMps2: 0.1, seed: 14 },
      { x: 0.05, y: 0.05, z: 9.8 },
    );
    const a = analyseAmbientRecord(rec);
    expect(a.status).toBe('below-resolution');
    expect(a.caveats).toContain('browser-rounding');
    expect(a.measured).toBeNull();
  });
  it('gives no-signal when the readings never change', () => {
    const n = 6000;
    const a = analyseAmbientRecord({
      timesS: Array.from({ length: n }, (_, i) => i / 100),
      x: new Array(n).fill(0),
      y: new Array(n).fill(0.1),
      z: new Array(n).fill(9.8),
    });
    expect(a.status).toBe('no-signal');
  });
});

describe('analyseAmbientRecord bad input', () => {
  const rec = phoneRecord(
    { x: null, y: mode(5, 0.03, 15, 70), simulationRateHz: SIM, durationS: 70 },
    { ...PHONE, seed: 16 },
  );
  it('does not crash on empty arrays: too-short', () => {
    expect(analyseAmbientRecord({ timesS: [], x: [], y: [], z: [] }).status).toBe('too-short');
  });
  it('does not crash on missing arrays (not array-like): too-short', () => {
    const input = { timesS: null, x: undefined, y: 3, z: 'x' } as unknown as Parameters<
      typeof analyseAmbientRecord
    >[0];
    expect(analyseAmbientRecord(input).status).toBe('too-short');
  });
  it('does not crash on NaN samples: drops them, says so, still finds the mode', () => {
    const y = [...rec.y];
    for (let i = 0; i < y.length; i += 97) y[i] = Number.NaN;
    const a = analyseAmbientRecord({ ...rec, y });
    expect(a.caveats).toContain('dropped-samples');
    expect(a.resample.droppedNonFinite).toBeGreaterThan(50);
    expect(Math.abs(a.measured!.frequencyHz - 5) / 5).toBeLessThan(0.02);
  });
  it('does not crash on non-monotonic timestamps: sorts them, says so, still finds the mode', () => {
    const order = rec.timesS.map((_, i) => i);
    for (let i = 10; i + 1 < order.length; i += 50)
      [order[i], order[i + 1]] = [order[i + 1]!, order[i]!];
    const pick = (a: number[]) => order.map((i) => a[i]!);
    const a = analyseAmbientRecord({
      timesS: pick(rec.timesS),
      x: pick(rec.x),
      y: pick(rec.y),
      z: pick(rec.z),
    });
    expect(a.resample.reordered).toBe(true);
    expect(a.caveats).toContain('reordered');
    expect(Math.abs(a.measured!.frequencyHz - 5) / 5).toBeLessThan(0.02);
  });
  it('does not crash on a too short record (10 s): too-short', () => {
    const n = 1000;
    expect(
      analyseAmbientRecord({
        timesS: rec.timesS.slice(0, n),
        x: rec.x.slice(0, n),
        y: rec.y.slice(0, n),
        z: rec.z.slice(0, n),
      }).status,
    ).toBe('too-short');
  });
  it('does not crash on a record with a gap: keeps the longest stretch and says so', () => {
    const timesS = rec.timesS.map((t, i) => (i > 1000 ? t + 30 : t));
    const a = analyseAmbientRecord({ ...rec, timesS });
    expect(a.caveats).toContain('gaps');
    expect(a.durationS).toBeGreaterThan(55);
  });
  it('does not crash on a 5 Hz sample rate: rate-too-low', () => {
    const n = 600;
    const a = analyseAmbientRecord({
      timesS: Array.from({ length: n }, (_, i) => i / 5),
      x: Array.from({ length: n }, (_, i) => Math.sin(i)),
      y: Array.from({ length: n }, (_, i) => Math.cos(i)),
      z: new Array(n).fill(9.8),
    });
    expect(a.status).toBe('rate-too-low');
  });
  it('cuts channels of unequal length to the shortest and says so', () => {
    const a = analyseAmbientRecord({ ...rec, z: rec.z.slice(0, rec.z.length - 10) });
    expect(a.caveats).toContain('dropped-samples');
    expect(a.status).toBe('estimate');
  });
  it('rejects a bad option with the value', () => {
    expect(() => analyseAmbientRecord({ ...rec, referenceFrequencyHz: -1 })).toThrow(
      /referenceFrequencyHz/,
    );
    expect(() => analyseAmbientRecord({ ...rec, longEdgeAlong: 'z' as 'x' })).toThrow(
      /longEdgeAlong/,
    );
  });
});
