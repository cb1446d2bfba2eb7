/**
 * The screening verdict of one survey: the governing damage state with its probabilities,
 * the evidence behind it (predicted and observed side by side), a recommended posting, the
 * flags that send the building to a detailed assessment, a confidence statement, and the
 * cautions. See {@link screen}.
 */
import { HAZUS_WOOD } from '../damage/hazus-wood-parameters.js';
import { hazusWoodClass } from '../damage/hazus-wood-class.js';
import { damageStateRank, worstDamageState, type DamageState } from '../damage/damage-state.js';
import { C1_SITE_CONSTANT } from '../damage/inelastic-displacement.js';
import { spectralAcceleration } from '../spectra/spectral-acceleration.js';
import type { SpectrumSpec } from '../spectra/spectrum-spec.js';
import { buildingResponse, type BuildingResponse } from '../storey/building-response.js';
import { Findings, type Assumption, type MissingInput } from '../storey/findings.js';
import type { SurveyInput } from '../survey/survey-input.js';
import { CALC_VERSION } from '../version.js';
import { directionSummary, type DirectionSummary } from './direction-summary.js';
import type { EvidenceItem } from './evidence.js';
import { checklistEvidence, residualDriftEvidence } from './observed-evidence.js';
import { postingRank, type PostingLevel } from './posting-level.js';
import { POSTING_BY_STATE, stricterPosting } from './posting-rules.js';
import {
  demandCapacityEvidence,
  fragilityEvidence,
  noStrengthEvidence,
  softWeakEvidence,
  stiffnessLossEvidence,
  torsionEvidence,
  type FragilityReading,
} from './predicted-evidence.js';
import { rockingEvidence } from './rocking-evidence.js';
import {
  FRAGILITY_CAUTION,
  POSTING_CAUTION,
  RESIDUAL_DRIFT_CAUTION,
  VERDICT_CAUTION,
} from './screening-cautions.js';
import { SCREENING_FLAGS, type ScreeningFlag, type ScreeningFlagId } from './screening-flags.js';
import {
  RESULT_VERSION,
  type ScreeningConfidence,
  type ScreeningProbabilities,
  type ScreeningResult,
} from './screening-result.js';
import { fieldLabel } from './field-label.js';
import { fixed, storeyName } from './text-format.js';
import { DAMAGE_STATE_WORDS, POSTING_WORDS } from './verdict-words.js';

/** Options of {@link screen}. */
export interface ScreenOptions {
  /**
   * Run the pulse time-history check of each rocking wall (default true). It takes some
   * tens of ms per wall; without it the rocking prediction is the spectral estimate only,
   * which is known to be unreliable in some cases (see calc/rocking).
   */
  rockingTimeHistory?: boolean;
}

/**
 * Dispersion added to every fragility β for each group of uncertain inputs (empirical
 * period, defaulted code level, walls with missing or typical values), combined with the
 * published β by the square root of the sum of squares, as FEMA P-58-1 combines its
 * modelling dispersions (method from memory, verify; 0.25 ours, common practice, no source).
 */
export const ADDED_BETA_PER_GROUP = 0.25;

const WORDS = DAMAGE_STATE_WORDS;

/** The hazard when it is usable: a spectrum the storey model accepted. */
function usableHazard(survey: SurveyInput, response: BuildingResponse): SpectrumSpec | null {
  const h = survey.hazard;
  if (h === null || h === undefined || typeof h !== 'object') return null;
  if (response.missingInputs.some((m) => m.field === 'hazard' || m.field.startsWith('hazard.'))) {
    return null;
  }
  try {
    spectralAcceleration(h, 0);
    return h;
  } catch {
    return null;
  }
}

/** The constant a of C1 from the ground type of an EN 1998-1 spectrum, else soft ground. */
function siteConstant(hazard: SpectrumSpec | null, findings: Findings): number {
  if (hazard !== null && hazard.kind === 'ec8') {
    // EN 1998-1 Table 3.1 ground types by vs,30 against the ASCE 7 site classes: A (> 800 m/s)
    // ≈ A/B, B (360–800) ≈ C, C (180–360) ≈ D, D (< 180) ≈ E; E (thin soil on rock) taken as
    // D (derived from the vs,30 ranges of both tables).
    const a =
      hazard.ground === 'A'
        ? C1_SITE_CONSTANT.AB
        : hazard.ground === 'B'
          ? C1_SITE_CONSTANT.C
          : C1_SITE_CONSTANT.DEF;
    findings.assume(
      'screening.c1-site',
      `C1 site constant a = ${a} for EN 1998-1 ground ${hazard.ground} (matched to the ASCE 41 site classes by vs,30).`,
      'ASCE 41-17 §7.4.3.3.2 (from memory, verify); EN 1998-1:2004 Table 3.1',
    );
    return a;
  }
  if (hazard !== null) {
    findings.assume(
      'screening.c1-site.default',
      `The spectrum does not say the ground type: C1 uses a = ${C1_SITE_CONSTANT.DEF}, soft ground (the largest C1).`,
      'ASCE 41-17 §7.4.3.3.2 (from memory, verify); default ours, conservative',
    );
  }
  return C1_SITE_CONSTANT.DEF;
}

function probabilitiesOf(r: FragilityReading): ScreeningProbabilities {
  return {
    basis: r.basis,
    demand: r.demand,
    exceedance: { ...r.probabilities.exceedance },
    discrete: { ...r.probabilities.discrete },
    betas: r.betas,
    mostLikelyState: r.probabilities.mostLikelyState,
  };
}

/** Supplemental devices on walls that are not rocking walls (those are in rocking evidence). */
function deviceEvidence(survey: SurveyInput): EvidenceItem[] {
  const walls = Array.isArray(survey.walls) ? survey.walls : [];
  const out: EvidenceItem[] = [];
  walls.forEach((w) => {
    if (w === null || typeof w !== 'object' || w.type === 'rocking') return;
    const devices = Array.isArray(w.devices) ? w.devices : [];
    if (devices.length === 0) return;
    out.push({
      id: `devices.${String(w.id)}`,
      side: 'predicted',
      kind: 'devices',
      label: 'Supplemental devices',
      where: `wall ${String(w.id)}`,
      value: null,
      unit: 'none',
      valueText: devices.join(', '),
      threshold: null,
      thresholdText: 'any device',
      state: null,
      postingFloor: null,
      flag: 'devices-not-modelled',
      text: `Wall ${String(w.id)} has supplemental devices (${devices.join(', ')}): they are not modelled.`,
      source: 'scope of the storey model (calc/storey)',
    });
  });
  return out;
}

/** Replaces any non-finite number by null (and says where), so the result is plain JSON. */
function plain(value: unknown, path: string, bad: string[]): unknown {
  if (typeof value === 'number') {
    if (Number.isFinite(value)) return value;
    bad.push(path);
    return null;
  }
  if (Array.isArray(value)) return value.map((v, i) => plain(v, `${path}[${i}]`, bad));
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) {
      if (v !== undefined) out[k] = plain(v, `${path}.${k}`, bad);
    }
    return out;
  }
  return value;
}

/** Key defaults: the ones that lower the confidence. */
const KEY_DEFAULT =
  /^(period\.empirical|demand\.elf|storey\.partial|wall\.clt-typical|period\.measured-both)/;
/** Defaults worth listing (mass and load defaults included). */
const ANY_DEFAULT = /default|typical|empirical|partial|measured-both|elf/;

function confidenceOf(
  predictedPossible: boolean,
  hazardGiven: boolean,
  assumptions: Assumption[],
  missing: MissingInput[],
  classDefaults: string[],
  rockingDefaults: string[],
  addedBeta: number,
): ScreeningConfidence {
  const missingText = missing.map((m) => `${fieldLabel(m.field)}: ${m.effect}`);
  const defaulted = [
    ...classDefaults,
    ...assumptions.filter((a) => ANY_DEFAULT.test(a.id)).map((a) => a.text),
    ...rockingDefaults,
  ];
  const key = assumptions.filter((a) => KEY_DEFAULT.test(a.id)).map((a) => a.text);
  let level: ScreeningConfidence['level'];
  let statement: string;
  if (!predictedPossible) {
    level = 'low';
    statement = hazardGiven
      ? 'Confidence low: the demand could not be computed (see the missing inputs), so nothing is predicted and the verdict rests on what was seen.'
      : 'Confidence low: there is no usable hazard, so nothing is predicted and the verdict rests on what was seen.';
  } else if (missing.length > 0 || key.length > 0 || classDefaults.length > 0) {
    level = 'reduced';
    const parts: string[] = [];
    const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
    if (missing.length > 0) {
      parts.push(`${plural(missing.length, 'input', 'inputs')} missing or unusable`);
    }
    if (classDefaults.length + key.length > 0) {
      parts.push(plural(classDefaults.length + key.length, 'key default', 'key defaults'));
    }
    statement = `Confidence reduced: ${parts.join(' and ')}`;
    statement +=
      addedBeta > 0
        ? `; the fragility dispersion β was widened by ${fixed(addedBeta, 2)} (SRSS).`
        : '.';
  } else {
    level = 'normal';
    statement =
      'Confidence normal for a screening: the inputs the verdict uses were entered; defaults are limited to typical loads and model idealisations.';
  }
  const some = (list: string[], sep: string) =>
    list.slice(0, 3).join(sep) + (list.length > 3 ? `${sep}and ${list.length - 3} more` : '');
  if (missing.length > 0) statement += ` Missing or unusable: ${some(missingText, '; ')}.`;
  if (classDefaults.length + key.length > 0) {
    statement += ` Key defaults: ${some([...classDefaults, ...key], ' ')}`;
  }
  return { level, statement, missing: missingText, defaulted, addedBeta };
}

const FLAG_INTRO: Record<ScreeningFlagId, string> = {
  'extensive-damage': 'Extensive or worse damage',
  'soft-or-weak-storey': 'Soft or weak storey',
  'no-racking-strength': 'Storey without racking strength',
  torsion: 'Torsion',
  'rocking-wall': 'Rocking wall',
  'devices-not-modelled': 'Supplemental devices',
  'residual-drift': 'Residual drift',
  'residual-drift-stability': 'Residual drift and stability',
  'ground-failure': 'Ground failure',
  'stiffness-loss': 'Stiffness loss',
};

/**
 * Screens one survey. Combines the predicted evidence (Hazus fragility from the peak
 * inter-storey drift ratio and from the spectral displacement, storey demand over strength,
 * storeys without racking strength, soft and weak storeys, torsion, rocking θ/α, stiffness
 * loss from a measured frequency) with the observed evidence (residual drift, the damage
 * checklist, uplift). Each item gives a least damage state; the governing state is the worst
 * of them, so what was observed can raise the prediction and nothing lowers the result below
 * what was observed. The posting follows from the governing state and from items that ask for
 * a least posting (falling hazards, ground failure).
 *
 * Missing inputs never throw: without a usable hazard nothing is predicted and the observed
 * evidence alone decides; every missing or defaulted input is listed in `confidence` and
 * widens the fragility dispersion. The result is plain JSON (no NaN or Infinity).
 *
 * @throws RangeError when `survey` is not a survey at all (no `building` object): a
 *   programmer error, not a missing input.
 */
export function screen(survey: SurveyInput, options: ScreenOptions = {}): ScreeningResult {
  if (
    survey === null ||
    typeof survey !== 'object' ||
    survey.building === null ||
    typeof survey.building !== 'object'
  ) {
    throw new RangeError(`survey must be a SurveyInput with a building, got ${String(survey)}`);
  }
  const findings = new Findings();
  const response = buildingResponse(survey);
  const cls = hazusWoodClass(survey.building);
  const params = HAZUS_WOOD[cls.type][cls.level];
  const hazard = usableHazard(survey, response);
  const a = siteConstant(hazard, findings);
  const heights = (Array.isArray(survey.building.storeys) ? survey.building.storeys : []).map(
    (st) =>
      typeof st?.heightM === 'number' && Number.isFinite(st.heightM) && st.heightM > 0
        ? st.heightM
        : null,
  );
  const dirs: [DirectionSummary, DirectionSummary] = [
    directionSummary(response.x, a, heights),
    directionSummary(response.y, a, heights),
  ];

  // Uncertain input groups widen β.
  const groups: string[] = [];
  if (dirs.some((d) => d.periodKind === 'empirical')) groups.push('empirical period');
  if (cls.levelDefaulted) groups.push('code level');
  if (response.assumptions.some((x) => /^(storey\.partial|wall\.clt-typical)/.test(x.id))) {
    groups.push('wall values');
  }
  const addedBeta = ADDED_BETA_PER_GROUP * Math.sqrt(groups.length);
  if (groups.length > 0) {
    findings.assume(
      'screening.added-beta',
      `Fragility β widened by ${fixed(addedBeta, 2)} (SRSS) for uncertain inputs: ${groups.join(', ')}.`,
      'dispersion per group 0.25, ours (common practice, no source); SRSS combination as in FEMA P-58-1 (from memory, verify)',
    );
  }

  const fragility = fragilityEvidence(dirs, params, cls, addedBeta);
  const rocking = rockingEvidence(
    survey,
    hazard,
    { timeHistory: options.rockingTimeHistory ?? true },
    findings,
  );
  const predicted: EvidenceItem[] = [
    ...fragility.items,
    ...demandCapacityEvidence(dirs),
    ...noStrengthEvidence(dirs),
    ...softWeakEvidence(dirs, params, cls),
    ...torsionEvidence(dirs),
    ...rocking.predicted,
    ...stiffnessLossEvidence(response),
    ...deviceEvidence(survey),
  ];
  const observed: EvidenceItem[] = [
    ...residualDriftEvidence(survey, findings),
    ...checklistEvidence(survey, findings),
    ...rocking.observed,
  ];

  if (fragility.drift !== null) {
    findings.assume(
      'screening.peak-drift',
      'The largest storey drift is read against the Hazus thresholds, which are for the average drift of a typical building: conservative where the drift gathers in one storey.',
      `${params.source} (modelling choice)`,
    );
  }
  if (dirs.some((d) => d.inelasticFactor > 1)) {
    findings.assume(
      'screening.c1',
      'Where the elastic demand exceeds the wall strength, drift and spectral displacement are multiplied by C1 = 1 + (μ − 1)/(a·Te²), μ being the largest storey demand over strength.',
      'ASCE 41-17 §7.4.3.3.2 eq. (7-29); FEMA 440 eq. (5-1) (from memory, verify)',
    );
  }

  // Governing state.
  const predictedPossible =
    fragility.drift !== null ||
    fragility.spectral !== null ||
    rocking.predicted.some((i) => i.value !== null);
  const predictedState: DamageState | null = predictedPossible
    ? worstDamageState(predicted.map((i) => i.state))
    : null;
  const observedState = worstDamageState(observed.map((i) => i.state));
  const state = worstDamageState([predictedState, observedState]);
  const pr = predictedState === null ? -1 : damageStateRank(predictedState);
  const or = damageStateRank(observedState);
  const governedBy: ScreeningResult['damage']['governedBy'] =
    state === 'none' ? 'none' : pr === or ? 'both' : pr > or ? 'predicted' : 'observed';

  // Probabilities: of the fragility reading with the worse median state (drift on a tie).
  let governingReading: FragilityReading | null = fragility.drift ?? fragility.spectral;
  if (
    fragility.drift !== null &&
    fragility.spectral !== null &&
    damageStateRank(fragility.spectral.probabilities.medianState) >
      damageStateRank(fragility.drift.probabilities.medianState)
  ) {
    governingReading = fragility.spectral;
  }

  // Posting.
  let level: PostingLevel = POSTING_BY_STATE[state];
  const postingReasons: string[] = [
    `${state === 'none' ? 'No' : WORDS[state]} damage → ${POSTING_WORDS[level].word} (Grainline's table: None or Slight → Open, Moderate → Limited entry, Extensive or Complete → Keep out).`,
  ];
  const all = [...predicted, ...observed];
  for (const item of all) {
    if (item.postingFloor === null) continue;
    if (postingRank(item.postingFloor) > postingRank(level)) {
      postingReasons.push(
        `${item.label} (${item.valueText}): at least ${POSTING_WORDS[item.postingFloor].word.toLowerCase()}.`,
      );
    }
    level = stricterPosting(level, item.postingFloor);
  }

  // Flags.
  const flagReasons = new Map<ScreeningFlagId, string[]>();
  const raise = (id: ScreeningFlagId, reason: string) => {
    const list = flagReasons.get(id) ?? [];
    if (!list.includes(reason)) list.push(reason);
    flagReasons.set(id, list);
  };
  if (damageStateRank(state) >= damageStateRank('extensive')) {
    raise(
      'extensive-damage',
      `${WORDS[state]} damage: repair, shoring or demolition is for an engineer to decide.`,
    );
  }
  for (const item of all) if (item.flag !== null) raise(item.flag, item.text);
  const flags: ScreeningFlag[] = SCREENING_FLAGS.filter((id) => flagReasons.has(id)).map((id) => ({
    id,
    reasons: flagReasons.get(id) as string[],
  }));

  // Reasons, most important first.
  const reasons: string[] = [];
  if (state === 'none') {
    reasons.push(
      predictedState === null
        ? 'Damage state None: nothing was recorded as seen, and without a usable hazard nothing is predicted.'
        : 'Damage state None: neither the prediction nor what was seen reaches Slight.',
    );
  } else {
    const by =
      governedBy === 'both'
        ? 'predicted and seen alike'
        : governedBy === 'observed'
          ? 'set by what was seen'
          : 'set by the prediction';
    reasons.push(`Damage state ${WORDS[state]}, ${by}:`);
    const setting = [
      ...(governedBy !== 'predicted' ? observed : []),
      ...(governedBy !== 'observed' ? predicted : []),
    ].filter((i) => i.state === state);
    for (const item of setting.slice(0, 3)) reasons.push(item.text);
    if (setting.length > 3) reasons.push(`… and ${setting.length - 3} more at ${WORDS[state]}.`);
  }
  if (predictedState !== null && predictedState !== state) {
    reasons.push(`The prediction alone gives ${WORDS[predictedState]}.`);
  }
  if (predictedState !== null && observedState !== state && state !== 'none') {
    reasons.push(
      observedState === 'none'
        ? `Nothing seen was recorded as damage; the predicted ${WORDS[state]} stands.` +
            (damageStateRank(state) >= damageStateRank('moderate')
              ? ' Look again behind finishes, in the crawl space, and at hold-downs and connections.'
              : '')
        : `What was seen alone gives ${WORDS[observedState]}; the predicted ${WORDS[state]} stands.`,
    );
  }
  if (predictedState !== null && or >= pr + 2) {
    reasons.push(
      `More was seen (${WORDS[observedState]}) than the hazard predicts (${WORDS[predictedState]}): the shaking at the site or the building may differ from the inputs.`,
    );
  }
  reasons.push(
    `Posting ${POSTING_WORDS[level].symbol} ${POSTING_WORDS[level].word}: ${postingReasons.join(' ')}`,
  );
  for (const f of flags) {
    reasons.push(
      `Detailed assessment (${FLAG_INTRO[f.id].toLowerCase()}): ${f.reasons[0]}${f.reasons.length > 1 ? ` (and ${f.reasons.length - 1} more)` : ''}`,
    );
  }

  // Assumptions, missing inputs, confidence.
  // The same sentence for several walls is listed once, with the walls it applies to.
  const byText = new Map<string, string[]>();
  for (const x of rocking.assumptions) {
    const ids = byText.get(x.text) ?? [];
    if (!ids.includes(x.wallId)) ids.push(x.wallId);
    byText.set(x.text, ids);
  }
  const rockingAssumptions: Assumption[] = [...byText].map(([text, ids], i) => ({
    id: `rocking.${i}`,
    text: `${ids.length === 1 ? 'Wall' : 'Walls'} ${ids.join(', ')}: ${text}`,
    source: 'calc/rocking (rockingWallFromInput, assessRockingWall)',
  }));
  const assumptions = [...response.assumptions, ...findings.assumptions, ...rockingAssumptions];
  const missingInputs = [...response.missingInputs, ...findings.missingInputs];
  const classDefaults = cls.levelDefaulted ? [cls.basis[cls.basis.length - 1] as string] : [];
  const rockingDefaults = rockingAssumptions
    .filter((x) => / not recorded/.test(x.text))
    .map((x) => x.text);
  const confidence = confidenceOf(
    predictedPossible,
    survey.hazard !== null && survey.hazard !== undefined,
    assumptions,
    missingInputs,
    classDefaults,
    rockingDefaults,
    addedBeta,
  );
  if (confidence.level !== 'normal')
    reasons.push(confidence.statement.split(' Missing or unusable:')[0] as string);

  const cautions = [VERDICT_CAUTION, FRAGILITY_CAUTION, POSTING_CAUTION];
  for (const c of rocking.cautions) if (!cautions.includes(c)) cautions.push(c);
  if (observed.some((i) => i.kind === 'residual-drift')) cautions.push(RESIDUAL_DRIFT_CAUTION);

  const dc = [...dirs]
    .filter((d) => d.maxDemandToCapacity !== null)
    .sort((p, q) => (q.maxDemandToCapacity as number) - (p.maxDemandToCapacity as number))[0];
  const peak = dirs
    .map((d) => d.peakDriftRatio)
    .filter((x): x is number => x !== null)
    .reduce<number | null>((m, x) => (m === null || x > m ? x : m), null);

  const result: ScreeningResult = {
    resultVersion: RESULT_VERSION,
    calcVersion: CALC_VERSION,
    damageState: state,
    damage: {
      state,
      word: WORDS[state],
      predicted: predictedState,
      observed: observedState,
      governedBy,
      probabilities: governingReading === null ? null : probabilitiesOf(governingReading),
    },
    posting: { level, ...POSTING_WORDS[level], reasons: postingReasons },
    needsAssessment: flags.length > 0,
    flags,
    reasons,
    evidence: { predicted, observed },
    fragilityClass: cls,
    directions: { x: dirs[0], y: dirs[1] },
    summary: {
      system: String(survey.building.system),
      periodS: { x: dirs[0].periodS, y: dirs[1].periodS },
      periodKind: { x: dirs[0].periodKind, y: dirs[1].periodKind },
      governingDemandToCapacity: dc?.maxDemandToCapacity ?? null,
      governingDemandToCapacityAt:
        dc === undefined
          ? null
          : `${storeyName(dc.maxDemandToCapacityStorey ?? 0)}, along ${dc.direction}`,
      peakDriftRatio: peak,
    },
    rockingWalls: rocking.walls,
    confidence,
    assumptions,
    missingInputs,
    cautions,
  };
  const bad: string[] = [];
  const clean = plain(result, 'result', bad) as ScreeningResult;
  if (bad.length > 0) {
    // Should not happen; if it does, say so rather than pass NaN on.
    clean.missingInputs.push({
      field: 'result',
      problem: 'invalid',
      effect: `internal: non-finite values replaced by null at ${bad.slice(0, 5).join(', ')}`,
    });
  }
  return clean;
}
