/**
 * Flow out of a bore through the ring-shaped "curtain" between its edge and a
 * plate held a gap h above it, taken as an orifice of area pi d_o h.
 *
 * Equation: Q = C_d pi d_o h sqrt(2 dp / rho)
 *
 * @param gapM gap h, m (>= 0)
 * @param pressureDropPa dp across the curtain, Pa (>= 0)
 * @param boreM bore diameter d_o, m (> 0)
 * @param densityKgM3 liquid density rho, kg/m3 (> 0)
 * @param dischargeCoefficient C_d (0.61 for a sharp edge)
 * @returns volume flow, m3/s
 *
 * Example: d_o 2 mm, h 0.5 mm, dp 20 kPa, water 998.2 kg/m3, C_d 0.61:
 * 0.61 x pi x 2e-3 x 5e-4 x sqrt(2 x 2e4 / 998.2) = 1.213e-5 m3/s (43.7 L/h).
 * Source: orifice equation applied to the curtain area (flapper-nozzle valves; e.g. Merritt,
 * Hydraulic Control Systems, ch. 5, from memory); C_d 0.61 standard texts (from memory).
 */
export function curtainFlowM3s(gapM: number, pressureDropPa: number, boreM: number, densityKgM3: number, dischargeCoefficient: number): number {
  return dischargeCoefficient * Math.PI * boreM * gapM * Math.sqrt((2 * Math.max(0, pressureDropPa)) / densityKgM3);
}
