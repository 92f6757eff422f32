/** Number of triangles in an indexed mesh. */
import type { IndexedMesh } from './types.ts';

export function triangleCount(mesh: IndexedMesh): number {
  return mesh.indices.length / 3;
}
