/**
 * The phone's accelerometer as the browser offers it: `devicemotion` events with
 * `accelerationIncludingGravity` (m/s², W3C DeviceOrientation Event specification), and the
 * permission some phones ask for first (`DeviceMotionEvent.requestPermission()`, which must
 * be called from a tap). Framework-free: components and tests use it alike.
 */

/** One reading: time in ms (the event's time stamp, same clock as performance.now()), m/s². */
export interface MotionSample {
  t: number;
  x: number;
  y: number;
  z: number;
}

/** What asking for the sensor gave. */
export type MotionAccess = 'granted' | 'denied' | 'unsupported' | 'insecure';

interface PermissionAware {
  requestPermission?: () => Promise<'granted' | 'denied' | 'default'>;
}

/** The DeviceMotionEvent constructor, when the browser has one. */
function motionEventClass(): (typeof DeviceMotionEvent & PermissionAware) | null {
  const w = globalThis as { DeviceMotionEvent?: typeof DeviceMotionEvent & PermissionAware };
  return typeof w.DeviceMotionEvent === 'function' ? w.DeviceMotionEvent : null;
}

/** True when this browser asks for permission before it sends motion events (iOS Safari). */
export function motionNeedsPermission(): boolean {
  return typeof motionEventClass()?.requestPermission === 'function';
}

/**
 * Asks for the motion sensor. Call it from a tap handler: Safari refuses the request
 * otherwise. Resolves, never rejects.
 */
export async function requestMotionAccess(): Promise<MotionAccess> {
  const cls = motionEventClass();
  if (!cls) return 'unsupported';
  if (typeof window !== 'undefined' && window.isSecureContext === false) return 'insecure';
  if (typeof cls.requestPermission !== 'function') return 'granted';
  try {
    return (await cls.requestPermission()) === 'granted' ? 'granted' : 'denied';
  } catch {
    return 'denied';
  }
}

/** Reads one event; null when the browser left an axis out (some do on the first event). */
export function sampleFromEvent(event: DeviceMotionEvent): MotionSample | null {
  const a = event.accelerationIncludingGravity;
  if (!a) return null;
  const { x, y, z } = a;
  if (typeof x !== 'number' || typeof y !== 'number' || typeof z !== 'number') return null;
  if (!Number.isFinite(x) || !Number.isFinite(y) || !Number.isFinite(z)) return null;
  const stamp = event.timeStamp;
  const t = Number.isFinite(stamp) && stamp > 0 ? stamp : performance.now();
  return { t, x, y, z };
}

/**
 * Calls `onSample` for every complete reading until the returned function is called.
 * `onInterval` receives the phone's own `interval` (ms) once, when it reports one.
 */
export function subscribeMotion(
  onSample: (sample: MotionSample) => void,
  onInterval?: (intervalMs: number) => void,
  target: Pick<Window, 'addEventListener' | 'removeEventListener'> = window,
): () => void {
  let intervalSent = false;
  const handler = (event: Event) => {
    const e = event as DeviceMotionEvent;
    if (!intervalSent && onInterval && typeof e.interval === 'number' && e.interval > 0) {
      intervalSent = true;
      onInterval(e.interval);
    }
    const s = sampleFromEvent(e);
    if (s) onSample(s);
  };
  target.addEventListener('devicemotion', handler);
  return () => target.removeEventListener('devicemotion', handler);
}
