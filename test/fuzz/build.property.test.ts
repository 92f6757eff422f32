/**
 * Property-based tests (fast-check): every design that sizes builds, at
 * preview quality, into parts that are closed 2-manifolds with positive volume
 * resting on the bed and under the triangle cap, checked with manifold-3d as
 * an independent mesh check (its status and volume) and a count of edge uses
 * (3MF core specification: every edge used exactly twice); the mounted parts
 * do not overlap at rest or at seal beyond the intended contacts (manifold-3d
 * intersection volumes). See checks.ts for the sources of each check.
 *
 * Designs that do not size at first are moved to a level from their smallest
 * reachable target upward, so most draws end in a build.
 */
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import { assemblyTransforms, buildParts } from '../../generator/solids/index.ts';
import { triangleBounds } from '../../generator/solids/part-caps.ts';
import { loadManifold, type IndexedMesh, type ManifoldToplevel } from '../../generator/solids/mesh/index.ts';
import { designSpec, setPath, toDocument } from './arbitraries.ts';
import { BUILD_RUNS, fuzzSeed } from './budget.ts';
import { checkAssembly, checkPartMeshes, checkSized } from './checks.ts';

let wasm: ManifoldToplevel;
beforeAll(async () => {
  wasm = await loadManifold();
});

/** The design sized, or moved up to a reachable level and sized; null if neither works. */
function sizedDesign(doc: Record<string, unknown>, rise: number): { sizing: SizingSuccess; doc: unknown } | null {
  const parsed = parseDesign(doc);
  if (!parsed.ok) return null;
  const first = sizeDesign(parsed.inputs);
  if (first.ok) return { sizing: first, doc };
  const level = first.waysOut.find((w) => w.field === 'level.target');
  const lowest = level ? Number.parseFloat(level.value) : NaN;
  if (!(lowest <= 250)) return null;
  const moved = setPath(doc, 'level.target', `${lowest + rise * (250 - lowest)} mm`);
  const again = parseDesign(moved);
  if (!again.ok) return null;
  const second = sizeDesign(again.inputs);
  return second.ok ? { sizing: second, doc: moved } : null;
}

const tally = { drawn: 0, built: 0, levers: 0, maxBuildMs: 0, maxTriangles: 0 };

describe('solids over the accepted input space (fast-check, manifold-3d)', () => {
  it(`${BUILD_RUNS} designs: every part a closed 2-manifold, positive volume, on the bed; no overlaps when mounted`, async () => {
    await fc.assert(
      fc.asyncProperty(designSpec({ plausible: true }), fc.double({ min: 0, max: 0.5, noNaN: true }), async (spec, rise) => {
        tally.drawn++;
        const found = sizedDesign(toDocument(spec), rise);
        if (!found) return;
        const { sizing, doc } = found;
        const sized = checkSized(sizing.inputs, sizing);
        if (sized.length) throw new Error(`${sized.join('\n')}\n${JSON.stringify(doc)}`);
        const started = performance.now();
        const parts = (await buildParts(sizing, { quality: 'preview', withPad: true })) as unknown as Record<string, IndexedMesh>;
        const ms = performance.now() - started;
        tally.built++;
        if (sizing.architecture === 'lever') tally.levers++;
        tally.maxBuildMs = Math.max(tally.maxBuildMs, ms);
        for (const m of Object.values(parts)) tally.maxTriangles = Math.max(tally.maxTriangles, m.indices.length / 3);
        // the caps are checked before building from a bound on each part's triangles: the bound must hold
        const bounds = triangleBounds(sizing, 'preview') as Record<string, number>;
        const overBound = Object.entries(parts).filter(([name, m]) => m.indices.length / 3 > bounds[name]).map(([name, m]) => `${name}: ${m.indices.length / 3} triangles over the bound ${bounds[name]}`);
        const problems = [
          ...overBound,
          ...checkPartMeshes(wasm, parts),
          ...checkAssembly(wasm, sizing, parts, { rest: assemblyTransforms(sizing, 'rest'), seal: assemblyTransforms(sizing, 'seal') }),
        ];
        if (problems.length) throw new Error(`${problems.join('\n')}\n${JSON.stringify(doc)}`);
      }),
      { numRuns: BUILD_RUNS, seed: fuzzSeed(), endOnFailure: true },
    );
    expect(tally.built).toBeGreaterThan(BUILD_RUNS / 3);
    // timing is reported, never tested (benchmarks are not timed tests)
    console.info(`[fuzz] build: ${JSON.stringify({ ...tally, maxBuildMs: Math.round(tally.maxBuildMs) })}`);
  }, 240_000);
});
