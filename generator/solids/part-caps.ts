/**
 * Resource caps, checked before any part is built (DESIGN "Caps"): no part
 * larger than 250 mm, none heavier than 200,000 triangles. The triangle count
 * of each part is bounded from its facet counts alone, so a sizing result that
 * would make a runaway mesh (a hand-edited one, or a unit slip) is refused in
 * microseconds with a message, instead of tying up a browser tab or a worker.
 *
 * Bound per part (N = facets around a circle at the asked quality):
 * - a solid of revolution from a profile of P corners: at most 2 P N triangles
 *   (each profile edge sweeps N quads; the axis ends are fans, fewer);
 * - a prism of an M-gon: at most 4 M triangles (2 M sides, 2 (M - 2) caps);
 * - a boolean of a body with cutters or ribs: at most BOOLEAN_FACTOR times the
 *   inputs' triangles together (manifold-3d re-triangulates the faces it cuts;
 *   the fuzz tests check the bound against every part they build).
 *
 * Example: the DESIGN scale example's housing at export quality (80 mm foot,
 * N = 64): body 2 x 10 x 64 = 1280, cutters about 600, bound about 5,600; the built mesh has
 * about 2,000.
 */
import { PART_SIZE_CAP_MM, TRIANGLE_CAP } from '../sizing/constants.ts';
import { standSpecOf } from '../sizing/parts/stand-spec.ts';
import { anchorSlots } from '../sizing/lever/lever-frame-volume-mm3.ts';
import type { SizingSuccess } from '../sizing/result.ts';
import { segmentsFor, type Quality } from './mesh/index.ts';

/** Boolean output over its inputs' triangles (measured below 1.5 on every fuzzed part; 3 leaves room). */
export const BOOLEAN_FACTOR = 3;

export type CappedPart = 'housing' | 'frame' | 'arm' | 'hanger' | 'stem' | 'float' | 'nozzle' | 'pin' | 'pad' | 'stand-base' | 'stand-plunger';

/** Straight stroke pieces the plunger's mass label may have (measured: "88.8g" has 107 in JSCAD's vector font, "0123456789.g" 162; 6 characters of the worst, 28 each). */
const LABEL_PIECES_MAX = 6 * 28;

const revolved = (corners: number, n: number) => 2 * corners * n;
const prismOf = (sides: number) => 4 * sides;

/** Upper bound of each part's triangle count at `quality`, from the sizing result alone (the parts this valve has). */
export function triangleBounds(sizing: SizingSuccess, quality: Quality): Partial<Record<CappedPart, number>> {
  const { float: f, nozzle: z, pin } = sizing.parts;
  const stand = standSpecOf(sizing);
  const nz = segmentsFor(z.shoulderDiameterMm / 2, quality);
  const nozzleCorners = 10 + 2 * z.barb.count;
  const np = segmentsFor(pin.diameterMm / 2, quality);
  const common = {
    float: revolved(12, segmentsFor(f.outerDiameterMm / 2, quality)),
    nozzle: BOOLEAN_FACTOR * (revolved(nozzleCorners, nz) + z.crushRibs.count * prismOf(5)),
    pin: BOOLEAN_FACTOR * (prismOf(np + 2) + 12),
    'stand-base': BOOLEAN_FACTOR * (revolved(13, segmentsFor(stand.base.footRadiusMm, quality)) + stand.base.slots.count * prismOf(4) + prismOf(5)),
    'stand-plunger': BOOLEAN_FACTOR * (revolved(8, segmentsFor(stand.plunger.cupRimRadiusMm, quality)) + LABEL_PIECES_MAX * prismOf(4)),
  };
  if (sizing.architecture === 'lever') {
    const { frame: fr, arm: a, rim, pad } = sizing.parts;
    const ring = (diameterMm: number) => prismOf(segmentsFor(diameterMm / 2, quality) + 3);
    const rimBounds = rim
      ? {
          hanger: BOOLEAN_FACTOR * (prismOf(8) + 3 * ring(rim.pilotHoleDiameterMm)),
          stem: BOOLEAN_FACTOR * (prismOf(4) + prismOf(segmentsFor(rim.screwHoleDiameterMm / 2, quality) + 2) + 2 * ring(rim.screwHoleDiameterMm)),
        }
      : {};
    return {
      ...common,
      ...rimBounds,
      // boxes, wing wedges and the boss; the seat, the pin hole, two or three anchor slots or two pilot holes
      frame: BOOLEAN_FACTOR * (8 * prismOf(6) + ring(fr.bossOuterDiameterMm) + ring(fr.seatBoreMm) + ring(fr.pinHoleDiameterMm) + anchorSlots(fr) * ring(fr.anchorDiameterMm) + 2 * ring(fr.stemPilotDiameterMm)),
      arm: BOOLEAN_FACTOR * (3 * prismOf(4) + ring(a.tongueDiameterMm) + ring(a.pocketDiameterMm) + ring(a.holeDiameterMm)),
      pad: revolved(4, segmentsFor(pad.diameterMm / 2, quality)),
    };
  }
  const h = sizing.parts.housing;
  const nh = segmentsFor(h.foot.outerDiameterMm / 2, quality);
  const cutters =
    h.vents.count * prismOf(segmentsFor(h.vents.diameterMm / 2, quality)) +
    h.foot.anchorHoles.count * prismOf(segmentsFor(h.foot.anchorHoles.diameterMm / 2, quality)) +
    h.drainNotches.count * prismOf(4) +
    prismOf(segmentsFor(h.pinHoles.diameterMm / 2, quality) + 3);
  return {
    ...common,
    housing: BOOLEAN_FACTOR * (revolved(10, nh) + cutters),
    pad: revolved(4, segmentsFor(f.padDiameterMm / 2, quality)),
  };
}

/** Largest extent of each part, mm, from its spec (the parts this valve has). */
export function partExtentsMm(sizing: SizingSuccess): Partial<Record<CappedPart, number>> {
  const { float: f, nozzle: z, pin } = sizing.parts;
  const stand = standSpecOf(sizing);
  const common = {
    float: Math.max(f.heightMm, f.outerDiameterMm),
    nozzle: Math.max(z.totalLengthMm, z.shoulderDiameterMm, z.collarDiameterMm + 2 * z.crushRibs.heightMm),
    pin: Math.max(pin.lengthMm + pin.head.lengthMm, pin.head.widthMm, pin.head.heightMm),
    'stand-base': Math.max(stand.base.heightMm, 2 * stand.base.footRadiusMm),
    'stand-plunger': Math.max(stand.plunger.heightMm, 2 * stand.plunger.cupRimRadiusMm),
  };
  if (sizing.architecture === 'lever') {
    const { frame: fr, arm: a, rim, pad } = sizing.parts;
    return {
      ...common,
      frame: Math.max(fr.heightMm, fr.deckFrontXMm - fr.footBackXMm, fr.footWidthMm, fr.deckWidthMm),
      arm: Math.max(a.tipXMm - a.tailXMm, a.eyeDepthMm + a.tongueLengthMm, a.barWidthMm),
      pad: Math.max(pad.diameterMm, pad.thicknessMm),
      ...(rim
        ? {
            hanger: Math.max(rim.hanger.innerLegLengthMm + rim.hanger.legMm, rim.hanger.gapMm + 2 * rim.hanger.legMm, rim.hanger.widthMm),
            stem: Math.max(rim.stem.lengthMm, rim.stem.widthMm),
          }
        : {}),
    };
  }
  const h = sizing.parts.housing;
  return {
    ...common,
    housing: Math.max(h.heightMm, h.foot.outerDiameterMm),
    pad: Math.max(f.padDiameterMm, f.padThicknessMm),
  };
}

/**
 * Why these parts must not be built (a part over 250 mm, a triangle bound over
 * 200,000, or a dimension that is not a finite positive number); empty when
 * they may. One entry per problem, with the part it concerns.
 */
export function partCapProblems(sizing: SizingSuccess, quality: Quality, parts: readonly CappedPart[]): { part: CappedPart; message: string }[] {
  const problems: { part: CappedPart; message: string }[] = [];
  const extents = partExtentsMm(sizing);
  let bounds: Partial<Record<CappedPart, number>> | null = null;
  try {
    bounds = triangleBounds(sizing, quality);
  } catch (error) {
    // segmentsFor refuses non-finite, negative or runaway radii
    problems.push({ part: parts[0] ?? 'float', message: `the parts' circles cannot be faceted (${error instanceof Error ? error.message : String(error)})` });
  }
  for (const part of parts) {
    const extent = extents[part] ?? Number.NaN;
    if (!(Number.isFinite(extent) && extent > 0)) problems.push({ part, message: `its size (${extent} mm) is not a positive number of millimetres` });
    else if (extent > PART_SIZE_CAP_MM + 1e-6) problems.push({ part, message: `${extent.toFixed(1)} mm across is over the ${PART_SIZE_CAP_MM} mm a part may be` });
    const bound = bounds?.[part];
    if (bound !== undefined && !(bound <= TRIANGLE_CAP)) {
      problems.push({ part, message: `up to ${Math.round(bound).toLocaleString('en')} triangles at ${quality} quality is over the ${TRIANGLE_CAP.toLocaleString('en')} a part may have` });
    }
  }
  return problems;
}
