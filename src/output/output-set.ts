import { existsSync, mkdirSync, realpathSync, statSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { inputError, usageError } from '../base/errors.js';
import { writeAtomic } from './atomic.js';

interface PlannedFile {
  path: string;
  contents: string | Uint8Array;
  /** The option that named it, for the message when two outputs meet. */
  option: string;
}

type PlannedFolder = Omit<PlannedFile, 'contents'>;

/**
 * Every output of one command, checked together before any is written: no two at one path, none at
 * an input's real path (another spelling or a symlink is caught), every file's folder existing or
 * planned. Then each file is written atomically, and last the standard output; a refusal writes nothing.
 */
export class OutputSet {
  private readonly files: PlannedFile[] = [];
  private readonly folders: PlannedFolder[] = [];
  private stdoutText: string | undefined;

  /** `inputs`: the files the command read ('-' for standard input is ignored). */
  constructor(private readonly inputs: readonly string[] = []) {}

  file(path: string, contents: string | Uint8Array, option = '--out'): this {
    this.files.push({ path, contents, option });
    return this;
  }

  /** A folder (created if its parent exists) and the files in it, named within it. */
  folder(path: string, files: Iterable<[string, string | Uint8Array]> = [], option = '--out'): this {
    this.folders.push({ path, option });
    for (const [name, contents] of files) this.file(join(path, name), contents, option);
    return this;
  }

  /** The main product: to the file `out` names, or to standard output when it names none. */
  text(out: string | undefined, text: string): this {
    if (out === undefined) this.stdoutText = text;
    else this.file(out, text);
    return this;
  }

  /** Throw the first refusal, if any, without writing anything. */
  check(): void {
    const planned = new Set<string>();
    for (const folder of this.folders) {
      checkFolder(folder, planned);
      planned.add(resolve(folder.path));
    }
    const protect = this.inputs
      .filter((input) => input !== '-' && existsSync(input))
      .map((input) => ({ input, real: realPath(input) }));
    const seen = new Map<string, PlannedFile>();
    for (const file of this.files) {
      const target = resolve(file.path);
      if (!isFolder(dirname(target)) && !planned.has(dirname(target))) {
        throw inputError(`cannot write ${file.path}: folder ${dirname(file.path)} does not exist`);
      }
      if (isFolder(target)) throw inputError(`cannot write ${file.path}: it is a folder`);
      const key = realPath(file.path);
      const other = seen.get(key);
      if (other !== undefined) {
        throw usageError(
          `cannot write ${file.path} twice (${other.option} ${other.path} and ${file.option})`,
        );
      }
      seen.set(key, file);
      const input = protect.find((p) => p.real === key)?.input;
      if (input !== undefined) throw inputError(`refusing to overwrite the input ${input} with an output`);
    }
  }

  /** Check everything, then create the folders and write every file and the standard output. */
  write(): void {
    this.check();
    // recursive: a folder made meanwhile by another thread (batch workers share one) is no error.
    for (const folder of this.folders) mkdirSync(folder.path, { recursive: true });
    for (const file of this.files) writeAtomic(file.path, file.contents);
    if (this.stdoutText !== undefined) process.stdout.write(this.stdoutText);
  }
}

/** Write one file atomically, after the checks of an output set, over none of the `inputs`. */
export function writeFileAtomic(path: string, contents: string | Uint8Array, inputs: readonly string[] = []) {
  new OutputSet(inputs).file(path, contents).write();
}

/** A folder may exist (as a folder), or be created when its parent exists or is `planned` (full paths). */
export function checkFolder({ path, option }: PlannedFolder, planned: ReadonlySet<string> = new Set()): void {
  const full = resolve(path);
  if (existsSync(full)) {
    if (!isFolder(full)) throw usageError(`${option} ${path}: exists and is not a folder`);
  } else if (!existsSync(dirname(full)) && !planned.has(dirname(full))) {
    throw usageError(`${option} ${path}: its parent folder does not exist`);
  }
}

const isFolder = (path: string) => existsSync(path) && statSync(path).isDirectory();

/** The real path of a file, or of its folder joined with its name when it does not exist yet. */
function realPath(path: string): string {
  const full = resolve(path);
  if (existsSync(full)) return realpathSync(full);
  const folder = dirname(full);
  return existsSync(folder) ? join(realpathSync(folder), basename(full)) : full;
}
