import type { ConstraintCode } from './evaluate-candidate.ts';

/**
 * Each size-setting rule as a grower would say it, for `boundBy` readers and failure reasons (screen, text
 * report, build sheet). The codes stay in JSON output; people read these sentences, in the glossary's words
 * (generator/doc/glossary.ts: tank full, spare lift, nozzle lip, seal pad, pad squeeze, retainer pin).
 */
export const CONSTRAINT_TEXT: Record<ConstraintCode | 'least-mass' | 'barb-wall' | 'lip-wall', string> = {
  'float-shape': 'a smaller float has no room for the seal pad in its top and for its walls',
  reserve: 'the float must lift its spare lift times the push needed to shut at tank full',
  'seal-in-cylinder': 'with the tank full, the float must shut while the water line is still on its straight side',
  travel: 'the float must shut low enough to hold the water depth, and still have room to drop onto its retainer pin',
  'outer-diameter-limit': 'the housing foot must fit in the widest valve you allow',
  'part-size': 'no part may be larger than 250 mm',
  'vent-room': 'the top of the housing needs room for its air vents between the nozzle and the wall',
  'tilt-offset': 'tipped as far as the housing lets it, the float must still hold the seal pad centred on the nozzle lip',
  'tilt-gap': 'tipped as far as the housing lets it, the float must leave the far side of the nozzle lip open by no more than half the pad squeeze',
  'bed-size': "every part must fit your printer's bed as it lies for printing",
  'least-mass': 'a wider or narrower float would use more plastic',
  'barb-wall': 'the nozzle hole must leave the barb a wall of at least two printed lines',
  'lip-wall': 'the nozzle lip must leave a sealing ring of at least two printed lines around the nozzle hole',
};
