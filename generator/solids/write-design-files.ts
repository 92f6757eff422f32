/**
 * Writes everything a grower needs for one valve into a folder (Node only):
 * one binary STL per part in print orientation, a 3MF with every part laid
 * out side by side on one plate, the design document (normalized JSON) and
 * the build sheet (Markdown and a printable HTML page). File names say the
 * design and the part: `<baseName>-housing.stl`, `<baseName>-plate.3mf`,
 * `<baseName>-design.json`, `<baseName>-build-sheet.md` / `.html`.
 *
 * All or nothing: every file is first written under a temporary name in the
 * same folder, then renamed once all are complete; on any failure the
 * temporary files (and any already renamed) are removed, files of an earlier
 * run that were being replaced are put back, and the error names the part or
 * file at fault. Used by `floatwright build` and the bench planner.
 *
 * Options: quality ('preview' | 'export', required); baseName (default: the
 * design's name made file-safe, else "float-valve"); withPad (default false:
 * also write the printed seal pad); signal (default none: an AbortSignal that
 * stops the run between steps, undoing what it wrote).
 */
import { randomBytes } from 'node:crypto';
import { lstat, mkdir, rename, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { buildSheetHtml, buildSheetMarkdown } from '../doc/build-sheet.ts';
import { fileStem } from '../doc/file-stem.ts';
import type { NormalizedDoc } from '../doc/schema.ts';
import type { SizingSuccess } from '../sizing/result.ts';
import { printBedMm } from '../sizing/parts/print-bed.ts';
import { buildParts, partNamesFor, PartBuildError, type AnyPartName } from './build-parts.ts';
import {
  countEdgeUses,
  meshBounds,
  meshVolumeMm3,
  packPlates,
  triangleCount,
  write3mf,
  writeStlBinary,
  type BoundsMm,
  type IndexedMesh,
  type Quality,
} from './mesh/index.ts';

export interface WriteDesignOptions {
  quality: Quality;
  baseName?: string;
  withPad?: boolean;
  /** also write the seal test stand's base and plunger (default false) */
  withTestStand?: boolean;
  /** stop when aborted (Ctrl-C): checked before each step; the folder is put back as it was */
  signal?: AbortSignal;
}

export interface WrittenPart {
  name: AnyPartName;
  /** path of the part's STL */
  file: string;
  volumeMm3: number;
  massG: number;
  triangles: number;
  bounds: BoundsMm;
}

export interface WrittenDesign {
  /** every file written, paths */
  files: string[];
  parts: WrittenPart[];
}

/** Gap between parts on a plate, mm. The plate is the design's bed (print.bed, 220 x 220 mm by default). */
const PLATE_SPACING_MM = 10;
const BASE_NAME_PATTERN = /^[A-Za-z0-9][A-Za-z0-9._-]{0,79}$/;

/** A file-safe base name from the design's name ("Rooftop planter tubs" -> "rooftop-planter-tubs"). */
export function baseNameFor(document: NormalizedDoc): string {
  return fileStem(document.name, { fallback: 'float-valve' });
}

/** The parts on plates no larger than the bed (packPlates): one 3MF per plate. */
function plates3mf(meshes: { name: string; mesh: IndexedMesh }[], title: string, bed: { widthMm: number; depthMm: number }): Uint8Array[] {
  const plate = { plateWidthMm: bed.widthMm, plateDepthMm: bed.depthMm, spacingMm: PLATE_SPACING_MM };
  const footprints = meshes.map(({ name, mesh }) => {
    const b = meshBounds(mesh);
    return { name, widthMm: b.max[0] - b.min[0], depthMm: b.max[1] - b.min[1] };
  });
  const groups = packPlates(footprints, plate);
  return groups.map((g, k) =>
    write3mf(g.map((i) => meshes[i]), { ...plate, title: groups.length > 1 ? `${title}, plate ${k + 1} of ${groups.length}` : title }),
  );
}

export async function writeDesignFiles(
  sizing: SizingSuccess,
  document: NormalizedDoc,
  dir: string,
  options: WriteDesignOptions,
): Promise<WrittenDesign> {
  if (typeof dir !== 'string' || dir.trim() === '') {
    throw new RangeError(`writeDesignFiles.dir = ${JSON.stringify(dir)}; allowed: a folder path`);
  }
  const base = options?.baseName ?? baseNameFor(document);
  if (!BASE_NAME_PATTERN.test(base)) {
    throw new RangeError(
      `writeDesignFiles.options.baseName = ${JSON.stringify(base)}; allowed: 1 to 80 letters, digits, ".", "_" or "-", starting with a letter or digit`,
    );
  }
  const quality = options.quality;
  const built = await buildParts(sizing, { quality, withPad: options.withPad, withTestStand: options.withTestStand });
  const names = partNamesFor(options, sizing);
  const density = (name: AnyPartName) => (name === 'pad' ? sizing.inputs.padDensityKgM3 : sizing.inputs.materialDensityKgM3);

  // Everything is made in memory first, so a failure leaves the folder as it was.
  const contents: { file: string; bytes: Uint8Array | string; what: string }[] = [];
  const parts: WrittenPart[] = [];
  const stlNames: Record<string, string> = {};
  for (const name of names) {
    const mesh = built[name] as IndexedMesh;
    const edges = countEdgeUses(mesh);
    if (!edges.closed) {
      throw new PartBuildError(
        name,
        `the mesh is not a closed 2-manifold (${edges.boundaryEdges} open edges, ${edges.overusedEdges} over-used, ${edges.inconsistentlyOriented} flipped)`,
      );
    }
    const volumeMm3 = meshVolumeMm3(mesh);
    const file = `${base}-${name}.stl`;
    stlNames[name] = file;
    contents.push({ file, bytes: writeStlBinary(mesh, { header: `floatwright ${base} ${name} (mm, print pose)` }), what: `${name} STL` });
    parts.push({
      name,
      file: join(dir, file),
      volumeMm3,
      massG: volumeMm3 * density(name) * 1e-6,
      triangles: triangleCount(mesh),
      bounds: meshBounds(mesh),
    });
  }
  let plateFile = `${base}-plate.3mf`;
  try {
    const objects = names.map((name) => ({ name: `${base} ${name}`, mesh: built[name] as IndexedMesh }));
    const plates = plates3mf(objects, `${document.name ?? base} (${quality})`, printBedMm(sizing.inputs));
    // one plate keeps its plain name; more are numbered
    plates.forEach((bytes, k) => {
      const file = plates.length === 1 ? plateFile : `${base}-plate-${k + 1}.3mf`;
      contents.push({ file, bytes, what: '3MF plate' });
    });
    if (plates.length > 1) plateFile = `${base}-plate-1.3mf`;
  } catch (error) {
    if (error instanceof RangeError && error.message.startsWith('print.bed')) throw error;
    throw new Error(`3MF plate: ${error instanceof Error ? error.message : String(error)}`, { cause: error });
  }
  const sheetFiles = { stl: stlNames, plate3mf: plateFile, withPad: options.withPad, withTestStand: options.withTestStand };
  contents.push({ file: `${base}-design.json`, bytes: `${JSON.stringify(document, null, 2)}\n`, what: 'design document' });
  contents.push({ file: `${base}-build-sheet.md`, bytes: buildSheetMarkdown(sizing, document, sheetFiles), what: 'build sheet' });
  contents.push({ file: `${base}-build-sheet.html`, bytes: buildSheetHtml(sizing, document, sheetFiles), what: 'build sheet' });

  const stop = () => options.signal?.throwIfAborted();
  stop();
  await mkdir(dir, { recursive: true });
  const tag = `${process.pid}-${randomBytes(4).toString('hex')}`;
  const temps: string[] = [];
  const finals: string[] = [];
  // files of an earlier run that this one replaces: moved aside first, put back if anything fails, so a
  // failed run never loses what a grower already had
  const backups: { target: string; backup: string }[] = [];
  try {
    for (const c of contents) {
      stop();
      const temp = join(dir, `.${c.file}.${tag}.tmp`);
      temps.push(temp);
      try {
        await writeFile(temp, c.bytes);
      } catch (error) {
        throw new Error(`${c.what} (${c.file}): ${error instanceof Error ? error.message : String(error)}`, { cause: error });
      }
    }
    // something other than a file at a target name (a folder): refuse before anything is replaced
    for (const c of contents) {
      const info = await lstat(join(dir, c.file)).catch(() => null);
      if (info && !info.isFile()) throw new Error(`${c.what} (${c.file}): something that is not a file already has this name in ${dir}; move it away`);
    }
    for (let i = 0; i < contents.length; i++) {
      stop();
      const target = join(dir, contents[i].file);
      const backup = join(dir, `.${contents[i].file}.${tag}.bak`);
      try {
        await rename(target, backup);
        backups.push({ target, backup });
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
      }
      await rename(temps[i], target);
      finals.push(target);
    }
  } catch (error) {
    await Promise.all([...temps, ...finals].map((path) => rm(path, { force: true })));
    for (const { target, backup } of backups) await rename(backup, target).catch(() => undefined);
    throw error;
  }
  // the new set is complete: a backup that cannot be removed now is debris the next run clears, not a failure
  await Promise.all(backups.map(({ backup }) => rm(backup, { force: true }).catch(() => undefined)));
  return { files: finals, parts };
}
