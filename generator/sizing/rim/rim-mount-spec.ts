import { PRINT_CLEARANCE_MM } from '../constants.ts';
import { ANCHOR_DIAMETER_MM } from '../parts/housing-spec.ts';
import { RIM_ADJUST_MM, RIM_MIN_LEG_MM, RIM_OUTER_LEG_MM, RIM_PILOT_HOLE_MM, RIM_SCREW_PITCH_MM } from './rim-constants.ts';

export interface RimMountOptions {
  /** rim (top of the container wall) above the floor, mm */
  rimHeightMm: number;
  /** container wall thickness, mm */
  wallThicknessMm: number;
  /** top of the valve (its highest plastic) above the floor as hung at the middle of the slot, mm */
  valveTopZMm: number;
  /** print wall, mm */
  printWallMm: number;
}

/**
 * Rim mount, mm. Mounted frame: x = 0 the wall's inner face, x > 0 inside the
 * container, z up from the floor. The hanger is an upside-down U over the wall
 * (a gap of the wall plus one print clearance each side); its inner leg carries
 * two pilot holes one pitch apart (M3 screws cut their own thread in them); a
 * third through the outer leg takes a clamp screw that presses the wall, so the
 * float's lift in a flood cannot raise the hanger off the rim. The stem, a flat bar against the inner leg,
 * has a slot over those screws (slide it up or down by adjustMm either way, then
 * tighten) and two holes at its foot one pitch apart for the valve's back plate.
 */
export interface RimMountSpec {
  adjustMm: number;
  /** clearance for the screws (slot width, the stem's valve holes), mm */
  screwHoleDiameterMm: number;
  /** the hanger's holes, into which the screws cut their own thread (horizontal when printed: pointed roof), mm */
  pilotHoleDiameterMm: number;
  screwPitchMm: number;
  hanger: {
    gapMm: number;
    legMm: number;
    /** along the wall */
    widthMm: number;
    innerLegLengthMm: number;
    outerLegLengthMm: number;
    /** underside of the bridge over the wall, and the upper screw hole's centre, mm above the floor */
    bridgeBottomZMm: number;
    upperHoleZMm: number;
    /** a clamp screw through the middle of the outer leg presses the wall, so a flood cannot lift the hanger off (pilot hole) */
    clampHoleZMm: number;
  };
  stem: {
    widthMm: number;
    thicknessMm: number;
    lengthMm: number;
    topZMm: number;
    bottomZMm: number;
    /** slot: centre-to-centre length and the height of its middle (as hung nominally) */
    slotLengthMm: number;
    slotMiddleZMm: number;
    /** the valve's screws: the upper one's centre */
    valveUpperHoleZMm: number;
  };
  /** depth behind the valve's back face to the hanger's outer face (stem + inner leg + gap + outer leg), mm */
  behindDepthMm: number;
  /** width of stem and hanger along the wall, mm */
  widthMm: number;
  /** the valve is too tall for this rim: its screws would sit in the slot's range */
  tooLow: boolean;
}

const upHalf = (mm: number) => Math.ceil(mm * 2 - 1e-9) / 2;

/**
 * The hanger and slotted stem for a rim and a valve hung under it:
 * - legs and stem: print wall, at least RIM_MIN_LEG_MM; width: a screw hole with two walls each side;
 * - hanger holes: the upper one a leg plus a hole and a wall under the bridge, the lower one a pitch lower;
 * - slot: the pitch plus twice the adjustment, centre to centre, middle between the hanger's holes;
 * - valve holes: under the valve's top by a hole and a wall; the stem's foot a hole and a wall under the lower.
 */
export function rimMountSpec(o: RimMountOptions): RimMountSpec {
  const c = PRINT_CLEARANCE_MM;
  const t = o.printWallMm;
  const d = ANCHOR_DIAMETER_MM;
  const p = RIM_SCREW_PITCH_MM;
  const leg = upHalf(Math.max(RIM_MIN_LEG_MM, t));
  const width = upHalf(d + 4 * t);
  const gap = o.wallThicknessMm + 2 * c;
  const bridgeBottom = o.rimHeightMm + c;
  const upperHole = bridgeBottom - (d / 2 + t);
  const lowerHole = upperHole - p;
  const innerLeg = bridgeBottom - (lowerHole - d / 2 - t);
  const slotLength = p + 2 * RIM_ADJUST_MM;
  const slotMiddle = (upperHole + lowerHole) / 2;
  const stemTop = slotMiddle + slotLength / 2 + d / 2 + t;
  const slotBottomEdge = slotMiddle - slotLength / 2 - d / 2;
  const valveUpper = o.valveTopZMm - (d / 2 + t);
  const stemBottom = valveUpper - p - d / 2 - t;
  return {
    adjustMm: RIM_ADJUST_MM,
    screwHoleDiameterMm: d,
    pilotHoleDiameterMm: RIM_PILOT_HOLE_MM,
    screwPitchMm: p,
    hanger: {
      gapMm: gap,
      legMm: leg,
      widthMm: width,
      innerLegLengthMm: innerLeg,
      outerLegLengthMm: RIM_OUTER_LEG_MM,
      bridgeBottomZMm: bridgeBottom,
      upperHoleZMm: upperHole,
      clampHoleZMm: bridgeBottom - RIM_OUTER_LEG_MM / 2,
    },
    stem: {
      widthMm: width,
      thicknessMm: leg,
      lengthMm: stemTop - stemBottom,
      topZMm: stemTop,
      bottomZMm: stemBottom,
      slotLengthMm: slotLength,
      slotMiddleZMm: slotMiddle,
      valveUpperHoleZMm: valveUpper,
    },
    behindDepthMm: leg + leg + gap + leg,
    widthMm: width,
    // the valve's upper screw needs a wall between its hole and the slot's lower end
    tooLow: valveUpper + d / 2 + t > slotBottomEdge + 1e-9,
  };
}
