/**
 * The entries an instrument adds to the survey's `instrumentRecords`: the raw readings in
 * the compact encoding of forms/instruments, with the result the inspector saw beside them.
 */
import { CALC_VERSION } from '../../calc/index.js';
import type { AmbientAnalysis, Direction } from '../../calc/index.js';
import {
  encodeSamples,
  MAX_TILT_SAMPLES,
  MAX_VIBRATION_SAMPLES,
  round,
} from '../../forms/instruments/index.js';
import type {
  InstrumentEntry,
  RawSamples,
  TiltData,
  VibrationData,
  VibrationSummary,
} from '../../forms/instruments/index.js';
import type { MeasuredPosition, TiltOutcome } from './tilt-session.js';

/** A fresh id for an entry. */
export function newEntryId(): string {
  return crypto.randomUUID();
}

/** The first `max` samples (a recorder never exceeds it; the cap only guards the schema). */
function capped(raw: RawSamples, max: number): RawSamples {
  if (raw.timesMs.length <= max) return raw;
  const cut = (a: ArrayLike<number>) => Array.prototype.slice.call(a, 0, max) as number[];
  return { timesMs: cut(raw.timesMs), x: cut(raw.x), y: cut(raw.y), z: cut(raw.z) };
}

/** What the inspector was shown, kept with the raw record. */
export function summaryOf(analysis: AmbientAnalysis): VibrationSummary {
  const e = analysis.estimate;
  const s = analysis.stiffness;
  return {
    status: analysis.status,
    frequencyHz: e ? round.frequency(e.frequencyHz) : null,
    frequencyUncertaintyHz:
      e && e.frequencyUncertaintyHz !== null ? round.frequency(e.frequencyUncertaintyHz) : null,
    dampingRatio: e && e.dampingRatio !== null ? round.ratio(e.dampingRatio) : null,
    confidence: e ? round.confidence(e.confidence) : null,
    direction: e ? e.direction : null,
    stiffnessRatio: s ? round.ratio(s.stiffnessRatio) : null,
    stiffnessUncertainty: s ? round.ratio(s.uncertainty) : null,
    caveats: [...analysis.caveats],
    calcVersion: CALC_VERSION,
  };
}

export interface VibrationMeta {
  longEdgeAlong: Direction | null;
  storey: number | null;
  expectedPeriodS: number | null;
  reportedIntervalMs: number | null;
  now?: Date;
}

/** The 'vibration' entry for a recording and (when it ran) its analysis. */
export function vibrationEntry(
  raw: RawSamples,
  analysis: AmbientAnalysis | null,
  meta: VibrationMeta,
): InstrumentEntry {
  const data: VibrationData = {
    version: 1,
    ...encodeSamples(capped(raw, MAX_VIBRATION_SAMPLES)),
    reportedIntervalMs: meta.reportedIntervalMs,
    longEdgeAlong: meta.longEdgeAlong,
    storey: meta.storey,
    expectedPeriodS: meta.expectedPeriodS,
    analysis: analysis ? summaryOf(analysis) : null,
  };
  return {
    id: newEntryId(),
    kind: 'vibration',
    recordedAt: (meta.now ?? new Date()).toISOString(),
    data,
  };
}

function positionData(p: MeasuredPosition): TiltData['positions'][number] {
  return {
    ...encodeSamples(capped(p.raw, MAX_TILT_SAMPLES)),
    angleRad: round.angle(p.position.angleRad),
    uncertaintyRad: round.angle(p.position.uncertaintyRad),
    ok: p.position.ok,
  };
}

/** The 'tilt' entry for a finished two-position reading. */
export function tiltEntry(
  outcome: TiltOutcome,
  meta: { storey: number | null; direction: Direction | null; now?: Date },
): InstrumentEntry {
  const r = outcome.reversal;
  const data: TiltData = {
    version: 1,
    positions: [positionData(outcome.positions[0]), positionData(outcome.positions[1])],
    result: {
      tiltRad: round.angle(r.tiltRad),
      uncertaintyRad: round.angle(r.uncertaintyRad),
      offsetRad: round.angle(r.offsetRad),
      offsetPlausible: r.offsetPlausible,
      driftRatio: round.ratio(outcome.driftRatio),
      driftUncertainty: round.ratio(outcome.driftUncertainty),
    },
    storey: meta.storey,
    direction: meta.direction,
    calcVersion: CALC_VERSION,
  };
  return {
    id: newEntryId(),
    kind: 'tilt',
    recordedAt: (meta.now ?? new Date()).toISOString(),
    data,
  };
}
