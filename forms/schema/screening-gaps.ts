/**
 * "Complete enough to screen": what a stored (valid) draft still lacks before the
 * calculation may run on it. These are not storage errors: a record with gaps is saved like
 * any other; the screen lists the gaps and keeps the result button waiting.
 */
import { EC8_TYPE1, EC8_TYPE2 } from '../../calc/spectra/index.js';
import { labelFor } from './field-messages.js';
import { en, type MessageCatalogue } from './messages.js';
import type { SurveyRecord } from './survey-record.js';

export type GapKind =
  | 'no-storeys'
  | 'no-walls'
  | 'no-hazard'
  | 'wall-on-missing-storey'
  | 'duplicate-wall-id'
  | 'uplift-unknown-wall'
  | 'drift-on-missing-storey'
  | 'corner-periods-order'
  | 'unconfirmed'
  | 'unparsed';

/** One missing or inconsistent thing, with the field it belongs to ('' for the record). */
export interface ScreeningGap {
  kind: GapKind;
  path: string;
  message: string;
}

/** Everything that keeps `record` from being screened; empty when it is ready. */
export function screeningGaps(
  record: SurveyRecord,
  catalogue: MessageCatalogue = en,
): ScreeningGap[] {
  const g = catalogue.gaps;
  const gaps: ScreeningGap[] = [];
  const storeys = record.building.storeys;

  for (const path of record.unparsed ? Object.keys(record.unparsed) : []) {
    gaps.push({
      kind: 'unparsed',
      path,
      message: g.unparsed(labelFor(path, catalogue).label, record.unparsed[path] ?? ''),
    });
  }
  for (const path of record.unconfirmed) {
    gaps.push({
      kind: 'unconfirmed',
      path,
      message: g.unconfirmed(labelFor(path, catalogue).label),
    });
  }

  if (storeys.length === 0) {
    gaps.push({ kind: 'no-storeys', path: 'building.storeys', message: g.noStoreys });
  }
  for (let s = 0; s < storeys.length; s++) {
    for (const d of ['x', 'y'] as const) {
      if (!record.walls.some((w) => w.storey === s && w.direction === d)) {
        gaps.push({
          kind: 'no-walls',
          path: 'walls',
          message: g.noWalls(s + 1, catalogue.direction(d)),
        });
      }
    }
  }

  const seen = new Set<string>();
  record.walls.forEach((w, i) => {
    if (w.storey >= storeys.length) {
      gaps.push({
        kind: 'wall-on-missing-storey',
        path: `walls.${i}.storey`,
        message: g.wallOnMissingStorey(w.id, w.storey + 1),
      });
    }
    if (seen.has(w.id)) {
      gaps.push({
        kind: 'duplicate-wall-id',
        path: `walls.${i}.id`,
        message: g.duplicateWallId(w.id),
      });
    }
    seen.add(w.id);
  });
  record.observations.uplift.forEach((u, i) => {
    if (!seen.has(u.wallId)) {
      gaps.push({
        kind: 'uplift-unknown-wall',
        path: `observations.uplift.${i}.wallId`,
        message: g.upliftUnknownWall(u.wallId),
      });
    }
  });
  record.observations.residualDrift.forEach((d, i) => {
    if (d.storey >= storeys.length) {
      gaps.push({
        kind: 'drift-on-missing-storey',
        path: `observations.residualDrift.${i}.storey`,
        message: g.driftOnMissingStorey(d.storey + 1),
      });
    }
  });

  const h = record.hazard;
  if (h === null) {
    gaps.push({ kind: 'no-hazard', path: 'hazard', message: g.noHazard });
  } else if (h.kind === 'ec8') {
    // The calculation fills absent corner periods from the recommended table of the type
    // and ground, then refuses TB > TC or TC > TD; check the same combination here.
    const row = (h.type === 1 ? EC8_TYPE1 : EC8_TYPE2)[h.ground];
    const TB = h.TB ?? row.TB;
    const TC = h.TC ?? row.TC;
    const TD = h.TD ?? row.TD;
    if (!(TB <= TC && TC <= TD)) {
      gaps.push({ kind: 'corner-periods-order', path: 'hazard.TB', message: g.cornerPeriodsOrder });
    }
  }
  return gaps;
}
