/** Hydraulics of the sizing core: friction factors, open-valve flow, fill time, drain area, supply networks. SI units. */
export { laminarFrictionFactor } from './laminarFrictionFactor.ts';
export { colebrookFrictionFactor, MAX_RELATIVE_ROUGHNESS } from './colebrookFrictionFactor.ts';
export { swameeJainFrictionFactor } from './swameeJainFrictionFactor.ts';
export { blasiusFrictionFactor } from './blasiusFrictionFactor.ts';
export { darcyFrictionFactor } from './darcyFrictionFactor.ts';
export { flowRegime, LAMINAR_LIMIT_REYNOLDS, TURBULENT_LIMIT_REYNOLDS, type FlowRegime } from './flowRegime.ts';
export { reynoldsNumber, type ReynoldsOptions } from './reynoldsNumber.ts';
export { tubeHeadLossM, type TubeHeadLossOptions } from './tubeHeadLossM.ts';
export { jetHeadM, type JetHeadOptions } from './jetHeadM.ts';
export { supplyFlow, type SupplyFlowOptions, type SupplyFlowResult } from './supplyFlow.ts';
export { fillTimeS, type FillTimeOptions } from './fillTimeS.ts';
export { drainAreaRequiredM2, type DrainAreaOptions } from './drainAreaRequiredM2.ts';
export {
  solveSupplyNetwork,
  type NetworkBranch,
  type NetworkBranchResult,
  type SupplyNetworkOptions,
  type SupplyNetworkResult,
} from './solveSupplyNetwork.ts';
