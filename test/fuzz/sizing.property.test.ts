/**
 * Property-based tests (fast-check) of the design document and the sizing
 * core over the whole accepted input space (generators in arbitraries.ts).
 *
 * For every accepted document: it parses; sizing never throws; a design that
 * sizes keeps every invariant of checks.ts (finite numbers; shut-off at H_max
 * equal to the target within 0.5 mm; Archimedes' lift over the reserve; travel,
 * clearance, drain by the orifice equation, vents, caps); a design that does
 * not size says why in words. When the only way out is a higher target, the
 * design is tried again at a level from that smallest reachable one upward.
 *
 * Seeds: each run draws new designs; a failure prints fast-check's seed and
 * path. Replay one with FUZZ_SEED=<seed> npx vitest run test/fuzz. Every
 * counterexample found so far is kept in regressions.test.ts.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { SizingResult } from '../../generator/sizing/result.ts';
import { designSpec, setPath, toDocument, type DesignSpec } from './arbitraries.ts';
import { calibrationMayBeRefused, checkInfeasible, checkSized, onlyCalibrationRefused } from './checks.ts';
import { fuzzSeed, SIZING_RUNS } from './budget.ts';

/** Counts per run, shown at the end (designs sized, sized ok, retargeted). */
const tally = { designs: 0, sized: 0, infeasible: 0, retargeted: 0, retargetedSized: 0 };

function sizeOrThrow(doc: unknown, spec: DesignSpec): { result: SizingResult; inputs: ReturnType<typeof parseDesign> } | null {
  const parsed = parseDesign(doc);
  if (!parsed.ok) {
    // bench points that may be refused (calibrationMayBeRefused): that one refusal is allowed, and must say so on seal.calibration
    const scattered = calibrationMayBeRefused(spec, doc);
    const onlyCalibration = onlyCalibrationRefused(parsed.errors);
    if (scattered && onlyCalibration) return null;
    throw new Error(`accepted document refused: ${JSON.stringify(parsed.errors)}\n${JSON.stringify(doc)}`);
  }
  tally.designs++;
  const result = sizeDesign(parsed.inputs);
  return { result, inputs: parsed };
}

function check(doc: unknown, spec: DesignSpec): SizingResult | null {
  const sized = sizeOrThrow(doc, spec);
  if (!sized) return null;
  const { result, inputs } = sized;
  if (!inputs.ok) return null;
  const problems = result.ok ? checkSized(inputs.inputs, result) : checkInfeasible(result);
  if (result.ok) tally.sized++;
  else tally.infeasible++;
  if (problems.length) throw new Error(`${problems.join('\n')}\n${JSON.stringify(doc)}`);
  return result;
}

describe('sizing over the accepted input space (fast-check properties)', () => {
  it(`${SIZING_RUNS} designs: parse, size or say why, invariants hold; levels from the smallest reachable upward`, () => {
    fc.assert(
      fc.property(fc.oneof(designSpec({ plausible: true }), designSpec()), fc.double({ min: 0, max: 1, noNaN: true }), (spec, rise) => {
        const doc = toDocument(spec);
        const result = check(doc, spec);
        if (!result || result.ok) return;
        const level = result.waysOut.find((w) => w.field === 'level.target');
        if (!level) return;
        // the smallest reachable target and upward (to the 250 mm cap of the field)
        const lowest = Number.parseFloat(level.value);
        expect(Number.isFinite(lowest)).toBe(true);
        if (lowest > 250) return;
        // a way out must work as given: the level alone, or the level together with the diameter limit it names
        const foot = /together/.test(level.message) ? result.waysOut.find((w) => w.field === 'limits.maxOuterDiameter') : undefined;
        // a container's rim stays at least as high as the level (the schema refuses less): raised with it here
        const withLevel = (d: Record<string, unknown>, value: string) => {
          const out = setPath(d, 'level.target', value);
          const rim = (d.container as { rimHeight?: unknown } | undefined)?.rimHeight;
          return rim === undefined ? out : setPath(out, 'container.rimHeight', `${Number.parseFloat(value) + 100} mm`);
        };
        let atWayOut = withLevel(doc, level.value);
        if (foot) atWayOut = setPath(atWayOut, 'limits.maxOuterDiameter', foot.value);
        const applied = check(atWayOut, spec);
        if (applied && !applied.ok) throw new Error(`the way out ${level.value}${foot ? ` with a ${foot.value} foot` : ''} does not size: ${applied.reasons.map((r) => r.code)}\n${JSON.stringify(doc)}`);
        tally.retargeted++;
        const target = lowest + rise * rise * (250 - lowest);
        const again = check(withLevel(doc, `${target} mm`), spec);
        if (again?.ok) tally.retargetedSized++;
      }),
      { numRuns: SIZING_RUNS, seed: fuzzSeed(), endOnFailure: true },
    );
    // the generators must reach feasible designs too, or the invariants test little
    expect(tally.sized).toBeGreaterThan(SIZING_RUNS / 10);
    console.info(`[fuzz] sizing: ${JSON.stringify(tally)}`);
  }, 180_000);
});
