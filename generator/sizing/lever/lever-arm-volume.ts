import { pointedHoleAreaMm2 } from './pointed-hole-area-mm2.ts';
import type { LeverArmSpec } from './lever-types.ts';

/**
 * The arm's printed volume, mm3, and the x of its centroid, mm from the pivot:
 * bar (width x depth x length) + the eye block below the bar + the pad table's
 * wings past the bar + the tongue, less the pad pocket and the pin hole (a
 * pointed hole, pointedHoleAreaMm2, through the eye's width). The centroid is
 * the volume-weighted mean of the pieces' own centroids.
 * Every piece is a prism or a cylinder: elementary geometry.
 *
 * Example: see test/sizing/lever.test.ts (a bar with every piece counted by hand).
 */
export function leverArmVolume(a: LeverArmSpec): { volumeMm3: number; centroidXMm: number } {
  const pieces: [number, number][] = [];
  const length = a.tipXMm - a.tailXMm;
  pieces.push([a.barWidthMm * a.barDepthMm * length, (a.tipXMm + a.tailXMm) / 2]);
  pieces.push([a.barWidthMm * (a.eyeDepthMm - a.barDepthMm) * (a.eyeHalfLengthMm - a.tailXMm), (a.eyeHalfLengthMm + a.tailXMm) / 2]);
  const side = 2 * a.tableHalfSideMm;
  pieces.push([Math.max(0, side - a.barWidthMm) * side * a.barDepthMm, a.padArmMm]);
  pieces.push([Math.PI * (a.tongueDiameterMm / 2) ** 2 * a.tongueLengthMm, a.floatArmMm]);
  pieces.push([-Math.PI * (a.pocketDiameterMm / 2) ** 2 * a.pocketDepthMm, a.padArmMm]);
  pieces.push([-pointedHoleAreaMm2(a.holeDiameterMm / 2, a.holeRoofAngleDeg) * a.barWidthMm, 0]);
  const volume = pieces.reduce((s, [v]) => s + v, 0);
  const moment = pieces.reduce((s, [v, x]) => s + v * x, 0);
  return { volumeMm3: volume, centroidXMm: moment / volume };
}
