/**
 * The figures of one plan direction that the verdict reads, taken from the storey model
 * (calc/storey): period, spectral values, drift per storey with the inelastic factor C1,
 * demand-to-capacity per storey, storeys with no racking strength, soft or weak storeys and
 * torsional eccentricity. Plain JSON.
 */
import { inelasticDisplacementFactor } from '../damage/inelastic-displacement.js';
import type { DirectionResponse } from '../storey/building-response.js';
import type { PeriodKind } from '../storey/period-estimate.js';
import type { Direction } from '../survey/survey-input.js';

/** A storey flagged by ASCE 7-16 Table 12.3-2 in one direction. */
export interface FlaggedStorey {
  storey: number;
  soft1a: boolean;
  extremeSoft1b: boolean;
  weak5a: boolean;
  extremeWeak5b: boolean;
  stiffnessRatioToAbove: number | null;
  strengthRatioToAbove: number | null;
  /**
   * Drift ratio of the storey if, once it yields, the whole inelastic roof displacement
   * (C1 × elastic roof displacement) gathers in it, the storeys above staying near elastic:
   * the storey mechanism of a weak storey. Null when not weak, not yielding or unknown.
   */
  mechanismDriftRatio: number | null;
}

export interface DirectionSummary {
  direction: Direction;
  periodS: number | null;
  periodKind: PeriodKind | null;
  /** Sa(T) in g and the elastic Sd(T) in m at the period used; null without demand. */
  spectralAccelerationG: number | null;
  spectralDisplacementM: number | null;
  /** C1 of the direction (1 when the walls stay within their strength or it is unknown). */
  inelasticFactor: number;
  /** Strength ratio μ C1 was computed from (the largest storey D/C), null when unknown. */
  strengthRatio: number | null;
  /** Elastic inter-storey drift ratio per storey, ground storey first. */
  elasticDriftRatios: (number | null)[];
  /** Largest drift ratio × C1, and its storey. */
  peakDriftRatio: number | null;
  peakDriftStorey: number | null;
  /** Storey shear demand / nominal strength, per storey (null where unknown). */
  demandToCapacity: (number | null)[];
  maxDemandToCapacity: number | null;
  maxDemandToCapacityStorey: number | null;
  /** Storeys whose recorded walls have zero racking strength while they carry shear. */
  zeroStrengthStoreys: number[];
  flaggedStoreys: FlaggedStorey[];
  /** Largest |eccentricity| / plan dimension over the storeys, and its storey. */
  maxEccentricity: number | null;
  maxEccentricityStorey: number | null;
}

function finite(x: number | null | undefined): x is number {
  return typeof x === 'number' && Number.isFinite(x);
}

/** Index and value of the largest finite entry, or nulls. */
function largest(values: readonly (number | null)[]): {
  value: number | null;
  index: number | null;
} {
  let value: number | null = null;
  let index: number | null = null;
  values.forEach((v, i) => {
    if (finite(v) && (value === null || v > value)) {
      value = v;
      index = i;
    }
  });
  return { value, index };
}

/**
 * Summarises one direction of the storey model for the verdict.
 *
 * @param siteConstant a of C1 (60, 90 or 130), see inelasticDisplacementFactor.
 */
export function directionSummary(
  d: DirectionResponse,
  siteConstant: number,
  storeyHeightsM: readonly (number | null)[],
): DirectionSummary {
  const demand = d.demand;
  const dc = d.demandToCapacity ?? d.storeys.map(() => null);
  const maxDc = largest(dc);
  const periodS = finite(d.period.usedS) ? d.period.usedS : null;
  let inelasticFactor = 1;
  if (maxDc.value !== null && periodS !== null) {
    inelasticFactor = inelasticDisplacementFactor(maxDc.value, periodS, siteConstant);
  }
  const elastic =
    demand?.driftRatios.map((r) => (finite(r) ? r : null)) ?? d.storeys.map(() => null);
  const peak = largest(elastic);
  const zeroStrengthStoreys: number[] = [];
  if (demand !== null) {
    d.storeys.forEach((s, i) => {
      const shear = demand.storeyShearsN[i];
      if (s.strengthN === 0 && s.shearWallCount > 0 && finite(shear) && shear > 0) {
        zeroStrengthStoreys.push(i);
      }
    });
  }
  const flaggedStoreys: FlaggedStorey[] = [];
  for (const irr of d.irregularities) {
    if (irr.soft1a || irr.extremeSoft1b || irr.weak5a || irr.extremeWeak5b) {
      const weak = irr.weak5a === true || irr.extremeWeak5b === true;
      const dcHere = dc[irr.storey] ?? null;
      const h = storeyHeightsM[irr.storey] ?? null;
      const roof = demand?.roofDisplacementM;
      const mechanismDriftRatio =
        weak && finite(dcHere) && dcHere >= 1 && finite(roof) && finite(h) && h > 0
          ? (roof * inelasticFactor) / h
          : null;
      flaggedStoreys.push({
        storey: irr.storey,
        soft1a: irr.soft1a === true,
        extremeSoft1b: irr.extremeSoft1b === true,
        weak5a: irr.weak5a === true,
        extremeWeak5b: irr.extremeWeak5b === true,
        stiffnessRatioToAbove: finite(irr.stiffnessRatioToAbove) ? irr.stiffnessRatioToAbove : null,
        strengthRatioToAbove: finite(irr.strengthRatioToAbove) ? irr.strengthRatioToAbove : null,
        mechanismDriftRatio,
      });
    }
  }
  const ecc = largest(d.torsionalEccentricity.map((e) => (finite(e) ? Math.abs(e) : null)));
  return {
    direction: d.direction,
    periodS,
    periodKind: d.period.kind,
    spectralAccelerationG:
      demand && finite(demand.spectralAccelerationG) ? demand.spectralAccelerationG : null,
    spectralDisplacementM:
      demand && finite(demand.spectralDisplacementM) ? demand.spectralDisplacementM : null,
    inelasticFactor,
    strengthRatio: maxDc.value,
    elasticDriftRatios: elastic,
    peakDriftRatio: peak.value === null ? null : peak.value * inelasticFactor,
    peakDriftStorey: peak.index,
    demandToCapacity: dc.map((v) => (finite(v) ? v : null)),
    maxDemandToCapacity: maxDc.value,
    maxDemandToCapacityStorey: maxDc.index,
    zeroStrengthStoreys,
    flaggedStoreys,
    maxEccentricity: ecc.value,
    maxEccentricityStorey: ecc.index,
  };
}
