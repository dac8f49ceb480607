import { inputError, usageError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';
import { ACCELERATION_UNITS, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { quote } from './fields.js';
import { expandTouching, fieldWidth } from './fixed.js';
import type { HeaderKeys } from './header.js';
import { scanHeaderLine } from './header.js';
import {
  countHint,
  firstColumnIsTime,
  fixedHint,
  type HeldRow,
  type LayoutSeen,
  ROWS_TO_CHOOSE,
  wrappedHint,
} from './layout-choice.js';
import { DECIMAL_COMMA, NUMBER, parseNumber, printedResolution } from './number.js';
import type { ReadOptions, RecordLayout } from './read.js';
import { ReadingSources } from './reading-sources.js';
import type { GroundRecord } from './record.js';
import type { RowScanner } from './rows.js';
import type { Separator } from './separator.js';

/**
 * Largest sample accepted, 10⁶ g (common practice: recorded PGAs stay below about 5 g, even mm/s²
 * read as g below 10⁵ g): beyond it no unit makes it a ground motion, and its squares could overflow.
 */
const MAX_ABS_ACCELERATION_G = 1e6;
const MAX_ABS_ACCELERATION_MS2 = MAX_ABS_ACCELERATION_G * STANDARD_GRAVITY_MS2;

/** A letter of any script, which a header line has and a row of numbers has not. */
const LETTER = /\p{L}/u;
const DIGIT = /\d/;
const NUMBER_START = /^[+-]?\.?\d/;
/** Only what numbers are written with: a field of these is a malformed number, not a word. */
const NUMERIC_CHARACTERS = /^[\d.,eEdD+-]+$/;
/** Control characters and the replacement character that stands for bytes that are not UTF-8. */
// biome-ignore lint/suspicious/noControlCharactersInRegex: finding control characters is the point
const BINARY = /[\u0000-\u0008\u000e-\u001f\ufffd]/;
/** Lines of header read before the first row of values at most: past them it is no record. */
const MAX_HEADER_LINES = 1000;

/**
 * Takes a record's lines, one by one or in scanned runs of rows, and keeps the samples, m/s², in a
 * growing array. Lines before the first row of values are its header: skipped, and read for the
 * keys of header.ts; the last of them, as wide as the rows, names the columns.
 */
export class RecordReader {
  /** The file's separator, chosen from its first lines before any row is taken. */
  separator: Separator = ',';
  /** Decimal commas in a tab-separated file, told with the separator. */
  tabDecimalCommas = false;
  /** Whether the text ended without a line break after its last line (set by the line splitter). */
  endedWithoutBreak = false;
  private layout: RecordLayout;
  private values = new Float64Array(16384);
  private count = 0;
  /** The line of the last row of values that row() read. */
  private lastDataLine = 0;
  private columns = 0;
  private valueColumn = 0;
  /** In a file with decimal commas, whether decimals are written with `.` or `,` (a file may not mix them). */
  private decimalMark: '.' | ',' | undefined;
  private decimalMarkLine = 0;
  private timeFirstS = 0;
  private timePreviousS = 0;
  /** Whether rowsFrom may read rows: the first data row is read and the layout allows it. */
  readsRows = false;
  /** m/s² per unit of the values, known once the first row of values is read. */
  private unitMS2 = 1;
  private readonly keys: HeaderKeys = {};
  /** The last header line's fields and line (the names of the columns when as wide as the rows). */
  private names: { fields: string[]; line: number } | undefined;
  private headerLineCount = 0;
  /** Rows held while an `auto` file of several values a line is told to be a table or wrapped. */
  private held: HeldRow[] | undefined;
  private seen: LayoutSeen | undefined;
  private touchingLine = 0;
  /** The last line that stated a header key: a line of keys names no columns. */
  private keyLine = 0;
  readonly sources: ReadingSources;

  /** `scanner`: the fast path for runs of numeric rows, none to read every row with row(). */
  constructor(
    readonly options: ReadOptions,
    private readonly scanner: RowScanner | null,
  ) {
    this.layout = options.layout ?? 'auto';
    if (options.dtS !== undefined && !(options.dtS > 0 && Number.isFinite(options.dtS)))
      throw usageError(`--dt must be a positive number of seconds, got ${options.dtS}`);
    if (this.layout === 'wrapped' && options.column !== undefined)
      throw usageError('--column does not apply to the wrapped layout (values are read in row order)');
    const c = options.column;
    if (typeof c === 'number' && !(Number.isInteger(c) && c >= 1))
      throw usageError(`--column must be a whole number ≥ 1 or a column's name, got ${c}`);
    this.sources = new ReadingSources(options, this.keys);
  }

  /** Whether the first row of values is still to come: lines so far are header, read for its keys. */
  get inHeader(): boolean {
    return this.seen === undefined;
  }

  /** A line before the data, as written: read for the header's keys. */
  headerText(text: string, line: number): void {
    const before = Object.keys(this.keys).length;
    scanHeaderLine(text, line, this.keys);
    if (Object.keys(this.keys).length > before) this.keyLine = line;
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
    const whitespace = this.separator === 'whitespace';
    let fields = whitespace ? rawFields.filter((f) => f !== '') : rawFields;
    if (fields.length === 0 || (fields.length === 1 && fields[0] === '')) return;
    for (const field of fields)
      if (BINARY.test(field)) throw this.error('binary data, not a text record', line);
    if (whitespace && this.options.fixed === undefined) {
      const split = expandTouching(fields);
      if (split !== fields && this.touchingLine === 0) this.touchingLine = line;
      fields = split;
    }
    if (this.seen === undefined) {
      if (this.isHeader(fields, line)) {
        this.header(fields, line);
        return;
      }
      this.start(fields, line, whitespace ? rawFields.join(' ') : undefined);
    }
    if (this.held !== undefined) {
      this.held.push({ fields, line });
      if (this.held.length >= ROWS_TO_CHOOSE) this.choose();
      return;
    }
    this.dataRow(fields, line);
  }

  private header(fields: string[], line: number): void {
    if (++this.headerLineCount > MAX_HEADER_LINES)
      throw this.error(
        `no row of values in the first ${MAX_HEADER_LINES} lines of text: is this a record?`,
        line,
      );
    this.names = line === this.keyLine ? undefined : { fields, line };
  }

  /** The first row of values: the layout is chosen now, or after a few rows when it cannot be yet. */
  private start(fields: string[], line: number, text: string | undefined): void {
    const declared = this.options.fixed;
    const width = declared !== undefined ? declared[0] : text === undefined ? undefined : fieldWidth(text);
    this.seen = { firstLine: line, perLine: fields.length, width };
    const named = this.names !== undefined && this.names.fields.length === fields.length;
    // Without a time step known, several values a line can only be a table: no need to wait.
    const dtKnown = this.options.dtS !== undefined || this.keys.dtS !== undefined;
    if (this.layout === 'auto' && fields.length > 1 && !named && dtKnown) this.held = [];
    else this.begin(fields.length, line);
  }

  /** Table or wrapped, by the held rows (held only when a time step is known for wrapped values). */
  private choose(): void {
    const held = this.held as HeldRow[];
    this.held = undefined;
    // A header's point count tells, when the file holds no more rows than looked at; else the first column.
    const points = this.keys.points?.value;
    const values = held.reduce((n, row) => n + row.fields.length, 0);
    const table = points === held.length ? true : points === values ? false : firstColumnIsTime(held);
    this.layout = table ? 'table' : 'wrapped';
    this.begin(held[0].fields.length, held[0].line);
    for (const row of held) this.dataRow(row.fields, row.line);
  }

  private begin(columns: number, line: number): void {
    const o = this.options;
    this.columns = columns;
    if (this.layout === 'auto') this.layout = columns === 1 ? 'single' : 'table';
    if (this.layout === 'single' && columns !== 1)
      throw this.error(`the single layout has one value a line, found ${columns} columns`, line);
    if (this.layout === 'table' && columns < 2)
      throw this.error('the table layout needs a time column and a value column, found 1 column', line);
    if (this.layout !== 'table' && o.dtS === undefined && this.keys.dtS === undefined) {
      const what = this.layout === 'single' ? `${o.source} has one value a line` : 'the wrapped layout has';
      throw usageError(`${what} and no time column: give the time step with --dt (the header states none)`);
    }
    if (this.layout === 'single' && o.column !== undefined && o.column !== 1)
      throw usageError(`--column ${o.column}: ${o.source} has one value a line`);
    const wrapped =
      this.options.layout === 'auto' || this.options.layout === undefined ? this.seen : undefined;
    this.valueColumn = this.layout === 'table' ? this.sources.valueColumn(columns, this.names, wrapped) : 1;
    this.unitMS2 =
      ACCELERATION_UNITS[this.sources.units(this.layout === 'table' ? this.valueColumn : 0, this.names)];
    // Decimal commas and declared widths are read by row() alone; the scanner reads neither.
    this.readsRows =
      this.scanner !== null &&
      this.layout === 'table' &&
      this.separator !== ';' &&
      !this.tabDecimalCommas &&
      o.fixed === undefined;
  }

  private dataRow(fields: string[], line: number): void {
    if (this.layout === 'wrapped') {
      for (let i = 0; i < fields.length; i++) this.add(this.number(fields[i], line, i + 1), line);
      this.lastDataLine = line;
      return;
    }
    if (fields.length !== this.columns) {
      const seen = this.seen as LayoutSeen;
      const more = this.count <= 1 && fields.length > seen.perLine;
      const hint = more ? ` (${countHint(seen, fields.length)})` : '';
      throw this.error(
        `expected ${columnCount(this.columns)}, found ${columnCount(fields.length)}${hint}`,
        line,
      );
    }
    for (let i = 0; i < fields.length; i++) {
      if (i === 0 || i === this.valueColumn - 1) continue;
      this.number(fields[i], line, i + 1); // columns not used must still be numbers
    }
    if (this.columns > 1) this.time(this.number(fields[0], line, 1), fields[0], line);
    this.add(this.number(fields[this.valueColumn - 1], line, this.valueColumn), line);
    this.lastDataLine = line;
  }

  /** Check that the time column advances by one uniform step. */
  private time(timeS: number, text: string, line: number): void {
    const i = this.count;
    if (i > 0 && !(timeS > this.timePreviousS))
      throw this.error(
        `time does not increase: ${text} s after ${this.timePreviousS} s${this.wrappedHint()}`,
        line,
      );
    if (i >= 2) {
      // Allow a step one last printed digit off the mean, but never half a step.
      const meanStepS = (this.timePreviousS - this.timeFirstS) / (i - 1);
      const stepS = timeS - this.timePreviousS;
      const offS = Math.abs(stepS - meanStepS);
      // The first test spares working out the printed resolution for most steps.
      const uniform =
        offS <= 1e-6 * meanStepS ||
        offS <= Math.min(printedResolution(text) * 1.01, 0.5 * meanStepS) + 1e-6 * meanStepS;
      if (!uniform)
        throw this.error(
          `the time step changes here: ${formatS(stepS)} s after ${formatS(meanStepS)} s; the step must be uniform${this.wrappedHint()}`,
          line,
        );
    }
    if (i === 0) this.timeFirstS = timeS;
    this.timePreviousS = timeS;
  }

  /** Near the start of an `auto` file, the hint that its values may be wrapped several a line. */
  private wrappedHint(): string {
    if (this.options.layout !== undefined && this.options.layout !== 'auto') return '';
    if (this.count > ROWS_TO_CHOOSE) return '';
    return ` (${wrappedHint(this.seen as LayoutSeen)})`;
  }

  /**
   * A header line: not all numbers, and some letters or no digits at all (so `0\t0,5` is refused
   * as data, not skipped, while `-----` and `time,accel` are skipped).
   */
  private isHeader(fields: string[], line: number): boolean {
    if (fields.every((f) => this.isNumber(f))) return false;
    // A row of numbers with a letter slipped in (`0,0x10`, `0.1O`, `0,NaN`) is a bad row, not a header: refused.
    if (this.keyLine !== line && fields.every((f) => this.isNumber(f) || slippedNumber(f))) return false;
    // The E of `1.0E-022.0E-02` (values touching without a sign) is no word: that is a row, refused.
    const word = (f: string) => LETTER.test(f) && !NUMERIC_CHARACTERS.test(f);
    return fields.some(word) || !fields.some((f) => DIGIT.test(f));
  }

  private isNumber(text: string): boolean {
    return NUMBER.test(text) || (this.decimalCommas() && DECIMAL_COMMA.test(text));
  }

  /** Whether decimal commas may be read: where a comma cannot separate fields. */
  private decimalCommas(): boolean {
    return this.separator === ';' || this.tabDecimalCommas;
  }

  private number(text: string, line: number, column: number): number {
    let value = parseNumber(text);
    const commas = this.decimalCommas();
    if (Number.isNaN(value) && commas && DECIMAL_COMMA.test(text)) {
      this.mark(',', line);
      value = parseNumber(text.replace(',', '.'));
    } else if (commas && text.includes('.')) {
      this.mark('.', line);
    }
    if (!Number.isNaN(value)) return value;
    if (text === '') throw this.error(`empty value in column ${column}`, line);
    let hint = '';
    if (/^[+-]?\d*,\d+$/.test(text))
      hint = ' (decimal commas are read only in files separated by semicolons or tabs)';
    else if (/^[+-]?[\d.]+[eEdD][+-]?\d+[+-]?[\d.]/.test(text))
      hint = ` (${fixedHint(this.seen as LayoutSeen)})`;
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
        `${value} ${this.sources.unitsRead} is above ${MAX_ABS_ACCELERATION_G.toExponential(0)} g, which no ground motion reaches in any unit`,
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
    if (this.held !== undefined) this.choose();
    const o = this.options;
    if (this.count === 0) {
      if (this.names !== undefined && this.seen === undefined && this.headerLineCount === 1)
        throw this.error('a header row but no values after it', this.names.line);
      const skipped = (o.skip ?? 0) > 0 ? ` after skipping ${o.skip} lines` : '';
      const header = this.headerLineCount > 0 ? `, or only ${this.headerLineCount} lines of header text` : '';
      const message = `no values found${skipped}: the file is empty or holds only comments and blank lines${header}`;
      throw inputError(message, { file: o.source });
    }
    if (this.count < 2) throw this.error('only 1 sample; a record needs at least 2', this.lastDataLine);
    const samples =
      this.count > 0.75 * this.values.length
        ? this.values.subarray(0, this.count)
        : this.values.slice(0, this.count);
    return this.sources.record({
      accelMS2: samples,
      layout: this.layout as 'single' | 'table' | 'wrapped',
      columnStepS:
        this.columns > 1 && this.layout === 'table'
          ? (this.timePreviousS - this.timeFirstS) / (this.count - 1)
          : undefined,
      firstLine: (this.seen as LayoutSeen).firstLine,
      width: this.options.fixed === undefined && this.touchingLine > 0 ? this.seen?.width : undefined,
      touchingLine: this.touchingLine,
      endedWithoutBreak: this.endedWithoutBreak,
      valueColumn: this.valueColumn,
    });
  }
}

/**
 * A field that begins as a number and holds a letter (`0x10`, `0.1O`, `1.5e-3s`), or a spelling of
 * a value that is not finite (`NaN`, `Infinity`, `-inf`): among numbers, a bad value, not a name.
 */
function slippedNumber(field: string): boolean {
  return (NUMBER_START.test(field) && LETTER.test(field)) || /^[+-]?(?:nan|inf(?:inity)?)$/i.test(field);
}

function columnCount(columns: number): string {
  return columns === 1 ? '1 column' : `${columns} columns`;
}

function formatS(valueS: number): string {
  return formatNumber(valueS, 6);
}
