import { STANDARD_GRAVITY } from '../constants.ts';
import { depthForVolumeMm } from './submerged-volume.ts';
import type { FloatSpec } from '../result.ts';

/**
 * Submerged depth at which the float pushes up on the nozzle with force F.
 * Archimedes: rho g V_sub = F + m g, so V_sub = (F/g + m) / rho.
 *
 * @param forceN upward push wanted, N (0 gives the depth at which it just floats)
 * @param floatMassKg float mass including the pad, kg
 * @param densityKgM3 liquid density, kg/m3
 * @returns depth above the float's bottom, mm (Infinity if it cannot push that hard)
 *
 * Example: a cylinder float of radius 27 mm, 18 g, pushing 0.5229 N in water at
 * 998.2 kg/m3 sinks 31.2 mm. Source: Archimedes' principle.
 */
export function depthForForceMm(f: FloatSpec, forceN: number, floatMassKg: number, densityKgM3: number): number {
  const volumeM3 = (forceN / STANDARD_GRAVITY + floatMassKg) / densityKgM3;
  return depthForVolumeMm(f, volumeM3 * 1e9);
}

/**
 * Lift available at full submersion, F_avail = (rho V_f - m_f) g, N.
 * Example: 120 mL float weighing 20 g in water of 1000 kg/m3 lifts at most 100 g (0.981 N).
 * Source: Archimedes' principle.
 */
export function availableLiftN(outerVolumeMm3: number, floatMassKg: number, densityKgM3: number): number {
  return (densityKgM3 * outerVolumeMm3 * 1e-9 - floatMassKg) * STANDARD_GRAVITY;
}
