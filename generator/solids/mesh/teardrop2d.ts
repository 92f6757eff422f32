/**
 * Outline of a horizontal hole that prints without support: a circle with a
 * pointed roof whose two sides rise at 50 degrees (OVERHANG_MIN_DEG) and meet
 * at the tip, on +y (turn it so +y is the print's up direction).
 *
 * The roof lines are tangent to the circle at 40 and 140 degrees and meet at
 * (0, r / cos 50deg). The arc below is faceted with the circle's own vertices
 * (angles 2 pi k / N from +x, so with N a multiple of 4 the bottom and sides
 * are vertices); the tangent points are added as exact corners.
 * Counter-clockwise, centred on the origin.
 *
 * Options: radiusMm (required, > 0); segments of the whole circle (required,
 * whole number >= 4; segmentsFor gives one); roofDeg, the roof sides' angle
 * from the x axis (default OVERHANG_MIN_DEG, 50; between 30 and 80).
 */
import { jscad, type Geom2 } from './jscad.ts';
import { requireInteger, requirePositive } from './validate.ts';
import { OVERHANG_MIN_DEG } from '../../sizing/constants.ts';

export interface TeardropOptions {
  radiusMm: number;
  segments: number;
  roofDeg?: number;
}

export function teardrop2d(options: TeardropOptions): Geom2 {
  const r = requirePositive('teardrop2d.radiusMm', options?.radiusMm, 'mm');
  const n = requireInteger('teardrop2d.segments', options?.segments, 4, 4096);
  const roof = options.roofDeg ?? OVERHANG_MIN_DEG;
  if (!(roof >= 30 && roof <= 80)) throw new RangeError(`teardrop2d.roofDeg = ${roof}; allowed: 30 to 80 degrees`);
  const point = (k: number): [number, number] => {
    const [c, s] = unitCircle(k, n);
    return [r * c, r * s];
  };
  const a = ((90 - roof) * Math.PI) / 180; // tangent point's angle from +x
  const [tx, ty] = [r * Math.cos(a), r * Math.sin(a)];
  const points: [number, number][] = [[-tx, ty]]; // 90 + roof degrees
  // Vertex k sits at 360 k / n degrees; keep those outside the roof (40..140 degrees).
  const deg = (k: number) => (360 * k) / n;
  const eps = 1e-9;
  for (let k = 0; k < n; k++) if (deg(k) > 90 + roof + eps) points.push(point(k));
  for (let k = 0; k < n; k++) if (deg(k) < 90 - roof - eps) points.push(point(k));
  points.push([tx, ty]); // 90 - roof degrees
  points.push([0, r / Math.cos((roof * Math.PI) / 180)]); // tip
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
