import { isAscii } from 'node:buffer';
import { createRequire } from 'node:module';
import { pipeline } from 'node:stream/promises';
import type { Options as CsvOptions } from 'csv-parse';
import { inputError, usageError } from '../base/errors.js';
import { ACCELERATION_UNITS, type AccelerationUnit, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { createRecord, type GroundRecord } from './record.js';
import { type RowLayout, type RowScan, RowScanner } from './rows.js';

/**
 * csv-parse, loaded on first use: a file of plain numeric lines never needs it (the line scanner
 * splits those), and loading it cost a tenth of a whole `spectrum` run. Its CommonJS build, the
 * one `require` can load synchronously from inside the scanner. Each of its CommonJS files has a
 * CsvError class of its own (see isCsvError).
 */
let csvParse: typeof import('csv-parse') | undefined;
let csvParseSync: typeof import('csv-parse/sync') | undefined;
const requireHere = createRequire(import.meta.url);
const csv = () => (csvParse ??= requireHere('csv-parse') as typeof import('csv-parse'));
const csvSync = () => (csvParseSync ??= requireHere('csv-parse/sync') as typeof import('csv-parse/sync'));
/** An error that csv-parse threw: only a loaded build can have, and each build has its own class. */
const isCsvError = (error: unknown): error is InstanceType<typeof import('csv-parse').CsvError> =>
  (csvParse !== undefined && error instanceof csvParse.CsvError) ||
  (csvParseSync !== undefined && error instanceof csvParseSync.CsvError);

/**
 * How the values are laid out in the file. `single`: one acceleration value a line. `table`: time
 * in column 1 and one or more value columns. `wrapped`: values several to a line, read in row
 * order. `auto` tells single from table by the number of columns of the first data row.
 */
export type RecordLayout = 'auto' | 'single' | 'table' | 'wrapped';

export interface ReadOptions {
  /** The unit of the acceleration values; required, never guessed. */
  units: AccelerationUnit;
  /** Time step, s, for files without a time column (single and wrapped layouts). */
  dtS?: number;
  /** 1-based column holding the acceleration in a table (column 1 is time; default: the last). */
  column?: number;
  /** Lines to skip before the data (headers of fixed length). */
  skip?: number;
  layout?: RecordLayout;
  /** Name for people; default: the source's base name without extension. */
  name?: string;
  /** The path as the user gave it, `-` for standard input; used in every error message. */
  source: string;
}

/** Read a record from text already in memory (tests and the library API). */
export function readRecordText(text: string, options: ReadOptions): GroundRecord {
  const reader = new RecordReader(options);
  const scanner = new LineScanner(sniffSeparator(text, options.skip ?? 0), reader);
  scanner.push(wellFormed(text));
  scanner.end();
  return reader.finish();
}

/** How much of a stream is looked at to choose the separator: this much, and this many lines after --skip. */
const SNIFF_BYTES = 64 * 1024;
const SNIFF_LINES = 100;

/**
 * Read a record from a stream of text or bytes (a file, standard input). The first 64 KiB, and
 * at least 100 lines past --skip, choose the separator (lone `\r` line ends count as lines, and
 * the look stops early at a line too long to be read, so it never holds the whole of a file).
 * Then a line scanner takes the decoded text chunk by chunk. Once the first data row has set the
 * layout, runs of numeric rows go to the WebAssembly row scanner (rows.ts, the twin of
 * RecordReader.numericRow); other plain lines (digits, letters, signs, points, separators,
 * spaces and tabs, a few brackets) are split by the scanner itself, exactly as csv-parse would,
 * and every other line (`#`, quotes, control characters, any other character) goes to csv-parse,
 * which stays the authority on them. The samples go into a growing Float64Array, so memory holds
 * the samples, one chunk of text and at most one unfinished line, never a list of lines.
 *
 * Why: csv-parse's stream interface took 200–330 ms to read a 40,000-line two-column file, most
 * of the whole `spectrum` job; the scanner took 23–39 ms, and with the row scanner 8 ms once the
 * code is warm and about 30 ms in a fresh process (bench/read.js, medians on a 2-core machine
 * shared with other work). A line is refused when it is longer than MAX_LINE_CHARACTERS as it
 * stands; csv-parse counted only what it kept of a line (no separators, leading spaces or comment).
 *
 * A file that begins with the UTF-16LE byte-order mark (bytes FF FE) is read as before, all
 * through csv-parse's stream interface, which recognizes that mark and decodes UTF-16LE.
 */
export async function readRecordStream(
  input: AsyncIterable<string | Uint8Array>,
  options: ReadOptions,
): Promise<GroundRecord> {
  const reader = new RecordReader(options);
  const chunks = input[Symbol.asyncIterator]();
  const head: (string | Buffer)[] = [];
  const sniffDecoder = new StreamText(new TextDecoder('utf-8'));
  let headText = '';
  let ended = false;
  const skip = options.skip ?? 0;
  let headLines = 0;
  let unfinished = 0; // characters of the head's last line so far
  while (
    (headText.length < SNIFF_BYTES || headLines < skip + SNIFF_LINES) &&
    unfinished <= MAX_LINE_CHARACTERS
  ) {
    const next = await chunks.next();
    if (next.done) {
      ended = true;
      break;
    }
    const chunk = typeof next.value === 'string' ? next.value : toBuffer(next.value);
    head.push(chunk);
    const text = typeof chunk === 'string' ? chunk : sniffDecoder.decode(chunk, { stream: true });
    headText += text;
    headLines += lineBreaks(text, skip + SNIFF_LINES - headLines);
    const last = Math.max(text.lastIndexOf('\n'), text.lastIndexOf('\r'));
    unfinished = last === -1 ? unfinished + text.length : text.length - 1 - last;
  }
  const separator = sniffSeparator(headText, skip, !ended);
  if (startsWithUtf16Mark(head)) {
    await throughCsvParse(head, chunks, ended, separator, reader);
    return reader.finish();
  }
  const scanner = new LineScanner(separator, reader);
  const decoder = new StreamText(new TextDecoder('utf-8', { ignoreBOM: true })); // the scanner removes the mark as csv-parse does
  const decode = (bytes: Uint8Array) => decoder.decode(bytes, { stream: true });
  const feed = (chunk: string | Uint8Array) => {
    if (typeof chunk === 'string') {
      scanner.push(decoder.decode()); // bytes of a character cut short before a string are a bad character
      scanner.push(wellFormed(chunk));
    } else {
      scanner.pushBytes(chunk, decode);
    }
  };
  try {
    for (const chunk of head.splice(0)) feed(chunk);
    while (!ended) {
      const next = await chunks.next();
      if (next.done) ended = true;
      else feed(next.value);
    }
    scanner.push(decoder.decode());
    scanner.end();
  } finally {
    if (!ended) await chunks.return?.(); // close the file when reading stops early
  }
  return reader.finish();
}

/**
 * The reader before the line scanner, kept as it was: every line through csv-parse's stream
 * interface. Not part of the library API; the tests compare the scanner with it.
 */
export async function readRecordStreamCsvOnly(
  input: AsyncIterable<string | Uint8Array>,
  options: ReadOptions,
): Promise<GroundRecord> {
  const reader = new RecordReader(options);
  const chunks = input[Symbol.asyncIterator]();
  const head: (string | Buffer)[] = [];
  const decoder = new TextDecoder('utf-8');
  let headText = '';
  let ended = false;
  const skip = options.skip ?? 0;
  let headLines = 0;
  while (headText.length < SNIFF_BYTES || headLines < skip + SNIFF_LINES) {
    const next = await chunks.next();
    if (next.done) {
      ended = true;
      break;
    }
    const chunk = typeof next.value === 'string' ? next.value : toBuffer(next.value);
    head.push(chunk);
    const text = typeof chunk === 'string' ? chunk : decoder.decode(chunk, { stream: true });
    headText += text;
    for (let at = text.indexOf('\n'); at !== -1; at = text.indexOf('\n', at + 1)) headLines++;
  }
  await throughCsvParse(head, chunks, ended, sniffSeparator(headText, skip, !ended, false), reader);
  return reader.finish();
}

/** The head already read, then the rest of the stream, through csv-parse's stream interface into the reader. */
async function throughCsvParse(
  head: (string | Buffer)[],
  chunks: AsyncIterator<string | Uint8Array>,
  ended: boolean,
  separator: Separator,
  reader: RecordReader,
): Promise<void> {
  async function* all(): AsyncGenerator<string | Buffer> {
    try {
      yield* head;
      if (ended) return;
      for (;;) {
        const next = await chunks.next();
        if (next.done) return;
        yield typeof next.value === 'string' ? next.value : toBuffer(next.value);
      }
    } finally {
      if (!ended) await chunks.return?.(); // close the file when reading stops early
    }
  }
  try {
    await pipeline(
      all,
      csv().parse(streamCsvOptions(separator, reader)),
      async (rows: AsyncIterable<unknown>) => {
        for await (const _ of rows); // every row is taken in on_record; nothing comes out
      },
    );
  } catch (error) {
    throw asInputError(error, reader.options.source);
  }
}

/** Whether the stream begins with the bytes FF FE (and a third), where csv-parse switches to UTF-16LE. */
function startsWithUtf16Mark(head: (string | Buffer)[]): boolean {
  const first: number[] = [];
  for (const chunk of head) {
    for (const byte of typeof chunk === 'string' ? Buffer.from(chunk.slice(0, 3)) : chunk.subarray(0, 3)) {
      first.push(byte);
      if (first.length === 3) return first[0] === 0xff && first[1] === 0xfe;
    }
  }
  return false;
}

/**
 * Line breaks in a piece of text, counted up to `atMost` (the head needs only so many): each `\n`,
 * and each `\r` not followed by `\n` in the piece. Counting all of a 256 KiB chunk's lines cost a
 * fresh process 1.5 ms and a compilation.
 */
function lineBreaks(text: string, atMost: number): number {
  let count = 0;
  for (let at = text.indexOf('\n'); at !== -1 && count < atMost; at = text.indexOf('\n', at + 1)) count++;
  for (let at = text.indexOf('\r'); at !== -1 && count < atMost; at = text.indexOf('\r', at + 1))
    if (text.charCodeAt(at + 1) !== 10) count++;
  return count;
}

/**
 * Text as csv-parse saw it: csv-parse turned a string into UTF-8 bytes, which write a lone
 * surrogate as U+FFFD, the replacement character.
 */
function wellFormed(text: string): string {
  const s = text as unknown as { isWellFormed(): boolean; toWellFormed(): string };
  return s.isWellFormed() ? text : s.toWellFormed();
}

/**
 * Warnings (not errors) when the peak read looks like the wrong unit: a PGA above 5 g or below
 * 0.0001 g (common practice: recorded PGAs lie well inside this range). Returned as data; the CLI
 * prints them.
 */
export function unitWarnings(record: GroundRecord): string[] {
  const pgaMS2 = record.pgaMS2;
  const pgaG = pgaMS2 / STANDARD_GRAVITY_MS2;
  // The bounds are compared with a part in 10¹² to spare, so a PGA of exactly 5 g or 0.0001 g
  // that went through the unit factor is not warned about.
  if (pgaG <= 5 * (1 + 1e-12) && pgaG >= 1e-4 * (1 - 1e-12)) return [];
  const readFactor = ACCELERATION_UNITS[record.unitsRead];
  const alternatives: string[] = [];
  for (const [unit, factor] of Object.entries(ACCELERATION_UNITS)) {
    if (unit === 'gal' || factor === readFactor) continue;
    const altG = (pgaMS2 / readFactor) * (factor / STANDARD_GRAVITY_MS2);
    if (altG >= 0.01 && altG <= 2) alternatives.push(`in ${unit} it would be ${altG.toPrecision(3)} g`);
  }
  const bound = pgaG > 5 ? 'above 5 g' : 'below 0.0001 g';
  const hint = alternatives.length > 0 ? `; ${alternatives.join(', ')}` : '';
  return [
    `PGA ${pgaG.toPrecision(3)} g read in ${record.unitsRead} is ${bound}: are the units right?${hint}`,
  ];
}

/** A number, with Fortran exponents (1.5D-03) accepted; NaN for anything else, NaN and ±Infinity included. */
export function parseNumber(text: string): number {
  const short = shortDecimal(text);
  if (!Number.isNaN(short)) return short;
  if (!NUMBER.test(text)) return Number.NaN;
  // Number() refuses a D exponent, and reads every other form NUMBER allows.
  let value = Number(text);
  if (Number.isNaN(value)) value = Number(text.replace(FORTRAN_EXPONENT, 'e'));
  return Number.isFinite(value) ? value : Number.NaN;
}

/** 10⁰ to 10²², every one exact in binary64 (5²² < 2⁵³). */
const POWERS_OF_TEN = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));

/**
 * A number in the commonest form (sign, digits with at most one point, an `e` or `E` exponent)
 * with at most 15 significant digits and a scale within 10^±22, read in one step; NaN for any
 * other text, which parseNumber reads the long way. The value is Number()'s exactly (closed
 * form): the digits make an integer below 2⁵³ and the power of ten is exact, so the one
 * multiplication or division rounds once, to the nearest double, as Number() rounds. Number()
 * and the regular expression took half the time of reading a file.
 */
function shortDecimal(text: string): number {
  return decimalIn(text, 0, text.length);
}

/** A space or a tab. */
const isBlank = (c: number) => c === 32 || c === 9;
/** The end of a field of a numeric row: a comma, a space or a tab. */
const isFieldEnd = (c: number) => c === 44 || c === 32 || c === 9;

/** shortDecimal of text[from, to) (NaN for an empty range), without cutting the text out. */
function decimalIn(text: string, from: number, to: number): number {
  if (from >= to) return Number.NaN;
  let i = from;
  let c = text.charCodeAt(from);
  const negative = c === 45;
  if (negative || c === 43) i++;
  let mantissa = 0;
  let digits = 0;
  let significant = 0;
  let decimals = 0;
  let point = false;
  for (; i < to; i++) {
    c = text.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      digits++;
      if (point) decimals++;
      if (significant > 0 || c !== 48) significant++;
      mantissa = mantissa * 10 + (c - 48);
    } else if (c === 46 && !point) {
      point = true;
    } else {
      break;
    }
  }
  if (digits === 0 || significant > 15) return Number.NaN;
  let exponent = 0;
  if (i < to) {
    if (c !== 101 && c !== 69) return Number.NaN; // not e or E (a D exponent goes the long way)
    if (++i === to) return Number.NaN;
    c = text.charCodeAt(i);
    const negativeExponent = c === 45;
    if (negativeExponent || c === 43) i++;
    if (i === to || to - i > 3) return Number.NaN; // no digits, or far outside 10^±22
    for (; i < to; i++) {
      c = text.charCodeAt(i);
      if (c < 48 || c > 57) return Number.NaN;
      exponent = exponent * 10 + (c - 48);
    }
    if (negativeExponent) exponent = -exponent;
  }
  const scale = exponent - decimals;
  if (scale < -22 || scale > 22) return Number.NaN;
  const magnitude = scale >= 0 ? mantissa * POWERS_OF_TEN[scale] : mantissa / POWERS_OF_TEN[-scale];
  return negative ? -magnitude : magnitude;
}

const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eEdD][+-]?\d+)?$/;
const FORTRAN_EXPONENT = /[dD]/;
/** A decimal comma, read only in files separated by semicolons, where it cannot split fields. */
const DECIMAL_COMMA = /^[+-]?(\d+,\d*|,\d+)([eEdD][+-]?\d+)?$/;
/** A letter of any script, which a header row of names has and a row of numbers has not. */
const LETTER = /\p{L}/u;
/** Control characters and the replacement character that stands for bytes that are not UTF-8. */
// biome-ignore lint/suspicious/noControlCharactersInRegex: finding control characters is the point
const BINARY = /[\u0000-\u0008\u000e-\u001f\ufffd]/;

/** `whitespace` is runs of spaces and tabs. */
type Separator = ',' | ';' | 'whitespace';

/**
 * Choose the separator from the first line that holds only numbers and separators (so a header
 * written in words cannot mislead it): a semicolon if it has one, else tabs and spaces if it
 * has a tab, else a comma, else runs of spaces. When `partial`, the text is cut mid-stream and its last line is not looked at.
 * The look stops before a line longer than MAX_LINE_CHARACTERS, which is refused where it stands
 * (a stream's head stops there too); `stopAtLongLine` false is the rule before the line scanner.
 */
function sniffSeparator(text: string, skip: number, partial = false, stopAtLongLine = true): Separator {
  let lines = text.split(/\r\n|\n|\r/, skip + 2000);
  const long = stopAtLongLine
    ? lines.findIndex(
        (l, i) => l.length - (i === 0 && l.charCodeAt(0) === 0xfeff ? 1 : 0) > MAX_LINE_CHARACTERS,
      )
    : -1;
  if (long !== -1) lines = lines.slice(0, long);
  else if (partial) lines.pop();
  let firstText: string | undefined;
  for (const raw of lines.slice(skip)) {
    const line = raw.replace(/^\ufeff/, '').trim();
    if (line === '' || line.startsWith('#')) continue;
    if (/^[0-9eEdD+\-.,;\s]+$/.test(line) && /\d/.test(line)) return separatorOf(line);
    firstText ??= line;
  }
  return firstText === undefined ? ',' : separatorOf(firstText);
}

function separatorOf(line: string): Separator {
  if (line.includes(';')) return ';';
  if (line.includes('\t')) return 'whitespace';
  if (line.includes(',')) return ',';
  return 'whitespace';
}

/** How csv-parse reads a file with this separator (no quotes: a `"` is part of a field). */
function csvOptions(separator: Separator): CsvOptions {
  return {
    delimiter: separator === 'whitespace' ? [' ', '\t'] : separator,
    trim: separator !== 'whitespace',
    bom: true,
    comment: '#',
    quote: false,
    skip_empty_lines: true,
    relax_column_count: true,
    record_delimiter: ['\r\n', '\n', '\r'],
    max_record_size: MAX_LINE_CHARACTERS,
  };
}

/** csv-parse's options for a whole stream, each record handed to the reader. */
function streamCsvOptions(separator: Separator, reader: RecordReader): CsvOptions {
  reader.separator = separator;
  return {
    ...csvOptions(separator),
    on_record: (fields: string[], info) => {
      // --skip counts lines of the file; csv-parse's from_line does not count comment lines, so a
      // `#` line among the skipped ones made it skip a line of data as well.
      if (info.lines <= (reader.options.skip ?? 0)) return null;
      reader.row(fields, info.lines);
      return null;
    },
  };
}

/**
 * The characters of a plain line, which csv-parse would split the same way as a plain `split`:
 * 1 for digits, letters, signs, points, commas, semicolons, the underscore, brackets, slashes and
 * the percent sign (what numbers and a header row of names are written with), 2 for space and
 * tab, 0 for anything else. No `#` (a comment), no quote, no character csv-parse trims other
 * than space and tab, no control character, nothing outside ASCII. A header row read here rather
 * than by csv-parse spares loading csv-parse at all for most files (a tenth of a whole run).
 */
const PLAIN_CHARACTERS = (() => {
  const kinds = new Uint8Array(128);
  const letters = 'abcdefghijklmnopqrstuvwxyz';
  for (const c of `0123456789${letters}${letters.toUpperCase()}+-.,;_()[]/%`) kinds[c.charCodeAt(0)] = 1;
  kinds[32] = 2;
  kinds[9] = 2;
  return kinds;
})();

/**
 * Splits decoded text into lines and hands their fields to the reader, line by line, numbered as
 * csv-parse numbers them (`info.lines`: 1-based, each `\r\n`, `\n` or lone `\r` one break).
 * Plain lines are split here; every other line goes to csv-parse alone, with the options it
 * has for a whole file, so that the fields are those csv-parse gives. Holds at most one
 * unfinished line, refused once it is longer than MAX_LINE_CHARACTERS.
 */
class LineScanner {
  private readonly reader: RecordReader;
  private readonly separator: Separator;
  private readonly skip: number;
  private readonly lineOptions: CsvOptions;
  /**
   * The unfinished line, in pieces, and their length. The array is emptied in place, never
   * replaced: a new empty array has another shape, which would throw push()'s optimized code away.
   */
  private readonly pieces: string[] = [];
  private pending = 0;
  /** Number of the line being read. */
  private line = 1;
  /** The last text ended with `\r`: a `\n` first in the next one is the second half of `\r\n`. */
  private afterCarriageReturn = false;
  private started = false;

  constructor(separator: Separator, reader: RecordReader) {
    this.reader = reader;
    this.separator = separator;
    this.skip = reader.options.skip ?? 0;
    reader.separator = separator;
    // The byte-order mark is removed here, at the start of the text only, as csv-parse's bom
    // option removes it at the start of the stream; a line handed to csv-parse alone must not
    // lose a second one.
    this.lineOptions = { ...csvOptions(separator), bom: false };
  }

  push(text: string): void {
    const length = text.length;
    if (length === 0) return;
    let from = 0;
    if (!this.started) {
      this.started = true;
      if (text.charCodeAt(0) === 0xfeff) from = 1;
    }
    if (this.afterCarriageReturn) {
      this.afterCarriageReturn = false;
      if (text.charCodeAt(from) === 10) from++;
    }
    let lf = text.indexOf('\n', from);
    let cr = text.indexOf('\r', from);
    let rows = true;
    while (lf !== -1 || cr !== -1) {
      if (rows && this.pending === 0 && this.reader.readsRows) {
        // Once the reader knows the layout, hand it the rest of the text: it reads the numeric
        // rows it can in WebAssembly (once a text; the lines after any it does not read come here).
        rows = false;
        const { next, lines } = this.reader.rowsFrom(text, from, this.line);
        if (lines > 0) {
          this.line += lines;
          from = next;
          lf = text.indexOf('\n', from);
          cr = text.indexOf('\r', from);
          continue;
        }
      }
      const start = from;
      let end: number;
      if (cr === -1 || (lf !== -1 && lf < cr)) {
        end = lf;
        from = lf + 1;
        lf = text.indexOf('\n', from);
      } else {
        end = cr;
        from = cr + 1;
        if (from === length) this.afterCarriageReturn = true;
        else if (text.charCodeAt(from) === 10) {
          from++;
          lf = text.indexOf('\n', from);
        }
        cr = text.indexOf('\r', from);
      }
      if (this.pending === 0) this.takeRange(text, start, end);
      else this.takeLine(this.unfinished(text.slice(start, end)));
    }
    if (from < length) {
      this.pieces.push(from === 0 ? text : text.slice(from));
      this.pending += length - from;
      if (this.pending > MAX_LINE_CHARACTERS) throw longLineError(this.reader.options.source, this.line);
    }
  }

  /**
   * A chunk of UTF-8 bytes, `decode` giving the text of bytes in the stream's order. The numeric
   * rows at a line start go straight from the bytes to the row scanner, which reads whole ASCII
   * lines only; everything else (a line cut between chunks, the lines from the first the scanner
   * does not read) is decoded and pushed as text. Copying the bytes of a 900 kB record into
   * strings and back took a fresh process about 3 ms.
   */
  pushBytes(bytes: Uint8Array, decode: (bytes: Uint8Array) => string): void {
    let from = 0;
    // Before the reader knows the layout (lines to skip, a header, the first data row): a line at
    // a time, for as many lines as the head that chose the separator, so that the rows after them
    // in the first chunk go to the scanner too.
    for (let lines = 0; !this.reader.readsRows && lines <= this.skip + SNIFF_LINES; lines++) {
      const lineFeed = bytes.indexOf(10, from);
      if (lineFeed === -1) break;
      this.push(decode(bytes.subarray(from, lineFeed + 1)));
      from = lineFeed + 1;
    }
    if (this.pending > 0 || this.afterCarriageReturn) {
      // The line cut between chunks (or the \n of a cut \r\n) ends at the next line feed: as text.
      const lineFeed = bytes.indexOf(10, from);
      if (lineFeed === -1) {
        this.push(decode(from === 0 ? bytes : bytes.subarray(from)));
        return;
      }
      this.push(decode(bytes.subarray(from, lineFeed + 1)));
      from = lineFeed + 1;
    }
    if (this.started && !this.afterCarriageReturn && this.pending === 0 && this.reader.readsRows) {
      const { next, lines } = this.reader.rowsFromBytes(bytes, from, this.line);
      this.line += lines;
      from = next;
    }
    if (from < bytes.length) this.push(decode(from === 0 ? bytes : bytes.subarray(from)));
  }

  /** The end of the text: its last line, if it has no line break after it. */
  end(): void {
    if (this.pending > 0) this.takeLine(this.unfinished(''));
  }

  private unfinished(last: string): string {
    this.pieces.push(last);
    const line = this.pieces.join('');
    this.pieces.length = 0;
    this.pending = 0;
    return line;
  }

  /** A whole line (one that was cut between texts): as takeRange reads it. */
  private takeLine(line: string): void {
    this.takeRange(line, 0, line.length);
  }

  /** The line text[start, end): a numeric row read where it stands, any other line by take(). */
  private takeRange(text: string, start: number, end: number): void {
    const number = this.line;
    if (end > start && number > this.skip && this.reader.numericRow(text, start, end, number)) {
      this.line++;
      return;
    }
    this.take(text.slice(start, end));
  }

  private take(line: string): void {
    const number = this.line++;
    if (line.length > MAX_LINE_CHARACTERS) throw longLineError(this.reader.options.source, number);
    if (line.length === 0) return; // csv-parse's skip_empty_lines
    const fields = this.plainFields(line);
    if (number <= this.skip) {
      // Lines to skip are still read by csv-parse, as before, so that its limit on a record's
      // size holds there too; a plain line is far inside it.
      if (fields === undefined) this.parsed(line, number);
      return;
    }
    if (fields !== undefined) {
      if (fields.length > 0) this.reader.row(fields, number, true);
      return;
    }
    const parsed = this.parsed(line, number);
    if (parsed !== undefined) this.reader.row(parsed, number);
  }

  /**
   * The fields of a plain line as csv-parse gives them: split at each separator (each space or
   * tab for the whitespace separator) and, for `,` and `;`, trimmed of spaces and tabs, none for
   * a line of only spaces and tabs, which csv-parse skips as empty. Undefined for a line that is
   * not plain. One pass over the characters; String.prototype.split and a regular expression
   * for the check took a third of the time of reading.
   */
  private plainFields(line: string): string[] | undefined {
    const fields: string[] = [];
    const whitespace = this.separator === 'whitespace';
    const separator = whitespace ? -1 : this.separator.charCodeAt(0);
    let from = 0;
    let spaces = false;
    for (let i = 0; i < line.length; i++) {
      const c = line.charCodeAt(i);
      const kind = c < 128 ? PLAIN_CHARACTERS[c] : 0;
      if (kind === 0) return undefined;
      if (c === separator || (kind === 2 && whitespace)) {
        fields.push(line.slice(from, i));
        from = i + 1;
      } else if (kind === 2) {
        spaces = true;
      }
    }
    fields.push(from === 0 ? line : line.slice(from));
    if (spaces) {
      // csv-parse's trim; in a plain line the only characters it trims are spaces and tabs.
      for (let i = 0; i < fields.length; i++) fields[i] = fields[i].trim();
      if (fields.length === 1 && fields[0] === '') return [];
    }
    return fields;
  }

  /** csv-parse's fields for one line that is not plain; undefined for a comment or a line it skips. */
  private parsed(line: string, number: number): string[] | undefined {
    try {
      return (csvSync().parse(line, this.lineOptions) as string[][])[0];
    } catch (error) {
      throw asInputError(error, this.reader.options.source, number);
    }
  }
}

const MAX_LINE_CHARACTERS = 1_000_000;

/**
 * Largest acceleration sample accepted, 10⁶ g (common practice: recorded PGAs stay below about
 * 5 g, and even a record in mm/s² read as g stays below 10⁵ g). Beyond it the value is not a
 * ground motion in any unit, and squares and sweeps of it could overflow to Infinity.
 */
const MAX_ABS_ACCELERATION_G = 1e6;
const MAX_ABS_ACCELERATION_MS2 = MAX_ABS_ACCELERATION_G * STANDARD_GRAVITY_MS2;

/** csv-parse's error as a one-line input error, at `line` if given, else at csv-parse's line. */
function asInputError(error: unknown, file: string, line?: number): unknown {
  if (!isCsvError(error)) return error;
  const at = line ?? (typeof error.lines === 'number' ? error.lines : undefined);
  if (error.code === 'CSV_MAX_RECORD_SIZE') return longLineError(file, at);
  return inputError(`cannot read this line (${error.message.split('\n')[0]})`, { file, line: at });
}

function longLineError(file: string, line: number | undefined) {
  return inputError(`a line longer than ${MAX_LINE_CHARACTERS} characters: is this a text record?`, {
    file,
    line,
  });
}

/**
 * The text of a stream of UTF-8 chunks. While every byte so far is ASCII, as in most records, a
 * chunk is copied as Latin-1, which gives the same characters: decoding UTF-8 took a fresh process
 * about 2.5 ms for a 900 kB file, the copy a tenth of that. From the first other byte on, the
 * TextDecoder decodes every chunk, as it did all of them before.
 */
class StreamText {
  private ascii = true;
  constructor(private readonly decoder: TextDecoder) {}

  decode(chunk?: Uint8Array, options?: { stream?: boolean }): string {
    if (chunk !== undefined && this.ascii && isAscii(chunk)) return toBuffer(chunk).toString('latin1');
    if (chunk !== undefined) this.ascii = false;
    return this.decoder.decode(chunk, options);
  }
}

function toBuffer(chunk: Uint8Array): Buffer {
  return Buffer.isBuffer(chunk) ? chunk : Buffer.from(chunk.buffer, chunk.byteOffset, chunk.byteLength);
}

/** Takes rows one at a time and keeps the samples, in m/s², in a Float64Array grown by doubling. */
class RecordReader {
  readonly options: ReadOptions;
  separator: Separator = ',';
  private readonly layout: RecordLayout;
  private values = new Float64Array(16384);
  private count = 0;
  private headerLine = 0;
  private firstDataLine = 0;
  private lastDataLine = 0;
  private columns = 0;
  private valueColumn = 0;
  /** In a semicolon file, whether decimals are written with `.` or `,` (a file may not mix them). */
  private decimalMark: '.' | ',' | undefined;
  private decimalMarkLine = 0;
  private timeFirstS = 0;
  private timePreviousS = 0;
  /** Whether numericRow may read rows: the first data row is read and the layout allows it. */
  private numericRows = false;
  private whitespace = false;
  /** m/s² per unit of the values. */
  private readonly unitMS2: number;

  constructor(options: ReadOptions) {
    this.options = options;
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

  /**
   * A data line text[start, end) after the first, in a file separated by commas or by spaces and
   * tabs, when it holds only short decimals (shortDecimal) in the file's number of columns and
   * its time advances by the file's step: read as row() reads it, without cutting it into
   * strings. Anything else (a comment, a word, a semicolon file, a wrong column count, a step
   * that is not plainly uniform, a value out of range) returns false and goes to row(), which
   * reads it or says what is wrong. Runs of such lines go to the WebAssembly row scanner
   * (rowsFrom), which reads exactly these; this reads the ones it leaves.
   */
  numericRow(text: string, start: number, end: number, line: number): boolean {
    if (!this.numericRows || end - start > MAX_LINE_CHARACTERS) return false;
    const whitespace = this.whitespace;
    let i = start;
    let column = 0;
    let timeS = 0;
    let value = 0;
    // Every read is inside [start, end): reading past the text's end would throw the engine's
    // optimized code away.
    for (;;) {
      while (i < end && isBlank(text.charCodeAt(i))) i++;
      if (i === end && (whitespace || column === 0)) break;
      const from = i;
      while (i < end && !isFieldEnd(text.charCodeAt(i))) i++;
      const number = decimalIn(text, from, i);
      if (Number.isNaN(number)) return false;
      column++;
      if (column === 1) timeS = number;
      if (column === this.valueColumn) value = number;
      while (i < end && isBlank(text.charCodeAt(i))) i++;
      if (i === end) break;
      if (!whitespace) {
        if (text.charCodeAt(i) !== 44) return false;
        i++;
      }
    }
    if (column !== this.columns) return false;
    if (Math.abs(value) * this.unitMS2 > MAX_ABS_ACCELERATION_MS2) return false;
    if (column > 1) {
      // time()'s checks where they pass at once: the time increases, by the mean step to 1e-6
      // (the first data row went through row(), so there is at least one sample before).
      const i = this.count;
      if (!(timeS > this.timePreviousS)) return false;
      if (i >= 2) {
        const meanStepS = (this.timePreviousS - this.timeFirstS) / (i - 1);
        if (!(Math.abs(timeS - this.timePreviousS - meanStepS) <= 1e-6 * meanStepS)) return false;
      }
      this.timePreviousS = timeS;
    }
    if (this.count === this.values.length) this.grow();
    this.values[this.count++] = value * this.unitMS2;
    this.lastDataLine = line;
    return true;
  }

  /** Whether numericRow (and rowsFrom) may read rows now. */
  get readsRows(): boolean {
    return this.numericRows;
  }

  /**
   * numericRow over the lines of `text` from `from` (the start of line `line`) on, for as many as
   * the WebAssembly row scanner reads (RowScanner, rows.ts): where it stopped and how many lines
   * it read; none where it is not available.
   */
  rowsFrom(text: string, from: number, line: number): { next: number; lines: number } {
    return this.scannedRows(from, line, (scanner, next, layout) => scanner.scan(text, next, layout));
  }

  /** rowsFrom over UTF-8 bytes from byte `from` on (the scanner reads ASCII only: a byte a character). */
  rowsFromBytes(bytes: Uint8Array, from: number, line: number): { next: number; lines: number } {
    return this.scannedRows(from, line, (scanner, next, layout) => scanner.scanBytes(bytes, next, layout));
  }

  /** The rows that `scan` reads from `from` on, one run after another, taken in. */
  private scannedRows(
    from: number,
    line: number,
    scan: (scanner: RowScanner, next: number, layout: RowLayout) => RowScan & { refused: boolean },
  ): { next: number; lines: number } {
    const scanner = this.numericRows ? RowScanner.get() : undefined;
    let next = from;
    let lines = 0;
    while (scanner !== undefined) {
      const run = scan(scanner, next, {
        columns: this.columns,
        valueColumn: this.valueColumn,
        whitespace: this.whitespace,
        unitMS2: this.unitMS2,
        limitMS2: MAX_ABS_ACCELERATION_MS2,
        count: this.count,
        timeFirstS: this.timeFirstS,
        timePreviousS: this.timePreviousS,
      });
      if (run.lines === 0) break;
      while (this.count + run.values.length > this.values.length) this.grow();
      this.values.set(run.values, this.count);
      this.count += run.values.length;
      this.timePreviousS = run.timePreviousS;
      if (run.lastRow >= 0) this.lastDataLine = line + lines + run.lastRow;
      lines += run.lines;
      next = run.next;
      if (run.refused) break;
    }
    return { next, lines };
  }

  /** One row's fields; `plain` when they come from a plain line, which has no control characters. */
  row(rawFields: string[], line: number, plain = false): void {
    const fields = this.separator === 'whitespace' ? rawFields.filter((f) => f !== '') : rawFields;
    if (fields.length === 0 || (fields.length === 1 && fields[0] === '')) return;
    if (fields[0].startsWith('#')) return;
    if (!plain)
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
    if (fields.length !== this.columns) {
      const found = fields.length === 1 ? '1 column' : `${fields.length} columns`;
      throw this.error(
        `expected ${this.columns} column${this.columns === 1 ? '' : 's'}, found ${found}`,
        line,
      );
    }
    for (let i = 0; i < fields.length; i++) {
      if (i === 0 || i === this.valueColumn - 1) continue;
      this.number(fields[i], line, i + 1); // columns not used must still be numbers
    }
    if (this.columns === 1) {
      this.add(this.number(fields[0], line, 1), line);
    } else {
      this.time(this.number(fields[0], line, 1), fields[0], line);
      this.add(this.number(fields[this.valueColumn - 1], line, this.valueColumn), line);
    }
    this.lastDataLine = line;
  }

  private firstRow(columns: number, line: number): void {
    const o = this.options;
    this.columns = columns;
    this.firstDataLine = line;
    // Semicolon files may write decimal commas, which number() tracks; numericRow does not.
    this.numericRows = this.layout !== 'wrapped' && this.separator !== ';';
    this.whitespace = this.separator === 'whitespace';
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
    if (i > 0 && !(timeS > this.timePreviousS)) {
      throw this.error(`time does not increase: ${text} s after ${this.timePreviousS} s`, line);
    }
    if (i >= 2) {
      // Times are printed to a few decimals: allow a step one last printed digit off the mean,
      // but never half a step, which is a real change whatever the rounding.
      const meanStepS = (this.timePreviousS - this.timeFirstS) / (i - 1);
      const stepS = timeS - this.timePreviousS;
      const offS = Math.abs(stepS - meanStepS);
      // Within the last term of the tolerance the step is uniform whatever the first two (both
      // are ≥ 0); most steps are, and the printed resolution need not be worked out for them.
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
    return !fields.every((f) => this.isNumber(f)) && fields.some((f) => LETTER.test(f));
  }

  private isNumber(text: string): boolean {
    return NUMBER.test(text) || (this.separator === ';' && DECIMAL_COMMA.test(text));
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
    if (this.count === this.values.length) this.grow();
    this.values[this.count++] = value * this.unitMS2;
  }

  private grow(): void {
    const bigger = new Float64Array(this.values.length * 2);
    bigger.set(this.values);
    this.values = bigger;
  }

  private error(message: string, line: number) {
    return inputError(message, { file: this.options.source, line });
  }

  finish(): GroundRecord {
    const o = this.options;
    if (this.count === 0) {
      if (this.headerLine > 0) throw this.error('a header row but no values after it', this.headerLine);
      const skipped = (o.skip ?? 0) > 0 ? ` after skipping ${o.skip} lines` : '';
      throw inputError(
        `no values found${skipped}: the file is empty or holds only comments and blank lines`,
        {
          file: o.source,
        },
      );
    }
    if (this.count < 2)
      throw this.error('only 1 sample; a record needs at least 2', this.lastDataLine || this.firstDataLine);
    let dtS = o.dtS;
    if (this.columns > 1) {
      const columnDtS = (this.timePreviousS - this.timeFirstS) / (this.count - 1);
      if (dtS !== undefined && Math.abs(dtS - columnDtS) > 1e-4 * columnDtS)
        throw inputError(`--dt ${dtS} disagrees with the time column's step, ${formatS(columnDtS)} s`, {
          file: o.source,
        });
      dtS = columnDtS;
    }
    // The samples are in m/s² already: every row stored its value times the unit's factor.
    const accelMS2 = this.values.slice(0, this.count);
    return createRecord({
      name: o.name ?? baseName(o.source),
      source: o.source,
      dtS: dtS as number,
      accelMS2,
      unitsRead: o.units,
    });
  }
}

/** The place value of the last printed digit: 0.001 for `0.005`, 1e-5 for `1.5e-4`. */
function printedResolution(text: string): number {
  const match = /^[+-]?\d*(?:[.,](\d*))?(?:[eEdD]([+-]?\d+))?$/.exec(text);
  if (match === null) return 0;
  return 10 ** (Number(match[2] ?? 0) - (match[1]?.length ?? 0));
}

function formatS(valueS: number): string {
  return Number(valueS.toPrecision(6)).toString();
}

/** A field as shown in a message: quoted, cut short, with unprintable characters escaped. */
function quote(text: string): string {
  const short = text.length > 40 ? `${text.slice(0, 40)}…` : text;
  // Line and paragraph separators and the byte-order mark are escaped too, so the message stays one visible line.
  return `'${short.replace(/[^\x20-\x7e\u00a0-\u2027\u202a-\ufefe\uff00-\uffff]/g, (c) => {
    const code = c.charCodeAt(0);
    return code <= 0xff
      ? `\\x${code.toString(16).padStart(2, '0')}`
      : `\\u${code.toString(16).padStart(4, '0')}`;
  })}'`;
}

function baseName(source: string): string {
  if (source === '-') return 'stdin';
  const base = source.split(/[\\/]/).pop() ?? source;
  const dot = base.lastIndexOf('.');
  return dot > 0 ? base.slice(0, dot) : base;
}
