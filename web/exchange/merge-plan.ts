/**
 * The merge policy for imported surveys, decided before anything is written:
 *
 * - Surveys are matched by id; revisions by (id, revision number).
 * - A revision the device does not hold is added. The device's current record for a survey
 *   becomes its newest revision (highest number); older revisions fill in its history.
 * - A revision the device already holds with the same content is a duplicate, and skipped
 *   (so importing the same file twice, or two files that share surveys, adds nothing).
 *   `lastExportedAt` is bookkeeping of the exporting device, not content: it is ignored.
 * - A revision the device holds with different content is a conflict: two inspectors'
 *   devices both wrote revision n. Neither is thrown away. The one already on the device (or
 *   first in the file) keeps the revision slot; the other is kept beside it as a conflict
 *   variant, flagged for a person to resolve.
 * - Nothing already stored is changed or deleted: the plan only ever adds.
 *
 * Pure: the caller reads what the device holds for the incoming ids, asks for a plan, and
 * writes it in one transaction.
 */
import type { SurveyRecord } from '../../forms/index.js';
import { sameSurveyContent } from './same-content.js';

/** What the device holds for one survey id. */
export interface ExistingSurvey {
  /** Every stored revision of the survey. */
  revisions: readonly SurveyRecord[];
  /** Conflict variants already kept beside them. */
  conflicts: readonly SurveyRecord[];
}

/** A record that shares (id, revision) with another of different content. */
export interface ConflictVariant {
  /** The variant to keep beside the revision. */
  record: SurveyRecord;
  /** The record that holds the revision slot. */
  holder: SurveyRecord;
}

export interface MergePlan {
  /** New revisions to write, in order (at most one per id and revision). */
  revisions: SurveyRecord[];
  /** New conflict variants to keep. */
  conflicts: ConflictVariant[];
  /** Ids the device did not hold before. */
  newSurveys: string[];
  /** Ids whose current record becomes a newer revision. */
  newerCurrent: string[];
  /** Incoming records identical to a stored or earlier incoming one. */
  duplicates: number;
}

interface Slot {
  record: SurveyRecord;
}

/** Groups by revision number: the holder and any kept variants. */
interface IdState {
  byRevision: Map<number, { holder: Slot; variants: Slot[] }>;
  storedMax: number;
  existed: boolean;
}

function slot(record: SurveyRecord): Slot {
  return { record };
}

function sameSlot(a: Slot, b: Slot): boolean {
  return sameSurveyContent(a.record, b.record);
}

/** Plans the merge of `incoming` (in file order) into what the device holds. */
export function planMerge(
  incoming: readonly SurveyRecord[],
  existing: ReadonlyMap<string, ExistingSurvey>,
): MergePlan {
  const states = new Map<string, IdState>();
  const stateOf = (id: string): IdState => {
    let state = states.get(id);
    if (state) return state;
    const held = existing.get(id);
    state = { byRevision: new Map(), storedMax: 0, existed: false };
    if (held && held.revisions.length > 0) {
      state.existed = true;
      for (const r of held.revisions) {
        state.byRevision.set(r.revision, { holder: slot(r), variants: [] });
        if (r.revision > state.storedMax) state.storedMax = r.revision;
      }
      for (const c of held.conflicts) {
        const entry = state.byRevision.get(c.revision);
        // A variant whose holder is gone cannot happen (nothing is deleted); if storage ever
        // reports one, treating it as a variant still keeps it from being written twice.
        if (entry) entry.variants.push(slot(c));
        else state.byRevision.set(c.revision, { holder: slot(c), variants: [] });
      }
    }
    states.set(id, state);
    return state;
  };

  const plan: MergePlan = {
    revisions: [],
    conflicts: [],
    newSurveys: [],
    newerCurrent: [],
    duplicates: 0,
  };
  const newMax = new Map<string, number>();

  for (const record of incoming) {
    const state = stateOf(record.id);
    const s = slot(record);
    const entry = state.byRevision.get(record.revision);
    if (!entry) {
      state.byRevision.set(record.revision, { holder: s, variants: [] });
      plan.revisions.push(record);
      if (record.revision > (newMax.get(record.id) ?? 0)) newMax.set(record.id, record.revision);
      continue;
    }
    if (sameSlot(entry.holder, s) || entry.variants.some((v) => sameSlot(v, s))) {
      plan.duplicates += 1;
      continue;
    }
    entry.variants.push(s);
    plan.conflicts.push({ record, holder: entry.holder.record });
  }

  for (const [id, max] of newMax) {
    const state = states.get(id) as IdState;
    if (!state.existed) plan.newSurveys.push(id);
    else if (max > state.storedMax) plan.newerCurrent.push(id);
  }
  return plan;
}
