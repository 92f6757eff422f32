/**
 * Splits parts over as few build plates as the shelf packing allows, in order:
 * a part goes on the current plate while layoutOnPlate still fits them all,
 * else it starts the next plate. A part larger than the plate alone (either way
 * round is not tried: parts come in print pose and the slicer may turn them) is
 * refused with a message naming `print.bed`, the part, its size and the bed.
 *
 * Returns the plates as lists of indices into `footprints`.
 * Example: three 120 x 120 mm parts, spacing 10, on a 220 x 220 bed -> [[0], [1], [2]];
 * two 100 x 100 mm parts -> [[0, 1]].
 */
import { layoutOnPlate, type Footprint, type PlateOptions } from './layout-on-plate.ts';

export function packPlates(footprints: readonly (Footprint & { name: string })[], plate: PlateOptions): number[][] {
  const plates: number[][] = [];
  let current: number[] = [];
  footprints.forEach((f, i) => {
    if (!layoutOnPlate([f], plate).fits) {
      throw new RangeError(
        `print.bed = ${plate.plateWidthMm} x ${plate.plateDepthMm} mm is too small for the ${f.name} ` +
          `(${f.widthMm.toFixed(1)} x ${f.depthMm.toFixed(1)} mm on the bed); allowed: a bed at least that large`,
      );
    }
    const trial = [...current, i];
    if (current.length > 0 && !layoutOnPlate(trial.map((j) => footprints[j]), plate).fits) {
      plates.push(current);
      current = [i];
    } else current = trial;
  });
  if (current.length) plates.push(current);
  return plates;
}
