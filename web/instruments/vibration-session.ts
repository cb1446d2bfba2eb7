/**
 * An ambient vibration recording, free of any UI: collects every reading at the rate the
 * phone delivers, with the time stamps it delivers (resampling is calc's job, after the
 * recording), and reports progress. Time comes from the samples, so tests drive it with
 * synthetic samples.
 */
import type { MotionSample } from './motion-source.js';
import { SampleBuffer } from './sample-buffer.js';

/** Recording length the procedure allows, s (60–120 s). */
export const MIN_DURATION_S = 60;
export const MAX_DURATION_S = 120;
export const DEFAULT_DURATION_S = 90;
/** Warn when no reading came within this long of the start, ms (our choice). */
export const NO_SENSOR_AFTER_MS = 2500;

export interface VibrationProgress {
  recording: boolean;
  done: boolean;
  elapsedS: number;
  durationS: number;
  /** 0..1. */
  progress: number;
  sampleCount: number;
  /** Mean rate so far, Hz (null before two readings). */
  rateHz: number | null;
}

/** Clamps a requested duration into the allowed 60–120 s. */
export function clampDuration(durationS: number | undefined): number {
  if (durationS === undefined || !Number.isFinite(durationS)) return DEFAULT_DURATION_S;
  return Math.min(MAX_DURATION_S, Math.max(MIN_DURATION_S, durationS));
}

export class VibrationSession {
  readonly durationS: number;
  private readonly buffer = new SampleBuffer();
  private readonly listeners = new Set<(p: VibrationProgress) => void>();
  private recording = false;
  private done = false;
  private reportedIntervalMs: number | null = null;

  constructor(durationS?: number) {
    this.durationS = clampDuration(durationS);
  }

  subscribe(listener: (p: VibrationProgress) => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  get progress(): VibrationProgress {
    const first = this.buffer.firstT;
    const last = this.buffer.lastT;
    const elapsedS = first !== null && last !== null ? Math.max(0, (last - first) / 1000) : 0;
    const n = this.buffer.length;
    return {
      recording: this.recording,
      done: this.done,
      elapsedS: Math.min(elapsedS, this.durationS),
      durationS: this.durationS,
      progress: Math.min(1, elapsedS / this.durationS),
      sampleCount: n,
      rateHz: n >= 2 && elapsedS > 0 ? (n - 1) / elapsedS : null,
    };
  }

  private emit(): void {
    const p = this.progress;
    for (const l of this.listeners) l(p);
  }

  start(): void {
    this.buffer.clear();
    this.done = false;
    this.recording = true;
    this.emit();
  }

  /** Stops early (the record so far is kept; calc decides whether it is long enough). */
  stop(): void {
    if (!this.recording) return;
    this.recording = false;
    this.done = true;
    this.emit();
  }

  setReportedInterval(ms: number): void {
    if (Number.isFinite(ms) && ms > 0) this.reportedIntervalMs = ms;
  }

  feed(sample: MotionSample): void {
    if (!this.recording) return;
    this.buffer.push(sample);
    const first = this.buffer.firstT as number;
    if (sample.t - first >= this.durationS * 1000) {
      this.recording = false;
      this.done = true;
    }
    this.emit();
  }

  /** The recorded samples (times in ms as delivered, accelerations in m/s²). */
  raw(): {
    timesMs: Float64Array;
    x: Float64Array;
    y: Float64Array;
    z: Float64Array;
    reportedIntervalMs: number | null;
  } {
    return { ...this.buffer.snapshot(), reportedIntervalMs: this.reportedIntervalMs };
  }
}
