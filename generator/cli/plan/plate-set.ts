/**
 * The plan's combined plate set on disk (packing and 3MF in
 * generator/solids/mesh/plate-set-files.ts). The meshes are read back from the
 * design folders' binary STL files and welded by exact position, so the plates
 * hold exactly the parts the folders hold.
 */
import { mkdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { IndexedMesh } from '../../solids/mesh/index.ts';
import { PLATE_SET_BED, plateSetFiles, type PlateSetDesignMeshes } from '../../solids/mesh/plate-set-files.ts';

/** A 256 mm square bed (common practice for a mid-size printer), 10 mm between parts. */
export const PLATE = PLATE_SET_BED;

/** A binary STL (80-byte header, uint32 count, 50 bytes a triangle) welded into an indexed mesh. */
export function readStlBinary(bytes: Uint8Array): IndexedMesh {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const triangles = view.getUint32(80, true);
  if (84 + 50 * triangles !== bytes.byteLength) throw new RangeError(`STL: ${bytes.byteLength} bytes do not hold ${triangles} triangles`);
  const index = new Map<string, number>();
  const positions: number[] = [];
  const indices = new Uint32Array(3 * triangles);
  for (let t = 0; t < triangles; t++) {
    for (let c = 0; c < 3; c++) {
      const at = 84 + 50 * t + 12 + 12 * c;
      const x = view.getFloat32(at, true);
      const y = view.getFloat32(at + 4, true);
      const z = view.getFloat32(at + 8, true);
      const key = `${x},${y},${z}`;
      let i = index.get(key);
      if (i === undefined) {
        i = positions.length / 3;
        index.set(key, i);
        positions.push(x, y, z);
      }
      indices[3 * t + c] = i;
    }
  }
  return { positions: new Float32Array(positions), indices };
}

export interface PlateSetDesign {
  id: string;
  quantity: number;
  /** part name -> STL path relative to root */
  stl: Record<string, string>;
}

/** Writes root/plates/plate-NN.3mf, none larger than the bed (default PLATE), and returns their paths relative to root. */
export async function writePlateSet(root: string, designs: readonly PlateSetDesign[], bed?: { widthMm: number; depthMm: number }): Promise<string[]> {
  const withMeshes: PlateSetDesignMeshes[] = [];
  for (const d of designs) {
    const meshes: Record<string, IndexedMesh> = {};
    for (const [part, file] of Object.entries(d.stl)) meshes[part] = readStlBinary(await readFile(join(root, file)));
    withMeshes.push({ id: d.id, quantity: d.quantity, meshes });
  }
  await mkdir(join(root, 'plates'), { recursive: true });
  const written: string[] = [];
  for (const { file, bytes } of plateSetFiles(withMeshes, bed)) {
    await writeFile(join(root, file), bytes);
    written.push(file);
  }
  return written;
}
