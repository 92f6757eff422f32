/**
 * manifold-3d Manifold → JSCAD geom3 made of triangles.
 */
import type { Manifold } from 'manifold-3d';
import type { Geom3 } from './jscad.ts';
import { manifoldToMesh, type ManifoldToMeshOptions } from './manifold-to-mesh.ts';
import { meshToGeom3 } from './mesh-to-geom3.ts';

export function manifoldToGeom3(manifold: Manifold, options: ManifoldToMeshOptions = {}): Geom3 {
  return meshToGeom3(manifoldToMesh(manifold, options));
}
