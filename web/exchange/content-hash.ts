/**
 * A short fingerprint of a record's content, for spotting duplicates and conflicts among
 * many records without keeping every canonical text in memory. Equal fingerprints are
 * confirmed by comparing the canonical texts (see `sameContent`), so a collision can never
 * merge two different records.
 */
import { canonicalJson } from './canonical-json.js';

/**
 * cyrb53 (a public-domain 53-bit string hash by bryc, 2018): fast, well mixed, not
 * cryptographic, which is all a duplicate check needs.
 */
export function hash53(text: string, seed = 0): number {
  let h1 = 0xdeadbeef ^ seed;
  let h2 = 0x41c6ce57 ^ seed;
  for (let i = 0; i < text.length; i++) {
    const ch = text.charCodeAt(i);
    h1 = Math.imul(h1 ^ ch, 2654435761);
    h2 = Math.imul(h2 ^ ch, 1597334677);
  }
  h1 = Math.imul(h1 ^ (h1 >>> 16), 2246822507);
  h1 ^= Math.imul(h2 ^ (h2 >>> 13), 3266489909);
  h2 = Math.imul(h2 ^ (h2 >>> 16), 2246822507);
  h2 ^= Math.imul(h1 ^ (h1 >>> 13), 3266489909);
  return 4294967296 * (2097151 & h2) + (h1 >>> 0);
}

/** The fingerprint of a value's content (key order does not matter). */
export function contentHash(value: unknown): number {
  return hash53(canonicalJson(value));
}

/** True when two values hold the same JSON content, whatever their key order. */
export function sameContent(a: unknown, b: unknown): boolean {
  return canonicalJson(a) === canonicalJson(b);
}

/**
 * A survey's content for merging: the record without `lastExportedAt`, which is device
 * bookkeeping set when a file is exported (storage writes no revision for it). Without
 * this, a survey exported twice from the same device would look like a conflict.
 */
function mergeContent<T extends { lastExportedAt?: unknown }>(record: T): T {
  // Spread defines own keys as data properties, so no key is lost; nested values are shared.
  return { ...record, lastExportedAt: null };
}

/** The fingerprint of a survey's content for merging (see `mergeContent`). */
export function surveyContentHash(record: { lastExportedAt?: unknown }): number {
  return contentHash(mergeContent(record));
}

/** True when two revisions of a survey hold the same content for merging. */
export function sameSurveyContent(
  a: { lastExportedAt?: unknown },
  b: { lastExportedAt?: unknown },
): boolean {
  return sameContent(mergeContent(a), mergeContent(b));
}
