/**
 * The tilt meter's procedure, free of any UI: two positions, each "wait until the phone is
 * still, then average about two seconds", then the reversal and the drift ratio (all the
 * arithmetic is calc/vibration's). Feed it motion samples; read `view`; subscribe for
 * changes. Time comes from the samples themselves, so tests drive it with synthetic samples.
 */
import {
  driftRatioFromTilt,
  MAX_MEASURABLE_TILT_RAD,
  measureTiltPosition,
  reversalCalibration,
  STILL_RANGE_MPS2,
  STILL_STD_MPS2,
  tiltFromGravity,
} from '../../calc/index.js';
import type { ReversalResult, TiltPosition } from '../../calc/index.js';
import type { MotionSample } from './motion-source.js';
import { SampleBuffer } from './sample-buffer.js';

/** Averaging time per position, s: about 2 s, as the procedure asks. */
export const AVERAGING_S = 2;
/** The phone must be still this long before averaging starts, s (our choice). */
export const SETTLE_S = 0.5;
/** Give up waiting for stillness after this long, s (our choice). */
export const SETTLE_TIMEOUT_S = 15;
/** The live reading averages this long, s (our choice: steady to read, quick to follow). */
const LIVE_S = 0.3;

export type TiltIssue =
  | 'not-still' // moved during the averaging, or never settled
  | 'not-upright' // long edge not within 45° of vertical
  | 'implausible-magnitude' // |a| not near g: moving, or a sensor far off calibration
  | 'too-few' // too few readings arrived (the sensor is slow or stopped)
  | 'offset-implausible' // the two positions disagree by more than any sensor offset
  | 'too-steep'; // a lean beyond what residual drift means

export type TiltActivity = 'waiting' | 'settling' | 'averaging';

/** One measured position, with the raw readings it averaged (for the stored record). */
export interface MeasuredPosition {
  position: TiltPosition;
  raw: { timesMs: Float64Array; x: Float64Array; y: Float64Array; z: Float64Array };
}

export interface TiltOutcome {
  reversal: ReversalResult;
  driftRatio: number;
  driftUncertainty: number;
  positions: [MeasuredPosition, MeasuredPosition];
}

export interface TiltView {
  /** Which position is being measured: 1, 2, or 'done'. */
  phase: 1 | 2 | 'done';
  activity: TiltActivity;
  /** 0..1 through the averaging. */
  progress: number;
  /** Current lean reading (elevation of the phone's x axis), rad; null before readings arrive. */
  liveAngleRad: number | null;
  /** Whether the last half second looked still. */
  liveStill: boolean;
  /** Readings received so far. */
  sampleCount: number;
  /** Why the last attempt did not count. */
  issue: TiltIssue | null;
  outcome: TiltOutcome | null;
}

function stats(a: Float64Array): { std: number; range: number; mean: number } {
  let sum = 0;
  let min = Infinity;
  let max = -Infinity;
  for (const v of a) {
    sum += v;
    if (v < min) min = v;
    if (v > max) max = v;
  }
  const mean = sum / a.length;
  let ss = 0;
  for (const v of a) ss += (v - mean) ** 2;
  return { std: a.length > 1 ? Math.sqrt(ss / (a.length - 1)) : 0, range: max - min, mean };
}

export class TiltSession {
  private readonly buffer = new SampleBuffer();
  private readonly listeners = new Set<(v: TiltView) => void>();
  private phase: 1 | 2 | 'done' = 1;
  private activity: TiltActivity = 'waiting';
  /** When the current activity began, ms; null until the first sample after `begin()`. */
  private activitySince: number | null = null;
  private averagingFrom = 0;
  private first: MeasuredPosition | null = null;
  private state: TiltView = {
    phase: 1,
    activity: 'waiting',
    progress: 0,
    liveAngleRad: null,
    liveStill: false,
    sampleCount: 0,
    issue: null,
    outcome: null,
  };

  get view(): TiltView {
    return this.state;
  }

  /** The angle read in position 1, rad (null until it is measured). */
  get firstAngleRad(): number | null {
    return this.first?.position.angleRad ?? null;
  }

  subscribe(listener: (v: TiltView) => void): () => void {
    this.listeners.add(listener);
    return () => this.listeners.delete(listener);
  }

  private emit(patch: Partial<TiltView>): void {
    this.state = { ...this.state, ...patch };
    for (const l of this.listeners) l(this.state);
  }

  /** Starts the current position: wait for stillness, then average. */
  begin(): void {
    if (this.phase === 'done') return;
    this.activity = 'settling';
    this.activitySince = this.buffer.lastT;
    this.emit({ activity: 'settling', progress: 0, issue: null });
  }

  /** Abandons the current attempt (the position stays to be measured). */
  cancel(): void {
    this.activity = 'waiting';
    this.emit({ activity: 'waiting', progress: 0 });
  }

  /** Starts again from position 1. */
  reset(): void {
    this.phase = 1;
    this.first = null;
    this.activity = 'waiting';
    this.buffer.clear();
    this.emit({ phase: 1, activity: 'waiting', progress: 0, issue: null, outcome: null });
  }

  /** The window of samples from `fromMs` on. */
  private window(fromMs: number) {
    return this.buffer.snapshot(this.buffer.indexAtOrAfter(fromMs));
  }

  private isStill(w: { x: Float64Array; y: Float64Array; z: Float64Array }): boolean {
    return [w.x, w.y, w.z].every((a) => {
      const s = stats(a);
      return s.std <= STILL_STD_MPS2 && s.range <= STILL_RANGE_MPS2;
    });
  }

  feed(sample: MotionSample): void {
    this.buffer.push(sample);
    const now = sample.t;
    const live = this.window(now - LIVE_S * 1000);
    const settle = this.window(now - SETTLE_S * 1000);
    const still = settle.x.length >= 3 && this.isStill(settle);
    let liveAngleRad: number | null = null;
    if (live.x.length > 0) {
      const [mx, my, mz] = [stats(live.x).mean, stats(live.y).mean, stats(live.z).mean];
      if (Math.hypot(mx, my, mz) > 0) liveAngleRad = tiltFromGravity(mx, my, mz).xRad;
    }
    const patch: Partial<TiltView> = {
      liveAngleRad,
      liveStill: still,
      sampleCount: this.buffer.length,
    };

    if (this.activity === 'settling') {
      if (this.activitySince === null) this.activitySince = now;
      const waited = now - this.activitySince;
      if (still && waited >= SETTLE_S * 1000) {
        this.activity = 'averaging';
        this.averagingFrom = now;
        patch.activity = 'averaging';
        patch.progress = 0;
      } else if (waited > SETTLE_TIMEOUT_S * 1000) {
        this.activity = 'waiting';
        patch.activity = 'waiting';
        patch.issue = 'not-still';
      }
    } else if (this.activity === 'averaging') {
      const elapsed = now - this.averagingFrom;
      patch.progress = Math.min(1, elapsed / (AVERAGING_S * 1000));
      if (elapsed >= AVERAGING_S * 1000) Object.assign(patch, this.finishPosition());
    }
    this.emit(patch);
  }

  private finishPosition(): Partial<TiltView> {
    this.activity = 'waiting';
    const raw = this.window(this.averagingFrom);
    const position = measureTiltPosition(raw);
    const issue: TiltIssue | null = !position.enoughSamples
      ? 'too-few'
      : !position.still
        ? 'not-still'
        : !position.upright
          ? 'not-upright'
          : !position.magnitudePlausible
            ? 'implausible-magnitude'
            : null;
    if (issue) return { activity: 'waiting', progress: 0, issue };
    const measured: MeasuredPosition = { position, raw };
    if (this.phase === 1) {
      this.first = measured;
      this.phase = 2;
      return { phase: 2, activity: 'waiting', progress: 0, issue: null };
    }
    const first = this.first as MeasuredPosition;
    const reversal = reversalCalibration(first.position, position);
    if (!reversal.offsetPlausible) {
      // Start the pair again: one of the two positions was not what the procedure asks.
      this.phase = 1;
      this.first = null;
      return { phase: 1, activity: 'waiting', progress: 0, issue: 'offset-implausible' };
    }
    if (Math.abs(reversal.tiltRad) >= MAX_MEASURABLE_TILT_RAD) {
      this.phase = 1;
      this.first = null;
      return { phase: 1, activity: 'waiting', progress: 0, issue: 'too-steep' };
    }
    const drift = driftRatioFromTilt(reversal.tiltRad, reversal.uncertaintyRad);
    this.phase = 'done';
    return {
      phase: 'done',
      activity: 'waiting',
      progress: 1,
      issue: null,
      outcome: {
        reversal,
        driftRatio: drift.ratio,
        driftUncertainty: drift.uncertainty,
        positions: [first, measured],
      },
    };
  }
}
