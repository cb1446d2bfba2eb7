// The tilt meter's procedure (web/instruments/tilt-session.ts) driven by synthetic motion
// samples: a face leaning by a known angle, read by a phone with a zero offset, noise and a
// small axis misalignment, in the two positions of the reversal. The expected lean is the
// simulator's input; the reversal algebra is checked in test/reference/vibration-tilt.test.ts.
import { describe, expect, it } from 'vitest';
import { G } from '../../calc/index.js';
import { AVERAGING_S, SETTLE_TIMEOUT_S, TiltSession } from '../../web/instruments/tilt-session.js';
import type { MotionSample } from '../../web/instruments/motion-source.js';
import { gaussian, mulberry32 } from '../reference/vibration-synthetic.js';

const deg = Math.PI / 180;

/** A phone on its long edge against a face leaning by `leanRad`; `turned`: position 2. */
const clock = { t: 1000 };

function phone(
  seed: number,
  leanRad: number,
  opts: { sigma?: number; offset?: number; shake?: number } = {},
) {
  const g = gaussian(mulberry32(seed));
  const sigma = opts.sigma ?? 0.01;
  const offset = opts.offset ?? 0.04 * G; // 40 mg zero offset on x
  return (turned: boolean): MotionSample => {
    const t = (clock.t += 10); // 100 Hz, one clock for every simulated phone
    const sign = turned ? -1 : 1;
    const ay = G * Math.cos(leanRad);
    const shake = opts.shake ? opts.shake * Math.sin(t / 37) : 0;
    return {
      t,
      x: sign * G * Math.sin(leanRad) + 0.01 * ay + offset + sigma * g() + shake,
      y: ay + sigma * g(),
      z: 0.2 + sigma * g(),
    };
  };
}

function run(
  session: TiltSession,
  next: (turned: boolean) => MotionSample,
  turned: boolean,
  seconds: number,
) {
  for (let i = 0; i < seconds * 100; i++) session.feed(next(turned));
}

describe('TiltSession', () => {
  it('measures a 0.3° lean through the reversal, removing a 40 mg offset and a 1 % misalignment', () => {
    const s = new TiltSession();
    const next = phone(1, 0.3 * deg);
    run(s, next, false, 1);
    expect(s.view.liveAngleRad).not.toBeNull();
    s.begin();
    expect(s.view.activity).toBe('settling');
    run(s, next, false, AVERAGING_S + 1);
    expect(s.view.phase).toBe(2);
    expect(s.view.issue).toBeNull();
    s.begin();
    run(s, next, true, AVERAGING_S + 1);
    const out = s.view.outcome;
    expect(s.view.phase).toBe('done');
    expect(out).not.toBeNull();
    expect(Math.abs(out!.reversal.tiltRad - 0.3 * deg)).toBeLessThan(
      3 * out!.reversal.uncertaintyRad + 0.01 * 0.3 * deg,
    );
    expect(out!.reversal.offsetRad).toBeCloseTo(Math.asin(0.04 + 0.01), 2);
    expect(out!.driftRatio).toBeCloseTo(Math.tan(0.3 * deg), 3);
    expect(out!.positions[0].raw.x.length).toBeGreaterThanOrEqual(AVERAGING_S * 100);
  });

  it('reports "not-still" after the settling timeout when the phone keeps moving', () => {
    const s = new TiltSession();
    const next = phone(2, 0.3 * deg, { shake: 0.5 });
    s.begin();
    run(s, next, false, SETTLE_TIMEOUT_S + 1);
    expect(s.view.issue).toBe('not-still');
    expect(s.view.activity).toBe('waiting');
    expect(s.view.phase).toBe(1);
  });

  it('starts the pair again when the two positions disagree beyond any sensor offset', () => {
    const s = new TiltSession();
    const a = phone(3, 0.3 * deg, { offset: 0 });
    s.begin();
    run(s, a, false, AVERAGING_S + 1);
    // Position 2 on another face: readings 0.3° and 12° give an "offset" of (0.3° + 12°)/2 ≈ 6.2°,
    // beyond the 5.7° any sensor offset explains.
    const b = phone(4, -12 * deg, { offset: 0 });
    s.begin();
    run(s, b, true, AVERAGING_S + 1);
    expect(s.view.issue).toBe('offset-implausible');
    expect(s.view.phase).toBe(1);
  });

  it('keeps the phase and reports the issue when a position is not upright', () => {
    const s = new TiltSession();
    let t = 0;
    const flat = (): MotionSample => ({ t: (t += 10), x: 0.05, y: 0.1, z: 9.8 });
    s.begin();
    for (let i = 0; i < (AVERAGING_S + 1) * 100; i++) s.feed(flat());
    expect(s.view.issue).toBe('not-upright');
    expect(s.view.phase).toBe(1);
  });

  it('can be cancelled and reset', () => {
    const s = new TiltSession();
    const next = phone(5, 0);
    s.begin();
    run(s, next, false, 0.7);
    s.cancel();
    expect(s.view.activity).toBe('waiting');
    s.reset();
    expect(s.view.phase).toBe(1);
    expect(s.view.outcome).toBeNull();
  });

  it('notifies subscribers and stops after unsubscribe', () => {
    const s = new TiltSession();
    let calls = 0;
    const off = s.subscribe(() => (calls += 1));
    s.feed({ t: 1, x: 0, y: 9.81, z: 0 });
    off();
    s.feed({ t: 2, x: 0, y: 9.81, z: 0 });
    expect(calls).toBe(1);
  });
});
