import { isAscii } from 'node:buffer';
import { ACCELERATION_UNITS, type AccelerationUnit, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { LineSplitter } from './lines.js';
import { RecordReader } from './reader.js';
import type { GroundRecord } from './record.js';
import { RowScanner } from './rows.js';
import { LINE_BREAK, MAX_LINE_CHARACTERS } from './separator.js';

/**
 * `single`: one value a line. `table`: time in column 1, then value columns. `wrapped`: values
 * several to a line, in row order. `auto`: single or table by the columns of the first data row.
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

/** Warnings when a PGA above 5 g or below 0.0001 g suggests the wrong unit (common practice). */
export function unitWarnings(record: GroundRecord): string[] {
  const pgaMS2 = record.pgaMS2;
  const pgaG = pgaMS2 / STANDARD_GRAVITY_MS2;
  // A part in 10¹² to spare, so exactly 5 g or 0.0001 g through the unit factor is not warned about.
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
