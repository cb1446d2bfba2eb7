/**
 * Pure edits of a survey record for the survey screens. Every function returns a new record
 * (the argument is never changed) that is still valid to store: values that are not valid
 * yet are kept as text in `unparsed`, values the app fills in are listed in `unconfirmed`.
 */
import {
  clearUnparsed,
  confirmField,
  keepUnparsed,
  markUnconfirmed,
  shiftPathsAfterRemoval,
  type StoreyRecord,
  type SurveyRecord,
  type WallRecord,
} from '../../../forms/index.js';
import type { FieldChange } from '../../../forms/fields/index.js';

type Json = unknown;

/** Sets `value` at the dot path `parts` of `target`, copying every object on the way. */
function setIn(target: Json, parts: readonly string[], value: Json): Json {
  if (parts.length === 0) return value;
  const [head, ...rest] = parts as [string, ...string[]];
  if (Array.isArray(target)) {
    const index = Number(head);
    if (!Number.isInteger(index) || index < 0 || index >= target.length) {
      throw new RangeError(`path index must be inside the list, got ${head} of ${target.length}`);
    }
    const copy = target.slice();
    copy[index] = setIn(copy[index], rest, value);
    return copy;
  }
  if (typeof target !== 'object' || target === null) {
    throw new RangeError(`path must lead through objects, got ${String(target)} before ${head}`);
  }
  const obj = target as Record<string, Json>;
  return { ...obj, [head]: setIn(obj[head], rest, value) };
}

/** Reads the value at a dot path, or undefined where the path does not lead. */
export function getIn(target: Json, path: string): Json {
  let cur: Json = target;
  for (const part of path.split('.')) {
    if (cur === null || typeof cur !== 'object') return undefined;
    cur = (cur as Record<string, Json>)[part];
  }
  return cur;
}

/** Sets the value at `path` and marks it as the inspector's own (confirmed, nothing pending). */
export function setValue(record: SurveyRecord, path: string, value: Json): SurveyRecord {
  const next = setIn(record, path.split('.'), value) as SurveyRecord;
  return confirmField(clearUnparsed(next, path), path);
}

/** Applies what a field reported. */
export function applyFieldChange(record: SurveyRecord, change: FieldChange): SurveyRecord {
  return change.kind === 'value'
    ? setValue(record, change.path, change.value)
    : keepUnparsed(record, change.path, change.text);
}

/** Removes every bookkeeping entry under `prefix` (the item itself and anything inside it). */
export function forgetUnder(record: SurveyRecord, prefix: string): SurveyRecord {
  const inside = (p: string) => p === prefix || p.startsWith(`${prefix}.`);
  const unparsed: Record<string, string> = {};
  for (const [k, v] of Object.entries(record.unparsed)) if (!inside(k)) unparsed[k] = v;
  return { ...record, unparsed, unconfirmed: record.unconfirmed.filter((p) => !inside(p)) };
}

/** Renumbers bookkeeping after item `index` was removed from the list at `listPath`. */
function shiftAfterRemoval(record: SurveyRecord, listPath: string, index: number): SurveyRecord {
  const keys = Object.keys(record.unparsed);
  const shiftedKeys = shiftPathsAfterRemoval(keys, listPath, index);
  // shiftPathsAfterRemoval drops paths inside the removed item; match the survivors in order.
  const survivors = keys.filter((k) => {
    const prefix = `${listPath}.`;
    if (!k.startsWith(prefix)) return true;
    const seg = k.slice(prefix.length).split('.')[0] ?? '';
    return !/^\d+$/.test(seg) || Number(seg) !== index;
  });
  const unparsed: Record<string, string> = {};
  survivors.forEach((k, i) => {
    const nk = shiftedKeys[i];
    if (nk !== undefined) unparsed[nk] = record.unparsed[k] ?? '';
  });
  return {
    ...record,
    unparsed,
    unconfirmed: shiftPathsAfterRemoval(record.unconfirmed, listPath, index),
  };
}

// ——— Storeys ———

/**
 * Default height of a new storey when there is none below to copy, m: a typical timber
 * storey (common practice, no source). Always listed as unconfirmed.
 */
export const DEFAULT_STOREY_HEIGHT_M = 2.7;
/**
 * Default floor area when the plan size is unknown, m²: a placeholder the inspector must
 * confirm or change (common practice, no source). Always listed as unconfirmed.
 */
export const DEFAULT_FLOOR_AREA_M2 = 100;

function defaultFloor(
  record: SurveyRecord,
  storeyIndex: number,
): StoreyRecord['floorConstruction'] {
  if (storeyIndex === 0) return 'on-grade';
  return record.building.system === 'mass-timber-panel' || record.building.system === 'rocking-wall'
    ? 'clt'
    : 'light-timber';
}

/**
 * Adds a storey on top. It copies the storey below (height, area, floor); the first storey
 * gets defaults (plan area when known). Every copied or default value is unconfirmed.
 */
export function addStorey(record: SurveyRecord): SurveyRecord {
  const storeys = record.building.storeys;
  const i = storeys.length;
  const below = storeys[i - 1];
  const { planXM, planYM } = record.building;
  const storey: StoreyRecord = below
    ? {
        heightM: below.heightM,
        floorAreaM2: below.floorAreaM2,
        floorConstruction: i === 1 ? defaultFloor(record, 1) : below.floorConstruction,
        unitWeightPa: below.unitWeightPa,
      }
    : {
        heightM: DEFAULT_STOREY_HEIGHT_M,
        floorAreaM2: planXM !== null && planYM !== null ? planXM * planYM : DEFAULT_FLOOR_AREA_M2,
        floorConstruction: defaultFloor(record, 0),
        unitWeightPa: null,
      };
  let next: SurveyRecord = {
    ...record,
    building: { ...record.building, storeys: [...storeys, storey] },
  };
  const base = `building.storeys.${i}`;
  for (const f of ['heightM', 'floorAreaM2', 'floorConstruction'] as const) {
    next = markUnconfirmed(next, `${base}.${f}`);
  }
  return next;
}

/** What keeps the top storey from being removed, or null when it can go. */
export function storeyRemovalBlock(
  record: SurveyRecord,
): { walls: number; readings: number } | null {
  const top = record.building.storeys.length - 1;
  if (top < 0) return null;
  const walls = record.walls.filter((w) => w.storey === top).length;
  const readings = record.observations.residualDrift.filter((d) => d.storey === top).length;
  return walls > 0 || readings > 0 ? { walls, readings } : null;
}

/** Removes the top storey (callers check `storeyRemovalBlock` first and say why not). */
export function removeTopStorey(record: SurveyRecord): SurveyRecord {
  const storeys = record.building.storeys;
  if (storeys.length === 0) return record;
  const top = storeys.length - 1;
  if (storeyRemovalBlock(record) !== null) {
    throw new RangeError(`storey ${top + 1} still has walls or readings; remove them first`);
  }
  const next = forgetUnder(
    { ...record, building: { ...record.building, storeys: storeys.slice(0, top) } },
    `building.storeys.${top}`,
  );
  return next;
}

/**
 * Sets one field of every storey (the quick "N storeys × a typical height" entry). The value
 * is the inspector's own for every storey, so each is confirmed.
 */
export function setAllStoreys(
  record: SurveyRecord,
  field: 'heightM' | 'floorAreaM2',
  value: number,
): SurveyRecord {
  let next: SurveyRecord = record;
  record.building.storeys.forEach((_s, i) => {
    next = setValue(next, `building.storeys.${i}.${field}`, value);
  });
  return next;
}

/** Keeps text typed in the quick entry as pending text of every storey's field. */
export function setAllStoreysPending(
  record: SurveyRecord,
  field: 'heightM' | 'floorAreaM2',
  text: string,
): SurveyRecord {
  let next: SurveyRecord = record;
  record.building.storeys.forEach((_s, i) => {
    next = keepUnparsed(next, `building.storeys.${i}.${field}`, text);
  });
  return next;
}

// ——— Walls ———

/** Types of a light-frame wall entered as a total length per sheathing. */
export const SHEATHING_TYPES = [
  'wsp-150',
  'wsp-100',
  'wsp-75',
  'wsp-50',
  'gypsum',
  'diagonal-boards',
  'unsheathed',
] as const satisfies readonly WallRecord['type'][];

export type SheathingType = (typeof SHEATHING_TYPES)[number];

/** Wall types that carry dimensions, loads and connectors (mass timber, rocking). */
export function isPanelType(type: WallRecord['type']): boolean {
  return type === 'clt-bracketed' || type === 'rocking';
}

/** Id of the total-length group of one sheathing type on one storey and direction. */
export function totalWallId(storey: number, direction: 'x' | 'y', type: SheathingType): string {
  return `${storey + 1}${direction.toUpperCase()}-total-${type}`;
}

/** A fresh id for a single wall: storey number, direction and a running number ("2Y-3"). */
export function nextWallId(record: SurveyRecord, storey: number, direction: 'x' | 'y'): string {
  const prefix = `${storey + 1}${direction.toUpperCase()}-`;
  let n = 0;
  for (const w of record.walls) {
    if (!w.id.startsWith(prefix)) continue;
    const k = Number(w.id.slice(prefix.length));
    if (Number.isInteger(k) && k > n) n = k;
  }
  return `${prefix}${n + 1}`;
}

function blankWall(
  id: string,
  storey: number,
  direction: 'x' | 'y',
  type: WallRecord['type'],
  lengthM: number,
): WallRecord {
  return {
    id,
    storey,
    direction,
    type,
    lengthM,
    heightM: null,
    positionM: null,
    connectors: isPanelType(type)
      ? {
          holdDownCount: null,
          holdDownCapacityN: null,
          holdDownStiffnessNPerM: null,
          bracketCount: null,
          bracketCapacityN: null,
          bracketStiffnessNPerM: null,
        }
      : null,
    rocking: isPanelType(type)
      ? { thicknessM: null, selfWeightN: null, gravityLoadN: null, postTensionN: null }
      : null,
    devices: [],
    userUnitShearNPerM: null,
    userUnitStiffnessNPerM2: null,
  };
}

/**
 * Sets the total length of one sheathing type on one storey and direction: creates the
 * group, changes it, or (length null: the field was cleared) removes it.
 */
export function setSheathingTotal(
  record: SurveyRecord,
  storey: number,
  direction: 'x' | 'y',
  type: SheathingType,
  lengthM: number | null,
): SurveyRecord {
  const id = totalWallId(storey, direction, type);
  const index = record.walls.findIndex((w) => w.id === id);
  if (lengthM === null)
    return index === -1 ? clearUnparsed(record, pendingTotalKey(id)) : removeWall(record, index);
  if (index === -1) {
    return clearUnparsed(
      { ...record, walls: [...record.walls, blankWall(id, storey, direction, type, lengthM)] },
      pendingTotalKey(id),
    );
  }
  return setValue(record, `walls.${index}.lengthM`, lengthM);
}

/** Where text typed for a not-yet-existing sheathing total is kept. */
export function pendingTotalKey(wallId: string): string {
  return `walls.${wallId}.lengthM`;
}

/**
 * Default length of a new single wall or panel, m: a placeholder listed as unconfirmed
 * until typed (common practice, no source: a 2.4 m panel is a usual module).
 */
export const DEFAULT_WALL_LENGTH_M = 2.4;

/** Adds a single wall of `type`; its length is a placeholder until the inspector types one. */
export function addWall(
  record: SurveyRecord,
  storey: number,
  direction: 'x' | 'y',
  type: WallRecord['type'],
): { record: SurveyRecord; index: number } {
  const id = nextWallId(record, storey, direction);
  const wall = blankWall(id, storey, direction, type, DEFAULT_WALL_LENGTH_M);
  const index = record.walls.length;
  const next = markUnconfirmed(
    { ...record, walls: [...record.walls, wall] },
    `walls.${index}.lengthM`,
  );
  return { record: next, index };
}

/** Changes a wall's type, adding or dropping the panel details that go with it. */
export function setWallType(
  record: SurveyRecord,
  index: number,
  type: WallRecord['type'],
): SurveyRecord {
  const wall = record.walls[index];
  if (!wall) throw new RangeError(`wall index must exist, got ${index}`);
  const panel = isPanelType(type);
  const blank = blankWall(wall.id, wall.storey, wall.direction, type, wall.lengthM);
  const updated: WallRecord = {
    ...wall,
    type,
    connectors: panel ? (wall.connectors ?? blank.connectors) : wall.connectors,
    rocking: panel ? (wall.rocking ?? blank.rocking) : wall.rocking,
  };
  const walls = record.walls.slice();
  walls[index] = updated;
  return confirmField({ ...record, walls }, `walls.${index}.type`);
}

/** Removes a wall and every uplift reading that refers to it. */
export function removeWall(record: SurveyRecord, index: number): SurveyRecord {
  const wall = record.walls[index];
  if (!wall) throw new RangeError(`wall index must exist, got ${index}`);
  let next: SurveyRecord = shiftAfterRemoval(
    { ...record, walls: record.walls.filter((_w, i) => i !== index) },
    'walls',
    index,
  );
  for (;;) {
    const u = next.observations.uplift.findIndex((x) => x.wallId === wall.id);
    if (u === -1) break;
    next = removeUplift(next, u);
  }
  return forgetUnder(next, upliftPendingKey(wall.id));
}

/**
 * Copies the walls of one storey and direction to another storey that has none there yet,
 * marked unconfirmed. (A storey that already has walls along that direction is left as it
 * is: copying again would double them.)
 */
export function copyWalls(
  record: SurveyRecord,
  fromStorey: number,
  toStorey: number,
  direction: 'x' | 'y',
): SurveyRecord {
  if (record.walls.some((w) => w.storey === toStorey && w.direction === direction)) return record;
  let next = record;
  for (const w of record.walls) {
    if (w.storey !== fromStorey || w.direction !== direction) continue;
    const total = /-total-(.+)$/.exec(w.id);
    const id = total
      ? totalWallId(toStorey, direction, total[1] as SheathingType)
      : nextWallId(next, toStorey, direction);
    if (next.walls.some((x) => x.id === id)) continue;
    const index = next.walls.length;
    next = { ...next, walls: [...next.walls, { ...w, id, storey: toStorey }] };
    next = markUnconfirmed(next, `walls.${index}.lengthM`);
  }
  return next;
}

// ——— Observations ———

/** Sets the uplift gap at a wall (null: cleared, the reading is removed). */
export function setUplift(record: SurveyRecord, wallId: string, gapM: number | null): SurveyRecord {
  const index = record.observations.uplift.findIndex((u) => u.wallId === wallId);
  const pendingKey = upliftPendingKey(wallId);
  if (gapM === null) {
    const cleared = clearUnparsed(record, pendingKey);
    return index === -1 ? cleared : removeUplift(cleared, index);
  }
  if (index === -1) {
    const uplift = [...record.observations.uplift, { wallId, gapM }];
    return clearUnparsed(
      { ...record, observations: { ...record.observations, uplift } },
      pendingKey,
    );
  }
  return setValue(record, `observations.uplift.${index}.gapM`, gapM);
}

/**
 * Where text typed for the uplift of a wall that has no reading yet is kept. The `wall-`
 * prefix keeps it apart from list indices (`observations.uplift.3.gapM`).
 */
export function upliftPendingKey(wallId: string): string {
  return `observations.uplift.wall-${wallId}.gapM`;
}

function removeUplift(record: SurveyRecord, index: number): SurveyRecord {
  const uplift = record.observations.uplift.filter((_u, i) => i !== index);
  return shiftAfterRemoval(
    { ...record, observations: { ...record.observations, uplift } },
    'observations.uplift',
    index,
  );
}

/** Removes the residual drift reading at `index`. */
export function removeDrift(record: SurveyRecord, index: number): SurveyRecord {
  const residualDrift = record.observations.residualDrift.filter((_d, i) => i !== index);
  return shiftAfterRemoval(
    { ...record, observations: { ...record.observations, residualDrift } },
    'observations.residualDrift',
    index,
  );
}
