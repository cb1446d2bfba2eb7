/**
 * The map's cache of survey summaries (store `map-cache` of map-db.ts), so that opening the
 * map draws every survey at once, even 100 000 of them, instead of first reading and
 * checking every full record.
 *
 * The summaries are stored column by column (typed arrays for numbers and codes, string
 * lists with dictionaries for repeated names and days), which IndexedDB clones far faster
 * than 100 000 small objects.
 *
 * When the cache is current:
 * - it is rebuilt from a full read of the surveys whenever it is missing, unreadable, or an
 *   import happened since it was built (imports can bring records whose `updatedAt` is old,
 *   see IMPORT_STAMP_SETTING in web/exchange);
 * - otherwise the map draws it, then reads only the surveys saved since it was built
 *   (storage's `updatedAt` index; every save stamps the device's clock) and applies them.
 */
import type { DamageState, StructuralSystem } from '../../calc/index.js';
import {
  DAMAGE_KEYS,
  POSTING_KEYS,
  type MapData,
  type MapPoint,
  type PostingKey,
  type UnplacedSurvey,
} from './map-points.js';
import { mapDb } from './map-db.js';
import { SYSTEMS } from './option-words.js';

const KEY = 'summary';
const FORMAT = 1;

export interface MapCache {
  data: MapData;
  /** Device time just before the surveys were read for this cache (ISO). */
  builtAt: string;
  /** The import stamp the cache saw (null when no import ever ran). */
  importStamp: string | null;
}

interface Row {
  format: number;
  builtAt: string;
  importStamp: string | null;
  count: number;
  ids: string[];
  address: string[];
  updatedAt: string[];
  lat: Float64Array;
  lon: Float64Array;
  revision: Float64Array;
  /** Indices into POSTING_KEYS, DAMAGE_KEYS, SYSTEMS. */
  posting: Uint8Array;
  damage: Uint8Array;
  system: Uint8Array;
  /** bit 0: needs assessment; bit 1: conflict; bit 2: has a location. */
  flags: Uint8Array;
  inspector: Uint32Array;
  inspectors: string[];
  day: Uint32Array;
  days: string[];
}

function indexer() {
  const list: string[] = [];
  const at = new Map<string, number>();
  return {
    list,
    of(value: string): number {
      let i = at.get(value);
      if (i === undefined) {
        i = list.length;
        list.push(value);
        at.set(value, i);
      }
      return i;
    },
  };
}

/** Encodes map data as cache columns (pure). */
export function encodeMapCache(data: MapData, builtAt: string, importStamp: string | null): Row {
  const all: Array<MapPoint | UnplacedSurvey> = [...data.points, ...data.unplaced];
  const n = all.length;
  const row: Row = {
    format: FORMAT,
    builtAt,
    importStamp,
    count: n,
    ids: new Array<string>(n),
    address: new Array<string>(n),
    updatedAt: new Array<string>(n),
    lat: new Float64Array(n),
    lon: new Float64Array(n),
    revision: new Float64Array(n),
    posting: new Uint8Array(n),
    damage: new Uint8Array(n),
    system: new Uint8Array(n),
    flags: new Uint8Array(n),
    inspector: new Uint32Array(n),
    inspectors: [],
    day: new Uint32Array(n),
    days: [],
  };
  const inspectors = indexer();
  const days = indexer();
  for (let i = 0; i < n; i++) {
    const s = all[i] as MapPoint | UnplacedSurvey;
    row.ids[i] = s.id;
    row.address[i] = s.address;
    row.updatedAt[i] = s.updatedAt;
    row.revision[i] = s.revision;
    row.posting[i] = POSTING_KEYS.indexOf(s.posting);
    row.damage[i] = DAMAGE_KEYS.indexOf(s.damage);
    row.system[i] = Math.max(0, SYSTEMS.indexOf(s.system));
    const placed = 'lat' in s;
    row.flags[i] = (s.needsAssessment ? 1 : 0) | (s.conflict ? 2 : 0) | (placed ? 4 : 0);
    if (placed) {
      row.lat[i] = s.lat;
      row.lon[i] = s.lon;
    }
    row.inspector[i] = inspectors.of(s.inspector);
    row.day[i] = days.of(s.day);
  }
  row.inspectors = inspectors.list;
  row.days = days.list;
  return row;
}

function isRow(v: unknown): v is Row {
  if (typeof v !== 'object' || v === null) return false;
  const r = v as Partial<Row>;
  const n = r.count;
  if (r.format !== FORMAT || typeof n !== 'number' || typeof r.builtAt !== 'string') return false;
  const lists = [r.ids, r.address, r.updatedAt];
  const arrays = [
    r.lat,
    r.lon,
    r.revision,
    r.posting,
    r.damage,
    r.system,
    r.flags,
    r.inspector,
    r.day,
  ];
  return (
    lists.every((l) => Array.isArray(l) && l.length === n) &&
    arrays.every(
      (a) => ArrayBuffer.isView(a) && (a as unknown as { length: number }).length === n,
    ) &&
    Array.isArray(r.inspectors) &&
    Array.isArray(r.days)
  );
}

/** Decodes cache columns; null when anything does not fit (the caller then reads afresh). */
export function decodeMapCache(value: unknown): MapCache | null {
  if (!isRow(value)) return null;
  const r = value;
  const points: MapPoint[] = [];
  const unplaced: UnplacedSurvey[] = [];
  for (let i = 0; i < r.count; i++) {
    const posting = POSTING_KEYS[r.posting[i] as number];
    const damage = DAMAGE_KEYS[r.damage[i] as number];
    const system = SYSTEMS[r.system[i] as number];
    const inspector = r.inspectors[r.inspector[i] as number];
    const day = r.days[r.day[i] as number];
    const id = r.ids[i];
    if (
      !posting ||
      !damage ||
      !system ||
      inspector === undefined ||
      day === undefined ||
      typeof id !== 'string'
    ) {
      return null;
    }
    const flags = r.flags[i] as number;
    // One object literal per survey, in one shape (no spreading): decoding 100 000 of them
    // is on the way to the map's first drawing.
    if (flags & 4) {
      points.push({
        id,
        posting: posting as PostingKey,
        damage: damage as DamageState | 'unknown',
        system: system as StructuralSystem,
        inspector,
        day,
        needsAssessment: (flags & 1) !== 0,
        address: r.address[i] as string,
        revision: r.revision[i] as number,
        updatedAt: r.updatedAt[i] as string,
        conflict: (flags & 2) !== 0,
        lat: r.lat[i] as number,
        lon: r.lon[i] as number,
      });
    } else {
      unplaced.push({
        id,
        posting: posting as PostingKey,
        damage: damage as DamageState | 'unknown',
        system: system as StructuralSystem,
        inspector,
        day,
        needsAssessment: (flags & 1) !== 0,
        address: r.address[i] as string,
        revision: r.revision[i] as number,
        updatedAt: r.updatedAt[i] as string,
        conflict: (flags & 2) !== 0,
      });
    }
  }
  return { data: { points, unplaced }, builtAt: r.builtAt, importStamp: r.importStamp ?? null };
}

/** Replaces or adds the summaries of changed surveys, and sets the conflict flags (pure). */
export function applyChanges(
  data: MapData,
  changed: MapData,
  conflictIds: ReadonlySet<string>,
): MapData {
  const ids = new Set([...changed.points, ...changed.unplaced].map((s) => s.id));
  const keep = <T extends UnplacedSurvey>(list: readonly T[]) => list.filter((s) => !ids.has(s.id));
  const flag = <T extends UnplacedSurvey>(s: T): T =>
    s.conflict === conflictIds.has(s.id) ? s : { ...s, conflict: conflictIds.has(s.id) };
  return {
    points: [...keep(data.points), ...changed.points].map(flag),
    unplaced: [...keep(data.unplaced), ...changed.unplaced].map(flag),
  };
}

export async function readMapCache(): Promise<MapCache | null> {
  try {
    return decodeMapCache(await (await mapDb()).get('map-cache', KEY));
  } catch {
    return null;
  }
}

export async function writeMapCache(
  data: MapData,
  builtAt: string,
  importStamp: string | null,
): Promise<void> {
  try {
    await (await mapDb()).put('map-cache', encodeMapCache(data, builtAt, importStamp), KEY);
  } catch {
    // Only a cache: the next opening reads the surveys again.
  }
}
