/**
 * Groups evidence items that say the same thing about different places, so a building with
 * twelve identical rocking walls shows one item naming the twelve walls rather than twelve
 * screens of repeats. The calculation's list (stored and exported) keeps every item.
 */
import type { EvidenceItem } from '../../../calc/index.js';

export interface EvidenceGroup {
  /** The first item of the group; its figures stand for all. */
  item: EvidenceItem;
  /** Where each item of the group is (its `where`), in the calculation's order. */
  places: string[];
}

/** The item with its own place taken out, so items differing only in place compare equal. */
function signature(e: EvidenceItem): string {
  const place = e.where ?? '';
  // A place is named in the text by its last word ("wall S1X1" → "S1X1").
  const name = place.split(' ').pop() ?? '';
  const text = name.length > 0 ? e.text.split(name).join('\u0000') : e.text;
  return JSON.stringify([
    e.side,
    e.kind,
    e.label,
    e.valueText,
    e.thresholdText,
    e.state,
    e.postingFloor,
    e.flag,
    text,
  ]);
}

/**
 * Groups items equal in everything but their place. Items without a place, or whose place
 * word is not named in their text, are never grouped with another.
 */
export function groupEvidence(items: readonly EvidenceItem[]): EvidenceGroup[] {
  const groups: EvidenceGroup[] = [];
  const bySignature = new Map<string, EvidenceGroup>();
  for (const e of items) {
    const name = e.where?.split(' ').pop() ?? '';
    if (e.where === null || name === '' || !e.text.includes(name)) {
      groups.push({ item: e, places: e.where === null ? [] : [e.where] });
      continue;
    }
    const key = signature(e);
    const found = bySignature.get(key);
    if (found) found.places.push(e.where);
    else {
      const group = { item: e, places: [e.where] };
      bySignature.set(key, group);
      groups.push(group);
    }
  }
  return groups;
}

/** Items that are alike by `keyOf`, in first-seen order, each with every member. */
export function groupAlike<T>(
  items: readonly T[],
  keyOf: (item: T) => string,
): { first: T; members: T[] }[] {
  const out: { first: T; members: T[] }[] = [];
  const byKey = new Map<string, { first: T; members: T[] }>();
  for (const item of items) {
    const key = keyOf(item);
    const found = byKey.get(key);
    if (found) found.members.push(item);
    else {
      const group = { first: item, members: [item] };
      byKey.set(key, group);
      out.push(group);
    }
  }
  return out;
}
