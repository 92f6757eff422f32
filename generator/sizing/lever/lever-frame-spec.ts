import { PRINT_CLEARANCE_MM } from '../constants.ts';
import { ANCHOR_DIAMETER_MM } from '../parts/housing-spec.ts';
import type { NozzleSpec } from '../result.ts';
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
}

/**
 * The frame around the arm (LeverFrameSpec). The cheeks stand a print clearance
 * off the arm each side and a wall thick, and reach a wall plus a clearance past
 * the arm's eye fore and aft; the pin holes in them are the arm's (pin + 2
 * clearances, pointed roof down when mounted, up in the deck-down print). The
 * deck sits over the nozzle exactly as the direct valve's: its underside the
 * nozzle's protrusion plus the boss above the tip. On the floor the cheeks stand
 * on a foot plate with room for anchor screws at the sides and behind (print:
 * deck down, so the foot is the top of the print, carried by 50-degree gussets);
 * on the rim they stop a wall under the pin hole's point, and a back plate takes
 * the stem's screws.
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
  const cheekBottom = floor ? 0 : o.pivotZMm - pointedHoleApexMm(a.holeDiameterMm / 2, SELF_SUPPORT_ANGLE_DEG) - t;
  const anchorRoom = ANCHOR_DIAMETER_MM + 2 * t;
  return {
    mount: o.mount,
    wallMm: t,
    cheekGapMm: cheekGap,
    widthMm: width,
    postHalfLengthMm: post,
    cheekBottomZMm: cheekBottom,
    pivotZMm: o.pivotZMm,
    pinHoleDiameterMm: a.holeDiameterMm,
    deckFrontXMm: a.padArmMm + bossOuter / 2,
    deckWidthMm: Math.max(width, bossOuter),
    deckBottomZMm: deckBottom,
    deckThicknessMm: o.deckThicknessMm,
    seatBoreMm: seatBore,
    bossOuterDiameterMm: bossOuter,
    bossHeightMm: o.bossHeightMm,
    footBackXMm: floor ? -post - anchorRoom : -post - t,
    footWidthMm: floor ? width + 2 * anchorRoom : width,
    footThicknessMm: floor ? Math.max(t, 2) : t,
    heightMm: top - cheekBottom,
  };
}
