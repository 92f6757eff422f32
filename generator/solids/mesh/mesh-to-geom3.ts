/**
 * Indexed mesh → JSCAD geom3, one triangle per polygon (JSCAD measures,
 * transforms and draws it as any other solid).
 */
import { jscad, type Geom3 } from './jscad.ts';
import type { IndexedMesh } from './types.ts';

export function meshToGeom3(mesh: IndexedMesh): Geom3 {
  const { positions, indices } = mesh;
  const { poly3, geom3 } = jscad.geometries;
  const corner = (v: number): [number, number, number] => [positions[3 * v], positions[3 * v + 1], positions[3 * v + 2]];
  const polygons = [];
  for (let t = 0; t < indices.length; t += 3) {
    polygons.push(poly3.create([corner(indices[t]), corner(indices[t + 1]), corner(indices[t + 2])]));
  }
  return geom3.create(polygons);
}
