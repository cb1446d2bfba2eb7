import { G } from '../units/gravity.js';
import { requireNonNegative, requirePositive } from './guards.js';
import { rockingBlock, type RockingBlock } from './rocking-block.js';

/** What a rocking wall is made of and carries. SI units: m and N. */
export interface RockingWallParams {
  /** Full width 2b (heel to toe) in m. */
  widthM: number;
  /** Full height 2h in m. */
  heightM: number;
  /** Self weight W of the panel, in N (> 0). */
  selfWeightN: number;
  /** Gravity load N carried on top of the wall, in N (≥ 0). */
  gravityLoadN: number;
  /** Total post-tension force P, in N (≥ 0). */
  postTensionN: number;
  /** Tension capacity F of the hold-downs at one end of the wall (the heel), in N (≥ 0). */
  holdDownCapacityN: number;
}

/** Lever arms (horizontal, about the toe) and heights of the forces on a rocking wall, in m. */
export interface RockingWallLeverArms {
  /** Self weight, at the panel centre: b. */
  selfWeight: number;
  /** Gravity load on top, at the top centre: b. */
  gravityLoad: number;
  /** Post-tension on the wall's centre line, anchored in the foundation: b. */
  postTension: number;
  /** Hold-down at the heel: 2b (full width; rigid base, no compression-zone depth). */
  holdDown: number;
  /** Height of the panel's own centre of mass: h. */
  selfWeightHeight: number;
  /** Height of the gravity load (top of the wall): 2h. */
  gravityLoadHeight: number;
}

/** Restoring moments about the toe at the onset of uplift, in N·m. */
export interface RockingWallMoments {
  selfWeight: number;
  gravityLoad: number;
  postTension: number;
  holdDown: number;
}

/**
 * A rocking wall. Its top-level block fields (`alpha`, `p`, `R`, `restitution`,
 * `upliftAccelerationG`) describe the EQUIVALENT BLOCK that rockingTimeHistory,
 * rockingDemand and pulseOverturningCheck use; `panel` holds the bare panel's own
 * {@link rockingBlock} parameters. With no gravity load, post-tension or hold-downs both are
 * identical, so the simple rigid block is kept exact.
 */
export interface RockingWall extends RockingBlock {
  /** The bare panel as a rigid block, from its geometry only (Housner 1963). */
  panel: RockingBlock;
  /** Moment capacity about the toe at uplift, in N·m: M = (W + N + P)·b + F·2b. */
  momentCapacityNm: number;
  /** Restoring moment about the toe while rocking (hold-downs let go), in N·m: (W + N + P)·b. */
  rockingMomentNm: number;
  /** Overturning moment about the toe per g of ground acceleration, in N·m: W·h + N·2h. */
  overturningMomentPerGNm: number;
  /** Uplift acceleration once the hold-downs have let go, in g: tan α of the equivalent block. */
  rockingUpliftAccelerationG: number;
  /** Base shear at uplift, in N: upliftAccelerationG × (W + N). */
  upliftBaseShearN: number;
  /** Mass moving with the wall (panel + gravity load), in kg. */
  massKg: number;
  /** Height of the centre of that mass above the base, in m. */
  centreOfMassHeightM: number;
  /** Moment of inertia about the toe, in kg·m². */
  rotationalInertiaKgM2: number;
  leverArmsM: RockingWallLeverArms;
  restoringMomentsNm: RockingWallMoments;
}

/**
 * A rocking wall: a rigid panel on a rigid base that may carry a gravity load on top, be
 * post-tensioned and be held down at its ends, mapped onto an equivalent Housner block.
 *
 * Lever arms about the toe (the corner it rocks on), with b, h the half-width and half-height:
 * self weight W at b (height h); gravity load N at the top centre, b (height 2h); post-tension
 * P on the centre line, anchored in the foundation, b; hold-downs at the heel, 2b.
 *
 * Uplift (rest → rocking), in g: λ = M_restoring / (m_eff·g·h_cg), with
 * M_restoring = (W + N + P)·b + F·2b and m_eff·g·h_cg = W·h + N·2h: the gravity load's mass is
 * taken to ride with the top of the wall (its tributary seismic mass), the tendon and the
 * hold-downs add restoring moment but no mass.
 *
 * Rocking, derived here (exact algebra). About the toe the restoring moment is
 * A·cos θ − B·sin θ with A = (W + N + P)·b and B = W·h + N·2h (P treated as a constant force
 * through the centre of the base, the point where the tendon crosses the joint), which is
 * exactly √(A² + B²)·sin(α_e − θ) with α_e = atan(A/B). So the equivalent block has
 * - α_e = atan(A/B): both the uplift acceleration (without hold-downs) and the angle at which
 *   the wall topples statically;
 * - p_e² = B / (I₀·cos α_e), with I₀ = (4/3)·(W/g)·R² + (N/g)·(b² + 4h²);
 * - r_e = 1 − 2·m_eff·b² / I₀, angular momentum about the new corner at impact (Housner's
 *   argument with the gravity load as a point mass at the top centre).
 * With P = 0 the equivalent block is the exact equation of the wall with its top mass. With
 * P > 0 the one approximation is in the ground-motion term, whose lever is taken as that of a
 * mass at the combined centre (overstating it by P·b·sin θ per g, conservative).
 *
 * Hold-downs are taken to let go at the first uplift (they raise only `upliftAccelerationG`);
 * tendon elongation, tendon yield and the compression zone at the toe are not modelled.
 *
 * @throws RangeError naming the bad field: dimensions and self weight must be finite > 0, the
 *   other forces finite ≥ 0.
 */
export function rockingWall(params: RockingWallParams): RockingWall {
  if (params === null || typeof params !== 'object') {
    throw new RangeError(`params must be an object, got ${String(params)}`);
  }
  const widthM = requirePositive('widthM', params.widthM);
  const heightM = requirePositive('heightM', params.heightM);
  const W = requirePositive('selfWeightN', params.selfWeightN);
  const N = requireNonNegative('gravityLoadN', params.gravityLoadN);
  const P = requireNonNegative('postTensionN', params.postTensionN);
  const F = requireNonNegative('holdDownCapacityN', params.holdDownCapacityN);
  const panel = rockingBlock(widthM, heightM);
  const b = widthM / 2;
  const h = heightM / 2;

  const leverArmsM: RockingWallLeverArms = {
    selfWeight: b,
    gravityLoad: b,
    postTension: b,
    holdDown: 2 * b,
    selfWeightHeight: h,
    gravityLoadHeight: 2 * h,
  };
  const restoringMomentsNm: RockingWallMoments = {
    selfWeight: W * b,
    gravityLoad: N * b,
    postTension: P * b,
    holdDown: F * 2 * b,
  };
  const A = (W + N + P) * b;
  const B = W * h + N * 2 * h;
  const momentCapacityNm = A + F * 2 * b;
  const massKg = (W + N) / G;
  const centreOfMassHeightM = B / (W + N);
  // 4/3: I₀ = (4/3)·m·R² of a rectangle about its corner (Housner 1963); the gravity load is a
  // point mass at the top centre, a distance √(b² + (2h)²) from the toe.
  const I0 = (4 / 3) * (W / G) * panel.R * panel.R + (N / G) * (b * b + 4 * h * h);
  const alpha = Math.atan2(A, B);
  const p = Math.sqrt(B / (I0 * Math.cos(alpha)));
  // Housner's impact argument: r = 1 − 2·Σm·b²/I₀ (each mass sits b from either corner).
  const restitution = Math.max(0, 1 - (2 * massKg * b * b) / I0); // 0: squat walls stop at impact
  const upliftAccelerationG = momentCapacityNm / B;
  return {
    widthM,
    heightM,
    alpha,
    R: Math.hypot(b, centreOfMassHeightM),
    p,
    restitution,
    upliftAccelerationG,
    panel,
    momentCapacityNm,
    rockingMomentNm: A,
    overturningMomentPerGNm: B,
    rockingUpliftAccelerationG: A / B,
    upliftBaseShearN: upliftAccelerationG * (W + N),
    massKg,
    centreOfMassHeightM,
    rotationalInertiaKgM2: I0,
    leverArmsM,
    restoringMomentsNm,
  };
}
