/**
 * A plan's combined plate set, in memory: every part of every valve to print
 * (each design's parts times its quantity) packed onto as few build plates as
 * the shelf packing (packPlates) allows, one 3MF per plate
 * (`plates/plate-01.3mf`, ...). Shared by the command line (which reads the
 * meshes back from its STL files) and the workbench (which holds them).
 *
 * Example: two designs of four parts, quantities 3 and 2, on a 256 mm bed ->
 * 20 parts, two or three plates depending on the float sizes.
 */
import { meshBounds } from './mesh-bounds.ts';
import { packPlates } from './pack-plates.ts';
import type { IndexedMesh } from './types.ts';
import { write3mf } from './write3mf.ts';

/** A 256 mm square bed (common practice for a mid-size printer), 10 mm between parts. */
export const PLATE_SET_BED = { plateWidthMm: 256, plateDepthMm: 256, spacingMm: 10 } as const;

export interface PlateSetDesignMeshes {
  id: string;
  /** valves to print from this design (whole number >= 1) */
  quantity: number;
  /** part name -> mesh in print orientation, mm, resting on z = 0 */
  meshes: Record<string, IndexedMesh>;
}

/** The plates as files (path relative to the plan's folder, 3MF bytes); `bed` in mm, default PLATE_SET_BED. */
export function plateSetFiles(designs: readonly PlateSetDesignMeshes[], bed?: { widthMm: number; depthMm: number }): { file: string; bytes: Uint8Array }[] {
  const items: { name: string; mesh: IndexedMesh; widthMm: number; depthMm: number }[] = [];
  for (const d of designs) {
    for (const [part, mesh] of Object.entries(d.meshes)) {
      const b = meshBounds(mesh);
      for (let k = 1; k <= d.quantity; k++) {
        items.push({ name: `${d.id} ${part} ${k}/${d.quantity}`, mesh, widthMm: b.max[0] - b.min[0], depthMm: b.max[1] - b.min[1] });
      }
    }
  }
  const plate = { ...PLATE_SET_BED, ...(bed ? { plateWidthMm: bed.widthMm, plateDepthMm: bed.depthMm } : {}) };
  const plates = packPlates(items, plate).map((g) => g.map((i) => items[i]!));
  return plates.map((p, n) => ({
    file: `plates/plate-${String(n + 1).padStart(2, '0')}.3mf`,
    bytes: write3mf(p.map(({ name, mesh }) => ({ name, mesh })), { ...plate, title: `floatwright plan, plate ${n + 1} of ${plates.length}` }),
  }));
}
