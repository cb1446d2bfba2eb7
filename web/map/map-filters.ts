/**
 * Filters of the map and their counts. Each facet (outcome, damage state, system, inspector,
 * needs-assessment) is a set of chosen values; an empty set means "all". The date range is
 * inclusive, by survey day.
 *
 * Counts are faceted, as in a shop's search page: the count beside each value is how many
 * surveys would show if that value were chosen, with every *other* filter applied. So the
 * numbers always answer "what would I see if I picked this".
 */
import type { StructuralSystem } from '../../calc/index.js';
import type { DamageKey, MapPoint, PostingKey, UnplacedSurvey } from './map-points.js';

export type AssessmentKey = 'needed' | 'not-needed';

export interface MapFilter {
  posting: ReadonlySet<PostingKey>;
  damage: ReadonlySet<DamageKey>;
  system: ReadonlySet<StructuralSystem>;
  inspector: ReadonlySet<string>;
  assessment: ReadonlySet<AssessmentKey>;
  /** First and last day shown (YYYY-MM-DD), or null for open-ended. */
  from: string | null;
  to: string | null;
}

export type Facet = 'posting' | 'damage' | 'system' | 'inspector' | 'assessment';
export const FACETS: readonly Facet[] = ['posting', 'damage', 'system', 'inspector', 'assessment'];

export const NO_FILTER: MapFilter = {
  posting: new Set(),
  damage: new Set(),
  system: new Set(),
  inspector: new Set(),
  assessment: new Set(),
  from: null,
  to: null,
};

type Summary = UnplacedSurvey | MapPoint;

function valueOf(point: Summary, facet: Facet): string {
  switch (facet) {
    case 'posting':
      return point.posting;
    case 'damage':
      return point.damage;
    case 'system':
      return point.system;
    case 'inspector':
      return point.inspector;
    case 'assessment':
      return point.needsAssessment ? 'needed' : 'not-needed';
  }
}

function passes(point: Summary, filter: MapFilter, skip: Facet | null): boolean {
  if (filter.from !== null && point.day < filter.from) return false;
  if (filter.to !== null && point.day > filter.to) return false;
  for (const facet of FACETS) {
    if (facet === skip) continue;
    const chosen = filter[facet] as ReadonlySet<string>;
    if (chosen.size > 0 && !chosen.has(valueOf(point, facet))) return false;
  }
  return true;
}

/** True when the survey passes every filter. */
export function matchesFilter(point: Summary, filter: MapFilter): boolean {
  return passes(point, filter, null);
}

/** The surveys that pass every filter. */
export function applyFilter<T extends Summary>(points: readonly T[], filter: MapFilter): T[] {
  return points.filter((p) => passes(p, filter, null));
}

/** Faceted counts: for each facet, value → how many would pass with that value chosen. */
export type FacetCounts = Record<Facet, Map<string, number>>;

export function facetCounts(points: readonly Summary[], filter: MapFilter): FacetCounts {
  const counts: FacetCounts = {
    posting: new Map(),
    damage: new Map(),
    system: new Map(),
    inspector: new Map(),
    assessment: new Map(),
  };
  if (isUnfiltered(filter)) {
    // No filter (the map as it opens): every survey counts under each of its values.
    const bump = (m: Map<string, number>, v: string) => m.set(v, (m.get(v) ?? 0) + 1);
    for (const p of points) {
      bump(counts.posting, p.posting);
      bump(counts.damage, p.damage);
      bump(counts.system, p.system);
      bump(counts.inspector, p.inspector);
      bump(counts.assessment, p.needsAssessment ? 'needed' : 'not-needed');
    }
    return counts;
  }
  for (const point of points) {
    if (filter.from !== null && point.day < filter.from) continue;
    if (filter.to !== null && point.day > filter.to) continue;
    // Which facets reject this survey? With none it counts everywhere; with exactly one,
    // it counts only under that facet (choosing its value there would let it through).
    let failed: Facet | null = null;
    let failures = 0;
    for (const facet of FACETS) {
      const chosen = filter[facet] as ReadonlySet<string>;
      if (chosen.size > 0 && !chosen.has(valueOf(point, facet))) {
        failed = facet;
        failures += 1;
        if (failures > 1) break;
      }
    }
    if (failures > 1) continue;
    for (const facet of FACETS) {
      if (failures === 1 && facet !== failed) continue;
      const m = counts[facet];
      const v = valueOf(point, facet);
      m.set(v, (m.get(v) ?? 0) + 1);
    }
  }
  return counts;
}

/** Adds or removes one value of a facet. */
export function toggleValue(filter: MapFilter, facet: Facet, value: string): MapFilter {
  const next = new Set(filter[facet] as ReadonlySet<string>);
  if (next.has(value)) next.delete(value);
  else next.add(value);
  return { ...filter, [facet]: next };
}

/** True when no filter is set. */
export function isUnfiltered(filter: MapFilter): boolean {
  return FACETS.every((f) => filter[f].size === 0) && filter.from === null && filter.to === null;
}

/** The distinct days and inspectors in the data, sorted, for the filter controls. */
export function dataRange(points: readonly Summary[]): {
  firstDay: string | null;
  lastDay: string | null;
  inspectors: string[];
} {
  let firstDay: string | null = null;
  let lastDay: string | null = null;
  const inspectors = new Set<string>();
  for (const p of points) {
    if (firstDay === null || p.day < firstDay) firstDay = p.day;
    if (lastDay === null || p.day > lastDay) lastDay = p.day;
    inspectors.add(p.inspector);
  }
  return { firstDay, lastDay, inspectors: [...inspectors].sort((a, b) => a.localeCompare(b)) };
}
