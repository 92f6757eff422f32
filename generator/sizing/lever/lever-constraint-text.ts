import type { LeverConstraint } from './lever-types.ts';

/**
 * Each rule a lever valve must meet as a grower would say it, for `boundBy` readers and failure reasons
 * (the codes stay in JSON output), in the glossary's words as the direct valve's (layout/constraint-text.ts).
 */
export const LEVER_CONSTRAINT_TEXT: Record<LeverConstraint | 'least-mass', string> = {
  'float-shape': 'a smaller float has no room for the socket the arm fits in and for its walls',
  reserve: 'the float, through the arm, must give its spare lift times the push the seal pad needs to shut at tank full',
  'seal-in-cylinder': 'with the tank full, the float must shut while the water line is still on its straight side',
  travel: 'the float must shut high enough above the floor for the seal pad to drop clear of the nozzle lip when the arm comes down',
  'float-clearance': 'the float must hang clear of the frame round the pivot, shut and with the arm down',
  'arm-clearance': "the arm's seal pad table must swing clear of the frame's cheeks when the arm comes down",
  'pad-arc': 'turning on the arm, the seal pad must meet the nozzle lip square enough to close its far side (open by no more than half the pad squeeze)',
  'outer-diameter-limit': 'the valve, seen from above, must fit in the widest valve you allow',
  'part-size': 'no part may be larger than 250 mm',
  'rim-height': 'hung from the rim, the valve must sit under the slotted stem with room to be lowered by the whole reach of its slot',
  'bed-size': "every part must fit your printer's bed as it lies for printing",
  'pad-stop': "the seal pad's hard stop must leave the tight seal free",
  'least-mass': 'another float or arm would use more plastic',
};

/** The travel rule hung from the rim, where the floor the float must clear is lowered by the slotted stem's whole reach. */
export const LEVER_RIM_TRAVEL_TEXT =
  'the float must shut high enough above the floor, less the whole reach of the slotted stem, for the seal pad to drop clear of the nozzle lip when the arm comes down';
