/**
 * Fixed values of the lever valve, each with where it comes from. Millimetres
 * unless the name says otherwise.
 */

/**
 * Sliding friction of a printed plastic pin in a printed plastic eye, wet: 0.3.
 * Published pairs of PLA, PETG and ABS on themselves run from about 0.2 to 0.4
 * (from memory; common practice takes 0.3 for a printed journal). Water wets,
 * but does not lubricate, these plastics at these loads, so no reduction is taken.
 */
export const PIVOT_FRICTION_COEFFICIENT = 0.3;

/** Lowest mechanical advantage a_float / a_pad the search tries (below it a direct float is simpler). */
export const MIN_LEVER_RATIO = 1.25;
/** Highest mechanical advantage tried: past it the float's travel (ratio times the pad's) is too long to hold a level. */
export const MAX_LEVER_RATIO = 10;
/** Float arms are tried on this grid, mm. */
export const FLOAT_ARM_STEP_MM = 2.5;
/** Lever float diameters are tried on this grid, mm (twice the direct search's step: two more search dimensions). */
export const LEVER_DIAMETER_STEP_MM = 1;
/** Pad arms tried past the shortest one, mm: a longer pad arm tilts the float less at rest (shallow trays). */
export const PAD_ARM_EXTRA_MM: readonly number[] = [0, 8, 16, 24, 32];

/** Depth of the socket in the float's plateau that takes the arm's round tongue, mm (glued; common practice). */
export const FLOAT_SOCKET_DEPTH_MM = 3;
/** Gap between the float and the frame's post, mm (common practice: a grain of grit passes). */
export const FLOAT_TO_FRAME_GAP_MM = 2;
/** Overhang angle of every self-supporting face, degrees from the bed (DESIGN second part: at least 50). */
export const SELF_SUPPORT_ANGLE_DEG = 50;
