import { ORIFICE_DISCHARGE_COEFFICIENT } from '../constants.ts';
import { checkRange, POSITIVE, NON_NEGATIVE, type AllowedRange } from './check-range.ts';
import { jetHeadCoreM } from './jet-head-core-m.ts';

/** Allowed discharge coefficients: 0 < C_d <= 1. */
export const DISCHARGE_COEFFICIENT_RANGE: AllowedRange = Object.freeze({ min: 0, minExclusive: true, max: 1 });

export interface JetHeadOptions {
  /** volume flow through the orifice, m3/s (>= 0) */
  flowM3s: number;
  /** orifice diameter, m (> 0) */
  orificeM: number;
  /** discharge coefficient C_d, dimensionless (0 < C_d <= 1); default ORIFICE_DISCHARGE_COEFFICIENT (0.61) */
  dischargeCoefficient?: number;
}

/**
 * Head spent making the free jet at an orifice (its velocity head).
 *
 * Equation: h = (Q / (C_d A_o))^2 / (2 g), A_o = pi d_o^2 / 4
 * (the orifice equation Q = C_d A_o sqrt(2 g h) solved for h)
 *
 * Returns metres of liquid column.
 *
 * Example: d_o = 3 mm, C_d = 0.61, Q = 2.83236e-5 m3/s (101.97 L/h) gives h = 2.200 m.
 * Source: orifice equation (Torricelli with a discharge coefficient), any fluid mechanics text,
 * e.g. White, Fluid Mechanics, ch. 6; C_d = 0.61 for a sharp edge (standard texts, from memory).
 */
export function jetHeadM(opts: JetHeadOptions): number {
  const flowM3s = checkRange('flowM3s', opts.flowM3s, NON_NEGATIVE);
  const orificeM = checkRange('orificeM', opts.orificeM, POSITIVE);
  const cd = checkRange('dischargeCoefficient', opts.dischargeCoefficient ?? ORIFICE_DISCHARGE_COEFFICIENT, DISCHARGE_COEFFICIENT_RANGE);
  return jetHeadCoreM(flowM3s, orificeM, cd);
}
