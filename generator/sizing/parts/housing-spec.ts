import type { HousingSpec } from '../result.ts';

export interface HousingSpecOptions {
  /** bore, mm: float diameter + 2 (functional gap + print clearance) */
  boreMm: number;
  wallMm: number;
  /** underside of the deck, mm above the base */
  deckBottomZMm: number;
  deckThicknessMm: number;
  /** seat: bore for the nozzle collar, and the boss that lengthens it under the deck */
  seatBoreMm: number;
  bossHeightMm: number;
  /** drain notch size (drainNotchSize) */
  notch: { widthMm: number; heightMm: number };
  /** retainer pin diameter, mm, and the height of its holes' centre */
  pinDiameterMm: number;
  pinHoleCenterZMm: number;
  printClearanceMm: number;
  /** the float's guide: sleeve bore and outer diameter, its mouth and the stop ring's face (mounted z), the stop ring's bore */
  guide: { boreMm: number; outerDiameterMm: number; mouthZMm: number; stopZMm: number; stopBoreMm: number };
}

/** Vent holes through the deck (DESIGN: at least two of 3 mm); three so one blocked vent is harmless. */
export const VENT_COUNT = 3;
export const VENT_DIAMETER_MM = 3;
/** Slots through the guide sleeve, from its mouth up past the boss's underside, so the air above the collar reaches the vents (common practice: a trapped pocket pushes back). */
export const GUIDE_SLOT_COUNT = 3;
export const GUIDE_SLOT_WIDTH_MM = 2;
/** The slots reach this far into the boss above its underside, mm, so no air is left above their tops. */
export const GUIDE_SLOT_RISE_MM = 0.5;
/**
 * The pin holes' teardrop roof, degrees from the horizontal. Where the hole leaves the
 * foot's flare, the roof and the flare meet in an edge where each printed layer of height h
 * steps out by h cot(roof) and h cot(flare) at once, h sqrt(cot^2 roof + cot^2 flare) in all:
 * 1.19 h for a 50-degree roof in a 50-degree flare, more than the h cot 45deg = h a slicer
 * allows at a 45-degree threshold. A 58-degree roof in a 60-degree flare steps 0.85 h
 * (elementary geometry). Measured with PrusaSlicer at 0.3 mm layers on the presets: 50/50
 * put support under the pin holes, 58/60 none (55/60 and 55/63 still some). The roof is
 * kept as low as that allows: the pin's lowest height grows with 1 / cos(roof).
 */
export const PIN_HOLE_ROOF_DEG = 58;
/** The foot's flare, degrees from the bed once printed deck-down (see PIN_HOLE_ROOF_DEG for why it is steeper than 50). */
export const FOOT_FLARE_DEG = 60;
export const FOOT_FLARE_RISE = Math.tan((FOOT_FLARE_DEG * Math.PI) / 180);
/** Drain notches: six around the rim, at least 4 x 4 mm (common practice: roots and grit pass). */
export const NOTCH_COUNT = 6;
export const NOTCH_MIN_MM = 4;
/** Drain notches are sized for this multiple of the required area. */
export const NOTCH_AREA_MARGIN = 1.25;
/** Anchor holes in the foot: three, clearing an M3 screw or a tent peg (common practice). */
export const ANCHOR_COUNT = 3;
export const ANCHOR_DIAMETER_MM = 3.5;

/** Height of the drain notches for a bore and a required area, and their width (mm). */
export function drainNotchSize(boreMm: number, drainAreaMm2: number): { widthMm: number; heightMm: number } {
  const want = drainAreaMm2 * NOTCH_AREA_MARGIN;
  // a notch may take at most half of its share of the circumference
  const widthCap = (Math.PI * boreMm) / NOTCH_COUNT / 2;
  const width = Math.min(widthCap, Math.max(NOTCH_MIN_MM, want / (NOTCH_COUNT * NOTCH_MIN_MM)));
  const height = Math.max(NOTCH_MIN_MM, want / (NOTCH_COUNT * width));
  return { widthMm: width, heightMm: height };
}

/**
 * Where the loaded pin sits in its hole. The hole is a teardrop of radius
 * R = r + c whose point (sides at a = PIN_HOLE_ROOF_DEG from the horizontal) faces down
 * when mounted (up in the deck-down print). The pin settles into that V: a circle
 * of radius r touching both sides has its centre r / cos a above the point, and
 * the point is R / cos a below the hole centre, so the pin's centre sits
 * c / cos a below the hole centre. (The pin's flat, at r cos 50deg, ends below
 * those two touching points, so it sits the same either way up.) Elementary geometry.
 */
export function pinDropBelowHoleCentreMm(printClearanceMm: number): number {
  return printClearanceMm / Math.cos((PIN_HOLE_ROOF_DEG * Math.PI) / 180);
}

/**
 * Lowest the retainer pin's top can sit, mm: notch height, one wall of plastic
 * between the notch and the teardrop's point, then the teardrop (its point
 * (r + c) / cos a below its centre), less the pin's drop into the point:
 * notch + wall + r (1 + 1 / cos a), a = PIN_HOLE_ROOF_DEG.
 */
export function pinTopMinimumMm(notchHeightMm: number, wallMm: number, pinDiameterMm: number): number {
  return notchHeightMm + wallMm + (pinDiameterMm / 2) * (1 + 1 / Math.cos((PIN_HOLE_ROOF_DEG * Math.PI) / 180));
}

/**
 * The housing's dimensions (mounted, z up from the base). The foot is a flange
 * carrying the anchor holes under a flare (FOOT_FLARE_DEG) that reaches the flange's
 * edge, so printed deck-down nothing overhangs flatter than 50 degrees. The boss
 * under the deck widens into the float's guide: a sleeve (guide.boreMm) hanging
 * to guide.mouthZMm, with a stop ring inside it (guide.stopBoreMm) down to
 * guide.stopZMm, cut by GUIDE_SLOT_COUNT air slots.
 */
export function housingSpec(o: HousingSpecOptions): HousingSpec {
  const t = o.wallMm;
  const outer = o.boreMm + 2 * t;
  const notch = o.notch;
  const holeDiameter = o.pinDiameterMm + 2 * o.printClearanceMm;
  const flange = Math.max(t, 2);
  const anchorRadius = outer / 2 + 2 * t + ANCHOR_DIAMETER_MM / 2;
  const footOuter = 2 * (anchorRadius + ANCHOR_DIAMETER_MM / 2 + t);
  const bossOuter = o.guide.outerDiameterMm;
  return {
    boreMm: o.boreMm,
    wallMm: t,
    outerDiameterMm: outer,
    heightMm: o.deckBottomZMm + o.deckThicknessMm,
    deckBottomZMm: o.deckBottomZMm,
    deckThicknessMm: o.deckThicknessMm,
    seatBoreMm: o.seatBoreMm,
    bossOuterDiameterMm: bossOuter,
    bossHeightMm: o.bossHeightMm,
    vents: { count: VENT_COUNT, diameterMm: VENT_DIAMETER_MM, circleRadiusMm: (bossOuter / 2 + o.boreMm / 2) / 2 },
    drainNotches: { count: NOTCH_COUNT, widthMm: notch.widthMm, heightMm: notch.heightMm, angleOffsetDeg: 0 },
    pinHoles: { diameterMm: holeDiameter, centerZMm: o.pinHoleCenterZMm },
    guide: {
      boreMm: o.guide.boreMm,
      mouthZMm: o.guide.mouthZMm,
      stopZMm: o.guide.stopZMm,
      stopBoreMm: o.guide.stopBoreMm,
      slots: { count: GUIDE_SLOT_COUNT, widthMm: GUIDE_SLOT_WIDTH_MM, riseMm: GUIDE_SLOT_RISE_MM, angleOffsetDeg: 60 },
    },
    foot: {
      outerDiameterMm: footOuter,
      flangeThicknessMm: flange,
      flareWidthMm: footOuter / 2 - outer / 2,
      // between the notches, and clear of the pin holes on the x axis
      anchorHoles: { count: ANCHOR_COUNT, diameterMm: ANCHOR_DIAMETER_MM, circleRadiusMm: anchorRadius, angleOffsetDeg: 90 },
    },
  };
}
