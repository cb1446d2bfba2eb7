/**
 * Importing a file: our GeoJSON (any earlier schema version) or our zip export (GeoJSON plus
 * photos). Steps:
 *
 * 1. read and validate every Feature (geojson-import.ts); bad ones are listed with reasons;
 * 2. strict mode: if any Feature is bad, stop here, writing nothing;
 * 3. look up what the device holds for the incoming survey ids and plan the merge
 *    (merge-plan.ts): duplicates dropped, new revisions added, conflicts kept beside;
 * 4. write the plan with storage's `writeRevisions`: ONE transaction, all or nothing, so a
 *    failed import leaves stored data untouched; the current pointer moves only to a newer
 *    revision;
 * 5. flag the conflicts found, and add photos from a zip that the device does not have.
 *
 * Conflict variants are written in the same transaction as revisions with the shared
 * revision number (storage keeps revision rows append-only and allows that), placed before
 * the record holding the slot, so they never become current. They are flagged in settings
 * (exchange-store.ts) for the map and the building list.
 */
import { unzipSync } from 'fflate';
import type { SurveyRecord } from '../../forms/index.js';
import { t } from '../i18n/index.js';
import { sameSurveyContent } from './same-content.js';
import { IMPORT_STAMP_SETTING, addConflictFlags, type ExchangeStore } from './exchange-store.js';
import { readExchangeText, type RejectedFeature } from './geojson-import.js';
import { planMerge, type ExistingSurvey } from './merge-plan.js';
import { ZIP_ENTRIES } from './zip-export.js';

/** Largest file read, in MB: beyond it a phone runs out of memory before JSON.parse ends. */
export const MAX_IMPORT_MB = 500;

export interface ImportOptions {
  /** All of the file or nothing: any bad Feature stops the import before it writes. */
  strict: boolean;
  /** Clock, for tests. */
  now?: () => Date;
}

export interface ConflictNote {
  surveyId: string;
  revision: number;
  address: string;
  /** Inspectors of the version holding the revision and of the one kept beside it. */
  holderInspector: string;
  variantInspector: string;
}

interface Counts {
  fileName: string;
  /** Features that passed validation. */
  accepted: number;
  rejected: RejectedFeature[];
}

export type ImportReport =
  | { status: 'refused'; fileName: string; reason: string }
  | ({ status: 'refused-strict' } & Counts)
  | ({ status: 'failed'; reason: string } & Counts)
  | ({
      status: 'imported';
      newSurveys: number;
      newRevisions: number;
      newerCurrent: number;
      duplicates: number;
      conflicts: ConflictNote[];
      /** Accepted surveys without a location (imported; listed beside the map). */
      withoutLocation: number;
      /** From records of an earlier schema version, migrated. */
      migrated: number;
      photosAdded: number;
      photosFailed: number;
    } & Counts);

/** What the device holds for the incoming ids, reading full histories only where needed. */
async function lookupExisting(
  store: ExchangeStore,
  incoming: readonly SurveyRecord[],
): Promise<Map<string, ExistingSurvey>> {
  const current = new Map<string, SurveyRecord>();
  for (const r of await store.listSurveys()) current.set(r.id, r);
  const needHistory = new Set<string>();
  for (const r of incoming) {
    const held = current.get(r.id);
    // Only a record that is not simply the current one again needs the survey's history.
    if (held && (held.revision !== r.revision || !sameSurveyContent(held, r)))
      needHistory.add(r.id);
  }
  const out = new Map<string, ExistingSurvey>();
  for (const r of incoming) {
    const held = current.get(r.id);
    if (!held || out.has(r.id)) continue;
    if (!needHistory.has(r.id)) {
      out.set(r.id, { revisions: [held], conflicts: [] });
      continue;
    }
    const rows = await store.getRevisions(r.id);
    const revisions: SurveyRecord[] = [held];
    const conflicts: SurveyRecord[] = [];
    for (const row of rows) {
      const slot = revisions.find((x) => x.revision === row.revision);
      if (!slot) revisions.push(row.record);
      else if (
        !sameSurveyContent(slot, row.record) &&
        !conflicts.some((c) => sameSurveyContent(c, row.record))
      )
        conflicts.push(row.record);
    }
    out.set(r.id, { revisions, conflicts });
  }
  return out;
}

const PHOTO_TYPES: Readonly<Record<string, string>> = {
  jpg: 'image/jpeg',
  jpeg: 'image/jpeg',
  png: 'image/png',
  webp: 'image/webp',
  heic: 'image/heic',
  avif: 'image/avif',
};

async function imageSize(blob: Blob): Promise<{ width: number; height: number }> {
  if (typeof createImageBitmap !== 'function') return { width: 0, height: 0 };
  try {
    const bitmap = await createImageBitmap(blob);
    const size = { width: bitmap.width, height: bitmap.height };
    bitmap.close();
    return size;
  } catch {
    return { width: 0, height: 0 };
  }
}

/** Adds photos from a zip that accepted records list and the device lacks. */
async function importPhotos(
  store: ExchangeStore,
  records: readonly SurveyRecord[],
  files: ReadonlyMap<string, Uint8Array>,
  now: Date,
): Promise<{ added: number; failed: number }> {
  let added = 0;
  let failed = 0;
  for (const record of records) {
    for (const photo of record.photos) {
      const prefix = `${ZIP_ENTRIES.photosDir}${record.id}/${photo.id}.`;
      const name = [...files.keys()].find((k) => k.startsWith(prefix));
      if (!name) continue;
      const type = PHOTO_TYPES[name.slice(prefix.length).toLowerCase()];
      if (!type) continue;
      try {
        if (await store.getPhoto(photo.id)) continue;
        const bytes = files.get(name) as Uint8Array;
        const blob = new Blob([bytes as BlobPart], { type });
        const { width, height } = await imageSize(blob);
        await store.putPhoto({
          id: photo.id,
          surveyId: record.id,
          blob,
          type,
          width,
          height,
          bytes: blob.size,
          storedAt: now.toISOString(),
        });
        added += 1;
      } catch {
        failed += 1;
      }
    }
  }
  return { added, failed };
}

/** Imports exchange text (the GeoJSON itself). */
export async function importText(
  text: string,
  fileName: string,
  options: ImportOptions,
  store: ExchangeStore,
  photos: ReadonlyMap<string, Uint8Array> = new Map(),
): Promise<ImportReport> {
  const now = (options.now ?? (() => new Date()))();
  const parsed = readExchangeText(text);
  if (!parsed.ok) return { status: 'refused', fileName, reason: parsed.reason };
  const counts: Counts = { fileName, accepted: parsed.accepted.length, rejected: parsed.rejected };
  if (options.strict && parsed.rejected.length > 0) return { status: 'refused-strict', ...counts };

  const incoming = parsed.accepted.map((a) => a.record);
  let existing: Map<string, ExistingSurvey>;
  try {
    existing = await lookupExisting(store, incoming);
  } catch (err) {
    return { status: 'failed', reason: errorText(err), ...counts };
  }
  const plan = planMerge(incoming, existing);
  const writes = [...plan.conflicts.map((c) => c.record), ...plan.revisions];
  if (writes.length > 0) {
    try {
      await store.writeRevisions(writes, { current: 'newer', kind: 'import' });
    } catch (err) {
      return { status: 'failed', reason: errorText(err), ...counts };
    }
  }
  const foundAt = now.toISOString();
  if (writes.length > 0) {
    // Caches of "what changed since" must rebuild (see IMPORT_STAMP_SETTING).
    await store
      .setSetting(IMPORT_STAMP_SETTING, `${foundAt}#${Math.random().toString(36).slice(2)}`)
      .catch(() => undefined);
  }
  try {
    await addConflictFlags(
      store,
      plan.conflicts.map((c) => ({ surveyId: c.record.id, revision: c.record.revision, foundAt })),
    );
  } catch {
    // The variants are stored either way; the flag list is an index that can be rebuilt.
  }
  const photoResult =
    photos.size > 0 ? await importPhotos(store, incoming, photos, now) : { added: 0, failed: 0 };
  return {
    status: 'imported',
    ...counts,
    newSurveys: plan.newSurveys.length,
    newRevisions: plan.revisions.length,
    newerCurrent: plan.newerCurrent.length,
    duplicates: plan.duplicates,
    conflicts: plan.conflicts.map((c) => ({
      surveyId: c.record.id,
      revision: c.record.revision,
      address: c.record.address,
      holderInspector: c.holder.inspector,
      variantInspector: c.record.inspector,
    })),
    withoutLocation: incoming.filter((r) => r.location === null).length,
    migrated: parsed.accepted.filter((a) => a.fromVersion !== a.record.schemaVersion).length,
    photosAdded: photoResult.added,
    photosFailed: photoResult.failed,
  };
}

function errorText(err: unknown): string {
  if (typeof err === 'object' && err !== null && 'userMessage' in err) {
    return String((err as { userMessage: unknown }).userMessage);
  }
  return err instanceof Error ? err.message : String(err);
}

const ZIP_MAGIC = [0x50, 0x4b, 0x03, 0x04];

/** Imports a file the user picked: GeoJSON text, or a zip export. Never throws. */
export async function importFile(
  file: Blob & { name?: string },
  options: ImportOptions,
  store: ExchangeStore,
): Promise<ImportReport> {
  const fileName = file.name ?? '';
  if (file.size > MAX_IMPORT_MB * 1024 * 1024) {
    return {
      status: 'refused',
      fileName,
      reason: t('exchange.file.tooLarge', { max: MAX_IMPORT_MB }),
    };
  }
  let bytes: Uint8Array;
  try {
    bytes = new Uint8Array(await file.arrayBuffer());
  } catch {
    return { status: 'refused', fileName, reason: t('exchange.file.unreadable') };
  }
  if (ZIP_MAGIC.every((b, i) => bytes[i] === b)) {
    let entries: Record<string, Uint8Array>;
    try {
      entries = unzipSync(bytes, {
        // Only what an export holds; anything else in the zip is never even inflated.
        filter: (f) => /\.(geo)?json$/i.test(f.name) || f.name.startsWith(ZIP_ENTRIES.photosDir),
      });
    } catch {
      return { status: 'refused', fileName, reason: t('exchange.file.zipBroken') };
    }
    const names = Object.keys(entries);
    const geojson =
      names.find((n) => n === ZIP_ENTRIES.geojson) ?? names.find((n) => /\.(geo)?json$/i.test(n));
    if (!geojson) return { status: 'refused', fileName, reason: t('exchange.file.zipEmpty') };
    const photos = new Map<string, Uint8Array>();
    for (const n of names)
      if (n.startsWith(ZIP_ENTRIES.photosDir)) photos.set(n, entries[n] as Uint8Array);
    const text = new TextDecoder().decode(entries[geojson]);
    return importText(text, fileName, options, store, photos);
  }
  // Not a zip: GeoJSON text (UTF-8, with or without a byte-order mark).
  const text = new TextDecoder('utf-8', { fatal: false, ignoreBOM: false }).decode(bytes);
  return importText(text, fileName, options, store);
}
