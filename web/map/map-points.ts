/**
 * What the map shows of each survey: a small, flat summary built once from the records, so
 * filtering and clustering 100 000 surveys never touches the full records again.
 * Surveys without a location cannot be placed; they are returned separately and listed
 * beside the map, never dropped.
 */
import type { DamageState, PostingLevel, StructuralSystem } from '../../calc/index.js';
import type { SurveyRecord } from '../../forms/index.js';
import { readVerdict } from '../exchange/survey-verdict.js';

/** A posting level, or 'unscreened' for a survey with no result yet. */
export type PostingKey = PostingLevel | 'unscreened';
/** A damage state, or 'unknown' when the result does not say. */
export type DamageKey = DamageState | 'unknown';

export const POSTING_KEYS: readonly PostingKey[] = ['keep-out', 'limited', 'open', 'unscreened'];
export const DAMAGE_KEYS: readonly DamageKey[] = [
  'complete',
  'extensive',
  'moderate',
  'slight',
  'none',
  'unknown',
];

export interface MapPoint {
  id: string;
  lat: number;
  lon: number;
  posting: PostingKey;
  damage: DamageKey;
  system: StructuralSystem;
  inspector: string;
  /** Day of the survey (UTC date of `createdAt`), YYYY-MM-DD. */
  day: string;
  needsAssessment: boolean;
  address: string;
  revision: number;
  updatedAt: string;
  /** True when another device's variant of this survey is kept beside it, to resolve. */
  conflict: boolean;
}

/** A survey that has no location, listed beside the map. */
export type UnplacedSurvey = Omit<MapPoint, 'lat' | 'lon'>;

export interface MapData {
  points: MapPoint[];
  unplaced: UnplacedSurvey[];
}

function summary(record: SurveyRecord, conflict: boolean): UnplacedSurvey {
  const verdict = readVerdict(record);
  return {
    id: record.id,
    posting: verdict.posting ?? 'unscreened',
    damage: verdict.damageState ?? 'unknown',
    system: record.building.system,
    inspector: record.inspector,
    day: record.createdAt.slice(0, 10),
    needsAssessment: verdict.needsAssessment,
    address: record.address,
    revision: record.revision,
    updatedAt: record.updatedAt,
    conflict,
  };
}

/** Splits records into map points and unplaced surveys. */
export function toMapData(
  records: readonly SurveyRecord[],
  conflictIds: ReadonlySet<string> = new Set(),
): MapData {
  const points: MapPoint[] = [];
  const unplaced: UnplacedSurvey[] = [];
  for (const record of records) {
    const s = summary(record, conflictIds.has(record.id));
    const loc = record.location;
    if (loc) points.push({ ...s, lat: loc.lat, lon: loc.lon });
    else unplaced.push(s);
  }
  return { points, unplaced };
}
