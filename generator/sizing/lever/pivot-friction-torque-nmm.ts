/**
 * Friction torque of a loose pin turning in its eye (a dry journal bearing):
 *
 *   M_f = R r sin(phi),  tan(phi) = mu      (about mu R r for small mu)
 *
 * The eye touches the pin along one line; the resultant R there leans by the
 * friction angle phi, so it passes the axis at the "friction circle" of radius
 * r sin(phi).
 *
 * @param reactionN magnitude of the force between pin and eye, R, N
 * @param pinRadiusMm r, mm
 * @param frictionCoefficient mu (PIVOT_FRICTION_COEFFICIENT for printed plastic, wet)
 * @returns M_f, N mm
 *
 * Example: R = 0.5 N on a 2 mm pin with mu = 0.3: 0.5 x 2 x sin(atan 0.3) = 0.2873 N mm
 * (0.3 N mm with the small-mu form). Source: J. L. Meriam and L. G. Kraige,
 * Engineering Mechanics: Statics, "Journal bearings" (friction circle), from memory.
 */
export function pivotFrictionTorqueNmm(reactionN: number, pinRadiusMm: number, frictionCoefficient: number): number {
  return Math.abs(reactionN) * pinRadiusMm * Math.sin(Math.atan(frictionCoefficient));
}
