/**
 * A solid of revolution about the z axis from a profile in the (r, z) half
 * plane: JSCAD's extrudeRotate, one closed solid, no booleans.
 *
 * Options:
 * - points: the profile's corners [r, z] in mm, counter-clockwise (material on
 *   the left when walking the outline), r >= 0; corners with r = 0 lie on the
 *   axis, where the extrusion closes the solid.
 * - segments: facets around the axis (whole number >= 3); segmentsFor gives one.
 *
 * Every horizontal section of the result is a regular N-gon (or a ring of two)
 * whose corners lie on the profile's radii, so the solid's volume is exactly
 * k(N) = N sin(2 pi / N) / (2 pi) times the true solid of revolution (ratio of
 * an inscribed N-gon's area to its circle's, elementary geometry).
 *
 * Example: a 10 x 5 rectangle from r = 0, 32 segments → a 10 mm radius disc
 * 5 mm thick of volume 0.99359 * pi * 100 * 5 = 1560.7 mm3.
 */
import { jscad, type Geom3 } from '../mesh/index.ts';

export function revolveProfile(points: readonly (readonly [number, number])[], segments: number): Geom3 {
  if (!Number.isInteger(segments) || segments < 3) {
    throw new RangeError(`revolveProfile.segments = ${segments}; allowed: a whole number of 3 or more`);
  }
  points.forEach(([r, z], i) => {
    if (!Number.isFinite(r) || !Number.isFinite(z) || r < 0) {
      throw new RangeError(`revolveProfile.points[${i}] = [${r}, ${z}]; allowed: finite numbers with r >= 0`);
    }
  });
  const profile = jscad.geometries.geom2.fromPoints(points.map(([r, z]) => [r, z] as [number, number]));
  return jscad.extrusions.extrudeRotate({ segments }, profile);
}

/** Ratio of a regular N-gon's area to that of its circumscribed circle: N sin(2 pi / N) / (2 pi). */
export function polygonAreaRatio(segments: number): number {
  return (segments * Math.sin((2 * Math.PI) / segments)) / (2 * Math.PI);
}
