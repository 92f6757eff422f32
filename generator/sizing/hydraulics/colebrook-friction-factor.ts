import { checkRange, POSITIVE } from './check-range.ts';

/** Largest relative roughness e/d the friction-factor functions accept (the Moody chart stops at 0.05). */
export const MAX_RELATIVE_ROUGHNESS = 0.1;
export const RELATIVE_ROUGHNESS_RANGE = Object.freeze({ min: 0, max: MAX_RELATIVE_ROUGHNESS });

/**
 * Darcy friction factor of turbulent pipe flow from the Colebrook-White equation,
 * solved by Newton iteration on x = 1/sqrt(f) until f changes by less than 1e-12 (relative).
 *
 * Equation: 1/sqrt(f) = -2 log10( (e/d)/3.7 + 2.51 / (Re sqrt(f)) )
 *
 * g(x) = x + 2 log10(a + b x), a = (e/d)/3.7, b = 2.51/Re, is increasing and
 * concave, so Newton's method converges from any positive start (a step that
 * would leave x > 0 is halved instead).
 *
 * @param reynolds Reynolds number Re = rho v d / mu (dimensionless, > 0; meaningful from about 4000)
 * @param relativeRoughness e/d, absolute roughness over inner diameter (dimensionless, 0 to 0.1)
 * @returns Darcy friction factor f (dimensionless)
 *
 * Example: Re = 1e5, e/d = 1e-4 gives f = 0.018514.
 * Source: C. F. Colebrook (1939), J. Inst. Civil Eng. 11:133-156; the example is the reference value
 * in H. K. Winning and T. Coole (2013), Flow Turbulence Combust. 90:1-27.
 */
export function colebrookFrictionFactor(reynolds: number, relativeRoughness: number): number {
  checkRange('reynolds', reynolds, POSITIVE);
  checkRange('relativeRoughness', relativeRoughness, RELATIVE_ROUGHNESS_RANGE);
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
