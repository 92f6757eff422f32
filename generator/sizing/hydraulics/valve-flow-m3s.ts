import { STANDARD_GRAVITY } from '../constants.ts';
import { bisectIncreasing } from './bisect-increasing.ts';
import { illinoisIncreasing } from './illinois-increasing.ts';
import { jetHeadM } from './jet-head-m.ts';
import { tubeHeadLossM } from './tube-head-loss-m.ts';

/** Everything the steady energy balance of one tube-and-orifice line needs; SI, already checked. */
export interface ValveLine {
  /** head available from the line's start to the orifice, m */
  headM: number;
  tubeInnerDiameterM: number;
  tubeLengthM: number;
  orificeM: number;
  densityKgM3: number;
  viscosityPaS: number;
  /** minor loss at the tube's start (K_in at a tank, 0 at a tee) */
  entranceLossK: number;
  dischargeCoefficient: number;
  roughnessM: number;
}

/**
 * Volume flow (m3/s) of one open line: the Q that solves
 * H = (K_in + f l_t/d_t) v_t^2/(2g) + (Q/(C_d A_o))^2/(2g)
 * by bisection (or the Illinois method) on [0, C_d A_o sqrt(2 g H)] (at the upper end the jet alone uses all of H).
 * The right side increases with Q in every regime, so the root is unique.
 * Zero for H <= 0. Internal: callers check the inputs (supplyFlow, solveSupplyNetwork).
 * Source: steady energy equation with Darcy-Weisbach losses (White, Fluid Mechanics, ch. 3 and 6).
 */
export function valveFlowM3s(line: ValveLine, relativeTolerance: number, method: 'bisection' | 'illinois' = 'bisection'): number {
  if (!(line.headM > 0)) return 0;
  const orificeAreaM2 = 0.25 * Math.PI * line.orificeM * line.orificeM;
  const upperM3s = line.dischargeCoefficient * orificeAreaM2 * Math.sqrt(2 * STANDARD_GRAVITY * line.headM);
  const residual = (flowM3s: number): number =>
    tubeHeadLossM({
      flowM3s,
      innerDiameterM: line.tubeInnerDiameterM,
      lengthM: line.tubeLengthM,
      densityKgM3: line.densityKgM3,
      viscosityPaS: line.viscosityPaS,
      roughnessM: line.roughnessM,
      minorLossK: line.entranceLossK,
    }) +
    jetHeadM({ flowM3s, orificeM: line.orificeM, dischargeCoefficient: line.dischargeCoefficient }) -
    line.headM;
  const solve = method === 'illinois' ? illinoisIncreasing : bisectIncreasing;
  return solve(residual, 0, upperM3s, relativeTolerance).root;
}
