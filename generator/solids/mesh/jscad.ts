/**
 * The JSCAD modelling library, loaded the same way in Node and in a vite bundle.
 *
 * @jscad/modeling is CommonJS. Node's ESM loader exposes its exports only under
 * `default` (module.exports); bundlers expose them on the namespace as well.
 * Taking `default` when present gives the full library in both.
 */
import * as jscadNamespace from '@jscad/modeling';

type Modeling = typeof jscadNamespace;

export const jscad: Modeling =
  (jscadNamespace as unknown as { default?: Modeling }).default ?? jscadNamespace;

/** A JSCAD solid: polygons plus a pending transform. */
export type Geom3 = jscadNamespace.geometries.geom3.Geom3;
/** A JSCAD 2D shape (outlines for extrusion). */
export type Geom2 = jscadNamespace.geometries.geom2.Geom2;
