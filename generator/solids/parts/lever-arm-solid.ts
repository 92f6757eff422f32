/**
 * The lever's arm, in print pose: its top face (the pad's side) on the bed, so
 * every piece stands up from z = 0 as a straight prism and nothing overhangs
 * but the pin hole's roof and the pad pocket's floor.
 *
 * Print frame: x along the arm from the pivot axis (as mounted), z up from the
 * bed = down from the mounted top face, y = -y mounted (a half turn about x).
 * Pieces (LeverArmSpec): the bar, the eye block round the pivot (deeper), the
 * square pad table, the round tongue standing up at the float arm (it plugs into
 * the float's socket), joined in one manifold-3d union; then one subtraction of
 * the pad pocket (a blind round hole from the bed: its floor is a short bridge of
 * the pocket's diameter, the print's one) and the pin hole across the eye along
 * y, its pointed roof at holeRoofAngleDeg from the bed (pointedHole2d).
 *
 * Fits: the pin hole and the pocket are drawn with their flats on the nominal
 * circle (holePolygonRadiusMm), so the pin and the pad go in at any facet count.
 */
import { holePolygonRadiusMm, jscad, loadManifold, manifoldToMesh, segmentsFor, subtractAll, unionAll, type IndexedMesh, type Quality } from '../mesh/index.ts';
import type { LeverArmSpec } from '../../sizing/lever/lever-types.ts';
import { circlePoints } from '../shapes/polygon-section.ts';
import { pointedHole2d } from '../shapes/pointed-hole2d.ts';
import { prism } from '../shapes/prism.ts';
import { asMat4, fromRows, translation } from '../shapes/transform-mesh.ts';

/** Cutters reach this far past the faces they cut, mm; the tongue is sunk this far into the bar. */
const OVERRUN_MM = 1;

const rect = (x0: number, x1: number, y0: number, y1: number): [number, number][] => [
  [x0, y0],
  [x1, y0],
  [x1, y1],
  [x0, y1],
];

export async function buildLeverArmMesh(a: LeverArmSpec, quality: Quality): Promise<IndexedMesh> {
  const wasm = await loadManifold();
  const w = a.barWidthMm / 2;
  const s = a.tableHalfSideMm;
  const bar = prism(rect(a.tailXMm, a.tipXMm, -w, w), a.barDepthMm);
  const eye = prism(rect(a.tailXMm, a.eyeHalfLengthMm, -w, w), a.eyeDepthMm);
  const table = prism(rect(a.padArmMm - s, a.padArmMm + s, -s, s), a.barDepthMm);
  const rt = a.tongueDiameterMm / 2;
  const tongue = prism(circlePoints(rt, segmentsFor(rt, quality)), a.tongueLengthMm + OVERRUN_MM, translation(a.floatArmMm, 0, a.barDepthMm - OVERRUN_MM));
  const body = unionAll(wasm, [bar, eye, table, tongue]);

  const rp = a.pocketDiameterMm / 2;
  const np = segmentsFor(rp, quality);
  const pocket = prism(circlePoints(holePolygonRadiusMm(rp, np), np), a.pocketDepthMm + OVERRUN_MM, translation(a.padArmMm, 0, -OVERRUN_MM));

  // pin hole: the outline's (u, v) -> (x, z), extruded along y across the eye; tip up (+z in print)
  const rh = a.holeDiameterMm / 2;
  const nh = segmentsFor(rh, quality);
  const length = a.barWidthMm + 2 * OVERRUN_MM;
  const outline = pointedHole2d(holePolygonRadiusMm(rh, nh), nh, a.holeRoofAngleDeg);
  const drill = jscad.extrusions.extrudeLinear({ height: length }, outline);
  // (u, v, w) -> (x, y, z) = (u, w - length/2, v + centre depth): a proper rotation (u, v, w) -> (u, w, v) is a mirror, so w is taken negative
  const hole = jscad.transforms.transform(asMat4(fromRows([1, 0, 0], [0, 0, -1], [0, 1, 0], [0, length / 2, a.holeCentreDepthMm])), drill);
  try {
    return manifoldToMesh(subtractAll(wasm, body, [pocket, hole]), { dispose: true });
  } finally {
    body.delete();
  }
}
