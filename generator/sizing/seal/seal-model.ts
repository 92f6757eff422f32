import { MIN_SEATING_INDENTATION_M, PAD_STOP_STRAIN, STANDARD_GRAVITY } from '../constants.ts';
import { circleArea } from '../hydrostatics/circle-area.ts';
import { closingForceN } from '../hydrostatics/closing-force-n.ts';
import { fitSealCalibration } from '../hydrostatics/fit-seal-calibration.ts';
import { pressurePa } from '../hydrostatics/pressure-pa.ts';
import type { DesignInputs } from '../inputs.ts';
import { filmAreaM2 } from './film-area-m2.ts';
import { gasketAreaM2 } from './gasket-area-m2.ts';
import { landStrain } from './land-strain.ts';
import type { PadMaterial } from './pads.ts';
import { seatingForceN } from './seating-force-n.ts';

/** The seal of one design: its pad, the force for a tight seal at any head, and how far the pad gives. */
export interface SealModel {
  pad: PadMaterial;
  /** true when the sizing chose the pad (document said "auto" or nothing) */
  padChosen: boolean;
  boreAreaM2: number;
  /** contact ring (d_o to d_s) */
  landAreaM2: number;
  filmAreaM2: number;
  /** area in the force model: the gasket-factor area, or the bench fit's */
  modelAreaM2: number;
  /** seating force: the model's F_seat, or the bench fit's intercept */
  seatN: number;
  fromCalibration: boolean;
  calibrationRmsN: number;
  /** force for a tight seal at a head, N */
  sealForceN: (headM: number) => number;
  /** pad strain under the land at the tight seal at H_max */
  strainAtSeal: number;
  /** indentation at the tight seal at H_max, mm */
  indentationMm: number;
  /** indentation at the tight seal at H_min, mm (less pressure, less push: the shallower of the two) */
  indentationAtHeadMinMm: number;
  /** indentation at which the hard stop takes the push (25 % of the pad), mm */
  stopIndentationMm: number;
}

/**
 * The seal at the nozzle (DESIGN second part, "Seal, pad and closing force"):
 * F_seal(H) = p(H) A_m + F_seat with A_m the gasket-factor area for the pad's m
 * (gasket-area-m2.ts) and F_seat the larger of y on the ring and the push that
 * seats the pad by MIN_SEATING_INDENTATION_M (seating-force-n.ts); bench points
 * replace A_m and F_seat by their fitted line. The pad indents by the contact
 * model of land-strain.ts.
 */
export function sealModel(inp: DesignInputs, pad: PadMaterial, padChosen: boolean): SealModel {
  const dO = inp.orificeM;
  const dS = inp.sealDiameterM;
  const boreArea = circleArea(dO);
  const landArea = circleArea(dS) - boreArea;
  const rho = inp.liquidDensityKgM3;
  let area = gasketAreaM2(dO, dS, pad.gasketFactor);
  let seat = seatingForceN({
    seatingStressPa: pad.seatingStressPa,
    meanDiameterM: (dO + dS) / 2,
    effectiveWidthM: (dS - dO) / 4,
    stiffnessPa: pad.stiffnessPa,
    thicknessM: inp.padThicknessM,
    seatingIndentationM: MIN_SEATING_INDENTATION_M,
  });
  let rms = 0;
  const fromCalibration = inp.calibration.length > 0;
  if (fromCalibration) {
    const fit = fitSealCalibration(inp.calibration, rho, seat);
    area = fit.sealAreaM2;
    seat = Math.max(0, fit.preloadN);
    rms = fit.rmsResidualN;
  }
  const sealForceN = (headM: number) => closingForceN({ headM, sealAreaM2: area, preloadN: seat, densityKgM3: rho });
  const strainAt = (headM: number) =>
    landStrain({
      forceN: sealForceN(headM),
      pressurePa: pressurePa(headM, rho, STANDARD_GRAVITY),
      boreAreaM2: boreArea,
      landAreaM2: landArea,
      stiffnessPa: pad.stiffnessPa,
    });
  const strain = strainAt(inp.headMaxM);
  const tMm = inp.padThicknessM * 1e3;
  return {
    pad,
    padChosen,
    boreAreaM2: boreArea,
    landAreaM2: landArea,
    filmAreaM2: filmAreaM2(dO, dS),
    modelAreaM2: area,
    seatN: seat,
    fromCalibration,
    calibrationRmsN: rms,
    sealForceN,
    strainAtSeal: strain,
    indentationMm: strain * tMm,
    indentationAtHeadMinMm: strainAt(inp.headMinM) * tMm,
    stopIndentationMm: PAD_STOP_STRAIN * tMm,
  };
}
