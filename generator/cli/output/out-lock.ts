/**
 * One writer at a time in an output folder: a lock file created with O_EXCL
 * (open "wx": it fails if the file exists, atomically), holding the writer's
 * process id. A lock whose process is gone (a killed run) is taken over; a
 * live one means busy. Source: POSIX open(2), O_CREAT | O_EXCL.
 */
import { open, readFile, rm, stat } from 'node:fs/promises';
import { join } from 'node:path';

export const LOCK_FILE = '.floatwright-lock';
/** An empty lock younger than this is a writer between creating it and writing its pid. */
const EMPTY_LOCK_GRACE_MS = 5000;

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
  if (!Number.isNaN(pid)) return alive(pid);
  return Date.now() - ((await stat(join(folder, LOCK_FILE)).catch(() => null))?.mtimeMs ?? 0) < EMPTY_LOCK_GRACE_MS;
}

/** Take the folder's lock; returns its release. Throws FolderBusyError when a live run holds it. */
export async function takeLock(folder: string, shownAs: string): Promise<() => Promise<void>> {
  const path = join(folder, LOCK_FILE);
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      const handle = await open(path, 'wx');
      try {
        await handle.writeFile(`${process.pid}\n`);
      } catch (error) {
        await handle.close().catch(() => undefined);
        await rm(path, { force: true }).catch(() => undefined);
        throw error;
      } finally {
        await handle.close().catch(() => undefined);
      }
      return async () => void (await rm(path, { force: true }));
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const pid = Number.parseInt(await readFile(path, 'utf8').catch(() => ''), 10);
      // a lock without a pid is being written now, unless it is older than a few seconds (its writer died)
      const young = Number.isNaN(pid) && Date.now() - ((await stat(path).catch(() => null))?.mtimeMs ?? 0) < EMPTY_LOCK_GRACE_MS;
      if (young || (!Number.isNaN(pid) && alive(pid))) throw new FolderBusyError(shownAs, Number.isNaN(pid) ? null : pid);
      await rm(path, { force: true });
    }
  }
  throw new FolderBusyError(shownAs, null);
}
