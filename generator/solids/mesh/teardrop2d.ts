/**
 * Outline of a horizontal hole that prints without support: a circle with a
 * pointed roof whose two sides rise at 45 degrees and meet at the tip, on +y
 * (turn it so +y is the print's up direction).
 *
 * The roof lines are tangent to the circle at 45 and 135 degrees and meet at
 * (0, r sqrt 2). The arc below is faceted with the circle's own vertices
 * (angles 2 pi k / N from +x, so with N a multiple of 4 the bottom and sides
 * are vertices); the tangent points are added as exact corners.
 * Counter-clockwise, centred on the origin.
 *
 * Options: radiusMm (required, > 0); segments of the whole circle (required,
 * whole number >= 4; segmentsFor gives one).
 */
import { jscad, type Geom2 } from './jscad.ts';
import { requireInteger, requirePositive } from './validate.ts';

export interface TeardropOptions {
  radiusMm: number;
  segments: number;
}

export function teardrop2d(options: TeardropOptions): Geom2 {
  const r = requirePositive('teardrop2d.radiusMm', options?.radiusMm, 'mm');
  const n = requireInteger('teardrop2d.segments', options?.segments, 4, 4096);
  const point = (k: number): [number, number] => {
    const [c, s] = unitCircle(k, n);
    return [r * c, r * s];
  };
  const tangent = r / Math.SQRT2;
  const points: [number, number][] = [[-tangent, tangent]]; // 135 degrees
  // Vertex k sits at 360 k / n degrees; keep those outside the roof (45..135
  // degrees): 8k > 3n is past 135, 8k < n is before 45.
  for (let k = 0; k < n; k++) if (8 * k > 3 * n) points.push(point(k));
  for (let k = 0; k < n; k++) if (8 * k < n) points.push(point(k));
  points.push([tangent, tangent]); // 45 degrees
  points.push([0, r * Math.SQRT2]); // tip
  return jscad.geometries.geom2.fromPoints(points);
}

/** cos and sin of 2 pi k / n, exact on the axes (so axis vertices have a 0, not 6e-17). */
function unitCircle(k: number, n: number): [number, number] {
  if ((4 * k) % n === 0) {
    const quarter = (4 * k) / n;
    return ([[1, 0], [0, 1], [-1, 0], [0, -1]] as [number, number][])[quarter % 4];
  }
  const angle = (2 * Math.PI * k) / n;
  return [Math.cos(angle), Math.sin(angle)];
}
