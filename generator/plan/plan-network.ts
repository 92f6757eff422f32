import { fillTimeS, solveSupplyNetwork, type NetworkBranch } from '../sizing/hydraulics/index.ts';
import type { DesignInputs } from '../sizing/inputs.ts';
import type { ValveFlow } from './types.ts';

export interface NetworkRow {
  count: number;
  mainLengthM: number;
  tipElevationM: number;
  /** the nozzle insert's length, the bore's (designBasis(inputs).nozzle.totalLengthMm / 1000), m; absent, a sharp orifice */
  boreLengthM?: number;
  inputs: DesignInputs;
}

export interface PlanNetworkOptions {
  tankSurfaceElevationM: number;
  mainInnerDiameterM: number;
  densityKgM3: number;
  viscosityPaS: number;
  rows: readonly NetworkRow[];
}

export interface PlanNetworkFlows {
  /** each row's valve with every valve of the plan open */
  shared: ValveFlow[];
  /** each row's valve open alone (one valve, main included) */
  alone: ValveFlow[];
  /** tank outflow with every valve open, L/h */
  mainFlowLph: number;
}

function branchOf(row: NetworkRow, count: number): NetworkBranch {
  return {
    mainLengthM: row.mainLengthM,
    count,
    tubeInnerDiameterM: row.inputs.tubeInnerDiameterM,
    tubeLengthM: row.inputs.tubeLengthM,
    orificeM: row.inputs.orificeM,
    tipElevationM: row.tipElevationM,
    // the bore as the single design sizes it: a short tube when the insert is at least three bores long
    boreLengthM: row.boreLengthM,
  };
}

function withFill(inputs: DesignInputs, flowM3s: number): ValveFlow {
  const s =
    inputs.reservoirAreaM2 !== null && inputs.reservoirRiseM !== null
      ? fillTimeS({ areaM2: inputs.reservoirAreaM2, riseM: inputs.reservoirRiseM, flowM3s })
      : null;
  return { flowLph: flowM3s * 3.6e6, fillTimeMin: s === null ? null : s / 60 };
}

/**
 * Flows of a plan's supply at one tank level: every valve wide open at once
 * (the worst case for the far and high containers), and each row's valve open
 * alone, through the main and its own branch tube (solveSupplyNetwork with
 * that one branch, so the main's loss is counted). Fill time t = A rise / Q.
 * Source: solveSupplyNetwork (energy equation for branching pipes, White, Fluid Mechanics ch. 6).
 */
export function planNetwork(opts: PlanNetworkOptions): PlanNetworkFlows {
  const common = {
    tankSurfaceElevationM: opts.tankSurfaceElevationM,
    mainInnerDiameterM: opts.mainInnerDiameterM,
    densityKgM3: opts.densityKgM3,
    viscosityPaS: opts.viscosityPaS,
  };
  const all = solveSupplyNetwork({ ...common, branches: opts.rows.map((r) => branchOf(r, r.count)) });
  const shared = opts.rows.map((r, i) => withFill(r.inputs, all.branches[i]!.flowM3s));
  const alone = opts.rows.map((r) => {
    const one = solveSupplyNetwork({ ...common, branches: [branchOf(r, 1)] });
    return withFill(r.inputs, one.branches[0]!.flowM3s);
  });
  return { shared, alone, mainFlowLph: all.mainFlowLph };
}

/**
 * Whether a row starves, and why (null when it does not): with every valve open
 * at once its valve gets nothing; or less than its plants use at their peak
 * (`demandLph`: even wide open it cannot keep up, so the reservoir falls however
 * long the valve stays open); or less than `share` of what it gets alone.
 *
 * Example: 3 L/h shared against 4 L/h alone at a share of 0.5 does not starve on
 * the share (75 %), but does under a peak use of 100 L/day (4.17 L/h).
 */
export function starvingReason(shared: ValveFlow, alone: ValveFlow, share: number, tankText: string, demandLph = 0): string | null {
  if (shared.flowLph <= 0) return `gets no water with every valve open at ${tankText}`;
  if (shared.flowLph < demandLph) {
    const lph = (x: number) => Number(x.toPrecision(3)).toString();
    return `gets ${lph(shared.flowLph)} L/h with every valve open at ${tankText}, less than its plants' peak use (${lph(demandLph * 24)} L/day, ${lph(demandLph)} L/h)`;
  }
  if (shared.flowLph < share * alone.flowLph) {
    const pct = Math.floor((100 * shared.flowLph) / alone.flowLph);
    return `gets ${pct} % of its own flow with every valve open at ${tankText} (below ${Math.round(share * 100)} %)`;
  }
  return null;
}
