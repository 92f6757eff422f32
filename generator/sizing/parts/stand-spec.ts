import { STANDARD_GRAVITY } from '../constants.ts';
import type { FloatSpec, HousingSpec, NozzleSpec, SizingSuccess } from '../result.ts';

/**
 * The seal test stand (DESIGN "Seal test stand"): a base that holds the
 * grower's own nozzle insert pointing up, in the same seat as the housing's,
 * and a guided plunger that carries the pad on its underside and a cup on top.
 * With the tank at a known head, water goes into the cup until the drip stops;
 * plunger + cup + water on a kitchen scale gives one (head, mass) point.
 *
 * Every dimension here is in mm, z up from the table (the stand as used).
 * Nothing in either part overhangs by more than 40 degrees from the vertical
 * printed as posed (OVERHANG_DEG from the bed or steeper), with no bridges:
 * - base, printed as it stands: the chamber under the deck is a cone roof at
 *   OVERHANG_DEG; the tube's exit and the guide's slots are open at one end
 *   or pointed at OVERHANG_DEG.
 * - plunger, printed cup down: the cup is a cone (OVERHANG_DEG) whose rim is
 *   on the bed; the pad pocket opens upward.
 */
export interface StandSpecOptions {
  /** the nozzle's seat: the housing's (or the lever frame's), the same fields */
  housing: Pick<HousingSpec, 'deckThicknessMm' | 'bossHeightMm' | 'seatBoreMm'>;
  nozzle: NozzleSpec;
  /** what carries the pad (the float, or the lever's arm): its pocket and how far the pad stands proud */
  float: Pick<FloatSpec, 'pocketRadiusMm' | 'pocketDepthMm' | 'padProudMm'>;
  /** supply tube inner diameter, mm */
  tubeInnerDiameterMm: number;
  /** housing wall, mm: the base's walls and the plunger's stem */
  wallMm: number;
  /** extrusion line width, mm: the cup's wall is two lines (light plunger) */
  lineWidthMm: number;
  printClearanceMm: number;
  /** print material density, kg/m3 */
  materialDensityKgM3: number;
  /** pad mass, g (the pad rides on the plunger and is weighed with it) */
  padMassG: number;
  /** force for a tight seal at the highest head, N: the cup holds 1.5 x that as water, less the plunger */
  sealForceAtHeadMaxN: number;
  /** water density, kg/m3 */
  liquidDensityKgM3: number;
}

export interface StandBaseSpec {
  /** foot flange radius and thickness; a flare at OVERHANG_DEG rises from it to the wall */
  footRadiusMm: number;
  footThicknessMm: number;
  /** chamber wall: inner and outer radius */
  chamberRadiusMm: number;
  outerRadiusMm: number;
  /** the seat: bore and length identical to the housing's (seatBoreMm; deck + boss) */
  seatBoreMm: number;
  seatLengthMm: number;
  /** bottom of the seat bore, where the chamber's cone roof meets it */
  seatBottomZMm: number;
  /** chamber roof cone's foot (at the chamber wall) */
  roofFootZMm: number;
  /** deck top (the nozzle's shoulder rests here) */
  deckTopZMm: number;
  /** the plunger's guide: a tube standing on the deck */
  guideInnerRadiusMm: number;
  guideOuterRadiusMm: number;
  guideTopZMm: number;
  /** vertical slots from the guide top into the deck (water and air out) */
  slots: { count: number; widthMm: number; floorZMm: number };
  /** where the supply tube leaves the chamber: a slot from the table up, pointed at the top */
  tubeExit: { widthMm: number; heightMm: number };
  heightMm: number;
  volumeMm3: number;
  massG: number;
}

export interface StandPlungerSpec {
  /** guided stem radius; the pad face is its underside */
  stemRadiusMm: number;
  stemLengthMm: number;
  /** pad pocket in the pad face (the float's) */
  pocketRadiusMm: number;
  pocketDepthMm: number;
  /** cone cup on top: rim radius (outside), wall measured across the cone */
  cupRimRadiusMm: number;
  cupWallMm: number;
  /** flat flange round the rim (on the bed when printed) that carries the mass label on its underside (as used) */
  flangeWidthMm: number;
  flangeThicknessMm: number;
  /** water the cup holds to its rim, mL */
  cupCapacityMl: number;
  heightMm: number;
  /** raised mass label under the flange (as used; on top of it as printed): text, cap height, relief, centre y as printed */
  label: { text: string; heightMm: number; depthMm: number; centerOffsetMm: number; maxWidthMm: number };
  /** plastic (the label's few tens of mm3 are left out: about 0.03 g), the pad, and both */
  plasticVolumeMm3: number;
  plasticMassG: number;
  padMassG: number;
  massG: number;
}

export interface StandSpec {
  base: StandBaseSpec;
  plunger: StandPlungerSpec;
  /** pad face of the plunger when the pad rests on the lip: z of the lip top, and the plunger's bottom then */
  lipTopZMm: number;
  plungerSeatedZMm: number;
  /** radial gap between the plunger and its guide, each side: print clearance + running gap */
  guideGapMm: number;
  /** true when the cup, at its size cap, holds less than the test at the highest head may need */
  cupCapped: boolean;
}

/** Steepest overhang from the bed, degrees (project rule: every self-supporting face at least 50 degrees; 55 leaves margin). */
export const OVERHANG_DEG = 55;
/** Running gap on top of the print clearance, mm, each side (common practice: a sliding fit needs a few tenths). */
export const RUNNING_GAP_MM = 0.3;
/** The plunger may lift this far off the lip before its cup meets the guide, mm. */
const LIFT_MM = 6;
/** Room around the barb and the tube's bend in the chamber, mm (common practice: a 4-6 mm tube bends on about 15 mm). */
const TUBE_ROOM_MM = 15;
/** Supply tube wall, mm (from memory: common 4/6 and 6/9 mm drip tubing has 1-1.5 mm walls). */
const TUBE_WALL_MM = 1.5;
/** Guide slots. */
const SLOT_COUNT = 3;
const SLOT_WIDTH_MM = 4;
/** Label: JSCAD vectorText height and relief, mm (digits stand 1.5 x this: 4.5 mm; 0.6 mm proud reads at a 0.4 mm nozzle, common practice). */
const LABEL_HEIGHT_MM = 3;
/** The label's box over its vectorText height, strokes included (measured: "88.8g" spans -0.5 to 1.5 x the height, strokes 0.18 x). */
const LABEL_BOX_PER_HEIGHT = 2.2;
const LABEL_DEPTH_MM = 0.6;
/** Flange under the label, mm (about five 0.2 mm layers). */
const FLANGE_THICKNESS_MM = 1.0;
/** Label width over its vectorText height for up to 5 characters, strokes included (measured: "88.8g" is 5.86 x its height plus the stroke). */
const LABEL_WIDTH_PER_HEIGHT = 6.6;
/** Largest cup rim radius, mm (a cup of about 0.2 L; a heavier test takes a jar on top). */
const CUP_RIM_MAX_MM = 45;
/** Smallest cup the grower still fills easily, mL. */
const CUP_MIN_ML = 20;
/** Foot flange reach past the chamber wall, mm. */
const FOOT_REACH_MM = 10;

const tanO = Math.tan((OVERHANG_DEG * Math.PI) / 180);
const sinO = Math.sin((OVERHANG_DEG * Math.PI) / 180);

/**
 * Volume of a solid of revolution from its half-section polygon [r, z], mm3
 * (Pappus' centroid theorem written over the polygon's edges:
 * V = (pi / 3) |sum (r_i + r_j)(r_i z_j - r_j z_i)|). Example: the square
 * [0,0],[1,0],[1,1],[0,1] gives pi (a unit cylinder).
 */
export function revolvedVolumeMm3(profile: readonly (readonly [number, number])[]): number {
  let s = 0;
  for (let i = 0; i < profile.length; i++) {
    const [ri, zi] = profile[i];
    const [rj, zj] = profile[(i + 1) % profile.length];
    s += (ri + rj) * (ri * zj - rj * zi);
  }
  return (Math.PI / 3) * Math.abs(s);
}

/** The mass label as printed: one decimal below 100 g, whole grams above. */
export function plungerLabelText(massG: number): string {
  return `${massG < 100 ? massG.toFixed(1) : Math.round(massG).toFixed(0)}g`;
}

/** Base half-section corners [r, z], counter-clockwise (as used), for true circles. */
export function standBaseProfile(b: StandBaseSpec): [number, number][] {
  const flareTop = b.footThicknessMm + (b.footRadiusMm - b.outerRadiusMm) * tanO;
  const ring: [number, number][] = [
    [b.chamberRadiusMm, 0],
    [b.footRadiusMm, 0],
    [b.footRadiusMm, b.footThicknessMm],
    [b.outerRadiusMm, flareTop],
    [b.outerRadiusMm, b.deckTopZMm],
  ];
  if (b.guideOuterRadiusMm < b.outerRadiusMm) ring.push([b.guideOuterRadiusMm, b.deckTopZMm]);
  ring.push(
    [b.guideOuterRadiusMm, b.guideTopZMm],
    [b.guideInnerRadiusMm, b.guideTopZMm],
    [b.guideInnerRadiusMm, b.deckTopZMm],
    [b.seatBoreMm / 2, b.deckTopZMm],
    [b.seatBoreMm / 2, b.seatBottomZMm],
    [b.chamberRadiusMm, b.roofFootZMm],
  );
  return ring;
}

/** Plunger half-section corners [r, z] as used (pad face at z = 0), counter-clockwise, for true circles. */
export function standPlungerProfile(p: StandPlungerSpec): [number, number][] {
  const Rs = p.stemRadiusMm;
  const Rc = p.cupRimRadiusMm;
  const w = p.cupWallMm / sinO; // wall across the cone, taken horizontally
  const rimZ = p.heightMm;
  const flangeZ = rimZ - p.flangeThicknessMm;
  const stemTop = flangeZ - (Rc - Rs) * tanO;
  const apexZ = rimZ - (Rc - w) * tanO;
  return [
    [p.pocketRadiusMm, 0],
    [Rs, 0],
    [Rs, stemTop],
    [Rc, flangeZ],
    [Rc + p.flangeWidthMm, flangeZ],
    [Rc + p.flangeWidthMm, rimZ],
    [Rc - w, rimZ],
    [0, apexZ],
    [0, p.pocketDepthMm],
    [p.pocketRadiusMm, p.pocketDepthMm],
  ];
}

/**
 * The stand's dimensions from the design's own parts: the seat bore and length
 * are the housing's (so the same nozzle fits the same way), the pad pocket is
 * the float's, and the cup holds 1.5 x the tight-seal force at the highest head
 * as water (less the plunger), between CUP_MIN_ML and a rim of CUP_RIM_MAX_MM.
 * The plunger's mass is its plastic (Pappus volume x density) plus the pad.
 */
export function standSpec(o: StandSpecOptions): StandSpec {
  const t = Math.max(o.wallMm, 1.2);
  const cupT = Math.max(2 * o.lineWidthMm, 0.8);
  const n = o.nozzle;
  const f = o.float;
  const gap = o.printClearanceMm + RUNNING_GAP_MM;
  const seatLength = o.housing.deckThicknessMm + o.housing.bossHeightMm;
  const seatR = o.housing.seatBoreMm / 2;

  // Plunger stem: the pocket with a wall round it, and no narrower than the nozzle's shoulder it rides over.
  const pocketR = f.pocketRadiusMm;
  const labelW = LABEL_HEIGHT_MM * LABEL_WIDTH_PER_HEIGHT;
  const stemR = Math.max(pocketR + t, n.shoulderDiameterMm / 2 + t);
  const cupW = cupT / sinO;
  // the cup's apex dips into the stem: keep a floor above the pocket
  const stemLength = Math.max(2 * stemR, f.pocketDepthMm + t + (stemR - cupW) * tanO);

  const plungerFor = (rimR: number): StandPlungerSpec => {
    const heightMm = stemLength + (rimR - stemR) * tanO + FLANGE_THICKNESS_MM;
    // the label's straight line fits on the flat flange: inner edge past the rim, corners inside the edge
    const box = LABEL_BOX_PER_HEIGHT * LABEL_HEIGHT_MM;
    const labelC = rimR + 0.5 + box / 2;
    const flangeW = Math.hypot(labelW / 2, labelC + box / 2) + 0.5 - rimR;
    const draft: StandPlungerSpec = {
      stemRadiusMm: stemR,
      stemLengthMm: stemLength,
      pocketRadiusMm: pocketR,
      pocketDepthMm: f.pocketDepthMm,
      cupRimRadiusMm: rimR,
      cupWallMm: cupT,
      flangeWidthMm: flangeW,
      flangeThicknessMm: FLANGE_THICKNESS_MM,
      cupCapacityMl: 0,
      heightMm,
      label: { text: '', heightMm: LABEL_HEIGHT_MM, depthMm: LABEL_DEPTH_MM, centerOffsetMm: labelC, maxWidthMm: labelW },
      plasticVolumeMm3: 0,
      plasticMassG: 0,
      padMassG: o.padMassG,
      massG: 0,
    };
    const ri = rimR - cupW;
    draft.cupCapacityMl = (Math.PI * ri * ri * ri * tanO) / 3 / 1000;
    draft.plasticVolumeMm3 = revolvedVolumeMm3(standPlungerProfile(draft));
    draft.plasticMassG = (draft.plasticVolumeMm3 * o.materialDensityKgM3) / 1e6;
    draft.massG = draft.plasticMassG + o.padMassG;
    draft.label.text = plungerLabelText(draft.massG);
    return draft;
  };

  // Cup: smallest rim that holds the water the highest head may need (bisection: capacity grows with the rim).
  const needG = (1.5 * o.sealForceAtHeadMaxN * 1000) / STANDARD_GRAVITY;
  const enough = (p: StandPlungerSpec) => p.cupCapacityMl * (o.liquidDensityKgM3 / 1000) >= Math.max(CUP_MIN_ML, needG - p.massG);
  let lo = stemR + 2 * cupW;
  let hi = CUP_RIM_MAX_MM;
  const cupCapped = !enough(plungerFor(hi));
  if (!cupCapped && !enough(plungerFor(lo))) {
    for (let k = 0; k < 40; k++) {
      const mid = (lo + hi) / 2;
      if (enough(plungerFor(mid))) hi = mid;
      else lo = mid;
    }
  } else if (!cupCapped) hi = lo;
  const plunger = plungerFor(Math.max(hi, stemR + 2 * cupW));

  // Base: the nozzle's shoulder on the deck, its lip up; the plunger's pad on the lip.
  const guideInner = stemR + gap;
  const guideOuter = guideInner + t;
  const tubeOuter = o.tubeInnerDiameterMm + 2 * TUBE_WALL_MM;
  const barbBelow = n.totalLengthMm - n.protrusionMm - seatLength;
  const chamberR = Math.max(guideOuter - t, seatR + tubeOuter / 2 + TUBE_ROOM_MM / 2);
  const outerR = chamberR + t;
  const footR = outerR + FOOT_REACH_MM;
  const footT = Math.max(t, 2);
  const roofRise = (chamberR - seatR) * tanO;
  const flareTop = footT + (footR - outerR) * tanO;
  const exitW = tubeOuter + 2;
  const exitH = tubeOuter + 3 + (exitW / 2) * tanO;
  // the roof's foot stays above the tube's exit, so the exit goes through the straight wall
  const seatBottom = Math.max(barbBelow + TUBE_ROOM_MM, roofRise + exitH + 2);
  const deckTop = seatBottom + seatLength;
  const lipTop = deckTop + n.protrusionMm;
  const padFace = lipTop + f.padProudMm; // the plunger's underside with the pad resting on the lip
  const guideTop = padFace + stemLength - LIFT_MM;
  const base: StandBaseSpec = {
    footRadiusMm: footR,
    footThicknessMm: footT,
    chamberRadiusMm: chamberR,
    outerRadiusMm: outerR,
    seatBoreMm: o.housing.seatBoreMm,
    seatLengthMm: seatLength,
    seatBottomZMm: seatBottom,
    roofFootZMm: seatBottom - roofRise,
    deckTopZMm: deckTop,
    guideInnerRadiusMm: guideInner,
    guideOuterRadiusMm: guideOuter,
    guideTopZMm: guideTop,
    slots: { count: SLOT_COUNT, widthMm: SLOT_WIDTH_MM, floorZMm: deckTop - 0.5 },
    tubeExit: { widthMm: exitW, heightMm: exitH },
    heightMm: guideTop,
    volumeMm3: 0,
    massG: 0,
  };
  base.volumeMm3 = standBaseVolumeMm3(base);
  base.massG = (base.volumeMm3 * o.materialDensityKgM3) / 1e6;
  return { base, plunger, lipTopZMm: lipTop, plungerSeatedZMm: padFace, guideGapMm: gap, cupCapped };
}

/**
 * Base volume: the revolved profile less the guide slots (boxes through the
 * guide wall, down into the deck by half a millimetre) and the tube exit
 * (a box plus its pointed top through the wall, less the flare, taken as a box
 * through the wall thickness and foot). Approximate to about 1 %.
 */
export function standBaseVolumeMm3(b: StandBaseSpec): number {
  const body = revolvedVolumeMm3(standBaseProfile(b));
  const slotDepth = b.guideTopZMm - b.deckTopZMm;
  const slots = b.slots.count * b.slots.widthMm * (b.guideOuterRadiusMm - b.guideInnerRadiusMm) * slotDepth;
  const slotDeck = b.slots.count * b.slots.widthMm * (b.outerRadiusMm - b.guideInnerRadiusMm) * (b.deckTopZMm - b.slots.floorZMm);
  const w = b.tubeExit.widthMm;
  const pointH = (w / 2) * tanO;
  const exitArea = w * (b.tubeExit.heightMm - pointH) + (w * pointH) / 2;
  // foot and flare in the exit's width: reach past the wall is (footR - outerR) up to the flange top, then falls at the flare
  const reach = b.footRadiusMm - b.outerRadiusMm;
  const flare = Math.min(b.tubeExit.heightMm - pointH, reach * tanO);
  const footPart = w * (reach * b.footThicknessMm + reach * flare - (flare * flare) / (2 * tanO));
  const exit = exitArea * (b.outerRadiusMm - b.chamberRadiusMm) + footPart;
  return body - slots - slotDeck - exit;
}

/** The stand for a sized design (the same parts, the design's pad, material and highest-head seal force). */
export function standSpecOf(sizing: SizingSuccess): StandSpec {
  const p = sizing.parts;
  // a lever's nozzle sits in the frame's deck as in the housing's, and its pad in the arm's pocket
  const carrier =
    sizing.architecture === 'direct'
      ? sizing.parts.float
      : { pocketRadiusMm: sizing.parts.arm.pocketDiameterMm / 2, pocketDepthMm: sizing.parts.arm.pocketDepthMm, padProudMm: sizing.inputs.padThicknessM * 1e3 - sizing.parts.arm.pocketDepthMm };
  return standSpec({
    housing: sizing.architecture === 'direct' ? sizing.parts.housing : sizing.parts.frame,
    nozzle: p.nozzle,
    float: carrier,
    tubeInnerDiameterMm: sizing.inputs.tubeInnerDiameterM * 1000,
    wallMm: sizing.inputs.wallM * 1000,
    lineWidthMm: sizing.inputs.lineWidthM * 1000,
    printClearanceMm: sizing.parts.printClearanceMm,
    materialDensityKgM3: sizing.inputs.materialDensityKgM3,
    padMassG: sizing.mass.byPart.pad,
    sealForceAtHeadMaxN: sizing.closingForce.atHeadMaxN,
    liquidDensityKgM3: sizing.inputs.liquidDensityKgM3,
  });
}
