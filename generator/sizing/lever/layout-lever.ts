import { PART_SIZE_CAP_MM, PRINT_CLEARANCE_MM, STANDARD_GRAVITY } from '../constants.ts';
import { depthForForceMm } from '../float/depth-for-force.ts';
import { nozzleVolumeMm3, pinVolumeMm3 } from '../parts/part-volumes.ts';
import { PIN_DIAMETER_MM, pinSpec } from '../parts/pin-spec.ts';
import { rimMountSpec, type RimMountSpec } from '../rim/rim-mount-spec.ts';
import { rimMountVolumesMm3 } from '../rim/rim-mount-volumes.ts';
import { RIM_ADJUST_MM } from '../rim/rim-constants.ts';
import { fitsBed, printBedMm } from '../parts/print-bed.ts';
import { armStopTurnRad } from './arm-stop-turn-rad.ts';
import { armWeightInLiquidN } from './arm-weight-in-liquid-n.ts';
import { leverHoldDown } from './lever-hold-down.ts';
import { floatLowestZMm } from './float-lowest-z-mm.ts';
import { frictionLevelBandMm } from './friction-level-band-mm.ts';
import { leverArmVolume } from './lever-arm-volume.ts';
import { FLOAT_TO_FRAME_GAP_MM, PIVOT_FRICTION_COEFFICIENT } from './lever-constants.ts';
import { leverFloatPushN } from './lever-float-push-n.ts';
import type { LeverFloat } from './lever-float.ts';
import { leverFrameSpec } from './lever-frame-spec.ts';
import { leverFrameVolumeMm3 } from './lever-frame-volume-mm3.ts';
import { leverPadForceN } from './lever-pad-force-n.ts';
import { leverPad } from './lever-pad.ts';
import type { LeverArmSpec, LeverBasis, LeverCandidate, LeverConstraint } from './lever-types.ts';
import { padArcContact } from './pad-arc-contact.ts';
import { widestExtentMm, type PlanShape } from './widest-extent-mm.ts';

/** The arm with its pad: printed volume, dry weight and centroid (the arm is above the water at the seal). */
export interface ArmLoad {
  arm: LeverArmSpec;
  armMm3: number;
  /** the printed arm's own centroid, mm (without the pad) */
  armOnlyCentroidMm: number;
  padMassKg: number;
  weightN: number;
  centroidMm: number;
}

export function armLoad(lb: LeverBasis, arm: LeverArmSpec): ArmLoad {
  const v = leverArmVolume(arm);
  const pad = leverPad(lb.basis);
  const armKg = v.volumeMm3 * 1e-9 * lb.basis.inputs.materialDensityKgM3;
  const kg = armKg + pad.massKg;
  return { arm, armMm3: v.volumeMm3, armOnlyCentroidMm: v.centroidXMm, padMassKg: pad.massKg, weightN: kg * STANDARD_GRAVITY, centroidMm: (armKg * v.centroidXMm + pad.massKg * arm.padArmMm) / kg };
}

const PIN_RADIUS_MM = PIN_DIAMETER_MM / 2;

/** Float push (closing, friction against it) that holds the seal force of a head. */
export function floatPushForHead(lb: LeverBasis, load: ArmLoad, headM: number, direction: 'closing' | 'opening' = 'closing') {
  return floatPushForPadForce(load, lb.sealForceN(headM), direction);
}

/** Float push (closing, friction against it) that holds a pad force, N. */
export function floatPushForPadForce(load: ArmLoad, padForceN: number, direction: 'closing' | 'opening' = 'closing') {
  return leverFloatPushN({
    padForceN,
    padArmMm: load.arm.padArmMm,
    floatArmMm: load.arm.floatArmMm,
    armWeightN: load.weightN,
    armCentroidMm: load.centroidMm,
    pinRadiusMm: PIN_RADIUS_MM,
    frictionCoefficient: PIVOT_FRICTION_COEFFICIENT,
    direction,
  });
}

/**
 * Pad force a float push gives with friction against it (the moment balance with
 * every arm moved out by the friction circle, valid while the pin carries the arm
 * down, which holds for a ratio above 1).
 */
export function padForceFromPush(load: ArmLoad, floatPushN: number): number {
  const k = PIN_RADIUS_MM * Math.sin(Math.atan(PIVOT_FRICTION_COEFFICIENT));
  return leverPadForceN(floatPushN, load.arm.floatArmMm + k, load.weightN, load.centroidMm + k, load.arm.padArmMm + k);
}

/** Reserve and seal depth of a float on this arm at H_max (what its cylinder height settles); with no float, the push alone. */
export function leverFloatChecks(lb: LeverBasis, load: ArmLoad, f: LeverFloat | null): { reserve: number; sealDepthMm: number; pushN: number } {
  const push = floatPushForHead(lb, load, lb.basis.inputs.headMaxM).floatPushN;
  if (!f) return { reserve: NaN, sealDepthMm: NaN, pushN: push };
  return {
    reserve: padForceFromPush(load, f.availableN) / lb.sealForceN(lb.basis.inputs.headMaxM),
    sealDepthMm: depthForForceMm(f.float, push, f.massKg, lb.basis.inputs.liquidDensityKgM3),
    pushN: push,
  };
}

export interface LeverLayoutOptions {
  mount: 'floor' | 'rim';
  /** rim and wall, mm, for the rim mount */
  rim?: { rimHeightMm: number; wallThicknessMm: number };
  load: ArmLoad;
  float: LeverFloat;
  /** floor: a third anchor wing across the back (default true; see leverFrameSpec) */
  backWing?: boolean;
}

/**
 * The float's lowest point with the pad `travelMm` below the lip (the arm turned theta = asin((travel + delta) / a_pad)),
 * mm: floatLowestZMm. A function of its own, not a closure: layoutLever runs for every candidate of the search.
 */
function lowestAtTravel(arm: LeverArmSpec, floatRadiusMm: number, floatBottomMm: number, pivotZMm: number, indentationMm: number, travelMm: number): number {
  return floatLowestZMm(arm.floatArmMm, floatRadiusMm, floatBottomMm, pivotZMm, Math.asin(Math.min(1, (travelMm + indentationMm) / arm.padArmMm)));
}

/**
 * Lays out a lever valve (heights in mm above the floor):
 * - the float seals at H_max with its bottom at z_b = L - z(F_float), F_float the
 *   closing push with friction (so the level never rises past the target);
 * - the arm lies on the float's plateau; its top face is the plateau + bar depth;
 *   the pad stands proud of it, and the nozzle tip is the pad face less the
 *   indentation; the pivot axis is the hole's centre depth under the top face:
 *   the arm is level at the seal by construction;
 * - at rest the arm turns down until its heel meets the frame's back wall (built
 *   for the preferred travel), or until the float's far bottom corner meets the
 *   floor (on the rim: the floor less the adjustment), whichever first; the pad's
 *   travel then must be at least the minimum;
 * - the frame, the pin across it, and on the rim the hanger and stem follow.
 */
export function layoutLever(lb: LeverBasis, o: LeverLayoutOptions): LeverCandidate {
  const b = lb.basis;
  const inp = b.inputs;
  const rho = inp.liquidDensityKgM3;
  const { load, float: lf } = o;
  const arm = load.arm;
  const f = lf.float;
  const R = f.outerDiameterMm / 2;
  const delta = lb.indentationMm;
  const pad = leverPad(b);
  const targetMm = inp.targetLevelM * 1e3;

  const closeMax = floatPushForHead(lb, load, inp.headMaxM);
  const openMax = floatPushForHead(lb, load, inp.headMaxM, 'opening');
  const closeMin = floatPushForHead(lb, load, inp.headMinM);
  // reserve and seal depth at H_max (the push is closeMax's: the same moment balance)
  const seal = leverFloatChecks(lb, load, lf);
  const sealDepth = seal.sealDepthMm;
  const floatBottom = targetMm - sealDepth;
  const armTop = floatBottom + f.heightMm + arm.barDepthMm;
  const tip = armTop + pad.proudMm - delta;
  const pivot = armTop - arm.holeCentreDepthMm;
  const contact = padArcContact(arm.padArmMm, inp.sealDiameterM * 1e3, delta, tip - pivot);

  const frame = leverFrameSpec({
    mount: o.mount,
    arm,
    nozzle: b.nozzle,
    pivotZMm: pivot,
    tipZMm: tip,
    wallMm: inp.wallM * 1e3,
    deckThicknessMm: b.deckThicknessMm,
    bossHeightMm: b.bossHeightMm,
    indentationMm: delta,
    padStopIndentationMm: lb.padStopIndentationMm,
    backWing: o.backWing ?? true,
  });
  // rest: the arm turns nose down until its heel meets the back wall (armStopTurnRad), or until the float's
  // far bottom corner meets the floor (on the rim: the floor less the adjustment), whichever first; the pad
  // has then dropped a_p sin(theta) - delta from the lip
  const floorZ = o.mount === 'rim' ? RIM_ADJUST_MM : 0;
  const stopTurn = armStopTurnRad(-arm.tailXMm, arm.eyeDepthMm - arm.holeCentreDepthMm, frame.postHalfLengthMm);
  let restTravel = Number.isFinite(stopTurn) ? arm.padArmMm * Math.sin(stopTurn) - delta : arm.padArmMm - delta;
  // raised by this much (a deeper level), the float would clear the floor at the minimum travel; no height helps
  // an arm whose stop comes first
  const travelShortfall =
    restTravel < b.minimumTravelMm - 1e-9 ? Infinity : Math.max(0, floorZ - lowestAtTravel(arm, R, floatBottom, pivot, delta, b.minimumTravelMm), floorZ - floatBottom);
  if (lowestAtTravel(arm, R, floatBottom, pivot, delta, restTravel) < floorZ) {
    let lo = 0;
    let hi = restTravel;
    // 30 halvings: a few tenths of a micrometre on any travel
    for (let i = 0; i < 30; i++) {
      const mid = (lo + hi) / 2;
      if (lowestAtTravel(arm, R, floatBottom, pivot, delta, mid) >= floorZ) lo = mid;
      else hi = mid;
    }
    restTravel = lo;
  }
  const pin = pinSpec(frame.widthMm, arm.holeDiameterMm);
  let rim: RimMountSpec | null = null;
  let rimMm3 = 0;
  if (o.mount === 'rim') {
    if (!o.rim) throw new RangeError('layoutLever: the rim mount needs rim.rimHeightMm and rim.wallThicknessMm');
    rim = rimMountSpec({
      rimHeightMm: o.rim.rimHeightMm,
      wallThicknessMm: o.rim.wallThicknessMm,
      valveTopZMm: frame.cheekBottomZMm + frame.heightMm,
      printWallMm: inp.wallM * 1e3,
    });
    const v = rimMountVolumesMm3(rim);
    rimMm3 = v.hangerMm3 + v.stemMm3;
  }

  const shapes: PlanShape[] = [
    { kind: 'rect', x0: -frame.postHalfLengthMm - frame.wallMm, x1: frame.deckFrontXMm, y0: -frame.deckWidthMm / 2, y1: frame.deckWidthMm / 2 },
    // cheeks and side wings, then the back wall and back wing (if any)
    { kind: 'rect', x0: -frame.postHalfLengthMm - frame.wallMm, x1: frame.postHalfLengthMm, y0: -frame.footWidthMm / 2, y1: frame.footWidthMm / 2 },
    { kind: 'rect', x0: frame.footBackXMm, x1: -frame.postHalfLengthMm, y0: -frame.widthMm / 2, y1: frame.widthMm / 2 },
    { kind: 'rect', x0: arm.tailXMm, x1: arm.tipXMm, y0: -arm.barWidthMm / 2, y1: arm.barWidthMm / 2 },
    { kind: 'circle', x: arm.floatArmMm, y: 0, r: R },
  ];
  if (rim) shapes.push({ kind: 'rect', x0: frame.footBackXMm - rim.behindDepthMm, x1: frame.footBackXMm, y0: -rim.widthMm / 2, y1: rim.widthMm / 2 });
  const footprint = widestExtentMm(shapes);

  const volumes = {
    armMm3: load.armMm3,
    frameMm3: leverFrameVolumeMm3(frame) + rimMm3,
    floatMm3: lf.shellMm3,
    nozzleMm3: nozzleVolumeMm3(b.nozzle),
    pinMm3: pinVolumeMm3(pin),
  };
  const printedMm3 = volumes.armMm3 + volumes.frameMm3 + volumes.floatMm3 + volumes.nozzleMm3 + volumes.pinMm3;

  // flooded: the float lifts its whole reserve; everything else weighs what it weighs wet
  const rhoM = inp.materialDensityKgM3;
  const padWetN = load.padMassKg * (1 - rho / inp.padDensityKgM3) * STANDARD_GRAVITY;
  const armWetN = armWeightInLiquidN(load.armMm3, rhoM, rho, 1) + padWetN;
  const armWetCentroid = (armWeightInLiquidN(load.armMm3, rhoM, rho, 1) * load.armOnlyCentroidMm + padWetN * arm.padArmMm) / armWetN;
  const restWetN = armWeightInLiquidN(volumes.frameMm3 + volumes.nozzleMm3 + volumes.pinMm3, rhoM, rho, 1);
  const hold = leverHoldDown({
    floatLiftN: lf.availableN,
    floatArmMm: arm.floatArmMm,
    armWetWeightN: armWetN,
    armCentroidMm: armWetCentroid,
    restWetWeightN: restWetN,
    backEdgeXMm: frame.footBackXMm,
    // floor: the side anchors sit at the pivot's x; rim: the stem's screws in the back wall carry it all
    anchorXMm: o.mount === 'floor' ? 0 : frame.footBackXMm + frame.wallMm,
    densityKgM3: rho,
  });
  const holdDown =
    o.mount === 'floor'
      ? hold
      : { upliftN: hold.upliftN, tippingMomentNmm: hold.tippingMomentNmm, anchorForceN: Math.max(0, 1.5 * hold.upliftN), ballastSteelG: 0 };

  const violations: LeverConstraint[] = [];
  if (seal.reserve < inp.reserve) violations.push('reserve');
  if (!(sealDepth <= f.cylinderHeightMm)) violations.push('seal-in-cylinder');
  if (restTravel < b.minimumTravelMm - 1e-9 || floatBottom < floorZ) violations.push('travel');
  // clear of the frame at the seal and at rest: turned nose down by theta about the pivot, the float's near bottom
  // corner (a_f - R, z_b) swings back towards the frame to (a_f - R) cos(theta) - (z_p - z_b) sin(theta)
  const restTurn = Math.asin(Math.min(1, (restTravel + delta) / arm.padArmMm));
  const nearAtRest = (arm.floatArmMm - R) * Math.cos(restTurn) - (pivot - floatBottom) * Math.sin(restTurn);
  if (Math.min(arm.floatArmMm - R, nearAtRest) < frame.postHalfLengthMm + FLOAT_TO_FRAME_GAP_MM - 1e-9) violations.push('float-clearance');
  // and the arm's pad table, whose lower back edge swings back the same way, clear of the cheeks by a print clearance
  const tableAtRest = (arm.padArmMm - arm.tableHalfSideMm) * Math.cos(restTurn) - (arm.barDepthMm - arm.holeCentreDepthMm) * Math.sin(restTurn);
  if (tableAtRest < frame.postHalfLengthMm + PRINT_CLEARANCE_MM - 1e-9) violations.push('arm-clearance');
  if (contact.lipGapMm > delta / 2 + 1e-9) violations.push('pad-arc');
  if (footprint > inp.maxOuterDiameterM * 1e3 + 1e-9) violations.push('outer-diameter-limit');
  if (frame.heightMm > PART_SIZE_CAP_MM || arm.tipXMm - arm.tailXMm > PART_SIZE_CAP_MM || f.outerDiameterMm > PART_SIZE_CAP_MM || (rim && rim.stem.lengthMm > PART_SIZE_CAP_MM)) {
    violations.push('part-size');
  }
  if (rim && (rim.tooLow || frame.cheekBottomZMm < RIM_ADJUST_MM)) violations.push('rim-height');
  // every part's print footprint on the bed, either way round: frame deck down, arm top face down, float, pin,
  // hanger on its side, stem flat
  const bed = printBedMm(inp);
  const footprints: [number, number][] = [
    [frame.deckFrontXMm - frame.footBackXMm, Math.max(frame.footWidthMm, frame.deckWidthMm)],
    [arm.tipXMm - arm.tailXMm, Math.max(arm.barWidthMm, 2 * arm.tableHalfSideMm)],
    [f.outerDiameterMm, f.outerDiameterMm],
    [pin.lengthMm + pin.head.lengthMm, pin.head.widthMm],
    ...(rim ? ([[rim.hanger.gapMm + 2 * rim.hanger.legMm, rim.hanger.innerLegLengthMm + rim.hanger.legMm], [rim.stem.lengthMm, rim.stem.widthMm]] as [number, number][]) : []),
  ];
  if (!footprints.every((p) => fitsBed(p[0], p[1], bed))) violations.push('bed-size');
  // the stop must leave the tight seal free: it may only take the push past the seal's indentation
  if (!(lb.padStopIndentationMm > delta)) violations.push('pad-stop');

  return {
    mount: o.mount,
    arm,
    frame,
    float: f,
    pin,
    nozzle: b.nozzle,
    rim,
    ratio: arm.floatArmMm / arm.padArmMm,
    floatMassKg: lf.massKg,
    floatAvailableN: lf.availableN,
    reserve: seal.reserve,
    floatPushAtHeadMaxN: closeMax.floatPushN,
    padForceAtHeadMaxN: lb.sealForceN(inp.headMaxM),
    padForceAtHeadMinN: lb.sealForceN(inp.headMinM),
    sealDepthMm: sealDepth,
    floatBottomZMm: floatBottom,
    tipZMm: tip,
    pivotZMm: pivot,
    shutOffAtHeadMaxMm: floatBottom + sealDepth,
    shutOffAtHeadMinMm: floatBottom + depthForForceMm(f, closeMin.floatPushN, lf.massKg, rho),
    hysteresisMm: frictionLevelBandMm(closeMax.floatPushN, openMax.floatPushN, Math.PI * R * R, rho),
    pivotReactionN: closeMax.pivotReactionN,
    frictionTorqueNmm: closeMax.frictionTorqueNmm,
    armWeightN: load.weightN,
    armCentroidMm: load.centroidMm,
    padTiltDeg: contact.tiltDeg,
    lipGapMm: contact.lipGapMm,
    padSlideMm: contact.slideMm,
    restTravelMm: restTravel,
    restLowestZMm: lowestAtTravel(arm, R, floatBottom, pivot, delta, restTravel),
    travelShortfallMm: travelShortfall,
    footprintMm: footprint,
    volumes,
    holdDown,
    padMassKg: load.padMassKg,
    totalMassKg: printedMm3 * 1e-9 * inp.materialDensityKgM3 + load.padMassKg,
    violations,
  };
}
