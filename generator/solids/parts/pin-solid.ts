/**
 * The retainer pin, print pose: lying along x on its flat (z = 0), the head
 * (a box, flat on the bed too) at x from -head.length to 0, the round bar
 * from the head's face (x = 0) to x = lengthMm. Section: circle of
 * diameterMm with the part below flatOffsetMm under the axis cut away, so the
 * axis is at z = flatOffsetMm and every overhang of the round is at 50 degrees
 * or steeper (PinSpec). The bar is extruded from inside the head, so the head
 * and bar overlap and join cleanly in one manifold-3d union.
 */
import { jscad, loadManifold, manifoldToMesh, segmentsFor, unionAll, type IndexedMesh, type Quality } from '../mesh/index.ts';
import type { PinSpec } from '../../sizing/result.ts';
import { prism } from '../shapes/prism.ts';
import { fromRows } from '../shapes/transform-mesh.ts';

export function pinSegments(p: PinSpec, quality: Quality): number {
  return segmentsFor(p.diameterMm / 2, quality);
}

/** Section corners [y, z] with the flat on z = 0, counter-clockwise: the flat's ends, then the circle's corners above it. */
export function pinSection(p: PinSpec, segments: number): [number, number][] {
  const r = p.diameterMm / 2;
  const f = p.flatOffsetMm;
  const alpha = Math.asin(f / r); // the flat meets the circle at -alpha and pi + alpha
  const half = Math.sqrt(r * r - f * f);
  const eps = 1e-9;
  const arc: { a: number; point: [number, number] }[] = [];
  for (let k = 0; k < segments; k++) {
    // the circle's own corners, angles taken in [-pi/2, 3pi/2) so the kept arc is one run
    let a = (2 * Math.PI * k) / segments;
    if (a >= 1.5 * Math.PI) a -= 2 * Math.PI;
    if (a > -alpha + eps && a < Math.PI + alpha - eps) arc.push({ a, point: [r * Math.cos(a), f + r * Math.sin(a)] });
  }
  arc.sort((u, v) => u.a - v.a);
  return [[half, 0], ...arc.map((c) => c.point), [-half, 0]];
}

export async function buildPinMesh(p: PinSpec, quality: Quality): Promise<IndexedMesh> {
  const wasm = await loadManifold();
  const section = pinSection(p, pinSegments(p, quality));
  const { lengthMm: hl, widthMm: hw, heightMm: hh } = p.head;
  // (x, y, z) of the extrusion -> (z, x, y): the section's [y, z] stays [y, z], the extrusion runs along x
  const bar = prism(section, p.lengthMm + hl, fromRows([0, 0, 1], [1, 0, 0], [0, 1, 0], [-hl, 0, 0]));
  const head = jscad.primitives.cuboid({ size: [hl, hw, hh], center: [-hl / 2, 0, hh / 2] });
  return manifoldToMesh(unionAll(wasm, [bar, head]), { dispose: true });
}
