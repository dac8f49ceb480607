import { Command, CommanderError } from 'commander';
import { isQuakesweepError } from '../errors.js';
import { VERSION } from '../version.js';
import { registerAnchor } from './commands/anchor.js';
import { registerBatch } from './commands/batch.js';
import { registerDamping } from './commands/damping.js';
import { registerDemo } from './commands/demo.js';
import { registerDesign } from './commands/design.js';
import { registerFloor } from './commands/floor.js';
import { registerInfo } from './commands/info.js';
import { registerMerge } from './commands/merge.js';
import { registerReport } from './commands/report.js';
import { registerRotD } from './commands/rotd.js';
import { registerSpectrum } from './commands/spectrum.js';
import { registerSynth } from './commands/synth.js';

/** Exit codes: 0 done, 1 internal fault or partly failed batch, 2 bad input or usage. */
export const EXIT_INPUT = 2;
export const EXIT_INTERNAL = 1;

export function buildProgram(): Command {
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
  registerSpectrum(program);
  registerInfo(program);
  registerDesign(program);
  registerDamping(program);
  registerRotD(program);
  registerFloor(program);
  registerAnchor(program);
  registerSynth(program);
  registerReport(program);
  registerDemo(program);
  registerBatch(program);
  registerMerge(program);
  return program;
}

/** Run the CLI; every failure becomes one line on stderr and an exit code, never a stack trace. */
export async function main(argv: string[]): Promise<number> {
  const program = buildProgram();
  try {
    await program.parseAsync(argv, { from: 'user' });
    return 0;
  } catch (error) {
    return reportError(error);
  }
}

export function reportError(error: unknown): number {
  if (error instanceof CommanderError) {
    if (
      error.exitCode === 0 ||
      error.code === 'commander.helpDisplayed' ||
      error.code === 'commander.version'
    )
      return 0;
    return EXIT_INPUT; // commander already printed its one-line message
  }
  if (isQuakesweepError(error)) {
    process.stderr.write(`quakesweep: ${oneLine(error.describe())}\n`);
    return error.kind === 'internal' ? EXIT_INTERNAL : EXIT_INPUT;
  }
  const code = (error as NodeJS.ErrnoException | undefined)?.code;
  if (code === 'ENOENT' || code === 'EACCES' || code === 'EISDIR' || code === 'ENOTDIR') {
    const path = (error as NodeJS.ErrnoException).path ?? '';
    const reason = {
      ENOENT: 'no such file',
      EACCES: 'permission denied',
      EISDIR: 'is a folder',
      ENOTDIR: 'not a folder',
    }[code];
    process.stderr.write(`quakesweep: ${oneLine(`${path}: ${reason}`)}\n`);
    return EXIT_INPUT;
  }
  const message = error instanceof Error ? error.message : String(error);
  process.stderr.write(
    `quakesweep: internal error: ${oneLine(message.split('\n')[0])} (please report this)\n`,
  );
  return EXIT_INTERNAL;
}

/** A message on one line: breaks that came in with a file name or an option value become spaces. */
function oneLine(text: string): string {
  return text.trim().replace(/[\r\n\u2028\u2029]+/g, ' ');
}
