import { existsSync, lstatSync, mkdirSync, realpathSync, rmdirSync, type Stats, statSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { inputError, QuakesweepError, usageError } from '../base/errors.js';
import { markupSafe } from '../base/printable.js';
import { TEMPORARY_NAME, writeThrough } from './atomic.js';
import { recoverFolder } from './recover.js';
import { guardSignals } from './signals.js';
import { commitFiles, type PlannedWrite } from './transaction.js';

interface PlannedFile {
  path: string;
  contents: string | Uint8Array;
  /** The option that named it, for the message when two outputs meet. */
  option: string;
}

type PlannedFolder = Omit<PlannedFile, 'contents'>;

/** Where a planned file goes: a file replaced or created atomically, or a device or FIFO written through. */
interface Destination {
  file: PlannedFile;
  /** The real path written (a symlink's target; the folder's real path joined with a new name). */
  real: string;
  /** The file it replaces, if any (its mode is kept). */
  replaces?: Stats;
  through?: 'device' | 'fifo';
}

/** The longest file name most file systems allow, in bytes. */
const NAME_MAX_BYTES = 255;

/**
 * Every output of one command, as one transaction: checked together before any is written (no two
 * at one path or inode; none over an input, by real path or inode, whatever the spelling or
 * symlink; every folder existing or planned), then staged and renamed into place all together
 * (transaction.ts), or none. A symlink is written through to its target, atomically, the link kept;
 * a character device or FIFO (/dev/null, a terminal, a named pipe) is written as `>` would, never
 * replaced by a file; a block device or socket is refused. Standard output comes last.
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
    this.destinations();
  }

  private destinations(): Destination[] {
    const planned = new Set<string>();
    for (const folder of this.folders) {
      checkFolder(folder, planned);
      planned.add(resolve(folder.path));
    }
    const protect = this.inputs.filter((input) => input !== '-').flatMap(identify);
    const seen = new Map<string, PlannedFile>();
    const destinations: Destination[] = [];
    for (const file of this.files) {
      const destination = destinationOf(file, planned);
      const stats = destination.replaces;
      const keys = [destination.real, ...(stats ? [`${stats.dev}:${stats.ino}`] : [])];
      for (const key of keys) {
        const other = seen.get(key);
        if (other !== undefined) {
          throw usageError(
            `cannot write ${file.path} twice (${other.option} ${other.path} and ${file.option})`,
          );
        }
      }
      for (const key of keys) seen.set(key, file);
      const input = protect.find((p) => keys.includes(p.real) || keys.includes(p.inode ?? ''))?.input;
      if (input !== undefined) throw inputError(`refusing to overwrite the input ${input} with an output`);
      destinations.push(destination);
    }
    return destinations;
  }

  /** Check everything, then create the folders and write every file and the standard output. */
  write(): void {
    const destinations = this.destinations();
    guardSignals();
    const created: string[] = [];
    try {
      for (const folder of this.folders) {
        const full = resolve(folder.path);
        if (!existsSync(full)) created.push(full);
        // recursive: a folder made meanwhile by another process is no error.
        mkdirSync(full, { recursive: true });
      }
      const atomic = destinations.filter((d) => d.through === undefined);
      const folders = [...new Set(atomic.map((d) => dirname(d.real)))];
      for (const folder of folders) recoverFolder(folder);
      const writes: PlannedWrite[] = atomic.map((d) => ({
        final: d.real,
        contents: d.file.contents,
        replaces: d.replaces,
      }));
      if (writes.length > 0) commitFiles(writes, folders[0]);
    } catch (error) {
      for (const folder of created.reverse()) removeIfEmpty(folder);
      throw describeWriteError(error, destinations, 'nothing was changed');
    }
    for (const d of destinations) {
      if (d.through === undefined) continue;
      try {
        writeThrough(d.file.path, d.file.contents, d.through === 'fifo');
      } catch (error) {
        const others = destinations.length > 1 ? 'the other outputs were written' : 'nothing was written';
        throw describeWriteError(error, [d], others);
      }
    }
    // Standard output reaches a terminal: no escape sequence or control character from a name.
    if (this.stdoutText !== undefined) process.stdout.write(markupSafe(this.stdoutText));
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

/**
 * Before any work: refuse when an input lies in the output folder `path` under a name the command
 * may write there (`isOutput`), e.g. `report --target DIR/target.csv --out DIR` is fine but
 * `--target DIR/psa.svg` with `--svg DIR` is not. The output set checks the exact names again.
 */
export function checkFolderInputs(
  { path, option }: PlannedFolder,
  inputs: readonly string[],
  isOutput: (name: string) => boolean,
): void {
  checkFolder({ path, option });
  if (!existsSync(path)) return;
  const folder = realpathSync(path);
  for (const input of inputs) {
    if (input === '-') continue;
    for (const { real } of identify(input)) {
      if (dirname(real) === folder && isOutput(basename(real)))
        throw inputError(
          `refusing to overwrite the input ${input}: ${option} ${path} would write ${basename(real)}`,
        );
    }
  }
}

const isFolder = (path: string) => existsSync(path) && statSync(path).isDirectory();

/** An input's real path and, when it exists, its inode ("dev:ino"). */
function identify(input: string): { input: string; real: string; inode?: string }[] {
  try {
    const stats = statSync(input);
    return [{ input, real: realpathSync(input), inode: `${stats.dev}:${stats.ino}` }];
  } catch {
    return [{ input, real: realPath(input) }];
  }
}

/** Classify where `file` goes; throw a one-line refusal for what cannot be written safely. */
function destinationOf(file: PlannedFile, plannedFolders: ReadonlySet<string>): Destination {
  const full = resolve(file.path);
  if (Buffer.byteLength(basename(full)) > NAME_MAX_BYTES)
    throw usageError(`cannot write ${file.path}: its name is longer than ${NAME_MAX_BYTES} bytes`);
  let link: Stats | undefined;
  try {
    link = lstatSync(full);
  } catch {
    // Nothing there yet: a new file in a folder that exists or is planned.
    if (!isFolder(dirname(full)) && !plannedFolders.has(dirname(full)))
      throw inputError(`cannot write ${file.path}: folder ${dirname(file.path)} does not exist`);
    return { file, real: realPath(full) };
  }
  let stats = link;
  if (link.isSymbolicLink()) {
    try {
      stats = statSync(full);
    } catch {
      throw inputError(
        `cannot write ${file.path}: it is a symbolic link to nothing; remove it or name a file`,
      );
    }
  }
  if (stats.isDirectory()) throw inputError(`cannot write ${file.path}: it is a folder`);
  if (stats.isCharacterDevice()) return { file, real: full, through: 'device' };
  if (stats.isFIFO()) return { file, real: full, through: 'fifo' };
  if (!stats.isFile())
    throw inputError(`cannot write ${file.path}: it is a ${stats.isSocket() ? 'socket' : 'block device'}`);
  return { file, real: realpathSync(full), replaces: stats };
}

/** The real path of a file, or of its folder joined with its name when it does not exist yet. */
function realPath(path: string): string {
  const full = resolve(path);
  if (existsSync(full)) return realpathSync(full);
  const folder = dirname(full);
  return existsSync(folder) ? join(realpathSync(folder), basename(full)) : full;
}

function removeIfEmpty(folder: string): void {
  try {
    rmdirSync(folder);
  } catch {
    // Not empty or already gone: leave it.
  }
}

/** What the file system said, as one line naming the path (exit 2), for the errors a person can fix. */
const WRITE_ERRORS = new Map([
  ['ENOSPC', 'no space left on the device'],
  ['EDQUOT', 'disk quota exceeded'],
  ['EROFS', 'read-only file system'],
  ['EACCES', 'permission denied'],
  ['EPERM', 'operation not permitted'],
  ['ENAMETOOLONG', 'name too long'],
  ['ENXIO', 'a FIFO with no reader'],
  ['EXDEV', 'a symbolic link to another file system'],
  ['EIO', 'input/output error'],
]);

function describeWriteError(error: unknown, destinations: readonly Destination[], outcome: string): unknown {
  if (error instanceof QuakesweepError) return error;
  const errno = error as NodeJS.ErrnoException;
  const reason = WRITE_ERRORS.get(errno?.code ?? '');
  if (reason === undefined) return error;
  let where = destinations.length === 1 ? destinations[0].file.path : 'the outputs';
  if (destinations.length !== 1 && errno.path !== undefined)
    where = TEMPORARY_NAME.test(basename(errno.path)) ? `into ${dirname(errno.path)}` : errno.path;
  return inputError(`cannot write ${where}: ${reason}; ${outcome}`);
}
