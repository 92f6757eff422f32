import { checkRange, POSITIVE, NON_NEGATIVE } from './check-range.ts';

export interface FillTimeOptions {
  /** reservoir surface area, m2 (> 0) */
  areaM2: number;
  /** level rise wanted, m (>= 0) */
  riseM: number;
  /** inflow, m3/s (>= 0) */
  flowM3s: number;
}

/**
 * Time to raise a reservoir's level by a given depth at a steady inflow.
 *
 * Equation: t = A * rise / Q (seconds)
 *
 * Returns null when the flow is zero (the level never rises), so no Infinity reaches a
 * report; a zero rise takes 0 s.
 *
 * Example: A = 0.12 m2, rise = 20 mm, Q = 24 L/h (6.6667e-6 m3/s): 2.4 L takes 360 s.
 * Source: volume balance (continuity), any fluid mechanics text.
 */
export function fillTimeS(opts: FillTimeOptions): number | null {
  const areaM2 = checkRange('areaM2', opts.areaM2, POSITIVE);
  const riseM = checkRange('riseM', opts.riseM, NON_NEGATIVE);
  const flowM3s = checkRange('flowM3s', opts.flowM3s, NON_NEGATIVE);
  if (riseM === 0) return 0;
  if (flowM3s === 0) return null;
  return (areaM2 * riseM) / flowM3s;
}
