import { ANCHOR_DIAMETER_MM } from '../parts/housing-spec.ts';
import { SELF_SUPPORT_ANGLE_DEG } from './lever-constants.ts';
import { pointedHoleAreaMm2 } from './pointed-hole-area-mm2.ts';
import type { LeverFrameSpec } from './lever-types.ts';

/**
 * The frame's printed volume, mm3 (an estimate for the search until the frame
 * has its own solid): two cheeks (wall x post length x height, less the pin
 * holes), the deck (less the seat bore), the boss ring, and the foot plate with
 * three anchor holes and 50-degree gussets under its overhang (triangles of the
 * overhang a by a tan 50deg along the cheeks and the back), or on the rim the back
 * plate with two screw holes. Elementary geometry.
 */
export function leverFrameVolumeMm3(f: LeverFrameSpec): number {
  const t = f.wallMm;
  const seat = Math.PI * (f.seatBoreMm / 2) ** 2;
  const postLength = 2 * f.postHalfLengthMm;
  const cheeks = 2 * t * postLength * (f.deckBottomZMm - f.cheekBottomZMm) - 2 * t * pointedHoleAreaMm2(f.pinHoleDiameterMm / 2, SELF_SUPPORT_ANGLE_DEG);
  const deck = (f.deckFrontXMm + f.postHalfLengthMm) * f.deckWidthMm * f.deckThicknessMm - seat * f.deckThicknessMm;
  const boss = (Math.PI * (f.bossOuterDiameterMm / 2) ** 2 - seat) * f.bossHeightMm;
  const anchor = Math.PI * (ANCHOR_DIAMETER_MM / 2) ** 2;
  let base: number;
  if (f.mount === 'floor') {
    const length = f.postHalfLengthMm - f.footBackXMm;
    const overhang = (f.footWidthMm - f.widthMm) / 2;
    const gusset = 0.5 * overhang * overhang * Math.tan((SELF_SUPPORT_ANGLE_DEG * Math.PI) / 180);
    base = length * f.footWidthMm * f.footThicknessMm - 3 * anchor * f.footThicknessMm + gusset * (2 * postLength + f.widthMm);
  } else {
    const top = f.deckBottomZMm + f.deckThicknessMm;
    base = t * f.widthMm * (top - f.cheekBottomZMm) - 2 * anchor * t;
  }
  return cheeks + deck + boss + base;
}
