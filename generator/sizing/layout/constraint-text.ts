import type { ConstraintCode } from './evaluate-candidate.ts';

/** Plain words for each constraint, for `boundBy` readers and failure reasons. */
export const CONSTRAINT_TEXT: Record<ConstraintCode | 'least-mass' | 'barb-wall' | 'lip-wall', string> = {
  'float-shape': 'the float is too small to close around its pad pocket and walls',
  reserve: 'the float must lift the reserve times the force needed to close at the highest head',
  'seal-in-cylinder': 'at the highest head the float must seal while the water line is still on its straight side',
  travel: 'the float must seal low enough to hold the target level and still leave travel above the retainer pin',
  'outer-diameter-limit': 'the housing foot must fit within the outer-diameter limit',
  'part-size': 'no part may be larger than 250 mm',
  'vent-room': 'the deck needs room for its vents between the nozzle seat and the wall',
  'tilt-offset': 'tipped as far as its bore and guide allow, the float must keep the pad centred on the lip within the pad margin',
  'tilt-gap': "tipped as far as its bore and guide allow, the float must leave the lip's far side no more than half the pad indentation open",
  'bed-size': "every part must fit the printer's bed (print.bed) in its print pose",
  'least-mass': 'a wider or narrower float would use more plastic',
  'barb-wall': 'the nozzle bore must leave the barb a wall of at least two print lines',
  'lip-wall': 'the nozzle lip must leave a sealing ring of at least two print lines around the bore',
};
