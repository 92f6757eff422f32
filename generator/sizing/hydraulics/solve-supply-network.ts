import { ORIFICE_DISCHARGE_COEFFICIENT, SHARP_ENTRANCE_LOSS, TUBE_ROUGHNESS_M } from '../constants.ts';
import { checkRange } from './check-range.ts';
import { MAX_RELATIVE_ROUGHNESS } from './colebrook-friction-factor.ts';
import { flowRegime, type FlowRegime } from './flow-regime.ts';
import { illinoisIncreasing } from './illinois-increasing.ts';
import { reynoldsNumber } from './reynolds-number.ts';
import { tubeHeadLossM } from './tube-head-loss-m.ts';
import { valveFlowM3s } from './valve-flow-m3s.ts';

/** One tee on the main and the identical valves it feeds. */
export interface NetworkBranch {
  /** distance along the main from the tank to this branch's tee, m (>= 0; several branches may share one) */
  mainLengthM: number;
  /** identical valves fed from this tee, each by its own tube (whole number >= 0) */
  count: number;
  /** each valve's branch tube inner diameter, m (> 0) */
  tubeInnerDiameterM: number;
  /** each valve's branch tube length, m (>= 0) */
  tubeLengthM: number;
  /** each valve's nozzle orifice diameter, m (> 0) */
  orificeM: number;
  /** nozzle tip elevation, m, on the same datum as tankSurfaceElevationM */
  tipElevationM: number;
  /** each valve's bore length, m (>= 0): at least 3 bore diameters makes it a short tube (boreHeadM); default 0, a sharp orifice */
  boreLengthM?: number;
}

export interface SupplyNetworkOptions {
  /** tank water surface elevation, m (E_tank) */
  tankSurfaceElevationM: number;
  /** main pipe inner diameter, m (> 0) */
  mainInnerDiameterM: number;
  branches: readonly NetworkBranch[];
  /** liquid density, kg/m3 (> 0) */
  densityKgM3: number;
  /** liquid dynamic viscosity, Pa s (> 0) */
  viscosityPaS: number;
  /** loss coefficient where the main leaves the tank (>= 0); default SHARP_ENTRANCE_LOSS (0.5) */
  entranceLossK?: number;
  /** orifice discharge coefficient of every nozzle (0 < C_d <= 1); default ORIFICE_DISCHARGE_COEFFICIENT (0.61) */
  dischargeCoefficient?: number;
  /** wall roughness of main and branch tubes, m (>= 0, at most a tenth of every bore); default TUBE_ROUGHNESS_M */
  roughnessM?: number;
}

export interface NetworkBranchResult {
  /** flow through each valve of this branch, m3/s */
  flowM3s: number;
  /** the same in litres per hour */
  flowLph: number;
  /** all `count` valves together, L/h */
  totalLph: number;
  /** total energy head at the tee, m on the elevation datum (E_tank less the main's losses up to it) */
  headAtTeeM: number;
  /** Reynolds number in each valve's branch tube (0 at zero flow) */
  reynolds: number;
  regime: FlowRegime;
}

export interface SupplyNetworkResult {
  /** one entry per input branch, in input order */
  branches: NetworkBranchResult[];
  /** flow leaving the tank into the main, L/h (equals the sum of the branch totals) */
  mainFlowLph: number;
  /** true when the far-head bracket shrank to 1e-10 (relative to the head span searched) */
  converged: boolean;
  /** marches of the main taken by the outer root search */
  iterations: number;
}

const RELATIVE_TOLERANCE = 1e-10;

/**
 * Flows of a branched supply line with every valve wide open.
 *
 * Model: for each valve,
 * E_tank - h_main(tank -> its tee, including K_in at the tank) - h_branch(Q) - (Q/(C_d A_o))^2/2g = E_tip,
 * where each main segment between consecutive tees carries the sum of all flows drawn
 * downstream of it (Darcy-Weisbach with darcyFrictionFactor; tee losses neglected). A valve
 * whose tip lies above the head at its tee gets zero flow.
 *
 * Method: single-unknown shooting from the far end. Guess the energy head E_far at the farthest
 * tee; march up the main tee by tee, each valve's flow from the head at its tee (an inner bracketed
 * solve of the single-line energy balance), each segment's loss at the sum of the flows drawn beyond
 * it, to the tank surface this needs, E_tank(E_far). It increases with E_far (a higher far head
 * raises every draw and every loss upstream), equals E_far below the lowest tip (no flow), and is at
 * least E_tank at E_far = E_tank, so a bracketed search on E_far finds the one solution. Marching
 * this way, every segment's flow is the sum of draws beyond it: never negative, flow conserved
 * exactly, and no head ever above the tank (a march from the tank with a guessed outflow could run
 * the main dry part way and, with 150 rows of 1000 valves, overflow to an infinite head). Both root
 * searches keep a bracket and use the Illinois variant of regula falsi (as sure as bisection, far fewer
 * marches). Sources, from memory: energy equation for pipes in series and branching pipes (White, Fluid
 * Mechanics, ch. 6); Illinois method (Dowell and Jarratt 1971, BIT 11:168-174).
 *
 * Example: one valve on a tee 3 m along an 8 mm main (K_in 0.5), branch tube 4 mm x 2 m,
 * 3 mm orifice, tank 0.35 m above the tip, water at 20 C: 23.51 L/h, 0.3296 m of head at the tee,
 * Re 2072 in the branch tube (laminar). Hand check: two Hagen-Poiseuille resistances
 * 128 mu l / (pi rho g d^4) in series plus the entrance and jet heads, solved by bisection, give the same.
 */
export function solveSupplyNetwork(opts: SupplyNetworkOptions): SupplyNetworkResult {
  const tankM = checkRange('tankSurfaceElevationM', opts.tankSurfaceElevationM);
  const mainD = checkRange('mainInnerDiameterM', opts.mainInnerDiameterM, { min: 0, minExclusive: true });
  const densityKgM3 = checkRange('densityKgM3', opts.densityKgM3, { min: 0, minExclusive: true });
  const viscosityPaS = checkRange('viscosityPaS', opts.viscosityPaS, { min: 0, minExclusive: true });
  const entranceLossK = checkRange('entranceLossK', opts.entranceLossK ?? SHARP_ENTRANCE_LOSS, { min: 0 });
  const cd = checkRange('dischargeCoefficient', opts.dischargeCoefficient ?? ORIFICE_DISCHARGE_COEFFICIENT, {
    min: 0,
    minExclusive: true,
    max: 1,
  });
  const roughnessM = checkRange('roughnessM', opts.roughnessM ?? TUBE_ROUGHNESS_M, { min: 0 });
  const roughnessNote = { min: 0, max: MAX_RELATIVE_ROUGHNESS, note: 'roughnessM over the bore' };
  checkRange('roughnessM / mainInnerDiameterM', roughnessM / mainD, roughnessNote);
  if (!Array.isArray(opts.branches)) throw new RangeError(`branches = ${String(opts.branches)} is out of range; allowed: an array`);
  const branches = opts.branches.map((b, i) => {
    const at = `branches[${i}]`;
    const tubeInnerDiameterM = checkRange(`${at}.tubeInnerDiameterM`, b?.tubeInnerDiameterM, { min: 0, minExclusive: true });
    checkRange(`roughnessM / ${at}.tubeInnerDiameterM`, roughnessM / tubeInnerDiameterM, roughnessNote);
    return {
      index: i,
      mainLengthM: checkRange(`${at}.mainLengthM`, b.mainLengthM, { min: 0 }),
      count: checkRange(`${at}.count`, b.count, { min: 0, integer: true }),
      tipElevationM: checkRange(`${at}.tipElevationM`, b.tipElevationM),
      line: {
        headM: 0,
        tubeInnerDiameterM,
        tubeLengthM: checkRange(`${at}.tubeLengthM`, b.tubeLengthM, { min: 0 }),
        orificeM: checkRange(`${at}.orificeM`, b.orificeM, { min: 0, minExclusive: true }),
        densityKgM3,
        viscosityPaS,
        entranceLossK: 0,
        dischargeCoefficient: cd,
        roughnessM,
        boreLengthM: checkRange(`${at}.boreLengthM`, b.boreLengthM ?? 0, { min: 0 }),
      },
    };
  });
  // Stable sort: branches at one distance keep their input order.
  const alongMain = [...branches].sort((a, b) => a.mainLengthM - b.mainLengthM);

  const valveFlows = new Array<number>(branches.length).fill(0);
  const teeHeads = new Array<number>(branches.length).fill(tankM);

  /** Head lost along a main segment carrying flowM3s (>= 0: the draws downstream of it). */
  const mainLossM = (flowM3s: number, lengthM: number, minorLossK: number): number =>
    flowM3s > 0 ? tubeHeadLossM({ flowM3s, innerDiameterM: mainD, lengthM, densityKgM3, viscosityPaS, roughnessM, minorLossK }) : 0;

  let mainFlowM3s = 0;
  let overshootM = Infinity;
  /**
   * March up the main from the far tee, given the energy head there; fills valveFlows and
   * teeHeads and returns the tank surface this needs. Every segment carries the sum of the
   * draws beyond it, so flow is conserved by construction and no flow is ever negative.
   */
  const tankHeadFor = (farHeadM: number): number => {
    let headM = farHeadM;
    let inMainM3s = 0;
    for (let k = alongMain.length - 1; k >= 0; k--) {
      const b = alongMain[k]!;
      if (k < alongMain.length - 1) headM += mainLossM(inMainM3s, alongMain[k + 1]!.mainLengthM - b.mainLengthM, 0);
      // far above the tank already: this guess is too high whatever lies upstream (marching on could overflow)
      if (headM > tankM + overshootM) return headM;
      const q = b.count > 0 ? valveFlowM3s({ ...b.line, headM: headM - b.tipElevationM }, RELATIVE_TOLERANCE * 1e-2, 'illinois') : 0;
      valveFlows[b.index] = q;
      teeHeads[b.index] = headM;
      inMainM3s += b.count * q;
    }
    mainFlowM3s = inMainM3s;
    return alongMain.length ? headM + mainLossM(inMainM3s, alongMain[0]!.mainLengthM, entranceLossK) : headM;
  };

  // Below the lowest drawing tip nothing flows and the tank head needed equals the far head; at the tank's
  // own head it is at least the tank's. The far head is searched between, relative to the lower end.
  const drawing = alongMain.filter((b) => b.count > 0);
  const lowestM = Math.min(tankM, ...drawing.map((b) => b.tipElevationM));
  const spanM = tankM - lowestM;
  overshootM = Math.max(spanM, 1);
  const solved =
    drawing.length > 0 && spanM > 0
      ? illinoisIncreasing((d) => tankHeadFor(lowestM + d) - tankM, 0, spanM, RELATIVE_TOLERANCE)
      : { root: spanM, iterations: 0, converged: true };
  tankHeadFor(lowestM + solved.root); // leave the arrays at the answer

  const results = branches.map((b): NetworkBranchResult => {
    const flowM3s = valveFlows[b.index]!;
    const reynolds = reynoldsNumber({ flowM3s, innerDiameterM: b.line.tubeInnerDiameterM, densityKgM3, viscosityPaS });
    return {
      flowM3s,
      flowLph: flowM3s * 3.6e6,
      totalLph: b.count * flowM3s * 3.6e6,
      headAtTeeM: teeHeads[b.index]!,
      reynolds,
      regime: flowRegime(reynolds),
    };
  });
  return {
    branches: results,
    mainFlowLph: mainFlowM3s * 3.6e6,
    converged: solved.converged,
    iterations: solved.iterations,
  };
}
