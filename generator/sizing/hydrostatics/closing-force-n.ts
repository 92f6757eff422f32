import { STANDARD_GRAVITY } from '../constants.ts';
import { pressurePa } from './pressure-pa.ts';

export interface ClosingForceOptions {
  /** supply head above the nozzle tip, m */
  headM: number;
  /** effective seal area the pressure acts on, m2: (pi/4) d_s^2, or A_eff from a bench fit */
  sealAreaM2: number;
  /** force to indent the pad with no pressure, N */
  preloadN: number;
  /** liquid density, kg/m3 */
  densityKgM3: number;
  /** m/s2, default standard gravity */
  gravityMS2?: number;
}

/**
 * Force the float must press the pad onto the nozzle with to stop the flow.
 *
 *   F_need(H) = rho g H A_seal + F_pre
 *
 * Example: 10 ft (3.048 m) of water at 998.2 kg/m3 on a 4 mm circle (12.566 mm2),
 * no preload: 0.375 N, i.e. 38.2 gf. Source: p A (hydrostatics); REFERENCE value
 * computed from NIST constants.
 */
export function closingForceN(opts: ClosingForceOptions): number {
  const g = opts.gravityMS2 ?? STANDARD_GRAVITY;
  return pressurePa(opts.headM, opts.densityKgM3, g) * opts.sealAreaM2 + opts.preloadN;
}
