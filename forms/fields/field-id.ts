/** DOM ids for fields, derived from the record path, so a summary can link to each field. */

/** 'building.storeys.0.heightM' → 'f-building-storeys-0-heightM'. */
export function fieldId(path: string): string {
  return `f-${path.replace(/[^A-Za-z0-9_-]/g, '-')}`;
}
