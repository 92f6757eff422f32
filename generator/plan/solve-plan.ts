import type { FieldError } from '../doc/fields.ts';
import { formatNumber } from '../doc/units.ts';
import { HEAD_CAP_M } from '../sizing/constants.ts';
import type { DesignInputs } from '../sizing/inputs.ts';
import type { SizingResult, SizingSuccess, WayOut } from '../sizing/result.ts';
import { sizeDesign } from '../sizing/size-design.ts';
import { designBasis } from '../sizing/layout/design-basis.ts';
import { groupDesigns } from './group-designs.ts';
import { planNetwork, starvingReason } from './plan-network.ts';
import { planPathFor } from './schema.ts';
import { solveTipElevation } from './solve-tip-elevation.ts';
import type { PlanContainerResult, PlanDesign, PlanInputs, PlanResult, PlanTotals, TipSolution } from './types.ts';

export type PlanSolve = { ok: true; result: PlanResult } | { ok: false; errors: FieldError[] };

/** sizeDesign with a cache: identical containers are sized once. */
export function memoisedSizer(size: (inputs: DesignInputs) => SizingResult = sizeDesign): (inputs: DesignInputs) => SizingResult {
  const cache = new Map<string, SizingResult>();
  return (inputs) => {
    const key = JSON.stringify(inputs);
    let hit = cache.get(key);
    if (!hit) cache.set(key, (hit = size(inputs)));
    return hit;
  };
}

const m = (x: number) => `${formatNumber(x, 4)} m`;

/** The head range a container's elevation gives, checked against the sizing's limits: null when fine. */
function headProblem(plan: PlanInputs, c: PlanInputs['containers'][number], tip: TipSolution): FieldError | null {
  const field = `containers.${c.index}.floorElevation`;
  const tipHeightM = tip.tipElevationM - c.floorElevationM;
  if (tip.headMaxM > HEAD_CAP_M) {
    return {
      field,
      message: `${m(c.floorElevationM)} is too low; with the nozzle tip ${formatNumber(tipHeightM * 1e3, 3)} mm above the floor the full tank stands ${m(tip.headMaxM)} above it, more than ${m(HEAD_CAP_M)}: the floor must be at least ${m(plan.tankFullSurfaceElevationM - HEAD_CAP_M - tipHeightM)} (or lower the tank). floatwright sizes valves for low-pressure gravity feed only.`,
    };
  }
  if (tip.headMinM <= 0) {
    return {
      field,
      message: `${m(c.floorElevationM)} is too high; the nozzle tip (${m(tip.tipElevationM)}) is not below the tank's lowest surface (${m(plan.tankLowSurfaceElevationM)}): the floor must be below ${m(plan.tankLowSurfaceElevationM - tipHeightM)}.`,
    };
  }
  return null;
}

/** A sizing way out in plan terms: a lower head becomes a higher floor; other fields map to where they were written. */
function planWayOut(w: WayOut, c: PlanInputs['containers'][number], tip: TipSolution, plan: PlanInputs): WayOut {
  const headM = w.field === 'supply.headMax' ? Number.parseFloat(w.value) : NaN;
  if (Number.isFinite(headM)) {
    const floorM = plan.tankFullSurfaceElevationM - headM - (tip.tipElevationM - c.floorElevationM);
    const v = Math.ceil(floorM * 100) / 100;
    return { field: `containers.${c.index}.floorElevation`, value: `${formatNumber(v, 4)} m`, message: `a floor at least ${formatNumber(v, 4)} m up (at most ${w.value} of head), or a lower tank` };
  }
  return { ...w, field: planPathFor(w.field, c.origins, `design.${w.field}`) };
}

/**
 * Plans a whole bench: each container's head range solved with its own tip
 * height, each valve sized, identical valves grouped into one file set, the
 * supply network with every valve open (and each alone) at full and low tank,
 * starving containers named, and the totals to buy and print.
 */
export function solvePlan(plan: PlanInputs, size: (inputs: DesignInputs) => SizingResult = memoisedSizer()): PlanSolve {
  const tips = plan.containers.map((c) =>
    solveTipElevation({
      inputs: c.inputs,
      floorElevationM: c.floorElevationM,
      tankFullSurfaceElevationM: plan.tankFullSurfaceElevationM,
      tankLowSurfaceElevationM: plan.tankLowSurfaceElevationM,
      size,
    }),
  );
  const errors = plan.containers.map((c, i) => headProblem(plan, c, tips[i]!)).filter((e): e is FieldError => e !== null);
  if (errors.length) return { ok: false, errors };

  const { groups, idOf } = groupDesigns(tips.map((t, i) => ({ sizing: t.sizing.ok ? t.sizing : null, count: plan.containers[i]!.count })));

  const rows = plan.containers.map((c, i) => ({
    count: c.count,
    mainLengthM: c.mainLengthM,
    tipElevationM: tips[i]!.tipElevationM,
    boreLengthM: designBasis(c.inputs).nozzle.totalLengthMm * 1e-3,
    inputs: c.inputs,
  }));
  const common = { mainInnerDiameterM: plan.mainInnerDiameterM, densityKgM3: plan.liquidDensityKgM3, viscosityPaS: plan.liquidViscosityPaS, rows };
  const full = planNetwork({ ...common, tankSurfaceElevationM: plan.tankFullSurfaceElevationM });
  const low = planNetwork({ ...common, tankSurfaceElevationM: plan.tankLowSurfaceElevationM });

  const containers = plan.containers.map((c, i): PlanContainerResult => {
    const tip = tips[i]!;
    const s = tip.sizing;
    const demandLph = c.inputs.demandM3s * 3.6e6;
    const reason =
      starvingReason(full.shared[i]!, full.alone[i]!, plan.starvingShare, 'full tank', demandLph) ??
      starvingReason(low.shared[i]!, low.alone[i]!, plan.starvingShare, 'low tank', demandLph);
    return {
      index: c.index,
      name: c.name,
      count: c.count,
      design: idOf[i]!,
      floorElevationM: c.floorElevationM,
      tipElevationM: tip.tipElevationM,
      headMaxM: tip.headMaxM,
      headMinM: tip.headMinM,
      targetMm: c.inputs.targetLevelM * 1e3,
      shutOffAtHeadMaxMm: s.ok ? s.levels.shutOffAtHeadMaxMm : null,
      shutOffAtHeadMinMm: s.ok ? s.levels.shutOffAtHeadMinMm : null,
      aloneFull: full.alone[i]!,
      aloneLow: low.alone[i]!,
      sharedFull: full.shared[i]!,
      sharedLow: low.shared[i]!,
      starving: reason !== null,
      starvingReason: reason,
      tipConverged: tip.converged,
      sizing: s,
      waysOut: s.ok ? [] : s.waysOut.map((w) => planWayOut(w, c, tip, plan)),
    };
  });

  const designs: PlanDesign[] = groups.map((g) => ({
    id: g.id,
    containerIndices: g.members.map((k) => plan.containers[k]!.index),
    quantity: g.quantity,
    sizing: g.sizing,
  }));

  const sized = containers.filter((c): c is PlanContainerResult & { sizing: SizingSuccess } => c.sizing.ok);
  const sumOf = (f: (c: (typeof sized)[number]) => number) => sized.reduce((a, c) => a + c.count * f(c), 0);
  const totals: PlanTotals = {
    // housing, float, nozzle, pin; a lever's frame, arm, float, nozzle, pin, and on the rim its hanger and stem
    parts: sumOf((c) => (c.sizing.architecture === 'direct' ? 4 : c.sizing.rim ? 7 : 5)),
    valves: sumOf(() => 1),
    filamentG: sumOf((c) => c.sizing.mass.totalG - c.sizing.mass.byPart.pad),
    filamentM: sumOf((c) => c.sizing.mass.filamentM),
    ballastSteelG: sumOf((c) => c.sizing.holdDown.ballastSteelG),
    mainFlowLph: full.mainFlowLph,
    mainFlowLowLph: low.mainFlowLph,
  };
  return { ok: true, result: { ok: sized.length === containers.length, plan, containers, designs, totals } };
}
