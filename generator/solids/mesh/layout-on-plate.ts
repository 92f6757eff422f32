/**
 * Lays rectangular footprints side by side on a build plate (shelf packing):
 * deepest first, left to right in rows ("shelves") from the front of the
 * plate; a row that would pass the plate's width starts a new shelf behind
 * the deepest footprint of the last one. The whole arrangement is then centred
 * on the plate. Footprints keep `spacingMm` between each other.
 *
 * Coordinates follow 3MF (Core Specification 3.1): origin at the plate's
 * front-left corner, x to the right, y to the back, millimetres. Placements
 * are the front-left corner of each footprint, in input order.
 *
 * Example: two 50 × 30 mm footprints, spacing 10, on a 200 × 200 plate →
 * used 110 × 30 mm, first at (45, 85), second at (105, 85).
 */
import { requireNonNegative, requirePositive } from './validate.ts';

export interface Footprint {
  widthMm: number;
  depthMm: number;
}

export interface PlateOptions {
  /** plate size along x, mm */
  plateWidthMm: number;
  /** plate size along y, mm */
  plateDepthMm: number;
  /** gap between neighbouring parts, mm (the arrangement is centred, so the edge margin is what is left) */
  spacingMm: number;
}

export interface PlateLayout {
  /** front-left corner of each footprint, input order */
  placements: { xMm: number; yMm: number }[];
  /** size of the whole arrangement */
  usedWidthMm: number;
  usedDepthMm: number;
  /** false when the arrangement does not fit on the plate (then it starts at the origin instead of centred) */
  fits: boolean;
}

export function layoutOnPlate(footprints: readonly Footprint[], plate: PlateOptions, path = 'layoutOnPlate'): PlateLayout {
  const plateWidthMm = requirePositive(`${path}.plateWidthMm`, plate?.plateWidthMm, 'mm');
  const plateDepthMm = requirePositive(`${path}.plateDepthMm`, plate?.plateDepthMm, 'mm');
  const spacingMm = requireNonNegative(`${path}.spacingMm`, plate?.spacingMm, 'mm');
  footprints.forEach((f, i) => {
    requireNonNegative(`${path}.footprints[${i}].widthMm`, f.widthMm, 'mm');
    requireNonNegative(`${path}.footprints[${i}].depthMm`, f.depthMm, 'mm');
  });

  const order = footprints.map((_, i) => i).sort((a, b) => footprints[b].depthMm - footprints[a].depthMm || a - b);
  const placements = footprints.map(() => ({ xMm: 0, yMm: 0 }));
  let x = 0;
  let shelfY = 0;
  let shelfDepth = 0;
  let usedWidthMm = 0;
  for (const i of order) {
    const { widthMm, depthMm } = footprints[i];
    if (x > 0 && x + widthMm > plateWidthMm) {
      shelfY += shelfDepth + spacingMm;
      x = 0;
      shelfDepth = 0;
    }
    placements[i] = { xMm: x, yMm: shelfY };
    usedWidthMm = Math.max(usedWidthMm, x + widthMm);
    shelfDepth = Math.max(shelfDepth, depthMm);
    x += widthMm + spacingMm;
  }
  const usedDepthMm = footprints.length ? shelfY + shelfDepth : 0;
  const fits = usedWidthMm <= plateWidthMm && usedDepthMm <= plateDepthMm;
  if (fits) {
    const dx = (plateWidthMm - usedWidthMm) / 2;
    const dy = (plateDepthMm - usedDepthMm) / 2;
    for (const p of placements) {
      p.xMm += dx;
      p.yMm += dy;
    }
  }
  return { placements, usedWidthMm, usedDepthMm, fits };
}
