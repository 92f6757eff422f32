import { colebrookFrictionFactorCore } from './colebrook-friction-factor-core.ts';
import { LAMINAR_LIMIT_REYNOLDS, TURBULENT_LIMIT_REYNOLDS } from './flow-regime.ts';
import type { FrictionBridge } from './darcy-friction-factor.ts';
import { laminarFrictionFactor } from './laminar-friction-factor.ts';

/** The bridge's turbulent end, f_Colebrook(4000, e/d): one value per roughness, kept for the last roughness asked
 * (a solver asks for the same tube's again and again, and Colebrook is an iteration). */
let bridgeEnd = { relativeRoughness: NaN, f: NaN };
function bridgeEndFrictionFactor(relativeRoughness: number): number {
  if (bridgeEnd.relativeRoughness !== relativeRoughness) {
    bridgeEnd = { relativeRoughness, f: colebrookFrictionFactorCore(TURBULENT_LIMIT_REYNOLDS, relativeRoughness) };
  }
  return bridgeEnd.f;
}

/**
 * darcyFrictionFactor without its input checks, for solvers' inner loops whose inputs were checked once at
 * their door (Re > 0, 0 <= e/d <= 0.1). The equation, its example and source: darcyFrictionFactor.
 */
export function darcyFrictionFactorCore(reynolds: number, relativeRoughness: number, bridge: FrictionBridge = 'linear'): number {
  if (reynolds <= LAMINAR_LIMIT_REYNOLDS) return laminarFrictionFactor(reynolds);
  if (reynolds >= TURBULENT_LIMIT_REYNOLDS) return colebrookFrictionFactorCore(reynolds, relativeRoughness);
  if (bridge !== 'linear') {
    const laminar = laminarFrictionFactor(reynolds);
    const turbulent = colebrookFrictionFactorCore(reynolds, relativeRoughness);
    return bridge === 'low' ? Math.min(laminar, turbulent) : Math.max(laminar, turbulent);
  }
  const fromF = laminarFrictionFactor(LAMINAR_LIMIT_REYNOLDS);
  const toF = bridgeEndFrictionFactor(relativeRoughness);
  const share = (reynolds - LAMINAR_LIMIT_REYNOLDS) / (TURBULENT_LIMIT_REYNOLDS - LAMINAR_LIMIT_REYNOLDS);
  return fromF + (toF - fromF) * share;
}
