/**
 * Resource caps (DESIGN "Caps": no part over 250 mm, none over 200,000
 * triangles) are enforced before building: generator/solids/part-caps.ts
 * bounds each part's triangles from its facet counts (revolved profile 2 P N,
 * prism 4 M, booleans times a factor; elementary mesh counting). Checked here:
 * the bound holds for every part the fuzzing builds at both qualities
 * (fast-check property testing), no accepted design comes near the cap, and
 * sizing results edited past the caps are refused with a message naming the
 * part, before any geometry is made.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseDesign } from '../../generator/doc/schema.ts';
import { sizeDesign } from '../../generator/sizing/size-design.ts';
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import { direct } from '../sizing/fixtures.ts';
import { buildParts, PartBuildError } from '../../generator/solids/index.ts';
import { partCapProblems, triangleBounds } from '../../generator/solids/part-caps.ts';
import { designSpec, toDocument } from './arbitraries.ts';
import { fuzzSeed } from './budget.ts';
import { TRIANGLE_CAP } from './checks.ts';

function sized(doc: unknown): SizingSuccess | null {
  const parsed = parseDesign(doc);
  if (!parsed.ok) return null;
  const result = sizeDesign(parsed.inputs);
  return result.ok ? result : null;
}

const base = direct(sized({ supply: { headMax: '2.2 m' }, level: { target: '45 mm' }, valve: { architecture: 'direct' } }) ?? { ok: false, reasons: [], waysOut: [], warnings: [] });
/** The widest accepted design: a wide float allowed by the 250 mm limit (deep target, short head). */
const wide = sized({ supply: { headMax: '3.05 m' }, level: { target: '40 mm' }, limits: { maxOuterDiameter: '250 mm' }, nozzle: { sealDiameter: '12 mm' } });

describe('triangle bounds hold and accepted designs stay far under the cap', () => {
  it('every fuzzed design: built triangles <= the bound at preview and export quality; bound under the cap (fast-check)', async () => {
    let designs = 0;
    let worst = 0;
    await fc.assert(
      fc.asyncProperty(designSpec({ plausible: true }), async (spec) => {
        const sizing = sized(toDocument(spec));
        if (!sizing) return;
        designs++;
        for (const quality of ['preview', 'export'] as const) {
          const bounds = triangleBounds(sizing, quality);
          for (const b of Object.values(bounds)) expect(b).toBeLessThanOrEqual(TRIANGLE_CAP);
          if (quality === 'export' && designs > 8) continue; // export builds cost more: a handful per run
          const parts = await buildParts(sizing, { quality, withPad: true });
          for (const [name, mesh] of Object.entries(parts)) {
            const count = mesh!.indices.length / 3;
            const bound = bounds[name as keyof typeof bounds]!;
            worst = Math.max(worst, count / bound);
            expect(count, `${name} at ${quality}`).toBeLessThanOrEqual(bound);
          }
        }
      }),
      { numRuns: 40, seed: fuzzSeed() },
    );
    console.info(`[fuzz] caps: ${designs} designs, largest built/bound ratio ${worst.toFixed(2)}`);
  }, 120_000);

  it('the widest accepted design is still two orders of magnitude under the cap at export quality', () => {
    expect(wide).not.toBeNull();
    const bounds = triangleBounds(wide!, 'export');
    for (const b of Object.values(bounds)) expect(b).toBeLessThan(TRIANGLE_CAP / 10);
  });
});

describe('sizing results past the caps are refused before building, naming the part', () => {
  it('a housing foot of 2 m', async () => {
    const big = structuredClone(base);
    big.parts.housing.foot.outerDiameterMm = 2000;
    const started = performance.now();
    await expect(buildParts(big, { quality: 'preview' })).rejects.toThrow(/^housing: 2000\.0 mm across is over the 250 mm a part may be/);
    await expect(buildParts(big, { quality: 'preview' })).rejects.toBeInstanceOf(PartBuildError);
    expect(performance.now() - started).toBeLessThan(1000); // refused at once, nothing built (not a timing test of the build)
  });

  it('a float of 0.2 m across, a pin of 1 km (a unit slip), a NaN dimension', async () => {
    const wideFloat = structuredClone(base);
    wideFloat.parts.float.outerDiameterMm = 260;
    expect(partCapProblems(wideFloat, 'export', ['float'])[0].message).toMatch(/260\.0 mm across is over the 250 mm/);
    const pin = structuredClone(base);
    pin.parts.pin.diameterMm = 1e6;
    await expect(buildParts(pin, { quality: 'export' })).rejects.toThrow(/pin|faceted/);
    const nan = structuredClone(base);
    nan.parts.nozzle.totalLengthMm = Number.NaN;
    await expect(buildParts(nan, { quality: 'preview' })).rejects.toThrow(/^nozzle: its size \(NaN mm\) is not a positive number/);
  });

  it('a triangle bound over 200,000 is refused with the count', () => {
    // N = 4096 facets (the segment counter's own ceiling) on a housing: 2 x 10 x 4096 x 3 > 200,000
    const fine = structuredClone(base);
    fine.parts.housing.foot.outerDiameterMm = 240;
    const bounds = triangleBounds(fine, 'export');
    expect(bounds.housing).toBeLessThan(TRIANGLE_CAP);
    const problems = partCapProblems({ ...fine, parts: { ...fine.parts, housing: { ...fine.parts.housing, vents: { ...fine.parts.housing.vents, count: 5000 } } } }, 'export', ['housing']);
    expect(problems[0].message).toMatch(/triangles at export quality is over the 200,000 a part may have/);
  });
});
