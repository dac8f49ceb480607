import { inputError, usageError } from '../base/errors.js';
import { ACCELERATION_UNITS, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { quote } from './fields.js';
import { DECIMAL_COMMA, NUMBER, parseNumber, printedResolution } from './number.js';
import type { ReadOptions, RecordLayout } from './read.js';
import { createRecord, type GroundRecord, recordName } from './record.js';
import type { RowScanner } from './rows.js';
import type { Separator } from './separator.js';

/**
 * Largest sample accepted, 10⁶ g (common practice: recorded PGAs stay below about 5 g, even mm/s²
 * read as g below 10⁵ g): beyond it no unit makes it a ground motion, and its squares could overflow.
 */
const MAX_ABS_ACCELERATION_G = 1e6;
const MAX_ABS_ACCELERATION_MS2 = MAX_ABS_ACCELERATION_G * STANDARD_GRAVITY_MS2;

/** A letter of any script, which a header row of names has and a row of numbers has not. */
const LETTER = /\p{L}/u;
/** Control characters and the replacement character that stands for bytes that are not UTF-8. */
// biome-ignore lint/suspicious/noControlCharactersInRegex: finding control characters is the point
const BINARY = /[\u0000-\u0008\u000e-\u001f\ufffd]/;

/** Takes a record's rows, one by one or in scanned runs, and keeps the samples, m/s², in a growing array. */
export class RecordReader {
  /** The file's separator, chosen from its first lines before any row is taken. */
  separator: Separator = ',';
  private readonly layout: RecordLayout;
  private values = new Float64Array(16384);
  private count = 0;
  private headerLine = 0;
  /** The line of the last row of values that row() read. */
  private lastDataLine = 0;
  private columns = 0;
  private valueColumn = 0;
  /** In a semicolon file, whether decimals are written with `.` or `,` (a file may not mix them). */
  private decimalMark: '.' | ',' | undefined;
  private decimalMarkLine = 0;
  private timeFirstS = 0;
  private timePreviousS = 0;
  /** Whether rowsFrom may read rows: the first data row is read and the layout allows it. */
  readsRows = false;
  /** m/s² per unit of the values. */
  private readonly unitMS2: number;

  /** `scanner`: the fast path for runs of numeric rows, none to read every row with row(). */
  constructor(
    readonly options: ReadOptions,
    private readonly scanner: RowScanner | null,
  ) {
    this.layout = options.layout ?? 'auto';
    this.unitMS2 = ACCELERATION_UNITS[options.units];
    if ((this.layout === 'single' || this.layout === 'wrapped') && options.dtS === undefined)
      throw usageError(`the ${this.layout} layout has no time column: give the time step with --dt`);
    if (options.dtS !== undefined && !(options.dtS > 0 && Number.isFinite(options.dtS)))
      throw usageError(`--dt must be a positive number of seconds, got ${options.dtS}`);
    if (this.layout === 'wrapped' && options.column !== undefined)
      throw usageError('--column does not apply to the wrapped layout (values are read in row order)');
    if (options.column !== undefined && !(Number.isInteger(options.column) && options.column >= 1))
      throw usageError(`--column must be a whole number ≥ 1, got ${options.column}`);
  }

  /** Rows from `from` (a line's start) read by the scanner, which takes exactly those row() would. */
  rowsFrom(text: string, from: number): { next: number; lines: number } {
    const scanner = this.scanner as RowScanner;
    let next = from;
    let lines = 0;
    while (next < text.length) {
      const run = scanner.scan(text, next, {
        columns: this.columns,
        valueColumn: this.valueColumn,
        whitespace: this.separator === 'whitespace',
        unitMS2: this.unitMS2,
        limitMS2: MAX_ABS_ACCELERATION_MS2,
        count: this.count,
        timeFirstS: this.timeFirstS,
        timePreviousS: this.timePreviousS,
      });
      this.reserve(run.values.length);
      this.values.set(run.values, this.count);
      this.count += run.values.length;
      this.timePreviousS = run.timePreviousS;
      lines += run.lines;
      next = run.next;
      // Past the end of the text laid out in its memory, it lays out more and reads on.
      if (run.refused || run.lines === 0) break;
    }
    return { next, lines };
  }

  /** The end of a text given to rowsFrom: the scanner lets go of it. */
  textDone(): void {
    this.scanner?.release();
  }

  row(rawFields: string[], line: number): void {
    const fields = this.separator === 'whitespace' ? rawFields.filter((f) => f !== '') : rawFields;
    if (fields.length === 0 || (fields.length === 1 && fields[0] === '')) return;
    for (const field of fields)
      if (BINARY.test(field)) throw this.error('binary data, not a text record', line);
    if (this.layout === 'wrapped') {
      for (let i = 0; i < fields.length; i++) this.add(this.number(fields[i], line, i + 1), line);
      this.lastDataLine = line;
      return;
    }
    if (this.columns === 0 && this.headerLine === 0 && this.isHeader(fields)) {
      this.headerLine = line; // one header row of names is allowed before the data
      return;
    }
    if (this.columns === 0) this.firstRow(fields.length, line);
    if (fields.length !== this.columns)
      throw this.error(`expected ${columnCount(this.columns)}, found ${columnCount(fields.length)}`, line);
    for (let i = 0; i < fields.length; i++) {
      if (i === 0 || i === this.valueColumn - 1) continue;
      this.number(fields[i], line, i + 1); // columns not used must still be numbers
    }
    if (this.columns > 1) this.time(this.number(fields[0], line, 1), fields[0], line);
    this.add(this.number(fields[this.valueColumn - 1], line, this.valueColumn), line);
    this.lastDataLine = line;
  }

  private firstRow(columns: number, line: number): void {
    const o = this.options;
    this.columns = columns;
    // Semicolon files may write decimal commas, which number() tracks and the scanner does not.
    this.readsRows = this.scanner !== null && this.layout !== 'wrapped' && this.separator !== ';';
    if (this.layout === 'single' && columns !== 1)
      throw this.error(`the single layout has one value a line, found ${columns} columns`, line);
    if (this.layout === 'table' && columns < 2)
      throw this.error('the table layout needs a time column and a value column, found 1 column', line);
    if (columns === 1) {
      if (o.column !== undefined && o.column !== 1)
        throw usageError(`--column ${o.column}: ${o.source} has one value a line`);
      if (o.dtS === undefined)
        throw usageError(`${o.source} has one value a line and no time column: give the time step with --dt`);
      this.valueColumn = 1;
      return;
    }
    const column = o.column ?? columns;
    if (column === 1 || column > columns)
      throw usageError(
        `--column ${column}: ${o.source} has ${columns} columns; column 1 is time, so choose 2 to ${columns}`,
      );
    this.valueColumn = column;
  }

  /** Check that the time column advances by one uniform step. */
  private time(timeS: number, text: string, line: number): void {
    const i = this.count;
    if (i > 0 && !(timeS > this.timePreviousS))
      throw this.error(`time does not increase: ${text} s after ${this.timePreviousS} s`, line);
    if (i >= 2) {
      // Allow a step one last printed digit off the mean, but never half a step.
      const meanStepS = (this.timePreviousS - this.timeFirstS) / (i - 1);
      const stepS = timeS - this.timePreviousS;
      const offS = Math.abs(stepS - meanStepS);
      // The first test spares working out the printed resolution for most steps.
      const uniform =
        offS <= 1e-6 * meanStepS ||
        offS <= Math.min(printedResolution(text) * 1.01, 0.5 * meanStepS) + 1e-6 * meanStepS;
      if (!uniform) {
        const hint =
          this.layout === 'auto' ? ' (if the values are wrapped several a line, use --layout wrapped)' : '';
        throw this.error(
          `the time step changes here: ${formatS(stepS)} s after ${formatS(meanStepS)} s; the step must be uniform${hint}`,
          line,
        );
      }
    }
    if (i === 0) this.timeFirstS = timeS;
    this.timePreviousS = timeS;
  }

  /** A row of names: not all numbers, and some letters (so `0\t0,5` is refused as data, not skipped). */
  private isHeader(fields: string[]): boolean {
    const number = (f: string) => NUMBER.test(f) || (this.separator === ';' && DECIMAL_COMMA.test(f));
    return !fields.every(number) && fields.some((f) => LETTER.test(f));
  }

  private number(text: string, line: number, column: number): number {
    let value = parseNumber(text);
    if (Number.isNaN(value) && this.separator === ';' && DECIMAL_COMMA.test(text)) {
      this.mark(',', line);
      value = parseNumber(text.replace(',', '.'));
    } else if (this.separator === ';' && text.includes('.')) {
      this.mark('.', line);
    }
    if (!Number.isNaN(value)) return value;
    if (text === '') throw this.error(`empty value in column ${column}`, line);
    const hint = /^[+-]?\d*,\d+$/.test(text)
      ? ' (decimal commas are read only in files separated by semicolons)'
      : '';
    throw this.error(`${quote(text)} is not a number${hint}`, line);
  }

  private mark(mark: '.' | ',', line: number): void {
    if (this.decimalMark === undefined) {
      this.decimalMark = mark;
      this.decimalMarkLine = line;
    } else if (this.decimalMark !== mark) {
      throw this.error(
        `a decimal '${mark}' here, but line ${this.decimalMarkLine} used '${this.decimalMark}'; a file must use one decimal mark`,
        line,
      );
    }
  }

  private add(value: number, line: number): void {
    if (Math.abs(value) * this.unitMS2 > MAX_ABS_ACCELERATION_MS2) {
      throw this.error(
        `${value} ${this.options.units} is above ${MAX_ABS_ACCELERATION_G.toExponential(0)} g, which no ground motion reaches in any unit`,
        line,
      );
    }
    this.reserve(1);
    this.values[this.count++] = value * this.unitMS2;
  }

  /** Room for `more` samples: the array doubled, or more if that is not enough. */
  private reserve(more: number): void {
    if (this.count + more <= this.values.length) return;
    const bigger = new Float64Array(Math.max(2 * this.values.length, this.count + more));
    bigger.set(this.values);
    this.values = bigger;
  }

  private error(message: string, line: number) {
    return inputError(message, { file: this.options.source, line });
  }

  /** The record read, named as the options say or after its source (`stdin` for `-`). */
  finish(): GroundRecord {
    const o = this.options;
    if (this.count === 0) {
      if (this.headerLine > 0) throw this.error('a header row but no values after it', this.headerLine);
      const skipped = (o.skip ?? 0) > 0 ? ` after skipping ${o.skip} lines` : '';
      const message = `no values found${skipped}: the file is empty or holds only comments and blank lines`;
      throw inputError(message, { file: o.source });
    }
    if (this.count < 2) throw this.error('only 1 sample; a record needs at least 2', this.lastDataLine);
    let dtS = o.dtS;
    if (this.columns > 1) {
      const columnDtS = (this.timePreviousS - this.timeFirstS) / (this.count - 1);
      if (dtS !== undefined && Math.abs(dtS - columnDtS) > 1e-4 * columnDtS)
        throw inputError(`--dt ${dtS} disagrees with the time column's step, ${formatS(columnDtS)} s`, {
          file: o.source,
        });
      dtS = columnDtS;
    }
    return createRecord({
      name: o.name ?? (o.source === '-' ? 'stdin' : recordName(o.source)),
      source: o.source,
      dtS: dtS as number,
      // A view when little of the array is spare (a copy would hold the samples twice at the peak).
      accelMS2:
        this.count > 0.75 * this.values.length
          ? this.values.subarray(0, this.count)
          : this.values.slice(0, this.count),
      unitsRead: o.units,
    });
  }
}

function columnCount(columns: number): string {
  return columns === 1 ? '1 column' : `${columns} columns`;
}

function formatS(valueS: number): string {
  return Number(valueS.toPrecision(6)).toString();
}
