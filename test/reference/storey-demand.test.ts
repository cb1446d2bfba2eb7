// Demand on the storey model, against hand calculations.
// References: EN 1998-1:2004 §3.2.2.2 eqs. (3.2)–(3.5) (spectrum, type 1, ground B: S = 1.2,
// TB = 0.15, TC = 0.5, TD = 2.0, Table 3.2), modal superposition with SRSS (EN 1998-1
// §4.3.3.3.2; Chopra, Dynamics of Structures, ch. 13), the two-storey textbook modes
// (m1 = 2m, m2 = m, k1 = 2k, k2 = k: ω² = k/2m, 2k/m; φ1 = [½, 1], φ2 = [−1, 1]; Γ = 4/3, −1/3),
// and the equivalent lateral force distribution of ASCE 7-16 §12.8.3.
import { describe, expect, it } from 'vitest';
import { buildingResponse, elfExponent } from '../../calc/index.js';
import { storey, survey, wall } from '../fixtures/buildings/survey-builder.js';

const g = 9.81;
// EN 1998-1 type 1, ground B, ag = 0.25 g (S = 1.2, TB = 0.15, TC = 0.5, TD = 2.0).
function se(T: number): number {
  const agS = 0.25 * 1.2;
  if (T <= 0.15) return agS * (1 + (T / 0.15) * 1.5);
  if (T <= 0.5) return 2.5 * agS;
  if (T <= 2) return (2.5 * agS * 0.5) / T;
  return (2.5 * agS * 0.5 * 2) / (T * T);
}

describe('single-storey building (one mode)', () => {
  const s = survey({ walls: [wall({ storey: 0, direction: 'x', lengthM: 5 })] });
  const r = buildingResponse(s);
  const m = (100 * 700) / g; // 100 m² light roof at 700 Pa
  const k = (14 * (4448.2216152605 / 0.0254) * 5) / 2.8; // SDPWS Ga·L/h
  it('has the period 2π√(m/k) and uses it as the modal period', () => {
    expect(r.x.period.kind).toBe('modal');
    expect(r.x.period.usedS).toBeCloseTo(2 * Math.PI * Math.sqrt(m / k), 12);
  });
  it('gives base shear Sa·W = 0.75 × 70 kN = 52.5 kN on the EN 1998-1 plateau', () => {
    expect(r.x.demand!.spectralAccelerationG).toBeCloseTo(0.75, 12);
    expect(r.x.demand!.baseShearN).toBeCloseTo(52_500, 6);
  });
  it('gives roof displacement Sd = Sa·W/k and drift ratio Sd/h', () => {
    const sd = (0.75 * 70_000) / k;
    expect(r.x.demand!.roofDisplacementM).toBeCloseTo(sd, 12);
    expect(r.x.demand!.driftRatios[0]).toBeCloseTo(sd / 2.8, 12);
  });
  it('gives demand-to-capacity = 52.5 kN / (5 m × 560 plf)', () => {
    expect(r.x.demandToCapacity![0]).toBeCloseTo(
      52_500 / (5 * 560 * (4.4482216152605 / 0.3048)),
      9,
    );
  });
});

describe('two-storey textbook building (m1 = 2m, m2 = m, k1 = 2k, k2 = k), modal SRSS', () => {
  const m = 10_000; // kg
  const k = 1e7; // N/m
  const s = survey({
    storeys: [
      storey({ floorConstruction: 'on-grade', heightM: 3 }),
      // Floor of storey 1 carries 2m: 100 m² × 1962 Pa / 9.81 = 20 000 kg.
      storey({ heightM: 3, floorAreaM2: 100, unitWeightPa: (2 * m * g) / 100 }),
    ],
    walls: [
      wall({
        storey: 0,
        direction: 'x',
        type: 'user',
        lengthM: 10,
        userUnitShearNPerM: 20_000,
        userUnitStiffnessNPerM2: (2 * k) / 10,
      }),
      wall({
        storey: 1,
        direction: 'x',
        type: 'user',
        lengthM: 10,
        userUnitShearNPerM: 20_000,
        userUnitStiffnessNPerM2: k / 10,
      }),
    ],
  });
  s.building.roofUnitWeightPa = (m * g) / 100;
  const r = buildingResponse(s);
  const T1 = (2 * Math.PI) / Math.sqrt(k / (2 * m));
  const T2 = (2 * Math.PI) / Math.sqrt((2 * k) / m);
  const sa1 = se(T1);
  const sa2 = se(T2);
  const sd = (sa: number, T: number) => sa * g * (T / (2 * Math.PI)) ** 2;
  it('finds T1 = 2π/√(k/2m) and T2 = 2π/√(2k/m)', () => {
    expect(r.x.modes!.periods[0]).toBeCloseTo(T1, 12);
    expect(r.x.modes!.periods[1]).toBeCloseTo(T2, 12);
  });
  it('combines the storey shears by SRSS: base √((8/3·m·Sa1·g)² + (1/3·m·Sa2·g)²)', () => {
    const base = Math.hypot((8 / 3) * m * sa1 * g, (1 / 3) * m * sa2 * g);
    const top = Math.hypot((4 / 3) * m * sa1 * g, (1 / 3) * m * sa2 * g);
    expect(r.x.demand!.method).toBe('modal-srss');
    expect(r.x.demand!.baseShearN).toBeCloseTo(base, 6);
    expect(r.x.demand!.storeyShearsN[1]).toBeCloseTo(top, 6);
  });
  it('gives roof displacement Γ1·φ1·Sd(T1) = 4/3·Sd(T1)', () => {
    expect(r.x.demand!.roofDisplacementM).toBeCloseTo((4 / 3) * sd(sa1, T1), 12);
  });
  it('combines the drifts by SRSS: storey 0 √((2/3·Sd1)² + (1/3·Sd2)²), storey 1 √((2/3·Sd1)² + (2/3·Sd2)²)', () => {
    const d0 = Math.hypot((2 / 3) * sd(sa1, T1), (1 / 3) * sd(sa2, T2));
    const d1 = Math.hypot((2 / 3) * sd(sa1, T1), (2 / 3) * sd(sa2, T2));
    expect(r.x.demand!.storeyDriftsM[0]).toBeCloseTo(d0, 12);
    expect(r.x.demand!.driftRatios[1]).toBeCloseTo(d1 / 3, 12);
  });
});

describe('equivalent lateral forces when there are no walls (ASCE 7-16 §12.8.1, §12.8.3)', () => {
  const s = survey({
    storeys: [
      storey({ floorConstruction: 'on-grade', heightM: 3 }),
      storey({ heightM: 3 }),
      storey({ heightM: 3 }),
    ],
  });
  const r = buildingResponse(s);
  const T = 0.05 * 9 ** 0.75; // EN 1998-1 eq. (4.6), H = 9 m
  const w = [100 * 1200, 100 * 1200, 100 * 700]; // N at levels 3, 6, 9 m
  it('uses the empirical period and says which', () => {
    expect(r.x.period.kind).toBe('empirical');
    expect(r.x.period.usedS).toBeCloseTo(T, 12);
    expect(r.x.demand!.method).toBe('elf');
  });
  it('gives V = Sa·W and forces ∝ w·h (k = 1 for T ≤ 0.5 s)', () => {
    const V = se(T) * (w[0]! + w[1]! + w[2]!);
    const wh = [w[0]! * 3, w[1]! * 6, w[2]! * 9];
    const sum = wh[0]! + wh[1]! + wh[2]!;
    expect(r.x.demand!.baseShearN).toBeCloseTo(V, 6);
    expect(r.x.demand!.storeyShearsN[2]).toBeCloseTo((V * wh[2]!) / sum, 6);
    expect(r.x.demand!.storeyShearsN[1]).toBeCloseTo((V * (wh[1]! + wh[2]!)) / sum, 6);
  });
  it('gives roof displacement Γ·Sd with a shape linear in height', () => {
    const phi = [1 / 3, 2 / 3, 1];
    const mPhi = w.reduce((a, wi, i) => a + wi * phi[i]!, 0);
    const mPhi2 = w.reduce((a, wi, i) => a + wi * phi[i]! ** 2, 0);
    const sdT = se(T) * g * (T / (2 * Math.PI)) ** 2;
    expect(r.x.demand!.roofDisplacementM).toBeCloseTo((mPhi / mPhi2) * sdT, 12);
    expect(r.x.demand!.driftRatios[0]).toBeCloseTo(((mPhi / mPhi2) * sdT) / 9, 12);
  });
  it('has strength unknown, so no demand-to-capacity', () => {
    expect(r.x.storeys[0]!.strengthN).toBeNull();
    expect(r.x.demandToCapacity).toEqual([null, null, null]);
  });
  it('uses the ASCE 7-16 §12.8.3 exponent: 1 up to 0.5 s, 2 from 2.5 s, linear between', () => {
    expect(elfExponent(0.3)).toBe(1);
    expect(elfExponent(1.5)).toBe(1.5);
    expect(elfExponent(3)).toBe(2);
  });
});

describe('damping other than 5 %', () => {
  it('reads the demand at the spectrum’s damping through η (EN 1998-1 eq. 3.6)', () => {
    const s = survey({
      walls: [wall({ storey: 0, direction: 'x', lengthM: 5 })],
      hazard: { kind: 'asce7', SDS: 1.0, SD1: 0.6, TL: 8, damping: 0.1 },
    });
    const r = buildingResponse(s);
    expect(r.x.demand!.dampingRatio).toBe(0.1);
    expect(r.x.demand!.spectralAccelerationG).toBeCloseTo(Math.sqrt(10 / 15), 12);
  });
});
