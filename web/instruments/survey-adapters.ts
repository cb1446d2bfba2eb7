/**
 * How an instrument's result goes into a survey draft, as pure record → record functions for
 * the survey screen's `edit()`: the tilt meter fills the residual-drift reading of a storey
 * and direction (method 'phone-tilt', with its uncertainty) and stores its raw readings; the
 * vibration recorder sets the measured frequency and stores the recording.
 */
import { buildingResponse, empiricalPeriod } from '../../calc/index.js';
import type { Direction, MeasuredFrequencyInput } from '../../calc/index.js';
import { clearUnparsed, limits, type SurveyRecord } from '../../forms/index.js';
import type { InstrumentEntry } from '../../forms/instruments/index.js';

/** Most instrument entries one record may hold (the record schema's limit). */
export const MAX_INSTRUMENT_ENTRIES = 1_000;

/** What the tilt meter emits. */
export interface TiltMeterResult {
  tiltRad: number;
  uncertaintyRad: number;
  offsetRad: number;
  driftRatio: number;
  driftUncertainty: number;
  entry: InstrumentEntry;
}

function withEntry(record: SurveyRecord, entry: InstrumentEntry): SurveyRecord {
  if (record.instrumentRecords.length >= MAX_INSTRUMENT_ENTRIES) return record;
  return { ...record, instrumentRecords: [...record.instrumentRecords, entry] };
}

/**
 * Puts a phone tilt reading into the residual drift of `storey` (0 = ground) along
 * `direction`, keeping any offset already typed for that reading, and stores the raw readings.
 */
export function withPhoneTilt(
  record: SurveyRecord,
  storey: number,
  direction: Direction,
  result: TiltMeterResult,
): SurveyRecord {
  const list = record.observations.residualDrift.slice();
  const index = list.findIndex((d) => d.storey === storey && d.direction === direction);
  const old = index === -1 ? null : list[index];
  const reading = {
    storey,
    direction,
    ratio: Math.min(result.driftRatio, limits.MAX_DRIFT_RATIO),
    method: 'phone-tilt' as const,
    offsetM: old?.offsetM ?? null,
    overHeightM: old?.overHeightM ?? null,
    tiltRad: result.tiltRad,
    uncertainty: Math.min(result.driftUncertainty, limits.MAX_DRIFT_RATIO),
  };
  if (index === -1) list.push(reading);
  else list[index] = reading;
  const at = index === -1 ? list.length - 1 : index;
  // The measured tilt replaces any half-typed tilt text of this reading.
  const next = clearUnparsed(record, `observations.residualDrift.${at}.tiltRad`);
  return withEntry(
    { ...next, observations: { ...next.observations, residualDrift: list } },
    result.entry,
  );
}

/**
 * Stores a vibration recording and, when it gave one, the measured frequency (a recording
 * without a clear peak never erases an earlier measured frequency).
 */
export function withVibration(
  record: SurveyRecord,
  measured: MeasuredFrequencyInput | null,
  raw: InstrumentEntry,
): SurveyRecord {
  const next = measured ? { ...record, measured } : record;
  return withEntry(next, raw);
}

/**
 * The period the recorder compares with: the storey model's first modal period (the longer
 * of the two directions) when walls are entered, else EN 1998-1 eq. (4.6) on the total
 * storey height; s; null without storey heights. A measured frequency already on the record
 * is left out, so a new recording is compared with the model, not with itself.
 */
export function expectedPeriodFor(record: SurveyRecord): number | null {
  const h = record.building.storeys.reduce((s, st) => s + (st.heightM ?? 0), 0);
  if (!(h > 0)) return null;
  try {
    const response = buildingResponse({ ...record, measured: null });
    const modal = [response.x.period.modalS, response.y.period.modalS].filter(
      (v): v is number => v !== null && Number.isFinite(v) && v > 0,
    );
    if (modal.length > 0) return Math.max(...modal);
  } catch {
    // An incomplete draft: fall back to the code formula below.
  }
  return empiricalPeriod(h, 'ec8');
}
