/**
 * Area of the true (unfaceted) teardrop outline, mm^2 (teardrop2d's shape):
 * the circle plus the kite between the centre, the two tangent points and the
 * tip, less the circle's sector between the tangent points; with the roof at
 * a = 50 degrees from the horizontal, A = r^2 (pi + tan a - a) (elementary
 * geometry; the sizing core's teardropAreaMm2 is the one formula).
 * Example: r = 2 mm → 4 (3.14159 + 1.19175 - 0.87266) = 13.843 mm^2.
 */
import { teardropAreaMm2 } from '../../sizing/parts/part-volumes.ts';
import { requirePositive } from './validate.ts';

export function teardropArea(radiusMm: number): number {
  return teardropAreaMm2(requirePositive('teardropArea.radiusMm', radiusMm, 'mm'));
}
