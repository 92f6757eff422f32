/**
 * Shared by the boolean helpers: takes a mix of JSCAD geom3s and Manifolds,
 * converts the geom3s (which this module then owns and frees) and leaves the
 * caller's Manifolds alone.
 */
import type { Manifold, ManifoldToplevel } from 'manifold-3d';
import { jscad, type Geom3 } from './jscad.ts';
import { toManifold } from './to-manifold.ts';

/** What the boolean helpers accept: a JSCAD solid, or a Manifold the caller keeps owning. */
export type Solid = Geom3 | Manifold;

export interface ConvertedSolids {
  manifolds: Manifold[];
  /** frees the Manifolds made here from geom3s (not the caller's) */
  release(): void;
}

export function convertSolids(wasm: ManifoldToplevel, solids: readonly Solid[], path: string): ConvertedSolids {
  const made: Manifold[] = [];
  const release = (): void => made.forEach((m) => m.delete());
  try {
    const manifolds = solids.map((solid, i) => {
      if (jscad.geometries.geom3.isA(solid)) {
        const manifold = toManifold(wasm, solid as Geom3, `${path}[${i}]`);
        made.push(manifold);
        return manifold;
      }
      if (solid && typeof (solid as Manifold).getMesh === 'function') return solid as Manifold;
      throw new TypeError(`${path}[${i}] is neither a JSCAD geom3 nor a manifold-3d Manifold`);
    });
    return { manifolds, release };
  } catch (error) {
    release();
    throw error;
  }
}
