/**
 * The sizing core's input: every quantity already converted to SI units
 * (m, kg, N, Pa, s) and every default filled in. The design-document schema
 * (generator/doc) produces this; the sizing core never sees raw text.
 */
export interface CalibrationPoint {
  /** supply head at which the pad was tested, m */
  headM: number;
  /** smallest mass that stopped the flow at that head, kg */
  massKg: number;
}

/** The valve's kind: the float pushing the pad straight up (direct) or on an arm that multiplies its push (lever). */
export type Architecture = 'direct' | 'lever';
/** Where the valve stands: on the container floor, or hung from its rim on a slotted stem. */
export type Mount = 'floor' | 'rim';

export interface DesignInputs {
  /** tank water surface above the nozzle tip, highest, m (H_max) */
  headMaxM: number;
  /** tank water surface above the nozzle tip, lowest, m (H_min <= H_max) */
  headMinM: number;
  /** target reservoir level above the container floor (housing base), m (L) */
  targetLevelM: number;
  /** liquid density, kg/m3 (rho) */
  liquidDensityKgM3: number;
  /** liquid dynamic viscosity, Pa s (mu) */
  liquidViscosityPaS: number;
  /** nozzle orifice (bore) diameter, m (d_o) */
  orificeM: number;
  /** outer diameter of the nozzle lip that presses the pad, m (d_s) */
  sealDiameterM: number;
  /** seal pad: a name from the pad table (generator/sizing/seal/pads.ts), or null to let the sizing choose */
  padName: string | null;
  /** seal pad thickness, m (t_pad) */
  padThicknessM: number;
  /** pad material density, kg/m3 (for the float's mass): the document's, else the pad's own from the table */
  padDensityKgM3: number;
  /** bench points; when present they replace the seating force and the model's area by a fit */
  calibration: CalibrationPoint[];
  /** print material name (as given, or "custom") */
  materialName: string;
  /** print material density, kg/m3 (rho_m) */
  materialDensityKgM3: number;
  /** housing wall thickness, m (t_w) */
  wallM: number;
  /** extrusion line width, m (w_line) */
  lineWidthM: number;
  /** largest footprint diameter the container allows, m */
  maxOuterDiameterM: number;
  /** float's full-submersion lift over the force needed at H_max (SF) */
  reserve: number;
  /** supply tube inner diameter, m (d_t) */
  tubeInnerDiameterM: number;
  /** supply tube length, m (l_t) */
  tubeLengthM: number;
  /** reservoir surface area for fill time, m2, or null when not given */
  reservoirAreaM2: number | null;
  /** reservoir rise for fill time, m, or null when not given */
  reservoirRiseM: number | null;
  /** container overflow height above its floor, m, or null when not given */
  overflowM: number | null;
  /** the plants' peak use drawn from the reservoir, m3/s (>= 0; the document's default when not given) */
  demandM3s: number;
  /** printer bed, m (plates never exceed it) */
  bedWidthM: number;
  bedDepthM: number;
  /** valve.architecture: fixed by the grower, or 'auto' (the sizing picks the least plastic) */
  architecture: Architecture | 'auto';
  /** valve.mount: fixed by the grower, or 'auto'; the rim is only considered when rimHeightM is given */
  mount: Mount | 'auto';
  /** container rim (top of its wall) above the floor, m, or null when not given */
  rimHeightM: number | null;
  /** container wall thickness at the rim, m (the document's default when not given) */
  containerWallM: number;
  /** document fields that were read but no longer mean anything (a first-version file); the sizing warns */
  retiredFields: string[];
}
