/** The words for a file system error, one table for every place that reads or writes files. */

/**
 * A short reason for an I/O error, without the absolute path Node puts in its messages:
 * `no such file (ENOENT)`, `permission denied (EACCES)`, `it is a folder (EISDIR)`...; the
 * bare code when it is none of these, and the error's message when it has no code.
 */
export function describeIoError(error: unknown): string {
  const code = (error as NodeJS.ErrnoException).code;
  switch (code) {
    case 'ENOENT':
      return 'no such file (ENOENT)';
    case 'EACCES':
    case 'EPERM':
    case 'EROFS':
      return `permission denied (${code})`;
    case 'EISDIR':
      return 'it is a folder (EISDIR)';
    case 'ENOTDIR':
      return 'a parent is not a folder (ENOTDIR)';
    case 'EEXIST':
      return 'a part of the path is not a folder (EEXIST)';
    case 'ENOSPC':
      return 'no space left on the device (ENOSPC)';
    case undefined:
      return (error as Error).message;
    default:
      return code;
  }
}
