/**
 * The marker file floatwright puts in every output folder it makes: it says
 * the folder is floatwright's and lists the entries floatwright wrote there.
 * `plan --force` replaces a folder only when it holds this marker and nothing
 * the marker does not list, so a grower's own files are never deleted.
 */
import { readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';

export const MARKER_FILE = '.floatwright-output';

export interface OutMarker {
  /** top-level entries (files and folders) floatwright wrote into the folder */
  entries: string[];
}

/** The folder's marker, or null when it has none (or one floatwright cannot read: treated as none). */
export async function readMarker(folder: string): Promise<OutMarker | null> {
  const text = await readFile(join(folder, MARKER_FILE), 'utf8').catch(() => null);
  if (text === null) return null;
  try {
    const data = JSON.parse(text) as unknown;
    const entries = (data as { entries?: unknown })?.entries;
    if (Array.isArray(entries) && entries.every((e) => typeof e === 'string')) return { entries };
  } catch {
    // unreadable: no marker
  }
  return null;
}

export async function writeMarker(folder: string, entries: readonly string[]): Promise<void> {
  const body = {
    note: 'Written by floatwright. "floatwright plan --force" may replace this folder only while it holds nothing but the entries below.',
    entries: [...new Set(entries)].sort(),
  };
  await writeFile(join(folder, MARKER_FILE), `${JSON.stringify(body, null, 2)}\n`);
}
