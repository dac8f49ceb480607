import { isAscii } from 'node:buffer';
import type { AccelerationUnit } from '../base/units.js';
import { LineSplitter } from './lines.js';
import { RecordReader } from './reader.js';
import { readingWarnings } from './reading.js';
import type { GroundRecord } from './record.js';
import { RowScanner } from './rows.js';
import { LINE_BREAK, MAX_LINE_CHARACTERS } from './separator.js';

/**
 * `single`: one value a line. `table`: time in column 1, then value columns. `wrapped`: values
 * several to a line, in row order. `auto`: single or table by the columns of the first data row.
 */
export type RecordLayout = 'auto' | 'single' | 'table' | 'wrapped';

export interface ReadOptions {
  /**
   * The unit of the acceleration values; never guessed: when left out, the header must state it
   * (header.ts); when given and the header says otherwise, it is used and a warning says so.
   */
  units?: AccelerationUnit;
  /** Time step, s, for files without a time column (single and wrapped layouts); else the header's. */
  dtS?: number;
  /**
   * The table's acceleration column: 1-based (column 1 is time) or a name of the header row, in
   * any case. Default: column 2 when it is the only value column; with more, it must be given.
   */
  column?: number | string;
  /** Declared fixed-width fields, the widths in characters (the last repeats); see fixed.ts. */
  fixed?: number[];
  /**
   * The time column's unit. Left out, seconds, and a step of 1 s or more or a record longer than a
   * day is refused as plainly not seconds (plausibility.ts); given, it is taken as told.
   */
  timeUnit?: 's' | 'ms';
  /** Lines to skip before the data (headers of fixed length). */
  skip?: number;
  layout?: RecordLayout;
  /** Name for people; default: the source's base name without extension. */
  name?: string;
  /** The path as the user gave it, `-` for standard input; used in every error message. */
  source: string;
}

/** Read a record from text in memory. `scanner` (for the tests): null to read without the scanner. */
export function readRecordText(
  text: string,
  options: ReadOptions,
  scanner: RowScanner | null = RowScanner.get(),
): GroundRecord {
  const reader = new RecordReader(options, scanner);
  new LineSplitter(reader, wellFormed(text), false).end();
  return reader.finish();
}

/** How much of a stream is looked at to choose the separator: this much, and this many lines after --skip. */
const SNIFF_BYTES = 64 * 1024;
const SNIFF_LINES = 100;

/**
 * Read a record from a stream of text or bytes (UTF-8, or UTF-16LE after FF FE). The head chooses
 * the separator, stopping early at a line too long to read; then the text goes to the line splitter
 * chunk by chunk, so memory holds the samples, one chunk and at most one unfinished line.
 */
export async function readRecordStream(input: AsyncIterable<string | Uint8Array>, options: ReadOptions) {
  const reader = new RecordReader(options, RowScanner.get());
  const chunks = input[Symbol.asyncIterator]();
  const decoder = new StreamText();
  let headText = '';
  let ended = false;
  const skip = options.skip ?? 0;
  let headLines = 0;
  let unfinished = 0; // characters of the head's last line so far
  try {
    while (
      (headText.length < SNIFF_BYTES || headLines < skip + SNIFF_LINES) &&
      unfinished <= MAX_LINE_CHARACTERS
    ) {
      const next = await chunks.next();
      if (next.done) {
        ended = true;
        break;
      }
      const text = decoder.decode(next.value);
      headText += text;
      // A `\r` that ends a chunk counts as a line: the count only tells when to stop looking.
      headLines += text.split(LINE_BREAK, skip + SNIFF_LINES - headLines + 1).length - 1;
      const last = Math.max(text.lastIndexOf('\n'), text.lastIndexOf('\r'));
      unfinished = last === -1 ? unfinished + text.length : text.length - 1 - last;
    }
    if (ended) headText += decoder.flush();
    const lines = new LineSplitter(reader, headText, !ended);
    while (!ended) {
      const next = await chunks.next();
      if (next.done) ended = true;
      else lines.push(decoder.decode(next.value));
    }
    lines.push(decoder.flush());
    lines.end();
  } finally {
    if (!ended) await chunks.return?.(); // close the file when reading stops early
  }
  return reader.finish();
}

/** Chunks as text, the byte-order mark kept; bytes are read as Latin-1 (faster) while all are ASCII. */
class StreamText {
  private decoder: TextDecoder | undefined;
  private ascii = true;
  /** The stream's first bytes, until there are three to tell the encoding by. */
  private held: Uint8Array[] = [];

  decode(chunk: string | Uint8Array): string {
    if (typeof chunk === 'string') return this.flush() + wellFormed(chunk); // bytes cut short before a string are a bad character
    let bytes = Buffer.from(chunk.buffer, chunk.byteOffset, chunk.byteLength);
    if (this.decoder === undefined) {
      this.held.push(bytes);
      bytes = Buffer.concat(this.held);
      if (bytes.length < 3) return '';
      this.held = [];
      this.choose(bytes[0] === 0xff && bytes[1] === 0xfe);
    }
    if (this.ascii && isAscii(bytes)) return bytes.toString('latin1');
    this.ascii = false;
    return (this.decoder as TextDecoder).decode(bytes, { stream: true });
  }

  /** The text of the bytes held or cut short, at a string or at the end of the stream. */
  flush(): string {
    if (this.decoder === undefined) this.choose(false);
    const held = Buffer.concat(this.held);
    this.held = [];
    return (this.decoder as TextDecoder).decode(held);
  }

  private choose(utf16: boolean): void {
    this.decoder = new TextDecoder(utf16 ? 'utf-16le' : 'utf-8', { ignoreBOM: true });
    this.ascii = !utf16;
  }
}

/** A lone surrogate becomes U+FFFD, as when the string is written as UTF-8 and read back. */
function wellFormed(text: string): string {
  return (text as unknown as { toWellFormed(): string }).toWellFormed();
}

/**
 * The warnings found while reading the record: implausible PGA, PGV, PGD or duration for the unit
 * (plausibility.ts), a unit that contradicts the header, a file cut short. They are also entries of
 * the record's processing list (reading.ts), so every output carries them.
 */
export function unitWarnings(record: Pick<GroundRecord, 'processing'>): string[] {
  return readingWarnings(record);
}
