/**
 * The plan's plate set in memory (generator/solids/mesh/plate-set-files.ts):
 * every part times its quantity lands on exactly one plate, each plate a 3MF
 * package holding 3D/3dmodel.model with one object and one build item per
 * part (3MF Core Specification 4.1: "object", "build/item"), and a smaller
 * bed takes more plates.
 */
import { strFromU8, unzipSync } from 'fflate';
import { describe, expect, it } from 'vitest';
import { plateSetFiles, PLATE_SET_BED } from '../../generator/solids/mesh/plate-set-files.ts';
import type { IndexedMesh } from '../../generator/solids/mesh/types.ts';

/** A closed box w x d x h mm resting on z = 0 (12 triangles). */
function box(w: number, d: number, h: number): IndexedMesh {
  const p = [0, 0, 0, w, 0, 0, w, d, 0, 0, d, 0, 0, 0, h, w, 0, h, w, d, h, 0, d, h];
  const t = [0, 2, 1, 0, 3, 2, 4, 5, 6, 4, 6, 7, 0, 1, 5, 0, 5, 4, 1, 2, 6, 1, 6, 5, 2, 3, 7, 2, 7, 6, 3, 0, 4, 3, 4, 7];
  return { positions: new Float32Array(p), indices: new Uint32Array(t) };
}

const objectNames = (bytes: Uint8Array) => {
  const model = strFromU8(unzipSync(bytes)['3D/3dmodel.model']!);
  return { objects: [...model.matchAll(/<object [^>]*name="([^"]+)"/g)].map((m) => m[1]!), items: (model.match(/<item /g) ?? []).length };
};

describe('plateSetFiles', () => {
  it('puts every part of every valve on one plate, named by design, part and copy', () => {
    const plates = plateSetFiles([
      { id: 'd1', quantity: 3, meshes: { housing: box(60, 60, 50), float: box(50, 50, 40) } },
      { id: 'd2', quantity: 2, meshes: { pin: box(10, 10, 30) } },
    ]);
    expect(plates.length).toBeGreaterThan(0);
    plates.forEach((p, n) => expect(p.file).toBe(`plates/plate-${String(n + 1).padStart(2, '0')}.3mf`));
    const all = plates.flatMap((p) => {
      const { objects, items } = objectNames(p.bytes);
      expect(items).toBe(objects.length);
      return objects;
    });
    expect(all.sort()).toEqual(['d1 float 1/3', 'd1 float 2/3', 'd1 float 3/3', 'd1 housing 1/3', 'd1 housing 2/3', 'd1 housing 3/3', 'd2 pin 1/2', 'd2 pin 2/2']);
  });

  it('needs more plates on a smaller bed', () => {
    const designs = [{ id: 'd1', quantity: 6, meshes: { housing: box(100, 100, 50) } }];
    const big = plateSetFiles(designs);
    const small = plateSetFiles(designs, { widthMm: 120, depthMm: 120 });
    expect(PLATE_SET_BED.plateWidthMm).toBe(256);
    expect(big.length).toBe(2); // two 100 mm parts a row, two rows on 256 mm: 4 a plate
    expect(small.length).toBe(6); // one a plate
  });
});
