/**
 * Root of an increasing function on [lo, hi] by bisection, where residual(lo) <= 0 <= residual(hi).
 * Internal helper (not re-exported by index.ts).
 *
 * Stops when the bracket is narrower than relativeTolerance times its upper end (or
 * an end is an exact root); bisection halves the bracket each step, so it always ends.
 * Source: bisection method, e.g. R. L. Burden and J. D. Faires, Numerical Analysis, sec. 2.1 (from memory).
 */
export interface BisectionResult {
  root: number;
  iterations: number;
  converged: boolean;
}

export function bisectIncreasing(
  residual: (x: number) => number,
  lo: number,
  hi: number,
  relativeTolerance: number,
  maxIterations = 200,
): BisectionResult {
  let iterations = 0;
  while (iterations < maxIterations) {
    if (hi - lo <= relativeTolerance * Math.abs(hi)) return { root: 0.5 * (lo + hi), iterations, converged: true };
    const mid = 0.5 * (lo + hi);
    iterations++;
    const r = residual(mid);
    if (r === 0) return { root: mid, iterations, converged: true };
    if (r < 0) lo = mid;
    else hi = mid;
  }
  return { root: 0.5 * (lo + hi), iterations, converged: false };
}
