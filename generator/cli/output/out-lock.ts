/**
 * One writer at a time in an output folder: a lock file created with O_EXCL
 * (open "wx": it fails if the file exists, atomically), holding the writer's
 * process id. A lock whose process is gone (a killed run) is taken over; a
 * live one means busy. Source: POSIX open(2), O_CREAT | O_EXCL.
 */
import { open, readFile, rm } from 'node:fs/promises';
import { join } from 'node:path';

export const LOCK_FILE = '.floatwright-lock';

/** The folder is being written by another floatwright run. */
export class FolderBusyError extends Error {
  constructor(readonly folder: string, readonly pid: number | null) {
    super(
      `"${folder}" is busy: another floatwright run${pid ? ` (process ${pid})` : ''} is writing there; wait for it to finish, or choose another folder.`,
    );
    this.name = 'FolderBusyError';
  }
}

function alive(pid: number): boolean {
  if (!Number.isInteger(pid) || pid <= 0) return false;
  if (pid === process.pid) return true;
  try {
    process.kill(pid, 0); // signal 0: only asks whether the process exists
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Whether a folder's lock is held by a live process (false: no lock, or its process is gone). */
export async function lockHeld(folder: string): Promise<boolean> {
  const text = await readFile(join(folder, LOCK_FILE), 'utf8').catch(() => null);
  if (text === null) return false;
  const pid = Number.parseInt(text, 10);
  return Number.isNaN(pid) || alive(pid);
}

/** Take the folder's lock; returns its release. Throws FolderBusyError when a live run holds it. */
export async function takeLock(folder: string, shownAs: string): Promise<() => Promise<void>> {
  const path = join(folder, LOCK_FILE);
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const handle = await open(path, 'wx');
      await handle.writeFile(`${process.pid}\n`);
      await handle.close();
      return async () => void (await rm(path, { force: true }));
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const pid = Number.parseInt(await readFile(path, 'utf8').catch(() => ''), 10);
      // a lock still being written (no pid yet) counts as live; a dead process's lock is stale
      if (Number.isNaN(pid) || alive(pid)) throw new FolderBusyError(shownAs, Number.isNaN(pid) ? null : pid);
      await rm(path, { force: true });
    }
  }
  throw new FolderBusyError(shownAs, null);
}
