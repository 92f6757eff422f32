/** The files the grower downloads, made from one sizing at export quality. */
import { strToU8, zipSync } from 'fflate';
import { writeStlBinary } from '../../generator/solids/mesh/write-stl-binary.ts';
import { write3mf } from '../../generator/solids/mesh/write3mf.ts';
import type { SizingSuccess } from '../../generator/sizing/result.ts';
import { buildSheet } from './sheet-source.ts';
import { PART_NAMES, type PartMeshes, type PartName } from './parts-contract.ts';
import type { ExportFile, ExportKind } from './protocol.ts';

/** Print bed assumed for the 3MF plate: 220 x 220 mm fits most hobby printers (common practice). */
export const PLATE = { plateWidthMm: 220, plateDepthMm: 220, spacingMm: 8 };

export function baseName(document: unknown): string {
  const name = document && typeof document === 'object' ? (document as { name?: unknown }).name : undefined;
  const slug = typeof name === 'string' ? name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 40) : '';
  return slug ? `floatwright-${slug}` : 'floatwright-valve';
}

export function stlFile(base: string, part: PartName, meshes: PartMeshes): ExportFile {
  return { name: `${base}-${part}.stl`, mime: 'model/stl', bytes: writeStlBinary(meshes[part], { header: `floatwright ${part}, millimetres` }) };
}

export function exportFiles(kind: ExportKind, sizing: SizingSuccess, document: unknown, meshes: PartMeshes | null, part?: PartName): ExportFile[] {
  const base = baseName(document);
  const need = () => {
    if (!meshes) throw new Error('the parts could not be built');
    return meshes;
  };
  switch (kind) {
    case 'stl':
      return [stlFile(base, part ?? 'housing', need())];
    case '3mf':
      return [plate(base, need(), document)];
    case 'sheet':
      return [{ name: `${base}-build-sheet.html`, mime: 'text/html', bytes: strToU8(buildSheet(sizing, document, base)) }];
    case 'zip': {
      const m = need();
      const entries: Record<string, Uint8Array> = {};
      for (const p of PART_NAMES) {
        const f = stlFile(base, p, m);
        entries[f.name] = f.bytes;
      }
      const p = plate(base, m, document);
      entries[p.name] = p.bytes;
      entries[`${base}-build-sheet.html`] = strToU8(buildSheet(sizing, document, base));
      entries[`${base}.json`] = strToU8(JSON.stringify(document, null, 2) + '\n');
      return [{ name: `${base}.zip`, mime: 'application/zip', bytes: zipSync(entries, { level: 6 }) }];
    }
  }
}

function plate(base: string, meshes: PartMeshes, document: unknown): ExportFile {
  const title = document && typeof document === 'object' && typeof (document as { name?: unknown }).name === 'string' ? (document as { name: string }).name : 'floatwright valve';
  const bytes = write3mf(PART_NAMES.map((name) => ({ name, mesh: meshes[name] })), { ...PLATE, title });
  return { name: `${base}-plate.3mf`, mime: 'model/3mf', bytes };
}
