/**
 * The housing. Built mounted (z up from the base), then turned deck-down for
 * printing: the deck is the first layer, the boss and the float's guide
 * sleeve stand up from it, the flare under the flange rises at 60 degrees and
 * the pin holes' teardrop tips point up.
 *
 * Body: one solid of revolution (HousingSpec): flange from z = 0, 60-degree
 * flare back to the tube, tube to the deck, deck on top, seat bore through
 * deck and boss, boss hanging under the deck inside the tube, going on down as
 * the guide sleeve with the stop ring inside it.
 * Cuts: vents, anchor holes, drain notches, the sleeve's air slots and the two
 * pin holes, all joined and taken away in one manifold-3d subtraction.
 *
 * Fits: the bore and every hole are drawn with their flats on the nominal
 * circle (holePolygonRadiusMm), so the float, the nozzle collar, the pin and
 * an anchor screw fit at any facet count; the outer surfaces have their
 * corners on the nominal circle.
 */
import {
  holePolygonRadiusMm,
  jscad,
  loadManifold,
  manifoldToMesh,
  segmentsFor,
  subtractAll,
  teardrop2d,
  type Geom3,
  type IndexedMesh,
  type Quality,
} from '../mesh/index.ts';
import type { HousingSpec } from '../../sizing/result.ts';
import { dedupe } from '../shapes/dedupe-corners.ts';
import { prism } from '../shapes/prism.ts';
import { revolveProfile } from '../shapes/revolve-profile.ts';
import { asMat4, fromRows, transformMesh, translation } from '../shapes/transform-mesh.ts';
import { circlePoints } from '../shapes/polygon-section.ts';
import { ANCHOR_ROOF_DEG, housingFlareHeightMm } from '../../sizing/parts/part-volumes.ts';
import { FOOT_FLARE_RISE, PIN_HOLE_ROOF_DEG } from '../../sizing/parts/housing-spec.ts';

/** Cutters reach this far past the faces they cut, mm, so no cut ends flush with a face. */
const CUT_OVERRUN_MM = 1;

export function housingSegments(h: HousingSpec, quality: Quality): number {
  return segmentsFor(h.foot.outerDiameterMm / 2, quality);
}

/** Half-section corners [r, z] (mounted), counter-clockwise; bore and seat radii are the drawn (flats-on-nominal) radii. */
export function housingProfile(h: HousingSpec, segments: number): [number, number][] {
  const Ro = h.outerDiameterMm / 2;
  const Rf = h.foot.outerDiameterMm / 2;
  const tf = h.foot.flangeThicknessMm;
  const rb = holePolygonRadiusMm(h.boreMm / 2, segments);
  const rs = holePolygonRadiusMm(h.seatBoreMm / 2, segments);
  const rg = holePolygonRadiusMm(h.guide.boreMm / 2, segments);
  const rStop = holePolygonRadiusMm(h.guide.stopBoreMm / 2, segments);
  const rBoss = h.bossOuterDiameterMm / 2;
  const top = h.deckBottomZMm + h.deckThicknessMm;
  const bossBottom = h.deckBottomZMm - h.bossHeightMm;
  return dedupe([
    [rb, 0],
    [Rf, 0],
    [Rf, tf],
    [Ro, tf + housingFlareHeightMm(h)],
    [Ro, top],
    [rs, top],
    [rs, bossBottom],
    [rStop, bossBottom],
    [rStop, h.guide.stopZMm],
    [rg, h.guide.stopZMm],
    [rg, h.guide.mouthZMm],
    [rBoss, h.guide.mouthZMm],
    [rBoss, h.deckBottomZMm],
    [rb, h.deckBottomZMm],
  ]);
}

/** Vertical round hole cutter at (x, y) from z0 to z1, flats on the nominal radius. */
function verticalHole(radiusMm: number, quality: Quality, x: number, y: number, z0: number, z1: number): Geom3 {
  const n = segmentsFor(radiusMm, quality);
  return prism(circlePoints(holePolygonRadiusMm(radiusMm, n), n), z1 - z0, translation(x, y, z0));
}

/** Every cutter of the housing, mounted frame. */
export function housingCutters(h: HousingSpec, quality: Quality): Geom3[] {
  const cutters: Geom3[] = [];
  const Rb = h.boreMm / 2;
  const Rf = h.foot.outerDiameterMm / 2;
  const top = h.deckBottomZMm + h.deckThicknessMm;
  const deg = Math.PI / 180;

  const v = h.vents;
  for (let k = 0; k < v.count; k++) {
    const a = (2 * Math.PI * k) / v.count;
    cutters.push(
      verticalHole(v.diameterMm / 2, quality, v.circleRadiusMm * Math.cos(a), v.circleRadiusMm * Math.sin(a), h.deckBottomZMm - CUT_OVERRUN_MM, top + CUT_OVERRUN_MM),
    );
  }

  const ah = h.foot.anchorHoles;
  // through the flange and the flare above the hole's inner edge
  const anchorTop = h.foot.flangeThicknessMm + Math.max(0, Rf - (ah.circleRadiusMm - ah.diameterMm / 2)) * FOOT_FLARE_RISE + CUT_OVERRUN_MM;
  const ra = ah.diameterMm / 2;
  const na = segmentsFor(ra, quality);
  const anchorOutline = teardrop2d({ radiusMm: holePolygonRadiusMm(ra, na), segments: na, roofDeg: ANCHOR_ROOF_DEG });
  const anchorPrism = jscad.extrusions.extrudeLinear({ height: anchorTop + CUT_OVERRUN_MM }, anchorOutline);
  // half a facet round from the pattern's angle, so the teardrop's point never lies on one of the
  // body's meridian edges (a cut through an edge leaves float32-degenerate slivers)
  const halfFacet = 180 / housingSegments(h, quality);
  for (let k = 0; k < ah.count; k++) {
    const a = (ah.angleOffsetDeg + halfFacet + (k * 360) / ah.count) * deg;
    // teardrop2d points at +y: turn it to point outward, at angle a
    const c = Math.sin(a);
    const s = -Math.cos(a);
    const place = fromRows([c, -s, 0], [s, c, 0], [0, 0, 1], [ah.circleRadiusMm * Math.cos(a), ah.circleRadiusMm * Math.sin(a), -CUT_OVERRUN_MM]);
    cutters.push(jscad.transforms.transform(asMat4(place), anchorPrism));
  }

  const dn = h.drainNotches;
  const inner = Rb - CUT_OVERRUN_MM;
  const outer = Rf + CUT_OVERRUN_MM;
  const slot: [number, number][] = [
    [inner, -dn.widthMm / 2],
    [outer, -dn.widthMm / 2],
    [outer, dn.widthMm / 2],
    [inner, dn.widthMm / 2],
  ];
  for (let k = 0; k < dn.count; k++) {
    const a = (dn.angleOffsetDeg + (k * 360) / dn.count) * deg;
    const c = Math.cos(a);
    const s = Math.sin(a);
    cutters.push(prism(slot, dn.heightMm + CUT_OVERRUN_MM, fromRows([c, -s, 0], [s, c, 0], [0, 0, 1], [0, 0, -CUT_OVERRUN_MM])));
  }

  // Air slots through the guide sleeve and its stop ring, from below the mouth to a little into the boss
  const gs = h.guide.slots;
  const slotIn = h.guide.stopBoreMm / 2 - 1;
  const slotOut = h.bossOuterDiameterMm / 2 + CUT_OVERRUN_MM;
  const slotSection: [number, number][] = [
    [slotIn, -gs.widthMm / 2],
    [slotOut, -gs.widthMm / 2],
    [slotOut, gs.widthMm / 2],
    [slotIn, gs.widthMm / 2],
  ];
  const slotBottom = h.guide.mouthZMm - CUT_OVERRUN_MM;
  const slotTop = h.deckBottomZMm - h.bossHeightMm + gs.riseMm;
  for (let k = 0; k < gs.count; k++) {
    const a = (gs.angleOffsetDeg + (k * 360) / gs.count) * deg;
    const c = Math.cos(a);
    const s = Math.sin(a);
    cutters.push(prism(slotSection, slotTop - slotBottom, fromRows([c, -s, 0], [s, c, 0], [0, 0, 1], [0, 0, slotBottom])));
  }

  // Pin holes: one teardrop prism across the whole housing along x. teardrop2d
  // points its tip at +y; (x, y, z) -> (z, -x, -y) lays the prism along x with
  // the tip down (mounted), which is up once the housing is turned deck-down.
  const r = h.pinHoles.diameterMm / 2;
  const n = segmentsFor(r, quality);
  const outline = teardrop2d({ radiusMm: holePolygonRadiusMm(r, n), segments: n, roofDeg: PIN_HOLE_ROOF_DEG });
  const length = 2 * (Rf + CUT_OVERRUN_MM);
  const drop = jscad.extrusions.extrudeLinear({ height: length }, outline);
  cutters.push(jscad.transforms.transform(asMat4(fromRows([0, 0, 1], [-1, 0, 0], [0, -1, 0], [-length / 2, 0, h.pinHoles.centerZMm])), drop));
  return cutters;
}

/** Mounted-pose mesh (base on z = 0, deck on top). */
export async function buildHousingMountedMesh(h: HousingSpec, quality: Quality): Promise<IndexedMesh> {
  const wasm = await loadManifold();
  const body = revolveProfile(housingProfile(h, housingSegments(h, quality)), housingSegments(h, quality));
  return manifoldToMesh(subtractAll(wasm, body, housingCutters(h, quality)), { dispose: true });
}

/**
 * Print pose: turned over about the x axis, deck on the bed: (x, y, z) -> (x, -y, H - z). Self-inverse.
 * H is taken at float32 precision, as the mesh stores the deck top, so the deck lands on exactly z = 0.
 */
export function housingFlipMatrix(h: HousingSpec): number[] {
  return fromRows([1, 0, 0], [0, -1, 0], [0, 0, -1], [0, 0, Math.fround(h.heightMm)]);
}

export async function buildHousingMesh(h: HousingSpec, quality: Quality): Promise<IndexedMesh> {
  return transformMesh(await buildHousingMountedMesh(h, quality), housingFlipMatrix(h));
}
