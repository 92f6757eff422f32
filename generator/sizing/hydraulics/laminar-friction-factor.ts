import { checkRange, POSITIVE } from './check-range.ts';

/**
 * Darcy friction factor of fully developed laminar pipe flow.
 *
 * Equation: f = 64 / Re
 *
 * @param reynolds Reynolds number Re = rho v d / mu (dimensionless, > 0)
 * @returns Darcy friction factor f (dimensionless)
 *
 * Example: Re = 2000 gives f = 0.032.
 * Source: Hagen-Poiseuille law; any fluid mechanics text, e.g. F. M. White, Fluid Mechanics, ch. 6.
 */
export function laminarFrictionFactor(reynolds: number): number {
  checkRange('reynolds', reynolds, POSITIVE);
  return 64 / reynolds;
}
