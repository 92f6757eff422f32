/**
 * The rim hanger, in print pose: lying on its side, its U section (RimMountSpec,
 * mounted x across the wall and z up) flat on the bed and extruded up by its
 * width, so every face but the pilot holes' roofs is vertical or level.
 *
 * Print frame: x = mounted x (0 at the wall's inner face, the inner leg at
 * x > 0), y = mounted z less the bridge's underside, z = along the rim. The two
 * pilot holes cross the inner leg along x, the clamp screw's the outer leg; their
 * pointed roofs (pointedHole2d at 50 degrees) face up. One manifold-3d subtraction.
 */
import { holePolygonRadiusMm, jscad, loadManifold, manifoldToMesh, segmentsFor, subtractAll, type IndexedMesh, type Quality } from '../mesh/index.ts';
import { PRINT_CLEARANCE_MM } from '../../sizing/constants.ts';
import { SELF_SUPPORT_ANGLE_DEG } from '../../sizing/lever/lever-constants.ts';
import type { RimMountSpec } from '../../sizing/rim/rim-mount-spec.ts';
import { pointedHole2d } from '../shapes/pointed-hole2d.ts';
import { prism } from '../shapes/prism.ts';
import { asMat4, fromRows } from '../shapes/transform-mesh.ts';

const OVERRUN_MM = 1;

/** The U section [x, y] (print frame), counter-clockwise. */
export function rimHangerSection(r: RimMountSpec): [number, number][] {
  const h = r.hanger;
  const c = PRINT_CLEARANCE_MM;
  const inner = c; // the inner leg's face against the wall
  const outer = c - h.gapMm; // the outer leg's face against the wall
  return [
    [inner, -h.innerLegLengthMm],
    [inner + h.legMm, -h.innerLegLengthMm],
    [inner + h.legMm, h.legMm],
    [outer - h.legMm, h.legMm],
    [outer - h.legMm, -h.outerLegLengthMm],
    [outer, -h.outerLegLengthMm],
    [outer, 0],
    [inner, 0],
  ];
}

export async function buildRimHangerMesh(r: RimMountSpec, quality: Quality): Promise<IndexedMesh> {
  const wasm = await loadManifold();
  const h = r.hanger;
  const body = prism(rimHangerSection(r), h.widthMm);
  const rp = r.pilotHoleDiameterMm / 2;
  const n = segmentsFor(rp, quality);
  const outline = pointedHole2d(holePolygonRadiusMm(rp, n), n, SELF_SUPPORT_ANGLE_DEG);
  const length = h.legMm + 2 * OVERRUN_MM;
  const drill = jscad.extrusions.extrudeLinear({ height: length }, outline);
  const cutters = [0, r.screwPitchMm].map((drop) =>
    // (u, v, w) -> (x, y, z) = (w + start, u + hole height, v + half width): a cyclic, proper rotation; tip (+v) up
    jscad.transforms.transform(
      asMat4(fromRows([0, 0, 1], [1, 0, 0], [0, 1, 0], [PRINT_CLEARANCE_MM - OVERRUN_MM, h.upperHoleZMm - h.bridgeBottomZMm - drop, h.widthMm / 2])),
      drill,
    ),
  );
  // the clamp screw's pilot hole through the outer leg, stopping short of the inner leg across the gap
  const outerFace = PRINT_CLEARANCE_MM - h.gapMm;
  const inward = Math.min(OVERRUN_MM, h.gapMm / 2);
  const clampDrill = jscad.extrusions.extrudeLinear({ height: h.legMm + OVERRUN_MM + inward }, outline);
  cutters.push(
    jscad.transforms.transform(
      asMat4(fromRows([0, 0, 1], [1, 0, 0], [0, 1, 0], [outerFace - h.legMm - OVERRUN_MM, h.clampHoleZMm - h.bridgeBottomZMm, h.widthMm / 2])),
      clampDrill,
    ),
  );
  return manifoldToMesh(subtractAll(wasm, body, cutters), { dispose: true });
}
