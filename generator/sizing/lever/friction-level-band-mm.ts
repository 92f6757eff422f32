import { STANDARD_GRAVITY } from '../constants.ts';

/**
 * Level band that pivot friction opens between the water level at which a rising
 * reservoir closes the valve and the level at which a falling one reopens it:
 *
 *   dL = (F_close - F_open) / (rho g A_wl)
 *
 * F_close and F_open are the float pushes for the same pad force with friction
 * against and with the float (leverFloatPushN), A_wl the float's waterplane area
 * (its straight side, where it seals). The float's push changes by rho g A_wl
 * per unit of depth.
 *
 * @param closingPushN F_close, N
 * @param openingPushN F_open, N
 * @param waterplaneAreaMm2 A_wl, mm2
 * @param densityKgM3 rho, kg/m3
 * @returns dL, mm
 *
 * Example: 0.01 N of difference on a 50 mm float (1963.5 mm2) in water at 998.2 kg/m3:
 * 0.01 / (998.2 x 9.80665 x 1963.5e-6) = 0.5203 mm. Source: Archimedes' principle.
 */
export function frictionLevelBandMm(closingPushN: number, openingPushN: number, waterplaneAreaMm2: number, densityKgM3: number): number {
  if (!(waterplaneAreaMm2 > 0)) throw new RangeError(`frictionLevelBandMm.waterplaneAreaMm2 = ${waterplaneAreaMm2}; allowed: greater than 0 mm2`);
  return ((closingPushN - openingPushN) / (densityKgM3 * STANDARD_GRAVITY * waterplaneAreaMm2 * 1e-6)) * 1e3;
}
