import { extname } from 'node:path';
import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { formatJson } from '../../formats/spectrum-json.js';
import { OutputSet } from '../../output/output-set.js';
import { announceSuccess } from '../announce.js';

/** --format, --out and --svg as commander hands them over. */
export interface OutputCliOptions {
  format?: string;
  out?: string;
  svg?: string;
}

/** The formats of a command's main product; every command writes all three. */
export type OutputFormat = 'table' | 'json' | 'csv';

/** The format a file name's extension stands for, when --format is not given. */
const FORMAT_BY_EXTENSION: ReadonlyMap<string, OutputFormat> = new Map([
  ['.csv', 'csv'],
  ['.json', 'json'],
  ['.txt', 'table'],
]);

/** The help of --format, the same on every command. */
export const FORMAT_HELP =
  'table, json or csv (default: a table on the terminal; with --out, by its extension .csv, .json or .txt, else json)';

/** Add --format, --out and, when `svgHelp` is given, --svg <dir>. */
export function addOutputOptions(command: Command, svgHelp?: string): Command {
  command
    .option('--format <format>', FORMAT_HELP)
    .option('--out <path>', 'write to this file instead of standard output');
  return svgHelp === undefined ? command : command.option('--svg <dir>', svgHelp);
}

/**
 * The format of the main product: --format when given (it must agree with the extension of --out,
 * when that names a format), else the one the extension of --out names, else json into a file and
 * a table on the terminal.
 */
export function outputFormat(options: OutputCliOptions): OutputFormat {
  const byExtension =
    options.out === undefined ? undefined : FORMAT_BY_EXTENSION.get(extname(options.out).toLowerCase());
  if (options.format === undefined) return byExtension ?? (options.out === undefined ? 'table' : 'json');
  const format = options.format.trim().toLowerCase();
  if (format !== 'table' && format !== 'json' && format !== 'csv')
    throw usageError(`--format '${options.format}': use table, json or csv`);
  if (byExtension !== undefined && byExtension !== format)
    throw usageError(
      `--format ${format} contradicts --out ${options.out} (a ${byExtension} name); change one of them`,
    );
  return format;
}

/** The value of --axes: log or linear. */
export function figureAxes(axes = 'log'): 'log' | 'linear' {
  if (axes !== 'log' && axes !== 'linear') throw usageError(`--axes '${axes}': use log or linear`);
  return axes;
}

/** A command's product in each of its formats, and its figures for --svg by file name. */
export interface Product {
  /** The JSON value (written by formatJson). */
  json(): unknown;
  csv(): string;
  table(): string;
  figures(): Iterable<[string, string]> | Promise<Iterable<[string, string]>>;
  /** What was made, in a few words for the line on standard error ("PSA of h1, 61 periods × 1 damping"). */
  summary: string;
}

/**
 * Write a command's product, in the format of outputFormat, to --out (or standard output) and,
 * with --svg, its figures, after checking them all against each other and the `inputs`; then say
 * on standard error what was written, with the caution.
 */
export async function writeProduct(
  inputs: readonly string[],
  options: OutputCliOptions,
  product: Product,
): Promise<void> {
  const format = outputFormat(options);
  const outputs = new OutputSet(inputs);
  const figures = options.svg === undefined ? [] : Array.from(await product.figures());
  if (options.svg !== undefined) outputs.folder(options.svg, figures, '--svg');
  const text =
    format === 'json' ? formatJson(product.json()) : format === 'csv' ? product.csv() : product.table();
  outputs.text(options.out, text).write();
  const written = [
    options.out === undefined ? `${format} on standard output` : `${options.out} (${format})`,
    ...(options.svg === undefined
      ? []
      : [`${figures.length} figure${figures.length === 1 ? '' : 's'} in ${options.svg}`]),
  ];
  announceSuccess(product.summary, written);
}
