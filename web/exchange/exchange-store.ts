/**
 * What exchange needs from device storage (web/storage's SurveyStore has all of it): the
 * current surveys, a survey's revisions, the all-or-nothing `writeRevisions`, photos, and
 * settings. Written as an interface so the merge can be tested against storage on a fake
 * IndexedDB and so this folder does not reach into storage's internals.
 */
import type { SurveyRecord } from '../../forms/index.js';

export interface StoredRevision {
  surveyId: string;
  revision: number;
  kind: string;
  record: SurveyRecord;
}

export interface StoredPhoto {
  id: string;
  surveyId: string;
  blob: Blob;
  type: string;
  width: number;
  height: number;
  bytes: number;
  storedAt: string;
}

export interface ExchangeStore {
  listSurveys(): Promise<SurveyRecord[]>;
  getRevisions(id: string): Promise<StoredRevision[]>;
  writeRevisions(
    records: readonly SurveyRecord[],
    options?: { current?: 'newer' | 'always' | 'never'; kind?: 'save' | 'conflict' | 'import' },
  ): Promise<{ revisionsWritten: number; currentUpdated: string[] }>;
  getPhoto(id: string): Promise<StoredPhoto | undefined>;
  putPhoto(row: StoredPhoto): Promise<void>;
  getSetting(key: string): Promise<unknown>;
  setSetting(key: string, value: unknown): Promise<void>;
  markExported?(items: readonly { id: string; revision: number }[], at: Date): Promise<string[]>;
}

/** A kept conflict: survey id and the revision number two versions share. */
export interface ConflictFlag {
  surveyId: string;
  revision: number;
  /** When the import that found it ran (ISO time). */
  foundAt: string;
}

/**
 * Settings key stamped after every import that wrote something. Imported records can carry
 * an old `updatedAt`, so a cache that looks for "saved since" (the map's) must rebuild when
 * this stamp changed.
 */
export const IMPORT_STAMP_SETTING = 'exchange.importedAt';

/** Settings key under which import conflicts are listed for the map and the list. */
export const CONFLICTS_SETTING = 'exchange.conflicts';

function isFlag(v: unknown): v is ConflictFlag {
  if (typeof v !== 'object' || v === null) return false;
  const f = v as Record<string, unknown>;
  return (
    typeof f['surveyId'] === 'string' &&
    typeof f['revision'] === 'number' &&
    typeof f['foundAt'] === 'string'
  );
}

/** The conflicts flagged so far (an unreadable setting reads as none). */
export async function readConflictFlags(
  store: Pick<ExchangeStore, 'getSetting'>,
): Promise<ConflictFlag[]> {
  const value = await store.getSetting(CONFLICTS_SETTING);
  return Array.isArray(value) ? value.filter(isFlag) : [];
}

/** Adds flags (one per survey id and revision). */
export async function addConflictFlags(
  store: Pick<ExchangeStore, 'getSetting' | 'setSetting'>,
  flags: readonly ConflictFlag[],
): Promise<void> {
  if (flags.length === 0) return;
  const known = await readConflictFlags(store);
  const keys = new Set(known.map((f) => `${f.surveyId}#${f.revision}`));
  const next = [...known];
  for (const f of flags) {
    const key = `${f.surveyId}#${f.revision}`;
    if (keys.has(key)) continue;
    keys.add(key);
    next.push(f);
  }
  await store.setSetting(CONFLICTS_SETTING, next);
}
