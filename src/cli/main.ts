import { Command, CommanderError } from 'commander';
import { isQuakesweepError, usageError } from '../base/errors.js';
import { printable } from '../base/printable.js';
import { VERSION } from '../base/version.js';
import { closestName } from './suggest.js';

type Register = (program: Command) => void;

/**
 * The commands, in the order of --help, each loaded only when needed: a run of one command loads
 * that command's modules and no other's (start-up is part of every job's time).
 */
const COMMANDS: [string, () => Promise<Register>][] = [
  ['spectrum', async () => (await import('./commands/spectrum.js')).registerSpectrum],
  ['info', async () => (await import('./commands/info.js')).registerInfo],
  ['record', async () => (await import('./commands/record.js')).registerRecord],
  ['design', async () => (await import('./commands/design.js')).registerDesign],
  ['damping', async () => (await import('./commands/damping.js')).registerDamping],
  ['rotd', async () => (await import('./commands/rotd.js')).registerRotD],
  ['floor', async () => (await import('./commands/floor.js')).registerFloor],
  ['ductility', async () => (await import('./commands/ductility.js')).registerDuctility],
  ['anchor', async () => (await import('./commands/anchor.js')).registerAnchor],
  ['synth', async () => (await import('./commands/synth.js')).registerSynth],
  ['report', async () => (await import('./commands/report.js')).registerReport],
  ['demo', async () => (await import('./commands/demo.js')).registerDemo],
  ['batch', async () => (await import('./commands/batch.js')).registerBatch],
  ['merge', async () => (await import('./commands/merge.js')).registerMerge],
];

/** Exit codes: 0 done, 1 internal fault or partly failed batch, 2 bad input or usage. */
export const EXIT_INPUT = 2;
export const EXIT_INTERNAL = 1;

/**
 * The program with every command, or with only `only` when it names one (for a run of that
 * command; help, unknown commands and their suggestions see them all).
 */
export async function buildProgram(only?: string): Promise<Command> {
  const program = new Command('quakesweep')
    .description(
      'Response spectra and preliminary equipment anchorage demands from ground-acceleration records.',
    )
    .version(VERSION)
    .exitOverride();
  // Commander's own errors become one line like every other error: its message (with any
  // "Did you mean" hint) and the pointer to --help, folded together.
  program.configureOutput({
    writeErr: (text) => process.stderr.write(text),
    outputError: (text, write) =>
      write(`quakesweep: ${oneLine(text.replace(/^error: /, ''))} (run with --help for usage)\n`),
  });
  const chosen = COMMANDS.filter(([name]) => name === only);
  for (const [, load] of chosen.length === 1 ? chosen : COMMANDS) (await load())(program);
  return program;
}

/** Run the CLI; every failure becomes one line on stderr and an exit code, never a stack trace. */
export async function main(argv: string[]): Promise<number> {
  watchStandardStreams();
  let code: number;
  try {
    checkHelpTopic(argv);
    await (await buildProgram(argv[0])).parseAsync(argv, { from: 'user' });
    code = 0;
  } catch (error) {
    code = reportError(error);
  }
  return streamFailure ?? code;
}

/** The exit code once standard output failed (closed pipe, full disk), if it did. */
let streamFailure: number | undefined;

/**
 * A failure of standard output (EPIPE when the reader stops early, as `| head -1` does; ENOSPC on a
 * full device) ends the run with one line on stderr and exit code 2, not a stack trace; later
 * writes are dropped. A failing stderr is dropped silently (there is nowhere left to say it).
 */
function watchStandardStreams(): void {
  if (process.stdout.listenerCount('error') > 0) return;
  process.stdout.on('error', (error: NodeJS.ErrnoException) => {
    if (streamFailure !== undefined) return;
    streamFailure = EXIT_INPUT;
    process.exitCode = EXIT_INPUT;
    process.stdout.write = (() => true) as typeof process.stdout.write;
    const reason =
      error.code === 'EPIPE'
        ? 'standard output was closed before the end; the output is cut short'
        : `standard output: ${FILE_ERRORS.get(error.code ?? '') ?? error.code ?? error.message}; the output is cut short`;
    process.stderr.write(`quakesweep: ${reason}\n`);
  });
  process.stderr.on('error', () => {
    process.stderr.write = (() => true) as typeof process.stderr.write;
  });
}

/** `help <topic>` names a command; anything else is refused (exit 2) with the nearest name, if any. */
function checkHelpTopic(argv: string[]): void {
  const [first, topic] = argv;
  if (first !== 'help' || topic === undefined || topic.startsWith('-')) return;
  const names = COMMANDS.map(([name]) => name);
  if (names.includes(topic)) return;
  const near = closestName(topic, names);
  const hint = near === undefined ? `the commands are ${names.join(', ')}` : `did you mean '${near}'?`;
  throw usageError(`no command '${topic}' to explain; ${hint}`);
}

/** What a failed file operation says, by its error code. */
const FILE_ERRORS = new Map([
  ['ENOENT', 'no such file'],
  ['EACCES', 'permission denied'],
  ['EISDIR', 'is a folder'],
  ['ENOTDIR', 'not a folder'],
  ['EPERM', 'operation not permitted'],
  ['EROFS', 'read-only file system'],
  ['ENOSPC', 'no space left on the device'],
  ['EDQUOT', 'disk quota exceeded'],
  ['ENAMETOOLONG', 'name too long'],
  ['ELOOP', 'too many symbolic links'],
  ['EEXIST', 'already exists'],
  ['ENOTEMPTY', 'folder not empty'],
  ['EMFILE', 'too many open files'],
  ['ENFILE', 'too many open files'],
  ['EIO', 'input/output error'],
  ['EBUSY', 'busy'],
  ['EXDEV', 'on another file system'],
]);

export function reportError(error: unknown): number {
  // Commander has printed its own one-line message; help and --version end with exit code 0.
  if (error instanceof CommanderError) return error.exitCode === 0 ? 0 : EXIT_INPUT;
  if (isQuakesweepError(error)) {
    process.stderr.write(`quakesweep: ${oneLine(error.describe())}\n`);
    return error.kind === 'internal' ? EXIT_INTERNAL : EXIT_INPUT;
  }
  const errno = error as NodeJS.ErrnoException | undefined;
  const reason = FILE_ERRORS.get(errno?.code ?? '');
  if (reason !== undefined) {
    // An error of a write to an open file carries no path; its syscall says what failed.
    const where = errno?.path ?? (errno?.syscall === undefined ? 'file' : `${errno.syscall}`);
    process.stderr.write(`quakesweep: ${oneLine(`${where}: ${reason}`)}\n`);
    return EXIT_INPUT;
  }
  const message = error instanceof Error ? error.message : String(error);
  process.stderr.write(
    `quakesweep: internal error: ${oneLine(message.split('\n')[0])} (please report this)\n`,
  );
  return EXIT_INTERNAL;
}

/**
 * A message on one line: breaks that came in with a file name or an option value become spaces,
 * and terminal control sequences are removed (see printable).
 */
function oneLine(text: string): string {
  return printable(text.trim().replace(/[\r\n\u2028\u2029]+/g, ' '));
}
