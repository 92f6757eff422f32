/**
 * The seal test stand's base, printed as it stands (foot on the bed): one
 * solid of revolution (standBaseProfile: foot flange, flare at OVERHANG_DEG,
 * chamber wall, deck with the housing's seat bore, cone roof under the deck at
 * OVERHANG_DEG, guide tube on the deck), less the guide slots (open at the
 * top) and the supply tube's exit (open at the bed, pointed at OVERHANG_DEG),
 * in one manifold-3d subtraction. The seat and guide bores are drawn with their
 * flats on the nominal circle (holePolygonRadiusMm), as the housing's seat.
 */
import { holePolygonRadiusMm, loadManifold, manifoldToMesh, segmentsFor, subtractAll, type Geom3, type IndexedMesh, type Quality } from '../mesh/index.ts';
import { OVERHANG_DEG, standBaseProfile, type StandBaseSpec } from '../../sizing/parts/stand-spec.ts';
import { prism } from '../shapes/prism.ts';
import { revolveProfile } from '../shapes/revolve-profile.ts';
import { fromRows } from '../shapes/transform-mesh.ts';

const CUT_OVERRUN_MM = 1;

export function standBaseSegments(b: StandBaseSpec, quality: Quality): number {
  return segmentsFor(b.footRadiusMm, quality);
}

/** The profile with the seat and guide bores at their drawn (flats-on-nominal) radii. */
export function standBaseDrawnProfile(b: StandBaseSpec, segments: number): [number, number][] {
  const seat = b.seatBoreMm / 2;
  return standBaseProfile(b).map(([r, z]) => {
    if (r === seat) return [holePolygonRadiusMm(seat, segments), z];
    if (r === b.guideInnerRadiusMm) return [holePolygonRadiusMm(r, segments), z];
    return [r, z];
  });
}

export function standBaseCutters(b: StandBaseSpec): Geom3[] {
  const cutters: Geom3[] = [];
  const inner = b.guideInnerRadiusMm - CUT_OVERRUN_MM;
  const outer = b.outerRadiusMm + CUT_OVERRUN_MM;
  const hw = b.slots.widthMm / 2;
  const slot: [number, number][] = [[inner, -hw], [outer, -hw], [outer, hw], [inner, hw]];
  const depth = b.guideTopZMm + CUT_OVERRUN_MM - b.slots.floorZMm;
  for (let k = 0; k < b.slots.count; k++) {
    // slots between the tube exit (at +x) and each other
    const a = (2 * Math.PI * (k + 0.5)) / b.slots.count;
    const c = Math.cos(a);
    const s = Math.sin(a);
    cutters.push(prism(slot, depth, fromRows([c, -s, 0], [s, c, 0], [0, 0, 1], [0, 0, b.slots.floorZMm])));
  }
  // Tube exit along +x: outline in the (y, z) plane, extruded along x through wall, flare and foot.
  const w = b.tubeExit.widthMm / 2;
  const point = w * Math.tan((OVERHANG_DEG * Math.PI) / 180);
  const shoulder = b.tubeExit.heightMm - point;
  const outline: [number, number][] = [[-w, -CUT_OVERRUN_MM], [w, -CUT_OVERRUN_MM], [w, shoulder], [0, b.tubeExit.heightMm], [-w, shoulder]];
  const x0 = b.chamberRadiusMm - CUT_OVERRUN_MM;
  const length = b.footRadiusMm + CUT_OVERRUN_MM - x0;
  // prism local (u, v, h) -> (x, y, z) = (x0 + h, u, v)
  cutters.push(prism(outline, length, fromRows([0, 0, 1], [1, 0, 0], [0, 1, 0], [x0, 0, 0])));
  return cutters;
}

export async function buildStandBaseMesh(b: StandBaseSpec, quality: Quality): Promise<IndexedMesh> {
  const wasm = await loadManifold();
  const n = standBaseSegments(b, quality);
  const body = revolveProfile(standBaseDrawnProfile(b, n), n);
  return manifoldToMesh(subtractAll(wasm, body, standBaseCutters(b)), { dispose: true });
}
