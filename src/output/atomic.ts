import { closeSync, fsyncSync, openSync, renameSync, rmSync, writeSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
/**
 * Write `contents` to `path` atomically: into a temporary file beside it, flushed, then renamed into
 * place, so that no reader sees half a file and a failure leaves nothing. An output set checks first.
 */
export function writeAtomic(path: string, contents: string | Uint8Array): void {
  const target = resolve(path);
  // Math.random, since loading node:crypto would cost every run; 'wx' refuses a name that exists.
  const tag = Math.random().toString(36).slice(2, 10);
  const temporary = join(dirname(target), `.${basename(target)}.${process.pid}.${tag}.tmp`);
  let fd: number | undefined;
  try {
    fd = openSync(temporary, 'wx');
    const bytes = typeof contents === 'string' ? Buffer.from(contents, 'utf8') : contents;
    let offset = 0;
    while (offset < bytes.length) offset += writeSync(fd, bytes, offset, bytes.length - offset);
    fsyncSync(fd);
    closeSync(fd);
    fd = undefined;
    renameSync(temporary, target);
  } catch (error) {
    if (fd !== undefined) closeSync(fd);
    try {
      rmSync(temporary, { force: true });
    } catch {
      // A temporary name the file system refused (ENAMETOOLONG) was never made: nothing to remove.
    }
    // A failed write to the open file (ENOSPC, EIO) carries no path, a failed open (EROFS, EACCES)
    // the temporary name the user never gave: name the output it was for.
    const errno = error as NodeJS.ErrnoException;
    if (errno !== null && typeof errno === 'object' && errno.code !== undefined)
      if (errno.path === undefined || errno.path === temporary) errno.path = target;
    throw error;
  }
}
