/**
 * The IndexedDB database "grainline": what each object store holds, its indexes, and the
 * upgrade steps. Opened through idb, from any `IDBFactory` (the page's, or a fake one in
 * tests).
 *
 * Stores:
 * - `surveys` — the current version of each survey, key = survey id. The value is a row
 *   wrapping the record with fields derived from it for the indexes: `updatedAt`,
 *   `outcome` (posting level of the result snapshot, or 'unscreened') and `cell` (geohash
 *   of the location, absent without one; IndexedDB leaves such rows out of that index).
 * - `revisions` — append-only history, auto-increment key. Every save adds one row; no code
 *   path updates or deletes a row here. Conflicting saves are rows with kind 'conflict'.
 * - `photos` — image Blobs (already downscaled on the device), key = photo id, which the
 *   record's `photos` list refers to.
 * - `settings` — small key/value pairs (device id, ...).
 * - `quarantine` — stored values that failed to parse, kept exactly as read, with why.
 *
 * Rows read back are `unknown` until parsed (rows.ts): a store may hold anything an older
 * build, a bug or a disk fault left there.
 */
import { wrap, type DBSchema, type IDBPDatabase, type IDBPTransaction, type StoreNames } from 'idb';
import type { FieldMessage } from '../../forms/index.js';

export const DB_NAME = 'grainline';
/** Database (layout) version. Bump it with a new step in `upgrade` below. */
export const DB_VERSION = 1;

/** How a revision row came to be. */
export type RevisionKind = 'save' | 'conflict' | 'import';

export interface SurveyRow {
  id: string;
  revision: number;
  updatedAt: string;
  outcome: string;
  cell?: string;
  /** The save that wrote this row: lets a retried save recognise its own earlier commit. */
  saveId: string;
  record: unknown;
}

export interface RevisionRow {
  seq?: number;
  surveyId: string;
  revision: number;
  savedAt: string;
  kind: RevisionKind;
  /** For kind 'conflict': the current revision this save collided with. */
  conflictWith: number | null;
  /** The tab (page instance) that wrote it, when known. */
  tabId: string | null;
  record: unknown;
}

export interface PhotoRow {
  id: string;
  surveyId: string;
  blob: Blob;
  type: string;
  width: number;
  height: number;
  bytes: number;
  storedAt: string;
}

export interface SettingRow {
  key: string;
  value: unknown;
}

/** Where a quarantined value was found. */
export type QuarantineSource = 'surveys' | 'revisions' | 'draft' | 'settings';

export interface QuarantineRow {
  qid?: number;
  source: QuarantineSource;
  /** The key it had there (survey id, revision seq as text, or draft survey id). */
  sourceKey: string;
  /** The value exactly as read. */
  raw: unknown;
  reason: string;
  messages: FieldMessage[];
  quarantinedAt: string;
}

export interface GrainlineSchema extends DBSchema {
  surveys: {
    key: string;
    value: SurveyRow;
    indexes: { updatedAt: string; outcome: string; cell: string };
  };
  revisions: {
    key: number;
    value: RevisionRow;
    indexes: { surveyId: string; surveyRevision: [string, number] };
  };
  photos: { key: string; value: PhotoRow; indexes: { surveyId: string } };
  settings: { key: string; value: SettingRow };
  quarantine: {
    key: number;
    value: QuarantineRow;
    indexes: { sourceKey: [string, string]; quarantinedAt: string };
  };
}

export type GrainlineDb = IDBPDatabase<GrainlineSchema>;
export type StoreName = StoreNames<GrainlineSchema>;

/**
 * Upgrade steps, one per database version. Never edit a past step: users' databases were
 * built by it. Add `if (oldVersion < 2) { ... }` below for the next layout change.
 */
export function upgrade(
  db: IDBPDatabase<GrainlineSchema>,
  oldVersion: number,
  _tx: IDBPTransaction<GrainlineSchema, StoreName[], 'versionchange'>,
): void {
  if (oldVersion < 1) {
    const surveys = db.createObjectStore('surveys', { keyPath: 'id' });
    surveys.createIndex('updatedAt', 'updatedAt');
    surveys.createIndex('outcome', 'outcome');
    surveys.createIndex('cell', 'cell');
    const revisions = db.createObjectStore('revisions', { keyPath: 'seq', autoIncrement: true });
    revisions.createIndex('surveyId', 'surveyId');
    revisions.createIndex('surveyRevision', ['surveyId', 'revision']);
    const photos = db.createObjectStore('photos', { keyPath: 'id' });
    photos.createIndex('surveyId', 'surveyId');
    db.createObjectStore('settings', { keyPath: 'key' });
    const quarantine = db.createObjectStore('quarantine', { keyPath: 'qid', autoIncrement: true });
    quarantine.createIndex('sourceKey', ['source', 'sourceKey']);
    quarantine.createIndex('quarantinedAt', 'quarantinedAt');
  }
}

export interface OpenHandlers {
  /** Our open waits: an older tab holds the database open at an older version. */
  blocked?(): void;
  /** A newer version (or a deletion) is waiting for this connection to close. */
  blocking?(db: GrainlineDb): void;
  /** The browser closed the connection (storage cleared, disk error, backgrounded tab). */
  terminated?(): void;
}

/**
 * Opens the database from `factory`. Same as idb's `openDB` (whose code it follows), except
 * that the factory is a parameter, so tests can give each case its own fake IndexedDB.
 */
export function openDatabase(
  factory: IDBFactory,
  name: string,
  version: number,
  handlers: OpenHandlers = {},
): Promise<GrainlineDb> {
  const request = factory.open(name, version);
  const opened = wrap(request) as unknown as Promise<GrainlineDb>;
  request.addEventListener('upgradeneeded', (event) => {
    const db = wrap(request.result) as unknown as GrainlineDb;
    const tx = wrap(request.transaction as IDBTransaction) as unknown as IDBPTransaction<
      GrainlineSchema,
      StoreName[],
      'versionchange'
    >;
    upgrade(db, event.oldVersion, tx);
  });
  request.addEventListener('blocked', () => handlers.blocked?.());
  opened
    .then((db) => {
      db.addEventListener('close', () => handlers.terminated?.());
      db.addEventListener('versionchange', () => handlers.blocking?.(db));
    })
    .catch(() => undefined); // the caller gets the rejection through `opened`
  return opened;
}
