/**
 * Every supported spectrum has the same four-branch shape once its parameters are worked
 * out: a linear ramp from the ground-acceleration ordinate to a plateau, the plateau, a
 * constant-velocity branch ∝ 1/T and a constant-displacement branch ∝ 1/T². Resolving a spec
 * once (checking it on the way) lets callers evaluate many periods cheaply.
 */
export interface ResolvedSpectrum {
  /** Ordinate at T = 0, in g (not scaled by damping). */
  atZeroG: number;
  /** Plateau ordinate, in g, already scaled by η. */
  plateauG: number;
  /** End of the ramp = start of the plateau, in s (EC8 TB, ASCE T0). */
  rampEndS: number;
  /** End of the plateau, in s (EC8 TC, ASCE TS). */
  plateauEndS: number;
  /** End of the 1/T branch, in s (EC8 TD, ASCE TL; Infinity when there is none). */
  velocityEndS: number;
  /** Damping ratio of the ordinates, and the factor η applied for it. */
  dampingRatio: number;
  eta: number;
}

/** Sa(T) in g of a resolved spectrum; T must be finite and ≥ 0 (not checked here). */
export function resolvedSpectralAcceleration(r: ResolvedSpectrum, T: number): number {
  if (T === 0) return r.atZeroG;
  if (T < r.rampEndS) return r.atZeroG + ((r.plateauG - r.atZeroG) * T) / r.rampEndS;
  if (T <= r.plateauEndS) return r.plateauG;
  if (T <= r.velocityEndS) return (r.plateauG * r.plateauEndS) / T;
  return (r.plateauG * r.plateauEndS * r.velocityEndS) / (T * T);
}
