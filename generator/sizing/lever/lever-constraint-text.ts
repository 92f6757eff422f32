import type { LeverConstraint } from './lever-types.ts';

/** Plain words for each rule a lever valve must meet, for `boundBy` readers and failure reasons. */
export const LEVER_CONSTRAINT_TEXT: Record<LeverConstraint | 'least-mass', string> = {
  'float-shape': 'the float is too small to close around the socket for the arm and its walls',
  reserve: "the float, through the arm, must give the reserve times the pad's force for a tight seal at the highest head",
  'seal-in-cylinder': 'at the highest head the float must seal while the water line is still on its straight side',
  travel: 'the float must seal high enough off the floor (on the rim: the floor less the adjustment) and leave the pad its travel when the arm drops',
  'float-clearance': 'the float must hang clear of the frame round the pivot, at the seal and with the arm dropped to its rest',
  'pad-arc': "turning on the arm, the pad must meet the lip squarely enough to close its far side (the gap at most half the pad's squeeze)",
  'outer-diameter-limit': 'the valve, seen from above, must fit within the outer-diameter limit',
  'part-size': 'no part may be larger than 250 mm',
  'rim-height': 'hung from the rim, the valve must sit below the slotted stem with room to be lowered by the whole adjustment',
  'bed-size': "every part must fit the printer's bed (print.bed) in its print pose",
  'pad-stop': "the pad's hard stop must leave the tight seal free",
  'least-mass': 'another float or arm would use more plastic',
};
