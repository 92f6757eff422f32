/**
 * A file-system failure said plainly, for a grower: what happened and what to
 * do, never the raw errno line ("EACCES: permission denied, open '/x/.y.tmp'").
 * Codes are POSIX errno names as Node reports them (node:fs, error.code).
 * Example: fileErrorText({ code: 'ENOSPC' }, 'out/tubs') ===
 *   'the disk holding "out/tubs" is full; free some space and run it again.'
 */
export function fileErrorText(error: unknown, where: string): string {
  const code = (error as NodeJS.ErrnoException | undefined)?.code;
  const at = `"${where}"`;
  switch (code) {
    case 'EACCES':
    case 'EPERM':
      return `permission denied: floatwright may not write in ${at}; choose a folder you can write to.`;
    case 'EROFS':
      return `${at} is on a read-only disk; choose a folder on a disk you can write to.`;
    case 'ENOSPC':
      return `the disk holding ${at} is full; free some space and run it again.`;
    case 'EDQUOT':
      return `your disk quota is used up where ${at} lies; free some space and run it again.`;
    case 'ENAMETOOLONG':
      return `a file name in ${at} is too long for the file system; choose a shorter folder name or a shorter design name.`;
    case 'ENOTDIR':
      return `part of the path ${at} is a file, not a folder; choose another path.`;
    case 'EEXIST':
    case 'ENOTEMPTY':
    case 'ENOENT':
    case 'EBUSY':
      return `something else changed ${at} while floatwright was writing there (another program, or a folder removed); run it again when nothing else writes there.`;
    case 'EMFILE':
    case 'ENFILE':
      return 'too many files are open on this computer; close some programs and run it again.';
    case 'EIO':
      return `the disk reported a read or write error in ${at}; check the disk and run it again.`;
    default:
      return `the file system refused to write in ${at}${code ? ` (${code})` : ''}; check the folder and run it again.`;
  }
}

/** Whether an error came from the file system (it carries an errno code) rather than from floatwright itself. */
export function isFileSystemError(error: unknown): boolean {
  const code = (error as NodeJS.ErrnoException | undefined)?.code;
  return typeof code === 'string' && /^E[A-Z0-9]+$/.test(code) && !code.startsWith('ERR_');
}
