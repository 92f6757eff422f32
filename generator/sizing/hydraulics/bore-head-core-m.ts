import { STANDARD_GRAVITY } from '../constants.ts';
import { boreModel } from './bore-model.ts';
import { contractionLossKCore } from './contraction-loss-k-core.ts';
import { darcyFrictionFactorCore } from './darcy-friction-factor-core.ts';
import type { FrictionBridge } from './darcy-friction-factor.ts';
import { jetHeadCoreM } from './jet-head-core-m.ts';
import { reynoldsNumberCore } from './reynolds-number-core.ts';

/**
 * boreHeadM without its input checks and option object, for solvers' inner loops whose inputs were checked
 * once at their door (boreHeadM's ranges; the roughness given, m). The equation, its example and source: boreHeadM.
 */
export function boreHeadCoreM(
  flowM3s: number,
  boreM: number,
  boreLengthM: number,
  tubeInnerDiameterM: number,
  densityKgM3: number,
  viscosityPaS: number,
  dischargeCoefficient: number,
  roughnessM: number,
  bridge?: FrictionBridge,
): number {
  if (boreModel(boreLengthM, boreM) === 'orifice') return jetHeadCoreM(flowM3s, boreM, dischargeCoefficient);
  if (flowM3s === 0) return 0;
  const beta = Math.min(1, boreM / tubeInnerDiameterM);
  const reynolds = reynoldsNumberCore(flowM3s, boreM, densityKgM3, viscosityPaS);
  const f = darcyFrictionFactorCore(reynolds, roughnessM / boreM, bridge);
  const k = contractionLossKCore(beta) + (f * boreLengthM) / boreM + 1.0;
  const v = (4 * flowM3s) / (Math.PI * boreM * boreM);
  return (k * v * v) / (2 * STANDARD_GRAVITY);
}
