import { STANDARD_GRAVITY } from '../constants.ts';
import { bisectIncreasing } from './bisect-increasing.ts';
import { illinoisIncreasing } from './illinois-increasing.ts';
import { boreHeadCoreM } from './bore-head-core-m.ts';
import { boreModel } from './bore-model.ts';
import { checkValveLine } from './check-valve-line.ts';
import type { FrictionBridge } from './darcy-friction-factor.ts';
import { tubeHeadLossCoreM } from './tube-head-loss-core-m.ts';

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
  /** length of the bore, m: at least 3 bore diameters makes it a short tube (boreHeadM); 0 or absent, a sharp orifice */
  boreLengthM?: number;
  /** friction between Re 2300 and 4000 in tube and bore; default 'linear' */
  bridge?: FrictionBridge;
}

/**
 * Volume flow (m3/s) of one open line: the Q that solves
 * H = (K_in + f l_t/d_t) v_t^2/(2g) + h_bore(Q)
 * with h_bore the sharp orifice's (Q/(C_d A_o))^2/(2g) or the short tube's (K_c + f l_o/d_o + 1) v_o^2/(2g)
 * (boreHeadM), by bisection (or the Illinois method) on [0, C A_o sqrt(2 g H)], C = C_d for the orifice and 1
 * for the short tube (whose loss coefficients sum to at least the exit's 1.0): at the upper end the bore alone uses all of H.
 * The right side increases with Q in every regime, so the root is unique.
 * With `gapHeadM`, the head taken by a restriction past the bore (the gap between lip and pad, gapFlow), m,
 * increasing in Q, joins the right side (a separate argument, so the line is shared, not copied, per gap).
 * `upperHintM3s` (default none): a flow known to be above the answer (the previous point of a march whose
 * flow falls), which narrows the bracket; the answer is the same to the tolerance, in fewer steps.
 * Zero for H <= 0. Internal: callers check the inputs (supplyFlow, solveSupplyNetwork); the line is checked again here once.
 * Source: steady energy equation with Darcy-Weisbach losses (White, Fluid Mechanics, ch. 3 and 6).
 */
export function valveFlowM3s(
  line: ValveLine,
  relativeTolerance: number,
  method: 'bisection' | 'illinois' = 'bisection',
  gapHeadM?: (flowM3s: number) => number,
  upperHintM3s = Infinity,
): number {
  if (!(line.headM > 0)) return 0;
  const orificeAreaM2 = 0.25 * Math.PI * line.orificeM * line.orificeM;
  const boreLengthM = line.boreLengthM ?? 0;
  const c = boreModel(boreLengthM, line.orificeM) === 'short-tube' ? 1 : line.dischargeCoefficient;
  const upperM3s = Math.min(upperHintM3s, c * orificeAreaM2 * Math.sqrt(2 * STANDARD_GRAVITY * line.headM));
  // the line is checked once here; the residual, called a dozen times per solve, uses the unchecked cores
  checkValveLine(line, boreLengthM);
  const solve = method === 'illinois' ? illinoisIncreasing : bisectIncreasing;
  // an arrow written in the call, not a named const: tsx names every named closure it makes (about 0.5 us each)
  return solve((flowM3s) => headBalanceM(line, boreLengthM, gapHeadM, flowM3s), 0, upperM3s, relativeTolerance).root;
}

/** The energy balance's residual at a flow, m: tube + bore (+ gap) losses less the head; increasing in Q, zero at the answer. */
function headBalanceM(line: ValveLine, boreLengthM: number, gapHeadM: ((flowM3s: number) => number) | undefined, flowM3s: number): number {
  return (
    tubeHeadLossCoreM(
      flowM3s,
      line.tubeInnerDiameterM,
      line.tubeLengthM,
      line.densityKgM3,
      line.viscosityPaS,
      line.roughnessM,
      line.entranceLossK,
      line.bridge,
    ) +
    boreHeadCoreM(
      flowM3s,
      line.orificeM,
      boreLengthM,
      line.tubeInnerDiameterM,
      line.densityKgM3,
      line.viscosityPaS,
      line.dischargeCoefficient,
      line.roughnessM,
      line.bridge,
    ) +
    (gapHeadM ? gapHeadM(flowM3s) : 0) -
    line.headM
  );
}
