/**
 * Height of the float's lowest point once the arm has turned down by theta
 * about the pivot (x along the arm, z up, pivot at (0, z_p)): each bottom corner
 * (x, z) goes to z_p - x sin(theta) + (z - z_p) cos(theta); the far corner
 * (a_float + R) drops most.
 *
 * @param floatArmMm a_float, mm; @param radiusMm float radius R, mm
 * @param bottomZMm float bottom with the arm level, mm; @param pivotZMm z_p, mm
 * @param thetaRad turn of the arm, nose down, rad
 *
 * Example: float at 60 mm, R 30, bottom 10 mm, pivot 60 mm, theta 0.1 rad:
 * far corner 60 - 90 sin 0.1 - 50 cos 0.1 = 1.265 mm, 8.7 mm lower than with the
 * arm level. Source: rotation of a point about an axis (elementary geometry).
 */
export function floatLowestZMm(floatArmMm: number, radiusMm: number, bottomZMm: number, pivotZMm: number, thetaRad: number): number {
  const s = Math.sin(thetaRad);
  const c = Math.cos(thetaRad);
  // no inner function: this runs inside the lever search's bisections
  const bottom = pivotZMm + (bottomZMm - pivotZMm) * c;
  return Math.min(bottom - (floatArmMm - radiusMm) * s, bottom - (floatArmMm + radiusMm) * s);
}
