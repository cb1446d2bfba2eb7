/**
 * One helper for every transaction: run the work, wait for `done`, and on any failure abort
 * so that nothing is half-written.
 *
 * Pitfalls it exists for (all easy to hit with idb, whose docs warn about the first two):
 * - A transaction auto-commits as soon as no request is pending when the task ends. Awaiting
 *   anything that is not a request of this transaction (a fetch, a timer, `estimate()`,
 *   a Blob's `arrayBuffer()`) lets it commit, and the next request throws
 *   TransactionInactiveError. Do all such work before opening the transaction; inside,
 *   await only this transaction's requests and synchronous code (zod parsing is synchronous).
 * - If the work throws after some requests were queued, the transaction still commits those
 *   requests unless it is aborted. Hence the abort below: one save = all or nothing.
 * - A failed request rejects its own promise and `tx.done`; `done` must be awaited or
 *   caught, or it surfaces as an unhandled rejection.
 * - Queueing many requests before awaiting them (fast for bulk writes): if queueing throws
 *   half-way (say a quota error thrown by `add`), the requests already queued reject when
 *   the transaction aborts, and nobody awaits them. Wrap each in `quiet()` as it is queued.
 * - `durability: 'strict'` asks the browser to flush to disk before `complete` (Chromium's
 *   default is 'relaxed', which may lose the last writes on power loss). Records here are
 *   the only copy, so saves use strict; the cost is one disk flush per save.
 */
import type { IDBPTransaction } from 'idb';
import type { GrainlineDb, GrainlineSchema, StoreName } from './db.js';

export type Tx<S extends StoreName[], M extends IDBTransactionMode> = IDBPTransaction<
  GrainlineSchema,
  S,
  M
>;

export async function inTransaction<const S extends StoreName[], M extends IDBTransactionMode, T>(
  db: GrainlineDb,
  stores: S,
  mode: M,
  work: (tx: Tx<S, M>) => Promise<T>,
): Promise<T> {
  const tx = db.transaction(stores, mode, {
    durability: mode === 'readwrite' ? 'strict' : 'default',
  }) as Tx<S, M>;
  try {
    const result = await work(tx);
    await tx.done;
    return result;
  } catch (error) {
    try {
      tx.abort();
    } catch {
      // Already finished or aborting: nothing more to undo.
    }
    await tx.done.catch(() => undefined);
    throw error;
  }
}

/**
 * Marks a request's promise as handled (its rejection is still seen by whoever awaits it),
 * so requests queued before a failure do not surface as unhandled rejections.
 */
export function quiet<T>(p: Promise<T>): Promise<T> {
  p.catch(() => undefined);
  return p;
}
