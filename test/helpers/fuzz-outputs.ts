/**
 * Checks the fuzz tests apply to whatever a command wrote: every file of a folder read back by its
 * kind (JSON parses and holds no NaN, Infinity or unexpected null; CSV cells cannot start a
 * spreadsheet formula; SVG is well-formed XML), no temporary left, and no control character in
 * anything a terminal would show. Each returns the first problem found as text, or undefined.
 */
import { spawnSync } from 'node:child_process';
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { parse as parseCsv } from 'csv-parse/sync';
import { JSDOM } from 'jsdom';
import { TEMPORARY_NAME } from '../../src/output/atomic.js';
import { BIN, type CliResult } from './run-cli.js';

/** Every file under `folder`, as paths relative to it (folders by their files). */
export function filesUnder(folder: string, prefix = ''): string[] {
  const found: string[] = [];
  for (const name of readdirSync(folder).sort()) {
    const path = join(folder, name);
    if (statSync(path).isDirectory()) found.push(...filesUnder(path, `${prefix}${name}/`));
    else found.push(`${prefix}${name}`);
  }
  return found;
}

/** A temporary of the output transaction (`.qs-…`) among `files`, if any. */
export function temporaryAmong(files: string[]): string | undefined {
  return files.find((file) => TEMPORARY_NAME.test(file.split('/').at(-1) ?? '') || /\.tmp$/.test(file));
}

/**
 * Control characters a terminal acts on (C0 but tab and line feed, DEL, C1): none may reach
 * standard output or standard error (issue 21: escape sequences in names reached the terminal).
 */
// biome-ignore lint/suspicious/noControlCharactersInRegex: looking for control characters is the point
export const TERMINAL_CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/;

/** Characters XML 1.0 forbids (C0 but tab, LF, CR), and ESC-led sequences, in a written text file. */
// biome-ignore lint/suspicious/noControlCharactersInRegex: looking for control characters is the point
const FILE_CONTROL = /[\u0000-\u0008\u000b\u000c\u000e-\u001f\ufffe\uffff]/;

/** A CSV cell a spreadsheet would run as a formula (common practice: = + - @ tab CR), unless a number. */
const FORMULA_START = /^[=+\-@\t\r]/;
const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/** A problem with one CSV text: a cell that could start a formula, or a non-finite number. */
export function csvProblem(text: string): string | undefined {
  const lines = text.split(/\r?\n/);
  const body: string[] = [];
  for (const line of lines) {
    if (line.startsWith('#')) {
      // A note line: a spreadsheet splits it at its commas too; every piece after the first is a cell.
      for (const piece of line.split(',').slice(1)) {
        const rest = piece.replace(/^[\s"]*/, '');
        if (FORMULA_START.test(rest) && !NUMBER.test(rest.trim().replace(/"$/, '')))
          return `note line cell ${JSON.stringify(piece)} could start a formula`;
      }
    } else body.push(line);
  }
  let rows: string[][];
  try {
    rows = parseCsv(body.join('\n'), { relax_column_count: true, skip_empty_lines: true });
  } catch (error) {
    return `not RFC 4180 CSV: ${(error as Error).message}`;
  }
  for (const row of rows) {
    for (const cell of row) {
      if (FORMULA_START.test(cell) && !NUMBER.test(cell))
        return `cell ${JSON.stringify(cell)} could start a formula`;
      if (/^[+-]?(NaN|Infinity|inf)$/i.test(cell))
        return `cell ${JSON.stringify(cell)} is not a finite number`;
    }
  }
  return undefined;
}

/** Paths of the nulls in a parsed JSON value (a NaN or ±Infinity is written as null). */
export function nullPaths(value: unknown, path = '$'): string[] {
  if (value === null) return [path];
  if (Array.isArray(value)) return value.flatMap((v, i) => nullPaths(v, `${path}[${i}]`));
  if (typeof value === 'object')
    return Object.entries(value as Record<string, unknown>).flatMap(([k, v]) => nullPaths(v, `${path}.${k}`));
  return [];
}

/**
 * Nulls written on purpose (found by listing the nulls of every command's JSON on plausible runs):
 * the frequency of T = 0 (f = ∞), first in a frequency list; the other corner of a one-sided filter;
 * an equipment's omega0 left unset; a floor spectrum without broadening; a damping comparison's
 * ratios where they have no value (src/formats/damping.ts: a ratio to a zero reference, the
 * geometric mean without a period above 0, a published formula at 0% damping). Anything else null is a
 * NaN or an Infinity that JSON.stringify hid.
 */
const INTENDED_NULL =
  /\.frequencies_hz\[0\]$|\.parameters\.(?:high|low)_corner_hz$|\.omega0$|^\$\.broadening$|^\$\.spectra\[\d+\]\.(?:geometric_mean_ratio|ratio_to_reference\[\d+\]|published\..*)$/;

export function jsonProblem(text: string): string | undefined {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return `not JSON: ${(error as Error).message}`;
  }
  const odd = nullPaths(json).filter((path) => !INTENDED_NULL.test(path));
  return odd.length > 0 ? `null (a hidden NaN or Infinity?) at ${odd.slice(0, 3).join(', ')}` : undefined;
}

export function svgProblem(text: string): string | undefined {
  try {
    const doc = new JSDOM(text, { contentType: 'image/svg+xml' }).window.document;
    if (doc.getElementsByTagName('parsererror').length > 0) return 'SVG is not well-formed XML';
  } catch (error) {
    return `SVG is not well-formed XML: ${(error as Error).message}`;
  }
  return undefined;
}

/** The first problem with a written file, by its extension (the text checks apply to every kind). */
export function fileProblem(name: string, text: string): string | undefined {
  if (FILE_CONTROL.test(text)) return `${name}: holds a control character XML forbids`;
  // biome-ignore lint/suspicious/noControlCharactersInRegex: an escape sequence in a file is the point
  if (/\u001b/.test(text)) return `${name}: holds an escape character`;
  const kind = name.split('.').at(-1);
  const problem =
    kind === 'json'
      ? jsonProblem(text)
      : kind === 'csv'
        ? csvProblem(text)
        : kind === 'svg'
          ? svgProblem(text)
          : undefined;
  return problem === undefined ? undefined : `${name}: ${problem}`;
}

/** Every file under `folder` checked (names relative to it); the first problem, if any. */
export function folderProblem(folder: string): string | undefined {
  const files = filesUnder(folder);
  const temporary = temporaryAmong(files);
  if (temporary !== undefined) return `temporary left: ${temporary}`;
  for (const file of files) {
    const problem = fileProblem(file, readFileSync(join(folder, file), 'utf8'));
    if (problem !== undefined) return problem;
  }
  return undefined;
}

/**
 * node --max-old-space-size=`heapMb` bin/quakesweep.js argv in `cwd`, killed after `timeoutMs`:
 * a hang shows as code -1, a death by signal (an OOM abort included) as code -2.
 */
export function runBoundedChild(argv: string[], cwd: string, timeoutMs: number, heapMb = 512): CliResult {
  const start = performance.now();
  const result = spawnSync(process.execPath, [`--max-old-space-size=${heapMb}`, BIN, ...argv], {
    cwd,
    encoding: 'utf8',
    timeout: timeoutMs,
    maxBuffer: 64 * 1024 * 1024,
  });
  const timedOut = result.error !== undefined && /ETIMEDOUT/.test(String(result.error));
  return {
    code: timedOut ? -1 : (result.status ?? -2),
    stdout: result.stdout ?? '',
    stderr: result.stderr ?? '',
    ms: performance.now() - start,
  };
}

/** What a V8 heap exhaustion or abort prints. */
export const V8_ABORT = /heap out of memory|FATAL ERROR|Aborted|core dumped|Allocation failed/;
