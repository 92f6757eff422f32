/**
 * One design's file set in a folder: an STL per printed part, a 3MF plate with
 * the four parts, and the build sheet (Markdown and HTML).
 *
 * Interim: the `build` command's own "write a design's file set" function had
 * not landed when the plan command was written; once it does, the plan should
 * call that instead of this.
 */
import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { buildSheetHtml, buildSheetMarkdown } from '../../doc/build-sheet.ts';
import type { NormalizedDoc } from '../../doc/schema.ts';
import type { SizingSuccess } from '../../sizing/result.ts';
import { buildParts, PART_NAMES, type Quality } from '../../solids/index.ts';
import { write3mf, writeStlBinary } from '../../solids/mesh/index.ts';

/** A 256 mm square bed (common practice for a mid-size printer), 10 mm between parts. */
export const PLATE = { plateWidthMm: 256, plateDepthMm: 256, spacingMm: 10 } as const;

export interface DesignFilesOptions {
  sizing: SizingSuccess;
  document: NormalizedDoc;
  /** folder to write into (created) */
  dir: string;
  /** file name prefix, e.g. "d1" */
  prefix: string;
  quality: Quality;
  /** "print N" on the sheet and in the 3MF title */
  quantity: number;
}

/** Writes the set and returns the file names written (relative to `dir`) and the triangle count. */
export async function writeDesignFiles(opts: DesignFilesOptions): Promise<{ files: string[]; triangles: number }> {
  await mkdir(opts.dir, { recursive: true });
  const parts = await buildParts(opts.sizing, { quality: opts.quality });
  const files: string[] = [];
  const stl: Record<string, string> = {};
  let triangles = 0;
  for (const name of PART_NAMES) {
    const file = `${opts.prefix}-${name}.stl`;
    await writeFile(join(opts.dir, file), writeStlBinary(parts[name], { header: `floatwright ${opts.prefix} ${name}, mm` }));
    files.push(file);
    stl[name] = file;
    triangles += parts[name].indices.length / 3;
  }
  const plate = `${opts.prefix}-plate.3mf`;
  const bytes = write3mf(
    PART_NAMES.map((name) => ({ name: `${opts.prefix} ${name}`, mesh: parts[name] })),
    { ...PLATE, title: `floatwright ${opts.prefix}: print ${opts.quantity}` },
  );
  await writeFile(join(opts.dir, plate), bytes);
  files.push(plate);
  const sheetFiles = { stl, plate3mf: plate };
  await writeFile(join(opts.dir, 'build-sheet.md'), buildSheetMarkdown(opts.sizing, opts.document, sheetFiles));
  await writeFile(join(opts.dir, 'build-sheet.html'), buildSheetHtml(opts.sizing, opts.document, sheetFiles));
  files.push('build-sheet.md', 'build-sheet.html');
  return { files, triangles };
}
