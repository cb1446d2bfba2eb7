/**
 * What can go wrong with device storage, said in the catalogue's words.
 *
 * Every failure that reaches the UI is a `StorageError` with a `kind` and a sentence saying
 * what to do (forms/schema/messages.ts, `storage` section). Browser errors are classified
 * here, once.
 */
import { en, type FieldMessage, type MessageCatalogue } from '../../forms/index.js';

export type StorageErrorKind =
  | 'quota' // out of space: export, remove photos
  | 'connection' // the database could not be (re)opened
  | 'reload-required' // another tab upgraded the database; this tab has closed it
  | 'invalid' // the record given to storage is not valid (a bug, or unchecked input)
  | 'not-found'
  | 'unknown';

export class StorageError extends Error {
  override readonly name = 'StorageError';
  constructor(
    readonly kind: StorageErrorKind,
    /** A sentence for the inspector, from the catalogue. */
    readonly userMessage: string,
    options: { cause?: unknown; fieldMessages?: FieldMessage[] } = {},
  ) {
    super(userMessage, options.cause === undefined ? undefined : { cause: options.cause });
    this.fieldMessages = options.fieldMessages ?? [];
  }
  /** For kind 'invalid': what is wrong, per field. */
  readonly fieldMessages: FieldMessage[];
}

/**
 * When the device is "near" its quota: used up to this fraction, or less than this many
 * bytes left. An AbortError in that state is almost always the quota at commit time.
 * Source: common practice, no source (chosen so a few photos' worth of space counts as near).
 */
export const NEAR_QUOTA_FRACTION = 0.95;
export const NEAR_QUOTA_BYTES = 20 * 1024 * 1024;

function errorName(error: unknown): string {
  return typeof error === 'object' && error !== null && 'name' in error
    ? String((error as { name: unknown }).name)
    : '';
}

/** True for the browsers' ways of saying "out of space". */
export function isQuotaError(error: unknown): boolean {
  const name = errorName(error);
  if (name === 'QuotaExceededError' || name === 'NS_ERROR_DOM_QUOTA_REACHED') return true;
  // Old WebKit and Chromium used the legacy code 22 for quota.
  return error instanceof DOMException && error.code === 22;
}

/** True when the error means the connection went away (retry after reopening). */
export function isConnectionLost(error: unknown): boolean {
  const name = errorName(error);
  // InvalidStateError: transaction() on a closed connection. UnknownError: Chromium and
  // WebKit when the backing store connection dropped (e.g. a backgrounded mobile tab).
  return name === 'InvalidStateError' || name === 'UnknownError';
}

export function isAbortError(error: unknown): boolean {
  return errorName(error) === 'AbortError';
}

/** A storage estimate (bytes), or nulls when the browser gives none. */
export interface QuotaEstimate {
  usage: number | null;
  quota: number | null;
}

export function isNearQuota(e: QuotaEstimate): boolean {
  if (e.usage === null || e.quota === null || e.quota <= 0) return false;
  return e.usage >= e.quota * NEAR_QUOTA_FRACTION || e.quota - e.usage < NEAR_QUOTA_BYTES;
}

/**
 * Turns anything thrown during a storage operation into a StorageError. `estimate` is read
 * only for an AbortError, to tell a quota abort from another one.
 */
export async function classifyStorageError(
  error: unknown,
  estimate: () => Promise<QuotaEstimate>,
  catalogue: MessageCatalogue = en,
): Promise<StorageError> {
  if (error instanceof StorageError) return error;
  const s = catalogue.storage;
  if (isQuotaError(error)) return new StorageError('quota', s.quota, { cause: error });
  if (isAbortError(error)) {
    const e = await estimate().catch(() => ({ usage: null, quota: null }));
    if (isNearQuota(e)) return new StorageError('quota', s.quota, { cause: error });
  }
  if (isConnectionLost(error))
    return new StorageError('connection', s.connectionLost, { cause: error });
  const detail = errorName(error) || (error instanceof Error ? error.message : String(error));
  return new StorageError('unknown', s.unknown(detail), { cause: error });
}
