/**
 * Smallest height on a grid at which a rule holds, for rules that, once they
 * hold, keep holding as the height grows (a float's reserve and its seal depth
 * both ease as it grows taller). Bisection over [lo, hi] to a quarter step,
 * then up the grid, clear of floating-point fuzz, to the first height that holds.
 *
 * @param ok the rule at a height, mm
 * @param stepMm the grid, mm; @param loMm, hiMm the range searched, mm
 * @returns the height, mm, or null when the rule fails even at hiMm
 *
 * Example: ok = h => h >= 12.34, step 0.1, range [0.5, 250]: 12.4.
 * Source: bisection method (R. L. Burden and J. D. Faires, Numerical Analysis, sec. 2.1, from memory).
 */
export function shortestWorkingHeightMm(ok: (heightMm: number) => boolean, stepMm: number, loMm: number, hiMm: number): number | null {
  if (!ok(hiMm)) return null;
  let lo = loMm;
  let hi = hiMm;
  if (ok(lo)) return lo;
  while (hi - lo > stepMm / 4) {
    const mid = (lo + hi) / 2;
    if (ok(mid)) hi = mid;
    else lo = mid;
  }
  let k = Math.ceil(lo / stepMm - 1e-6);
  while (!ok(Number((k * stepMm).toFixed(6)))) k++;
  return Number((k * stepMm).toFixed(6));
}
