import { closeSync, openSync, readSync } from 'node:fs';
import type { Command } from 'commander';
import { inputError, usageError } from '../../base/errors.js';
import { printable } from '../../base/printable.js';
import { parseAccelerationUnit } from '../../base/units.js';
import { parseFixedWidths } from '../../record/fixed.js';
import { type ReadOptions, type RecordLayout, readRecordStream, unitWarnings } from '../../record/read.js';
import type { GroundRecord } from '../../record/record.js';

/** Options of every command that reads a record (values as commander hands them over). */
export interface RecordCliOptions {
  dt?: string;
  units?: string;
  column?: string;
  skip?: string;
  layout?: string;
  name?: string;
  fixed?: string;
  timeUnit?: string;
}

/** Add the reading options to a command. */
export function addRecordOptions(command: Command): Command {
  return command
    .option(
      '--units <unit>',
      "unit of the acceleration values: g, m/s2, cm/s2 (gal), mm/s2, in/s2, ft/s2 (required unless the file's header states it; overrides the header)",
    )
    .option(
      '--dt <seconds>',
      "time step, s, for files without a time column (single and wrapped layouts); overrides the header's",
    )
    .option(
      '--column <n|name>',
      "the table's acceleration column: a number (column 1 is time) or a header name, any case (needed when there are several value columns)",
    )
    .option('--skip <n>', 'lines to skip before the data (text header lines are skipped without it)', '0')
    .option(
      '--fixed <widths>',
      'fixed-width fields: COUNTxWIDTH (e.g. 8x10) or widths separated by commas (e.g. 10,10,12)',
    )
    .option(
      '--time-unit <unit>',
      'unit of the time column, s or ms; given, a step of 1 s or more or a record longer than a day is taken as told',
    )
    .option(
      '--layout <layout>',
      'auto, single (one value a line), table (time, then values), wrapped (several values a line, row order)',
      'auto',
    )
    .option('--name <name>', "the record's name in outputs (default: the file's base name)");
}

export function recordReadOptions(source: string, options: RecordCliOptions): ReadOptions {
  const layout = options.layout ?? 'auto';
  if (!['auto', 'single', 'table', 'wrapped'].includes(layout)) {
    throw usageError(`--layout '${layout}': use auto, single, table or wrapped`);
  }
  const timeUnit = options.timeUnit;
  if (timeUnit !== undefined && timeUnit !== 's' && timeUnit !== 'ms')
    throw usageError(`--time-unit '${timeUnit}': use s or ms`);
  return {
    source,
    units: options.units === undefined ? undefined : parseAccelerationUnit(options.units),
    dtS: options.dt === undefined ? undefined : positiveNumber('--dt', options.dt),
    column: options.column === undefined ? undefined : columnOption(options.column),
    fixed: options.fixed === undefined ? undefined : parseFixedWidths(options.fixed),
    timeUnit,
    skip: options.skip === undefined ? 0 : wholeNumber('--skip', options.skip, 0),
    layout: layout as RecordLayout,
    name: options.name,
  };
}

/** `--column`: a whole number, or else a column's name. */
function columnOption(text: string): number | string {
  if (/^\s*[+-]?\d+(\.\d*)?\s*$/.test(text)) return wholeNumber('--column', text, 1);
  if (text.trim() === '') throw usageError("--column must be a column's number or name, got ''");
  return text.trim();
}

/**
 * Open the file (or standard input for `-`) and read it as a record, printing on stderr the
 * warnings of reading (which the record's outputs carry too).
 */
export async function loadRecord(source: string, options: RecordCliOptions): Promise<GroundRecord> {
  const readOptions = recordReadOptions(source, options);
  const chunks = source === '-' ? boundedStdin(process.stdin) : fileChunks(source);
  const record = await readRecordStream(chunks, readOptions).catch((error: unknown) => {
    // Errors of reading (a folder, say) come without the path; give them the one the user typed.
    const errno = error as NodeJS.ErrnoException;
    if (typeof errno?.code === 'string' && !errno.path) errno.path = source;
    throw error;
  });
  for (const warning of unitWarnings(record))
    process.stderr.write(`quakesweep: warning: ${printable(`${source}: ${warning}`)}\n`);
  return record;
}

/**
 * Most bytes read from standard input (2 GiB): a stream has no size to check first, and one that
 * never ends would grow the record's memory without bound. Beyond it, save the record to a file.
 */
export const MAX_STDIN_BYTES = 2 ** 31;

/** A stream's chunks, refused once they pass `limit` bytes in all. */
export async function* boundedStdin(
  input: AsyncIterable<string | Uint8Array>,
  limit = MAX_STDIN_BYTES,
): AsyncGenerator<string | Uint8Array> {
  let bytes = 0;
  for await (const chunk of input) {
    bytes += typeof chunk === 'string' ? Buffer.byteLength(chunk) : chunk.length;
    if (bytes > limit)
      throw inputError(
        `more than ${limit >= 2 ** 30 ? `${limit / 2 ** 30} GiB` : `${limit} bytes`} on standard input, the most read from a stream; save the record to a file and name it instead`,
        { file: 'stdin' },
      );
    yield chunk;
  }
}

/**
 * A file's bytes, 256 KiB at a time, read as they are asked for (closed when the reader stops
 * early). Plain reads: a file stream would load node:fs/promises at every start-up. Chunks no
 * larger than 256 KiB keep a long record's peak memory low.
 */
async function* fileChunks(path: string): AsyncGenerator<Uint8Array> {
  const fd = openSync(path, 'r');
  try {
    for (;;) {
      const chunk = Buffer.allocUnsafe(1 << 18);
      const length = readSync(fd, chunk, 0, chunk.length, null);
      if (length === 0) return;
      yield chunk.subarray(0, length);
    }
  } finally {
    closeSync(fd);
  }
}

export function positiveNumber(option: string, text: string): number {
  const value = Number(text);
  if (text.trim() === '' || !Number.isFinite(value) || value <= 0)
    throw usageError(`${option} must be a positive number, got '${text}'`);
  return value;
}

/** A whole number from `min` to `max` (unbounded when left out). */
export function wholeNumber(option: string, text: string, min: number, max?: number): number {
  const value = Number(text);
  if (!Number.isInteger(value) || value < min || (max !== undefined && value > max)) {
    const range = max === undefined ? `≥ ${min}` : `from ${min} to ${max}`;
    throw usageError(`${option} must be a whole number ${range}, got '${text}'`);
  }
  return value;
}
