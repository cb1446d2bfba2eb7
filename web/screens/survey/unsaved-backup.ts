/**
 * A safety net for the last quarter second. The draft saver writes each change to IndexedDB
 * within 200 ms and flushes on `pagehide`, but a transaction started while the page unloads
 * (a reload, a pull-to-refresh) may never complete. So when the page goes away with a change
 * not yet saved, the record as shown is also put in localStorage, synchronously; when the
 * survey opens again and IndexedDB still holds the revision that change was based on, the
 * change is applied again and saved. Otherwise (it was saved after all, or the survey moved
 * on elsewhere) the copy is dropped: the stored revisions win.
 */
import type { SurveyRecord } from '../../../forms/index.js';

const key = (id: string) => `grainline.unsavedDraft.${id}`;

interface Backup {
  baseRevision: number;
  record: SurveyRecord;
}

/** Keeps `record` (with changes not yet saved) until the survey opens again. */
export function backupUnsaved(record: SurveyRecord): void {
  try {
    const value: Backup = { baseRevision: record.revision, record };
    localStorage.setItem(key(record.id), JSON.stringify(value));
  } catch {
    // Full or unavailable: nothing more can be done while the page unloads.
  }
}

/** Forgets the copy (the change reached IndexedDB). */
export function dropBackup(id: string): void {
  try {
    localStorage.removeItem(key(id));
  } catch {
    // Nothing to do.
  }
}

/**
 * The record to restore for a survey just loaded as `loaded`, or null. The copy is removed
 * either way.
 */
export function takeBackup(loaded: SurveyRecord): SurveyRecord | null {
  let raw: string | null = null;
  try {
    raw = localStorage.getItem(key(loaded.id));
  } catch {
    return null;
  }
  if (raw === null) return null;
  dropBackup(loaded.id);
  try {
    const b = JSON.parse(raw) as Partial<Backup>;
    if (typeof b !== 'object' || b === null || typeof b.baseRevision !== 'number') return null;
    if (!b.record || b.record.id !== loaded.id || b.baseRevision !== loaded.revision) return null;
    return { ...b.record, revision: loaded.revision, updatedAt: loaded.updatedAt };
  } catch {
    return null;
  }
}
