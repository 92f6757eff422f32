import { pivotFrictionTorqueNmm } from './pivot-friction-torque-nmm.ts';

export interface LeverFloatPushOptions {
  /** force wanted at the pad, N */
  padForceN: number;
  /** a_pad, a_float, mm from the pivot axis (arm level) */
  padArmMm: number;
  floatArmMm: number;
  /** arm weight (in the liquid where wet), N, and its centroid's arm, mm */
  armWeightN: number;
  armCentroidMm: number;
  /** pivot pin radius, mm, and the pin-in-eye friction coefficient */
  pinRadiusMm: number;
  frictionCoefficient: number;
  /**
   * 'closing' (water rising: friction resists the float, which must push harder),
   * 'opening' (water falling: friction holds the arm, the push may drop lower).
   */
  direction: 'closing' | 'opening';
}

/**
 * Float push that holds a pad force against the pivot's friction:
 *
 *   F_f a_f = F_pad a_p + W x_c + s M_f,   M_f = mu' |R| r,   R = F_pad + W - F_f
 *
 * with s = +1 closing, -1 opening, mu' = sin(atan mu) (friction circle) and R the
 * pin's vertical reaction on the arm (vertical equilibrium). For R >= 0 this is
 * linear: F_f (a_f + s mu' r) = F_pad (a_p + s mu' r) + W (x_c + s mu' r); the
 * other sign of R is solved the same way, and the consistent one returned.
 *
 * @returns { floatPushN, pivotReactionN (R, up on the arm), frictionTorqueNmm }
 *
 * Example: F_pad 0.8264 N at 20 mm, W 0.04903 N at 30 mm, float at 60 mm, r 2 mm,
 * mu 0.3 (mu' = 0.28735): closing (0.8264 x 20.5747 + 0.04903 x 30.5747) / 60.5747
 * = 0.30544 N; R = 0.8264 + 0.04903 - 0.30544 = 0.5700 N. Without friction, 0.3 N.
 * Source: moment and force balance of a rigid body with a journal-bearing friction
 * circle (Meriam and Kraige, Engineering Mechanics: Statics, from memory).
 */
export function leverFloatPushN(o: LeverFloatPushOptions): { floatPushN: number; pivotReactionN: number; frictionTorqueNmm: number } {
  if (!(o.floatArmMm > 0) || !(o.padArmMm > 0)) {
    throw new RangeError(`leverFloatPushN: arms must be greater than 0 mm (pad ${o.padArmMm}, float ${o.floatArmMm})`);
  }
  const s = o.direction === 'closing' ? 1 : -1;
  const m = o.pinRadiusMm * Math.sin(Math.atan(o.frictionCoefficient));
  for (const sign of [1, -1]) {
    // R = sign |R|: M_f = sign m R, so F_f (a_f + s sign m) = F_pad (a_p + s sign m) + W (x_c + s sign m)
    const k = s * sign * m;
    const push = (o.padForceN * (o.padArmMm + k) + o.armWeightN * (o.armCentroidMm + k)) / (o.floatArmMm + k);
    const reaction = o.padForceN + o.armWeightN - push;
    if (sign * reaction >= -1e-12) {
      return { floatPushN: push, pivotReactionN: reaction, frictionTorqueNmm: pivotFrictionTorqueNmm(reaction, o.pinRadiusMm, o.frictionCoefficient) };
    }
  }
  // unreachable for positive arms (one branch is always consistent); kept total
  const push = (o.padForceN * o.padArmMm + o.armWeightN * o.armCentroidMm) / o.floatArmMm;
  return { floatPushN: push, pivotReactionN: o.padForceN + o.armWeightN - push, frictionTorqueNmm: 0 };
}
