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
  // the rectangles' corners in two flat lists (no pair per corner: this runs for every candidate of the lever search)
  const xs: number[] = [];
  const ys: number[] = [];
  for (const s of shapes) {
    if (s.kind === 'rect') {
      xs.push(s.x0, s.x0, s.x1, s.x1);
      ys.push(s.y0, s.y1, s.y0, s.y1);
    }
  }
  // corner to corner compared squared (one root at the end), then the circles
  let best2 = 0;
  for (let i = 0; i < xs.length; i++) {
    for (let j = i + 1; j < xs.length; j++) {
      const dx = xs[i] - xs[j];
      const dy = ys[i] - ys[j];
      const d2 = dx * dx + dy * dy;
      if (d2 > best2) best2 = d2;
    }
  }
  let best = Math.sqrt(best2);
  for (const c of shapes) {
    if (c.kind !== 'circle') continue;
    for (let k = 0; k < xs.length; k++) best = Math.max(best, Math.hypot(xs[k] - c.x, ys[k] - c.y) + c.r);
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
