import { checkRange, POSITIVE } from './check-range.ts';

/**
 * Darcy friction factor of turbulent flow in a smooth pipe (for cross-checks).
 *
 * Equation: f = 0.3164 Re^-0.25
 *
 * @param reynolds Reynolds number (dimensionless, > 0; stated range about 4000 to 1e5)
 * @returns Darcy friction factor f (dimensionless)
 *
 * Example: Re = 1e5 gives f = 0.017792.
 * Source: H. Blasius (1913), Mitt. Forschungsarb. Ingenieurwes. 131.
 */
export function blasiusFrictionFactor(reynolds: number): number {
  checkRange('reynolds', reynolds, POSITIVE);
  return 0.3164 * reynolds ** -0.25;
}
