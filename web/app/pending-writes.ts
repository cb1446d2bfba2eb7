/**
 * A registry of work that must reach storage before the page may reload or close.
 *
 * The storage layer registers a flusher (it writes any debounced draft at once); the update
 * notice and the page-lifecycle handlers call `flushPendingWrites()` and wait for it. Keeping
 * the registry here means the app shell does not import the storage layer, and a reload can
 * never overtake a half-saved form.
 */

type Flusher = () => Promise<void>;

const flushers = new Set<Flusher>();

/** Registers a flusher; returns a function that removes it again. */
export function registerFlusher(flush: Flusher): () => void {
  flushers.add(flush);
  return () => flushers.delete(flush);
}

/**
 * Runs every registered flusher and resolves when all have settled. Rejects with an
 * AggregateError listing every failure, so the caller can refuse to reload.
 */
export async function flushPendingWrites(): Promise<void> {
  const results = await Promise.allSettled([...flushers].map((flush) => flush()));
  const failures = results.flatMap((r) => (r.status === 'rejected' ? [r.reason as unknown] : []));
  if (failures.length > 0) {
    throw new AggregateError(failures, `${failures.length} pending write(s) could not be saved`);
  }
}
