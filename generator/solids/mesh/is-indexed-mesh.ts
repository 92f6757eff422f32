/** Tells an IndexedMesh from a JSCAD geom3 (or anything else). */
import type { IndexedMesh } from './types.ts';

export function isIndexedMesh(value: unknown): value is IndexedMesh {
  const candidate = value as Partial<IndexedMesh> | null;
  return !!candidate && candidate.positions instanceof Float32Array && candidate.indices instanceof Uint32Array;
}
