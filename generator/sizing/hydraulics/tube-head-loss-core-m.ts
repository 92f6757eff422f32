import { STANDARD_GRAVITY } from '../constants.ts';
import { darcyFrictionFactorCore } from './darcy-friction-factor-core.ts';
import type { FrictionBridge } from './darcy-friction-factor.ts';
import { reynoldsNumberCore } from './reynolds-number-core.ts';

/**
 * tubeHeadLossM without its input checks and option object, for solvers' inner loops whose inputs were
 * checked once at their door (flow m3/s >= 0; diameter m > 0; length m >= 0; density kg/m3 > 0;
 * viscosity Pa s > 0; roughness m, 0 to a tenth of the diameter; minor-loss K >= 0).
 * The equation, its example and source: tubeHeadLossM.
 */
export function tubeHeadLossCoreM(
  flowM3s: number,
  innerDiameterM: number,
  lengthM: number,
  densityKgM3: number,
  viscosityPaS: number,
  roughnessM: number,
  minorLossK: number,
  bridge?: FrictionBridge,
): number {
  if (flowM3s === 0) return 0;
  const d = innerDiameterM;
  const reynolds = reynoldsNumberCore(flowM3s, d, densityKgM3, viscosityPaS);
  const velocityMS = (4 * flowM3s) / (Math.PI * d * d);
  const f = darcyFrictionFactorCore(reynolds, roughnessM / d, bridge);
  return ((minorLossK + (f * lengthM) / d) * velocityMS * velocityMS) / (2 * STANDARD_GRAVITY);
}
