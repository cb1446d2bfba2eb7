/**
 * A growing store of motion samples in typed arrays (a two-minute record at 100 Hz is 12,000
 * samples; plain arrays of objects would cost several times the memory and time).
 */
import type { MotionSample } from './motion-source.js';

export class SampleBuffer {
  private t = new Float64Array(1024);
  private x = new Float64Array(1024);
  private y = new Float64Array(1024);
  private z = new Float64Array(1024);
  private n = 0;

  get length(): number {
    return this.n;
  }

  push(s: MotionSample): void {
    if (this.n === this.t.length) {
      const grow = (a: Float64Array) => {
        const b = new Float64Array(a.length * 2);
        b.set(a);
        return b;
      };
      this.t = grow(this.t);
      this.x = grow(this.x);
      this.y = grow(this.y);
      this.z = grow(this.z);
    }
    this.t[this.n] = s.t;
    this.x[this.n] = s.x;
    this.y[this.n] = s.y;
    this.z[this.n] = s.z;
    this.n += 1;
  }

  clear(): void {
    this.n = 0;
  }

  /** Time of the first and last sample, ms (null when empty). */
  get firstT(): number | null {
    return this.n > 0 ? (this.t[0] as number) : null;
  }
  get lastT(): number | null {
    return this.n > 0 ? (this.t[this.n - 1] as number) : null;
  }

  /** Copies of the samples from index `from` on (all by default). */
  snapshot(from = 0): { timesMs: Float64Array; x: Float64Array; y: Float64Array; z: Float64Array } {
    const a = Math.max(0, Math.min(from, this.n));
    return {
      timesMs: this.t.slice(a, this.n),
      x: this.x.slice(a, this.n),
      y: this.y.slice(a, this.n),
      z: this.z.slice(a, this.n),
    };
  }

  /** Index of the first sample at or after time `tMs` (binary search; samples in arrival order). */
  indexAtOrAfter(tMs: number): number {
    let lo = 0;
    let hi = this.n;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if ((this.t[mid] as number) < tMs) lo = mid + 1;
      else hi = mid;
    }
    return lo;
  }
}
