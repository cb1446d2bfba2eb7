/**
 * The building's position: from GPS (with its accuracy), typed coordinates, or a map tap.
 * Typed coordinates only become a location when both latitude and longitude are valid;
 * until then each typed text is kept in `unparsed`.
 */
import { clearUnparsed, keepUnparsed, type SurveyRecord } from '../../../forms/index.js';
import { checkNumber, numberSpecFor, type FieldChange } from '../../../forms/fields/index.js';
import type { UnitSystem } from '../../../forms/units/index.js';

export type LocationSource = 'gps' | 'map' | 'typed';

/** Sets the location from a position fix (GPS or a map tap). */
export function setLocation(
  record: SurveyRecord,
  lat: number,
  lon: number,
  accuracyM: number | null,
  source: LocationSource,
): SurveyRecord {
  const next = clearUnparsed(clearUnparsed(record, 'location.lat'), 'location.lon');
  return { ...next, location: { lat, lon, accuracyM, source } };
}

/** Removes the location (the inspector asked to). */
export function clearLocation(record: SurveyRecord): SurveyRecord {
  return clearUnparsed(
    clearUnparsed({ ...record, location: null }, 'location.lat'),
    'location.lon',
  );
}

/** Applies a typed latitude or longitude. */
export function applyCoordinateChange(
  record: SurveyRecord,
  change: FieldChange,
  system: UnitSystem,
): SurveyRecord {
  const field = change.path === 'location.lat' ? 'lat' : 'lon';
  const loc = record.location;
  if (loc !== null) {
    if (change.kind === 'pending' || change.value === null) {
      return keepUnparsed(record, change.path, change.kind === 'pending' ? change.text : '');
    }
    // A typed coordinate has no GPS accuracy: the position is now the typed one.
    return clearUnparsed(
      {
        ...record,
        location: { ...loc, [field]: change.value as number, accuracyM: null, source: 'typed' },
      },
      change.path,
    );
  }
  const next = keepUnparsed(record, change.path, change.text);
  const latText = next.unparsed['location.lat'];
  const lonText = next.unparsed['location.lon'];
  if (latText === undefined || lonText === undefined) return next;
  const lat = checkNumber(latText, numberSpecFor('location.lat')!, system);
  const lon = checkNumber(lonText, numberSpecFor('location.lon')!, system);
  if (lat.state !== 'valid' || lon.state !== 'valid') return next;
  return setLocation(next, lat.valueSI, lon.valueSI, null, 'typed');
}
