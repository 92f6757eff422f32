import { TUBE_ROUGHNESS_M } from '../constants.ts';
import { checkRange, POSITIVE, NON_NEGATIVE } from './check-range.ts';
import { MAX_RELATIVE_ROUGHNESS } from './colebrook-friction-factor.ts';
import type { FrictionBridge } from './darcy-friction-factor.ts';
import { tubeHeadLossCoreM } from './tube-head-loss-core-m.ts';

export interface TubeHeadLossOptions {
  /** volume flow, m3/s (>= 0) */
  flowM3s: number;
  /** tube inner diameter, m (> 0) */
  innerDiameterM: number;
  /** tube length, m (>= 0) */
  lengthM: number;
  /** liquid density, kg/m3 (> 0) */
  densityKgM3: number;
  /** liquid dynamic viscosity, Pa s (> 0) */
  viscosityPaS: number;
  /** absolute wall roughness, m (>= 0, at most a tenth of the diameter); default TUBE_ROUGHNESS_M (1.5 um) */
  roughnessM?: number;
  /** sum of minor-loss coefficients on the tube velocity head (entrance, bends), dimensionless (>= 0); default 0 */
  minorLossK?: number;
  /** friction between Re 2300 and 4000 (darcyFrictionFactor); default 'linear' */
  bridge?: FrictionBridge;
}

/**
 * Head lost in a round tube: Darcy-Weisbach friction plus minor losses.
 *
 * Equation: h = (K + f l / d) v^2 / (2 g), v = 4 Q / (pi d^2), f = darcyFrictionFactor(Re, e/d)
 *
 * Returns metres of liquid column; 0 at zero flow.
 *
 * Example: water at 20 C, d = 4 mm, l = 5 m, Q = 6.1409e-6 m3/s (22.107 L/h, Re 1948, laminar),
 * K = 0 gives h = 0.500 m, the same as Hagen-Poiseuille Q = pi d^4 rho g h / (128 mu l).
 * Source: Darcy-Weisbach equation and Hagen-Poiseuille law (White, Fluid Mechanics, ch. 6).
 */
export function tubeHeadLossM(opts: TubeHeadLossOptions): number {
  const flowM3s = checkRange('flowM3s', opts.flowM3s, NON_NEGATIVE);
  const d = checkRange('innerDiameterM', opts.innerDiameterM, POSITIVE);
  const lengthM = checkRange('lengthM', opts.lengthM, NON_NEGATIVE);
  const roughnessRaw = opts.roughnessM ?? TUBE_ROUGHNESS_M;
  // the range depends on d: built (and checked in full) only when the quick test fails
  const roughnessM =
    typeof roughnessRaw === 'number' && roughnessRaw >= 0 && roughnessRaw <= MAX_RELATIVE_ROUGHNESS * d
      ? roughnessRaw
      : checkRange('roughnessM', roughnessRaw, { min: 0, max: MAX_RELATIVE_ROUGHNESS * d, note: 'a tenth of innerDiameterM' });
  const minorLossK = checkRange('minorLossK', opts.minorLossK ?? 0, NON_NEGATIVE);
  const densityKgM3 = checkRange('densityKgM3', opts.densityKgM3, POSITIVE);
  const viscosityPaS = checkRange('viscosityPaS', opts.viscosityPaS, POSITIVE);
  return tubeHeadLossCoreM(flowM3s, d, lengthM, densityKgM3, viscosityPaS, roughnessM, minorLossK, opts.bridge);
}
