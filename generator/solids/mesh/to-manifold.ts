/**
 * JSCAD geom3 → manifold-3d Manifold: weld (geom3ToMesh), then hand over.
 * Throws a clear Error, with manifold-3d's status, if the solid is not a
 * closed 2-manifold. The caller owns the result (`.delete()` it when done).
 */
import type { Manifold, ManifoldToplevel } from 'manifold-3d';
import { geom3ToMesh } from './geom3-to-mesh.ts';
import type { Geom3 } from './jscad.ts';
import { meshToManifold } from './mesh-to-manifold.ts';

export function toManifold(wasm: ManifoldToplevel, geom: Geom3, name = 'geom3'): Manifold {
  return meshToManifold(wasm, geom3ToMesh(geom), name);
}
