import { flowFigures } from './flow-figures.ts';
import { sealFigures } from './seal-figures.ts';
import { FILAMENT_DIAMETER_MM, ORIFICE_DISCHARGE_COEFFICIENT, OVERFLOW_MARGIN_M, PRINT_CLEARANCE_MM } from './constants.ts';
import { depthForForceMm } from './float/depth-for-force.ts';
import { floatOuterVolumeMm3 } from './float/float-shape.ts';
import { leakToleranceMl } from './float/leak-tolerance-ml.ts';
import { circleArea } from './hydrostatics/circle-area.ts';
import { pressurePa } from './hydrostatics/pressure-pa.ts';
import type { SupplyFlowResult } from './hydraulics/index.ts';
import type { DesignBasis } from './layout/design-basis.ts';
import { armLoad, floatPushForHead, floatPushForPadForce, padForceFromPush } from './lever/layout-lever.ts';
import { leverBasisFromDesign } from './lever/lever-basis.ts';
import { anchorSlotsInWords } from './lever/lever-frame-volume-mm3.ts';
import { leverPad } from './lever/lever-pad.ts';
import type { LeverCandidate } from './lever/lever-types.ts';
import { searchLever, type LeverSearchOutcome } from './lever/search-lever.ts';
import { rimMountVolumesMm3 } from './rim/rim-mount-volumes.ts';
import { RIM_ADJUST_MM } from './rim/rim-constants.ts';
import type { DesignInputs, Mount } from './inputs.ts';
import type { Choice, LeverSizing, Warning } from './result.ts';
import { landStrain } from './seal/land-strain.ts';
import { lineForDesign, type FlowBand } from './throttle/line-for-design.ts';
import { throttleReportOf } from './throttle/throttle-report.ts';
import { valveCharacteristic } from './throttle/valve-characteristic.ts';

const fmt = (x: number, digits = 1) => Number(x.toFixed(digits)).toString();

/**
 * Lever searches already run within one sizing (withLeverSearchMemo), by what they read: the inputs less the
 * valve's kind and mount (which only pick the searches to run), and the mount searched. A failure's ways out
 * ask again for searches the sizing has just run (the other mount, the wide search); a search is pure, so its
 * answer is kept rather than worked out twice. Nothing is kept from one sizing to the next, so each sizing
 * (and the benchmark's timing of it) does all its own work.
 */
let memo: Map<string, LeverSearchOutcome | null> | null = null;
const searchKey = (inp: DesignInputs, mount: Mount) =>
  `${mount} ${JSON.stringify(inp, (k, v) => (k === 'architecture' || k === 'mount' ? undefined : v))}`;

/** Runs `work` (one sizing) with its lever searches kept for its own repeats; nested calls share the outer one's. */
export function withLeverSearchMemo<T>(work: () => T): T {
  if (memo) return work();
  memo = new Map();
  try {
    return work();
  } finally {
    memo = null;
  }
}

/** The lever search for one mount (the rim's height and wall from the inputs; null on the rim without a rim height). */
export function searchLeverFor(b: DesignBasis, mount: Mount, limitMm?: number): LeverSearchOutcome | null {
  const inp = limitMm === undefined ? b.inputs : { ...b.inputs, maxOuterDiameterM: limitMm / 1e3 };
  if (!memo) return searchLeverUncached(b, inp, mount);
  const key = searchKey(inp, mount);
  let outcome = memo.get(key);
  if (outcome === undefined) memo.set(key, (outcome = searchLeverUncached(b, inp, mount)));
  return outcome;
}

function searchLeverUncached(b: DesignBasis, inp: DesignInputs, mount: Mount): LeverSearchOutcome | null {
  const lb = leverBasisFromDesign(inp === b.inputs ? b : { ...b, inputs: inp });
  if (mount === 'floor') return searchLever(lb, { mount: 'floor' });
  if (inp.rimHeightM === null) return null;
  return searchLever(lb, { mount: 'rim', rim: { rimHeightMm: inp.rimHeightM * 1e3, wallThicknessMm: inp.containerWallM * 1e3 } });
}

/** Printed plastic of a lever candidate, g (the pad is cut, not printed). */
export function leverPlasticG(c: LeverCandidate, materialDensityKgM3: number): number {
  const v = c.volumes;
  return (v.armMm3 + v.frameMm3 + v.floatMm3 + v.nozzleMm3 + v.pinMm3) * 1e-9 * materialDensityKgM3 * 1e3;
}

export interface LeverFlows {
  qMax: SupplyFlowResult;
  qMin: SupplyFlowResult;
  qMaxLow: SupplyFlowResult;
  qMaxHigh: SupplyFlowResult;
}

/**
 * A sized lever valve from the lightest candidate of the lever search (generator/sizing/lever):
 * the same pad, nozzle and flows as the direct valve (DesignBasis), the float's figures at the
 * float (its own lift and push; closingForce stays the force at the pad), the characteristic
 * through the arm (valveCharacteristic with the ratio and the moment balance), and the lever's
 * and rim's own figures (issue 13, size --json).
 */
export function leverSizing(b: DesignBasis, c: LeverCandidate, outcome: LeverSearchOutcome, flows: LeverFlows, choice: Choice, commonWarnings: Warning[]): LeverSizing {
  const inp = b.inputs;
  const rho = inp.liquidDensityKgM3;
  const lb = leverBasisFromDesign(b);
  const f = c.float;
  const massKg = c.floatMassKg;
  const loadFull = armLoad(lb, c.arm);
  const pushFor = (padForceN: number) => floatPushForPadForce(loadFull, padForceN).floatPushN;
  const depthAt = (pushN: number, kg = massKg) => depthForForceMm(f, pushN, kg, rho);
  const delta = b.indentationMm;
  const ratio = c.ratio;
  const floorZ = c.mount === 'rim' ? RIM_ADJUST_MM : 0;
  const pushMin = floatPushForHead(lb, loadFull, inp.headMinM).floatPushN;
  const restTurnRad = Math.asin(Math.min(1, (c.restTravelMm + delta) / c.arm.padArmMm));
  // float bottom, small turns: the float moves `ratio` times as far as the pad
  const touchBottom = c.floatBottomZMm - delta * ratio;
  const restBottom = c.floatBottomZMm - (c.restTravelMm + delta) * ratio;
  const floating = depthAt(pushFor(0));

  const characteristicAt = (headM: number, band: FlowBand) =>
    valveCharacteristic({
      line: lineForDesign(inp, headM, b.nozzle.totalLengthMm * 1e-3, band),
      lip: { boreM: inp.orificeM, lipM: inp.sealDiameterM, filmAreaM2: b.filmAreaM2, dischargeCoefficient: ORIFICE_DISCHARGE_COEFFICIENT },
      float: f,
      floatMassKg: massKg,
      touchBottomMm: touchBottom,
      indentationMm: delta,
      restBottomMm: restBottom,
      sealForceN: b.sealForceN(headM),
      floatPerPad: ratio,
      floatPushN: pushFor,
    });
  const { qMax, qMin } = flows;
  const throttle = throttleReportOf(b, characteristicAt, qMax.flowLph, qMin.flowLph);

  // the pad in service: the stop takes the float's push past the stop's squeeze; without it, the float's whole lift through the arm
  const strainUnder = (forceN: number) =>
    landStrain({ forceN, pressurePa: 0, boreAreaM2: b.boreAreaM2, landAreaM2: b.landAreaM2, stiffnessPa: b.pad.stiffnessPa });
  const padForceFlooded = c.reserve * b.forceAtHeadMaxN;
  const worstWithoutStop = Math.max(b.strainAtSeal, strainUnder(b.forceAtHeadMaxN), strainUnder(padForceFlooded));
  const stepM3 = 1e-8;
  const levelRisePerMl = (depthAt(c.floatPushAtHeadMaxN) - depthAt(c.floatPushAtHeadMaxN, massKg - rho * stepM3)) / (stepM3 * 1e6);

  const rhoM = inp.materialDensityKgM3;
  const gramsOf = (mm3: number) => mm3 * 1e-9 * rhoM * 1e3;
  const rimV = c.rim ? rimMountVolumesMm3(c.rim) : { hangerMm3: 0, stemMm3: 0 };
  const frameOnlyMm3 = c.volumes.frameMm3 - rimV.hangerMm3 - rimV.stemMm3;
  const byPart = {
    frame: gramsOf(frameOnlyMm3),
    arm: gramsOf(c.volumes.armMm3),
    float: gramsOf(c.volumes.floatMm3),
    nozzle: gramsOf(c.volumes.nozzleMm3),
    pin: gramsOf(c.volumes.pinMm3),
    pad: c.padMassKg * 1e3,
    hanger: gramsOf(rimV.hangerMm3),
    stem: gramsOf(rimV.stemMm3),
  };
  const plasticMm3 = c.volumes.armMm3 + c.volumes.frameMm3 + c.volumes.floatMm3 + c.volumes.nozzleMm3 + c.volumes.pinMm3;
  const armLengthMm = c.arm.tipXMm - c.arm.tailXMm;

  return {
    ok: true,
    inputs: { ...inp, demandLpd: inp.demandM3s * 8.64e7 },
    architecture: 'lever',
    mount: c.mount,
    footprintMm: c.footprintMm,
    choice,
    ...sealFigures(b, worstWithoutStop),
    float: {
      outerDiameterMm: f.outerDiameterMm,
      heightMm: f.heightMm,
      cylinderHeightMm: f.cylinderHeightMm,
      volumeMm3: floatOuterVolumeMm3(f),
      shellVolumeMm3: c.volumes.floatMm3,
      massG: massKg * 1e3,
      availableForceN: c.floatAvailableN,
      reserve: c.reserve,
      sealDepthAtHeadMaxMm: c.sealDepthMm,
      sealDepthAtHeadMinMm: depthAt(pushMin),
      shellMm: f.shellMm,
      dryMassG: byPart.float,
      leakToleranceMl: leakToleranceMl(c.floatAvailableN, c.floatPushAtHeadMaxN, rho),
      levelRisePerMlMm: levelRisePerMl,
    },
    nozzle: {
      tipHeightMm: c.tipZMm,
      travelMm: c.restTravelMm,
      minimumTravelMm: b.minimumTravelMm,
      orificeMm: inp.orificeM * 1e3,
      sealDiameterMm: inp.sealDiameterM * 1e3,
      massG: byPart.nozzle,
    },
    levels: {
      targetMm: inp.targetLevelM * 1e3,
      shutOffAtHeadMaxMm: c.shutOffAtHeadMaxMm,
      shutOffAtHeadMinMm: c.shutOffAtHeadMinMm,
      liftOffMm: restBottom + floating,
      firstTouchMm: touchBottom + floating,
      throttleStartMm: touchBottom + floating,
      contactMm: throttle.headMax.contactMm,
      flow50Mm: throttle.flow50Mm,
      flow10Mm: throttle.flow10Mm,
      flow1Mm: throttle.flow1Mm,
      heldAtDemandMm: throttle.heldAtDemandMm,
      heldAtDemandLowTankMm: throttle.heldAtDemandLowTankMm,
      lowTank: { throttleStartMm: touchBottom + floating, contactMm: throttle.headMin.contactMm, ...throttle.lowTank },
      // lowered as a whole, the valve can go down until the float at rest meets the floor (on the rim: its lowest setting)
      minimumReachableMm: inp.targetLevelM * 1e3 - Math.max(0, c.restLowestZMm - floorZ),
      overflowMm: inp.overflowM === null ? null : inp.overflowM * 1e3,
    },
    ...flowFigures(inp, b.nozzle.totalLengthMm, flows, throttle),
    lever: {
      ratio,
      pivotHeightMm: c.pivotZMm,
      armLengthMm,
      hysteresisMm: c.hysteresisMm,
      padArmMm: c.arm.padArmMm,
      floatArmMm: c.arm.floatArmMm,
      floatPushAtHeadMaxN: c.floatPushAtHeadMaxN,
      floatPushAtHeadMinN: pushMin,
      frictionTorqueNmm: c.frictionTorqueNmm,
      armWeightN: c.armWeightN,
      armCentroidMm: c.armCentroidMm,
      padTiltDeg: c.padTiltDeg,
      lipGapMm: c.lipGapMm,
      restTravelMm: c.restTravelMm,
      padForceFromPush: { perNewton: padForceFromPush(loadFull, 1) - padForceFromPush(loadFull, 0), offsetN: padForceFromPush(loadFull, 0) },
    },
    rim: c.rim
      ? {
          adjustMm: c.rim.adjustMm,
          rimHeightMm: inp.rimHeightM! * 1e3,
          wallThicknessMm: inp.containerWallM * 1e3,
          stemLengthMm: c.rim.stem.lengthMm,
          valveTopZMm: c.frame.cheekBottomZMm + c.frame.heightMm,
        }
      : null,
    frame: { heightMm: c.frame.heightMm, widthMm: c.frame.widthMm, massG: byPart.frame },
    arm: { massG: byPart.arm },
    pin: { diameterMm: c.pin.diameterMm, massG: byPart.pin },
    holdDown: c.holdDown,
    mass: {
      totalG: gramsOf(plasticMm3) + byPart.pad,
      filamentM: plasticMm3 / circleArea(FILAMENT_DIAMETER_MM) / 1e3,
      byPart,
    },
    boundBy: outcome.boundBy,
    warnings: [...commonWarnings, ...leverWarnings(c)],
    parts: {
      printClearanceMm: PRINT_CLEARANCE_MM,
      arm: c.arm,
      frame: c.frame,
      float: f,
      nozzle: c.nozzle,
      pin: c.pin,
      rim: c.rim,
      pad: (({ diameterMm, thicknessMm, proudMm }) => ({ diameterMm, thicknessMm, proudMm }))(leverPad(b)),
      volumes: { armMm3: c.volumes.armMm3, frameMm3: frameOnlyMm3, floatMm3: c.volumes.floatMm3, nozzleMm3: c.volumes.nozzleMm3, pinMm3: c.volumes.pinMm3, ...rimV },
      mount: { pivotZMm: c.pivotZMm, nozzleTipZMm: c.tipZMm, floatSealZMm: c.floatBottomZMm, restTurnRad },
    },
  };
}

/** The lever's own warnings: holding it down in a flood. */
function leverWarnings(c: LeverCandidate): Warning[] {
  const w: Warning[] = [];
  const h = c.holdDown;
  if (c.mount === 'floor' && h.anchorForceN > 0) {
    w.push({
      code: 'hold-down',
      message: `If the container floods, the float tips the frame up about its back edge: screw the ${anchorSlotsInWords(c.frame)} anchor wings down (${fmt(h.anchorForceN, 2)} N between them) or add ${fmt(h.ballastSteelG, 0)} g of steel ballast on them.`,
    });
  }
  if (c.mount === 'rim' && h.anchorForceN > 0) {
    w.push({
      code: 'hold-down',
      message: `If the container floods, the float lifts the valve with ${fmt(h.upliftN, 2)} N: tighten the hanger's clamp screw against the wall so it cannot ride up.`,
    });
  }
  return w;
}

/** The tight shut-off at full tank too near the overflow (the same rule as the direct valve's). */
export function leverTooNearOverflow(c: LeverCandidate, overflowM: number | null): boolean {
  return overflowM !== null && c.shutOffAtHeadMaxMm > (overflowM - OVERFLOW_MARGIN_M) * 1e3 + 1e-9;
}
