/**
 * Registers the service worker and runs the update flow through workbox-window.
 *
 * A new version never takes over by itself: it waits, the app shows a notice, and only when
 * the user accepts are pending drafts flushed, the waiting worker activated and the page
 * reloaded. A reload we did not ask for could lose a half-filled form.
 */
import { Workbox } from 'workbox-window';
import { SKIP_WAITING } from '../../sw/messages.js';
import { flushPendingWrites } from './pending-writes.js';
import { createStore } from './store.js';

export type UpdatePhase = 'none' | 'waiting' | 'applying' | 'flush-failed';

/** Whether a new version is waiting, and where the user's update request stands. */
export const updateState = createStore<{ phase: UpdatePhase; offlineReady: boolean }>({
  phase: 'none',
  offlineReady: false,
});

let workbox: Workbox | null = null;
let reloadRequested = false;

/** How often a long-open app asks the server whether a new version exists (30 min). */
const UPDATE_CHECK_MS = 30 * 60 * 1000;

/** Registers /sw.js. Does nothing where service workers are unavailable (or in dev). */
export function registerServiceWorker(): void {
  if (!('serviceWorker' in navigator) || import.meta.env.DEV) return;
  const wb = new Workbox('/sw.js', { scope: '/' });
  workbox = wb;

  wb.addEventListener('waiting', () => {
    updateState.set({ ...updateState.get(), phase: 'waiting' });
  });
  wb.addEventListener('activated', (event) => {
    if (!event.isUpdate) updateState.set({ ...updateState.get(), offlineReady: true });
  });
  wb.addEventListener('controlling', () => {
    // Only reload when this page asked for the new version; another tab accepting an
    // update must not reload this one behind the user's back.
    if (reloadRequested) window.location.reload();
  });

  void wb.register();
  const check = () => void wb.update().catch(() => undefined);
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'visible') check();
  });
  setInterval(check, UPDATE_CHECK_MS);
}

/** Asks the server for a new version now (the settings screen and tests use this). */
export async function checkForUpdate(): Promise<void> {
  await workbox?.update();
}

/**
 * The user accepted the update: flush drafts first; only if every write landed, activate the
 * waiting worker, which then takes control and triggers the reload.
 */
export async function applyUpdate(): Promise<void> {
  if (!workbox) return;
  updateState.set({ ...updateState.get(), phase: 'applying' });
  try {
    await flushPendingWrites();
  } catch {
    updateState.set({ ...updateState.get(), phase: 'flush-failed' });
    return;
  }
  reloadRequested = true;
  workbox.messageSkipWaiting();
  // workbox-window sends its own message type; send ours too so the worker's check is explicit.
  const registration = await navigator.serviceWorker.getRegistration();
  registration?.waiting?.postMessage({ type: SKIP_WAITING });
}

/** The user chose "Later": hide the notice; the waiting version is offered again next time the app opens. */
export function postponeUpdate(): void {
  updateState.set({ ...updateState.get(), phase: 'none' });
}
