/**
 * Fixed constants of the sizing model. Each says where it comes from.
 * SI units unless the name says otherwise.
 */

/** Standard gravity, m/s2. Source: 3rd CGPM (1901); NIST SP 330. */
export const STANDARD_GRAVITY = 9.80665;

/** Water at 20 C, kg/m3. Source: CRC Handbook, properties of water (IAPWS-95), from memory. */
export const WATER_DENSITY_20C = 998.2;

/** Water at 20 C, Pa s. Source: IAPWS 2008 viscosity formulation, from memory. */
export const WATER_VISCOSITY_20C = 1.0016e-3;

/** Steel for ballast, kg/m3. Typical handbook value, from memory. */
export const STEEL_DENSITY = 7850;

/** Print clearance per side for every fit, mm. One fixed constant (common practice for FDM printers). */
export const PRINT_CLEARANCE_MM = 0.25;

/** Functional radial gap between float and bore on top of the print clearance, mm (common practice). */
export const FLOAT_GAP_MM = 0.75;

/** Filament diameter for length estimates, mm (common practice). */
export const FILAMENT_DIAMETER_MM = 1.75;

/** Discharge coefficient of a sharp-edged orifice. Standard fluid mechanics texts, from memory. */
export const ORIFICE_DISCHARGE_COEFFICIENT = 0.61;

/** Loss coefficient of a sharp-edged pipe entrance. Crane Technical Paper 410, from memory. */
export const SHARP_ENTRANCE_LOSS = 0.5;

/** Absolute roughness of drawn plastic tube, m (common practice: 1.5 um). */
export const TUBE_ROUGHNESS_M = 1.5e-6;

/** Largest head the tool sizes for, m: 10 ft (low-pressure only). 1 ft = 0.3048 m exactly (NIST SP 811). */
export const MAX_HEAD_M = 3.048;

/** Head refused past this, m (3.05 m: the 10 ft cap with rounding room). */
export const HEAD_CAP_M = 3.05;

/** Largest extent of any part, mm. */
export const PART_SIZE_CAP_MM = 250;

/** Largest triangle count of any part. */
export const TRIANGLE_CAP = 200_000;

/** Allowed level difference inside vs outside the housing while running wide open, m. */
export const DRAIN_HEAD_LOSS_M = 0.002;

/** Hold-down safety factor on the flood uplift (DESIGN: 1.5 F_up - W). */
export const HOLD_DOWN_FACTOR = 1.5;

/**
 * Indentation that seats a pad on a printed nozzle lip with no pressure behind it, m.
 * The lip's face is the first layer on the bed: its ridges and out-of-flatness are about
 * 0.1 mm (from memory); twice that conforms the pad across the whole ring (common practice).
 */
export const MIN_SEATING_INDENTATION_M = 0.2e-3;

/** Largest compressive strain of a pad in service, with the hard stop (common practice against compression set). */
export const PAD_STOP_STRAIN = 0.25;

/**
 * Largest strain at the tight seal at full tank when the sizing chooses the pad: 5 % short of the
 * stop, so a pad at the soft side of its grade still seals before the stop carries the push (our choice).
 */
export const AUTO_PAD_STRAIN = 0.2;

/** Least height of the container's overflow above the tight shut-off at full tank, m (DESIGN second part). */
export const OVERFLOW_MARGIN_M = 0.01;

/**
 * Least angle between any self-supporting surface and the print bed, degrees. Slicers add
 * automatic supports under faces flatter than their threshold, 45 degrees by default
 * (common practice); 5 degrees of margin keeps faceting and rounding off it, so a slicer
 * with supports on adds nothing (no support trapped in the float's sealed cavity).
 */
export const OVERHANG_MIN_DEG = 50;
/** Rise over run of a 50-degree surface, tan 50deg = 1.19175. */
export const OVERHANG_RISE = Math.tan((OVERHANG_MIN_DEG * Math.PI) / 180);

/**
 * Running gap of the float's guide on top of the print clearance, per side, mm: enough for
 * the collar to slide in its sleeve when both are printed a little fat (common practice).
 * The guide's play is PRINT_CLEARANCE_MM + GUIDE_RUNNING_GAP_MM.
 */
export const GUIDE_RUNNING_GAP_MM = 0.25;

/** Least length of the float's collar inside its sleeve, even at rest on the pin, mm (common practice: about four layers of 0.5 mm). */
export const GUIDE_MIN_OVERLAP_MM = 2;
