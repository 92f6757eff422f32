/**
 * Common volume of two solids. Returns a new Manifold the caller owns (empty,
 * status NoError, when they do not overlap).
 */
import type { Manifold, ManifoldToplevel } from 'manifold-3d';
import { convertSolids, type Solid } from './solid-inputs.ts';

export function intersect(wasm: ManifoldToplevel, a: Solid, b: Solid): Manifold {
  const { manifolds, release } = convertSolids(wasm, [a, b], 'intersect');
  try {
    return wasm.Manifold.intersection(manifolds[0], manifolds[1]);
  } finally {
    release();
  }
}
