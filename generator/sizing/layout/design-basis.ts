import { FLOAT_GAP_MM, GUIDE_MIN_OVERLAP_MM, GUIDE_RUNNING_GAP_MM, PRINT_CLEARANCE_MM } from '../constants.ts';
import { circleArea, diameterForArea } from '../hydrostatics/circle-area.ts';
import { nozzleSpec } from '../parts/nozzle-spec.ts';
import { chooseSeal } from '../seal/choose-seal.ts';
import type { PadMaterial } from '../seal/pads.ts';
import type { DesignInputs } from '../inputs.ts';
import type { NozzleSpec } from '../result.ts';

/** Everything that does not depend on the float's size: forces, pad, nozzle, travel. */
export interface DesignBasis {
  inputs: DesignInputs;
  /** area in the force model (gasket-factor area, or the bench fit's), m2 */
  sealAreaM2: number;
  /** seating force F_seat (or the bench fit's intercept), N */
  preloadN: number;
  equivalentSealDiameterMm: number;
  fromCalibration: boolean;
  calibrationRmsN: number;
  /** force for a TIGHT seal at H_max and H_min, N (sealForceN at those heads) */
  forceAtHeadMaxN: number;
  forceAtHeadMinN: number;
  /** force for a tight seal at any head, N: p(H) A + F_seat, or the bench line */
  sealForceN: (headM: number) => number;
  /** film force area of the land, pi (r_s^2 - r_o^2) / (2 ln(r_s/r_o)), m2 */
  filmAreaM2: number;
  /** bore area (pi/4) d_o^2, m2 */
  boreAreaM2: number;
  /** contact ring (pi/4)(d_s^2 - d_o^2), m2 */
  landAreaM2: number;
  /** the pad's table row, and whether the sizing chose it */
  pad: PadMaterial;
  padChosen: boolean;
  padStiffnessKpa: number;
  padThicknessMm: number;
  /** pad strain and indentation at the tight seal at H_max */
  strainAtSeal: number;
  indentationMm: number;
  /** pad indentation at the tight seal at H_min (the shallower), mm */
  indentationAtHeadMinMm: number;
  /** indentation at which the hard stop takes the float's push (25 % of the pad), mm */
  padStopIndentationMm: number;
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
  /**
   * The guide near the pad (DESIGN "Tilt, guide and stability"): a collar on the float's
   * top slides in a sleeve hanging from the deck; a ring inside the sleeve is the pad's
   * hard stop, met by the collar's top when the pad is indented padStopIndentationMm.
   */
  guide: {
    /** radial play of the collar in its sleeve: print clearance + running gap, mm */
    playMm: number;
    /** the collar's least radius: the stop ring's inner radius plus a 1 mm land, mm */
    collarMinRadiusMm: number;
    /** collar height: preferred travel + least overlap + stop gap + print clearance, mm */
    collarHeightMm: number;
    /** the stop ring's inner radius: clears the nozzle shoulder by the print clearance, mm */
    stopInnerRadiusMm: number;
    /** how far the float rises past the tight seal before the stop, mm */
    stopGapMm: number;
  };
}

/** Collar engagement in the seat, mm: at least 6 mm or one collar diameter (common practice for press fits). */
const MIN_SEAT_LENGTH_MM = 6;
/** Float shell in extrusion lines: four, so one bad line cannot open a leak path (DESIGN second part; common practice). */
export const FLOAT_SHELL_LINES = 4;

export function designBasis(inp: DesignInputs): DesignBasis {
  const seal = chooseSeal(inp);
  const lineMm = inp.lineWidthM * 1e3;
  const sealMm = inp.sealDiameterM * 1e3;
  const padThicknessMm = inp.padThicknessM * 1e3;
  const indentationMm = seal.indentationMm;
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
  const stopMm = seal.stopIndentationMm;
  const nozzle = nozzleSpec({
    orificeMm: inp.orificeM * 1e3,
    sealDiameterMm: sealMm,
    tubeInnerDiameterMm: inp.tubeInnerDiameterM * 1e3,
    // the lip stands taller than the deepest the pad is ever pressed (the hard stop)
    indentationMm: Math.max(indentationMm, stopMm),
    lineWidthMm: lineMm,
    seatLengthMm: seatLength,
    printClearanceMm: PRINT_CLEARANCE_MM,
  });
  // DESIGN: s >= max(d_o / 2, 1.5 mm), so the curtain pi d_o s is at least twice the orifice area.
  const minimumTravel = Math.max((inp.orificeM * 1e3) / 2, 1.5);
  const preferredTravel = Math.max(2 * minimumTravel, 4);
  const stopGap = Math.max(0, stopMm - indentationMm);
  // the stop ring clears the nozzle's shoulder and the pad standing proud of the float (a wide lip on fine lines
  // makes the pad the wider of the two)
  const stopInner = Math.max(nozzle.shoulderDiameterMm, padDiameter) / 2 + PRINT_CLEARANCE_MM;
  return {
    inputs: inp,
    sealAreaM2: seal.modelAreaM2,
    preloadN: seal.seatN,
    equivalentSealDiameterMm: diameterForArea(seal.modelAreaM2) * 1e3,
    fromCalibration: seal.fromCalibration,
    calibrationRmsN: seal.calibrationRmsN,
    forceAtHeadMaxN: seal.sealForceN(inp.headMaxM),
    forceAtHeadMinN: seal.sealForceN(inp.headMinM),
    sealForceN: seal.sealForceN,
    filmAreaM2: seal.filmAreaM2,
    boreAreaM2: seal.boreAreaM2,
    landAreaM2: seal.landAreaM2,
    pad: seal.pad,
    padChosen: seal.padChosen,
    padStiffnessKpa: seal.pad.stiffnessPa / 1e3,
    padThicknessMm,
    strainAtSeal: seal.strainAtSeal,
    indentationMm,
    indentationAtHeadMinMm: seal.indentationAtHeadMinMm,
    padStopIndentationMm: seal.stopIndentationMm,
    padDiameterMm: padDiameter,
    padProudMm: padProud,
    padMassKg: padVolumeM3 * inp.padDensityKgM3,
    // DESIGN second part: a float shell of four extrusion lines, for watertightness
    floatShellMm: FLOAT_SHELL_LINES * lineMm,
    radialGapMm: radialGap,
    deckThicknessMm: deck,
    bossHeightMm: seatLength - deck,
    nozzle,
    minimumTravelMm: minimumTravel,
    preferredTravelMm: preferredTravel,
    guide: {
      playMm: PRINT_CLEARANCE_MM + GUIDE_RUNNING_GAP_MM,
      collarMinRadiusMm: stopInner + 1,
      collarHeightMm: preferredTravel + GUIDE_MIN_OVERLAP_MM + stopGap + PRINT_CLEARANCE_MM,
      stopInnerRadiusMm: stopInner,
      stopGapMm: stopGap,
    },
  };
}
