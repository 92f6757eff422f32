import { ORIFICE_DISCHARGE_COEFFICIENT, SHARP_ENTRANCE_LOSS, TUBE_ROUGHNESS_M } from '../constants.ts';
import { checkRange, POSITIVE, NON_NEGATIVE } from './check-range.ts';
import { MAX_RELATIVE_ROUGHNESS } from './colebrook-friction-factor.ts';
import { boreModel, type BoreModel } from './bore-model.ts';
import { darcyFrictionFactor, type FrictionBridge } from './darcy-friction-factor.ts';
import { flowRegime, type FlowRegime } from './flow-regime.ts';
import { reynoldsNumber } from './reynolds-number.ts';
import { valveFlowM3s } from './valve-flow-m3s.ts';

export interface SupplyFlowOptions {
  /** tank water surface above the nozzle tip, m (>= 0) */
  headM: number;
  /** supply tube inner diameter, m (> 0) */
  tubeInnerDiameterM: number;
  /** supply tube length, m (>= 0) */
  tubeLengthM: number;
  /** nozzle orifice diameter, m (> 0) */
  orificeM: number;
  /** liquid density, kg/m3 (> 0) */
  densityKgM3: number;
  /** liquid dynamic viscosity, Pa s (> 0) */
  viscosityPaS: number;
  /** loss coefficient where the tube leaves the tank (>= 0); default SHARP_ENTRANCE_LOSS (0.5) */
  entranceLossK?: number;
  /** orifice discharge coefficient (0 < C_d <= 1); default ORIFICE_DISCHARGE_COEFFICIENT (0.61) */
  dischargeCoefficient?: number;
  /** tube wall roughness, m (>= 0, at most a tenth of the tube bore); default TUBE_ROUGHNESS_M (1.5 um) */
  roughnessM?: number;
  /** length of the bore, m (>= 0): at least 3 bore diameters makes it a short tube (boreHeadM); default 0, a sharp orifice */
  boreLengthM?: number;
  /** friction between Re 2300 and 4000 (darcyFrictionFactor); default 'linear' */
  bridge?: FrictionBridge;
}

export interface SupplyFlowResult {
  /** volume flow with the valve wide open, m3/s */
  flowM3s: number;
  /** the same in litres per hour */
  flowLph: number;
  /** mean velocity in the supply tube, m/s */
  tubeVelocityMS: number;
  /** Reynolds number in the supply tube (0 at zero flow) */
  reynolds: number;
  regime: FlowRegime;
  /** how the bore was modelled */
  boreModel: BoreModel;
  /** Darcy friction factor in the tube; null at zero flow, where it is undefined */
  frictionFactor: number | null;
}

/**
 * Flow through a wide-open valve fed by one tube from a tank: the steady energy
 * balance from the tank surface to the free jet, solved for Q by bisection to 1e-10 (relative).
 *
 * Equation: H = (v_t^2 / 2g)(K_in + f l_t / d_t) + h_bore(Q), h_bore the sharp orifice's (Q / (C_d A_o))^2 / 2g
 * or, for a bore at least 3 diameters long, the short tube's (K_c + f l_o/d_o + 1) v_o^2 / 2g (boreHeadM),
 * v_t = 4 Q / (pi d_t^2), A_o = pi d_o^2 / 4, f = darcyFrictionFactor(Re, e/d_t).
 *
 * headM = 0 gives zero flow (reynolds 0, regime 'laminar', frictionFactor null).
 * Throws RangeError naming the option when an input is out of range.
 *
 * Example: water at 20 C, d_t = 4 mm, l_t = 5 m, H = 0.5 m, with no entrance loss and an
 * orifice too large to matter, gives v_t = 0.489 m/s, Re = 1948, Q = 22.1 L/h (Hagen-Poiseuille,
 * Q = pi d^4 rho g H / (128 mu l)). With a very short tube and K_in = 0 it tends to
 * Torricelli's Q = C_d A_o sqrt(2 g H).
 * Source: steady energy equation with Darcy-Weisbach losses (White, Fluid Mechanics, ch. 3 and 6);
 * K_in = 0.5 Crane TP-410 (from memory); C_d = 0.61 standard texts (from memory).
 */
export function supplyFlow(opts: SupplyFlowOptions): SupplyFlowResult {
  const headM = checkRange('headM', opts.headM, NON_NEGATIVE);
  const tubeInnerDiameterM = checkRange('tubeInnerDiameterM', opts.tubeInnerDiameterM, POSITIVE);
  const tubeLengthM = checkRange('tubeLengthM', opts.tubeLengthM, NON_NEGATIVE);
  const orificeM = checkRange('orificeM', opts.orificeM, POSITIVE);
  const densityKgM3 = checkRange('densityKgM3', opts.densityKgM3, POSITIVE);
  const viscosityPaS = checkRange('viscosityPaS', opts.viscosityPaS, POSITIVE);
  const entranceLossK = checkRange('entranceLossK', opts.entranceLossK ?? SHARP_ENTRANCE_LOSS, NON_NEGATIVE);
  const dischargeCoefficient = checkRange('dischargeCoefficient', opts.dischargeCoefficient ?? ORIFICE_DISCHARGE_COEFFICIENT, {
    min: 0,
    minExclusive: true,
    max: 1,
  });
  const roughnessM = checkRange('roughnessM', opts.roughnessM ?? TUBE_ROUGHNESS_M, {
    min: 0,
    max: MAX_RELATIVE_ROUGHNESS * tubeInnerDiameterM,
    note: 'a tenth of tubeInnerDiameterM',
  });

  const boreLengthM = checkRange('boreLengthM', opts.boreLengthM ?? 0, NON_NEGATIVE);
  const bridge = opts.bridge ?? 'linear';
  const flowM3s = valveFlowM3s(
    { headM, tubeInnerDiameterM, tubeLengthM, orificeM, densityKgM3, viscosityPaS, entranceLossK, dischargeCoefficient, roughnessM, boreLengthM, bridge },
    1e-10,
  );
  const reynolds = reynoldsNumber({ flowM3s, innerDiameterM: tubeInnerDiameterM, densityKgM3, viscosityPaS });
  return {
    flowM3s,
    flowLph: flowM3s * 3.6e6,
    tubeVelocityMS: (4 * flowM3s) / (Math.PI * tubeInnerDiameterM * tubeInnerDiameterM),
    reynolds,
    regime: flowRegime(reynolds),
    boreModel: boreModel(boreLengthM, orificeM),
    frictionFactor: flowM3s > 0 ? darcyFrictionFactor(reynolds, roughnessM / tubeInnerDiameterM, bridge) : null,
  };
}
