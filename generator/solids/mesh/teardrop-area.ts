/**
 * Area of the true (unfaceted) teardrop outline, mm^2: three quarters of the
 * circle below the tangent points plus the square kite of side r between the
 * centre, the two tangent points and the tip:
 *   A = (3 pi / 4) r^2 + r^2 = r^2 (3 pi / 4 + 1)   (elementary geometry)
 * Example: r = 2 mm → 13.425 mm^2.
 */
import { requirePositive } from './validate.ts';

export function teardropArea(radiusMm: number): number {
  const r = requirePositive('teardropArea.radiusMm', radiusMm, 'mm');
  return r * r * ((3 * Math.PI) / 4 + 1);
}
