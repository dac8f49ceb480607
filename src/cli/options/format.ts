import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { OutputSet } from '../../output/output-set.js';

/** --format, --out and --svg as commander hands them over. */
export interface OutputCliOptions {
  format?: string;
  out?: string;
  svg?: string;
}

/** Add --format (described by `formatHelp`), --out and, when `svgHelp` is given, --svg <dir>. */
export function addOutputOptions(command: Command, formatHelp: string, svgHelp?: string): Command {
  command
    .option('--format <format>', formatHelp)
    .option('--out <path>', 'write to this file instead of standard output');
  return svgHelp === undefined ? command : command.option('--svg <dir>', svgHelp);
}

/**
 * The value of --format, one of `allowed`: by default a table on the terminal, or json with --out.
 * `hint` is the list the refusal names (the commands name it each in their own words).
 */
export function outputFormat(options: OutputCliOptions, allowed: readonly string[], hint: string): string {
  const format = options.format ?? (options.out === undefined ? 'table' : 'json');
  if (!allowed.includes(format)) throw usageError(`--format '${format}': use ${hint}`);
  return format;
}

/** The value of --axes: log or linear. */
export function figureAxes(axes = 'log'): 'log' | 'linear' {
  if (axes !== 'log' && axes !== 'linear') throw usageError(`--axes '${axes}': use log or linear`);
  return axes;
}

/**
 * Write a command's product to --out (or standard output) and, with --svg, its figures by file
 * name, after checking them all against each other and the `inputs`.
 */
export function writeProduct(
  inputs: readonly string[],
  options: OutputCliOptions,
  text: string,
  figures: () => Iterable<[string, string]>,
): void {
  const outputs = new OutputSet(inputs);
  if (options.svg !== undefined) outputs.folder(options.svg, figures(), '--svg');
  outputs.text(options.out, text).write();
}
