/**
 * What a killed `build` left in its output folder, put right by the next run
 * (which holds the folder's lock, so no live writer owns these). A run writes
 * `.NAME.TAG.tmp` files, then for each file moves the earlier NAME aside to
 * `.NAME.TAG.bak` and renames its temporary file to NAME, and removes the
 * backups only once every file is in place. So, per TAG:
 * - temporary files left: the run died before its file set was complete: every
 *   backup is put back over NAME (the earlier set returns) and the temporary files go;
 * - no temporary file left: the new set was complete: the backups go.
 * Returns how many files were put back and how many removed.
 */
import { readdir, rename, rm } from 'node:fs/promises';
import { join } from 'node:path';

const DEBRIS = /^\.(.+)\.([0-9]+-[0-9a-f]+)\.(tmp|bak)$/;

export async function clearDebris(folder: string): Promise<{ restored: number; removed: number }> {
  let restored = 0;
  let removed = 0;
  const found = (await readdir(folder)).map((name) => ({ name, match: DEBRIS.exec(name) })).filter((d) => d.match);
  const unfinished = new Set(found.filter((d) => d.match![3] === 'tmp').map((d) => d.match![2]));
  for (const { name, match } of found) {
    const path = join(folder, name);
    if (match![3] === 'bak' && unfinished.has(match![2])) {
      await rename(path, join(folder, match![1]!));
      restored++;
    } else {
      await rm(path, { force: true });
      removed++;
    }
  }
  return { restored, removed };
}
