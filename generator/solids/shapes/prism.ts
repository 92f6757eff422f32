/**
 * A straight prism from a 2D outline (JSCAD extrudeLinear along +z from
 * z = 0 to heightMm), then placed by a 4x4 matrix. The outline is given as
 * counter-clockwise corners.
 */
import { jscad, type Geom3 } from '../mesh/index.ts';
import { asMat4 } from './transform-mesh.ts';

export function prism(corners: readonly (readonly [number, number])[], heightMm: number, placement?: readonly number[]): Geom3 {
  if (!(heightMm > 0)) throw new RangeError(`prism.heightMm = ${heightMm}; allowed: greater than 0 mm`);
  const outline = jscad.geometries.geom2.fromPoints(corners.map(([x, y]) => [x, y] as [number, number]));
  const solid = jscad.extrusions.extrudeLinear({ height: heightMm }, outline);
  return placement ? jscad.transforms.transform(asMat4(placement), solid) : solid;
}
