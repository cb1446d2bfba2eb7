/**
 * Derivative-free minimisation by the Nelder–Mead simplex (Nelder & Mead 1965, "A simplex
 * method for function minimization", Computer Journal 7(4):308–313), with the standard
 * coefficients reflection 1, expansion 2, contraction ½, shrink ½ (Lagarias, Reeds, Wright &
 * Wright 1998, SIAM J. Optim. 9(1):112–147). Small problems only (a handful of parameters).
 */
import { requireIntegerIn } from './checks.js';

export interface NelderMeadOptions {
  /** Initial step per parameter (the simplex's size). */
  steps: readonly number[];
  /** Stop when the simplex's function values span less than this. Default 1e-9. */
  tolerance?: number;
  /** Stop after this many iterations. Default 2000. */
  maxIterations?: number;
}

export interface NelderMeadResult {
  x: number[];
  value: number;
  iterations: number;
  converged: boolean;
}

/** Minimises `f` from `start`. A non-finite f(x) counts as +∞ (the simplex moves away). */
export function nelderMead(
  f: (x: readonly number[]) => number,
  start: readonly number[],
  options: NelderMeadOptions,
): NelderMeadResult {
  const n = start.length;
  requireIntegerIn('start.length', n, 1, 20);
  if (options.steps.length !== n) {
    throw new RangeError(`options.steps must have ${n} entries, got ${options.steps.length}`);
  }
  const tolerance = options.tolerance ?? 1e-9;
  const maxIterations = options.maxIterations ?? 2000;
  const value = (x: readonly number[]) => {
    const v = f(x);
    return Number.isFinite(v) ? v : Infinity;
  };
  let simplex: { x: number[]; v: number }[] = [{ x: [...start], v: value(start) }];
  for (let i = 0; i < n; i++) {
    const x = [...start];
    x[i] = (x[i] as number) + (options.steps[i] as number);
    simplex.push({ x, v: value(x) });
  }
  const combine = (a: number[], b: number[], t: number) =>
    a.map((ai, i) => ai + t * ((b[i] as number) - ai));
  let iterations = 0;
  let converged = false;
  while (iterations < maxIterations) {
    simplex.sort((p, q) => p.v - q.v);
    const best = simplex[0] as { x: number[]; v: number };
    const worst = simplex[n] as { x: number[]; v: number };
    if (Math.abs(worst.v - best.v) <= tolerance * (Math.abs(best.v) + tolerance)) {
      converged = true;
      break;
    }
    iterations += 1;
    const centroid = new Array<number>(n).fill(0);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++)
        centroid[j] =
          (centroid[j] as number) + ((simplex[i] as { x: number[] }).x[j] as number) / n;
    }
    const reflected = combine(centroid, worst.x, -1);
    const vr = value(reflected);
    const second = simplex[n - 1] as { v: number };
    if (vr < best.v) {
      const expanded = combine(centroid, worst.x, -2);
      const ve = value(expanded);
      simplex[n] = ve < vr ? { x: expanded, v: ve } : { x: reflected, v: vr };
    } else if (vr < second.v) {
      simplex[n] = { x: reflected, v: vr };
    } else {
      const outside = vr < worst.v;
      const contracted = combine(centroid, outside ? reflected : worst.x, 0.5);
      const vc = value(contracted);
      if (vc < (outside ? vr : worst.v)) {
        simplex[n] = { x: contracted, v: vc };
      } else {
        simplex = simplex.map((p, i) => {
          if (i === 0) return p;
          const x = combine(best.x, p.x, 0.5);
          return { x, v: value(x) };
        });
      }
    }
  }
  simplex.sort((p, q) => p.v - q.v);
  const best = simplex[0] as { x: number[]; v: number };
  return { x: best.x, value: best.v, iterations, converged };
}
