/**
 * Key for welding vertices by exact position at the precision a mesh stores
 * (float32). Positions that round to the same float32 triple are one vertex;
 * -0 and 0 are the same position.
 */
export function weldKey(x: number, y: number, z: number): string {
  return `${Math.fround(x)},${Math.fround(y)},${Math.fround(z)}`;
}
