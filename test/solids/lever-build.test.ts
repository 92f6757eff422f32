/**
 * Lever valves built through the same door as the direct valve's (buildParts,
 * assemblyTransforms, writeDesignFiles): every part a closed 2-manifold resting
 * on the bed in its print pose, no two parts overlapping as mounted at the seal
 * and at rest (manifold-3d intersection volumes, an independent library; the
 * nozzle's crush ribs in the frame's seat and the lip in the pad are the
 * allowed contacts, bounded analytically), and the file set: one STL per part,
 * the 3MF plate, the design and the build sheet. Designs: our own scenarios (a
 * 25 mm tray at 2 m and a 250 mm bucket at 1.5 m hung from a rim 100 mm higher).
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { assemblyTransforms, buildParts, valvePartNames } from '../../generator/solids/index.ts';
import { countEdgeUses, loadManifold, meshBounds, type ManifoldToplevel } from '../../generator/solids/mesh/index.ts';
import { writeDesignFiles } from '../../generator/solids/write-design-files.ts';
import { checkAssembly } from '../fuzz/checks.ts';
import { lever } from '../sizing/fixtures.ts';
import { sizeAnyDoc } from './helpers.ts';
import { BUCKET_RIM, TRAY_LEVER } from './lever-demos.ts';


let wasm: ManifoldToplevel;
const scratch = mkdtempSync(join(tmpdir(), 'fw-lever-build-'));
beforeAll(async () => {
  wasm = await loadManifold();
});
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

for (const [label, doc, mount, count] of [['tray lever on the floor', TRAY_LEVER, 'floor', 5], ['bucket lever on the rim', BUCKET_RIM, 'rim', 7]] as const) {
  describe(label, () => {
    const { sizing, document } = sizeAnyDoc(doc);
    const s = lever(sizing);

    it(`${count} parts, each closed and on the bed; mounted, none overlaps another at the seal or at rest`, async () => {
      expect(s.mount).toBe(mount);
      const names = valvePartNames(s);
      expect(names).toHaveLength(count);
      const parts = await buildParts(s, { quality: 'preview', withPad: true });
      for (const name of [...names, 'pad' as const]) {
        const mesh = parts[name]!;
        expect(countEdgeUses(mesh).closed, name).toBe(true);
        expect(meshBounds(mesh).min[2], name).toBeCloseTo(0, 6);
      }
      const problems = checkAssembly(wasm, s, parts, { rest: assemblyTransforms(s, 'rest'), seal: assemblyTransforms(s, 'seal') });
      expect(problems).toEqual([]);
    });

    it('writes one STL per part, the plate, the design and the build sheet', async () => {
      const written = await writeDesignFiles(s, document, join(scratch, mount), { quality: 'preview' });
      const names = written.files.map((f) => f.split('/').pop()!);
      for (const part of valvePartNames(s)) expect(names.some((n) => n.endsWith(`-${part}.stl`)), part).toBe(true);
      expect(names.some((n) => n.endsWith('-plate.3mf'))).toBe(true);
      expect(names.some((n) => n.endsWith('-build-sheet.md'))).toBe(true);
    });
  });
}
