import { checkRange, NON_NEGATIVE } from './check-range.ts';

/** Reynolds number up to which pipe flow is taken as laminar (common practice; White, Fluid Mechanics, ch. 6). */
export const LAMINAR_LIMIT_REYNOLDS = 2300;

/** Reynolds number from which pipe flow is taken as fully turbulent (common practice; White, Fluid Mechanics, ch. 6). */
export const TURBULENT_LIMIT_REYNOLDS = 4000;

export type FlowRegime = 'laminar' | 'transitional' | 'turbulent';

/**
 * Flow regime in a round tube from its Reynolds number.
 *
 * Rule: Re <= 2300 laminar, 2300 < Re < 4000 transitional, Re >= 4000 turbulent.
 *
 * @param reynolds Reynolds number Re = rho v d / mu (dimensionless, >= 0; 0 means no flow, reported as laminar)
 * @returns 'laminar' | 'transitional' | 'turbulent'
 *
 * Example: Re = 1948 gives 'laminar'; Re = 3896 gives 'transitional'.
 * Source: the usual engineering limits 2300 and 4000 (common practice; e.g. F. M. White, Fluid Mechanics, ch. 6).
 */
export function flowRegime(reynolds: number): FlowRegime {
  checkRange('reynolds', reynolds, NON_NEGATIVE);
  if (reynolds <= LAMINAR_LIMIT_REYNOLDS) return 'laminar';
  if (reynolds < TURBULENT_LIMIT_REYNOLDS) return 'transitional';
  return 'turbulent';
}
