/**
 * contractionLossK without its input check, for solvers' inner loops whose diameter ratio was checked once
 * at their door (0 < beta <= 1). The equation, its example and source: contractionLossK.
 */
export function contractionLossKCore(beta: number): number {
  return 0.5 * (1 - beta * beta);
}
