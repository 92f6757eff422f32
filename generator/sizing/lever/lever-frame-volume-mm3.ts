import { SELF_SUPPORT_ANGLE_DEG } from './lever-constants.ts';
import { pointedHoleAreaMm2 } from './pointed-hole-area-mm2.ts';
import type { LeverFrameSpec } from './lever-types.ts';

/** Anchor slots of a frame: one in each wing (each side at the pivot's x, and the back's if any); none on the rim. */
export function anchorSlots(f: Pick<LeverFrameSpec, 'mount' | 'backWing'>): number {
  return f.mount === 'floor' ? (f.backWing ? 3 : 2) : 0;
}

/** anchorSlots in words, for the sentences that tell the grower how to hold the frame down ("two", "three"). */
export function anchorSlotsInWords(f: Pick<LeverFrameSpec, 'mount' | 'backWing'>): string {
  return ['no', 'one', 'two', 'three'][anchorSlots(f)]!;
}

/**
 * The frame's printed volume, mm3 (LeverFrameSpec; mounted pieces, each a prism
 * or a ring, elementary geometry):
 * - cheeks: 2 x wall x post length x (deck underside - cheek bottom), less the two pointed pin holes;
 * - back wall: wall x width x the same height;
 * - deck: (front - back) x width x thickness, less the seat bore; boss: ring of its height;
 * - the pad's hard stop: a block from the deck's underside down to its face;
 * - floor: wings (two along the cheeks and back wall, and one across the back
 *   if backWing) as plates a x length x thickness plus 50-degree wedges
 *   a x a tan(50deg) / 2 x length, less an anchor slot in each, open to the
 *   wing's edge (a half disc about the wing's middle and a strip out to the edge, through plate and wedge: the
 *   wedge's height falls linearly outward, so each piece is integrated exactly);
 * - rim: less the stem's two pointed pilot holes through the back wall.
 */
export function leverFrameVolumeMm3(f: LeverFrameSpec): number {
  const t = f.wallMm;
  const seat = Math.PI * (f.seatBoreMm / 2) ** 2;
  const postLength = 2 * f.postHalfLengthMm;
  const height = f.deckBottomZMm - f.cheekBottomZMm;
  const cheeks = 2 * t * postLength * height - 2 * t * pointedHoleAreaMm2(f.pinHoleDiameterMm / 2, f.holeRoofAngleDeg);
  const back = t * f.widthMm * height;
  const deckLength = f.deckFrontXMm + f.postHalfLengthMm + t;
  const deck = deckLength * f.deckWidthMm * f.deckThicknessMm - seat * f.deckThicknessMm;
  const boss = (Math.PI * (f.bossOuterDiameterMm / 2) ** 2 - seat) * f.bossHeightMm;
  let base = 0;
  if (f.mount === 'floor') {
    const a = f.wingMm;
    const tan = Math.tan((SELF_SUPPORT_ANGLE_DEG * Math.PI) / 180);
    const wingLength = 2 * (postLength + t) + (f.backWing ? f.widthMm : 0);
    // each anchor is a slot open to the wing's edge: a half disc (r) about the wing's middle, facing the wall,
    // then a strip 2r wide out to the edge; the wing there is plate + (a - u) tan(50deg) tall at u out from the wall
    const r = f.anchorDiameterMm / 2;
    const plate = f.footThicknessMm;
    const halfDisc = ((Math.PI * r * r) / 2) * (plate + (a / 2) * tan) + (2 / 3) * r ** 3 * tan;
    const strip = 2 * r * (plate * (a / 2) + (tan * a * a) / 8);
    base = wingLength * (a * plate + 0.5 * a * a * tan) - anchorSlots(f) * (halfDisc + strip);
  } else {
    base = -2 * t * pointedHoleAreaMm2(f.stemPilotDiameterMm / 2, f.holeRoofAngleDeg);
  }
  const stop = f.stopLengthMm * f.stopWidthMm * (f.deckBottomZMm - f.stopBottomZMm);
  return cheeks + back + deck + boss + stop + base;
}
