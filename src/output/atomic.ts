import {
  closeSync,
  existsSync,
  fsyncSync,
  openSync,
  realpathSync,
  renameSync,
  rmSync,
  statSync,
  writeSync,
} from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { inputError } from '../base/errors.js';

/**
 * Check that `path` can take an output: its folder exists, it is not a folder itself, and it is
 * not (through a symlink or another spelling) one of the `protect`ed inputs. Commands that write
 * several files check them all first, so a refusal leaves none written. Returns the full path.
 */
export function checkOutputPath(path: string, protect: readonly string[] = []): string {
  const target = resolve(path);
  const folder = dirname(target);
  if (!existsSync(folder) || !statSync(folder).isDirectory()) {
    throw inputError(`cannot write ${path}: folder ${dirname(path)} does not exist`);
  }
  if (existsSync(target) && statSync(target).isDirectory()) {
    throw inputError(`cannot write ${path}: it is a folder`);
  }
  for (const input of protect) {
    if (input === '-' || !existsSync(input)) continue;
    if (existsSync(target) && realpathSync(target) === realpathSync(input)) {
      throw inputError(`refusing to overwrite the input ${input} with an output`);
    }
  }
  return target;
}

/**
 * Write `contents` to `path` atomically: into a temporary file beside it, flushed, then renamed
 * into place, so a reader never sees a half-written file and a failure leaves nothing behind.
 * `protect` lists input paths that must never be overwritten.
 */
export function writeFileAtomic(
  path: string,
  contents: string | Uint8Array,
  protect: readonly string[] = [],
): void {
  const target = checkOutputPath(path, protect);
  const folder = dirname(target);
  // A name no other writer picks (the process, then a random tag: Math.random, since loading
  // node:crypto for it cost 2 ms of every run); 'wx' refuses to open one that exists all the same.
  const tag = Math.random().toString(36).slice(2, 10);
  const temporary = join(folder, `.${basename(target)}.${process.pid}.${tag}.tmp`);
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
    rmSync(temporary, { force: true });
    throw error;
  }
}
