import { checkRange, POSITIVE } from './check-range.ts';
import { RELATIVE_ROUGHNESS_RANGE } from './colebrook-friction-factor.ts';
import { darcyFrictionFactorCore } from './darcy-friction-factor-core.ts';

/**
 * How friction is taken between Re 2300 and 4000, where no formula is settled: 'linear' (the
 * sizing's nominal bridge), or its bounds, 'low' = min(64/Re, Colebrook) and 'high' = max of the two
 * (the laminar and turbulent ends carried into the gap; used for the flow band).
 */
export type FrictionBridge = 'linear' | 'low' | 'high';

/**
 * Darcy friction factor over the whole Reynolds range, as the sizing model uses it.
 *
 * Equation: f = 64/Re for Re <= 2300; Colebrook-White for Re >= 4000; in between,
 * linear in Re from 64/2300 to f_Colebrook(4000, e/d). The bridge keeps f continuous
 * (so the flow solvers see a continuous, increasing head loss) and rises with Re,
 * as measured friction does through transition.
 *
 * @param reynolds Reynolds number (dimensionless, > 0)
 * @param relativeRoughness e/d (dimensionless, 0 to 0.1)
 * @param bridge friction between Re 2300 and 4000 (FrictionBridge); default 'linear'
 * @returns Darcy friction factor f (dimensionless)
 *
 * Example: Re = 1948 gives 0.032854 (laminar); Re = 3150, e/d = 3.75e-4 gives
 * 0.027826 + 0.5 (0.040286 - 0.027826) = 0.034056 (f_Colebrook(4000, 3.75e-4) = 0.040286).
 * Source: 64/Re Hagen-Poiseuille; Colebrook (1939); the linear bridge is the project's
 * design rule (common practice: the transition zone has no settled formula).
 */
export function darcyFrictionFactor(reynolds: number, relativeRoughness: number, bridge: FrictionBridge = 'linear'): number {
  checkRange('reynolds', reynolds, POSITIVE);
  checkRange('relativeRoughness', relativeRoughness, RELATIVE_ROUGHNESS_RANGE);
  return darcyFrictionFactorCore(reynolds, relativeRoughness, bridge);
}
