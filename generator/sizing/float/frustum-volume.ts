/**
 * Volume of a conical frustum of height h between end radii R and r.
 *
 *   V = (pi h / 3)(R^2 + R r + r^2)
 *
 * Any consistent length unit; r = 0 gives a cone, R = r a cylinder.
 * Example: h = 21, R = 27, r = 6 gives 20 386 (mm3).
 * Source: elementary geometry.
 */
export function frustumVolume(heightH: number, radiusA: number, radiusB: number): number {
  return ((Math.PI * heightH) / 3) * (radiusA * radiusA + radiusA * radiusB + radiusB * radiusB);
}

/** Volume of a cylinder, V = pi r^2 h. Source: elementary geometry. */
export function cylinderVolume(radius: number, height: number): number {
  return Math.PI * radius * radius * height;
}
