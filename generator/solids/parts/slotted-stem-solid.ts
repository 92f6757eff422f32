/**
 * The slotted stem, in print pose: flat on the bed, one thickness tall, so the
 * slot and the holes are vertical and nothing overhangs.
 *
 * Print frame: x along the stem from its foot (x = 0) to its top (mounted z less
 * the stem's bottom), y across its width, z through its thickness. Cut in one
 * manifold-3d subtraction: the slot (a stadium: the slot's centre-to-centre
 * length between two half circles of the screw clearance) over the hanger's
 * screws, and the two clearance holes at the foot for the valve's screws.
 * Holes and slot ends are drawn with their flats on the nominal circle
 * (holePolygonRadiusMm), so the screws pass at any facet count.
 */
import { holePolygonRadiusMm, loadManifold, manifoldToMesh, segmentsFor, subtractAll, type IndexedMesh, type Quality } from '../mesh/index.ts';
import type { RimMountSpec } from '../../sizing/rim/rim-mount-spec.ts';
import { circlePoints } from '../shapes/polygon-section.ts';
import { prism } from '../shapes/prism.ts';
import { translation } from '../shapes/transform-mesh.ts';

const OVERRUN_MM = 1;

/** Stadium outline along x: half circles of radius r (n segments per whole circle, n a multiple of 2) round the ends of a centre line [x0, x1] at y = 0; counter-clockwise. */
export function stadiumOutline(x0: number, x1: number, r: number, n: number): [number, number][] {
  const half = n / 2;
  const points: [number, number][] = [];
  for (let k = 0; k <= half; k++) {
    const a = -Math.PI / 2 + (Math.PI * k) / half; // right end, bottom to top
    points.push([x1 + r * Math.cos(a), r * Math.sin(a)]);
  }
  for (let k = 0; k <= half; k++) {
    const a = Math.PI / 2 + (Math.PI * k) / half; // left end, top to bottom
    points.push([x0 + r * Math.cos(a), r * Math.sin(a)]);
  }
  return points;
}

export async function buildSlottedStemMesh(r: RimMountSpec, quality: Quality): Promise<IndexedMesh> {
  const wasm = await loadManifold();
  const s = r.stem;
  const w = s.widthMm / 2;
  const body = prism([[0, -w], [s.lengthMm, -w], [s.lengthMm, w], [0, w]], s.thicknessMm);
  const rh = r.screwHoleDiameterMm / 2;
  const n = 2 * Math.ceil(segmentsFor(rh, quality) / 2);
  const rd = holePolygonRadiusMm(rh, n);
  const mid = s.slotMiddleZMm - s.bottomZMm;
  const depth = s.thicknessMm + 2 * OVERRUN_MM;
  const slot = prism(stadiumOutline(mid - s.slotLengthMm / 2, mid + s.slotLengthMm / 2, rd, n), depth, translation(0, 0, -OVERRUN_MM));
  const holes = [0, r.screwPitchMm].map((drop) =>
    prism(circlePoints(rd, n), depth, translation(s.valveUpperHoleZMm - s.bottomZMm - drop, 0, -OVERRUN_MM)),
  );
  return manifoldToMesh(subtractAll(wasm, body, [slot, ...holes]), { dispose: true });
}
