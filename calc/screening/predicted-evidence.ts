/**
 * Predicted evidence: what the hazard and the storey model say about the building, as
 * evidence items. Fragility from the peak inter-storey drift ratio and from the spectral
 * displacement (Hazus wood curves), storey demand over strength, storeys without racking
 * strength, soft and weak storeys, torsion, and stiffness loss from a measured frequency.
 * (Rocking walls: rocking-evidence.ts.)
 */
import { damageProbabilities, type DamageProbabilities } from '../damage/damage-probabilities.js';
import { damageStateRank, type DamageState } from '../damage/damage-state.js';
import type { HazusWoodClass } from '../damage/hazus-wood-class.js';
import {
  THRESHOLD_STATES,
  type HazusWoodParameters,
  type PerState,
  type ThresholdState,
} from '../damage/hazus-wood-parameters.js';
import {
  STIFFNESS_RATIO_LIMIT_EMPIRICAL,
  STIFFNESS_RATIO_LIMIT_MODEL,
  stiffnessRatioFromFrequency,
} from '../damage/stiffness-loss.js';
import type { BuildingResponse } from '../storey/building-response.js';
import type { DirectionSummary } from './direction-summary.js';
import type { EvidenceItem } from './evidence.js';
import { capital, fixed, length, percent, storeyName } from './text-format.js';
import { DAMAGE_STATE_WORDS } from './verdict-words.js';

/** A Hazus fragility reading, kept for the result's probabilities. */
export interface FragilityReading {
  basis: 'drift' | 'spectral-displacement';
  /** The demand read: a drift ratio, or a spectral displacement in m. */
  demand: number;
  probabilities: DamageProbabilities;
  /** β of each state as used (published β widened by `addedBeta`). */
  betas: number[];
}

/**
 * Storey demand over nominal strength from which the walls are expected to yield: 1, with
 * the least state Slight (nail slip and cracked finishes as the walls pass their nominal
 * strength; our own, common practice, no source). Larger ratios act through C1 on the drift.
 */
export const YIELD_DEMAND_TO_CAPACITY = 1;

/**
 * Spectral acceleration from which a storey without racking strength is taken to fail as a
 * mechanism (Extensive); below it, Moderate: 0.2 g (our own, common practice, no source;
 * Hazus lists cripple-wall failure among Complete damage of W1).
 */
export const NO_STRENGTH_SA_G = 0.2;

/**
 * Torsional eccentricity (|e| / plan dimension) from which a storey is sent to detailed
 * assessment: 0.2. With walls only at the two edges and a rigid diaphragm, the edge drift
 * over the average is 1 + 2e/b, so 0.2 gives 1.4, the extreme torsional irregularity limit
 * of ASCE 7-16 Table 12.3-1 type 1b (derived; other wall layouts reach 1.4 sooner).
 */
export const TORSION_ECCENTRICITY_LIMIT = 0.2;

const NAMES = DAMAGE_STATE_WORDS;

/** "Hazus W1, high code" / "Hazus W1, pre-code". */
export function hazusClassText(cls: HazusWoodClass): string {
  return `Hazus ${cls.type}, ${cls.level === 'pre-code' ? 'pre-code' : `${cls.level} code`}`;
}

function thresholdWords(
  medians: PerState,
  state: DamageState,
  show: (x: number) => string,
): { threshold: number; text: string } {
  const i = THRESHOLD_STATES.indexOf(state as (typeof THRESHOLD_STATES)[number]);
  if (i === -1) {
    return {
      threshold: medians[0],
      text: `below the Slight median ${show(medians[0])}`,
    };
  }
  const next = i < 3 ? `; ${NAMES[THRESHOLD_STATES[i + 1]!]} at ${show(medians[i + 1]!)}` : '';
  return {
    threshold: medians[i]!,
    text: `${NAMES[state]} median ${show(medians[i]!)}${next}`,
  };
}

function widen(betas: PerState, added: number): PerState {
  return betas.map((b) => Math.sqrt(b * b + added * added)) as unknown as PerState;
}

export interface PredictedFragility {
  items: EvidenceItem[];
  drift: FragilityReading | null;
  spectral: FragilityReading | null;
}

/**
 * Fragility evidence from both directions: the larger inelastic peak drift ratio and the
 * larger inelastic spectral displacement. The median state of each curve is its least
 * state; widening β for missing inputs changes the probabilities, not the median state.
 */
export function fragilityEvidence(
  dirs: readonly DirectionSummary[],
  params: HazusWoodParameters,
  cls: HazusWoodClass,
  addedBeta: number,
): PredictedFragility {
  const items: EvidenceItem[] = [];
  const klass = hazusClassText(cls);
  const betas = widen(params.betas, addedBeta);
  let drift: FragilityReading | null = null;
  let spectral: FragilityReading | null = null;

  const byDrift = [...dirs]
    .filter((d) => d.peakDriftRatio !== null)
    .sort((a, b) => (b.peakDriftRatio as number) - (a.peakDriftRatio as number))[0];
  if (byDrift !== undefined) {
    const x = byDrift.peakDriftRatio as number;
    const p = damageProbabilities(x, params.driftThresholds, betas);
    drift = { basis: 'drift', demand: x, probabilities: p, betas: [...betas] };
    const th = thresholdWords(params.driftThresholds, p.medianState, percent);
    const storey = byDrift.peakDriftStorey ?? 0;
    const c1 =
      byDrift.inelasticFactor > 1
        ? ` (elastic ${percent(x / byDrift.inelasticFactor)} × C1 ${fixed(byDrift.inelasticFactor, 2)} for walls loaded to ${fixed(byDrift.strengthRatio ?? 1, 1)} × their strength)`
        : '';
    items.push({
      id: 'fragility.drift',
      side: 'predicted',
      kind: 'fragility-drift',
      label: 'Peak inter-storey drift',
      where: `${storeyName(storey)}, along ${byDrift.direction}`,
      value: x,
      unit: 'ratio',
      valueText: percent(x),
      threshold: th.threshold,
      thresholdText: `${th.text} (${klass})`,
      state: p.medianState,
      postingFloor: null,
      flag: null,
      text:
        `Peak drift ${percent(x)} in ${storeyName(storey)} along ${byDrift.direction}${c1}: ` +
        (p.medianState === 'none'
          ? `below the Slight threshold ${percent(params.driftThresholds[0])} of ${klass}.`
          : `past the ${NAMES[p.medianState]} threshold ${percent(th.threshold)} of ${klass}.`),
      source: `${params.source}; drift thresholds as medians with the published β (derived: Sd = drift × 0.75 × height); C1 from ASCE 41-17 eq. (7-29) (from memory, verify)`,
    });
  }

  const bySd = [...dirs]
    .filter((d) => d.spectralDisplacementM !== null)
    .sort(
      (a, b) =>
        (b.spectralDisplacementM as number) * b.inelasticFactor -
        (a.spectralDisplacementM as number) * a.inelasticFactor,
    )[0];
  if (bySd !== undefined) {
    const x = (bySd.spectralDisplacementM as number) * bySd.inelasticFactor;
    const p = damageProbabilities(x, params.spectralDisplacementMediansM, betas);
    spectral = { basis: 'spectral-displacement', demand: x, probabilities: p, betas: [...betas] };
    const th = thresholdWords(params.spectralDisplacementMediansM, p.medianState, length);
    items.push({
      id: 'fragility.spectral-displacement',
      side: 'predicted',
      kind: 'fragility-spectral-displacement',
      label: 'Spectral displacement',
      where: `along ${bySd.direction}`,
      value: x,
      unit: 'm',
      valueText: length(x),
      threshold: th.threshold,
      thresholdText: `${th.text} (${klass}, typical ${fixed(params.typicalHeightM, 1)} m tall)`,
      state: p.medianState,
      postingFloor: null,
      flag: null,
      text:
        `Spectral displacement ${length(x)} along ${bySd.direction} at T = ${fixed(bySd.periodS ?? 0, 2)} s` +
        (bySd.inelasticFactor > 1 ? ` (× C1 ${fixed(bySd.inelasticFactor, 2)})` : '') +
        ': ' +
        (p.medianState === 'none'
          ? `below the Slight median ${length(params.spectralDisplacementMediansM[0])} of ${klass}.`
          : `past the ${NAMES[p.medianState]} median ${length(th.threshold)} of ${klass}.`),
      source: `${params.source}; Sd elastic at the period used, times C1`,
    });
  }
  return { items, drift, spectral };
}

/** Storey demand over nominal strength, the largest over both directions. */
export function demandCapacityEvidence(dirs: readonly DirectionSummary[]): EvidenceItem[] {
  const best = [...dirs]
    .filter((d) => d.maxDemandToCapacity !== null)
    .sort((a, b) => (b.maxDemandToCapacity as number) - (a.maxDemandToCapacity as number))[0];
  if (best === undefined) return [];
  const dc = best.maxDemandToCapacity as number;
  const storey = best.maxDemandToCapacityStorey ?? 0;
  const yields = dc >= YIELD_DEMAND_TO_CAPACITY;
  return [
    {
      id: 'demand-capacity',
      side: 'predicted',
      kind: 'demand-capacity',
      label: 'Shear demand over strength',
      where: `${storeyName(storey)}, along ${best.direction}`,
      value: dc,
      unit: 'ratio',
      valueText: fixed(dc, 2),
      threshold: YIELD_DEMAND_TO_CAPACITY,
      thresholdText: '1.00: the walls reach their nominal strength',
      state: yields ? 'slight' : 'none',
      postingFloor: null,
      flag: null,
      text: yields
        ? `Elastic shear demand is ${fixed(dc, 2)} × the nominal wall strength in ${storeyName(storey)} along ${best.direction}: the walls yield (at least Slight); the extra displacement is in the drift through C1.`
        : `Elastic shear demand stays within the nominal wall strength (${fixed(dc, 2)}) in every storey.`,
      source:
        'storey model (calc/storey): elastic demand over SDPWS nominal strength; least state ours (common practice, no source)',
    },
  ];
}

/** Storeys whose recorded walls have no racking strength but carry shear (bare studs). */
export function noStrengthEvidence(dirs: readonly DirectionSummary[]): EvidenceItem[] {
  const out: EvidenceItem[] = [];
  for (const d of dirs) {
    for (const storey of d.zeroStrengthStoreys) {
      const sa = d.spectralAccelerationG ?? 0;
      const strong = sa >= NO_STRENGTH_SA_G;
      out.push({
        id: `no-racking-strength.${storey}.${d.direction}`,
        side: 'predicted',
        kind: 'no-racking-strength',
        label: 'No racking strength',
        where: `${storeyName(storey)}, along ${d.direction}`,
        value: sa,
        unit: 'none',
        valueText: `Sa ${fixed(sa, 2)} g`,
        threshold: NO_STRENGTH_SA_G,
        thresholdText: `Sa ${fixed(NO_STRENGTH_SA_G, 2)} g`,
        state: strong ? 'extensive' : 'moderate',
        postingFloor: null,
        flag: 'no-racking-strength',
        text:
          `${capital(storeyName(storey))} has only bare-stud walls along ${d.direction}, no dependable racking strength, under Sa ${fixed(sa, 2)} g: ` +
          (strong
            ? 'such a storey (typically a cripple wall) racks over as a mechanism (at least Extensive).'
            : 'only finishes and friction hold it (at least Moderate).'),
        source: `least states ours (common practice, no source), ${fixed(NO_STRENGTH_SA_G, 1)} g limit ours; Hazus W1 Complete damage includes cripple-wall failure`,
      });
    }
  }
  return out;
}

/**
 * ASCE 7-16 Table 12.3-2 soft and weak storeys. A flagged storey whose walls yield shows at
 * least Slight; a weak storey that yields is also read as a storey mechanism: the inelastic
 * roof displacement gathering in it, its drift read against the Hazus thresholds (the
 * soft-storey mechanism, derived from the deformed shape; an upper estimate).
 */
export function softWeakEvidence(
  dirs: readonly DirectionSummary[],
  params: HazusWoodParameters,
  cls: HazusWoodClass,
): EvidenceItem[] {
  const out: EvidenceItem[] = [];
  const klass = hazusClassText(cls);
  for (const d of dirs) {
    for (const f of d.flaggedStoreys) {
      if (d.zeroStrengthStoreys.includes(f.storey)) continue; // reported as no racking strength
      const dc = d.demandToCapacity[f.storey] ?? null;
      const yields = dc !== null && dc >= YIELD_DEMAND_TO_CAPACITY;
      const extreme = f.extremeSoft1b || f.extremeWeak5b;
      const kinds = [
        f.extremeSoft1b ? 'extreme soft (1b)' : f.soft1a ? 'soft (1a)' : null,
        f.extremeWeak5b ? 'extreme weak (5b)' : f.weak5a ? 'weak (5a)' : null,
      ].filter((k): k is string => k !== null);
      const ratios = [
        f.stiffnessRatioToAbove !== null
          ? `stiffness ${percent(f.stiffnessRatioToAbove)} of the storey above`
          : null,
        f.strengthRatioToAbove !== null
          ? `strength ${percent(f.strengthRatioToAbove)} of the storey above`
          : null,
      ].filter((k): k is string => k !== null);
      let state: DamageState | null = yields ? 'slight' : null;
      let mechanism = '';
      if (f.mechanismDriftRatio !== null) {
        const m = damageProbabilities(f.mechanismDriftRatio, params.driftThresholds, params.betas);
        if (damageStateRank(m.medianState) > damageStateRank(state ?? 'none')) {
          state = m.medianState;
        }
        mechanism =
          ` If the roof displacement gathers in it, its drift is ${percent(f.mechanismDriftRatio)}` +
          (m.medianState === 'none'
            ? ` (below the Slight threshold of ${klass}).`
            : `, past the ${NAMES[m.medianState]} threshold ${percent(params.driftThresholds[THRESHOLD_STATES.indexOf(m.medianState as ThresholdState)]!)} of ${klass}.`);
      }
      const flagged = yields || extreme;
      out.push({
        id: `soft-weak-storey.${f.storey}.${d.direction}`,
        side: 'predicted',
        kind: 'soft-weak-storey',
        label: 'Soft or weak storey',
        where: `${storeyName(f.storey)}, along ${d.direction}`,
        value: f.mechanismDriftRatio ?? f.strengthRatioToAbove ?? f.stiffnessRatioToAbove,
        unit: 'ratio',
        valueText:
          ratios.join(', ') +
          (f.mechanismDriftRatio !== null
            ? `; mechanism drift ${percent(f.mechanismDriftRatio)}`
            : ''),
        threshold: f.weak5a || f.extremeWeak5b ? 0.8 : 0.7,
        thresholdText:
          'soft: stiffness < 70 % of the storey above (extreme < 60 %); weak: strength < 80 % (extreme < 65 %); mechanism drift against the Hazus drift thresholds',
        state,
        postingFloor: null,
        flag: flagged ? 'soft-or-weak-storey' : null,
        text:
          `${capital(storeyName(f.storey))} along ${d.direction} is ${/^[aeiou]/.test(kinds[0] ?? '') ? 'an' : 'a'} ${kinds.join(' and ')} storey (${ratios.join(', ')})` +
          (yields
            ? `, and its walls yield (D/C ${fixed(dc, 2)}): the deformation gathers in it (at least ${NAMES[state ?? 'slight']}).${mechanism}`
            : extreme
              ? '; its walls stay within their strength under this hazard, but an extreme irregularity needs an engineer.'
              : dc === null
                ? '; without demand its effect is not judged.'
                : `; its walls stay within their strength (D/C ${fixed(dc, 2)}).`),
        source:
          'ASCE 7-16 Table 12.3-2 types 1a, 1b, 5a, 5b; storey mechanism drift = C1 × roof displacement / storey height (derived, upper estimate); least states ours (common practice, no source)',
      });
    }
  }
  return out;
}

/** Torsional eccentricity of the storeys, the largest per direction. */
export function torsionEvidence(dirs: readonly DirectionSummary[]): EvidenceItem[] {
  const out: EvidenceItem[] = [];
  for (const d of dirs) {
    if (d.maxEccentricity === null) continue;
    const e = d.maxEccentricity;
    const storey = d.maxEccentricityStorey ?? 0;
    const over = e >= TORSION_ECCENTRICITY_LIMIT;
    out.push({
      id: `torsion.${d.direction}`,
      side: 'predicted',
      kind: 'torsion',
      label: 'Torsional eccentricity',
      where: `${storeyName(storey)}, along ${d.direction}`,
      value: e,
      unit: 'ratio',
      valueText: `${percent(e)} of the plan width`,
      threshold: TORSION_ECCENTRICITY_LIMIT,
      thresholdText: `${percent(TORSION_ECCENTRICITY_LIMIT)} of the plan width`,
      state: null,
      postingFloor: null,
      flag: over ? 'torsion' : null,
      text: over
        ? `The centre of stiffness of ${storeyName(storey)} is ${percent(e)} of the plan width from the centre of mass (along ${d.direction}): the flexible side drifts well beyond the storey model (extreme torsional irregularity likely).`
        : `Torsional eccentricity ${percent(e)} of the plan width along ${d.direction}: below ${percent(TORSION_ECCENTRICITY_LIMIT)}.`,
      source:
        'calc/storey torsional eccentricity; limit derived from the edge-drift ratio 1 + 2e/b = 1.4 of ASCE 7-16 Table 12.3-1 type 1b',
    });
  }
  return out;
}

/**
 * Stiffness loss from a measured frequency: k_now/k_ref = (f_now/f_ref)², the reference
 * being the storey model's first frequency, else the empirical one. The lowest ratio over the
 * directions the measurement applies to.
 */
export function stiffnessLossEvidence(response: BuildingResponse): EvidenceItem[] {
  let best: {
    ratio: number;
    measuredHz: number;
    refHz: number;
    model: boolean;
    dir: string;
  } | null = null;
  for (const d of [response.x, response.y]) {
    const p = d.period;
    if (p.measuredS === null || !(p.measuredS > 0)) continue;
    const refS = p.modalS ?? p.empiricalS;
    if (refS === null || !(refS > 0)) continue;
    const ratio = stiffnessRatioFromFrequency(1 / p.measuredS, 1 / refS);
    if (best === null || ratio < best.ratio) {
      best = {
        ratio,
        measuredHz: 1 / p.measuredS,
        refHz: 1 / refS,
        model: p.modalS !== null,
        dir: d.direction,
      };
    }
  }
  if (best === null) return [];
  const limit = best.model ? STIFFNESS_RATIO_LIMIT_MODEL : STIFFNESS_RATIO_LIMIT_EMPIRICAL;
  const low = best.ratio < limit;
  const ref = best.model ? 'the storey model' : 'the empirical period formula (a weak reference)';
  return [
    {
      id: 'stiffness-loss',
      side: 'predicted',
      kind: 'stiffness-loss',
      label: 'Stiffness from the measured frequency',
      where: `along ${best.dir}`,
      value: best.ratio,
      unit: 'ratio',
      valueText: `k/k_ref ${fixed(best.ratio, 2)} (${fixed(best.measuredHz, 2)} Hz measured, ${fixed(best.refHz, 2)} Hz expected)`,
      threshold: limit,
      thresholdText: `${fixed(limit, 2)} against ${ref}`,
      state: null,
      postingFloor: null,
      flag: low ? 'stiffness-loss' : null,
      text: low
        ? `The measured frequency ${fixed(best.measuredHz, 2)} Hz is far below the ${fixed(best.refHz, 2)} Hz expected from ${ref}: stiffness ratio ${fixed(best.ratio, 2)}, a sign of hidden damage to connections or sheathing.`
        : `The measured frequency ${fixed(best.measuredHz, 2)} Hz against ${fixed(best.refHz, 2)} Hz expected from ${ref} gives a stiffness ratio of ${fixed(best.ratio, 2)}: no sign of lost stiffness.`,
      source:
        'k_now/k_ref = (f_now/f_ref)² (SDOF relation, Chopra, Dynamics of Structures, ch. 2); limits ours (common practice, no source)',
    },
  ];
}
