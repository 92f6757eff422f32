/**
 * Timing of the housing-like test part's booleans (not a test: nothing fails
 * on time). Run: npx tsx test/mesh/bench-housing.ts
 * Reports the median of 10 runs after 3 warm-ups, per quality:
 *  - primitives: JSCAD building the tube, deck, boss and cutters
 *  - booleans:   welding them into manifold-3d, the unions and subtractions,
 *                and reading the result back as an indexed mesh
 * Source of the segment counts: sagitta relation (segmentsFor), common practice for the two qualities.
 */
import { loadManifold, manifoldToMesh, triangleCount } from '../../generator/solids/mesh/index.ts';
import { buildHousing, housingParts } from './fixtures/housing.ts';

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return (sorted[(sorted.length - 1) >> 1] + sorted[sorted.length >> 1]) / 2;
}

async function main(): Promise<void> {
  const wasm = await loadManifold();
  for (const quality of ['preview', 'export'] as const) {
    const primitiveMs: number[] = [];
    const booleanMs: number[] = [];
    let triangles = 0;
    for (let run = 0; run < 13; run++) {
      const t0 = performance.now();
      const parts = housingParts(quality);
      const t1 = performance.now();
      const mesh = manifoldToMesh(buildHousing(wasm, parts), { dispose: true });
      const t2 = performance.now();
      triangles = triangleCount(mesh);
      if (run >= 3) {
        primitiveMs.push(t1 - t0);
        booleanMs.push(t2 - t1);
      }
    }
    console.log(
      `${quality}: ${triangles} triangles; JSCAD primitives ${median(primitiveMs).toFixed(2)} ms, ` +
        `booleans (weld in, manifold-3d, mesh out) ${median(booleanMs).toFixed(2)} ms (median of 10 after 3 warm-ups)`,
    );
  }
}

main();
