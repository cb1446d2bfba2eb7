/**
 * What each step still has to fix: entries kept as text because they are not valid yet
 * (errors, with the field's own sentence) and what the screening still lacks (gaps), each
 * linked to the field. A step with errors says where they are; the step bar counts them.
 */
import { screeningGaps, type SurveyRecord } from '../../../forms/index.js';
import { checkNumber, fieldId, numberSpecFor } from '../../../forms/fields/index.js';
import type { UnitSystem } from '../../../forms/units/index.js';
import { t } from '../../i18n/index.js';
import { optionLabel } from './option-labels.js';
import { STEPS, stepOfPath, type StepId } from './steps.js';

export interface StepIssue {
  /** 'error': typed text that is not a valid value; 'gap': missing or to confirm. */
  kind: 'error' | 'gap';
  path: string;
  /** Element id to link to (the field, or the step's section). */
  target: string;
  message: string;
}

export type StepIssues = Record<StepId, StepIssue[]>;

/** Field ids are derived from the stored path; pending keys of new items map to their field. */
function targetOf(path: string): string {
  return fieldId(path);
}

/**
 * The spec of the field at `path`, also for keys of items that do not exist yet
 * ('walls.1X-total-wsp-100.lengthM', 'observations.uplift.wall-2X-1.gapM'): the named
 * segment stands where a list index would.
 */
export function specForKey(path: string) {
  const direct = numberSpecFor(path);
  if (direct) return direct;
  const parts = path.split('.');
  for (let i = 1; i < parts.length - 1; i++) {
    const spec = numberSpecFor([...parts.slice(0, i), '0', ...parts.slice(i + 1)].join('.'));
    if (spec) return spec;
  }
  return null;
}

/** Draft choices of a hazard being entered: bookkeeping, not entries to fix. */
const DRAFT_CHOICES = new Set(['hazard.kind', 'hazard.type', 'hazard.ground']);

/** The sentence for text kept at `path`: the field's own check, else the schema's wording. */
function pendingMessage(path: string, text: string, system: UnitSystem, fallback: string): string {
  const spec = specForKey(path);
  if (spec) {
    const c = checkNumber(text, spec, system);
    if (c.state === 'invalid') return c.message;
    // Valid text that is still kept (e.g. a height waiting for its offset): say so.
    return t('issues.pendingIncomplete', { label: t(spec.label), text });
  }
  return fallback;
}

const along = (d: string) => t(d.toLowerCase() === 'x' ? 'walls.alongX' : 'walls.alongY');

/**
 * Where in the survey a path is, in words ("Storey 2", "Wall 1X-3", "Storey 1, along x"),
 * so that two identical sentences in the summary can be told apart; null for single fields.
 */
export function whereOf(record: SurveyRecord, path: string): string | null {
  const p = path.split('.');
  const index = (i: number) => (/^\d+$/.test(p[i] ?? '') ? Number(p[i]) : null);
  if (p[0] === 'building' && p[1] === 'storeys') {
    const i = index(2);
    return i === null ? null : t('building.storeyName', { n: i + 1 });
  }
  if (p[0] === 'walls') {
    const i = index(1);
    if (i !== null) return t('walls.wallName', { id: record.walls[i]?.id ?? String(i + 1) });
    const total = /^(\d+)([XY])-total-(.+)$/.exec(p[1] ?? '');
    if (total) {
      return `${t('building.storeyName', { n: Number(total[1]) })}, ${along(total[2] ?? 'x')}, ${optionLabel('wallType', total[3] ?? '')}`;
    }
    return null;
  }
  if (p[0] === 'observations' && p[1] === 'uplift') {
    const i = index(2);
    const id = i !== null ? record.observations.uplift[i]?.wallId : p[2]?.replace(/^wall-/, '');
    return id === undefined ? null : t('walls.wallName', { id });
  }
  if (p[0] === 'observations' && p[1] === 'residualDrift') {
    const i = index(2);
    if (i !== null) {
      const d = record.observations.residualDrift[i];
      return d ? t('obs.driftName', { storey: d.storey + 1, direction: along(d.direction) }) : null;
    }
    const m = /^s(\d+)([xy])$/.exec(p[2] ?? '');
    return m ? t('obs.driftName', { storey: Number(m[1]), direction: along(m[2] ?? 'x') }) : null;
  }
  if (p[0] === 'photos') {
    const i = index(1);
    return i === null ? null : t('photos.captionOf', { n: i + 1 });
  }
  return null;
}

/** Everything each step still has to fix, errors first. */
export function stepIssues(record: SurveyRecord, system: UnitSystem): StepIssues {
  const out = Object.fromEntries(STEPS.map((s) => [s, [] as StepIssue[]])) as StepIssues;
  for (const gap of screeningGaps(record)) {
    const step = stepOfPath(gap.path) ?? 'place';
    if (gap.kind === 'unparsed' && DRAFT_CHOICES.has(gap.path)) continue;
    if (gap.kind === 'unparsed') {
      const text = record.unparsed[gap.path] ?? '';
      const where = whereOf(record, gap.path);
      const message = pendingMessage(gap.path, text, system, gap.message);
      out[step].push({
        kind: 'error',
        path: gap.path,
        target: targetOf(gap.path),
        message: where ? `${where}: ${message}` : message,
      });
    } else {
      out[step].push({
        kind: 'gap',
        path: gap.path,
        target:
          gap.kind === 'no-walls' || gap.kind === 'no-storeys'
            ? `section-${step}`
            : targetOf(gap.path),
        message: gap.message,
      });
    }
  }
  // Without storeys there is nowhere to put walls: the walls step is not done either.
  if (record.building.storeys.length === 0) {
    out.walls.push({
      kind: 'gap',
      path: 'walls',
      target: 'section-walls',
      message: t('walls.needStoreys'),
    });
  }
  for (const s of STEPS)
    out[s].sort((a, b) => (a.kind === b.kind ? 0 : a.kind === 'error' ? -1 : 1));
  return out;
}

/** True when nothing keeps the record from being screened. */
export function readyToScreen(issues: StepIssues): boolean {
  return STEPS.every((s) => issues[s].length === 0);
}
