/**
 * Counts how each undirected edge of an indexed mesh is used.
 *
 * A closed, consistently oriented 2-manifold uses every undirected edge
 * exactly twice, once in each direction (3MF Core Specification 4.1: "Manifold
 * Edges" and "Consistent Triangle Orientation"). Anything else is reported:
 * edges used once are holes, three or more times are non-manifold, twice in
 * the same direction is a flipped neighbour.
 *
 * Example: a welded cube (8 vertices, 12 triangles) → 18 edges, all clean.
 */
import type { EdgeUseCounts, IndexedMesh } from './types.ts';

// One map value per undirected edge: uses in the low-to-high direction plus
// USE_BACKWARD times the uses high-to-low.
const USE_BACKWARD = 1 << 16;

export function countEdgeUses(mesh: IndexedMesh): EdgeUseCounts {
  const { indices } = mesh;
  const vertexCount = mesh.positions.length / 3;
  const uses = new Map<number, number>();
  let degenerateTriangles = 0;

  const add = (a: number, b: number): void => {
    const key = a < b ? a * vertexCount + b : b * vertexCount + a;
    uses.set(key, (uses.get(key) ?? 0) + (a < b ? 1 : USE_BACKWARD));
  };

  for (let t = 0; t < indices.length; t += 3) {
    const a = indices[t];
    const b = indices[t + 1];
    const c = indices[t + 2];
    if (a === b || b === c || c === a) {
      degenerateTriangles++;
      continue;
    }
    add(a, b);
    add(b, c);
    add(c, a);
  }

  let boundaryEdges = 0;
  let overusedEdges = 0;
  let inconsistentlyOriented = 0;
  for (const packed of uses.values()) {
    const forward = packed % USE_BACKWARD;
    const backward = Math.floor(packed / USE_BACKWARD);
    const total = forward + backward;
    if (total === 1) boundaryEdges++;
    else if (total > 2) overusedEdges++;
    else if (forward !== 1) inconsistentlyOriented++;
  }
  return {
    edges: uses.size,
    boundaryEdges,
    overusedEdges,
    inconsistentlyOriented,
    degenerateTriangles,
    closed: boundaryEdges === 0 && overusedEdges === 0 && inconsistentlyOriented === 0 && degenerateTriangles === 0,
  };
}
