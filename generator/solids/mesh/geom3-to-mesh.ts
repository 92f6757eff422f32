/**
 * JSCAD geom3 → welded indexed triangle mesh.
 *
 * JSCAD stores each face as its own convex polygon with its own copies of the
 * corner points; adjacent faces carry bit-identical coordinates. Welding by
 * exact (float32) position recovers the shared vertices, and a fan from each
 * polygon's first corner triangulates it (valid for convex polygons, which is
 * what JSCAD's primitives and extrusions make). Triangles that collapse to a
 * repeated index are dropped. The geom3's pending transform is applied.
 *
 * Example: a JSCAD cube (6 quads, 24 corner copies) → 8 vertices, 12 triangles.
 */
import { jscad, type Geom3 } from './jscad.ts';
import type { IndexedMesh } from './types.ts';
import { weldKey } from './weld-key.ts';

export function geom3ToMesh(geom: Geom3): IndexedMesh {
  const polygons = jscad.geometries.geom3.toPolygons(geom);
  const indexOf = new Map<string, number>();
  const positions: number[] = [];
  const indices: number[] = [];

  const vertexIndex = (point: readonly number[]): number => {
    const key = weldKey(point[0], point[1], point[2]);
    let index = indexOf.get(key);
    if (index === undefined) {
      index = positions.length / 3;
      indexOf.set(key, index);
      positions.push(point[0], point[1], point[2]);
    }
    return index;
  };

  for (const polygon of polygons) {
    const corners = polygon.vertices.map(vertexIndex);
    for (let i = 1; i + 1 < corners.length; i++) {
      const a = corners[0];
      const b = corners[i];
      const c = corners[i + 1];
      if (a !== b && b !== c && c !== a) indices.push(a, b, c);
    }
  }
  return { positions: new Float32Array(positions), indices: new Uint32Array(indices) };
}
