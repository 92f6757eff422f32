/**
 * How square the pad meets the lip on the lever's arc. The arm is level at the
 * tight seal, so there the pad face is flat on the lip. Before that it turns
 * about the pivot: when the pad centre is the indentation delta short of the
 * seal, the arm is turned by theta = asin(delta / a_pad) and the face is tilted
 * by the same angle, so across the lip (d_s) one side still stands open by
 *
 *   g = d_s sin(theta) = d_s delta / a_pad
 *
 * while the other side already touches. The face also slides sideways over that
 * last turn, by e sin(theta) for a face e above the pivot axis.
 * The search keeps g <= delta / 2 (the same rule as a tilted direct float),
 * which needs a_pad >= 2 d_s.
 *
 * @param padArmMm a_pad, mm
 * @param sealDiameterMm d_s, mm
 * @param indentationMm delta, mm
 * @param faceAbovePivotMm e, mm (pad face at the seal above the pivot axis)
 * @returns { tiltDeg, lipGapMm (g), slideMm }
 *
 * Example: a_pad 12 mm, d_s 5 mm, delta 0.5 mm, e 5.5 mm: theta = 2.388 deg,
 * g = 0.2083 mm (under delta / 2 = 0.25), slide 0.2292 mm. Source: elementary geometry.
 */
export function padArcContact(padArmMm: number, sealDiameterMm: number, indentationMm: number, faceAbovePivotMm: number): { tiltDeg: number; lipGapMm: number; slideMm: number } {
  if (!(padArmMm > indentationMm)) throw new RangeError(`padArcContact.padArmMm = ${padArmMm}; allowed: more than the indentation (${indentationMm} mm)`);
  const s = indentationMm / padArmMm;
  return { tiltDeg: (Math.asin(s) * 180) / Math.PI, lipGapMm: sealDiameterMm * s, slideMm: Math.abs(faceAbovePivotMm) * s };
}
