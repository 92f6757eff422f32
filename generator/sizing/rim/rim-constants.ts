/** Fixed values of the rim mount, mm, each with where it comes from. */

/** Level adjustment either way that the slotted stem gives after printing (issue 13: about +-10 mm). */
export const RIM_ADJUST_MM = 10;
/** Vertical pitch of the two screws that hold the stem (to the hanger, and the valve to the stem): two screws stop it turning. Common practice. */
export const RIM_SCREW_PITCH_MM = 12;
/** How far the hanger's outer leg reaches down the outside of the wall (common practice: enough that it cannot tip off). */
export const RIM_OUTER_LEG_MM = 15;
/** Thinnest hanger leg and stem, mm (common practice: stiff enough to carry a valve and its float when flooded). */
export const RIM_MIN_LEG_MM = 3;
/** Pilot hole for an M3 screw cut into printed plastic (common practice: 2.5 mm; the screw taps its own thread). */
export const RIM_PILOT_HOLE_MM = 2.5;
