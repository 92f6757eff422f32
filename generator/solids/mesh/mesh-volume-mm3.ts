/**
 * Signed volume enclosed by a closed triangle mesh, mm^3.
 *
 * Divergence theorem: V = (1/6) * sum over triangles of a · (b × c), with a,
 * b, c the corners in counter-clockwise order seen from outside. Positive for
 * outward-facing triangles, negative if the mesh is inside out. Summed in
 * double precision relative to the first vertex, which keeps the rounding
 * small for parts far from the origin.
 *
 * Example: a 10 mm cube → 1000 mm^3.
 */
import type { IndexedMesh } from './types.ts';

export function meshVolumeMm3(mesh: IndexedMesh): number {
  const { positions: p, indices } = mesh;
  if (indices.length === 0) return 0;
  const ox = p[0];
  const oy = p[1];
  const oz = p[2];
  let sixTimesVolume = 0;
  for (let t = 0; t < indices.length; t += 3) {
    const a = 3 * indices[t];
    const b = 3 * indices[t + 1];
    const c = 3 * indices[t + 2];
    const ax = p[a] - ox, ay = p[a + 1] - oy, az = p[a + 2] - oz;
    const bx = p[b] - ox, by = p[b + 1] - oy, bz = p[b + 2] - oz;
    const cx = p[c] - ox, cy = p[c + 1] - oy, cz = p[c + 2] - oz;
    sixTimesVolume += ax * (by * cz - bz * cy) + ay * (bz * cx - bx * cz) + az * (bx * cy - by * cx);
  }
  return sixTimesVolume / 6;
}
