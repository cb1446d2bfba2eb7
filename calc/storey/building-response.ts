import { CALC_VERSION } from '../version.js';
import { shearBuildingModes, type ShearBuildingModes } from '../modal/shear-building-modes.js';
import { empiricalPeriod, empiricalPeriodRange } from '../period/empirical-period.js';
import { upperLimitCoefficient } from '../period/upper-limit-coefficient.js';
import { REFERENCE_DAMPING } from '../spectra/damping-correction.js';
import type { ResolvedSpectrum } from '../spectra/resolved-spectrum.js';
import { resolveSpectrum } from '../spectra/spectral-acceleration.js';
import type { SpectrumSpec } from '../spectra/spectrum-spec.js';
import type { Direction, SurveyInput, WallInput } from '../survey/survey-input.js';
import { Findings, type Assumption, type MissingInput } from './findings.js';
import { PLAUSIBLE as PLAUSIBLE_RANGES, plausible, rangeText } from './plausible-ranges.js';
import type { PeriodEstimate } from './period-estimate.js';
import { elfDemand, modalDemand, type SeismicDemand } from './seismic-demand.js';
import { storeyIrregularities, type StoreyIrregularity } from './storey-irregularity.js';
import { storeyLateral, type StoreyLateral } from './storey-lateral.js';
import { storeyMasses, type StoreyMass } from './storey-masses.js';
import { torsionalEccentricity } from './torsional-eccentricity.js';
import {
  noteWallAssumptions,
  wallContribution,
  type WallContribution,
} from './wall-contribution.js';
import { storeyName } from './storey-name.js';

/** Module-local alias: read once, not through an import binding in hot loops. */
const PLAUSIBLE = PLAUSIBLE_RANGES;

/** The storey model and its response in one plan direction. */
export interface DirectionResponse {
  direction: Direction;
  /** Storey masses (the same for both directions), with how each was obtained. */
  masses: StoreyMass[];
  /** Storey stiffness (N/m) and strength (N) along this direction, with sources. */
  storeys: StoreyLateral[];
  /** Every wall along this direction and how it was treated (rocking walls: excluded). */
  walls: WallContribution[];
  /**
   * Modes of the storey model used for the demand: from the walls, with the stiffness
   * scaled uniformly to the measured period when a measurement is used. Null without a
   * complete model (then the demand, if any, is 'elf').
   */
  modes: ShearBuildingModes | null;
  /** Factor the wall stiffnesses were multiplied by to match the measured period, else null. */
  stiffnessScaleToMeasured: number | null;
  period: PeriodEstimate;
  /** Elastic demand: base and storey shears, roof displacement, drift ratios. Null without hazard, masses or period. */
  demand: SeismicDemand | null;
  /**
   * Storey shear demand over storey strength, ground storey first; an entry is null where
   * the strength is unknown or zero. Null when there is no demand.
   */
  demandToCapacity: (number | null)[] | null;
  /** ASCE 7-16 Table 12.3-2 soft/weak storey flags (1a, 1b, 5a, 5b). */
  irregularities: StoreyIrregularity[];
  /**
   * (centre of rigidity − centre of mass) / plan dimension perpendicular to this direction,
   * per storey; null where positions, plan size or stiffness are missing.
   */
  torsionalEccentricity: (number | null)[];
}

/** What {@link buildingResponse} returns. */
export interface BuildingResponse {
  calcVersion: string;
  /** Sum of storey heights, in m; null when a height is unusable. */
  totalHeightM: number | null;
  /** Sum of storey masses, in kg; null when a mass is unknown. */
  totalMassKg: number | null;
  masses: StoreyMass[];
  x: DirectionResponse;
  y: DirectionResponse;
  /** Every default and modelling assumption behind the numbers, each with its source. */
  assumptions: Assumption[];
  /** Inputs that were absent or unusable, and what the result did without them. */
  missingInputs: MissingInput[];
}

/** Text of the default-damping assumption (built once). */
const DAMPING_TEXT = `Spectrum ordinates at ${100 * REFERENCE_DAMPING} % viscous damping.`;

/** The hazard checked and resolved once, or null (listed) when absent or unusable. */
function checkHazard(
  hazard: SpectrumSpec | null,
  findings: Findings,
): { spec: SpectrumSpec; spectrum: ResolvedSpectrum } | null {
  if (hazard === null || hazard === undefined) {
    findings.missing(
      'hazard',
      'no response spectrum: shears, displacements and drifts are not computed',
    );
    return null;
  }
  const [, hi] = PLAUSIBLE.hazardValue;
  for (const key in hazard) {
    const value: unknown = (hazard as unknown as Record<string, unknown>)[key];
    if (typeof value === 'number' && value > hi) {
      findings.invalid(
        `hazard.${key}`,
        `${value} is above ${hi} (g or s), beyond any earthquake; demand is not computed`,
      );
      return null;
    }
  }
  try {
    return { spec: hazard, spectrum: resolveSpectrum(hazard) }; // validates every field
  } catch (e) {
    findings.invalid('hazard', `${(e as Error).message}; demand is not computed`);
    return null;
  }
}

interface Shared {
  survey: SurveyInput;
  hazard: SpectrumSpec | null;
  spectrum: ResolvedSpectrum | null;
  /** Empirical periods (s) by both methods, and the range warnings of the one in use. */
  ec8S: number | null;
  asce7S: number | null;
  rangeWarnings: string[];
  masses: StoreyMass[];
  massValues: number[] | null;
  heights: (number | null)[];
  allHeights: number[] | null;
  totalHeightM: number | null;
  contributions: WallContribution[];
  measuredS: number | null;
  measuredDirection: Direction | null;
  findings: Findings;
}

function directionResponse(direction: Direction, s: Shared): DirectionResponse {
  const { findings } = s;
  const n = s.masses.length;
  const walls: WallContribution[] = [];
  let hasWalls = false;
  for (const c of s.contributions) {
    if (c.direction !== direction) continue;
    walls.push(c);
    if (c.treatment === 'shear-wall') hasWalls = true;
  }
  const storeys = storeyLateral(n, direction, walls, s.survey.walls, findings);
  const stiffness: (number | null)[] = new Array<number | null>(n);
  const strength: (number | null)[] = new Array<number | null>(n);
  let zero = -1; // first storey without stiffness > 0
  for (let i = 0; i < n; i++) {
    const k = storeys[i]!.stiffnessNPerM;
    stiffness[i] = k;
    strength[i] = storeys[i]!.strengthN;
    if (zero === -1 && !(k !== null && k > 0)) zero = i;
  }

  // Modal model: needs every storey's mass and stiffness > 0.
  let modes: ShearBuildingModes | null = null;
  if (hasWalls && s.massValues !== null && n > 0) {
    if (zero === -1) {
      try {
        modes = shearBuildingModes(s.massValues, stiffness as number[]);
        if (!plausible(modes.periods[0], PLAUSIBLE.modelPeriodS)) {
          findings.invalid(
            `walls (${direction})`,
            `the storey model's first period ${modes.periods[0]} s is not ${rangeText(PLAUSIBLE.modelPeriodS)} s: wall or mass values are in error; no modal model along ${direction}`,
          );
          modes = null;
        }
      } catch (e) {
        findings.invalid(`walls (${direction})`, `modal analysis failed: ${(e as Error).message}`);
      }
    } else {
      findings.assume(
        `modal.skipped.${direction}`,
        `No modal model along ${direction}: ${storeyName(zero)} has ${stiffness[zero] === null ? 'unknown' : 'zero'} shear-wall stiffness; the period falls back to the next estimate.`,
        'a shear building needs every storey stiffness > 0 (modelling limit)',
      );
    }
  }

  // Period estimates.
  const hazard = s.hazard;
  const method = hazard !== null && hazard.kind === 'ec8' ? 'ec8' : 'asce7';
  const warnings: string[] = s.rangeWarnings.slice();
  const ec8 = s.ec8S;
  const asce7 = s.asce7S;
  const empiricalS = method === 'ec8' ? ec8 : asce7;
  let upperLimitS: number | null = null;
  if (hazard !== null && hazard.kind === 'asce7' && asce7 !== null) {
    upperLimitS = upperLimitCoefficient(hazard.SD1) * asce7;
  }
  const modalS = modes !== null ? modes.periods[0]! : null;
  const measuredS =
    s.measuredS !== null && (s.measuredDirection === null || s.measuredDirection === direction)
      ? s.measuredS
      : null;
  let usedS: number | null = null;
  let kind: PeriodEstimate['kind'] = null;
  if (measuredS !== null) {
    usedS = measuredS;
    kind = 'measured';
  } else if (modalS !== null) {
    usedS = modalS;
    kind = 'modal';
  } else if (empiricalS !== null) {
    usedS = empiricalS;
    kind = 'empirical';
    findings.assume(
      `period.empirical.${direction}`,
      `Period along ${direction} is the empirical ${method === 'ec8' ? 'EN 1998-1 eq. (4.6)' : 'ASCE 7-16 eq. (12.8-7)'} value (no measurement, no complete wall model).`,
      method === 'ec8'
        ? 'EN 1998-1:2004 §4.3.3.2.2, Ct = 0.050'
        : 'ASCE 7-16 eq. (12.8-7), Table 12.8-2, Ct = 0.0488, x = 0.75',
    );
  }
  if (upperLimitS !== null && modalS !== null && modalS > upperLimitS) {
    warnings.push(
      `modal period ${modalS.toFixed(3)} s exceeds Cu·Ta = ${upperLimitS.toFixed(3)} s; ASCE 7-16 §12.8.2 would cap a design period there, not applied to this estimate of likely response`,
    );
  }

  // A measurement scales the wall model uniformly, keeping its shapes (k ∝ 1/T²).
  let stiffnessScaleToMeasured: number | null = null;
  if (modes !== null && kind === 'measured' && usedS !== null) {
    const r = modes.periods[0]! / usedS;
    stiffnessScaleToMeasured = r * r;
    modes = {
      ...modes,
      periods: modes.periods.map((T) => T / r),
      frequencies: modes.frequencies.map((f) => f * r),
      circularFrequencies: modes.circularFrequencies.map((w) => w * r),
    };
    findings.assume(
      `period.scaled.${direction}`,
      `Along ${direction} the wall stiffnesses are scaled by ${stiffnessScaleToMeasured.toPrecision(3)} so the model's first period matches the measured one; mode shapes are kept.`,
      'model updating by uniform stiffness scaling (common practice, no source)',
    );
  }

  // Demand.
  let demand: SeismicDemand | null = null;
  const spectrum = s.spectrum;
  if (spectrum !== null && s.massValues !== null && usedS !== null) {
    if (modes !== null) {
      demand = modalDemand(spectrum, modes, s.massValues, s.heights);
    } else if (s.allHeights !== null) {
      demand = elfDemand(spectrum, usedS, s.massValues, s.allHeights);
      findings.assume(
        'demand.elf',
        'Without a complete wall model, demand is by equivalent lateral forces (ASCE 7-16 §12.8.3 distribution) with a mode shape linear in height for displacements.',
        'ASCE 7-16 §12.8.1 and §12.8.3; EN 1998-1:2004 §4.3.3.2.3(3)',
      );
    }
  }
  let demandToCapacity: (number | null)[] | null = null;
  if (demand !== null) {
    demandToCapacity = new Array<number | null>(n);
    for (let i = 0; i < n; i++) {
      const cap = strength[i] ?? null;
      const ratio = cap !== null && cap > 0 ? demand.storeyShearsN[i]! / cap : null;
      // A vanishingly small (but positive) strength overflows the ratio; report it as an
      // entry problem rather than pass Infinity on.
      if (ratio !== null && !Number.isFinite(ratio)) {
        findings.invalid(
          `storeys[${i}].walls.${direction}`,
          'The storey strength is too small to compare with the demand; check the wall values.',
        );
      }
      demandToCapacity[i] = ratio !== null && Number.isFinite(ratio) ? ratio : null;
    }
  }

  const plan = direction === 'x' ? s.survey.building.planYM : s.survey.building.planXM;
  const ecc = torsionalEccentricity(storeys, plan);
  if (hasWalls) {
    const planField = direction === 'x' ? 'building.planYM' : 'building.planXM';
    if (plan === null) {
      findings.missing(
        planField,
        `plan dimension unknown: torsional eccentricity along ${direction} not computed`,
      );
    } else if (!plausible(plan, PLAUSIBLE.planM)) {
      findings.invalid(
        planField,
        `plan dimension ${String(plan)} m is not a number ${rangeText(PLAUSIBLE.planM)} m: torsional eccentricity along ${direction} not computed`,
      );
    }
    let fields = '';
    const unplacedStoreys: number[] = [];
    for (const w of walls) {
      if (w.treatment !== 'shear-wall') continue;
      const pos = s.survey.walls[w.index]?.positionM ?? null;
      if (plausible(pos, PLAUSIBLE.positionM)) continue;
      fields += `${fields === '' ? '' : ', '}walls[${w.index}].positionM`;
      if (!unplacedStoreys.includes(w.storey)) unplacedStoreys.push(w.storey);
    }
    if (fields !== '') {
      findings.missing(
        fields,
        `wall positions unknown: torsional eccentricity along ${direction} not computed for ${unplacedStoreys.map(storeyName).join(', ')}`,
      );
    }
  }

  return {
    direction,
    masses: s.masses,
    storeys,
    walls,
    modes,
    stiffnessScaleToMeasured,
    period: {
      usedS,
      kind,
      measuredS,
      modalS,
      empiricalS,
      empiricalMethod: method,
      empiricalEc8S: ec8,
      empiricalAsce7S: asce7,
      upperLimitS,
      warnings,
    },
    demand,
    demandToCapacity,
    irregularities: storeyIrregularities(stiffness, strength),
    torsionalEccentricity: ecc,
  };
}

/**
 * The storey model of a surveyed building and its elastic response, per plan direction:
 * storey masses, wall-based stiffness and strength, modes, the period used (measured >
 * modal > empirical, the others beside it), base and storey shears, roof displacement,
 * inter-storey drift ratios, demand-to-capacity per storey, ASCE 7-16 Table 12.3-2
 * soft/weak-storey flags and torsional eccentricity.
 *
 * Demand is elastic (no behaviour factor q or R) against nominal wall strength, so a ratio
 * above 1 means the walls are expected to go past yield, not that they fail. Spectrum
 * ordinates are at the hazard's damping (5 % by default); for non-EC8 spectra a damping other
 * than 5 % is applied through the EN 1998-1 eq. (3.6) factor (see spectralAcceleration).
 *
 * Rocking walls are excluded from the shear-wall stiffness, strength and centre of rigidity
 * and are listed in `walls` with treatment 'excluded-rocking' (the rocking module assesses
 * them). Missing or unusable inputs never throw: each is listed in `missingInputs` and the
 * results that depend on it are null; every default is listed in `assumptions`.
 */
export function buildingResponse(survey: SurveyInput): BuildingResponse {
  const findings = new Findings();
  const building = survey.building;
  const storeyInputs = Array.isArray(building.storeys) ? building.storeys : [];
  if (storeyInputs.length === 0) {
    findings.missing('building.storeys', 'no storeys: nothing can be computed');
  }
  const masses = storeyMasses({ ...building, storeys: storeyInputs }, findings);
  const heights: (number | null)[] = storeyInputs.map((st, i) => {
    if (plausible(st.heightM, PLAUSIBLE.storeyHeightM)) return st.heightM;
    findings.invalid(
      `building.storeys[${i}].heightM`,
      `storey height ${String(st.heightM)} m is not a number ${rangeText(PLAUSIBLE.storeyHeightM)} m: total height, empirical period and that storey's drift ratio unknown`,
    );
    return null;
  });
  const allHeights =
    heights.every((h) => h !== null) && heights.length > 0 ? (heights as number[]) : null;
  const heightSum = allHeights === null ? null : allHeights.reduce((a, b) => a + b, 0);
  const totalHeightM = heightSum !== null && Number.isFinite(heightSum) ? heightSum : null;
  const massValues =
    masses.length > 0 && masses.every((m) => m.massKg !== null && m.massKg > 0)
      ? masses.map((m) => m.massKg as number)
      : null;
  const totalMassKg =
    masses.length > 0 && masses.every((m) => m.massKg !== null)
      ? masses.reduce((a, m) => a + (m.massKg as number), 0)
      : null;

  const checked = checkHazard(survey.hazard, findings);
  if (checked !== null && checked.spec.damping === undefined) {
    findings.assume(
      'demand.damping',
      DAMPING_TEXT,
      'reference damping of EN 1998-1:2004 §3.2.2.2 and ASCE 7-16 §11.4.6',
    );
  }
  const method = checked !== null && checked.spec.kind === 'ec8' ? 'ec8' : 'asce7';
  const ec8S = totalHeightM === null ? null : empiricalPeriod(totalHeightM, 'ec8');
  const asce7S = totalHeightM === null ? null : empiricalPeriod(totalHeightM, 'asce7');
  const rangeWarnings = totalHeightM === null ? [] : empiricalPeriodRange(totalHeightM, method);

  let measuredS: number | null = null;
  let measuredDirection: Direction | null = null;
  const m = survey.measured;
  if (m !== null && m !== undefined) {
    if (plausible(m.frequencyHz, PLAUSIBLE.frequencyHz)) {
      measuredS = 1 / m.frequencyHz;
      measuredDirection = m.direction === 'x' || m.direction === 'y' ? m.direction : null;
      if (measuredDirection === null) {
        findings.assume(
          'period.measured-both',
          'The measured frequency has no direction; it is used for both x and y.',
          'common practice, no source (the lowest ambient-vibration peak is usually the softer direction)',
        );
      }
      findings.assume(
        'period.measured-amplitude',
        'A period measured in ambient vibration is at very small amplitude; under strong shaking timber buildings soften, so the period is a lower bound.',
        'common practice, no source',
      );
    } else {
      findings.invalid(
        'measured.frequencyHz',
        `${String(m.frequencyHz)} Hz is not a number ${rangeText(PLAUSIBLE.frequencyHz)} Hz; not used`,
      );
    }
  }

  const wallsIn: WallInput[] = Array.isArray(survey.walls) ? survey.walls : [];
  if (wallsIn.length === 0) {
    findings.missing(
      'walls',
      'no walls entered: empirical period only; storey stiffness and strength unknown',
    );
  }
  const contributions: WallContribution[] = [];
  for (let i = 0; i < wallsIn.length; i++) {
    contributions.push(wallContribution(wallsIn[i]!, i, heights, findings));
  }
  noteWallAssumptions(contributions, findings);
  findings.assume(
    'demand.elastic',
    'Demand is elastic (no behaviour factor q or R) and capacity is nominal wall strength: a demand-to-capacity ratio above 1 means yielding is expected, not necessarily failure.',
    'modelling choice for screening (common practice)',
  );

  const shared: Shared = {
    survey,
    hazard: checked === null ? null : checked.spec,
    spectrum: checked === null ? null : checked.spectrum,
    ec8S,
    asce7S,
    rangeWarnings,
    masses,
    massValues,
    heights,
    allHeights,
    totalHeightM,
    contributions,
    measuredS,
    measuredDirection,
    findings,
  };
  const x = directionResponse('x', shared);
  const y = directionResponse('y', shared);
  return {
    calcVersion: CALC_VERSION,
    totalHeightM,
    totalMassKg,
    masses,
    x,
    y,
    assumptions: findings.assumptions,
    missingInputs: findings.missingInputs,
  };
}
