import { normalizedText } from '../doc/fields.ts';
import type { NormalizedDoc } from '../doc/schema.ts';
import type { SizingSuccess } from '../sizing/result.ts';
import type { PlanResult } from './types.ts';

/** Rounds for JSON output: enough digits for a grower, none of the float noise. */
const r = (x: number | null, digits = 4): number | null => (x === null ? null : Number(x.toFixed(digits)));

/** The sizing fields of one design, as `floatwright size --json` prints them (the whole result but its `ok`). */
export function sizingFields(s: SizingSuccess): Omit<SizingSuccess, 'ok'> {
  const { ok: _ok, ...fields } = s;
  return fields;
}

/** A design document written out with the heads the plan solved for it. */
export function documentWithHeads(doc: NormalizedDoc, headMaxM: number, headMinM: number): NormalizedDoc {
  return { ...doc, supply: { ...doc.supply, headMax: normalizedText(headMaxM, 'm'), headMin: normalizedText(headMinM, 'm') } };
}

/**
 * The plan as `--json` prints it: `{ ok, containers, designs, totals }`.
 * `files` maps a design id to the files written for it (paths relative to the output folder).
 */
export function planJson(result: PlanResult, files: Readonly<Record<string, readonly string[]>> = {}, extra: Record<string, unknown> = {}) {
  const containers = result.containers.map((c) => ({
    name: c.name,
    count: c.count,
    design: c.design,
    floorElevationM: r(c.floorElevationM),
    tipElevationM: r(c.tipElevationM),
    headMaxM: r(c.headMaxM),
    headMinM: r(c.headMinM),
    targetMm: r(c.targetMm, 2),
    shutOffAtHeadMaxMm: r(c.shutOffAtHeadMaxMm, 2),
    shutOffAtHeadMinMm: r(c.shutOffAtHeadMinMm, 2),
    flowAloneLph: r(c.aloneFull.flowLph, 2),
    flowSharedLph: r(c.sharedFull.flowLph, 2),
    flowAloneAtLowTankLph: r(c.aloneLow.flowLph, 2),
    flowSharedAtLowTankLph: r(c.sharedLow.flowLph, 2),
    fillTimeAloneMin: r(c.aloneFull.fillTimeMin, 2),
    fillTimeSharedMin: r(c.sharedFull.fillTimeMin, 2),
    fillTimeSharedAtLowTankMin: r(c.sharedLow.fillTimeMin, 2),
    starving: c.starving,
    starvingReason: c.starvingReason,
    tipConverged: c.tipConverged,
    warnings: c.sizing.warnings,
    ...(c.sizing.ok ? {} : { reasons: c.sizing.reasons, waysOut: c.waysOut }),
  }));
  const designs = result.designs.map((d) => {
    const first = result.containers.find((c) => c.index === d.containerIndices[0])!;
    const doc = result.plan.containers.find((c) => c.index === first.index)!.document;
    return {
      id: d.id,
      quantity: d.quantity,
      containers: d.containerIndices.map((i) => result.containers.find((c) => c.index === i)!.name),
      files: files[d.id] ?? [],
      document: documentWithHeads(doc, first.headMaxM, first.headMinM),
      ...sizingFields(d.sizing),
    };
  });
  const t = result.totals;
  return {
    ok: result.ok,
    ...extra,
    containers,
    designs,
    totals: {
      parts: t.parts,
      valves: t.valves,
      filamentG: r(t.filamentG, 1),
      filamentM: r(t.filamentM, 2),
      ballastSteelG: r(t.ballastSteelG, 0),
      mainFlowLph: r(t.mainFlowLph, 2),
      mainFlowAtLowTankLph: r(t.mainFlowLowLph, 2),
    },
  };
}
