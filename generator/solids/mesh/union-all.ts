/**
 * Union of any number of solids in one batch boolean (manifold-3d sorts the
 * operands and joins them as a balanced tree, faster than a chain of pairwise
 * unions). Returns a new Manifold the caller owns; an empty list gives an
 * empty Manifold.
 */
import type { Manifold, ManifoldToplevel } from 'manifold-3d';
import { convertSolids, type Solid } from './solid-inputs.ts';

export function unionAll(wasm: ManifoldToplevel, parts: readonly Solid[]): Manifold {
  const { manifolds, release } = convertSolids(wasm, parts, 'unionAll.parts');
  try {
    return wasm.Manifold.union(manifolds);
  } finally {
    release();
  }
}
