/**
 * Entering the hazard (the response spectrum to screen against). A spectrum only exists
 * once its required values are all valid; until then the chosen kind and every typed value
 * are kept as text in `unparsed` under `hazard.*`, so a half-entered spectrum survives a
 * reload and is never screened against.
 */
import {
  clearUnparsed,
  confirmField,
  keepUnparsed,
  type SurveyRecord,
} from '../../../forms/index.js';
import { checkNumber, numberSpecFor, type FieldChange } from '../../../forms/fields/index.js';
import type { UnitSystem } from '../../../forms/units/index.js';
import type { SpectrumSpec } from '../../../calc/index.js';

export type HazardKind = SpectrumSpec['kind'];
export const HAZARD_KINDS: readonly HazardKind[] = ['ec8', 'asce7', 'event'];

/** Number fields of each kind; the first ones are required. */
export const HAZARD_FIELDS: Record<HazardKind, { required: string[]; optional: string[] }> = {
  ec8: { required: ['ag'], optional: ['S', 'TB', 'TC', 'TD', 'damping'] },
  asce7: { required: ['SDS', 'SD1', 'TL'], optional: ['damping'] },
  event: { required: ['pga', 'sa03', 'sa10'], optional: ['damping'] },
};

const CHOICE_KEYS = ['hazard.kind', 'hazard.type', 'hazard.ground'] as const;

/** The kind being entered: the stored spectrum's, or the one chosen for a draft. */
export function hazardKind(record: SurveyRecord): HazardKind | null {
  if (record.hazard) return record.hazard.kind;
  const k = record.unparsed['hazard.kind'];
  return k === 'ec8' || k === 'asce7' || k === 'event' ? k : null;
}

/** EC8 spectrum type and ground of a stored spectrum or a draft (defaults: type 1, ground B). */
export function ec8Choices(record: SurveyRecord): {
  type: 1 | 2;
  ground: 'A' | 'B' | 'C' | 'D' | 'E';
} {
  if (record.hazard?.kind === 'ec8')
    return { type: record.hazard.type, ground: record.hazard.ground };
  const type = record.unparsed['hazard.type'] === '2' ? 2 : 1;
  const g = record.unparsed['hazard.ground'];
  const ground = g === 'A' || g === 'C' || g === 'D' || g === 'E' ? g : 'B';
  return { type, ground };
}

/** True when a draft has choices the inspector made but no values yet (nothing to lose). */
export function hazardHasValues(record: SurveyRecord): boolean {
  if (record.hazard) return true;
  return Object.keys(record.unparsed).some(
    (k) => k.startsWith('hazard.') && !(CHOICE_KEYS as readonly string[]).includes(k),
  );
}

function clearHazardDraft(record: SurveyRecord): SurveyRecord {
  let next = record;
  for (const k of Object.keys(record.unparsed)) {
    if (k === 'hazard' || k.startsWith('hazard.')) next = clearUnparsed(next, k);
  }
  return next;
}

/** Tries to build the spectrum from a draft; returns the record unchanged when incomplete. */
function assemble(record: SurveyRecord, system: UnitSystem): SurveyRecord {
  const kind = hazardKind(record);
  if (kind === null || record.hazard) return record;
  const values: Record<string, number> = {};
  const { required, optional } = HAZARD_FIELDS[kind];
  for (const f of [...required, ...optional]) {
    const text = record.unparsed[`hazard.${f}`];
    const spec = numberSpecFor(`hazard.${f}`);
    if (!spec) continue;
    if (text === undefined || text.trim() === '') {
      if (required.includes(f)) return record;
      continue;
    }
    const c = checkNumber(text, spec, system);
    if (c.state !== 'valid') return record;
    values[f] = c.valueSI;
  }
  let hazard: SpectrumSpec;
  if (kind === 'ec8') {
    hazard = { kind, ...ec8Choices(record), ag: values.ag ?? 0 };
    for (const f of ['S', 'TB', 'TC', 'TD', 'damping'] as const) {
      if (values[f] !== undefined) hazard[f] = values[f];
    }
  } else if (kind === 'asce7') {
    hazard = { kind, SDS: values.SDS ?? 0, SD1: values.SD1 ?? 0, TL: values.TL ?? 0 };
    if (values.damping !== undefined) hazard.damping = values.damping;
  } else {
    hazard = { kind, pga: values.pga ?? 0, sa03: values.sa03 ?? 0, sa10: values.sa10 ?? 0 };
    if (values.damping !== undefined) hazard.damping = values.damping;
  }
  return confirmField(clearHazardDraft({ ...record, hazard }), 'hazard');
}

/** Starts entering a spectrum of `kind` (any stored spectrum is replaced: ask first). */
export function chooseHazardKind(record: SurveyRecord, kind: HazardKind): SurveyRecord {
  if (hazardKind(record) === kind) return record;
  const cleared = confirmField(clearHazardDraft({ ...record, hazard: null }), 'hazard');
  return keepUnparsed(cleared, 'hazard.kind', kind);
}

/** Sets the EC8 type or ground of a stored spectrum or a draft. */
export function setEc8Choice(
  record: SurveyRecord,
  field: 'type' | 'ground',
  value: string,
  system: UnitSystem,
): SurveyRecord {
  if (record.hazard?.kind === 'ec8') {
    const hazard = {
      ...record.hazard,
      [field]: field === 'type' ? Number(value) : value,
    } as SpectrumSpec;
    return confirmField({ ...record, hazard }, 'hazard');
  }
  return assemble(keepUnparsed(record, `hazard.${field}`, value), system);
}

/** Applies what a hazard number field reported. */
export function applyHazardChange(
  record: SurveyRecord,
  change: FieldChange,
  system: UnitSystem,
): SurveyRecord {
  const field = change.path.slice('hazard.'.length);
  const h = record.hazard;
  if (h === null) {
    // Draft: keep every entry as text; the spectrum appears once all are valid.
    return assemble(keepUnparsed(record, change.path, change.text), system);
  }
  if (change.kind === 'pending') return keepUnparsed(record, change.path, change.text);
  const next = { ...h } as Record<string, unknown>;
  if (change.value === null) delete next[field];
  else next[field] = change.value;
  return confirmField(
    clearUnparsed({ ...record, hazard: next as unknown as SpectrumSpec }, change.path),
    'hazard',
  );
}
