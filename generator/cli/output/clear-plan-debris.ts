/**
 * What a killed `plan` left beside its output folder OUT, put right before the
 * next plan opens it. A plan builds into `.OUT.partial-TAG` (holding its own
 * lock) beside OUT, then swaps: OUT -> `.OUT.partial-TAG-old`, the new folder ->
 * OUT, and removes the old one. So:
 * - an `-old` folder while OUT is missing: the run died inside the swap; the
 *   earlier OUT is put back;
 * - every other such folder whose lock's process is gone: removed.
 * Folders whose lock a live run holds are left alone (that run is still working).
 */
import { lstat, readdir, rename, rm } from 'node:fs/promises';
import { basename, dirname, join } from 'node:path';
import { lockHeld } from './out-lock.ts';

export async function clearPlanDebris(out: string): Promise<{ restored: number; removed: number }> {
  const parent = dirname(out);
  const prefix = `.${basename(out)}.partial-`;
  let restored = 0;
  let removed = 0;
  const names = (await readdir(parent).catch(() => [] as string[])).filter((n) => n.startsWith(prefix)).sort((a, b) => Number(b.endsWith('-old')) - Number(a.endsWith('-old')));
  for (const name of names) {
    const path = join(parent, name);
    if (!(await lstat(path).catch(() => null))?.isDirectory() || (await lockHeld(path))) continue;
    if (name.endsWith('-old') && !(await lstat(out).catch(() => null))) {
      await rename(path, out);
      restored++;
    } else {
      await rm(path, { recursive: true, force: true });
      removed++;
    }
  }
  return { restored, removed };
}
