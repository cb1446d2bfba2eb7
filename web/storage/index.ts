/**
 * Device storage: surveys that are never lost. IndexedDB through idb; every module's
 * header says what it stores and which pitfall it guards against.
 *
 * - `SurveyStore` (survey-store.ts) — all reads and writes for one tab: `createSurvey`,
 *   `getSurvey`, `listSurveys`, `listByOutcome`, `listInCell`, `listUpdatedSince`,
 *   `getRevisions`, `saveDraft`, `writeRevisions` (many revisions and current pointers in
 *   one all-or-nothing transaction), `markExported`, `listQuarantined`,
 *   `exportQuarantined`, `countUnreadable`, `checkIntegrity`, photos, settings, `getDeviceId`,
 *   `storageStatus` (usage, quota, persistence, eviction warning), `onNotice`.
 * - Module functions over the page's store (default-store.ts): `listSurveys`, `getSurvey`,
 *   `getRevisions`, `writeRevisions`, `listQuarantined`, `exportQuarantined`,
 *   `createSurvey`, `markExported`, `storageStatus`, `onStorageNotice`, `getDefaultStore`.
 * - `DraftSaver` (draft-saver.ts) and `useSurveyDraft(id)` (use-survey-draft.ts) —
 *   autosave within 300 ms, flush on hide, conflict handling between tabs.
 * - `StorageNotices` (storage-notices.tsx) — records kept apart (with export), reload after
 *   another tab's upgrade, upgrade blocked by an older tab: shown by the app shell.
 * - Photos (photos.ts, jpeg-exif.ts) — downscale on the device, location EXIF stripped
 *   unless kept.
 * - `StorageError` (errors.ts) — failures with a sentence saying what to do.
 * - Derived values (derived.ts): `outcomeOf`, `cellOf`, `needsExport`; geohash.ts.
 * - db.ts — the database layout and upgrade steps; transaction.ts — the one transaction
 *   helper; connection.ts — reopen after a lost connection, close on version change.
 */
export { SurveyStore } from './survey-store.js';
export type {
  IntegrityReport,
  QuarantineEntry,
  RevisionEntry,
  SaveOutcome,
  SurveyStoreOptions,
  WriteRevisionsOptions,
  WriteRevisionsResult,
} from './survey-store.js';
export {
  createSurvey,
  exportQuarantined,
  getDefaultStore,
  getRevisions,
  getSurvey,
  listByOutcome,
  listInCell,
  listQuarantined,
  listSurveys,
  markExported,
  onStorageNotice,
  storageStatus,
  writeRevisions,
} from './default-store.js';
export { DEFAULT_DEBOUNCE_MS, DraftSaver } from './draft-saver.js';
export type {
  DraftConflict,
  DraftError,
  DraftPatch,
  DraftSaverOptions,
  DraftState,
  LifecycleTargets,
  SaveState,
} from './draft-saver.js';
export { useSurveyDraft } from './use-survey-draft.js';
export { StorageNotices } from './storage-notices.js';
export type { SurveyDraft } from './use-survey-draft.js';
export type { StoreNotice } from './connection.js';
export { StorageError, isQuotaError, NEAR_QUOTA_BYTES, NEAR_QUOTA_FRACTION } from './errors.js';
export type { StorageErrorKind } from './errors.js';
export type { StorageManagerLike, StorageStatus } from './persistence.js';
export { cellOf, needsExport, outcomeOf } from './derived.js';
export type { Outcome } from './derived.js';
export { CELL_PRECISION, decodeGeohash, encodeGeohash } from './geohash.js';
export {
  PHOTO_JPEG_QUALITY,
  PHOTO_MAX_EDGE_PX,
  fitWithin,
  photoMetaFor,
  photoRowFor,
  preparePhoto,
  savePhoto,
} from './photos.js';
export type { PreparedPhoto, PrepareOptions } from './photos.js';
export {
  exifHasGps,
  exifOrientation,
  findExifSegment,
  insertExif,
  stripExif,
  withUprightOrientation,
} from './jpeg-exif.js';
export { DB_NAME, DB_VERSION } from './db.js';
export type { PhotoRow, QuarantineSource, RevisionKind } from './db.js';
export { CHANNEL_NAME } from './tab-channel.js';
export type { TabMessage } from './tab-channel.js';
export { toJsonSafe } from './json-safe.js';
