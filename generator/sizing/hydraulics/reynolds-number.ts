import { checkRange, POSITIVE, NON_NEGATIVE } from './check-range.ts';
import { reynoldsNumberCore } from './reynolds-number-core.ts';

export interface ReynoldsOptions {
  /** volume flow through the tube, m3/s (>= 0) */
  flowM3s: number;
  /** tube inner diameter, m (> 0) */
  innerDiameterM: number;
  /** liquid density, kg/m3 (> 0) */
  densityKgM3: number;
  /** liquid dynamic viscosity, Pa s (> 0) */
  viscosityPaS: number;
}

/**
 * Reynolds number of flow in a round tube, from its volume flow.
 *
 * Equation: Re = rho v d / mu, v = Q / (pi d^2 / 4), so Re = 4 rho Q / (pi mu d)
 *
 * Example: water at 20 C (998.2 kg/m3, 1.0016e-3 Pa s), Q = 22.107 L/h (6.1409e-6 m3/s),
 * d = 4 mm gives v = 0.48867 m/s and Re = 1948.
 * Source: definition of the Reynolds number (any fluid mechanics text, e.g. White, Fluid Mechanics, ch. 1).
 */
export function reynoldsNumber(opts: ReynoldsOptions): number {
  const flowM3s = checkRange('flowM3s', opts.flowM3s, NON_NEGATIVE);
  const d = checkRange('innerDiameterM', opts.innerDiameterM, POSITIVE);
  const rho = checkRange('densityKgM3', opts.densityKgM3, POSITIVE);
  const mu = checkRange('viscosityPaS', opts.viscosityPaS, POSITIVE);
  return reynoldsNumberCore(flowM3s, d, rho, mu);
}
