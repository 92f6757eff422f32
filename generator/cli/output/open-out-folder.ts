/**
 * The output folder of `build` and `plan`, opened safely before anything is
 * written:
 * - a symbolic link or a file given as the folder is refused (never followed,
 *   never replaced: a link could point anywhere, a file is someone's work);
 * - a missing folder is made, with the marker (out-marker.ts) in it;
 * - the folder's lock is taken (out-lock.ts): a second writer is told "busy";
 * - debris of a killed run is put right (clear-debris.ts);
 * - `replace` (plan): a folder that already holds files is refused unless
 *   `force`, and with `force` only when every entry is one the marker lists.
 * `abandon()` after a failure removes what opening made (the folder, if it
 * made it and it is still empty) and releases the lock; `finish()` records the
 * entries written in the marker and releases the lock.
 */
import { lstat, mkdir, readdir, rm, rmdir } from 'node:fs/promises';
import { dirname, relative, resolve } from 'node:path';
import { clearDebris } from './clear-debris.ts';
import { clearPlanDebris } from './clear-plan-debris.ts';
import { LOCK_FILE, takeLock } from './out-lock.ts';
import { MARKER_FILE, readMarker, writeMarker } from './out-marker.ts';

/** A refusal about the output folder: exit 2 with this message, nothing deleted. */
export class OutFolderError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'OutFolderError';
  }
}

export interface OpenOutOptions {
  /** the folder as the grower wrote it, for messages */
  shownAs: string;
  /** plan: the folder's contents are to be replaced (refuse a non-empty folder unless force) */
  replace?: boolean;
  force?: boolean;
}

export interface OutFolder {
  /** absolute path */
  path: string;
  /** true when this run made the folder */
  created: boolean;
  /** entries the marker listed when the folder was opened (null: no marker) */
  listed: string[] | null;
  finish(written: readonly string[], opts?: { replaceListing?: boolean }): Promise<void>;
  abandon(): Promise<void>;
}

/** Entries that are floatwright's own bookkeeping, never a grower's file. */
export const isBookkeeping = (name: string) => name === MARKER_FILE || name === LOCK_FILE;

export async function openOutFolder(out: string, options: OpenOutOptions): Promise<OutFolder> {
  const path = resolve(out);
  const shown = options.shownAs;
  if (options.replace) await clearPlanDebris(path);
  const info = await lstat(path).catch((error: NodeJS.ErrnoException) => {
    if (error.code === 'ENOENT') return null;
    throw error;
  });
  if (info?.isSymbolicLink()) {
    throw new OutFolderError(`"${shown}" is a symbolic link; give the real folder instead (floatwright never writes or deletes through a link).`);
  }
  if (info && !info.isDirectory()) {
    throw new OutFolderError(`"${shown}" is a file, not a folder; nothing was replaced. Choose a folder name for the output.`);
  }

  let firstMade: string | undefined;
  /** remove the folders this run made, innermost first, while they are empty */
  const unmake = async (from: string) => {
    if (firstMade === undefined) return;
    for (let dir = from; !relative(firstMade, dir).startsWith('..'); dir = dirname(dir)) {
      if (!(await rmdir(dir).then(() => true, () => false)) || dir === firstMade) break;
    }
  };
  if (!info) {
    // the parents first, then the folder itself, so a folder name the disk refuses leaves no parents behind
    firstMade = await mkdir(dirname(path), { recursive: true });
    try {
      await mkdir(path);
      firstMade ??= path;
    } catch (error) {
      // Another run made the folder between our look and our mkdir: open it as an existing folder, so its lock
      // says "busy" rather than a vague "something else changed".
      const raced = (error as NodeJS.ErrnoException).code === 'EEXIST' && (await lstat(path).then((i) => i.isDirectory() && !i.isSymbolicLink(), () => false));
      if (!raced) {
        await unmake(dirname(path));
        throw error;
      }
      firstMade = undefined;
    }
  }
  const created = firstMade !== undefined;
  let release: () => Promise<void> = async () => {};
  const abandon = async () => {
    await release();
    if (!created) return;
    await rm(resolve(path, MARKER_FILE), { force: true });
    await unmake(path);
  };
  try {
    if (created) await writeMarker(path, []);
    release = await takeLock(path, shown);
    await clearDebris(path);
    const marker = await readMarker(path);
    if (options.replace) {
      const entries = (await readdir(path)).filter((n) => !isBookkeeping(n));
      if (entries.length && !options.force) {
        throw new OutFolderError(`"${shown}" already holds files; choose a new folder, empty it, or add --force to replace what an earlier floatwright run wrote there.`);
      }
      const listed = new Set(marker?.entries ?? []);
      const foreign = entries.filter((n) => !listed.has(n));
      if (entries.length && foreign.length) {
        const named = foreign.slice(0, 5).map((n) => `"${n}"`).join(', ') + (foreign.length > 5 ? ` and ${foreign.length - 5} more` : '');
        throw new OutFolderError(
          marker
            ? `"${shown}" holds entries floatwright did not write there (${named}); --force replaces only an earlier floatwright output, so nothing was deleted. Move them away or choose another folder.`
            : `"${shown}" was not made by floatwright (it has no ${MARKER_FILE} marker; it holds ${named}); --force replaces only a folder floatwright made, so nothing was deleted. Choose another folder.`,
        );
      }
    }
    return {
      path,
      created,
      listed: marker?.entries ?? null,
      finish: async (written, opts) => {
        // The files are in place: a marker that cannot be updated now only makes a later --force refuse them
        // (the safe side), and a lock that cannot be removed is taken over once this process is gone.
        if (marker || created) await writeMarker(path, opts?.replaceListing ? written : [...(marker?.entries ?? []), ...written]).catch(() => undefined);
        await release().catch(() => undefined);
      },
      abandon,
    };
  } catch (error) {
    await abandon();
    throw error;
  }
}
