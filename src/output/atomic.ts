import {
  closeSync,
  constants,
  fchmodSync,
  fchownSync,
  fsyncSync,
  openSync,
  renameSync,
  rmSync,
  type Stats,
  writeSync,
} from 'node:fs';
import { dirname, join } from 'node:path';

/**
 * The pieces of a safe write: short temporary names beside the destination, staging a file (written,
 * flushed, given the permissions of the file it replaces) and writing through to a device or FIFO.
 * The transaction (transaction.ts) puts them together; writeAtomic is a transaction of one file.
 */

/** Every temporary name starts so; the pid (base 36) tells a later run whether its writer still lives. */
export const TEMPORARY_PREFIX = '.qs-';

/** `.qs-<pid>-<tag>.<kind>`: at most ~25 bytes, whatever the length of the name it stands for. */
export const TEMPORARY_NAME = /^\.qs-([0-9a-z]+)-[0-9a-z]+\.(tmp|old|jnl|jtmp)$/;

/** A short unique name for a temporary file of `kind` in `folder`. */
export function temporaryPath(folder: string, kind: 'tmp' | 'old' | 'jnl' | 'jtmp'): string {
  // Math.random, since loading node:crypto would cost every run; 'wx' refuses a name that exists.
  const tag = Math.random().toString(36).slice(2, 10) || '0';
  return join(folder, `${TEMPORARY_PREFIX}${process.pid.toString(36)}-${tag}.${kind}`);
}

const bytesOf = (contents: string | Uint8Array) =>
  typeof contents === 'string' ? Buffer.from(contents, 'utf8') : contents;

function writeAll(fd: number, contents: string | Uint8Array): void {
  const bytes = bytesOf(contents);
  let offset = 0;
  while (offset < bytes.length) offset += writeSync(fd, bytes, offset, bytes.length - offset);
}

/**
 * Write `contents` to a new temporary file beside `target`, flushed to disk, with the mode (and,
 * where allowed, the owner) of `replaces`, the file it will replace. Returns its path; on failure
 * nothing is left and the error is thrown.
 */
export function stageFile(target: string, contents: string | Uint8Array, replaces?: Stats): string {
  const temporary = temporaryPath(dirname(target), 'tmp');
  let fd: number | undefined;
  try {
    fd = openSync(temporary, 'wx', 0o666);
    if (replaces !== undefined) {
      fchmodSync(fd, replaces.mode & 0o7777);
      try {
        fchownSync(fd, replaces.uid, replaces.gid);
      } catch {
        // Only the owner's group or root may give a file away; the mode is what matters.
      }
    }
    writeAll(fd, contents);
    fsyncSync(fd);
    closeSync(fd);
    fd = undefined;
    return temporary;
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

/**
 * Write into a character device or a FIFO that exists (/dev/null, a terminal, a named pipe), as
 * `>` in a shell would: opened and written, never renamed over. A FIFO nobody reads is refused
 * (ENXIO) rather than waited for.
 */
export function writeThrough(path: string, contents: string | Uint8Array, fifo: boolean): void {
  // The probe stays open until the real descriptor is, so that the reader never sees an end between.
  const probe = fifo ? openSync(path, constants.O_WRONLY | constants.O_NONBLOCK) : undefined;
  let fd: number | undefined;
  try {
    fd = openSync(path, constants.O_WRONLY | (fifo ? 0 : constants.O_TRUNC));
    if (probe !== undefined) closeSync(probe);
    writeAll(fd, contents);
  } finally {
    if (fd !== undefined) closeSync(fd);
    else if (probe !== undefined) closeSync(probe);
  }
}

/** Write `contents` to `path` atomically: a transaction of one file (see output-set.ts for checks). */
export function writeAtomic(path: string, contents: string | Uint8Array): void {
  const temporary = stageFile(path, contents);
  try {
    renameSync(temporary, path);
  } catch (error) {
    rmSync(temporary, { force: true });
    throw error;
  }
}
