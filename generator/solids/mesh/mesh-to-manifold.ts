/**
 * Indexed mesh → manifold-3d Manifold (positions only, numProp = 3).
 *
 * manifold-3d refuses anything that is not an oriented, closed 2-manifold;
 * this turns that refusal into an Error that names the solid, manifold-3d's
 * status and what an edge count finds, so the builder at fault is obvious.
 * The caller owns the returned Manifold: call `.delete()` when done (WASM
 * memory is not garbage-collected).
 */
import type { Manifold, ManifoldToplevel } from 'manifold-3d';
import { countEdgeUses } from './count-edge-uses.ts';
import type { IndexedMesh } from './types.ts';

export function meshToManifold(wasm: ManifoldToplevel, mesh: IndexedMesh, name = 'mesh'): Manifold {
  const input = new wasm.Mesh({ numProp: 3, vertProperties: mesh.positions, triVerts: mesh.indices });
  try {
    return new wasm.Manifold(input);
  } catch (error) {
    // manifold-3d throws a ManifoldError whose `code` is the status string.
    const status = (error as { code?: string } | null)?.code ?? (error instanceof Error ? error.message : String(error));
    const edges = countEdgeUses(mesh);
    throw new Error(
      `${name}: manifold-3d rejected the mesh (status ${status}): ` +
        `${mesh.indices.length / 3} triangles, ${mesh.positions.length / 3} vertices; ` +
        `${edges.boundaryEdges} open edges, ${edges.overusedEdges} edges shared by 3 or more triangles, ` +
        `${edges.inconsistentlyOriented} edges with flipped neighbours, ${edges.degenerateTriangles} degenerate triangles`,
      { cause: error },
    );
  }
}
