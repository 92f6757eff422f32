/**
 * The indexed triangle mesh every writer and measurement here works on.
 * Millimetres. Triangles are counter-clockwise seen from outside (outward
 * normals by the right-hand rule), as STL and 3MF both expect.
 */
export interface IndexedMesh {
  /** x, y, z of each vertex, one after another (length = 3 * vertex count) */
  positions: Float32Array;
  /** three vertex indices per triangle (length = 3 * triangle count) */
  indices: Uint32Array;
}

/** Axis-aligned bounding box in millimetres. */
export interface BoundsMm {
  min: [number, number, number];
  max: [number, number, number];
}

/** Result of counting how often each undirected edge is used by the triangles. */
export interface EdgeUseCounts {
  /** distinct undirected edges */
  edges: number;
  /** edges used by exactly one triangle (a hole in the surface) */
  boundaryEdges: number;
  /** edges used by three or more triangles (non-manifold fin or T-junction pile-up) */
  overusedEdges: number;
  /** edges used exactly twice but both times in the same direction (a flipped neighbour) */
  inconsistentlyOriented: number;
  /** triangles whose three indices are not all different */
  degenerateTriangles: number;
  /** true when every edge is used exactly twice, once in each direction, and no triangle is degenerate */
  closed: boolean;
}
