import { STANDARD_GRAVITY } from '../constants.ts';

/**
 * Hydrostatic gauge pressure under a column of liquid.
 *
 *   p = rho g H
 *
 * @param headM liquid column height, m
 * @param densityKgM3 liquid density, kg/m3
 * @param gravityMS2 gravitational acceleration, m/s2 (default standard gravity)
 * @returns pressure, Pa
 *
 * Example: 3.048 m (10 ft) of water at 998.2 kg/m3 gives 29.84 kPa (4.33 psi).
 * Source: hydrostatic law, any fluid mechanics text; g from NIST SP 330.
 */
export function pressurePa(headM: number, densityKgM3: number, gravityMS2 = STANDARD_GRAVITY): number {
  return densityKgM3 * gravityMS2 * headM;
}

/**
 * Inverse: the head of liquid that a gauge pressure stands for, H = p / (rho g), m.
 * Example: 1 psi (6894.757 Pa) of water at 998.2 kg/m3 is 0.7043 m (2.31 ft, common practice).
 */
export function headForPressureM(pressurePaValue: number, densityKgM3: number, gravityMS2 = STANDARD_GRAVITY): number {
  return pressurePaValue / (densityKgM3 * gravityMS2);
}
