/**
 * Rocking evidence: for each rocking wall, the predicted share of its toppling angle θ/α
 * under the hazard; for each wall with an uplift reading, what the gap says (observed θ/α,
 * yielded hold-downs, or an uplifted shear wall). Uses calc/rocking for the walls.
 */
import {
  ROCKING_BAND_STATES,
  ENGAGED_HOLD_DOWN_STATE,
  SHEAR_WALL_UPLIFT_STATE,
  UPLIFT_YIELD_GAP_M,
} from '../damage/rocking-states.js';
import { worstDamageState, type DamageState } from '../damage/damage-state.js';
import { assessRockingWall, type RockingFlag } from '../rocking/assess-rocking-wall.js';
import { ROCKING_BAND_LIMITS, type RockingBand } from '../rocking/observed-rocking.js';
import { rockingWallFromInput } from '../rocking/rocking-wall-from-input.js';
import type { SpectrumSpec } from '../spectra/spectrum-spec.js';
import type { Findings } from '../storey/findings.js';
import type { SurveyInput, WallInput } from '../survey/survey-input.js';
import type { EvidenceItem } from './evidence.js';
import { fixed, length } from './text-format.js';
import { DAMAGE_STATE_WORDS } from './verdict-words.js';

/** What the result keeps of one assessed wall. */
export interface RockingWallSummary {
  wallId: string;
  /** Index of the wall in `survey.walls`, or null for an uplift reading matching no wall. */
  wallIndex: number | null;
  /** True for walls of type 'rocking'; false for other walls with an uplift reading. */
  rockingWall: boolean;
  /** Slenderness α of the equivalent block, in rad (null when the wall could not be modelled). */
  alpha: number | null;
  predictedRatio: number | null;
  predictedBand: RockingBand | null;
  upliftGapM: number | null;
  observedRatio: number | null;
  observedBand: RockingBand | null;
  flags: RockingFlag[];
  reasons: string[];
}

export interface RockingEvidence {
  predicted: EvidenceItem[];
  observed: EvidenceItem[];
  walls: RockingWallSummary[];
  /** Sentences the rocking module asks to show. */
  cautions: string[];
  /** Model assumptions, one sentence each, with the wall they belong to. */
  assumptions: { wallId: string; text: string }[];
}

/** Lower limit of each band as θ/α (the limits of calc/rocking, common practice, no source). */
function bandThreshold(band: RockingBand): number {
  switch (band) {
    case 'none':
    case 'small':
      return ROCKING_BAND_LIMITS.small;
    case 'moderate':
      return ROCKING_BAND_LIMITS.small;
    case 'large':
      return ROCKING_BAND_LIMITS.moderate;
    case 'near-toppling':
      return ROCKING_BAND_LIMITS.large;
    case 'beyond-stability':
      return ROCKING_BAND_LIMITS.nearToppling;
  }
}

const BAND_WORDS: Record<RockingBand, string> = {
  none: 'no rocking',
  small: 'small rocking',
  moderate: 'moderate rocking',
  large: 'large rocking',
  'near-toppling': 'near toppling',
  'beyond-stability': 'at or past toppling',
};

const LIMITS_TEXT =
  'bands of θ/α: moderate from 0.15, large from 0.4, near toppling from 0.7, toppling at 1';
const BAND_SOURCE =
  'calc/rocking (Housner 1963 rigid block; bands ours, common practice, no source); least states ours (common practice, no source)';

/** Our sentence for each rocking flag, and whether it is about the prediction. */
const FLAG_TEXT: Record<RockingFlag, { predicted: boolean; text: string } | null> = {
  'no-hazard': null,
  'devices-not-modelled': { predicted: true, text: 'Its supplemental devices are not modelled.' },
  'spectral-not-converged': { predicted: true, text: 'The spectral estimate did not settle.' },
  'spectral-predicts-toppling': {
    predicted: true,
    text: 'The spectral estimate predicts toppling.',
  },
  'pulse-topples-at-pga': {
    predicted: true,
    text: 'A pulse at the site PGA topples it in the time-history check.',
  },
  'pulse-toppling-amplitude-reached': {
    predicted: true,
    text: 'The smallest pulse that topples it is within the site PGA.',
  },
  'observed-near-toppling': {
    predicted: false,
    text: 'The uplift came within 30 % of its toppling angle.',
  },
  'observed-beyond-stability': {
    predicted: false,
    text: 'The uplift is at or past its toppling angle: check the reading, the base and any lean.',
  },
  'observed-above-prediction': {
    predicted: false,
    text: 'It rocked more than the hazard predicts: the shaking or the model differ.',
  },
  'hold-downs-engaged': { predicted: false, text: 'Inspect its hold-downs.' },
};

function flagSentences(flags: readonly RockingFlag[], predicted: boolean): string[] {
  const out: string[] = [];
  for (const f of flags) {
    const t = FLAG_TEXT[f];
    if (t !== null && t.predicted === predicted) out.push(t.text);
  }
  return out;
}

function finitePositive(x: unknown): x is number {
  return typeof x === 'number' && Number.isFinite(x) && x > 0;
}

/** Largest recorded gap per wall id; readings that are not numbers ≥ 0 are listed as invalid. */
function upliftByWall(survey: SurveyInput, findings: Findings): Map<string, number> {
  const gaps = new Map<string, number>();
  const list = Array.isArray(survey.observations?.uplift) ? survey.observations.uplift : [];
  list.forEach((u, i) => {
    const gap = u?.gapM;
    if (typeof gap !== 'number' || !Number.isFinite(gap) || gap < 0) {
      findings.invalid(
        `observations.uplift[${i}].gapM`,
        `uplift gap ${String(gap)} m is not a number ≥ 0; the reading is not used`,
      );
      return;
    }
    const id = String(u.wallId);
    gaps.set(id, Math.max(gaps.get(id) ?? 0, gap));
  });
  return gaps;
}

export interface RockingOptions {
  /** Run the pulse time-history check of each rocking wall (default true). */
  timeHistory: boolean;
}

/**
 * Rocking evidence of a survey. Walls that cannot be modelled (no usable length or height)
 * are listed as missing inputs and their uplift readings still count, read as under a shear
 * wall.
 */
export function rockingEvidence(
  survey: SurveyInput,
  hazard: SpectrumSpec | null,
  options: RockingOptions,
  findings: Findings,
): RockingEvidence {
  const out: RockingEvidence = {
    predicted: [],
    observed: [],
    walls: [],
    cautions: [],
    assumptions: [],
  };
  const gaps = upliftByWall(survey, findings);
  const walls: WallInput[] = Array.isArray(survey.walls) ? survey.walls : [];
  const storeys = Array.isArray(survey.building?.storeys) ? survey.building.storeys : [];
  const matched = new Set<string>();

  walls.forEach((wall, index) => {
    if (wall === null || typeof wall !== 'object') return;
    const id = String(wall.id);
    const isRocking = wall.type === 'rocking';
    const gap = !matched.has(id) && gaps.has(id) ? (gaps.get(id) as number) : null;
    if (!isRocking && gap === null) return;
    if (gap !== null) matched.add(id);

    const storeyHeight = storeys[wall.storey]?.heightM;
    let model;
    try {
      model = rockingWallFromInput(wall, finitePositive(storeyHeight) ? storeyHeight : NaN);
    } catch (e) {
      findings.invalid(
        `walls[${index}]`,
        `wall ${id} cannot be modelled as a rocking block (${(e as Error).message})${gap !== null ? '; its uplift reading is read as under a shear wall' : ''}`,
      );
      if (gap !== null) out.observed.push(shearWallUplift(id, gap));
      return;
    }
    let a;
    try {
      a = assessRockingWall(model, isRocking ? hazard : null, gap, {
        timeHistory: options.timeHistory,
      });
    } catch (e) {
      // Values the model accepted but the assessment cannot use (absurd proportions).
      findings.invalid(
        `walls[${index}]`,
        `wall ${id} cannot be assessed for rocking (${(e as Error).message})${gap !== null ? '; its uplift reading is read as under a shear wall' : ''}`,
      );
      if (gap !== null) out.observed.push(shearWallUplift(id, gap));
      return;
    }
    for (const c of a.cautions) if (!out.cautions.includes(c)) out.cautions.push(c);
    for (const text of a.assumptions) out.assumptions.push({ wallId: id, text });
    out.walls.push({
      wallId: id,
      wallIndex: index,
      rockingWall: isRocking,
      alpha: model.wall.alpha,
      predictedRatio: a.predictedRatio,
      predictedBand: a.predictedBand,
      upliftGapM: gap,
      observedRatio: a.observed?.ratio ?? null,
      observedBand: a.observedBand,
      flags: a.flags.filter((f) => f !== 'no-hazard' || isRocking),
      reasons: a.reasons,
    });
    const devices = a.flags.includes('devices-not-modelled');

    if (isRocking && a.predictedRatio !== null && a.predictedBand !== null) {
      const band = a.predictedBand;
      let state = ROCKING_BAND_STATES[band].predicted;
      // Toppling is Complete only when the time-history check agrees (or was not run): the
      // spectral estimate alone is known to be unreliable (Makris & Konstantinidis 2003).
      const disagree = band === 'beyond-stability' && a.pulse !== null && !a.pulse.atPga.overturned;
      if (disagree) state = 'extensive';
      const sentences = flagSentences(a.flags, true);
      if (disagree) {
        sentences.push(
          `The pulse time-history check does not topple it (peak θ/α ${fixed(a.pulse?.atPga.peakRatio ?? 0, 2)}), so Extensive rather than Complete.`,
        );
      }
      const flagged = sentences.length > 0;
      out.predicted.push({
        id: `rocking.${id}.predicted`,
        side: 'predicted',
        kind: 'rocking',
        label: 'Rocking under the hazard (θ/α)',
        where: `wall ${id}`,
        value: a.predictedRatio,
        unit: 'ratio',
        valueText: fixed(a.predictedRatio, 2),
        threshold: bandThreshold(band),
        thresholdText: LIMITS_TEXT,
        state,
        postingFloor: null,
        flag: flagged ? (devices ? 'devices-not-modelled' : 'rocking-wall') : null,
        text:
          `Rocking wall ${id} is estimated to rock to θ/α = ${fixed(a.predictedRatio, 2)} under the hazard (${BAND_WORDS[band]})` +
          (state === 'none' ? '.' : `: at least ${DAMAGE_STATE_WORDS[state]}.`) +
          (flagged ? ` ${sentences.join(' ')}` : ''),
        source: BAND_SOURCE,
      });
    } else if (devices) {
      out.predicted.push({
        id: `rocking.${id}.devices`,
        side: 'predicted',
        kind: 'devices',
        label: 'Supplemental devices',
        where: `wall ${id}`,
        value: null,
        unit: 'none',
        valueText: model.devices.join(', '),
        threshold: null,
        thresholdText: 'any device',
        state: null,
        postingFloor: null,
        flag: 'devices-not-modelled',
        text: `Wall ${id} has supplemental devices (${model.devices.join(', ')}): they are not modelled.`,
        source: 'scope of the rocking model (calc/rocking)',
      });
    }

    if (gap !== null && a.observed !== null) {
      const band = a.observed.band;
      const engaged = a.flags.includes('hold-downs-engaged') && gap >= UPLIFT_YIELD_GAP_M;
      const states: DamageState[] = [ROCKING_BAND_STATES[band].observed];
      if (isRocking && engaged) states.push(ENGAGED_HOLD_DOWN_STATE);
      if (!isRocking && gap >= UPLIFT_YIELD_GAP_M) states.push(SHEAR_WALL_UPLIFT_STATE);
      const state = worstDamageState(states);
      const sentences = flagSentences(
        a.flags.filter((f) => f !== 'hold-downs-engaged'),
        false,
      );
      const observedFlag = sentences.length > 0;
      const what = isRocking
        ? `Uplift of ${length(gap)} under rocking wall ${id}: θ/α = ${fixed(a.observed.ratio, 2)} (${BAND_WORDS[band]})`
        : `Uplift of ${length(gap)} under wall ${id}, which is not meant to rock: θ/α = ${fixed(a.observed.ratio, 2)}`;
      const why =
        !isRocking && gap >= UPLIFT_YIELD_GAP_M
          ? '; its hold-downs or anchorage have yielded'
          : engaged
            ? '; its hold-downs have yielded or let go'
            : '';
      out.observed.push({
        id: `rocking.${id}.observed`,
        side: 'observed',
        kind: isRocking ? 'rocking' : 'uplift',
        label: isRocking ? 'Observed rocking (θ/α)' : 'Uplift under a wall',
        where: `wall ${id}`,
        value: gap,
        unit: 'm',
        valueText: `${length(gap)} (θ/α ${fixed(a.observed.ratio, 2)})`,
        threshold: isRocking ? bandThreshold(band) : UPLIFT_YIELD_GAP_M,
        thresholdText: isRocking
          ? `${LIMITS_TEXT}; hold-downs yielded from a ${length(UPLIFT_YIELD_GAP_M)} gap`
          : `${length(UPLIFT_YIELD_GAP_M)} gap: hold-downs or anchorage yielded`,
        state,
        postingFloor: null,
        flag: observedFlag ? 'rocking-wall' : null,
        text:
          what +
          why +
          (state === 'none' ? '.' : `: at least ${DAMAGE_STATE_WORDS[state]}.`) +
          (observedFlag ? ` ${sentences.join(' ')}` : '') +
          (engaged ? ` ${FLAG_TEXT['hold-downs-engaged']?.text ?? ''}` : ''),
        source: `${BAND_SOURCE}; ${length(UPLIFT_YIELD_GAP_M)} yield gap ours (common practice, no source)`,
      });
    }
  });

  // Readings under walls that are not in the survey still count, read as under a shear wall.
  for (const [id, gap] of gaps) {
    if (matched.has(id)) continue;
    findings.missing(
      `observations.uplift (wall ${id})`,
      `no wall with id ${id}: the ${length(gap)} gap is read as under a shear wall`,
    );
    out.observed.push(shearWallUplift(id, gap));
  }
  return out;
}

function shearWallUplift(id: string, gap: number): EvidenceItem {
  const yielded = gap >= UPLIFT_YIELD_GAP_M;
  return {
    id: `uplift.${id}`,
    side: 'observed',
    kind: 'uplift',
    label: 'Uplift under a wall',
    where: `wall ${id}`,
    value: gap,
    unit: 'm',
    valueText: length(gap),
    threshold: UPLIFT_YIELD_GAP_M,
    thresholdText: `${length(UPLIFT_YIELD_GAP_M)} gap: hold-downs or anchorage yielded`,
    state: yielded ? SHEAR_WALL_UPLIFT_STATE : 'none',
    postingFloor: null,
    flag: null,
    text: yielded
      ? `Uplift of ${length(gap)} under wall ${id}: its hold-downs or anchorage have yielded (at least ${DAMAGE_STATE_WORDS[SHEAR_WALL_UPLIFT_STATE]}).`
      : `Uplift of ${length(gap)} under wall ${id}: within normal slip (below ${length(UPLIFT_YIELD_GAP_M)}).`,
    source: `least state and ${length(UPLIFT_YIELD_GAP_M)} yield gap ours (common practice, no source)`,
  };
}
