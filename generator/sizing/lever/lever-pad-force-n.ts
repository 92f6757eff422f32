/**
 * Force the lever presses its pad onto the nozzle lip with: the moment balance
 * about the pivot (sum of moments about a fixed point is zero for a body at rest).
 *
 *   F_pad a_pad = F_float a_float - W_arm x_arm
 *
 * The float's net push F_float (buoyancy less its own weight, up) acts at a_float;
 * the arm's weight W_arm (down; in the liquid where it is wet) at its centroid
 * x_arm; the lip pushes the pad down at a_pad. Friction at the pivot is left out
 * here (leverFloatPushN adds it). All arms are horizontal distances from the
 * pivot axis with the arm level, as it is at the seal.
 *
 * @param floatPushN float's net upward push F_float, N
 * @param floatArmMm a_float, mm
 * @param armWeightN W_arm, N (armWeightInLiquidN)
 * @param armCentroidMm x_arm, mm
 * @param padArmMm a_pad, mm (> 0)
 * @returns F_pad, N (negative: the arm cannot lift its own weight)
 *
 * Example: 0.3 N at 60 mm, a 5 g arm (0.04903 N) centred at 30 mm, pad at 20 mm:
 * (0.3 x 60 - 0.04903 x 30) / 20 = 0.8264 N, a mechanical advantage of 3.
 * Source: statics, equilibrium of a rigid body (J. L. Meriam and L. G. Kraige,
 * Engineering Mechanics: Statics, ch. 3, from memory).
 */
export function leverPadForceN(floatPushN: number, floatArmMm: number, armWeightN: number, armCentroidMm: number, padArmMm: number): number {
  if (!(padArmMm > 0)) throw new RangeError(`leverPadForceN.padArmMm = ${padArmMm}; allowed: greater than 0 mm`);
  return (floatPushN * floatArmMm - armWeightN * armCentroidMm) / padArmMm;
}
