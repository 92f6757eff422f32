import { PRINT_CLEARANCE_MM } from '../constants.ts';
import { PIN_DIAMETER_MM } from '../parts/pin-spec.ts';
import { FLOAT_SOCKET_DEPTH_MM, SELF_SUPPORT_ANGLE_DEG } from './lever-constants.ts';
import { pointedHoleApexMm } from './pointed-hole-area-mm2.ts';
import type { LeverArmSpec } from './lever-types.ts';

export interface LeverArmOptions {
  /** a_pad and a_float, mm from the pivot axis */
  padArmMm: number;
  floatArmMm: number;
  /** print wall and line width, mm */
  wallMm: number;
  lineWidthMm: number;
  /** the lever's pad: diameter, thickness and how far it stands proud of the arm, mm */
  padDiameterMm: number;
  padThicknessMm: number;
  padProudMm: number;
  /**
   * turn of the arm, nose down from level, at which the back of the eye should
   * meet the frame's back wall (the rest stop), rad; default none: the eye ends
   * as far behind the pivot as in front
   */
  restTurnRad?: number;
}

/** Smallest bar width, mm (common practice: a printed bar this wide does not twist under a few newtons). */
export const MIN_BAR_WIDTH_MM = 8;
/** Smallest bar depth, mm (common practice). */
export const MIN_BAR_DEPTH_MM = 4;

/** Round a length up to the half millimetre, clear of floating-point fuzz. */
const upHalf = (mm: number) => Math.ceil(mm * 2 - 1e-9) / 2;

/**
 * The arm's dimensions for a pad arm and a float arm (LeverArmSpec):
 * - pin hole: pin diameter + 2 print clearances, centred one wall plus its radius
 *   under the top face; its pointed roof (SELF_SUPPORT_ANGLE_DEG) plus one wall
 *   below sets the eye's depth; the eye is one wall longer than the hole in front,
 *   and behind reaches back as far as the rest stop asks (restTurnRad,
 *   armStopTurnRad): at least as far as in front, at most a clearance short of
 *   the frame's back wall;
 * - bar: at least MIN_BAR_WIDTH_MM and four walls wide; deep enough for the pad
 *   pocket (pad thickness less what stands proud) over a floor of three lines;
 * - pad table: the pocket (pad + 2 clearances) and one wall round it;
 * - tongue: 1 mm narrower than the bar, one clearance short of the float's socket,
 *   so the bar bears on the float's plateau; the bar ends half its width past it.
 */
export function leverArmSpec(o: LeverArmOptions): LeverArmSpec {
  const c = PRINT_CLEARANCE_MM;
  const t = o.wallMm;
  const holeR = PIN_DIAMETER_MM / 2 + c;
  const holeCentreDepth = t + holeR;
  const pocketDepth = Math.max(0, o.padThicknessMm - o.padProudMm);
  const barDepth = upHalf(Math.max(MIN_BAR_DEPTH_MM, pocketDepth + 3 * o.lineWidthMm));
  const eyeDepth = Math.max(barDepth, upHalf(holeCentreDepth + pointedHoleApexMm(holeR, SELF_SUPPORT_ANGLE_DEG) + t));
  const barWidth = upHalf(Math.max(MIN_BAR_WIDTH_MM, 4 * t));
  const pocketDiameter = o.padDiameterMm + 2 * c;
  // the rest stop: the eye's lower back edge meets the back wall (a clearance and a wall past the front of the eye)
  // at the rest turn: heel cos(theta) + (depth below the axis) sin(theta) = wall; never nearer the wall than a clearance
  const eyeHalf = holeR + t;
  const wall = eyeHalf + c + t;
  const below = eyeDepth - holeCentreDepth;
  const theta = o.restTurnRad ?? 0;
  const heel = theta > 0 ? Math.min(wall - c, Math.max(eyeHalf, (wall - below * Math.sin(theta)) / Math.cos(theta))) : eyeHalf;
  // half a millimetre inside the bar each side, so the tongue's round never grazes the bar's flat sides
  const tongue = barWidth - 1;
  return {
    padArmMm: o.padArmMm,
    floatArmMm: o.floatArmMm,
    barWidthMm: barWidth,
    barDepthMm: barDepth,
    tailXMm: -heel,
    tipXMm: o.floatArmMm + barWidth / 2,
    eyeHalfLengthMm: eyeHalf,
    eyeDepthMm: eyeDepth,
    holeDiameterMm: 2 * holeR,
    holeCentreDepthMm: holeCentreDepth,
    holeRoofAngleDeg: SELF_SUPPORT_ANGLE_DEG,
    tableHalfSideMm: pocketDiameter / 2 + t,
    pocketDiameterMm: pocketDiameter,
    pocketDepthMm: pocketDepth,
    tongueDiameterMm: tongue,
    tongueLengthMm: FLOAT_SOCKET_DEPTH_MM - c,
  };
}
