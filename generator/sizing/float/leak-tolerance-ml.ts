import { STANDARD_GRAVITY } from '../constants.ts';

/**
 * Water a float can take in before it can no longer shut tight at full tank.
 * Water inside adds weight rho g V_in but no buoyancy (the envelope is the
 * same), so the lift at full submersion falls to F_avail - rho g V_in; it must
 * still reach F_seal(H_max):
 *
 *   V_in = (F_avail - F_seal(H_max)) / (rho g)
 *
 * @param availableN lift at full submersion, F_avail = (rho V_f - m_f) g, N
 * @param sealForceN force for a tight seal at the highest head, N
 * @param densityKgM3 liquid density, kg/m3
 * @returns mL (negative: the float cannot shut even dry)
 *
 * Example: 0.786 N of lift against 0.523 N at 998.2 kg/m3:
 * 0.263 / (998.2 x 9.80665) = 26.9e-6 m3, 26.9 mL. Source: Archimedes' principle.
 */
export function leakToleranceMl(availableN: number, sealForceN: number, densityKgM3: number): number {
  return ((availableN - sealForceN) / (densityKgM3 * STANDARD_GRAVITY)) * 1e6;
}
