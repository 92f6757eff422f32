import { PRINT_CLEARANCE_MM } from '../constants.ts';
import { ANCHOR_DIAMETER_MM } from '../parts/housing-spec.ts';
import type { NozzleSpec } from '../result.ts';
import { RIM_PILOT_HOLE_MM, RIM_SCREW_PITCH_MM } from '../rim/rim-constants.ts';
import { SELF_SUPPORT_ANGLE_DEG } from './lever-constants.ts';
import { pointedHoleApexMm } from './pointed-hole-area-mm2.ts';
import type { LeverArmSpec, LeverFrameSpec } from './lever-types.ts';

export interface LeverFrameOptions {
  mount: 'floor' | 'rim';
  arm: LeverArmSpec;
  nozzle: NozzleSpec;
  /** pivot axis and nozzle tip (sealing face) heights, mm above the floor */
  pivotZMm: number;
  tipZMm: number;
  wallMm: number;
  deckThicknessMm: number;
  bossHeightMm: number;
  /** pad indentation at the tight seal and at the hard stop, mm */
  indentationMm: number;
  padStopIndentationMm: number;
  /** floor: a third anchor wing across the back (default true) */
  backWing?: boolean;
}

/** Length of the stop block along the arm, mm (common practice: a few lines of plastic). */
export const STOP_LENGTH_MM = 3;

/**
 * The frame around the arm (LeverFrameSpec). The cheeks stand a print clearance
 * off the arm each side and a wall thick, and reach a clearance and a wall past
 * the arm's eye fore and aft; the pin holes in them are the arm's (pin + 2
 * clearances, pointed roof down when mounted, up in the deck-down print). The
 * deck sits over the nozzle exactly as the direct valve's housing deck: its
 * underside the nozzle's protrusion plus the boss above the tip; it reaches a
 * wall past the boss, and is at least a wall wider than the boss each side. On
 * the floor the cheeks stand on the floor, with an anchor wing along each side,
 * an anchor slot and two walls wide, and one across the back unless `backWing`
 * is false (the search leaves it off only where the valve would not fit the
 * footprint with it: the side anchors hold at the pivot's x all the same, but
 * nearer the back edge the frame tips about, so with twice or so the force); on
 * the rim they stop a wall under the pin hole's point (or under the lower stem
 * hole's, if lower), and the back wall carries the stem's pilot
 * holes, the upper one a clearance hole's radius and a wall under the deck's top,
 * where the stem's valve holes are (rimMountSpec). The pad's hard stop hangs
 * from the deck's front edge, past the boss and the nozzle's shoulder.
 */
export function leverFrameSpec(o: LeverFrameOptions): LeverFrameSpec {
  const c = PRINT_CLEARANCE_MM;
  const t = o.wallMm;
  const a = o.arm;
  const cheekGap = a.barWidthMm + 2 * c;
  const width = cheekGap + 2 * t;
  const post = a.eyeHalfLengthMm + c + t;
  const seatBore = o.nozzle.collarDiameterMm + 2 * c;
  const bossOuter = seatBore + 2 * t;
  const deckBottom = o.tipZMm + o.nozzle.protrusionMm + o.bossHeightMm;
  const top = deckBottom + o.deckThicknessMm;
  const floor = o.mount === 'floor';
  // hard stop: a block under the deck's front edge, sunk half a millimetre into the boss (so they join, not touch)
  // and clear of the nozzle's shoulder by a clearance; the arm turns up by (stop - seal indentation) / a_pad
  // past the seal before its top meets the block's far edge
  const stopStart = a.padArmMm + Math.max(bossOuter / 2 - 0.5, o.nozzle.shoulderDiameterMm / 2 + c);
  const deckFront = Math.max(a.padArmMm + bossOuter / 2 + t, stopStart + STOP_LENGTH_MM);
  const armTop = o.pivotZMm + a.holeCentreDepthMm;
  const stopGap = ((o.padStopIndentationMm - o.indentationMm) * deckFront) / a.padArmMm;
  const stemUpper = top - (ANCHOR_DIAMETER_MM / 2 + t);
  // on the rim: a wall under the pin hole's point, and under the lower stem hole's
  const cheekBottom = floor
    ? 0
    : Math.min(
        o.pivotZMm - pointedHoleApexMm(a.holeDiameterMm / 2, SELF_SUPPORT_ANGLE_DEG) - t,
        stemUpper - RIM_SCREW_PITCH_MM - pointedHoleApexMm(RIM_PILOT_HOLE_MM / 2, SELF_SUPPORT_ANGLE_DEG) - t,
      );
  const wing = floor ? ANCHOR_DIAMETER_MM + 2 * t : 0;
  const backWing = floor && (o.backWing ?? true);
  return {
    mount: o.mount,
    wallMm: t,
    cheekGapMm: cheekGap,
    widthMm: width,
    postHalfLengthMm: post,
    cheekBottomZMm: cheekBottom,
    pivotZMm: o.pivotZMm,
    pinHoleDiameterMm: a.holeDiameterMm,
    holeRoofAngleDeg: SELF_SUPPORT_ANGLE_DEG,
    padArmMm: a.padArmMm,
    deckFrontXMm: deckFront,
    deckWidthMm: Math.max(width, bossOuter + 2 * t),
    deckBottomZMm: deckBottom,
    deckThicknessMm: o.deckThicknessMm,
    seatBoreMm: seatBore,
    bossOuterDiameterMm: bossOuter,
    bossHeightMm: o.bossHeightMm,
    wingMm: wing,
    footThicknessMm: floor ? Math.max(t, 2) : 0,
    anchorDiameterMm: ANCHOR_DIAMETER_MM,
    stemPilotDiameterMm: RIM_PILOT_HOLE_MM,
    stemPitchMm: RIM_SCREW_PITCH_MM,
    stemUpperHoleZMm: stemUpper,
    stopLengthMm: deckFront - stopStart,
    stopWidthMm: a.barWidthMm - 1,
    stopBottomZMm: armTop + stopGap,
    backWing,
    footBackXMm: -post - t - (backWing ? wing : 0),
    footWidthMm: width + 2 * wing,
    heightMm: top - cheekBottom,
  };
}
