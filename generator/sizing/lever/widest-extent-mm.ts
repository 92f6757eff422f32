/** A shape seen from above: an axis-aligned rectangle or a circle, mm. */
export type PlanShape =
  | { kind: 'rect'; x0: number; x1: number; y0: number; y1: number }
  | { kind: 'circle'; x: number; y: number; r: number };

/**
 * Widest extent of a group of shapes seen from above: the largest distance
 * between two of their points (the diameter of their convex hull). It is reached
 * between two hull vertices, here rectangle corners or circle rims, so it is the
 * largest of: corner to corner |p - q|; corner to circle |p - c| + r; circle to
 * circle |c1 - c2| + r1 + r2 (a circle with itself: 2r).
 *
 * Example: a 10 x 10 square at the origin and a circle of radius 5 centred at
 * (20, 5): farthest are (0, 0) or (0, 10) to the circle, sqrt(400 + 25) + 5 = 25.616.
 * Source: elementary geometry.
 */
export function widestExtentMm(shapes: readonly PlanShape[]): number {
  // Corner to corner, compared squared (one root at the end). A corner of one rectangle and a corner of
  // another (or the same) take their x and their y independently, so the farthest pair of two rectangles
  // is the farthest x pair with the farthest y pair: (max dx^2) + (max dy^2), the same number as the
  // largest dx^2 + dy^2 over all 16 corner pairs (rounding is monotone), in 8 differences instead of 32.
  let best2 = 0;
  for (let i = 0; i < shapes.length; i++) {
    const a = shapes[i];
    if (a.kind !== 'rect') continue;
    for (let j = i; j < shapes.length; j++) {
      const b = shapes[j];
      if (b.kind !== 'rect') continue;
      const d2 = widestSquare(a.x0, a.x1, b.x0, b.x1) + widestSquare(a.y0, a.y1, b.y0, b.y1);
      if (d2 > best2) best2 = d2;
    }
  }
  let best = Math.sqrt(best2);
  for (const c of shapes) {
    if (c.kind !== 'circle') continue;
    for (const r of shapes) {
      if (r.kind !== 'rect') continue;
      best = Math.max(best, Math.hypot(r.x0 - c.x, r.y0 - c.y) + c.r, Math.hypot(r.x0 - c.x, r.y1 - c.y) + c.r);
      best = Math.max(best, Math.hypot(r.x1 - c.x, r.y0 - c.y) + c.r, Math.hypot(r.x1 - c.x, r.y1 - c.y) + c.r);
    }
  }
  for (let i = 0; i < shapes.length; i++) {
    const a = shapes[i];
    if (a.kind !== 'circle') continue;
    for (let j = i; j < shapes.length; j++) {
      const b = shapes[j];
      if (b.kind !== 'circle') continue;
      best = Math.max(best, Math.hypot(a.x - b.x, a.y - b.y) + a.r + b.r);
    }
  }
  return best;
}

/** Largest (p - q)^2 over p in {p0, p1} and q in {q0, q1}. */
function widestSquare(p0: number, p1: number, q0: number, q1: number): number {
  const a = p0 - q0;
  const b = p0 - q1;
  const c = p1 - q0;
  const d = p1 - q1;
  return Math.max(a * a, b * b, c * c, d * d);
}
