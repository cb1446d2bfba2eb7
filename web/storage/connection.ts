/**
 * The one open connection of a tab, kept alive: opened on first use, reopened when the
 * browser drops it, closed (after flushing) when a newer version of the app needs the
 * database. Stores nothing itself.
 *
 * - Lost connection: mobile browsers close IndexedDB connections of backgrounded tabs
 *   (the `close` event), and a later `transaction()` throws InvalidStateError; some throw
 *   UnknownError. `run()` then reopens and retries the work, so a save does not fail for it.
 *   The work given to `run()` must be safe to repeat (the saves here are: see saveId).
 * - Version change: when another tab opens a newer database version, this connection gets
 *   `versionchange` and blocks that tab until it closes. We flush pending drafts first
 *   (`beforeClose`), then close, then tell the app shell a reload is required. After that
 *   `run()` refuses with 'reload-required' rather than reopening the old version.
 * - Blocked: when this tab is the newer one and an older tab does not close, `blocked`
 *   fires; the app shell is told so it can ask the user to close the other tab.
 */
import { en, type MessageCatalogue } from '../../forms/index.js';
import { openDatabase, type GrainlineDb } from './db.js';
import { isAbortError, isConnectionLost, StorageError } from './errors.js';

/** What the storage layer tells the app shell. */
export type StoreNotice =
  | { type: 'upgrade-blocked'; message: string }
  /** The open that was blocked went through (the older tab closed). */
  | { type: 'upgrade-unblocked' }
  | { type: 'reload-required'; message: string }
  | { type: 'reopened' }
  | { type: 'quarantined'; count: number; message: string }
  /** The answer to `navigator.storage.persist()`, asked after this tab's first save. */
  | { type: 'persistence'; granted: boolean | null };

export interface ConnectionOptions {
  factory: IDBFactory;
  name: string;
  version: number;
  /** Flush pending writes before the connection closes for an upgrade. */
  beforeClose: () => Promise<void>;
  notify: (notice: StoreNotice) => void;
  catalogue?: MessageCatalogue;
  /** Attempts per `run()` when the connection is lost (first try included). */
  attempts?: number;
  /** Longest wait for `beforeClose` before closing anyway (the other tab is waiting). */
  flushTimeoutMs?: number;
}

/** Waits between retries, in ms. Source: common practice, no source. */
const RETRY_DELAYS_MS = [0, 50, 250, 1000];

export class Connection {
  private opening: Promise<GrainlineDb> | null = null;
  private current: GrainlineDb | null = null;
  private closedForUpgrade = false;
  private closingForUpgrade = false;
  private disposed = false;
  /** Counts connections lost; an abort seen across a loss is the loss, not the work. */
  private losses = 0;
  private readonly catalogue: MessageCatalogue;

  constructor(private readonly options: ConnectionOptions) {
    this.catalogue = options.catalogue ?? en;
  }

  /** True once a newer version took over; the tab must reload. */
  get reloadRequired(): boolean {
    return this.closedForUpgrade;
  }

  /** The open database, opening it when needed. */
  async db(): Promise<GrainlineDb> {
    if (this.closedForUpgrade) {
      throw new StorageError('reload-required', this.catalogue.storage.reloadRequired);
    }
    if (this.disposed) throw new Error('storage connection used after close()');
    if (this.opening === null) {
      let wasBlocked = false;
      const opening = openDatabase(this.options.factory, this.options.name, this.options.version, {
        blocked: () => {
          wasBlocked = true;
          this.options.notify({
            type: 'upgrade-blocked',
            message: this.catalogue.storage.upgradeBlocked,
          });
        },
        blocking: (db) => void this.handleVersionChange(db),
        terminated: () => {
          this.losses++;
          this.forget(opening);
        },
      });
      this.opening = opening;
      opening.then(
        (db) => {
          if (this.opening === opening) this.current = db;
          if (wasBlocked) this.options.notify({ type: 'upgrade-unblocked' });
        },
        () => this.forget(opening),
      );
    }
    return this.opening;
  }

  /**
   * Runs `work` with the open database; if the connection turns out to be lost, reopens it
   * and runs `work` again (a few times, with short waits).
   */
  async run<T>(work: (db: GrainlineDb) => Promise<T>): Promise<T> {
    const attempts = this.options.attempts ?? RETRY_DELAYS_MS.length;
    let lastError: unknown;
    for (let attempt = 0; attempt < attempts; attempt++) {
      const delay = RETRY_DELAYS_MS[Math.min(attempt, RETRY_DELAYS_MS.length - 1)] ?? 0;
      if (delay > 0) await new Promise((resolve) => setTimeout(resolve, delay));
      let db: GrainlineDb;
      try {
        db = await this.db();
      } catch (error) {
        if (error instanceof StorageError) throw error;
        if (error instanceof Error && error.name === 'VersionError') {
          // The database on disk is newer than this build: another tab updated the app.
          this.closedForUpgrade = true;
          this.options.notify({
            type: 'reload-required',
            message: this.catalogue.storage.reloadRequired,
          });
          throw new StorageError('reload-required', this.catalogue.storage.reloadRequired, {
            cause: error,
          });
        }
        lastError = error;
        continue; // open failed: try again after the next delay
      }
      const lossesBefore = this.losses;
      try {
        return await work(db);
      } catch (error) {
        // A transaction cut off by a lost connection aborts (AbortError) and the `close`
        // event follows: that is a loss too.
        let lost = isConnectionLost(error);
        if (!lost && isAbortError(error)) {
          if (this.losses === lossesBefore) await new Promise((resolve) => setTimeout(resolve, 0));
          lost = this.losses !== lossesBefore;
        }
        if (!lost || this.closedForUpgrade) throw error;
        lastError = error;
        this.forget(this.opening);
        if (attempt + 1 < attempts) this.options.notify({ type: 'reopened' });
      }
    }
    throw new StorageError('connection', this.catalogue.storage.connectionLost, {
      cause: lastError,
    });
  }

  /** Closes the connection for good (tests, or a page that is going away). */
  close(): void {
    this.disposed = true;
    this.current?.close();
    this.current = null;
    this.opening = null;
  }

  private forget(opening: Promise<GrainlineDb> | null): void {
    if (opening !== null && this.opening !== opening) return;
    try {
      this.current?.close();
    } catch {
      // Already closed.
    }
    this.current = null;
    this.opening = null;
  }

  private async handleVersionChange(db: GrainlineDb): Promise<void> {
    if (this.closingForUpgrade) return;
    this.closingForUpgrade = true;
    const timeout = this.options.flushTimeoutMs ?? 3000;
    let timer: ReturnType<typeof setTimeout> | undefined;
    try {
      await Promise.race([
        this.options.beforeClose(),
        new Promise((resolve) => {
          timer = setTimeout(resolve, timeout);
        }),
      ]);
    } catch {
      // A failed flush is reported by the saver itself; the other tab still needs us closed.
    } finally {
      clearTimeout(timer);
      this.closedForUpgrade = true;
      db.close();
      this.current = null;
      this.opening = null;
      this.options.notify({
        type: 'reload-required',
        message: this.catalogue.storage.reloadRequired,
      });
    }
  }
}
