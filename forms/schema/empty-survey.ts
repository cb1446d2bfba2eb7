/**
 * A new, empty survey: valid to store as it is, so the first keystroke can be saved.
 */
import { SCHEMA_VERSION, type SurveyRecord } from './survey-record.js';

/**
 * Building fields that must hold a value from the first moment but that the inspector has
 * not chosen yet. They start with a neutral default and stay listed in `unconfirmed` (so
 * screening waits) until the inspector picks one.
 */
export const DEFAULTED_BUILDING_FIELDS = [
  'building.system',
  'building.codeLevel',
  'building.occupancy',
  'building.roofConstruction',
] as const;

/**
 * Makes a valid new draft with nothing entered: empty text, no storeys, walls, readings or
 * photos, no location, hazard or result. The four defaulted building fields are listed in
 * `unconfirmed`. `revision` is 1 (the store renumbers on save); `id` is a random UUID unless
 * given.
 */
export function emptySurvey(
  deviceId: string,
  now: Date,
  id: string = crypto.randomUUID(),
): SurveyRecord {
  if (!(now instanceof Date) || Number.isNaN(now.getTime())) {
    throw new RangeError(`now must be a valid Date, got ${String(now)}`);
  }
  if (typeof deviceId !== 'string' || deviceId.length === 0) {
    throw new RangeError(`deviceId must be a non-empty string, got ${JSON.stringify(deviceId)}`);
  }
  const at = now.toISOString();
  return {
    schemaVersion: SCHEMA_VERSION,
    id,
    revision: 1,
    deviceId,
    createdAt: at,
    updatedAt: at,
    address: '',
    location: null,
    inspector: '',
    team: '',
    inspectionKind: 'first',
    building: {
      // Defaults only; each is listed in `unconfirmed` below.
      system: 'light-frame',
      codeLevel: 'unknown',
      occupancy: 'single-family',
      planXM: null,
      planYM: null,
      storeys: [],
      roofConstruction: 'light',
      roofUnitWeightPa: null,
    },
    walls: [],
    observations: { uplift: [], residualDrift: [], checklist: [], notes: '' },
    hazard: null,
    measured: null,
    photos: [],
    result: null,
    lastExportedAt: null,
    instrumentRecords: [],
    unconfirmed: [...DEFAULTED_BUILDING_FIELDS],
    unparsed: {},
  };
}
