/**
 * The whole bench in one zip: a folder per design (an STL per part, its 3MF
 * plate, the build sheet and the design document, as the valve page writes
 * them), `plates/` with every part to print packed on the plan's bed, and the
 * plan report (plan-report.md / .html, plan.json), laid out as
 * `floatwright plan --out` writes its folder.
 */
import { strToU8, zipSync } from 'fflate';
import { documentWithHeads, planHtml, planJson, planMarkdown, planReport, type PlanResult } from '../../generator/plan/index.ts';
import { buildParts } from '../../generator/solids/index.ts';
import { plateSetFiles, type PlateSetDesignMeshes } from '../../generator/solids/mesh/plate-set-files.ts';
import { printBedMm } from '../../generator/sizing/parts/print-bed.ts';
import { buildSheetHtml, buildSheetMarkdown } from '../../generator/doc/build-sheet.ts';
import { fileStem } from '../../generator/doc/file-stem.ts';
import { plates, stlFile } from './export-files.ts';
import { valvePartNames, type PartMeshes } from './parts-contract.ts';
import type { ExportFile } from './protocol.ts';


export async function benchZip(result: PlanResult, name = 'bench'): Promise<ExportFile> {
  const entries: Record<string, Uint8Array> = {};
  const files: Record<string, string[]> = {};
  const designs: PlateSetDesignMeshes[] = [];
  const used = new Set<string>();
  for (const d of result.designs) {
    const first = result.containers.find((c) => c.index === d.containerIndices[0])!;
    let folder = `${d.id}-${fileStem(first.name, { fallback: 'design', maxLength: 40 })}`;
    while (used.has(folder)) folder += '-x';
    used.add(folder);
    const doc = result.plan.containers.find((c) => c.index === first.index)!.document;
    const document = { ...documentWithHeads(doc, first.headMaxM, first.headMinM), name: `${d.id}: ${first.name} (print ${d.quantity})` };
    const meshes = (await buildParts(d.sizing, { quality: 'export' })) as PartMeshes;
    // the files as `floatwright plan` names them (generator/solids/write-design-files.ts): <id>-<part>.stl, <id>-plate.3mf, ...
    const plateFiles = plates(d.id, meshes, document, d.sizing);
    const names = valvePartNames(d.sizing);
    const sheetFiles = { stl: Object.fromEntries(names.map((p) => [p, `${d.id}-${p}.stl`])), plate3mf: plateFiles[0]!.name };
    const set: ExportFile[] = [
      ...names.map((p) => stlFile(d.id, p, meshes)),
      ...plateFiles,
      { name: `${d.id}-design.json`, mime: 'application/json', bytes: strToU8(`${JSON.stringify(document, null, 2)}\n`) },
      { name: `${d.id}-build-sheet.md`, mime: 'text/markdown', bytes: strToU8(buildSheetMarkdown(d.sizing, document, sheetFiles)) },
      { name: `${d.id}-build-sheet.html`, mime: 'text/html', bytes: strToU8(buildSheetHtml(d.sizing, document, sheetFiles)) },
    ];
    files[d.id] = set.map((f) => `${folder}/${f.name}`);
    for (const f of set) entries[`${folder}/${f.name}`] = f.bytes;
    designs.push({ id: d.id, quantity: d.quantity, meshes: Object.fromEntries(names.map((p) => [p, meshes[p]!])) });
  }
  // the plan's plates on the smallest bed of its designs (print.bed), as the command line does
  const bed = result.designs.reduce<{ widthMm: number; depthMm: number } | undefined>((b, d) => {
    const own = printBedMm(d.sizing.inputs);
    return !b || own.widthMm * own.depthMm < b.widthMm * b.depthMm ? { widthMm: own.widthMm, depthMm: own.depthMm } : b;
  }, undefined);
  const plateFiles = plateSetFiles(designs, bed);
  for (const p of plateFiles) entries[p.file] = p.bytes;
  const plateNames = plateFiles.map((p) => p.file);
  const report = planReport(result, files, plateNames);
  entries['plan-report.md'] = strToU8(planMarkdown(report));
  entries['plan-report.html'] = strToU8(planHtml(report));
  entries['plan.json'] = strToU8(`${JSON.stringify(planJson(result, files, { plates: plateNames }), null, 2)}\n`);
  return { name: `floatwright-${fileStem(name, { fallback: 'bench' })}.zip`, mime: 'application/zip', bytes: zipSync(entries, { level: 6 }) };
}
