/** Hydraulics of the sizing core: friction factors, open-valve flow, fill time, drain area, supply networks. SI units. */
export { laminarFrictionFactor } from './laminar-friction-factor.ts';
export { colebrookFrictionFactor, MAX_RELATIVE_ROUGHNESS } from './colebrook-friction-factor.ts';
export { swameeJainFrictionFactor } from './swamee-jain-friction-factor.ts';
export { blasiusFrictionFactor } from './blasius-friction-factor.ts';
export { darcyFrictionFactor, type FrictionBridge } from './darcy-friction-factor.ts';
export { flowRegime, LAMINAR_LIMIT_REYNOLDS, TURBULENT_LIMIT_REYNOLDS, type FlowRegime } from './flow-regime.ts';
export { reynoldsNumber, type ReynoldsOptions } from './reynolds-number.ts';
export { tubeHeadLossM, type TubeHeadLossOptions } from './tube-head-loss-m.ts';
export { contractionLossK } from './contraction-loss-k.ts';
export { boreModel, SHORT_TUBE_MIN_LENGTH_RATIO, type BoreModel } from './bore-model.ts';
export { boreHeadM, type BoreHeadOptions } from './bore-head-m.ts';
export { jetHeadM, type JetHeadOptions } from './jet-head-m.ts';
export { supplyFlow, type SupplyFlowOptions, type SupplyFlowResult } from './supply-flow.ts';
export { fillTimeS, type FillTimeOptions } from './fill-time-s.ts';
export { drainAreaRequiredM2, type DrainAreaOptions } from './drain-area-required-m2.ts';
export {
  solveSupplyNetwork,
  type NetworkBranch,
  type NetworkBranchResult,
  type SupplyNetworkOptions,
  type SupplyNetworkResult,
} from './solve-supply-network.ts';
