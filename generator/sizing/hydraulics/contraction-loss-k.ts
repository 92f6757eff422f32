import { checkRange, type AllowedRange } from './check-range.ts';
import { contractionLossKCore } from './contraction-loss-k-core.ts';

/** Allowed diameter ratios: 0 < beta <= 1. */
export const BETA_RANGE: AllowedRange = Object.freeze({ min: 0, minExclusive: true, max: 1 });

/**
 * Loss coefficient of a sudden contraction, on the small pipe's velocity head.
 *
 * Equation: K = 0.5 (1 - beta^2), beta = d_small / d_large (dimensionless, 0 < beta <= 1).
 *
 * @param beta diameter ratio d_small / d_large (dimensionless, > 0, <= 1)
 * @returns K (dimensionless): the head lost is K v_small^2 / (2 g)
 *
 * Example: a 2 mm bore fed from a 4 mm tube, beta = 0.5, gives K = 0.5 (1 - 0.25) = 0.375.
 * Source: Crane Technical Paper 410, sudden contraction (K on the small pipe's velocity).
 */
export function contractionLossK(beta: number): number {
  checkRange('beta', beta, BETA_RANGE);
  return contractionLossKCore(beta);
}
