import { checkRange, POSITIVE } from './check-range.ts';
import { colebrookFrictionFactorCore } from './colebrook-friction-factor-core.ts';

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
  return colebrookFrictionFactorCore(reynolds, relativeRoughness);
}
