/** How the nozzle's bore is modelled: a sharp orifice, or a short tube where the jet reattaches. */
export type BoreModel = 'orifice' | 'short-tube';

/** Bore lengths of at least this many bore diameters are short tubes (DESIGN second part; common practice: the vena contracta reattaches within about 2-3 diameters). */
export const SHORT_TUBE_MIN_LENGTH_RATIO = 3;

/**
 * The bore's model from its length: a short tube when l_o >= 3 d_o, else a sharp orifice.
 * @param boreLengthM length of the bore, m (>= 0; 0 means a thin plate)
 * @param boreM bore diameter, m (> 0)
 * Example: a 2 mm bore 20 mm long is a short tube; 5 mm long, an orifice.
 * Source: common practice (reattachment of the jet in a short tube, e.g. White, Fluid Mechanics, ch. 6 on orifices and nozzles).
 */
export function boreModel(boreLengthM: number, boreM: number): BoreModel {
  return boreLengthM >= SHORT_TUBE_MIN_LENGTH_RATIO * boreM ? 'short-tube' : 'orifice';
}
