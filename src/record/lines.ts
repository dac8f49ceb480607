import { inputError } from '../base/errors.js';
import { cutValue, LINES_COMPARED, linesBefore } from './cut-line.js';
import { lineFields, longLineError, quote } from './fields.js';
import { fixedFields } from './fixed.js';
import { NUMBER } from './number.js';
import type { RecordReader } from './reader.js';
import { MAX_LINE_CHARACTERS, sniffFields } from './separator.js';

/** Offers of a text to the row scanner that may read nothing before it is offered no more of it. */
const MAX_MISSES = 16;

/**
 * Splits text into lines (at `\r\n`, `\n` or a lone `\r`, from 1): runs of numeric rows go to the
 * reader's row scanner, other lines to row(); it holds at most one unfinished line.
 */
export class LineSplitter {
  private readonly reader: RecordReader;
  private readonly skip: number;
  /** The text after the last line break so far. */
  private rest = '';
  private line = 1;
  /** The last text ended with `\r`: a `\n` first in the next one is the second half of `\r\n`. */
  private afterCarriageReturn = false;
  /** The last few complete lines before `rest`: the shapes its values are compared with at the end. */
  private before: string[] = [];

  /** `head`: the text's first piece, which chooses the reader's separator (`partial`: it is cut short). */
  constructor(reader: RecordReader, head: string, partial: boolean) {
    this.reader = reader;
    this.skip = reader.options.skip ?? 0;
    // One byte-order mark is removed, at the start of the text only; any other is a character.
    const text = head.charCodeAt(0) === 0xfeff ? head.slice(1) : head;
    const sniffed = sniffFields(text, this.skip, partial);
    reader.separator = sniffed.separator;
    reader.tabDecimalCommas = sniffed.tabDecimalCommas;
    this.push(text);
  }

  push(text: string): void {
    const length = text.length;
    if (length === 0) return;
    let from = 0;
    const startsLine = this.rest === '';
    if (this.afterCarriageReturn) {
      this.afterCarriageReturn = false;
      if (text.charCodeAt(from) === 10) from++;
    }
    let lf = text.indexOf('\n', from);
    let cr = text.indexOf('\r', from);
    // The scanner is offered the text at its first whole line and after each line it did not read.
    let misses = 0;
    let scanned = false;
    while (lf !== -1 || cr !== -1) {
      if (!scanned && misses < MAX_MISSES && this.rest === '' && this.reader.readsRows) {
        const { next, lines } = this.reader.rowsFrom(text, from);
        if (lines > 0) {
          misses = 0;
          scanned = true;
          this.line += lines;
          from = next;
          if (lf !== -1 && lf < from) lf = text.indexOf('\n', from);
          if (cr !== -1 && cr < from) cr = text.indexOf('\r', from);
          continue;
        }
        misses++;
      }
      scanned = false;
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
      this.take(this.rest + text.slice(start, end));
      this.rest = '';
    }
    this.reader.textDone();
    if (from > 0) {
      const lines = linesBefore(text, from, LINES_COMPARED, startsLine);
      this.before = lines.length < LINES_COMPARED ? [...this.before, ...lines].slice(-LINES_COMPARED) : lines;
    }
    if (from < length) {
      this.rest += from === 0 ? text : text.slice(from);
      if (this.rest.length > MAX_LINE_CHARACTERS) throw longLineError(this.reader.options.source, this.line);
    }
  }

  /** The end of the text: its last line, if it has no line break after it. */
  end(): void {
    if (this.rest === '') return;
    this.reader.endedWithoutBreak = true;
    const number = this.line;
    const data = !this.reader.inHeader;
    this.take(this.rest);
    const cut = data ? cutValue(this.before, this.rest) : undefined;
    if (cut !== undefined)
      throw inputError(
        `the file ends here with no line break, on ${quote(cut)}, printed shorter than the values above it: it looks cut short (still being written or copied?); read it once it is whole`,
        { file: this.reader.options.source, line: number },
      );
  }

  private take(line: string): void {
    const number = this.line++;
    const { source } = this.reader.options;
    if (line.length > MAX_LINE_CHARACTERS) throw longLineError(source, number);
    if (line.length === 0) return;
    const reader = this.reader;
    if (reader.inHeader) reader.headerText(line, number);
    // Lines to skip are split too, so that the limit on a line's size in bytes holds there.
    let fields = lineFields(line, reader.separator, source, number);
    const widths = reader.options.fixed;
    if (widths !== undefined && fields.length > 0) {
      // Header lines are split as written, not cut into widths; the data from its first row on.
      const cut = fixedFields(uncommented(line), widths);
      if (!reader.inHeader || cut.every((f) => NUMBER.test(f))) fields = cut;
    }
    if (number > this.skip && fields.length > 0) reader.row(fields, number);
  }
}

/** The text of a line before any `#`. */
function uncommented(line: string): string {
  const hash = line.indexOf('#');
  return hash === -1 ? line : line.slice(0, hash);
}
