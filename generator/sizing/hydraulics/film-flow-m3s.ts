/**
 * Viscous radial flow through a thin film between parallel plates: the flat land
 * of the nozzle lip (bore radius r_o to lip radius r_s) and the pad above it.
 *
 * Equation: Q = pi h^3 dp / (6 mu ln(r_s / r_o))
 *
 * @param gapM film thickness h, m (>= 0)
 * @param pressureDropPa pressure at the inner edge over the outer, dp, Pa (>= 0)
 * @param boreM bore diameter d_o = 2 r_o, m (> 0)
 * @param lipM lip outer diameter d_s = 2 r_s, m (> d_o)
 * @param viscosityPaS dynamic viscosity mu, Pa s (> 0)
 * @returns volume flow, m3/s
 *
 * Example: h 20 um, dp 20 kPa, mu 1.0016 mPa s, r_s / r_o = 2.5:
 * pi (2e-5)^3 2e4 / (6 x 1.0016e-3 x ln 2.5) = 9.13e-8 m3/s (0.33 L/h).
 * Source: radial laminar flow between parallel plates (lubrication theory; e.g. White, Viscous Fluid Flow).
 */
export function filmFlowM3s(gapM: number, pressureDropPa: number, boreM: number, lipM: number, viscosityPaS: number): number {
  if (!(lipM > boreM && boreM > 0)) throw new RangeError('filmFlowM3s: the lip must be wider than the bore');
  return (Math.PI * gapM ** 3 * pressureDropPa) / (6 * viscosityPaS * Math.log(lipM / boreM));
}
