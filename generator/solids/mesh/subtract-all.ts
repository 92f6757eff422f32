/**
 * base minus every cutter: the cutters are first joined in one batch union,
 * then taken away in a single subtraction (one pass over the base instead of
 * one per cutter). Returns a new Manifold the caller owns.
 */
import type { Manifold, ManifoldToplevel } from 'manifold-3d';
import { convertSolids, type Solid } from './solid-inputs.ts';

export function subtractAll(wasm: ManifoldToplevel, base: Solid, cutters: readonly Solid[]): Manifold {
  const baseInput = convertSolids(wasm, [base], 'subtractAll.base');
  let cutterInput;
  try {
    cutterInput = convertSolids(wasm, cutters, 'subtractAll.cutters');
  } catch (error) {
    baseInput.release();
    throw error;
  }
  const cutterUnion = wasm.Manifold.union(cutterInput.manifolds);
  try {
    return wasm.Manifold.difference(baseInput.manifolds[0], cutterUnion);
  } finally {
    cutterUnion.delete();
    cutterInput.release();
    baseInput.release();
  }
}
