/**
 * Outline of a horizontal hole that prints without support, with a roof of any
 * pitch: a circle of radius r under two straight sides that rise at
 * roofAngleDeg from the bed, tangent to the circle at polar angles
 * (90 - alpha) and (90 + alpha) degrees, and meeting at the tip (0, r / cos(alpha)) on +y. The arc below the tangent points
 * keeps the circle's own vertices (angles 2 pi k / N from +x). At 45 degrees
 * this is teardrop2d's outline; the lever's parts use 50 (DESIGN second part:
 * every self-supporting face at least 50 degrees from the bed).
 * Counter-clockwise, centred on the origin. Area: pointedHoleAreaMm2 for true circles.
 *
 * Options: radiusMm (> 0), segments of the whole circle (whole number >= 4),
 * roofAngleDeg (45 to 80).
 */
import { jscad, type Geom2 } from '../mesh/index.ts';

export function pointedHole2d(radiusMm: number, segments: number, roofAngleDeg: number): Geom2 {
  if (!(radiusMm > 0)) throw new RangeError(`pointedHole2d.radiusMm = ${radiusMm}; allowed: greater than 0 mm`);
  if (!Number.isInteger(segments) || segments < 4) throw new RangeError(`pointedHole2d.segments = ${segments}; allowed: a whole number of 4 or more`);
  if (!(roofAngleDeg >= 45 && roofAngleDeg <= 80)) throw new RangeError(`pointedHole2d.roofAngleDeg = ${roofAngleDeg}; allowed: 45 to 80 degrees`);
  const a = (roofAngleDeg * Math.PI) / 180;
  const start = Math.PI / 2 - a; // right tangent point
  const end = Math.PI / 2 + a; // left tangent point
  const eps = 1e-9;
  const points: [number, number][] = [[radiusMm * Math.cos(end), radiusMm * Math.sin(end)]];
  // the circle's vertices outside the roof, from the left tangent point round the bottom to the right one
  const arc: { t: number; p: [number, number] }[] = [];
  for (let k = 0; k < segments; k++) {
    const ang = (2 * Math.PI * k) / segments;
    const t = (ang - end + 2 * Math.PI) % (2 * Math.PI); // angle travelled from the left tangent point, counter-clockwise
    if (t > eps && t < 2 * Math.PI - 2 * a - eps) arc.push({ t, p: [radiusMm * Math.cos(ang), radiusMm * Math.sin(ang)] });
  }
  arc.sort((u, v) => u.t - v.t);
  for (const v of arc) points.push(v.p);
  points.push([radiusMm * Math.cos(start), radiusMm * Math.sin(start)]);
  points.push([0, radiusMm / Math.cos(a)]);
  return jscad.geometries.geom2.fromPoints(points);
}
