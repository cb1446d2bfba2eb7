/**
 * Residual drift readings, one per storey and direction, entered as an offset over a height
 * (plumb line or level: mm or in over m or ft) or as a tilt in degrees. The stored ratio is
 * derived from the reading the inspector typed last, and the raw readings are kept beside it.
 *
 * drift ratio = |offset| / height, or tan(|tilt|) (geometry of a leaning line; no source
 * needed). Readings that are not complete yet are kept as text in `unparsed` under
 * `observations.residualDrift.s<storey><direction>.<field>`, so nothing typed is lost.
 */
import {
  clearUnparsed,
  confirmField,
  limits,
  markUnconfirmed,
  type SurveyRecord,
} from '../../../forms/index.js';
import { removeDrift } from './record-edit.js';

export type DriftField = 'offsetM' | 'overHeightM' | 'tiltRad';
type Reading = SurveyRecord['observations']['residualDrift'][number];

/** Where the reading of a storey and direction is stored (index), or -1. */
export function driftIndex(record: SurveyRecord, storey: number, direction: 'x' | 'y'): number {
  return record.observations.residualDrift.findIndex(
    (d) => d.storey === storey && d.direction === direction,
  );
}

/** Key of text kept for a reading that does not exist yet. */
export function driftPendingKey(storey: number, direction: 'x' | 'y', field: DriftField): string {
  return `observations.residualDrift.s${storey + 1}${direction}.${field}`;
}

/** The record path a drift field binds to: the reading's index when it exists. */
export function driftPath(
  record: SurveyRecord,
  storey: number,
  direction: 'x' | 'y',
  field: DriftField,
): string {
  const i = driftIndex(record, storey, direction);
  return i === -1
    ? driftPendingKey(storey, direction, field)
    : `observations.residualDrift.${i}.${field}`;
}

/** The drift ratio of a reading by its method, or null when the method's values are missing. */
export function ratioOf(
  r: Pick<Reading, 'method' | 'offsetM' | 'overHeightM' | 'tiltRad'>,
): number | null {
  if (r.method === 'offset' && r.offsetM !== null && r.overHeightM !== null && r.overHeightM > 0) {
    return Math.abs(r.offsetM) / r.overHeightM;
  }
  // A phone-tilt reading stores its tilt (after the reversal) like a typed one.
  if ((r.method === 'tilt' || r.method === 'phone-tilt') && r.tiltRad !== null) {
    return Math.tan(Math.abs(r.tiltRad));
  }
  return null;
}

export type DriftEdit =
  | { ok: true; record: SurveyRecord }
  /** The reading would mean a drift above the stored limit: kept as text by the caller. */
  | { ok: false; ratio: number };

function withReading(record: SurveyRecord, index: number, reading: Reading | null): SurveyRecord {
  const list = record.observations.residualDrift.slice();
  if (reading === null) return removeDrift(record, index);
  if (index === -1) list.push(reading);
  else list[index] = reading;
  return { ...record, observations: { ...record.observations, residualDrift: list } };
}

/**
 * Sets one field of the reading of a storey and direction to a valid value, or clears it
 * (null). Creates the reading on its first offset or tilt; removes it when neither is left.
 */
export function setDriftField(
  record: SurveyRecord,
  storey: number,
  direction: 'x' | 'y',
  field: DriftField,
  value: number | null,
  /** A valid height typed before the offset (kept as text until now), in m. */
  pendingHeightM: number | null = null,
): DriftEdit {
  let index = driftIndex(record, storey, direction);
  const storeyHeight = record.building.storeys[storey]?.heightM ?? null;
  let next = record;
  for (const f of ['offsetM', 'overHeightM', 'tiltRad'] as const) {
    if (f === field) next = clearUnparsed(next, driftPendingKey(storey, direction, f));
  }

  if (index === -1) {
    if (value === null) return { ok: true, record: next };
    if (field === 'overHeightM') {
      throw new RangeError('a height without an offset is not a reading; keep its text pending');
    }
    const heightTyped = pendingHeightM !== null && pendingHeightM > 0;
    const reading: Reading = {
      storey,
      direction,
      method: field === 'tiltRad' ? 'tilt' : 'offset',
      offsetM: field === 'offsetM' ? value : null,
      overHeightM: field === 'offsetM' ? (heightTyped ? pendingHeightM : storeyHeight) : null,
      tiltRad: field === 'tiltRad' ? value : null,
      ratio: 0,
      uncertainty: null,
    };
    const ratio = ratioOf(reading);
    if (ratio === null) return { ok: true, record: next };
    if (ratio > limits.MAX_DRIFT_RATIO) return { ok: false, ratio };
    next = withReading(next, -1, { ...reading, ratio });
    index = next.observations.residualDrift.length - 1;
    if (field === 'offsetM') {
      next = clearUnparsed(next, driftPendingKey(storey, direction, 'overHeightM'));
      if (!heightTyped)
        next = markUnconfirmed(next, `observations.residualDrift.${index}.overHeightM`);
    }
    return { ok: true, record: next };
  }

  const old = next.observations.residualDrift[index]!;
  const path = `observations.residualDrift.${index}.${field}`;
  next = confirmField(clearUnparsed(next, path), path);
  if (value === null) {
    if (field === 'overHeightM') {
      throw new RangeError('overHeightM cannot be cleared to null; keep the typed text pending');
    }
    // One reading cleared: fall back to the other one, or drop the reading when none is left.
    const fallback: Reading = {
      ...old,
      [field]: null,
      method: field === 'offsetM' ? 'tilt' : 'offset',
    };
    const r = ratioOf(fallback);
    return r === null
      ? { ok: true, record: removeDriftReading(next, storey, direction) }
      : { ok: true, record: withReading(next, index, { ...fallback, ratio: r }) };
  }
  const changed: Reading = { ...old, [field]: value };
  if (field === 'offsetM') {
    changed.method = 'offset';
    if (changed.overHeightM === null && storeyHeight !== null) {
      changed.overHeightM = storeyHeight;
      next = markUnconfirmed(next, `observations.residualDrift.${index}.overHeightM`);
    }
  }
  if (field === 'tiltRad') changed.method = 'tilt';
  const ratio = ratioOf(changed);
  if (ratio === null) {
    // Not enough for this method yet: keep the raw value, the reading stays as it was.
    return {
      ok: true,
      record: withReading(next, index, { ...changed, method: old.method, ratio: old.ratio }),
    };
  }
  if (ratio > limits.MAX_DRIFT_RATIO) return { ok: false, ratio };
  return { ok: true, record: withReading(next, index, { ...changed, ratio }) };
}

/** Removes the reading of a storey and direction with everything kept for it. */
export function removeDriftReading(
  record: SurveyRecord,
  storey: number,
  direction: 'x' | 'y',
): SurveyRecord {
  let next = record;
  for (const f of ['offsetM', 'overHeightM', 'tiltRad'] as const) {
    next = clearUnparsed(next, driftPendingKey(storey, direction, f));
  }
  const index = driftIndex(next, storey, direction);
  return index === -1 ? next : removeDrift(next, index);
}

/** Uses the offset or the tilt of a reading that has both. */
export function setDriftMethod(
  record: SurveyRecord,
  index: number,
  method: 'offset' | 'tilt',
): DriftEdit {
  const old = record.observations.residualDrift[index];
  if (!old) throw new RangeError(`drift reading index must exist, got ${index}`);
  const ratio = ratioOf({ ...old, method });
  if (ratio === null) return { ok: true, record };
  if (ratio > limits.MAX_DRIFT_RATIO) return { ok: false, ratio };
  return {
    ok: true,
    record: confirmField(
      withReading(record, index, { ...old, method, ratio }),
      `observations.residualDrift.${index}.method`,
    ),
  };
}
