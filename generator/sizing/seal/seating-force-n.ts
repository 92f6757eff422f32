export interface SeatingForceOptions {
  /** seating stress y of the pad material, Pa (0 for soft elastomers) */
  seatingStressPa: number;
  /** mean land diameter G = (d_o + d_s)/2, m */
  meanDiameterM: number;
  /** effective seating width b = N/2, m */
  effectiveWidthM: number;
  /** pad stiffness E, Pa */
  stiffnessPa: number;
  /** pad thickness t_pad, m */
  thicknessM: number;
  /** indentation that seats the pad on a printed lip, m (MIN_SEATING_INDENTATION_M) */
  seatingIndentationM: number;
}

/**
 * Force that seats the pad with no pressure behind it:
 *
 *   F_seat = max(y pi G 2b,  E (delta_seat / t_pad) A_land)
 *
 * the first the gasket-factor seating load (y on the contact ring
 * pi G 2b = (pi/4)(d_s^2 - d_o^2)); the second the push that indents the pad by
 * delta_seat under the land, by the contact model of land-strain.ts.
 *
 * @returns N
 *
 * Example: lip 2/5 mm (G 3.5 mm, b 0.75 mm, ring 16.49 mm2), sponge of
 * 192 kPa, 3 mm thick, seated by 0.2 mm, y = 0: 192e3 x 0.0667 x 16.49e-6
 * = 0.211 N. Source: ASME BPVC VIII-1 Mandatory Appendix 2 (the y term);
 * Hooke's law (the indentation term).
 */
export function seatingForceN(o: SeatingForceOptions): number {
  const ringM2 = Math.PI * o.meanDiameterM * 2 * o.effectiveWidthM;
  const byStress = o.seatingStressPa * ringM2;
  const byIndentation = o.stiffnessPa * (o.seatingIndentationM / o.thicknessM) * ringM2;
  return Math.max(byStress, byIndentation);
}
