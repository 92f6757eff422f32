/** The files the grower downloads, made from one sizing at export quality. */
import { strToU8, zipSync } from 'fflate';
import { writeStlBinary } from '../../generator/solids/mesh/write-stl-binary.ts';
import { write3mf } from '../../generator/solids/mesh/write3mf.ts';
import { meshBounds } from '../../generator/solids/mesh/mesh-bounds.ts';
import { packPlates } from '../../generator/solids/mesh/pack-plates.ts';
import { printBedMm } from '../../generator/sizing/parts/print-bed.ts';
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import { fileStem } from '../../generator/doc/file-stem.ts';
import type { TextUnits } from '../../generator/doc/text-in-units.ts';
import { buildSheet } from './sheet-source.ts';
import { valvePartNames, type PartMeshes, type PartName } from './parts-contract.ts';
import type { ExportFile, ExportKind } from './protocol.ts';

/** The 3MF plate: the design's bed (print.bed, 220 x 220 mm by default, common practice), 8 mm between parts. */
export const PLATE = { plateWidthMm: 220, plateDepthMm: 220, spacingMm: 8 };

/** The stem of every file of a design: its name made file-safe ("Tomates d'été" -> "tomates-d-ete"), else "floatwright-valve". */
export function baseName(document: unknown): string {
  return fileStem(document && typeof document === 'object' ? (document as { name?: unknown }).name : undefined);
}

export function stlFile(base: string, part: PartName, meshes: PartMeshes): ExportFile {
  const mesh = meshes[part];
  if (!mesh) throw new Error(`this valve has no ${part}`);
  return { name: `${base}-${part}.stl`, mime: 'model/stl', bytes: writeStlBinary(mesh, { header: `floatwright ${part}, millimetres` }) };
}

/** `units` (default metric): the system the build sheet is written in; parts and plates are in millimetres either way. */
export function exportFiles(kind: ExportKind, sizing: SizingSuccess, document: unknown, meshes: PartMeshes | null, part?: PartName, units: TextUnits = 'metric'): ExportFile[] {
  const base = baseName(document);
  const need = () => {
    if (!meshes) throw new Error('the parts could not be built');
    return meshes;
  };
  switch (kind) {
    case 'stl':
      return [stlFile(base, part ?? valvePartNames(sizing)[0]!, need())];
    case '3mf':
      return plates(base, need(), document, sizing);
    case 'sheet':
      return [{ name: `${base}-build-sheet.html`, mime: 'text/html', bytes: strToU8(buildSheet(sizing, document, base, units)) }];
    case 'zip': {
      const m = need();
      const entries: Record<string, Uint8Array> = {};
      for (const p of valvePartNames(sizing)) {
        const f = stlFile(base, p, m);
        entries[f.name] = f.bytes;
      }
      for (const p of plates(base, m, document, sizing)) entries[p.name] = p.bytes;
      entries[`${base}-build-sheet.html`] = strToU8(buildSheet(sizing, document, base, units));
      entries[`${base}-design.json`] = strToU8(JSON.stringify(document, null, 2) + '\n');
      return [{ name: `${base}.zip`, mime: 'application/zip', bytes: zipSync(entries, { level: 6 }) }];
    }
  }
}

/** The parts on plates no larger than the design's bed: one 3MF, or numbered ones when they need more than one. */
export function plates(base: string, meshes: PartMeshes, document: unknown, sizing: SizingSuccess): ExportFile[] {
  const title = document && typeof document === 'object' && typeof (document as { name?: unknown }).name === 'string' ? (document as { name: string }).name : 'floatwright valve';
  const bed = printBedMm(sizing.inputs);
  const plate = { ...PLATE, plateWidthMm: bed.widthMm, plateDepthMm: bed.depthMm };
  const names = valvePartNames(sizing);
  const footprints = names.map((name) => {
    const b = meshBounds(meshes[name]!);
    return { name, widthMm: b.max[0] - b.min[0], depthMm: b.max[1] - b.min[1] };
  });
  const groups = packPlates(footprints, plate);
  return groups.map((g, k) => ({
    name: groups.length === 1 ? `${base}-plate.3mf` : `${base}-plate-${k + 1}.3mf`,
    mime: 'model/3mf',
    bytes: write3mf(g.map((i) => ({ name: names[i]!, mesh: meshes[names[i]!]! })), { ...plate, title }),
  }));
}
