/**
 * The page's one SurveyStore (the page's IndexedDB, BroadcastChannel and
 * navigator.storage), created on first use, and plain functions over it for modules that
 * do not need a store of their own (export, import, building list, map, settings).
 */
import type { SurveyRecord } from '../../forms/index.js';
import type { StoreNotice } from './connection.js';
import type { Outcome } from './derived.js';
import type { StorageStatus } from './persistence.js';
import {
  SurveyStore,
  type QuarantineEntry,
  type RevisionEntry,
  type WriteRevisionsOptions,
  type WriteRevisionsResult,
} from './survey-store.js';

let store: SurveyStore | null = null;

export function getDefaultStore(): SurveyStore {
  store ??= new SurveyStore();
  return store;
}

/** Every readable current survey, most recently changed first. */
export const listSurveys = (): Promise<SurveyRecord[]> => getDefaultStore().listSurveys();
/** The current version of one survey, or undefined. */
export const getSurvey = (id: string): Promise<SurveyRecord | undefined> =>
  getDefaultStore().getSurvey(id);
/** Every revision of one survey, oldest first. */
export const getRevisions = (id: string): Promise<RevisionEntry[]> =>
  getDefaultStore().getRevisions(id);
/** Many revisions and current pointers in one all-or-nothing transaction. */
export const writeRevisions = (
  records: readonly SurveyRecord[],
  options?: WriteRevisionsOptions,
): Promise<WriteRevisionsResult> => getDefaultStore().writeRevisions(records, options);
/** Everything that could not be read, kept as found. */
export const listQuarantined = (): Promise<QuarantineEntry[]> =>
  getDefaultStore().listQuarantined();
/** The quarantine as JSON text. */
export const exportQuarantined = (): Promise<string> => getDefaultStore().exportQuarantined();
/** Creates and saves a new empty survey. */
export const createSurvey = (init?: { inspector?: string; team?: string }): Promise<SurveyRecord> =>
  getDefaultStore().createSurvey(init);
/** Marks exported revisions (no new revision is written). */
export const markExported = (
  items: readonly { id: string; revision: number }[],
  at: Date,
): Promise<string[]> => getDefaultStore().markExported(items, at);
export const listByOutcome = (outcome: Outcome): Promise<SurveyRecord[]> =>
  getDefaultStore().listByOutcome(outcome);
export const listInCell = (prefix: string): Promise<SurveyRecord[]> =>
  getDefaultStore().listInCell(prefix);
/** Usage, quota, persistence and the eviction warning, for the settings screen. */
export const storageStatus = (): Promise<StorageStatus> => getDefaultStore().storageStatus();
/** Subscribes the app shell to storage notices (reload required, upgrade blocked, ...). */
export const onStorageNotice = (listener: (n: StoreNotice) => void): (() => void) =>
  getDefaultStore().onNotice(listener);
