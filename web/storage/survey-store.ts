/**
 * SurveyStore: every read and write of surveys, revisions, photos, settings and the
 * quarantine, for one tab. Stores: see db.ts.
 *
 * Guarantees:
 * - Every read is parsed and migrated (rows.ts). A value that fails is quarantined: copied
 *   with the reason into `quarantine` in the same transaction that (for `surveys` only)
 *   takes it out of the current set, so it is never in neither place. Revision rows stay
 *   where they are (append-only) and are copied once.
 * - Every save is one readwrite transaction: one revision row added and, unless it
 *   conflicts, the current row replaced. Either both happen or neither (transaction.ts).
 * - Saves carry the revision they were based on. If the current revision moved since, the
 *   save is kept as a 'conflict' revision and the current row is left alone: the later
 *   writer is told, and both versions are in `revisions`.
 * - A lost connection is reopened and the write retried (connection.ts); a retried save
 *   recognises its own earlier commit by its saveId, so it is never applied twice.
 * - Failures are StorageErrors with a sentence (errors.ts); quota errors say what to do.
 */
import {
  emptySurvey,
  en,
  validateRecord,
  type FieldMessage,
  type MessageCatalogue,
  type SurveyRecord,
} from '../../forms/index.js';
import { Connection, type StoreNotice } from './connection.js';
import {
  DB_NAME,
  DB_VERSION,
  type GrainlineDb,
  type PhotoRow,
  type QuarantineRow,
  type QuarantineSource,
  type RevisionKind,
  type StoreName,
} from './db.js';
import { classifyStorageError, StorageError } from './errors.js';
import { prefixBounds } from './geohash.js';
import { toJsonSafe } from './json-safe.js';
import {
  defaultIsInstalled,
  defaultStorageManager,
  Persistence,
  type StorageManagerLike,
  type StorageStatus,
} from './persistence.js';
import { readRevisionRow, readSurveyRow, toRevisionRow, toSurveyRow } from './rows.js';
import { TabChannel, type TabMessage } from './tab-channel.js';
import { inTransaction, quiet, type Tx } from './transaction.js';
import type { Outcome } from './derived.js';

export interface SurveyStoreOptions {
  /** Defaults to the page's `indexedDB`. Tests pass a fresh fake-indexeddb factory. */
  indexedDB?: IDBFactory;
  name?: string;
  /** Database version to open; only tests of upgrades change it. */
  version?: number;
  now?: () => Date;
  /** Defaults to `navigator.storage`; null for none. */
  storage?: StorageManagerLike | null;
  isInstalled?: () => boolean;
  /** Identifies this tab in revisions and tab messages. */
  tabId?: string;
  catalogue?: MessageCatalogue;
  /** Talk to other tabs over BroadcastChannel (default true). */
  broadcast?: boolean;
  /** BroadcastChannel name (default 'grainline-surveys'; tests isolate themselves). */
  channelName?: string;
}

/** One revision of a survey, parsed. */
export interface RevisionEntry {
  seq: number;
  surveyId: string;
  revision: number;
  savedAt: string;
  kind: RevisionKind;
  conflictWith: number | null;
  tabId: string | null;
  record: SurveyRecord;
  /** Schema version it was stored in (older ones are migrated on read). */
  fromVersion: number;
}

/** A stored value that could not be read, kept exactly as found. */
export interface QuarantineEntry {
  qid: number;
  source: QuarantineSource;
  sourceKey: string;
  reason: string;
  messages: FieldMessage[];
  quarantinedAt: string;
  raw: unknown;
}

export type SaveOutcome =
  | { status: 'saved'; record: SurveyRecord }
  | {
      status: 'conflict';
      /** This save, as kept in `revisions` (kind 'conflict'). */
      record: SurveyRecord;
      /** The current version it collided with; null when none could be read. */
      current: SurveyRecord | null;
      currentRevision: number;
    };

export interface WriteRevisionsOptions {
  /**
   * When the current pointer of a survey moves to a record of the batch:
   * 'newer' (default) — to the batch's highest revision if it is above the stored one;
   * 'always' — to the batch's last record of that survey; 'never'.
   */
  current?: 'newer' | 'always' | 'never';
  kind?: RevisionKind;
}

export interface WriteRevisionsResult {
  revisionsWritten: number;
  currentUpdated: string[];
}

export interface IntegrityReport {
  surveysChecked: number;
  revisionsChecked: number;
  newlyQuarantined: number;
}

type CurrentRead =
  | { kind: 'ok'; record: SurveyRecord; saveId: unknown }
  | { kind: 'missing' }
  | { kind: 'quarantined' };

/** Makes a value storable: a value structured clone refuses is kept as its description. */
function cloneable(raw: unknown): unknown {
  try {
    structuredClone(raw);
    return raw;
  } catch {
    return { $unclonable: Object.prototype.toString.call(raw), text: String(raw) };
  }
}

export class SurveyStore {
  readonly tabId: string;
  readonly channel: TabChannel | null;
  private readonly connection: Connection;
  private readonly persistence: Persistence;
  private readonly catalogue: MessageCatalogue;
  private readonly now: () => Date;
  private readonly noticeListeners = new Set<(n: StoreNotice) => void>();
  private readonly flushers = new Set<() => Promise<void>>();
  private deviceIdCache: string | null = null;
  private persistenceAsked = false;

  constructor(options: SurveyStoreOptions = {}) {
    const factory = options.indexedDB ?? globalThis.indexedDB;
    if (!factory) throw new Error('IndexedDB is not available in this environment');
    this.catalogue = options.catalogue ?? en;
    this.now = options.now ?? (() => new Date());
    this.tabId = options.tabId ?? crypto.randomUUID();
    this.channel =
      options.broadcast === false ? null : new TabChannel(this.tabId, options.channelName);
    this.persistence = new Persistence(
      options.storage === undefined ? defaultStorageManager() : options.storage,
      options.isInstalled ?? defaultIsInstalled,
      this.catalogue,
    );
    this.connection = new Connection({
      factory,
      name: options.name ?? DB_NAME,
      version: options.version ?? DB_VERSION,
      beforeClose: () => this.flushAll(),
      notify: (n) => this.notify(n),
      catalogue: this.catalogue,
    });
  }

  // ——— app shell hooks ———

  /** Subscribes to notices for the app shell (reload required, upgrade blocked, ...). */
  onNotice(listener: (n: StoreNotice) => void): () => void {
    this.noticeListeners.add(listener);
    return () => this.noticeListeners.delete(listener);
  }

  /** Registers work to run before the connection closes for an upgrade (DraftSaver does). */
  registerFlusher(flush: () => Promise<void>): () => void {
    this.flushers.add(flush);
    return () => this.flushers.delete(flush);
  }

  /** Messages from other tabs (DraftSaver listens). */
  onTabMessage(listener: (m: TabMessage) => void): () => void {
    return this.channel?.subscribe(listener) ?? (() => undefined);
  }

  postTabMessage(message: TabMessage): void {
    this.channel?.post(message);
  }

  /** True once another tab upgraded the database; this tab must reload. */
  get reloadRequired(): boolean {
    return this.connection.reloadRequired;
  }

  /** The open database, for tests and benchmarks that compare with bare IndexedDB. */
  database(): Promise<GrainlineDb> {
    return this.connection.db();
  }

  close(): void {
    this.connection.close();
    this.channel?.close();
    this.noticeListeners.clear();
  }

  // ——— surveys ———

  /** Creates and saves a new empty survey (revision 1) and returns it. */
  async createSurvey(init: { inspector?: string; team?: string } = {}): Promise<SurveyRecord> {
    const deviceId = await this.getDeviceId();
    const draft = { ...emptySurvey(deviceId, this.now()), ...init };
    const outcome = await this.saveDraft(draft, { baseRevision: 0 });
    // A fresh UUID cannot collide; anything else is a bug worth hearing about.
    if (outcome.status !== 'saved')
      throw new Error(`new survey ${draft.id} collided with a stored one`);
    return outcome.record;
  }

  /** The current version of a survey, or undefined when absent (or just quarantined). */
  async getSurvey(id: string): Promise<SurveyRecord | undefined> {
    const raw: unknown = await this.read((db) => db.get('surveys', id));
    if (raw === undefined) return undefined;
    const r = readSurveyRow(raw, id, this.catalogue);
    if (r.ok) return r.record;
    await this.quarantineCurrent([id]);
    return undefined;
  }

  /** Every readable current survey, most recently changed first. */
  async listSurveys(): Promise<SurveyRecord[]> {
    const values: unknown[] = await this.read((db) => db.getAll('surveys'));
    return this.sortNewest(await this.parseCurrentRows(await this.keysOf(values, null), values));
  }

  /** Surveys whose result snapshot has this outcome (the `outcome` index). */
  listByOutcome(outcome: Outcome): Promise<SurveyRecord[]> {
    return this.listByIndex('outcome', IDBKeyRange.only(outcome));
  }

  /** Surveys located in the geohash cell `prefix` or any cell inside it (the map). */
  listInCell(prefix: string): Promise<SurveyRecord[]> {
    const [lo, hi] = prefixBounds(prefix);
    return this.listByIndex('cell', IDBKeyRange.bound(lo, hi));
  }

  /** Surveys changed at or after the given ISO time. */
  listUpdatedSince(iso: string): Promise<SurveyRecord[]> {
    return this.listByIndex('updatedAt', IDBKeyRange.lowerBound(iso));
  }

  /**
   * Saves a draft: one revision, plus the current row unless another save got there first
   * (then `status: 'conflict'`, and this version is kept as a conflict revision).
   * The stored record gets `revision = baseRevision + 1` and `updatedAt = now`.
   */
  async saveDraft(record: SurveyRecord, options: { baseRevision: number }): Promise<SaveOutcome> {
    const { baseRevision } = options;
    if (!Number.isInteger(baseRevision) || baseRevision < 0) {
      throw new RangeError(`baseRevision must be an integer ≥ 0, got ${baseRevision}`);
    }
    const savedAt = this.now().toISOString();
    const valid = validateRecord(
      { ...record, revision: baseRevision + 1, updatedAt: savedAt },
      this.catalogue,
    );
    if (!valid.ok) {
      throw new StorageError('invalid', this.catalogue.storage.invalidDraft, {
        fieldMessages: valid.messages,
      });
    }
    const stored = valid.record;
    const saveId = crypto.randomUUID();
    const outcome = await this.write((db) =>
      inTransaction(db, ['surveys', 'revisions', 'quarantine'], 'readwrite', async (tx) => {
        const current = await this.readCurrentInTx(tx, stored.id);
        if (current.kind === 'ok' && current.saveId === saveId) {
          return { status: 'saved', record: current.record } as const; // retried after an unseen commit
        }
        const currentRevision =
          current.kind === 'ok'
            ? current.record.revision
            : await this.maxRevisionInTx(tx, stored.id);
        const revisions = tx.objectStore('revisions');
        if (currentRevision !== baseRevision) {
          await revisions.add(
            toRevisionRow(stored, 'conflict', savedAt, currentRevision, this.tabId),
          );
          return {
            status: 'conflict',
            record: stored,
            current: current.kind === 'ok' ? current.record : null,
            currentRevision,
          } as const;
        }
        await revisions.add(toRevisionRow(stored, 'save', savedAt, null, this.tabId));
        await tx.objectStore('surveys').put(toSurveyRow(stored, saveId));
        return { status: 'saved', record: stored } as const;
      }),
    );
    if (outcome.status === 'saved') {
      this.postTabMessage({
        type: 'saved',
        id: stored.id,
        tabId: this.tabId,
        revision: stored.revision,
      });
      this.askPersistenceOnce();
    }
    return outcome;
  }

  /**
   * Writes many revisions, and moves current pointers, in ONE transaction: all or nothing.
   * Every record must be a valid current-version record (migrate older ones first with
   * `parseStoredRecord`); if any is not, nothing is written and the StorageError lists the
   * messages with paths prefixed by the record's index in `records`.
   */
  async writeRevisions(
    records: readonly SurveyRecord[],
    options: WriteRevisionsOptions = {},
  ): Promise<WriteRevisionsResult> {
    const mode = options.current ?? 'newer';
    const kind = options.kind ?? 'import';
    const messages: FieldMessage[] = [];
    let invalid = 0;
    const valid: SurveyRecord[] = [];
    records.forEach((r, i) => {
      const v = validateRecord(r, this.catalogue);
      if (v.ok) valid.push(v.record);
      else {
        invalid++;
        for (const m of v.messages)
          messages.push({ path: m.path ? `${i}.${m.path}` : String(i), message: m.message });
      }
    });
    if (invalid > 0) {
      throw new StorageError('invalid', this.catalogue.storage.invalidBatch(invalid), {
        fieldMessages: messages,
      });
    }
    // The record each survey's pointer may move to.
    const candidates = new Map<string, SurveyRecord>();
    if (mode !== 'never') {
      for (const r of valid) {
        const prev = candidates.get(r.id);
        if (prev === undefined || mode === 'always' || r.revision >= prev.revision)
          candidates.set(r.id, r);
      }
    }
    const savedAt = this.now().toISOString();
    const saveId = crypto.randomUUID();
    const result = await this.write((db) =>
      inTransaction(db, ['surveys', 'revisions', 'quarantine'], 'readwrite', async (tx) => {
        const revisions = tx.objectStore('revisions');
        const surveys = tx.objectStore('surveys');
        // Requests are queued together and run in order; awaiting them as one keeps the
        // transaction busy (and fast) without a round trip per record.
        const adds = valid.map((r) =>
          quiet(revisions.add(toRevisionRow(r, kind, savedAt, null, this.tabId))),
        );
        const ids = [...candidates.keys()];
        // For a big batch, one read of the existing keys spares a get for every new survey.
        const existing = ids.length > 64 ? new Set<IDBValidKey>(await surveys.getAllKeys()) : null;
        const currentRaw = await Promise.all(
          ids.map((id) =>
            existing === null || existing.has(id) ? quiet(surveys.get(id)) : undefined,
          ),
        );
        await Promise.all(adds);
        const updated: string[] = [];
        const puts: Promise<unknown>[] = [];
        for (let i = 0; i < ids.length; i++) {
          const id = ids[i] as string;
          const next = candidates.get(id) as SurveyRecord;
          const raw: unknown = currentRaw[i];
          if (raw !== undefined) {
            const r = readSurveyRow(raw, id, this.catalogue);
            if (!r.ok) {
              puts.push(quiet(this.quarantineInTx(tx, 'surveys', id, raw, r.reason, r.messages)));
            } else if (mode === 'newer' && r.record.revision >= next.revision) {
              continue;
            }
          }
          puts.push(quiet(surveys.put(toSurveyRow(next, saveId))));
          updated.push(id);
        }
        await Promise.all(puts);
        return { revisionsWritten: valid.length, currentUpdated: updated };
      }),
    );
    if (result.revisionsWritten > 0) this.askPersistenceOnce();
    if (result.currentUpdated.length > 0) {
      this.postTabMessage({
        type: 'changed',
        ids: result.currentUpdated.length <= 1000 ? result.currentUpdated : null,
        tabId: this.tabId,
      });
    }
    return result;
  }

  /**
   * Sets `lastExportedAt` on the current version of each survey, if it is still the
   * revision that was exported (a newer one is not exported yet). This is bookkeeping, not
   * content: it writes no revision. Returns the ids marked.
   */
  async markExported(
    items: readonly { id: string; revision: number }[],
    at: Date,
  ): Promise<string[]> {
    const iso = at.toISOString();
    const marked = await this.write((db) =>
      inTransaction(db, ['surveys'], 'readwrite', async (tx) => {
        const out: string[] = [];
        for (const item of items) {
          const raw: unknown = await tx.store.get(item.id);
          if (raw === undefined) continue;
          const r = readSurveyRow(raw, item.id, this.catalogue);
          if (!r.ok || r.record.revision !== item.revision) continue;
          await tx.store.put({ ...r.row, record: { ...r.record, lastExportedAt: iso } });
          out.push(item.id);
        }
        return out;
      }),
    );
    for (const item of items) {
      if (marked.includes(item.id)) {
        this.postTabMessage({
          type: 'exported',
          id: item.id,
          tabId: this.tabId,
          revision: item.revision,
          at: iso,
        });
      }
    }
    return marked;
  }

  /** Every revision of a survey, oldest first; unreadable ones are quarantined (copied). */
  async getRevisions(id: string): Promise<RevisionEntry[]> {
    const [keys, values] = await this.read((db) =>
      inTransaction(db, ['revisions'], 'readonly', (tx) => {
        const index = tx.store.index('surveyId');
        return Promise.all([index.getAllKeys(id), index.getAll(id)]);
      }),
    );
    return this.parseRevisionRows(keys, values);
  }

  // ——— quarantine ———

  /** Everything quarantined, oldest first, with the raw value as it was found. */
  async listQuarantined(): Promise<QuarantineEntry[]> {
    const rows: unknown[] = await this.read((db) => db.getAll('quarantine'));
    return rows.map((row) => row as QuarantineEntry);
  }

  async countQuarantined(): Promise<number> {
    return this.read((db) => db.count('quarantine'));
  }

  /** How many current surveys are stored (readable or not yet checked). */
  async countSurveys(): Promise<number> {
    return this.read((db) => db.count('surveys'));
  }

  /**
   * Stored records that could not be read (quarantined from surveys, revisions or
   * settings). Drafts kept aside while a form is not yet valid are left out: the form shows
   * those at the fields.
   */
  async countUnreadable(): Promise<number> {
    const [all, drafts] = await this.read((db) =>
      inTransaction(db, ['quarantine'], 'readonly', (tx) =>
        Promise.all([
          tx.store.count(),
          tx.store.index('sourceKey').count(IDBKeyRange.bound(['draft'], ['draft', []])),
        ]),
      ),
    );
    return all - drafts;
  }

  /** The quarantine as JSON text (see json-safe.ts for non-JSON values), for export. */
  async exportQuarantined(): Promise<string> {
    const entries = await this.listQuarantined();
    const out = [];
    for (const e of entries) out.push({ ...e, raw: await toJsonSafe(e.raw) });
    return JSON.stringify(
      { kind: 'grainline-quarantine', exportedAt: this.now().toISOString(), entries: out },
      null,
      2,
    );
  }

  /**
   * Keeps a draft that is not valid to store (so it cannot be a revision), under its survey
   * id: the latest such draft of a survey replaces the previous one.
   */
  async quarantineDraft(id: string, raw: unknown, messages: FieldMessage[]): Promise<void> {
    const value = cloneable(raw);
    await this.write((db) =>
      inTransaction(db, ['quarantine'], 'readwrite', async (tx) => {
        const index = tx.store.index('sourceKey');
        const existing = await index.getKey(['draft', id]);
        const row: QuarantineRow = {
          source: 'draft',
          sourceKey: id,
          raw: value,
          reason: 'invalid-draft',
          messages,
          quarantinedAt: this.now().toISOString(),
        };
        if (existing !== undefined) row.qid = existing;
        await tx.store.put(row);
      }),
    );
  }

  /**
   * Reads every survey and revision row and quarantines the unreadable ones (the app may
   * run it when idle; reads do the same for what they touch).
   */
  async checkIntegrity(): Promise<IntegrityReport> {
    const before = await this.countQuarantined();
    const [sKeys, sValues] = await this.read((db) =>
      inTransaction(db, ['surveys'], 'readonly', (tx) =>
        Promise.all([tx.store.getAllKeys(), tx.store.getAll()]),
      ),
    );
    await this.parseCurrentRows(sKeys, sValues);
    const [rKeys, rValues] = await this.read((db) =>
      inTransaction(db, ['revisions'], 'readonly', (tx) =>
        Promise.all([tx.store.getAllKeys(), tx.store.getAll()]),
      ),
    );
    await this.parseRevisionRows(rKeys, rValues);
    const after = await this.countQuarantined();
    return {
      surveysChecked: sKeys.length,
      revisionsChecked: rKeys.length,
      newlyQuarantined: after - before,
    };
  }

  // ——— photos ———

  /** Stores a photo Blob (prepare it with photos.ts first). */
  async putPhoto(row: PhotoRow): Promise<void> {
    await this.write((db) =>
      inTransaction(db, ['photos'], 'readwrite', async (tx) => {
        await tx.store.put(row);
      }),
    );
  }

  /** A stored photo, or undefined when absent or unreadable. */
  async getPhoto(id: string): Promise<PhotoRow | undefined> {
    const raw: unknown = await this.read((db) => db.get('photos', id));
    if (typeof raw !== 'object' || raw === null) return undefined;
    const row = raw as Partial<PhotoRow>;
    return row.id === id && typeof Blob !== 'undefined' && row.blob instanceof Blob
      ? (row as PhotoRow)
      : undefined;
  }

  /** Ids of the photos stored for a survey. */
  async listPhotoIds(surveyId: string): Promise<string[]> {
    return this.read((db) => db.getAllKeysFromIndex('photos', 'surveyId', surveyId));
  }

  /** Deletes a photo Blob (the inspector removes it, e.g. to free space). */
  async deletePhoto(id: string): Promise<void> {
    await this.write((db) =>
      inTransaction(db, ['photos'], 'readwrite', async (tx) => {
        await tx.store.delete(id);
      }),
    );
  }

  // ——— settings and device ———

  async getSetting(key: string): Promise<unknown> {
    const row: unknown = await this.read((db) => db.get('settings', key));
    return typeof row === 'object' && row !== null ? (row as { value?: unknown }).value : undefined;
  }

  async setSetting(key: string, value: unknown): Promise<void> {
    await this.write((db) =>
      inTransaction(db, ['settings'], 'readwrite', async (tx) => {
        await tx.store.put({ key, value });
      }),
    );
  }

  /** This device's id: made once, kept in settings. */
  async getDeviceId(): Promise<string> {
    if (this.deviceIdCache !== null) return this.deviceIdCache;
    const id = await this.write((db) =>
      inTransaction(db, ['settings', 'quarantine'], 'readwrite', async (tx) => {
        const settings = tx.objectStore('settings');
        const row: unknown = await settings.get('deviceId');
        const value =
          typeof row === 'object' && row !== null ? (row as { value?: unknown }).value : undefined;
        if (typeof value === 'string' && value.length > 0 && value.length <= 100) return value;
        if (row !== undefined)
          await this.quarantineInTx(tx, 'settings', 'deviceId', row, 'bad-setting', []);
        const fresh = crypto.randomUUID();
        await settings.put({ key: 'deviceId', value: fresh });
        return fresh;
      }),
    );
    this.deviceIdCache = id;
    return id;
  }

  /** Usage, quota, persistence and the eviction warning, for the settings screen. */
  storageStatus(): Promise<StorageStatus> {
    return this.persistence.status();
  }

  /** Asks for persistent storage now (the first save does it anyway). */
  requestPersistence(): Promise<boolean | null> {
    return this.persistence.requestOnce();
  }

  // ——— internals ———

  /** After the first save: ask the browser to keep the data, and tell the shell its answer. */
  private askPersistenceOnce(): void {
    if (this.persistenceAsked) return;
    this.persistenceAsked = true;
    void this.persistence
      .requestOnce()
      .then((granted) => this.notify({ type: 'persistence', granted }));
  }

  private notify(n: StoreNotice): void {
    for (const listener of [...this.noticeListeners]) listener(n);
  }

  private async flushAll(): Promise<void> {
    await Promise.allSettled([...this.flushers].map((f) => f()));
  }

  private read<T>(work: (db: GrainlineDb) => Promise<T>): Promise<T> {
    return this.write(work);
  }

  private async write<T>(work: (db: GrainlineDb) => Promise<T>): Promise<T> {
    try {
      return await this.connection.run(work);
    } catch (error) {
      throw await classifyStorageError(error, () => this.persistence.estimate(), this.catalogue);
    }
  }

  private sortNewest(records: SurveyRecord[]): SurveyRecord[] {
    return records.sort((a, b) =>
      a.updatedAt < b.updatedAt ? 1 : a.updatedAt > b.updatedAt ? -1 : 0,
    );
  }

  private async listByIndex(
    index: 'outcome' | 'cell' | 'updatedAt',
    range: IDBKeyRange,
  ): Promise<SurveyRecord[]> {
    const values: unknown[] = await this.read((db) => db.getAllFromIndex('surveys', index, range));
    const keys = await this.keysOf(values, { index, range });
    return this.sortNewest(await this.parseCurrentRows(keys, values));
  }

  /**
   * The primary keys of `surveys` rows read with getAll. The store's key path is `id`, so
   * IndexedDB guarantees each row's `id` is its key; only if a row somehow lacks one are
   * the keys read again (same query, same order).
   */
  private async keysOf(
    values: unknown[],
    query: { index: 'outcome' | 'cell' | 'updatedAt'; range: IDBKeyRange } | null,
  ): Promise<IDBValidKey[]> {
    const keys: IDBValidKey[] = [];
    for (const v of values) {
      const id = typeof v === 'object' && v !== null ? (v as { id?: unknown }).id : undefined;
      if (typeof id !== 'string') {
        return this.read((db) =>
          query === null
            ? db.getAllKeys('surveys')
            : db.getAllKeysFromIndex('surveys', query.index, query.range),
        );
      }
      keys.push(id);
    }
    return keys;
  }

  private async parseCurrentRows(keys: IDBValidKey[], values: unknown[]): Promise<SurveyRecord[]> {
    const good: SurveyRecord[] = [];
    const bad: string[] = [];
    values.forEach((raw, i) => {
      const key = keys[i] as string;
      const r = readSurveyRow(raw, key, this.catalogue);
      if (r.ok) good.push(r.record);
      else bad.push(key);
    });
    if (bad.length > 0) await this.quarantineCurrent(bad);
    return good;
  }

  private async parseRevisionRows(
    keys: IDBValidKey[],
    values: unknown[],
  ): Promise<RevisionEntry[]> {
    const good: RevisionEntry[] = [];
    const bad: Array<{ seq: number; raw: unknown; reason: string; messages: FieldMessage[] }> = [];
    values.forEach((raw, i) => {
      const seq = keys[i] as number;
      const r = readRevisionRow(raw, this.catalogue);
      if (r.ok) {
        good.push({
          seq,
          surveyId: r.row.surveyId,
          revision: r.row.revision,
          savedAt: r.row.savedAt,
          kind: r.row.kind,
          conflictWith: typeof r.row.conflictWith === 'number' ? r.row.conflictWith : null,
          tabId: typeof r.row.tabId === 'string' ? r.row.tabId : null,
          record: r.record,
          fromVersion: r.fromVersion,
        });
      } else {
        bad.push({ seq, raw, reason: r.reason, messages: r.messages });
      }
    });
    if (bad.length > 0) {
      const added = await this.write((db) =>
        inTransaction(db, ['quarantine'], 'readwrite', async (tx) => {
          let n = 0;
          for (const b of bad) {
            const seen = await tx.store.index('sourceKey').getKey(['revisions', String(b.seq)]);
            if (seen !== undefined) continue;
            await tx.store.add({
              source: 'revisions',
              sourceKey: String(b.seq),
              raw: b.raw,
              reason: b.reason,
              messages: b.messages,
              quarantinedAt: this.now().toISOString(),
            });
            n++;
          }
          return n;
        }),
      );
      if (added > 0) this.notifyQuarantined(added);
    }
    return good.sort((a, b) => a.seq - b.seq);
  }

  /**
   * Moves unreadable current rows to the quarantine, re-checked inside the transaction (a
   * row may have been fixed or removed since it was read). The requests are queued
   * together, not one round trip each: a damaged store may hold thousands of such rows.
   */
  private async quarantineCurrent(ids: readonly string[]): Promise<void> {
    const moved = await this.write((db) =>
      inTransaction(db, ['surveys', 'quarantine'], 'readwrite', async (tx) => {
        const surveys = tx.objectStore('surveys');
        const raws: unknown[] = await Promise.all(ids.map((id) => quiet(surveys.get(id))));
        const writes: Promise<unknown>[] = [];
        ids.forEach((id, i) => {
          const raw = raws[i];
          if (raw === undefined) return;
          const r = readSurveyRow(raw, id, this.catalogue);
          if (r.ok) return;
          writes.push(
            quiet(this.quarantineInTx(tx, 'surveys', id, raw, r.reason, r.messages)),
            quiet(surveys.delete(id)),
          );
        });
        await Promise.all(writes);
        return writes.length / 2;
      }),
    );
    if (moved > 0) this.notifyQuarantined(moved);
  }

  private notifyQuarantined(count: number): void {
    this.notify({ type: 'quarantined', count, message: this.catalogue.storage.quarantined(count) });
  }

  /**
   * Reads the current row of `id` inside a transaction. An unreadable row is moved to the
   * quarantine right there, in the same transaction.
   */
  private async readCurrentInTx(
    tx: Tx<['surveys', 'quarantine', ...StoreName[]], 'readwrite'> | Tx<StoreName[], 'readwrite'>,
    id: string,
  ): Promise<CurrentRead> {
    const surveys = tx.objectStore('surveys');
    const raw: unknown = await surveys.get(id);
    if (raw === undefined) return { kind: 'missing' };
    const r = readSurveyRow(raw, id, this.catalogue);
    if (r.ok) return { kind: 'ok', record: r.record, saveId: r.row.saveId };
    await this.quarantineInTx(tx, 'surveys', id, raw, r.reason, r.messages);
    await surveys.delete(id);
    return { kind: 'quarantined' };
  }

  private async quarantineInTx(
    tx: Tx<StoreName[], 'readwrite'>,
    source: QuarantineSource,
    sourceKey: string,
    raw: unknown,
    reason: string,
    messages: FieldMessage[],
  ): Promise<void> {
    await tx.objectStore('quarantine').add({
      source,
      sourceKey,
      raw,
      reason,
      messages,
      quarantinedAt: this.now().toISOString(),
    });
  }

  /** Highest revision number stored for `id` in any revision row (0 when none). */
  private async maxRevisionInTx(tx: Tx<StoreName[], 'readwrite'>, id: string): Promise<number> {
    const index = tx.objectStore('revisions').index('surveyRevision');
    const cursor = await index.openKeyCursor(
      IDBKeyRange.bound([id, -Infinity], [id, Infinity]),
      'prev',
    );
    const key = cursor?.key as [string, number] | undefined;
    return key === undefined ? 0 : key[1];
  }
}
