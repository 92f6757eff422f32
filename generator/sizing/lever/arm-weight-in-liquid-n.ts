import { STANDARD_GRAVITY } from '../constants.ts';

/**
 * Weight of a printed part less the buoyancy of its wet share:
 *
 *   W = V (rho_m - phi rho) g
 *
 * @param volumeMm3 printed volume V, mm3
 * @param materialDensityKgM3 rho_m, kg/m3
 * @param liquidDensityKgM3 rho, kg/m3
 * @param wetFraction phi, the share of the volume under the water line, 0 to 1
 * @returns W, N (negative when the wet part floats, e.g. PP)
 *
 * Example: 4 cm3 of PETG (1270 kg/m3) in water (998.2 kg/m3): dry 0.04982 N,
 * fully wet 4e-6 x 271.8 x 9.80665 = 0.01066 N. Source: Archimedes' principle.
 */
export function armWeightInLiquidN(volumeMm3: number, materialDensityKgM3: number, liquidDensityKgM3: number, wetFraction: number): number {
  if (!(wetFraction >= 0 && wetFraction <= 1)) {
    throw new RangeError(`armWeightInLiquidN.wetFraction = ${wetFraction}; allowed: 0 to 1`);
  }
  return volumeMm3 * 1e-9 * (materialDensityKgM3 - wetFraction * liquidDensityKgM3) * STANDARD_GRAVITY;
}
