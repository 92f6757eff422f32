import { TUBE_ROUGHNESS_M } from '../constants.ts';
import { boreHeadCoreM } from './bore-head-core-m.ts';
import { boreModel } from './bore-model.ts';
import { checkRange, NON_NEGATIVE, POSITIVE } from './check-range.ts';
import { RELATIVE_ROUGHNESS_RANGE } from './colebrook-friction-factor.ts';
import { BETA_RANGE } from './contraction-loss-k.ts';
import type { FrictionBridge } from './darcy-friction-factor.ts';
import { DISCHARGE_COEFFICIENT_RANGE } from './jet-head-m.ts';

export interface BoreHeadOptions {
  /** volume flow, m3/s (>= 0) */
  flowM3s: number;
  /** bore diameter d_o, m (> 0) */
  boreM: number;
  /** bore length l_o, m (>= 0): the nozzle insert's whole length */
  boreLengthM: number;
  /** supply tube inner diameter d_t feeding the bore, m (> 0) */
  tubeInnerDiameterM: number;
  densityKgM3: number;
  viscosityPaS: number;
  /** C_d of the sharp orifice when the bore is short */
  dischargeCoefficient: number;
  /** wall roughness of the bore, m; default TUBE_ROUGHNESS_M */
  roughnessM?: number;
  /** friction between Re 2300 and 4000; default 'linear' */
  bridge?: FrictionBridge;
}

/**
 * Head spent from the supply tube through the bore to the free jet.
 *
 * Short tube (l_o >= 3 d_o): h = (K_c + f l_o / d_o + 1.0) v_o^2 / (2 g), with the sudden
 * contraction K_c = 0.5 (1 - beta^2), beta = d_o / d_t, friction f over the bore's length and the
 * exit loss 1.0 (the jet's velocity head), v_o = 4 Q / (pi d_o^2).
 * Shorter bore: the sharp orifice, h = (Q / (C_d A_o))^2 / (2 g) (jetHeadM).
 *
 * Returns metres of liquid column.
 *
 * Example: d_o = 2 mm, d_t = 4 mm (K_c = 0.375), l_o = 20 mm, Re 7000 in the bore (f about 0.034):
 * K = 1.0 + 0.375 + 0.034 x 10 = 1.715, against 1 / 0.61^2 = 2.69 for the sharp orifice, so the
 * short tube passes sqrt(2.69 / 1.715) = 1.25 times the flow at the same head across it.
 * Source: Crane Technical Paper 410 (contraction, exit); Darcy-Weisbach friction (White, Fluid Mechanics, ch. 6).
 */
export function boreHeadM(o: BoreHeadOptions): number {
  const flowM3s = checkRange('flowM3s', o.flowM3s, NON_NEGATIVE);
  const boreM = checkRange('boreM', o.boreM, POSITIVE);
  const roughnessM = o.roughnessM ?? TUBE_ROUGHNESS_M;
  if (boreModel(o.boreLengthM, boreM) === 'orifice') {
    checkRange('dischargeCoefficient', o.dischargeCoefficient, DISCHARGE_COEFFICIENT_RANGE);
  } else if (flowM3s > 0) {
    checkRange('densityKgM3', o.densityKgM3, POSITIVE);
    checkRange('viscosityPaS', o.viscosityPaS, POSITIVE);
    checkRange('relativeRoughness', roughnessM / boreM, RELATIVE_ROUGHNESS_RANGE);
    checkRange('beta', Math.min(1, boreM / o.tubeInnerDiameterM), BETA_RANGE);
  }
  return boreHeadCoreM(flowM3s, boreM, o.boreLengthM, o.tubeInnerDiameterM, o.densityKgM3, o.viscosityPaS, o.dischargeCoefficient, roughnessM, o.bridge);
}
