import { checkRange } from './check-range.ts';
import { MAX_RELATIVE_ROUGHNESS } from './colebrook-friction-factor.ts';

/**
 * Explicit approximation of the Colebrook-White friction factor (for cross-checks).
 *
 * Equation: f = 0.25 / [ log10( (e/d)/3.7 + 5.74 / Re^0.9 ) ]^2
 *
 * @param reynolds Reynolds number (dimensionless, > 0; stated range 5000 to 1e8)
 * @param relativeRoughness e/d (dimensionless, 0 to 0.1; stated range 1e-6 to 1e-2)
 * @returns Darcy friction factor f (dimensionless)
 *
 * Example: Re = 1e5, e/d = 1e-4 gives f = 0.018452 (within 0.5 % of Colebrook's 0.018514).
 * Source: P. K. Swamee and A. K. Jain (1976), J. Hydraul. Div. ASCE 102(5):657-664.
 */
export function swameeJainFrictionFactor(reynolds: number, relativeRoughness: number): number {
  checkRange('reynolds', reynolds, { min: 0, minExclusive: true });
  checkRange('relativeRoughness', relativeRoughness, { min: 0, max: MAX_RELATIVE_ROUGHNESS });
  const log = Math.log10(relativeRoughness / 3.7 + 5.74 / reynolds ** 0.9);
  return 0.25 / (log * log);
}
