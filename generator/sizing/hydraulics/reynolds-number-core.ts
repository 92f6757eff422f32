/**
 * reynoldsNumber without its input checks, for solvers' inner loops whose inputs were checked once at their
 * door: volume flow (m3/s, >= 0), inner diameter (m, > 0), density (kg/m3, > 0), viscosity (Pa s, > 0).
 * The equation, its example and source: reynoldsNumber.
 */
export function reynoldsNumberCore(flowM3s: number, innerDiameterM: number, densityKgM3: number, viscosityPaS: number): number {
  return (4 * densityKgM3 * flowM3s) / (Math.PI * viscosityPaS * innerDiameterM);
}
