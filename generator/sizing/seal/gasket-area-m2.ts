/**
 * Pressure area of the gasket-factor form of flange design, applied to the
 * nozzle's flat land (bore d_o, lip d_s) pressing a pad:
 *
 *   G = (d_o + d_s) / 2 (mean land diameter), N = (d_s - d_o) / 2 (land width),
 *   b = N / 2 (effective seating width),
 *   A_m = (pi/4) G^2 + 2 pi b G m
 *
 * The first term is the pressure's end force inside G; the second the extra
 * contact force the pad needs, m times the pressure on an effective width 2b,
 * to stay tight. The force for a tight seal is then p A_m + F_seat.
 *
 * @param boreDiameterM d_o, m
 * @param lipDiameterM d_s, m (> d_o)
 * @param gasketFactor m of the pad material (dimensionless)
 * @returns m2
 *
 * Example: d_o 2 mm, d_s 5 mm, m 0.5: G 3.5 mm, b 0.75 mm,
 * 9.62 + 8.25 = 17.87 mm2.
 * Source: ASME BPVC Section VIII Div. 1, Mandatory Appendix 2 (the form; the
 * effective width b = N/2 of its Table 2-5.2 for narrow faces).
 */
export function gasketAreaM2(boreDiameterM: number, lipDiameterM: number, gasketFactor: number): number {
  if (!(boreDiameterM > 0 && lipDiameterM > boreDiameterM)) throw new RangeError('gasketAreaM2: the lip must be wider than the bore');
  const G = (boreDiameterM + lipDiameterM) / 2;
  const b = (lipDiameterM - boreDiameterM) / 4;
  return (Math.PI / 4) * G * G + 2 * Math.PI * b * G * gasketFactor;
}
