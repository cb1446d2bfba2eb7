/**
 * A preact hook around motion-source.ts: asks for the sensor from a tap, subscribes while
 * active, and notices when no readings arrive at all.
 */
import { useCallback, useEffect, useRef, useState } from 'preact/hooks';
import { requestMotionAccess, subscribeMotion } from './motion-source.js';
import type { MotionAccess, MotionSample } from './motion-source.js';
import { NO_SENSOR_AFTER_MS } from './vibration-session.js';

export type MotionState = 'off' | 'asking' | MotionAccess | 'silent';

/**
 * `start()` must run inside a tap handler (Safari's permission rule). Samples go to
 * `onSample` until `stop()` or unmount. `state` is 'granted' while readings flow, 'silent'
 * when none came within NO_SENSOR_AFTER_MS.
 */
export function useMotion(
  onSample: (s: MotionSample) => void,
  onInterval?: (ms: number) => void,
): { state: MotionState; start: () => Promise<boolean>; stop: () => void } {
  const [state, setState] = useState<MotionState>('off');
  const unsubscribe = useRef<(() => void) | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const sampleRef = useRef(onSample);
  const intervalRef = useRef(onInterval);
  sampleRef.current = onSample;
  intervalRef.current = onInterval;

  const stop = useCallback(() => {
    unsubscribe.current?.();
    unsubscribe.current = null;
    if (timer.current !== null) clearTimeout(timer.current);
    timer.current = null;
  }, []);

  const start = useCallback(async () => {
    stop();
    setState('asking');
    const access = await requestMotionAccess();
    setState(access);
    if (access !== 'granted') return false;
    let seen = false;
    unsubscribe.current = subscribeMotion(
      (s) => {
        if (!seen) {
          seen = true;
          setState('granted');
        }
        sampleRef.current(s);
      },
      (ms) => intervalRef.current?.(ms),
    );
    timer.current = setTimeout(() => {
      if (!seen) setState('silent');
    }, NO_SENSOR_AFTER_MS);
    return true;
  }, [stop]);

  useEffect(() => stop, [stop]);
  return { state, start, stop };
}
