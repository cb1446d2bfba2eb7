import type { ShearBuildingModes } from '../modal/shear-building-modes.js';
import {
  resolvedSpectralAcceleration,
  type ResolvedSpectrum,
} from '../spectra/resolved-spectrum.js';
import { G } from '../units/gravity.js';

/** Local copy of g (m/s²) for the loops below. */
const g = G;

/** Elastic seismic demand on the storeys in one direction. */
export interface SeismicDemand {
  /** 'modal-srss': all modes, SRSS; 'elf': equivalent lateral force with an assumed shape. */
  method: 'modal-srss' | 'elf';
  /** Fundamental period the demand is read at, in s. */
  periodS: number;
  /** Damping ratio of the spectrum ordinates. */
  dampingRatio: number;
  /** Sa(T1) in g and Sd(T1) in m. */
  spectralAccelerationG: number;
  spectralDisplacementM: number;
  /** Shear at the base, in N (= storeyShearsN[0]). */
  baseShearN: number;
  /** Shear in each storey, ground storey first, in N. */
  storeyShearsN: number[];
  /** Roof displacement Γ1·φ1,roof·Sd(T1), in m (first mode; φ1,roof = 1). */
  roofDisplacementM: number;
  /** Inter-storey drift of each storey, in m. */
  storeyDriftsM: number[];
  /** Inter-storey drift over storey height (null where the height is unusable). */
  driftRatios: (number | null)[];
}

function driftRatios(
  drifts: readonly number[],
  heights: readonly (number | null)[],
): (number | null)[] {
  const out: (number | null)[] = new Array<number | null>(drifts.length);
  for (let i = 0; i < drifts.length; i++) {
    const h = heights[i] ?? null;
    out[i] = h === null ? null : drifts[i]! / h;
  }
  return out;
}

/**
 * Modal response-spectrum demand: for each mode n, floor forces Γn·φn,i·mi·Sa(Tn)·g and floor
 * displacements Γn·φn,i·Sd(Tn); storey shears and drifts per mode, combined by SRSS (square
 * root of the sum of squares). SRSS is allowed when modes are well separated
 * (EN 1998-1:2004 §4.3.3.3.2(2): Tj ≤ 0.9·Ti), which holds for shear-building modes
 * (ASCE 7-16 §12.9.1.3 lists SRSS too). Elastic: no behaviour or response-modification factor.
 */
export function modalDemand(
  spectrum: ResolvedSpectrum,
  modes: ShearBuildingModes,
  masses: readonly number[],
  heights: readonly (number | null)[],
): SeismicDemand {
  const n = masses.length;
  const shear2 = new Float64Array(n);
  const drift2 = new Float64Array(n);
  let sa1 = 0;
  let sd1 = 0;
  let roof = 0;
  for (let j = 0; j < modes.periods.length; j++) {
    const T = modes.periods[j]!;
    const sa = resolvedSpectralAcceleration(spectrum, T);
    const w = T / (2 * Math.PI);
    const sd = sa * g * w * w;
    const gamma = modes.participationFactors[j]!;
    const phi = modes.shapes[j]!;
    if (j === 0) {
      sa1 = sa;
      sd1 = sd;
      roof = gamma * phi[n - 1]! * sd;
    }
    // Storey shear: sum of floor forces from the roof down.
    let v = 0;
    for (let i = n - 1; i >= 0; i--) {
      v += gamma * phi[i]! * masses[i]! * sa * g;
      shear2[i] = shear2[i]! + v * v;
      const d = gamma * (phi[i]! - (i > 0 ? phi[i - 1]! : 0)) * sd;
      drift2[i] = drift2[i]! + d * d;
    }
  }
  const storeyShearsN: number[] = new Array<number>(n);
  const storeyDriftsM: number[] = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    storeyShearsN[i] = Math.sqrt(shear2[i]!);
    storeyDriftsM[i] = Math.sqrt(drift2[i]!);
  }
  return {
    method: 'modal-srss',
    periodS: modes.periods[0]!,
    dampingRatio: spectrum.dampingRatio,
    spectralAccelerationG: sa1,
    spectralDisplacementM: sd1,
    baseShearN: storeyShearsN[0]!,
    storeyShearsN,
    roofDisplacementM: Math.abs(roof),
    storeyDriftsM,
    driftRatios: driftRatios(storeyDriftsM, heights),
  };
}

/**
 * Distribution exponent k of ASCE 7-16 §12.8.3: 1 for T ≤ 0.5 s, 2 for T ≥ 2.5 s, linear
 * between.
 */
export function elfExponent(T: number): number {
  if (T <= 0.5) return 1;
  if (T >= 2.5) return 2;
  return 1 + (T - 0.5) / 2;
}

/**
 * Equivalent lateral force demand, for when there is no modal model: base shear
 * V = Sa(T)·g·Σm (ASCE 7-16 §12.8.1 with Cs = Sa, i.e. R = Ie = 1, elastic), floor forces
 * by ASCE 7-16 §12.8.3 (Cvx = wx·hx^k / Σ wi·hi^k), and displacements from a mode shape
 * linear in height (EN 1998-1:2004 §4.3.3.2.3(3) allows it): Γ = Σmφ/Σmφ², floor
 * displacement Γ·φi·Sd(T), so every storey drifts Γ·Sd·hi/H.
 *
 * @param spectrum the hazard, resolved once (resolveSpectrum).
 * @param heights storey heights (all > 0, ground storey first), in m.
 */
export function elfDemand(
  spectrum: ResolvedSpectrum,
  T: number,
  masses: readonly number[],
  heights: readonly number[],
): SeismicDemand {
  const n = masses.length;
  const sa = resolvedSpectralAcceleration(spectrum, T);
  const w = T / (2 * Math.PI);
  const sd = sa * g * w * w;
  const levels = new Float64Array(n);
  let H = 0;
  let totalMass = 0;
  for (let i = 0; i < n; i++) {
    H += heights[i]!;
    levels[i] = H;
    totalMass += masses[i]!;
  }
  const k = elfExponent(T);
  let sumWh = 0;
  let mPhi = 0;
  let mPhi2 = 0;
  const wh = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    // (h/H)^k in place of h^k: the same distribution, free of overflow.
    wh[i] = masses[i]! * Math.pow(levels[i]! / H, k);
    sumWh += wh[i]!;
    const phi = levels[i]! / H;
    mPhi += masses[i]! * phi;
    mPhi2 += masses[i]! * phi * phi;
  }
  const V = sa * g * totalMass;
  const gamma = mPhi2 > 0 ? mPhi / mPhi2 : 0;
  const storeyShearsN: number[] = new Array<number>(n);
  const storeyDriftsM: number[] = new Array<number>(n);
  let v = 0;
  for (let i = n - 1; i >= 0; i--) {
    v += sumWh > 0 ? (V * wh[i]!) / sumWh : 0;
    storeyShearsN[i] = v;
    storeyDriftsM[i] = (gamma * sd * heights[i]!) / H;
  }
  return {
    method: 'elf',
    periodS: T,
    dampingRatio: spectrum.dampingRatio,
    spectralAccelerationG: sa,
    spectralDisplacementM: sd,
    baseShearN: storeyShearsN[0]!,
    storeyShearsN,
    roofDisplacementM: gamma * sd,
    storeyDriftsM,
    driftRatios: driftRatios(storeyDriftsM, heights),
  };
}
