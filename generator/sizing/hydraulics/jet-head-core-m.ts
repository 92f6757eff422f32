import { STANDARD_GRAVITY } from '../constants.ts';

/**
 * jetHeadM without its input checks and option object, for solvers' inner loops whose inputs were checked
 * once at their door (flow m3/s >= 0; orifice diameter m > 0; 0 < C_d <= 1).
 * The equation, its example and source: jetHeadM.
 */
export function jetHeadCoreM(flowM3s: number, orificeM: number, dischargeCoefficient: number): number {
  const jetVelocityMS = flowM3s / (dischargeCoefficient * Math.PI * orificeM * orificeM * 0.25);
  return (jetVelocityMS * jetVelocityMS) / (2 * STANDARD_GRAVITY);
}
