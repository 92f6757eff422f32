/**
 * One design's file set for the plan, through the `build` command's own
 * writer (generator/solids/write-design-files.ts): an STL per part, a 3MF
 * plate, the design document and the build sheet. This adapter only names
 * the files after the design id and reports them relative to the folder.
 */
import { basename } from 'node:path';
import type { NormalizedDoc } from '../../doc/schema.ts';
import type { SizingSuccess } from '../../sizing/result.ts';
import type { Quality } from '../../solids/index.ts';
import { writeDesignFiles as writeFileSet } from '../../solids/write-design-files.ts';

export interface DesignFilesOptions {
  sizing: SizingSuccess;
  document: NormalizedDoc;
  /** folder to write into (created) */
  dir: string;
  /** file name prefix, e.g. "d1" */
  prefix: string;
  quality: Quality;
  /** valves to print from this set (shown in the document's name) */
  quantity: number;
  /** stops the writing between steps (Ctrl-C) */
  signal?: AbortSignal;
}

/** Writes the set and returns the file names written (relative to `dir`) and the triangle count. */
export async function writeDesignFiles(opts: DesignFilesOptions): Promise<{ files: string[]; triangles: number }> {
  const written = await writeFileSet(opts.sizing, opts.document, opts.dir, { quality: opts.quality, baseName: opts.prefix, signal: opts.signal });
  return { files: written.files.map((f) => basename(f)), triangles: written.parts.reduce((n, p) => n + p.triangles, 0) };
}
