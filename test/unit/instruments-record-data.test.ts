// Stored instrument recordings: the compact encoding of forms/instruments round-trips within
// its stated resolution (0.01 ms, 0.1 mm/s²), entries built by web/instruments pass their own
// schema and the survey record's schema (forms/schema, the storage engineer's), and the draft
// adapters put results where the screening reads them.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analyseAmbientRecord, CALC_VERSION } from '../../calc/index.js';
import { emptySurvey, surveyRecordSchema } from '../../forms/index.js';
import {
  ACCEL_UNIT_MPS2,
  decodeSamples,
  encodeSamples,
  parseInstrumentData,
  TIME_UNIT_MS,
} from '../../forms/instruments/index.js';
import { tiltEntry, vibrationEntry } from '../../web/instruments/instrument-entries.js';
import {
  withPhoneTilt,
  withVibration,
  expectedPeriodFor,
} from '../../web/instruments/survey-adapters.js';
import type { TiltOutcome } from '../../web/instruments/tilt-session.js';
import { inputStdFor, PHONE, phoneRecord, sdofResponse } from '../reference/vibration-synthetic.js';

function aRecording(seconds = 120) {
  const y = sdofResponse({
    frequencyHz: 4,
    dampingRatio: 0.03,
    simulationRateHz: 500,
    durationS: seconds,
    inputStd: inputStdFor(1, 500),
    seed: 1,
  });
  const rec = phoneRecord(
    { x: null, y, simulationRateHz: 500, durationS: seconds },
    { ...PHONE, seed: 2 },
  );
  return { rec, raw: { timesMs: rec.timesS.map((t) => t * 1000), x: rec.x, y: rec.y, z: rec.z } };
}

function aTiltOutcome(): TiltOutcome {
  const raw = {
    timesMs: Float64Array.from({ length: 200 }, (_, i) => 5000 + i * 10),
    x: new Float64Array(200).fill(0.05),
    y: new Float64Array(200).fill(9.8),
    z: new Float64Array(200).fill(0.1),
  };
  const position = {
    angleRad: 0.005,
    uncertaintyRad: 0.0003,
    meanMps2: { x: 0.05, y: 9.8, z: 0.1 },
    stdMps2: { x: 0, y: 0, z: 0 },
    magnitudeMps2: 9.8,
    sampleCount: 200,
    quantizationStepMps2: null,
    ok: true,
    still: true,
    upright: true,
    magnitudePlausible: true,
    enoughSamples: true,
  };
  return {
    reversal: { tiltRad: 0.004, offsetRad: 0.001, uncertaintyRad: 0.0002, offsetPlausible: true },
    driftRatio: Math.tan(0.004),
    driftUncertainty: 0.0002,
    positions: [
      { position, raw },
      { position: { ...position, angleRad: -0.003 }, raw },
    ],
  };
}

describe('sample encoding', () => {
  it('round-trips times within 0.005 ms and accelerations within 0.05 mm/s², including disorder', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.record({
            t: fc.double({ min: 0, max: 2e5, noNaN: true }),
            x: fc.double({ min: -80, max: 80, noNaN: true }),
            y: fc.double({ min: -80, max: 80, noNaN: true }),
            z: fc.double({ min: -80, max: 80, noNaN: true }),
          }),
          { minLength: 1, maxLength: 300 },
        ),
        (samples) => {
          const raw = {
            timesMs: samples.map((s) => s.t),
            x: samples.map((s) => s.x),
            y: samples.map((s) => s.y),
            z: samples.map((s) => s.z),
          };
          const back = decodeSamples(encodeSamples(raw));
          const t0 = raw.timesMs[0]!;
          return samples.every(
            (s, i) =>
              Math.abs(back.timesS[i]! * 1000 - (s.t - t0)) <= TIME_UNIT_MS / 2 + 1e-9 &&
              Math.abs(back.x[i]! - s.x) <= ACCEL_UNIT_MPS2 / 2 + 1e-9 &&
              Math.abs(back.y[i]! - s.y) <= ACCEL_UNIT_MPS2 / 2 + 1e-9 &&
              Math.abs(back.z[i]! - s.z) <= ACCEL_UNIT_MPS2 / 2 + 1e-9,
          );
        },
      ),
      { numRuns: 80 },
    );
  });
  it('does not crash on empty, unequal or NaN input: throws a RangeError naming it', () => {
    expect(() => encodeSamples({ timesMs: [], x: [], y: [], z: [] })).toThrow(
      /at least one sample/,
    );
    expect(() => encodeSamples({ timesMs: [1, 2], x: [1], y: [1, 2], z: [1, 2] })).toThrow(
      /x must have 2/,
    );
    expect(() =>
      encodeSamples({ timesMs: [1, 2], x: [1, Number.NaN], y: [1, 2], z: [1, 2] }),
    ).toThrow(/x\[1\]/);
  });
});

describe('vibration entries', () => {
  it('stores a two-minute 100 Hz record in under 260 kB of JSON that passes its schema', () => {
    const { rec, raw } = aRecording();
    const analysis = analyseAmbientRecord(rec);
    const entry = vibrationEntry(raw, analysis, {
      longEdgeAlong: 'x',
      storey: 2,
      expectedPeriodS: 0.25,
      reportedIntervalMs: 10,
    });
    expect(entry.kind).toBe('vibration');
    const json = JSON.stringify(entry);
    expect(json.length).toBeLessThan(260_000);
    const parsed = parseInstrumentData('vibration', JSON.parse(json).data);
    expect(parsed.success).toBe(true);
    if (entry.kind !== 'vibration' || !parsed.success) throw new Error('unreachable');
    expect(entry.data.analysis?.calcVersion).toBe(CALC_VERSION);
    // The stored record analyses to the same frequency as the original.
    const back = decodeSamples(parsed.data);
    const again = analyseAmbientRecord({ timesS: back.timesS, x: back.x, y: back.y, z: back.z });
    expect(again.measured!.frequencyHz).toBeCloseTo(analysis.measured!.frequencyHz, 3);
  });
  it('rejects a stored record whose axes lost values, naming no sentence but the path', () => {
    const { raw } = aRecording(20);
    const entry = vibrationEntry(raw, null, {
      longEdgeAlong: null,
      storey: null,
      expectedPeriodS: null,
      reportedIntervalMs: null,
    });
    const data = structuredClone(entry.data) as { x: number[] };
    data.x.pop();
    const r = parseInstrumentData('vibration', data);
    expect(r.success).toBe(false);
    expect(parseInstrumentData('vibration', { version: 2 }).success).toBe(false);
    expect(parseInstrumentData('tilt', null).success).toBe(false);
  });
});

describe('tilt entries and the draft adapters', () => {
  it('builds a tilt entry that passes its schema and the survey record schema once in a draft', () => {
    const entry = tiltEntry(aTiltOutcome(), { storey: 0, direction: 'x' });
    expect(parseInstrumentData('tilt', entry.data).success).toBe(true);
    let record = emptySurvey('device-1', new Date('2026-01-02T03:04:05Z'));
    record = {
      ...record,
      building: {
        ...record.building,
        storeys: [
          { heightM: 3, floorAreaM2: 80, floorConstruction: 'on-grade', unitWeightPa: null },
        ],
      },
    };
    const next = withPhoneTilt(record, 0, 'x', {
      tiltRad: 0.004,
      uncertaintyRad: 0.0002,
      offsetRad: 0.001,
      driftRatio: Math.tan(0.004),
      driftUncertainty: 0.0002,
      entry,
    });
    expect(next.observations.residualDrift).toEqual([
      {
        storey: 0,
        direction: 'x',
        ratio: Math.tan(0.004),
        method: 'phone-tilt',
        offsetM: null,
        overHeightM: null,
        tiltRad: 0.004,
        uncertainty: 0.0002,
      },
    ]);
    expect(next.instrumentRecords).toHaveLength(1);
    const check = surveyRecordSchema.safeParse(JSON.parse(JSON.stringify(next)));
    expect(check.success, JSON.stringify(check.error?.issues?.slice(0, 3))).toBe(true);
  });
  it('replaces the tilt of an existing reading but keeps its typed offset', () => {
    const base = emptySurvey('device-1', new Date('2026-01-02T03:04:05Z'));
    const record = {
      ...base,
      observations: {
        ...base.observations,
        residualDrift: [
          {
            storey: 0,
            direction: 'y' as const,
            ratio: 0.01,
            method: 'offset' as const,
            offsetM: 0.03,
            overHeightM: 3,
            tiltRad: null,
            uncertainty: null,
          },
        ],
      },
    };
    const next = withPhoneTilt(record, 0, 'y', {
      tiltRad: -0.002,
      uncertaintyRad: 0.0001,
      offsetRad: 0,
      driftRatio: Math.tan(0.002),
      driftUncertainty: 0.0001,
      entry: tiltEntry(aTiltOutcome(), { storey: 0, direction: 'y' }),
    });
    expect(next.observations.residualDrift[0]).toMatchObject({
      method: 'phone-tilt',
      offsetM: 0.03,
      tiltRad: -0.002,
    });
  });
  it('sets the measured frequency and stores the recording; no peak leaves an earlier value alone', () => {
    const { raw } = aRecording(20);
    const entry = vibrationEntry(raw, null, {
      longEdgeAlong: null,
      storey: null,
      expectedPeriodS: null,
      reportedIntervalMs: null,
    });
    const base = emptySurvey('device-1', new Date('2026-01-02T03:04:05Z'));
    const measured = {
      frequencyHz: 4.1,
      dampingRatio: 0.03,
      confidence: 0.8,
      direction: 'x' as const,
    };
    const first = withVibration(base, measured, entry);
    expect(first.measured).toEqual(measured);
    const second = withVibration(first, null, entry);
    expect(second.measured).toEqual(measured);
    expect(second.instrumentRecords).toHaveLength(2);
    expect(surveyRecordSchema.safeParse(JSON.parse(JSON.stringify(second))).success).toBe(true);
  });
  it('takes the expected period from EN 1998-1 eq. (4.6) on the total height (6 m → 0.1917 s)', () => {
    const base = emptySurvey('device-1', new Date('2026-01-02T03:04:05Z'));
    const storey = {
      heightM: 3,
      floorAreaM2: 80,
      floorConstruction: 'light-timber' as const,
      unitWeightPa: null,
    };
    expect(expectedPeriodFor(base)).toBeNull();
    const two = { ...base, building: { ...base.building, storeys: [storey, storey] } };
    // Method notes §3 check value: H = 6 m → T1 = 0.05·6^0.75 = 0.1917 s.
    expect(expectedPeriodFor(two)).toBeCloseTo(0.1917, 4);
  });
});
