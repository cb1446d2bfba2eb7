/**
 * Observed evidence: residual drift readings and the observed-damage checklist, as evidence
 * items. (Uplift readings: rocking-evidence.ts.) Readings that are not usable are listed as
 * invalid inputs; nothing is dropped without a word.
 */
import { CHECKLIST_RULES } from '../damage/checklist-states.js';
import { damageStateRank } from '../damage/damage-state.js';
import {
  REPAIR_VERSUS_REBUILD_RATIO,
  RESIDUAL_DRIFT_THRESHOLDS,
  RESIDUAL_STABILITY_RATIO,
  residualDriftState,
} from '../damage/residual-drift-states.js';
import type { Findings } from '../storey/findings.js';
import type { ChecklistEntry, DriftMethod, Severity, SurveyInput } from '../survey/survey-input.js';
import type { EvidenceItem } from './evidence.js';
import { CHECKLIST_POSTING_FLOORS } from './posting-rules.js';
import { capital, percent, storeyName } from './text-format.js';
import { DAMAGE_STATE_WORDS } from './verdict-words.js';

const METHOD_WORDS: Record<DriftMethod, string> = {
  offset: 'measured offset',
  tilt: 'measured tilt',
  'phone-tilt': 'phone tilt',
  estimate: 'estimate',
};

const RESIDUAL_SOURCE =
  'FEMA P-58-1 Appendix C Table C-1 residual drift states (from memory, verify); 0.5 % repair-or-rebuild level after McCormick et al. 2008, 14WCEE (from memory, verify); link to Hazus names ours';

/** One item per residual drift reading. */
export function residualDriftEvidence(survey: SurveyInput, findings: Findings): EvidenceItem[] {
  const out: EvidenceItem[] = [];
  const list = Array.isArray(survey.observations?.residualDrift)
    ? survey.observations.residualDrift
    : [];
  const seen = new Map<string, number>();
  list.forEach((r, i) => {
    const ratio = r?.ratio;
    if (typeof ratio !== 'number' || !Number.isFinite(ratio) || ratio < 0) {
      findings.invalid(
        `observations.residualDrift[${i}].ratio`,
        `residual drift ${String(ratio)} is not a number ≥ 0; the reading is not used`,
      );
      return;
    }
    const storey = Number.isInteger(r.storey) && r.storey >= 0 ? r.storey : null;
    const dir = r.direction === 'x' || r.direction === 'y' ? r.direction : null;
    const key = `${storey ?? 'unknown'}.${dir ?? 'unknown'}`;
    const n = seen.get(key) ?? 0;
    seen.set(key, n + 1);
    const { state, threshold } = residualDriftState(ratio);
    const next = RESIDUAL_DRIFT_THRESHOLDS.find((t) => t.ratio > ratio);
    const u =
      typeof r.uncertainty === 'number' && Number.isFinite(r.uncertainty) && r.uncertainty > 0
        ? ` ± ${percent(r.uncertainty)}`
        : '';
    const where = `${storey === null ? 'a storey' : storeyName(storey)}, along ${dir ?? 'an unknown direction'}`;
    const method = METHOD_WORDS[r.method] ?? 'reading';
    const beyondRepair = ratio >= REPAIR_VERSUS_REBUILD_RATIO;
    const stability = ratio >= RESIDUAL_STABILITY_RATIO;
    let text = `Residual drift ${percent(ratio)}${u} in ${where} (${method})`;
    text +=
      threshold === null
        ? `: below ${percent(RESIDUAL_DRIFT_THRESHOLDS[0]!.ratio)}, nothing needs realigning.`
        : `: at or past ${percent(threshold.ratio)}, ${threshold.meaning} (at least ${DAMAGE_STATE_WORDS[state]}).`;
    if (stability) {
      text += ' From 1 % an engineer should judge its stability in aftershocks.';
    } else if (beyondRepair) {
      text += ' About 0.5 % is where repair often costs more than rebuilding.';
    }
    out.push({
      id: `residual-drift.${key}${n > 0 ? `.${n}` : ''}`,
      side: 'observed',
      kind: 'residual-drift',
      label: 'Residual drift',
      where,
      value: ratio,
      unit: 'ratio',
      valueText: `${percent(ratio)}${u}`,
      threshold: threshold?.ratio ?? next?.ratio ?? null,
      thresholdText: RESIDUAL_DRIFT_THRESHOLDS.map(
        (t) => `${percent(t.ratio)} ${DAMAGE_STATE_WORDS[t.state]}`,
      ).join(', '),
      state,
      postingFloor: null,
      flag: stability ? 'residual-drift-stability' : beyondRepair ? 'residual-drift' : null,
      text,
      source: RESIDUAL_SOURCE,
    });
  });
  return out;
}

/** One item per checklist item seen (the worse severity when an item is listed twice). */
export function checklistEvidence(survey: SurveyInput, findings: Findings): EvidenceItem[] {
  const list: ChecklistEntry[] = Array.isArray(survey.observations?.checklist)
    ? survey.observations.checklist
    : [];
  const worst = new Map<string, Severity>();
  list.forEach((entry, i) => {
    const rule = CHECKLIST_RULES[entry?.item];
    if (rule === undefined || (entry.severity !== 'minor' && entry.severity !== 'severe')) {
      findings.invalid(
        `observations.checklist[${i}]`,
        `checklist entry ${JSON.stringify(entry)} is not an item with severity minor or severe; not used`,
      );
      return;
    }
    const before = worst.get(entry.item);
    if (before === undefined || entry.severity === 'severe') worst.set(entry.item, entry.severity);
  });
  const out: EvidenceItem[] = [];
  for (const [item, severity] of worst) {
    const rule = CHECKLIST_RULES[item as ChecklistEntry['item']];
    const state = rule.state[severity];
    const floor = CHECKLIST_POSTING_FLOORS[rule.item]?.[severity] ?? null;
    out.push({
      id: `checklist.${rule.item}`,
      side: 'observed',
      kind: 'checklist',
      label: capital(rule.words),
      where: null,
      value: null,
      unit: 'none',
      valueText: severity,
      threshold: null,
      thresholdText: `minor: at least ${DAMAGE_STATE_WORDS[rule.state.minor]}; severe: at least ${DAMAGE_STATE_WORDS[rule.state.severe]}`,
      state,
      postingFloor: floor,
      flag: rule.item === 'ground-failure' ? 'ground-failure' : null,
      text:
        `Seen (${severity}): ${rule.words}; ${rule.why} (at least ${DAMAGE_STATE_WORDS[state]}` +
        (floor !== null
          ? `, and at least a ${floor === 'keep-out' ? 'keep-out' : 'limited-entry'} posting`
          : '') +
        ').',
      source:
        'checklist table ours (common practice, no source), read against the Hazus W1/W2 damage-state descriptions',
    });
  }
  // Most severe first, so the reasons read in order of weight.
  out.sort((a, b) => damageStateRank(b.state ?? 'none') - damageStateRank(a.state ?? 'none'));
  return out;
}
