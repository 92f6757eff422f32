import { pointedHoleAreaMm2 } from '../lever/pointed-hole-area-mm2.ts';
import { SELF_SUPPORT_ANGLE_DEG } from '../lever/lever-constants.ts';
import type { RimMountSpec } from './rim-mount-spec.ts';

/**
 * Printed volumes of the rim hanger and the slotted stem, mm3.
 * Hanger: its U section (inner leg + outer leg, both hanging from the bridge's
 * underside, + the bridge across the gap and both legs, a leg thick) times its width, less three pilot holes (pointed: the
 * hanger prints on its side), two through the inner leg and the clamp's through
 * the outer. Stem: width x thickness x length, less the slot (a stadium: rectangle
 * of the slot's length by the hole's width plus one hole) and two holes.
 * Elementary geometry.
 *
 * Example: see test/sizing/rim.test.ts.
 */
export function rimMountVolumesMm3(r: RimMountSpec): { hangerMm3: number; stemMm3: number } {
  const h = r.hanger;
  const hole = Math.PI * (r.screwHoleDiameterMm / 2) ** 2;
  const section = h.legMm * h.innerLegLengthMm + h.legMm * h.outerLegLengthMm + (h.gapMm + 2 * h.legMm) * h.legMm;
  // the hanger prints on its side, so its pilot holes are pointed (pointedHoleAreaMm2)
  const pilot = pointedHoleAreaMm2(r.pilotHoleDiameterMm / 2, SELF_SUPPORT_ANGLE_DEG);
  const hanger = section * h.widthMm - 3 * pilot * h.legMm;
  const s = r.stem;
  const slot = s.slotLengthMm * r.screwHoleDiameterMm + hole;
  const stem = s.widthMm * s.thicknessMm * s.lengthMm - (slot + 2 * hole) * s.thicknessMm;
  return { hangerMm3: hanger, stemMm3: stem };
}
