// The sensor plumbing of web/instruments: reading devicemotion events (W3C DeviceOrientation
// Event specification: accelerationIncludingGravity, interval), the permission flow of
// DeviceMotionEvent.requestPermission where it exists, the recording session, the analysis
// fallback when no Worker exists (Node), and the components' first render (preact's own
// renderer, preact-render-to-string).
import { afterEach, describe, expect, it } from 'vitest';
import { renderToString } from 'preact-render-to-string';
import { h } from 'preact';
import {
  motionNeedsPermission,
  requestMotionAccess,
  sampleFromEvent,
  subscribeMotion,
} from '../../web/instruments/motion-source.js';
import { clampDuration, VibrationSession } from '../../web/instruments/vibration-session.js';
import { analyseRecording } from '../../web/instruments/vibration-analysis.js';
import { TiltMeter } from '../../web/instruments/tilt-meter.js';
import { VibrationRecorder } from '../../web/instruments/vibration-recorder.js';
import { inputStdFor, PHONE, phoneRecord, sdofResponse } from '../reference/vibration-synthetic.js';

type MotionInit = {
  accelerationIncludingGravity?: { x: number | null; y: number | null; z: number | null } | null;
  interval?: number;
  timeStamp?: number;
};
const fakeEvent = (init: MotionInit) =>
  ({
    accelerationIncludingGravity: null,
    interval: 0,
    timeStamp: 5,
    ...init,
  }) as unknown as DeviceMotionEvent;

const g = globalThis as { DeviceMotionEvent?: unknown; window?: unknown };
afterEach(() => {
  delete g.DeviceMotionEvent;
});

describe('reading motion events', () => {
  it('takes accelerationIncludingGravity and the event time stamp', () => {
    const s = sampleFromEvent(
      fakeEvent({ accelerationIncludingGravity: { x: 0.1, y: 9.8, z: -0.2 }, timeStamp: 1234.5 }),
    );
    expect(s).toEqual({ t: 1234.5, x: 0.1, y: 9.8, z: -0.2 });
  });
  it('skips events with a missing axis or no acceleration (some phones send those first)', () => {
    expect(
      sampleFromEvent(fakeEvent({ accelerationIncludingGravity: { x: null, y: 9.8, z: 0 } })),
    ).toBeNull();
    expect(sampleFromEvent(fakeEvent({ accelerationIncludingGravity: null }))).toBeNull();
    expect(
      sampleFromEvent(fakeEvent({ accelerationIncludingGravity: { x: Number.NaN, y: 1, z: 1 } })),
    ).toBeNull();
  });
  it('subscribes to devicemotion, reports the interval once, and unsubscribes', () => {
    const target = new EventTarget();
    const got: number[] = [];
    const intervals: number[] = [];
    const off = subscribeMotion(
      (s) => got.push(s.x),
      (ms) => intervals.push(ms),
      target as unknown as Window,
    );
    const fire = (x: number) => {
      const e = new Event('devicemotion') as Event & MotionInit;
      Object.assign(e, { accelerationIncludingGravity: { x, y: 9.8, z: 0 }, interval: 16 });
      target.dispatchEvent(e);
    };
    fire(1);
    fire(2);
    off();
    fire(3);
    expect(got).toEqual([1, 2]);
    expect(intervals).toEqual([16]);
  });
});

describe('permission flow', () => {
  it('reports unsupported when the browser has no DeviceMotionEvent', async () => {
    expect(await requestMotionAccess()).toBe('unsupported');
    expect(motionNeedsPermission()).toBe(false);
  });
  it('grants without asking where no requestPermission exists (Android browsers)', async () => {
    g.DeviceMotionEvent = function DeviceMotionEvent() {};
    expect(motionNeedsPermission()).toBe(false);
    expect(await requestMotionAccess()).toBe('granted');
  });
  it('asks through requestPermission where it exists (iOS) and passes the answer on', async () => {
    const cls = function DeviceMotionEvent() {} as unknown as {
      requestPermission: () => Promise<string>;
    };
    g.DeviceMotionEvent = cls;
    cls.requestPermission = () => Promise.resolve('granted');
    expect(motionNeedsPermission()).toBe(true);
    expect(await requestMotionAccess()).toBe('granted');
    cls.requestPermission = () => Promise.resolve('denied');
    expect(await requestMotionAccess()).toBe('denied');
    cls.requestPermission = () => Promise.reject(new Error('not from a user gesture'));
    expect(await requestMotionAccess()).toBe('denied');
  });
});

describe('VibrationSession', () => {
  it('clamps the duration to 60–120 s', () => {
    expect(clampDuration(10)).toBe(60);
    expect(clampDuration(500)).toBe(120);
    expect(clampDuration(undefined)).toBe(90);
    expect(clampDuration(Number.NaN)).toBe(90);
  });
  it('ignores samples before start, stops by itself at the duration, and keeps the time stamps as delivered', () => {
    const s = new VibrationSession(60);
    s.feed({ t: 0, x: 0, y: 0, z: 9.8 });
    s.start();
    for (let i = 0; i <= 6100; i++) s.feed({ t: 1000 + i * 10 + (i % 3), x: 0, y: 0, z: 9.8 });
    const p = s.progress;
    expect(p.done).toBe(true);
    expect(p.recording).toBe(false);
    const raw = s.raw();
    expect(raw.timesMs[0]).toBe(1000);
    expect(raw.timesMs[1]).toBe(1011);
    expect(raw.timesMs.length).toBe(6001);
    expect(p.rateHz).toBeCloseTo(100, 0);
  });
  it('can be stopped early and keeps what it has', () => {
    const s = new VibrationSession(90);
    s.start();
    for (let i = 0; i < 100; i++) s.feed({ t: i * 10, x: 0, y: 0, z: 9.8 });
    s.stop();
    expect(s.progress.done).toBe(true);
    expect(s.raw().x.length).toBe(100);
  });
});

describe('analysis without a Worker (the main-thread fallback)', () => {
  it('analyses a recording to the simulated frequency', async () => {
    const y = sdofResponse({
      frequencyHz: 5.5,
      dampingRatio: 0.02,
      simulationRateHz: 500,
      durationS: 60,
      inputStd: inputStdFor(1, 500),
      seed: 3,
    });
    const rec = phoneRecord(
      { x: null, y, simulationRateHz: 500, durationS: 60 },
      { ...PHONE, seed: 4 },
    );
    expect(typeof (globalThis as { Worker?: unknown }).Worker).toBe('undefined');
    const a = await analyseRecording({
      timesS: Float64Array.from(rec.timesS),
      x: Float64Array.from(rec.x),
      y: Float64Array.from(rec.y),
      z: Float64Array.from(rec.z),
      longEdgeAlong: 'y',
      referenceFrequencyHz: 5,
      referenceRelativeUncertainty: 0.3,
      referenceIsEmpirical: true,
    });
    expect(Math.abs(a.measured!.frequencyHz - 5.5) / 5.5).toBeLessThan(0.02);
    expect(a.measured!.direction).toBe('y');
    expect(a.caveats).toContain('empirical-reference');
  });
});

describe('components (first render)', () => {
  it('renders the tilt meter closed, as one button with catalogue text', () => {
    const html = renderToString(h(TiltMeter, { onResult: () => undefined }));
    expect(html).toContain('Measure the lean with this phone');
    expect(html).toContain('type="button"');
  });
  it('renders the vibration recorder open with its instructions, choices and start button', () => {
    const html = renderToString(
      h(VibrationRecorder, {
        onResult: () => undefined,
        expectedPeriodS: 0.3,
        initiallyOpen: true,
      }),
    );
    expect(html).toContain('Lay the phone flat on the floor of the top storey');
    expect(html).toContain('plan x');
    expect(html).toContain('120 s');
    expect(html).toContain('Start recording');
  });
});
