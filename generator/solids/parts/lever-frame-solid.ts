/**
 * The lever valve's frame (LeverFrameSpec), built mounted (z up from the floor,
 * x along the arm from the pivot axis) and turned deck-down for printing: the
 * deck is the first layer, the boss, cheeks and back wall stand up from it, the
 * pin holes' pointed roofs (50 degrees, pointedHole2d) face up, and on the floor
 * mount the anchor wings are the top of the print, carried by 50-degree wedges.
 *
 * Body: one manifold-3d union of prisms (cheeks, back wall, deck, boss, the
 * pad's hard stop hanging from the deck's front edge, wings
 * with their wedges; each overlaps its neighbour a little so nothing joins
 * face to face only). Cuts, in one subtraction: the nozzle seat through boss
 * and deck, the pin hole across both cheeks, the anchor slots through the wings
 * (floor) or the stem's pilot holes through the back wall (rim). Holes are drawn
 * with their flats on the nominal circle (holePolygonRadiusMm).
 */
import { holePolygonRadiusMm, jscad, loadManifold, manifoldToMesh, segmentsFor, subtractAll, unionAll, type Geom3, type IndexedMesh, type Quality } from '../mesh/index.ts';
import { SELF_SUPPORT_ANGLE_DEG } from '../../sizing/lever/lever-constants.ts';
import type { LeverFrameSpec } from '../../sizing/lever/lever-types.ts';
import { circlePoints } from '../shapes/polygon-section.ts';
import { pointedHole2d } from '../shapes/pointed-hole2d.ts';
import { prism } from '../shapes/prism.ts';
import { asMat4, fromRows, transformMesh, translation } from '../shapes/transform-mesh.ts';

/** Cutters reach this far past what they cut; pieces overlap their neighbours by OVERLAP_MM. */
const OVERRUN_MM = 1;
const OVERLAP_MM = 0.5;

/** Axis-aligned box [x0, x1] x [y0, y1] x [z0, z1]. */
function box(x0: number, x1: number, y0: number, y1: number, z0: number, z1: number): Geom3 {
  return prism([[x0, y0], [x1, y0], [x1, y1], [x0, y1]], z1 - z0, translation(0, 0, z0));
}

/** A wing: plate a wide and `plate` thick, under a wedge rising at 50 degrees to the wall it leans on; section in (outward u, up z), extruded along `length`. */
function wingSection(a: number, plate: number): [number, number][] {
  const tan = Math.tan((SELF_SUPPORT_ANGLE_DEG * Math.PI) / 180);
  return [
    [-OVERLAP_MM, 0],
    [a, 0],
    [a, plate],
    [-OVERLAP_MM, plate + (a + OVERLAP_MM) * tan],
  ];
}

/**
 * Outline of a slot open to one side: the half circle of radius r about `centre`
 * facing away from `out` (a unit vector), then straight sides running `reach`
 * along `out`; counter-clockwise. n: segments of the whole circle.
 */
function openSlot(centre: [number, number], out: [number, number], r: number, n: number, reach: number): [number, number][] {
  const [cx, cy] = centre;
  const [ox, oy] = out;
  const [tx, ty] = [-oy, ox]; // out turned a quarter counter-clockwise
  const points: [number, number][] = [[cx - tx * r + ox * reach, cy - ty * r + oy * reach]];
  const half = Math.max(2, Math.round(n / 2));
  for (let k = 0; k <= half; k++) {
    // from the -t side round the back (-out) to the +t side: direction cos(ang) out - sin(ang) t, ang from 90 to 270 degrees
    const ang = Math.PI / 2 + (Math.PI * k) / half;
    const c = Math.cos(ang);
    const s = Math.sin(ang);
    points.push([cx + r * (c * ox - s * tx), cy + r * (c * oy - s * ty)]);
  }
  points.push([cx + tx * r + ox * reach, cy + ty * r + oy * reach]);
  // make it counter-clockwise whatever the direction
  let area = 0;
  for (let i = 0; i < points.length; i++) {
    const [x0, y0] = points[i];
    const [x1, y1] = points[(i + 1) % points.length];
    area += x0 * y1 - x1 * y0;
  }
  return area > 0 ? points : points.reverse();
}

export function leverFrameTopZMm(f: LeverFrameSpec): number {
  return f.deckBottomZMm + f.deckThicknessMm;
}

export async function buildLeverFrameMountedMesh(f: LeverFrameSpec, quality: Quality): Promise<IndexedMesh> {
  const wasm = await loadManifold();
  const t = f.wallMm;
  const post = f.postHalfLengthMm;
  const back = -post - t;
  const g = f.cheekGapMm / 2;
  const w = f.widthMm / 2;
  const top = leverFrameTopZMm(f);
  const pieces: Geom3[] = [
    // the cheeks reach into the back wall, which stops flush with the gap between them
    box(-post - OVERLAP_MM, post, g, w, f.cheekBottomZMm, f.deckBottomZMm + OVERLAP_MM),
    box(-post - OVERLAP_MM, post, -w, -g, f.cheekBottomZMm, f.deckBottomZMm + OVERLAP_MM),
    box(back, -post, -w, w, f.cheekBottomZMm, f.deckBottomZMm + OVERLAP_MM),
    box(back, f.deckFrontXMm, -f.deckWidthMm / 2, f.deckWidthMm / 2, f.deckBottomZMm, top),
  ];
  // the pad's hard stop under the deck's front edge (into the deck by the overlap)
  pieces.push(box(f.deckFrontXMm - f.stopLengthMm, f.deckFrontXMm, -f.stopWidthMm / 2, f.stopWidthMm / 2, f.stopBottomZMm, f.deckBottomZMm + OVERLAP_MM));
  const rb = f.bossOuterDiameterMm / 2;
  pieces.push(prism(circlePoints(rb, segmentsFor(rb, quality)), f.bossHeightMm + OVERLAP_MM, translation(f.padArmMm, 0, f.deckBottomZMm - f.bossHeightMm)));
  const cutters: Geom3[] = [];
  const hole = (radius: number) => {
    const n = segmentsFor(radius, quality);
    return { n, r: holePolygonRadiusMm(radius, n) };
  };
  if (f.mount === 'floor') {
    const a = f.wingMm;
    const section = wingSection(a, f.footThicknessMm);
    const length = post - back;
    // (u, z, s) -> side wing on +y: x = s + back, y = u + w, z = z (a cyclic turn: proper); the -y wing mirrored by a half turn about z
    pieces.push(prism(section, length, fromRows([0, 0, 1], [1, 0, 0], [0, 1, 0], [back, w, 0])));
    pieces.push(prism(section, length, fromRows([0, 0, -1], [-1, 0, 0], [0, 1, 0], [post, -w, 0])));
    // back wing: x = back - u, y = s - w, z = z
    if (f.backWing) pieces.push(prism(section, 2 * w, fromRows([-1, 0, 0], [0, 0, 1], [0, 1, 0], [back, -w, 0])));
    // anchor holes as slots open to the wing's edge: a round hole through the wedge would leave, on its
    // far side, a crescent printed over nothing (the ring closes beyond the hole as the wedge grows out)
    const ha = hole(f.anchorDiameterMm / 2);
    const h = f.footThicknessMm + a * Math.tan((SELF_SUPPORT_ANGLE_DEG * Math.PI) / 180) + 2 * OVERRUN_MM;
    const slots = [[0, w + a / 2, 0, 1], [0, -w - a / 2, 0, -1], ...(f.backWing ? [[back - a / 2, 0, -1, 0]] : [])];
    for (const [x, y, ox, oy] of slots) {
      cutters.push(prism(openSlot([x, y], [ox, oy], ha.r, ha.n, a / 2 + OVERRUN_MM), h, translation(0, 0, -OVERRUN_MM)));
    }
  } else {
    const hp = hole(f.stemPilotDiameterMm / 2);
    const drill = jscad.extrusions.extrudeLinear({ height: t + OVERLAP_MM + 2 * OVERRUN_MM }, pointedHole2d(hp.r, hp.n, SELF_SUPPORT_ANGLE_DEG));
    for (const z of [f.stemUpperHoleZMm, f.stemUpperHoleZMm - f.stemPitchMm]) {
      // (u, v, s) -> x = s + start, y = -u, z = zc - v: tip (+v) down when mounted, up in the deck-down print
      cutters.push(jscad.transforms.transform(asMat4(fromRows([0, 0, 1], [-1, 0, 0], [0, -1, 0], [back - OVERRUN_MM, 0, z])), drill));
    }
  }
  const rs = hole(f.seatBoreMm / 2);
  const seatBottom = f.deckBottomZMm - f.bossHeightMm - OVERRUN_MM;
  cutters.push(prism(circlePoints(rs.r, rs.n), top + OVERRUN_MM - seatBottom, translation(f.padArmMm, 0, seatBottom)));
  const hp = hole(f.pinHoleDiameterMm / 2);
  const span = 2 * w + 2 * OVERRUN_MM;
  const drill = jscad.extrusions.extrudeLinear({ height: span }, pointedHole2d(hp.r, hp.n, f.holeRoofAngleDeg));
  // (u, v, s) -> x = u, y = s - span / 2, z = pivot - v: tip down mounted
  cutters.push(jscad.transforms.transform(asMat4(fromRows([1, 0, 0], [0, 0, 1], [0, -1, 0], [0, -span / 2, f.pivotZMm])), drill));
  const body = unionAll(wasm, pieces);
  try {
    return manifoldToMesh(subtractAll(wasm, body, cutters), { dispose: true });
  } finally {
    body.delete();
  }
}

/** Print pose: turned over about x, deck on the bed: (x, y, z) -> (x, -y, top - z). */
export function leverFrameFlipMatrix(f: LeverFrameSpec): number[] {
  return fromRows([1, 0, 0], [0, -1, 0], [0, 0, -1], [0, 0, Math.fround(leverFrameTopZMm(f))]);
}

export async function buildLeverFrameMesh(f: LeverFrameSpec, quality: Quality): Promise<IndexedMesh> {
  return transformMesh(await buildLeverFrameMountedMesh(f, quality), leverFrameFlipMatrix(f));
}
