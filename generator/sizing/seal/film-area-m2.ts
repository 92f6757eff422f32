/**
 * Force area of a thin viscous film across a flat annular land, with the full
 * bore pressure at its inner edge and none at its outer edge. Radial laminar
 * flow between parallel plates has a pressure that falls with ln(r), which
 * integrates over the land and the bore to
 *
 *   A_film = pi (r_s^2 - r_o^2) / (2 ln(r_s / r_o))
 *
 * so the film pushes with p A_film (the bore's own pi r_o^2 included).
 *
 * @param boreDiameterM bore (orifice) diameter d_o = 2 r_o, m
 * @param lipDiameterM lip outer diameter d_s = 2 r_s, m (> d_o)
 * @returns m2
 *
 * Example: r_o 1.0 mm, r_s 2.5 mm: pi (6.25 - 1) / (2 ln 2.5) = 9.00 mm2.
 * Source: radial laminar flow between parallel plates (lubrication theory;
 * e.g. White, Viscous Fluid Flow).
 */
export function filmAreaM2(boreDiameterM: number, lipDiameterM: number): number {
  const ro = boreDiameterM / 2;
  const rs = lipDiameterM / 2;
  if (!(ro > 0 && rs > ro)) throw new RangeError('filmAreaM2: the lip must be wider than the bore');
  return (Math.PI * (rs * rs - ro * ro)) / (2 * Math.log(rs / ro));
}
