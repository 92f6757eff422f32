/**
 * How far the arm turns nose down before the back of its eye meets the frame's
 * back wall (the rest stop). The eye's lower back edge sits x behind and d below
 * the pivot axis; turned by theta it is x cos(theta) + d sin(theta) behind the
 * axis, = R cos(theta - phi) with R = hypot(x, d), phi = atan2(d, x). It meets a
 * wall X behind the axis first at
 *
 *   theta = phi - acos(X / R)        (never, if R < X)
 *
 * @param heelMm x, mm; @param depthBelowPivotMm d, mm; @param wallMm X, mm (X > x)
 * @returns theta, rad (Infinity when the edge never reaches the wall)
 *
 * Example: x 5.3, d 6, X 7: R = 8.0056, phi = 0.84727, acos(0.87439) = 0.50663,
 * theta = 0.34064 rad (19.52 deg). Source: rotation of a point about an axis
 * (elementary geometry).
 */
export function armStopTurnRad(heelMm: number, depthBelowPivotMm: number, wallMm: number): number {
  if (!(wallMm > heelMm)) throw new RangeError(`armStopTurnRad.wallMm = ${wallMm}; allowed: more than the heel (${heelMm} mm)`);
  const R = Math.hypot(heelMm, depthBelowPivotMm);
  if (R < wallMm) return Infinity;
  return Math.atan2(depthBelowPivotMm, heelMm) - Math.acos(wallMm / R);
}
