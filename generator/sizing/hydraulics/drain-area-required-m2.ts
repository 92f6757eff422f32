import { DRAIN_HEAD_LOSS_M, ORIFICE_DISCHARGE_COEFFICIENT, STANDARD_GRAVITY } from '../constants.ts';
import { checkRange, POSITIVE, NON_NEGATIVE } from './check-range.ts';

export interface DrainAreaOptions {
  /** largest flow the drain openings must pass, m3/s (>= 0) */
  flowM3s: number;
  /** level difference allowed across the openings, m (> 0); default DRAIN_HEAD_LOSS_M (2 mm) */
  headLossM?: number;
  /** discharge coefficient of the openings (0 < C_d <= 1); default ORIFICE_DISCHARGE_COEFFICIENT (0.61) */
  dischargeCoefficient?: number;
}

/**
 * Total drain-opening area that passes a flow with at most the given level difference.
 *
 * Equation: A_d = Q / (C_d sqrt(2 g dh))  (orifice equation solved for the area)
 *
 * Example: Q = 100 L/h (2.7778e-5 m3/s), dh = 2 mm, C_d = 0.61 gives A_d = 2.2992e-4 m2 (229.9 mm2).
 * Source: orifice equation (any fluid mechanics text, e.g. White, Fluid Mechanics, ch. 6);
 * C_d = 0.61 standard texts (from memory).
 */
export function drainAreaRequiredM2(opts: DrainAreaOptions): number {
  const flowM3s = checkRange('flowM3s', opts.flowM3s, NON_NEGATIVE);
  const headLossM = checkRange('headLossM', opts.headLossM ?? DRAIN_HEAD_LOSS_M, POSITIVE);
  const cd = checkRange('dischargeCoefficient', opts.dischargeCoefficient ?? ORIFICE_DISCHARGE_COEFFICIENT, {
    min: 0,
    minExclusive: true,
    max: 1,
  });
  return flowM3s / (cd * Math.sqrt(2 * STANDARD_GRAVITY * headLossM));
}
