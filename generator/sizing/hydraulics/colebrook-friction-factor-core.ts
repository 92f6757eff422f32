/**
 * colebrookFrictionFactor without its input checks, for solvers' inner loops whose inputs were checked once
 * at their door (Re > 0, 0 <= e/d <= 0.1). The equation, its example and source: colebrookFrictionFactor.
 */
export function colebrookFrictionFactorCore(reynolds: number, relativeRoughness: number): number {
  const a = relativeRoughness / 3.7;
  const b = 2.51 / reynolds;
  let x = 7; // f of about 0.02, typical of tube flow
  for (let i = 0; i < 100; i++) {
    const s = a + b * x;
    const g = x + 2 * Math.log10(s);
    const slope = 1 + (2 * b) / (s * Math.LN10);
    let next = x - g / slope;
    if (!(next > 0)) next = x / 2;
    // f = 1/x^2, so a relative change of 5e-13 in x is 1e-12 in f
    if (Math.abs(next - x) <= 5e-13 * next) return 1 / (next * next);
    x = next;
  }
  throw new Error(`colebrookFrictionFactor did not converge for reynolds = ${reynolds}, relativeRoughness = ${relativeRoughness}`);
}
