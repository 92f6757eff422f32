import { FLOAT_GAP_MM, PRINT_CLEARANCE_MM } from '../constants.ts';
import { circleArea, diameterForArea } from '../hydrostatics/circle-area.ts';
import { closingForceN } from '../hydrostatics/closing-force-n.ts';
import { fitSealCalibration } from '../hydrostatics/fit-seal-calibration.ts';
import { nozzleSpec } from '../parts/nozzle-spec.ts';
import type { DesignInputs } from '../inputs.ts';
import type { NozzleSpec } from '../result.ts';

/** Everything that does not depend on the float's size: forces, pad, nozzle, travel. */
export interface DesignBasis {
  inputs: DesignInputs;
  sealAreaM2: number;
  preloadN: number;
  equivalentSealDiameterMm: number;
  fromCalibration: boolean;
  calibrationRmsN: number;
  forceAtHeadMaxN: number;
  forceAtHeadMinN: number;
  /** pad disc and how it sits */
  padDiameterMm: number;
  padProudMm: number;
  padMassKg: number;
  floatShellMm: number;
  /** radial gap float to bore: functional gap + print clearance */
  radialGapMm: number;
  deckThicknessMm: number;
  bossHeightMm: number;
  nozzle: NozzleSpec;
  minimumTravelMm: number;
  /** travel aimed for when the target leaves room: twice the minimum, at least 4 mm */
  preferredTravelMm: number;
}

/** Collar engagement in the seat, mm: at least 6 mm or one collar diameter (common practice for press fits). */
const MIN_SEAT_LENGTH_MM = 6;

export function designBasis(inp: DesignInputs): DesignBasis {
  let sealArea = circleArea(inp.sealDiameterM);
  let preload = inp.preloadN;
  let rms = 0;
  const fromCalibration = inp.calibration.length > 0;
  if (fromCalibration) {
    const fit = fitSealCalibration(inp.calibration, inp.liquidDensityKgM3, inp.preloadN);
    sealArea = fit.sealAreaM2;
    preload = Math.max(0, fit.preloadN);
    rms = fit.rmsResidualN;
  }
  const force = (headM: number) =>
    closingForceN({ headM, sealAreaM2: sealArea, preloadN: preload, densityKgM3: inp.liquidDensityKgM3 });
  const lineMm = inp.lineWidthM * 1e3;
  const sealMm = inp.sealDiameterM * 1e3;
  const padThicknessMm = inp.padThicknessM * 1e3;
  const indentationMm = inp.indentationM * 1e3;
  const radialGap = FLOAT_GAP_MM + PRINT_CLEARANCE_MM;
  // The pad must cover the lip wherever the float drifts in its bore, with 1 mm to spare; cut to a half millimetre.
  const padDiameter = Math.ceil((sealMm + 2 * radialGap + 2) * 2) / 2;
  // The pad stands 1 mm proud (twice the indentation if that is more), never more than its thickness.
  const padProud = Math.min(padThicknessMm, Math.max(1, 2 * indentationMm));
  const padVolumeM3 = circleArea(padDiameter * 1e-3) * inp.padThicknessM;
  const wallMm = inp.wallM * 1e3;
  const deck = Math.max(wallMm, 2);
  const collarGuess = Math.max(inp.tubeInnerDiameterM * 1e3 * 1.15, sealMm) + 4 * lineMm;
  const seatLength = Math.max(MIN_SEAT_LENGTH_MM, collarGuess);
  const nozzle = nozzleSpec({
    orificeMm: inp.orificeM * 1e3,
    sealDiameterMm: sealMm,
    tubeInnerDiameterMm: inp.tubeInnerDiameterM * 1e3,
    indentationMm,
    lineWidthMm: lineMm,
    seatLengthMm: seatLength,
    printClearanceMm: PRINT_CLEARANCE_MM,
  });
  // DESIGN: s >= max(d_o / 2, 1.5 mm), so the curtain pi d_o s is at least twice the orifice area.
  const minimumTravel = Math.max((inp.orificeM * 1e3) / 2, 1.5);
  return {
    inputs: inp,
    sealAreaM2: sealArea,
    preloadN: preload,
    equivalentSealDiameterMm: diameterForArea(sealArea) * 1e3,
    fromCalibration,
    calibrationRmsN: rms,
    forceAtHeadMaxN: force(inp.headMaxM),
    forceAtHeadMinN: force(inp.headMinM),
    padDiameterMm: padDiameter,
    padProudMm: padProud,
    padMassKg: padVolumeM3 * inp.padDensityKgM3,
    floatShellMm: 3 * lineMm,
    radialGapMm: radialGap,
    deckThicknessMm: deck,
    bossHeightMm: seatLength - deck,
    nozzle,
    minimumTravelMm: minimumTravel,
    preferredTravelMm: Math.max(2 * minimumTravel, 4),
  };
}
