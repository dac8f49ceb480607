import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { formatJson } from '../../formats/spectrum-json.js';
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
 * Check --format: by default a table on the terminal, or json with --out; else the table or one of
 * the formats `offered` lists, in the command's words ("json or csv"), which the refusal repeats.
 */
export function outputFormat(options: OutputCliOptions, offered: string): string {
  const format = chosenFormat(options);
  if (format !== 'table' && !offered.split(' or ').includes(format))
    throw usageError(`--format '${format}': use ${offered}`);
  return format;
}

function chosenFormat(options: OutputCliOptions): string {
  return options.format ?? (options.out === undefined ? 'table' : 'json');
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
  csv?(): string;
  table(): string;
  figures(): Iterable<[string, string]> | Promise<Iterable<[string, string]>>;
}

/**
 * Write a command's product, in the format checked by outputFormat, to --out (or standard output)
 * and, with --svg, its figures, after checking them all against each other and the `inputs`.
 */
export async function writeProduct(
  inputs: readonly string[],
  options: OutputCliOptions,
  product: Product,
): Promise<void> {
  const format = chosenFormat(options);
  const outputs = new OutputSet(inputs);
  if (options.svg !== undefined) outputs.folder(options.svg, await product.figures(), '--svg');
  const text =
    format === 'json'
      ? formatJson(product.json())
      : format === 'csv' && product.csv
        ? product.csv()
        : product.table();
  outputs.text(options.out, text).write();
}
