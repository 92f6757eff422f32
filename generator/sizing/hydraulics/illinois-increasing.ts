import type { BisectionResult } from './bisect-increasing.ts';

/**
 * Root of an increasing function on [lo, hi], where residual(lo) <= 0 <= residual(hi), by the
 * Illinois variant of regula falsi: a secant step inside the bracket, halving the stored
 * residual of an end that stays put twice running so both ends close in. Same stopping rule
 * and result as bisectIncreasing (bracket narrower than relativeTolerance times its upper
 * end), in far fewer residual calls on smooth functions. Internal helper.
 * Source: M. Dowell and P. Jarratt (1971), BIT 11:168-174 (from memory).
 */
export function illinoisIncreasing(
  residual: (x: number) => number,
  lo: number,
  hi: number,
  relativeTolerance: number,
  maxIterations = 200,
): BisectionResult {
  let rLo = residual(lo);
  if (rLo >= 0) return { root: lo, iterations: 1, converged: true };
  let rHi = residual(hi);
  if (rHi <= 0) return { root: hi, iterations: 2, converged: true };
  let iterations = 2;
  let lastMoved = 0; // -1: lo moved last, +1: hi moved last
  while (iterations < maxIterations) {
    if (hi - lo <= relativeTolerance * Math.abs(hi)) return { root: 0.5 * (lo + hi), iterations, converged: true };
    let x = (lo * rHi - hi * rLo) / (rHi - rLo);
    if (!(x > lo && x < hi)) x = 0.5 * (lo + hi); // rounding guard
    const r = residual(x);
    iterations++;
    if (r === 0) return { root: x, iterations, converged: true };
    if (r < 0) {
      if (lastMoved === -1) rHi *= 0.5;
      lo = x;
      rLo = r;
      lastMoved = -1;
    } else {
      if (lastMoved === 1) rLo *= 0.5;
      hi = x;
      rHi = r;
      lastMoved = 1;
    }
  }
  return { root: 0.5 * (lo + hi), iterations, converged: false };
}
