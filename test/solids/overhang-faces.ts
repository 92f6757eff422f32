/**
 * The downward-facing triangles of a print-pose mesh that are flatter than a
 * given angle from the bed, leaving out those on the bed itself (z = 0).
 * A face's angle from the bed is the angle between its normal and straight down
 * subtracted from 90 degrees: it overhangs past `minAngleDeg` when the cosine of
 * its normal's angle to straight down exceeds cos(minAngleDeg) (elementary
 * geometry; slicers add support under faces flatter than their threshold,
 * common practice 45 degrees). Slivers (area under 1e-4 mm2) are skipped: their
 * normal is rounding noise.
 */
import type { IndexedMesh } from '../../generator/solids/mesh/index.ts';

/** Triangles smaller than this are slivers, mm2. */
const SLIVER_AREA_MM2 = 1e-4;

export interface OverhangFace {
  zMinMm: number;
  /** the triangle's corners [x, y, z] */
  corners: [number, number, number][];
}

export function overhangFaces(mesh: IndexedMesh, minAngleDeg: number): OverhangFace[] {
  const p = mesh.positions;
  const idx = mesh.indices;
  const limit = Math.cos((minAngleDeg * Math.PI) / 180);
  const out: OverhangFace[] = [];
  for (let t = 0; t < idx.length; t += 3) {
    const [a, b, c] = [3 * idx[t], 3 * idx[t + 1], 3 * idx[t + 2]];
    const ux = p[b] - p[a], uy = p[b + 1] - p[a + 1], uz = p[b + 2] - p[a + 2];
    const vx = p[c] - p[a], vy = p[c + 1] - p[a + 1], vz = p[c + 2] - p[a + 2];
    const nx = uy * vz - uz * vy, ny = uz * vx - ux * vz, nz = ux * vy - uy * vx;
    const len = Math.hypot(nx, ny, nz);
    // slivers (three corners in a line, as booleans leave now and then) have no direction and print nothing
    if (len / 2 < SLIVER_AREA_MM2) continue;
    const zMin = Math.min(p[a + 2], p[b + 2], p[c + 2]);
    if (-nz / len <= limit + 1e-4 || zMin === 0) continue;
    out.push({ zMinMm: zMin, corners: [a, b, c].map((v) => [p[v], p[v + 1], p[v + 2]] as [number, number, number]) });
  }
  return out;
}
