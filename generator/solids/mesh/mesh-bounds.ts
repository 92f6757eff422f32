/**
 * Axis-aligned bounds of the vertices a mesh's triangles use, mm.
 * An empty mesh gives min = +Infinity, max = -Infinity.
 */
import type { BoundsMm, IndexedMesh } from './types.ts';

export function meshBounds(mesh: IndexedMesh): BoundsMm {
  const min: [number, number, number] = [Infinity, Infinity, Infinity];
  const max: [number, number, number] = [-Infinity, -Infinity, -Infinity];
  const { positions, indices } = mesh;
  for (let i = 0; i < indices.length; i++) {
    const v = 3 * indices[i];
    for (let axis = 0; axis < 3; axis++) {
      const value = positions[v + axis];
      if (value < min[axis]) min[axis] = value;
      if (value > max[axis]) max[axis] = value;
    }
  }
  return { min, max };
}
