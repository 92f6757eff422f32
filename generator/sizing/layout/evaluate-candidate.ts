import { PART_SIZE_CAP_MM, PRINT_CLEARANCE_MM } from '../constants.ts';
import { availableLiftN, depthForForceMm } from '../float/depth-for-force.ts';
import { floatOuterVolumeMm3, floatShape, floatShellVolumeMm3 } from '../float/float-shape.ts';
import { drainNotchSize, housingSpec, pinDropBelowHoleCentreMm, pinTopMinimumMm, VENT_DIAMETER_MM } from '../parts/housing-spec.ts';
import { housingOuterRadiusAtMm, housingVolumeMm3, nozzleVolumeMm3, pinVolumeMm3 } from '../parts/part-volumes.ts';
import { PIN_DIAMETER_MM, pinSpec } from '../parts/pin-spec.ts';
import { fitsBed, printBedMm } from '../parts/print-bed.ts';
import type { FloatSpec, HousingSpec, PinSpec } from '../result.ts';
import type { DesignBasis } from './design-basis.ts';
import { guidedTilt, type GuidedTilt } from './guided-tilt.ts';

/** Why a candidate size fails; the codes appear in `boundBy` and in failure reasons. */
export type ConstraintCode =
  | 'float-shape'
  | 'reserve'
  | 'seal-in-cylinder'
  | 'travel'
  | 'outer-diameter-limit'
  | 'part-size'
  | 'vent-room'
  | 'tilt-offset'
  | 'tilt-gap'
  | 'bed-size';

export interface FloatSizing {
  float: FloatSpec;
  massKg: number;
  outerVolumeMm3: number;
  shellVolumeMm3: number;
  availableN: number;
  reserve: number;
  /** submerged depth when pressing with the force needed at H_max, mm */
  sealDepthMm: number;
}

/** The float alone, from its diameter and cylinder height (mm); null if the shape does not close. */
export function sizeFloat(b: DesignBasis, outerDiameterMm: number, cylinderHeightMm: number): FloatSizing | null {
  const float = floatShape({
    outerDiameterMm,
    cylinderHeightMm,
    shellMm: b.floatShellMm,
    padDiameterMm: b.padDiameterMm,
    padThicknessMm: b.inputs.padThicknessM * 1e3,
    padProudMm: b.padProudMm,
    clearanceMm: PRINT_CLEARANCE_MM,
    rimMm: b.floatShellMm,
    collarMinRadiusMm: b.guide.collarMinRadiusMm,
    collarHeightMm: b.guide.collarHeightMm,
  });
  if (!float) return null;
  const shell = floatShellVolumeMm3(float);
  const outer = floatOuterVolumeMm3(float);
  const massKg = shell * 1e-9 * b.inputs.materialDensityKgM3 + b.padMassKg;
  const rho = b.inputs.liquidDensityKgM3;
  const availableN = availableLiftN(outer, massKg, rho);
  return {
    float,
    massKg,
    outerVolumeMm3: outer,
    shellVolumeMm3: shell,
    availableN,
    reserve: availableN / b.forceAtHeadMaxN,
    sealDepthMm: depthForForceMm(float, b.forceAtHeadMaxN, massKg, rho),
  };
}

/** Float-frame heights of the guide at the tight seal: the sleeve's mouth (print clearance above the collar's foot when the stop holds). */
export function guideMouthInFloatMm(b: DesignBasis, f: FloatSpec): number {
  return f.cylinderHeightMm + f.coneHeightMm + b.guide.stopGapMm + PRINT_CLEARANCE_MM;
}

/** Worst tilt of this float at the tight seal, in its bore and guide (guidedTilt), and the pad's margin on the lip. */
export function floatTilt(b: DesignBasis, f: FloatSpec): GuidedTilt & { padMarginMm: number; pivotZMm: number } {
  const R = f.outerDiameterMm / 2;
  const pivotZ = f.heightMm + f.padProudMm - b.indentationMm;
  const tilt = guidedTilt({
    floatRadiusMm: R,
    boreRadiusMm: R + b.radialGapMm,
    cylinderHeightMm: f.cylinderHeightMm,
    guide: {
      collarRadiusMm: f.plateauRadiusMm,
      sleeveRadiusMm: f.plateauRadiusMm + b.guide.playMm,
      collarTopZMm: f.heightMm,
      sleeveMouthZMm: guideMouthInFloatMm(b, f),
      stopGapMm: b.guide.stopGapMm,
    },
    pivotZMm: pivotZ,
    lipDiameterMm: b.inputs.sealDiameterM * 1e3,
  });
  return {
    maxAngleDeg: tilt.maxAngleDeg,
    padOffsetMm: tilt.padOffsetMm,
    lipGapMm: tilt.lipGapMm,
    padMarginMm: b.padDiameterMm / 2 - (b.inputs.sealDiameterM * 1e3) / 2,
    pivotZMm: pivotZ,
  };
}

/** The float constraints of its lift alone (reserve, seal depth): cheap, and they ease as the float grows taller. */
export function floatLiftViolations(b: DesignBasis, f: FloatSizing | null): ConstraintCode[] {
  if (!f) return ['float-shape'];
  const v: ConstraintCode[] = [];
  if (f.reserve < b.inputs.reserve) v.push('reserve');
  if (!(f.sealDepthMm <= f.float.cylinderHeightMm)) v.push('seal-in-cylinder');
  return v;
}

/** The float constraints that its cylinder height settles (all ease as the float grows taller). */
export function floatViolations(b: DesignBasis, f: FloatSizing | null): ConstraintCode[] {
  if (!f) return ['float-shape'];
  const v = floatLiftViolations(b, f);
  const tilt = floatTilt(b, f.float);
  if (tilt.padOffsetMm > tilt.padMarginMm + 1e-9) v.push('tilt-offset');
  if (tilt.lipGapMm > b.indentationMm / 2 + 1e-9) v.push('tilt-gap');
  return v;
}

export interface Candidate extends FloatSizing {
  housing: HousingSpec;
  pin: PinSpec;
  pinTopMm: number;
  pinTopMinimumMm: number;
  /** float bottom when sealed at H_max */
  sealBottomMm: number;
  tipMm: number;
  travelMm: number;
  /** lowest target this float could hold at H_max */
  minimumReachableMm: number;
  volumes: { housingMm3: number; floatMm3: number; nozzleMm3: number; pinMm3: number };
  /** printed plastic plus pad, kg */
  totalMassKg: number;
  violations: ConstraintCode[];
}

/**
 * Lays out a complete valve around a float (vertical layout of DESIGN.md):
 * the float sits z(F_need(H_max)) deep when sealed, so its bottom is then at
 * z_b = L - z; the nozzle face sits at z_b + h_f + proud - delta; the pin top is
 * as low as the notches allow, raised on a taller skirt when a deep target would
 * otherwise give more than the preferred travel. `floatCodes`: the float's own
 * violations (floatViolations) when the caller has them already (a new array: the
 * layout's are added to it); default, worked out here.
 */
export function layoutCandidate(b: DesignBasis, f: FloatSizing, drainAreaMm2: number, floatCodes?: ConstraintCode[]): Candidate {
  const inp = b.inputs;
  const wallMm = inp.wallM * 1e3;
  const targetMm = inp.targetLevelM * 1e3;
  const deltaMm = b.indentationMm;
  const bore = f.float.outerDiameterMm + 2 * b.radialGapMm;
  const notch = drainNotchSize(bore, drainAreaMm2);
  const pinMin = pinTopMinimumMm(notch.heightMm, wallMm, PIN_DIAMETER_MM);
  const sealBottom = targetMm - f.sealDepthMm;
  const pinTop = Math.max(pinMin, sealBottom - deltaMm - b.preferredTravelMm);
  const travel = sealBottom - deltaMm - pinTop;
  const tip = sealBottom + f.float.heightMm + b.padProudMm - deltaMm;
  const deckBottom = tip + b.nozzle.protrusionMm + b.bossHeightMm;
  const housing = housingSpec({
    boreMm: bore,
    wallMm,
    deckBottomZMm: deckBottom,
    deckThicknessMm: b.deckThicknessMm,
    seatBoreMm: b.nozzle.collarDiameterMm + 2 * PRINT_CLEARANCE_MM,
    bossHeightMm: b.bossHeightMm,
    notch,
    pinDiameterMm: PIN_DIAMETER_MM,
    // the loaded pin rests in the teardrop's point, c sqrt(2) below the hole centre
    pinHoleCenterZMm: pinTop - PIN_DIAMETER_MM / 2 + pinDropBelowHoleCentreMm(PRINT_CLEARANCE_MM),
    printClearanceMm: PRINT_CLEARANCE_MM,
    guide: {
      boreMm: 2 * (f.float.plateauRadiusMm + b.guide.playMm),
      outerDiameterMm: 2 * (f.float.plateauRadiusMm + b.guide.playMm + wallMm),
      mouthZMm: sealBottom + guideMouthInFloatMm(b, f.float),
      stopZMm: sealBottom + f.float.heightMm + b.guide.stopGapMm,
      stopBoreMm: 2 * b.guide.stopInnerRadiusMm,
    },
  });
  // the pin must cross the housing where it is widest along its section: at its flat
  // (lowest, so deepest in the flare), flatOffset below its axis
  const pinAxisZ = pinTop - PIN_DIAMETER_MM / 2;
  const flatOffset = pinSpec(0, 0).flatOffsetMm;
  const span = 2 * housingOuterRadiusAtMm(housing, pinAxisZ - flatOffset);
  const pin = pinSpec(span, housing.pinHoles.diameterMm);
  const volumes = {
    housingMm3: housingVolumeMm3(housing),
    floatMm3: f.shellVolumeMm3,
    nozzleMm3: nozzleVolumeMm3(b.nozzle),
    pinMm3: pinVolumeMm3(pin),
  };
  const plasticMm3 = volumes.housingMm3 + volumes.floatMm3 + volumes.nozzleMm3 + volumes.pinMm3;
  const violations = floatCodes ?? floatViolations(b, f);
  if (travel < b.minimumTravelMm - 1e-9) violations.push('travel');
  if (housing.foot.outerDiameterMm > inp.maxOuterDiameterM * 1e3 + 1e-9) violations.push('outer-diameter-limit');
  if (housing.heightMm > PART_SIZE_CAP_MM || housing.foot.outerDiameterMm > PART_SIZE_CAP_MM || pin.lengthMm > PART_SIZE_CAP_MM) {
    violations.push('part-size');
  }
  if (bore / 2 - housing.bossOuterDiameterMm / 2 < VENT_DIAMETER_MM + 2) violations.push('vent-room');
  // every part must fit the printer's bed (print.bed) in its print pose
  const bed = printBedMm(inp);
  const foot = housing.foot.outerDiameterMm;
  const d = f.float.outerDiameterMm;
  const footprints: [number, number][] = [[foot, foot], [d, d], [pin.lengthMm + pin.head.lengthMm, pin.head.widthMm]];
  if (!footprints.every(([w, dd]) => fitsBed(w, dd, bed))) violations.push('bed-size');
  // the float's sizing field by field: a spread here cost about as much as the rest of the layout
  return {
    float: f.float,
    massKg: f.massKg,
    outerVolumeMm3: f.outerVolumeMm3,
    shellVolumeMm3: f.shellVolumeMm3,
    availableN: f.availableN,
    reserve: f.reserve,
    sealDepthMm: f.sealDepthMm,
    housing,
    pin,
    pinTopMm: pinTop,
    pinTopMinimumMm: pinMin,
    sealBottomMm: sealBottom,
    tipMm: tip,
    travelMm: travel,
    minimumReachableMm: pinMin + b.minimumTravelMm + deltaMm + f.sealDepthMm,
    volumes,
    totalMassKg: (plasticMm3 - volumes.floatMm3) * 1e-9 * inp.materialDensityKgM3 + f.massKg,
    violations,
  };
}
