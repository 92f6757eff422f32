import { AUTO_PAD_STRAIN, PAD_STOP_STRAIN } from '../constants.ts';
import type { DesignInputs } from '../inputs.ts';
import { PADS, findPad } from './pads.ts';
import { sealModel, type SealModel } from './seal-model.ts';

/**
 * The seal for the document's pad, or, for "auto" (null), the softest sponge
 * whose strain at the tight seal at H_max is at most AUTO_PAD_STRAIN (else the
 * softest within the stop; else the stiffest sponge, which the sizing then
 * refuses with its ways out). Softer is better while it fits: less seating
 * force, so a smaller float, and more indentation to close a tilted lip.
 * With bench points the choice is made on the model, then the points set the force.
 */
export function chooseSeal(inp: DesignInputs): SealModel {
  if (inp.padName !== null) {
    const pad = findPad(inp.padName);
    if (!pad) throw new RangeError(`seal.pad: "${inp.padName}" is not in the pad table`);
    return sealModel(inp, pad, false);
  }
  // chosen by the model alone (bench points describe the pad they were taken on, not the candidates)
  const model = { ...inp, calibration: [] };
  const sponges = PADS.filter((p) => p.kind === 'sponge').map((p) => sealModel(model, p, true));
  const pick =
    sponges.find((s) => s.strainAtSeal <= AUTO_PAD_STRAIN) ??
    sponges.find((s) => s.strainAtSeal <= PAD_STOP_STRAIN) ??
    sponges[sponges.length - 1];
  return inp.calibration.length ? sealModel(inp, pick.pad, true) : pick;
}
