export interface LandStrainOptions {
  /** the float's push on the pad, N */
  forceN: number;
  /** pressure in the bore at that moment, Pa (0 with the tank empty) */
  pressurePa: number;
  /** bore area A_o = (pi/4) d_o^2, m2 */
  boreAreaM2: number;
  /** land (contact ring) area A_land = (pi/4)(d_s^2 - d_o^2), m2 */
  landAreaM2: number;
  /** pad stiffness E: compressive modulus (secant to 25 % for sponge), Pa */
  stiffnessPa: number;
}

/**
 * Compressive strain of the pad under the nozzle's land. Contact model (a
 * stated choice, not a handbook formula): the bore pressure carries its share
 * of the push directly, p A_o; the rest bears on the land evenly, and the pad
 * under it compresses as a uniaxial column of its own stiffness:
 *
 *   sigma = (F - p A_o) / A_land,  strain = sigma / E,  indentation = strain t_pad
 *
 * It neglects the pad's spreading under a narrow ring (which stiffens a solid
 * pad, so indentations come out on the deep side for rubber) and any confinement.
 *
 * @returns strain (dimensionless; 0 when the pressure carries the whole push)
 *
 * Example: 0.60 N on a 2/5 mm lip (A_o 3.14 mm2, A_land 16.49 mm2) at 21.5 kPa,
 * pad of 192 kPa: (0.60 - 0.0676) / 16.49e-6 = 32.3 kPa, strain 0.168,
 * 0.50 mm on a 3 mm pad. Source: Hooke's law (uniaxial); the load split is ours.
 */
export function landStrain(o: LandStrainOptions): number {
  const sigma = (o.forceN - o.pressurePa * o.boreAreaM2) / o.landAreaM2;
  return Math.max(0, sigma) / o.stiffnessPa;
}
