/**
 * Area of a horizontal hole that prints without support: a circle of radius r
 * under a pointed roof whose sides rise at alpha from the bed, tangent to the
 * circle at polar angles 90deg -/+ alpha: the arc of 2 alpha under the roof is
 * replaced by the kite of the two tangent lines:
 *
 *   A = r^2 (pi - alpha + tan(alpha))
 *
 * alpha = 45 deg gives the familiar teardrop r^2 (3 pi / 4 + 1).
 *
 * @param radiusMm r, mm
 * @param roofAngleDeg alpha, degrees from the bed (45 to 89)
 * @returns A, mm2
 *
 * Example: r = 2.25 mm, alpha = 50 deg: 5.0625 (pi - 0.87266 + 1.19175) = 17.5197 mm2.
 * Source: elementary geometry (circle sector, kite of two tangents).
 */
export function pointedHoleAreaMm2(radiusMm: number, roofAngleDeg: number): number {
  const a = (roofAngleDeg * Math.PI) / 180;
  return radiusMm * radiusMm * (Math.PI - a + Math.tan(a));
}

/** Height of the roof's point above the hole's centre, r / cos(alpha), mm. Example: r 2.25, 50 deg: 3.5004. */
export function pointedHoleApexMm(radiusMm: number, roofAngleDeg: number): number {
  return radiusMm / Math.cos((roofAngleDeg * Math.PI) / 180);
}
