/**
 * The bench page's plan, checked and solved with generator/plan (the same
 * parsing, solve and report as `floatwright plan`), turned into what the page
 * draws. Runs in the bench worker.
 */
import { documentWithHeads, memoisedSizer, parsePlan, planReport, solvePlan, type PlanResult } from '../../generator/plan/index.ts';
import type { DesignInputs } from '../../generator/sizing/inputs.ts';
import type { SizingResult } from '../../generator/sizing/result.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { BenchGroup, BenchSolved } from './bench-protocol.ts';

/** Sizings kept between edits, so changing one group sizes only that group again; emptied when it grows large. */
const CACHE_LIMIT = 4000;
let cached = 0;
let sizer = memoisedSizer();
function countingSizer(inputs: DesignInputs): SizingResult {
  if (++cached > CACHE_LIMIT) {
    sizer = memoisedSizer(sizeDesign);
    cached = 0;
  }
  return sizer(inputs);
}

export type BenchPlan = { ok: true; result: PlanResult } | { ok: false; errors: { field: string; message: string }[] };

/** parsePlan then solvePlan; problems come back with their plan paths. */
export function solveBench(doc: unknown): BenchPlan {
  const parsed = parsePlan(doc);
  if (!parsed.ok) return parsed;
  return solvePlan(parsed.plan, countingSizer);
}

/** The solved plan as the page shows it. */
export function benchView(result: PlanResult): BenchSolved {
  const p = result.plan;
  const groups = result.containers.map((c): BenchGroup => {
    const input = p.containers.find((k) => k.index === c.index)!;
    const doc = input.document;
    const s = c.sizing;
    return {
      index: c.index,
      name: c.name,
      count: c.count,
      design: c.design,
      floorElevationM: c.floorElevationM,
      mainLengthM: input.mainLengthM,
      tipElevationM: c.tipElevationM,
      headMaxM: c.headMaxM,
      headMinM: c.headMinM,
      targetMm: c.targetMm,
      levelFullMm: c.shutOffAtHeadMaxMm,
      levelLowMm: c.shutOffAtHeadMinMm,
      aloneFullLph: c.aloneFull.flowLph,
      sharedFullLph: c.sharedFull.flowLph,
      aloneLowLph: c.aloneLow.flowLph,
      sharedLowLph: c.sharedLow.flowLph,
      fillSharedMin: c.sharedFull.fillTimeMin,
      starving: c.starving,
      starvingReason: c.starvingReason,
      noFit: s.ok ? [] : s.reasons.map((r) => r.message),
      waysOut: c.waysOut,
      warnings: s.ok ? s.warnings.map((w) => w.message) : [],
      valveDoc: { ...documentWithHeads(doc, c.headMaxM, c.headMinM), name: c.name } as Record<string, unknown>,
    };
  });
  return {
    tankFullM: p.tankFullSurfaceElevationM,
    tankLowM: p.tankLowSurfaceElevationM,
    mainInnerDiameterMm: p.mainInnerDiameterM * 1e3,
    starvingShare: p.starvingShare,
    groups,
    designs: result.designs.length,
    report: planReport(result),
  };
}
