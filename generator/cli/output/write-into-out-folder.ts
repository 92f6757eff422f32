/**
 * One run's writing into its output folder, with every safety around it: the
 * folder opened safely (open-out-folder.ts: no links or files, the lock, the
 * debris of a killed run), Ctrl-C / SIGTERM turned into a clean stop, and every
 * failure turned into a plain message with its exit status: 2 for the folder
 * or the disk (busy, refused, permission, full, name too long), 130 / 143 for a
 * signal. A fault of floatwright itself is re-thrown (exit 1) after the folder
 * is put back as it was. The folder's marker lists what was written.
 */
import { basename } from 'node:path';
import { PartBuildError } from '../../solids/build-parts.ts';
import { EXIT_INPUT } from '../command.ts';
import { fileErrorText, isFileSystemError } from './file-error-text.ts';
import { catchInterrupt, type Interrupt } from './interrupt.ts';
import { openOutFolder, OutFolderError, type OpenOutOptions } from './open-out-folder.ts';
import { FolderBusyError } from './out-lock.ts';

export type WriteOutcome<T> = { ok: true; value: T } | { ok: false; field: string; message: string; status: number };

export interface WriteIntoOptions extends Partial<OpenOutOptions> {
  /** the entries written, as names in the folder (default: the basenames of `files`) */
  entriesOf?: (value: unknown) => string[];
}

export async function writeIntoOutFolder<T extends { files: string[] }>(
  out: string,
  write: (dir: string, signal: AbortSignal) => Promise<T>,
  options: WriteIntoOptions = {},
): Promise<WriteOutcome<T>> {
  const interrupt = catchInterrupt();
  const shownAs = options.shownAs ?? out;
  let folder;
  try {
    folder = await openOutFolder(out, { ...options, shownAs });
  } catch (error) {
    interrupt.dispose();
    return failureOutcome(error, shownAs, null);
  }
  try {
    interrupt.signal.throwIfAborted();
    const value = await write(folder.path, interrupt.signal);
    interrupt.signal.throwIfAborted();
    await folder.finish(options.entriesOf ? options.entriesOf(value) : value.files.map((f) => basename(f)));
    return { ok: true, value };
  } catch (error) {
    await folder.abandon();
    return failureOutcome(error, shownAs, interrupt);
  } finally {
    interrupt.dispose();
  }
}

/** A failed write said plainly, with its exit status; a fault of floatwright itself is re-thrown. */
export function failureOutcome(error: unknown, shownAs: string, interrupt: Interrupt | null): WriteOutcome<never> & { ok: false } {
  const stopped = interrupt?.exitStatus();
  if (stopped) {
    return { ok: false, field: '--out', status: stopped, message: `stopped by ${interrupt!.name()}; nothing new was written to "${shownAs}" and any earlier files there are back in place.` };
  }
  if (error instanceof OutFolderError || error instanceof FolderBusyError) return { ok: false, field: '--out', status: EXIT_INPUT, message: error.message };
  const none = 'could not write the files, so none were written.';
  if (error instanceof PartBuildError) return { ok: false, field: error.part, status: EXIT_INPUT, message: `${none} ${error.message}` };
  if (isFileSystemError(error)) return { ok: false, field: '--out', status: EXIT_INPUT, message: `${none} ${fileErrorText(error, shownAs)}` };
  const cause = (error as Error | undefined)?.cause;
  if (error instanceof Error && (isFileSystemError(cause) || /^(3MF plate|design document|build sheet|\w+ STL)/.test(error.message))) {
    // the writer names the file at fault ("3MF plate (x-plate.3mf): ..."); the file system's own words are replaced
    const what = error.message.split(': ')[0];
    const detail = isFileSystemError(cause) ? fileErrorText(cause, shownAs) : error.message.slice(what!.length + 2);
    return { ok: false, field: '--out', status: EXIT_INPUT, message: `${none} ${what}: ${detail}` };
  }
  throw error;
}
