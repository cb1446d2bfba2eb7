/**
 * DraftSaver: autosave for one survey being edited in this tab. No framework; the preact
 * hook (use-survey-draft.ts) is a thin wrapper. Stores through SurveyStore.
 *
 * - Each change is written within `debounceMs` (200 ms): the first unsaved change starts the
 *   timer and later changes join that save, so steady typing still reaches the disk every
 *   fifth of a second (a trailing-only debounce would wait for a pause).
 * - Saves run one at a time, in order; a change made while a save runs goes in the next.
 * - `saveState` says 'saved' only after the save's transaction has completed (`done`).
 * - On `visibilitychange` to hidden and on `pagehide` the pending change is written at
 *   once, and the flush is registered with web/app/pending-writes.ts so an app update waits
 *   for it. (A page being unloaded may still lose a transaction started in `pagehide`; the
 *   hidden event usually comes first, and the debounce keeps the loss under 200 ms.)
 * - A draft that is not valid to store cannot be a revision; it is kept in the quarantine
 *   (one per survey) and the state is 'error' with field messages, until it is valid again.
 * - Another tab: a save that finds the stored revision moved on is kept as a conflict
 *   revision and `conflict` is set; the inspector picks `keepMine()` or `takeTheirs()`, and
 *   whichever is not picked stays in the revisions. A 'saved' message from another tab
 *   raises the conflict before the next save, or (with nothing unsaved here) just shows the
 *   new version.
 */
import { registerFlusher as registerAppFlusher } from '../app/pending-writes.js';
import {
  en,
  validateRecord,
  type FieldMessage,
  type MessageCatalogue,
  type SurveyRecord,
} from '../../forms/index.js';
import { StorageError, type StorageErrorKind } from './errors.js';
import type { SurveyStore } from './survey-store.js';
import type { TabMessage } from './tab-channel.js';

export type SaveState = 'saved' | 'saving' | 'unsaved' | 'error';

export interface DraftError {
  kind: StorageErrorKind;
  message: string;
  /** For kind 'invalid': messages per field path. */
  fieldMessages: FieldMessage[];
}

export interface DraftConflict {
  /** The version saved elsewhere; null when it could not be read. */
  theirs: SurveyRecord | null;
  theirRevision: number;
  message: string;
}

export interface DraftState {
  /** null until loaded, or when the survey is not on this device. */
  record: SurveyRecord | null;
  loading: boolean;
  saveState: SaveState;
  error: DraftError | null;
  conflict: DraftConflict | null;
  /** Number of other tabs that have this survey open. */
  otherTabs: number;
  /** Set when a newer version saved in another tab replaced the one shown here. */
  updatedElsewhere: boolean;
}

export type DraftPatch = Partial<SurveyRecord> | ((record: SurveyRecord) => SurveyRecord);

/** Where page-lifecycle events come from (defaults to the page's document and window). */
export interface LifecycleTargets {
  document: Pick<Document, 'addEventListener' | 'removeEventListener' | 'visibilityState'> | null;
  window: Pick<Window, 'addEventListener' | 'removeEventListener'> | null;
}

export interface DraftSaverOptions {
  store: SurveyStore;
  id: string;
  /** Longest time from a change to the start of its save, ms. */
  debounceMs?: number;
  /** Page events to flush on; `false` for none (tests, workers). */
  lifecycle?: LifecycleTargets | false;
  /** Register with web/app/pending-writes.ts (default true). */
  registerWithApp?: boolean;
  /** Waits before retrying a failed save that may succeed later (not quota, not invalid). */
  retryDelaysMs?: readonly number[];
  catalogue?: MessageCatalogue;
}

/**
 * 200 ms keeps every change within the ~300 ms the app promises, with room for validation
 * and the write on a slow phone: measured in Chromium under 4× CPU throttling
 * (test/bench/storage-browser.bench.ts), the rest of a save took 35–100 ms (p50–p95), so
 * 250 ms left p95 near 370 ms. Source: that measurement; common practice, no source.
 */
export const DEFAULT_DEBOUNCE_MS = 200;
const DEFAULT_RETRY_DELAYS_MS = [1000, 3000, 10000];

export class DraftSaver {
  private state: DraftState = {
    record: null,
    loading: true,
    saveState: 'saved',
    error: null,
    conflict: null,
    otherTabs: 0,
    updatedElsewhere: false,
  };
  private readonly listeners = new Set<(s: DraftState) => void>();
  private readonly store: SurveyStore;
  private readonly id: string;
  private readonly debounceMs: number;
  private readonly catalogue: MessageCatalogue;
  private readonly retryDelays: readonly number[];
  private readonly cleanups: Array<() => void> = [];
  private readonly otherTabIds = new Set<string>();
  /** Revision the in-memory record is based on (what the store must still hold to accept). */
  private baseRevision = 0;
  /** Change counter: `edits` counts updates, `persisted` the last one safely written. */
  private edits = 0;
  private persisted = 0;
  private inFlight = false;
  private timer: ReturnType<typeof setTimeout> | null = null;
  private retryTimer: ReturnType<typeof setTimeout> | null = null;
  private retries = 0;
  private chain: Promise<void> = Promise.resolve();
  private disposed = false;

  constructor(options: DraftSaverOptions) {
    this.store = options.store;
    this.id = options.id;
    this.debounceMs = options.debounceMs ?? DEFAULT_DEBOUNCE_MS;
    this.catalogue = options.catalogue ?? en;
    this.retryDelays = options.retryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS;

    this.cleanups.push(this.store.registerFlusher(() => this.flush()));
    if (options.registerWithApp !== false)
      this.cleanups.push(registerAppFlusher(() => this.flushOrThrow()));
    this.cleanups.push(this.store.onTabMessage((m) => this.onTabMessage(m)));

    const targets: LifecycleTargets | false =
      options.lifecycle ??
      ({
        document: typeof document === 'undefined' ? null : document,
        window: typeof window === 'undefined' ? null : window,
      } satisfies LifecycleTargets);
    if (targets) {
      const doc = targets.document;
      const onVisibility = () => {
        if (doc?.visibilityState === 'hidden') void this.flush();
      };
      const onPageHide = () => void this.flush();
      doc?.addEventListener('visibilitychange', onVisibility);
      targets.window?.addEventListener('pagehide', onPageHide);
      this.cleanups.push(() => {
        doc?.removeEventListener('visibilitychange', onVisibility);
        targets.window?.removeEventListener('pagehide', onPageHide);
      });
    }
  }

  getState(): DraftState {
    return this.state;
  }

  /** Calls `listener` now and on every change; returns the unsubscribe function. */
  subscribe(listener: (s: DraftState) => void): () => void {
    this.listeners.add(listener);
    listener(this.state);
    return () => this.listeners.delete(listener);
  }

  /** Reads the survey from storage. */
  async load(): Promise<void> {
    try {
      const record = await this.store.getSurvey(this.id);
      if (this.disposed) return;
      if (record === undefined) {
        this.set({
          loading: false,
          record: null,
          error: { kind: 'not-found', message: this.catalogue.storage.notFound, fieldMessages: [] },
        });
        return;
      }
      this.baseRevision = record.revision;
      this.set({ loading: false, record, error: null });
      this.store.postTabMessage({ type: 'open', id: this.id, tabId: this.store.tabId });
    } catch (error) {
      this.set({ loading: false, error: this.toDraftError(error) });
    }
  }

  /**
   * Applies a change: a partial record (merged at the top level) or a function of the
   * current record. Saved within `debounceMs`.
   */
  update(patch: DraftPatch): void {
    const record = this.state.record;
    if (record === null) throw new Error(`update() on survey ${this.id} before it was loaded`);
    const next = typeof patch === 'function' ? patch(record) : { ...record, ...patch };
    this.edits++;
    this.set({
      record: next,
      updatedElsewhere: false,
      saveState: this.inFlight ? 'saving' : 'unsaved',
    });
    this.schedule();
  }

  /** Writes any pending change now; resolves when it is durable (or failed: see state). */
  flush(): Promise<void> {
    this.clearTimer();
    this.chain = this.chain.then(() => this.saveOnce()).catch(() => undefined);
    return this.chain;
  }

  /** Like flush(), but rejects when the change could not be saved (for app updates). */
  async flushOrThrow(): Promise<void> {
    await this.flush();
    if (this.edits !== this.persisted) {
      throw new Error(this.state.error?.message ?? `survey ${this.id} has unsaved changes`);
    }
  }

  /** Tries a failed save again now. */
  retry(): Promise<void> {
    this.retries = 0;
    return this.flush();
  }

  /** Resolves a conflict by keeping this tab's version: it becomes the current one. */
  keepMine(): Promise<void> {
    const c = this.state.conflict;
    if (c === null) return Promise.resolve();
    this.baseRevision = c.theirRevision;
    this.edits++; // force a save on top of theirs
    this.set({ conflict: null, saveState: 'unsaved' });
    return this.flush();
  }

  /**
   * Resolves a conflict by taking the other version. This tab's version is not lost: it is
   * in the revisions, marked as a conflict.
   */
  async takeTheirs(): Promise<void> {
    const c = this.state.conflict;
    if (c === null) return;
    await this.flush(); // our latest edits go to the revisions first
    const theirs = c.theirs ?? (await this.store.getSurvey(this.id)) ?? null;
    this.baseRevision = theirs?.revision ?? c.theirRevision;
    this.persisted = this.edits;
    this.set({ conflict: null, record: theirs, saveState: 'saved', error: null });
  }

  /** Flushes, then stops listening. */
  async dispose(): Promise<void> {
    if (this.disposed) return;
    await this.flush();
    this.disposed = true;
    this.clearTimer();
    if (this.retryTimer !== null) clearTimeout(this.retryTimer);
    this.store.postTabMessage({ type: 'closed', id: this.id, tabId: this.store.tabId });
    for (const c of this.cleanups.splice(0)) c();
    this.listeners.clear();
  }

  // ——— internals ———

  private set(patch: Partial<DraftState>): void {
    this.state = { ...this.state, ...patch };
    for (const listener of [...this.listeners]) listener(this.state);
  }

  private schedule(): void {
    if (this.timer !== null || this.disposed) return;
    this.timer = setTimeout(() => {
      this.timer = null;
      void this.flush();
    }, this.debounceMs);
  }

  private clearTimer(): void {
    if (this.timer !== null) clearTimeout(this.timer);
    this.timer = null;
  }

  private async saveOnce(): Promise<void> {
    const record = this.state.record;
    if (record === null || this.edits === this.persisted) return;
    const edit = this.edits;
    const valid = validateRecord(record, this.catalogue);
    if (!valid.ok) {
      // Not valid to store: keep it aside so nothing typed is lost, and say what is wrong.
      try {
        await this.store.quarantineDraft(this.id, record, valid.messages);
      } catch {
        // Reported below either way; the record is still on screen.
      }
      this.set({
        saveState: 'error',
        error: {
          kind: 'invalid',
          message: this.catalogue.storage.invalidDraft,
          fieldMessages: valid.messages,
        },
      });
      return;
    }
    this.inFlight = true;
    this.set({ saveState: 'saving' });
    let patch: Partial<DraftState>;
    try {
      const outcome = await this.store.saveDraft(valid.record, { baseRevision: this.baseRevision });
      this.retries = 0;
      this.persisted = Math.max(this.persisted, edit);
      if (outcome.status === 'saved') {
        this.baseRevision = outcome.record.revision;
        const now = this.state.record ?? outcome.record;
        // Edits made while saving keep their content; they take the saved numbering.
        const shown =
          this.edits === edit
            ? outcome.record
            : { ...now, revision: outcome.record.revision, updatedAt: outcome.record.updatedAt };
        patch = { record: shown, error: null };
      } else {
        patch = {
          error: null,
          conflict: {
            theirs: outcome.current,
            theirRevision: outcome.currentRevision,
            message: this.catalogue.storage.conflict,
          },
        };
      }
    } catch (error) {
      patch = { error: this.toDraftError(error) };
    } finally {
      this.inFlight = false;
    }
    const failed = patch.error != null;
    // One state change per save: 'saved' is announced together with what was saved.
    this.set({
      ...patch,
      saveState: failed ? 'error' : this.edits === this.persisted ? 'saved' : 'unsaved',
    });
    if (failed) this.scheduleRetry((patch.error as DraftError).kind);
    else if (this.edits !== this.persisted) this.schedule();
  }

  private scheduleRetry(kind: StorageErrorKind): void {
    // Quota needs the inspector to free space; 'invalid' needs a fix; reload needs a reload.
    if (kind === 'quota' || kind === 'invalid' || kind === 'reload-required' || this.disposed)
      return;
    const delay = this.retryDelays[this.retries];
    if (delay === undefined) return;
    this.retries++;
    this.retryTimer = setTimeout(() => void this.flush(), delay);
  }

  private toDraftError(error: unknown): DraftError {
    if (error instanceof StorageError) {
      return { kind: error.kind, message: error.userMessage, fieldMessages: error.fieldMessages };
    }
    const detail = error instanceof Error ? error.message : String(error);
    return { kind: 'unknown', message: this.catalogue.storage.unknown(detail), fieldMessages: [] };
  }

  private onTabMessage(m: TabMessage): void {
    if (this.disposed) return;
    if (m.type === 'changed') {
      if (m.ids === null || m.ids.includes(this.id)) void this.checkForNewer();
      return;
    }
    if (m.id !== this.id) return;
    switch (m.type) {
      case 'open':
        this.otherTabIds.add(m.tabId);
        this.store.postTabMessage({ type: 'here', id: this.id, tabId: this.store.tabId });
        this.set({ otherTabs: this.otherTabIds.size });
        break;
      case 'here':
        this.otherTabIds.add(m.tabId);
        this.set({ otherTabs: this.otherTabIds.size });
        break;
      case 'closed':
        this.otherTabIds.delete(m.tabId);
        this.set({ otherTabs: this.otherTabIds.size });
        break;
      case 'saved':
        if (m.revision > this.baseRevision) void this.checkForNewer();
        break;
      case 'exported': {
        const r = this.state.record;
        if (r !== null && m.revision === this.baseRevision)
          this.set({ record: { ...r, lastExportedAt: m.at } });
        break;
      }
    }
  }

  /** Another tab saved this survey: show it, or raise the conflict if we have changes. */
  private async checkForNewer(): Promise<void> {
    // Let a save of ours that is under way finish first, so we compare with its result.
    await this.chain;
    let theirs: SurveyRecord | undefined;
    try {
      theirs = await this.store.getSurvey(this.id);
    } catch {
      return; // the revision check at the next save still protects the data
    }
    if (theirs === undefined || theirs.revision <= this.baseRevision || this.disposed) return;
    const unsaved = this.edits !== this.persisted || this.inFlight;
    if (!unsaved && this.state.conflict === null) {
      this.baseRevision = theirs.revision;
      this.set({ record: theirs, updatedElsewhere: true });
      return;
    }
    this.set({
      conflict: {
        theirs,
        theirRevision: theirs.revision,
        message: this.catalogue.storage.conflict,
      },
    });
  }
}
