import { ROWS_WASM_BASE64 } from './rows-binary.js';

/** Characters of text laid out in the WebAssembly row scanner's memory at a time. */
const TEXT_BYTES = 1 << 18;
/** Rows it may read at a time: a row takes at least two bytes (a digit and a line end). */
const CAPACITY = TEXT_BYTES / 2;

interface RowsExports {
  memory: WebAssembly.Memory;
  heapBase(): number;
  scanRows(
    text: number,
    length: number,
    columns: number,
    valueColumn: number,
    whitespace: number,
    unit: number,
    limit: number,
    values: number,
    capacity: number,
    state: number,
  ): void;
}

/** The reader's layout and running time check, as RecordReader.rowsFrom hands them over. */
export interface RowLayout {
  columns: number;
  valueColumn: number;
  whitespace: boolean;
  /** m/s² per unit of the values, and the largest |value|·unit accepted. */
  unitMS2: number;
  limitMS2: number;
  /** Samples read so far (at least one), the first time and the previous time, s. */
  count: number;
  timeFirstS: number;
  timePreviousS: number;
}

/** What one scan read: up to `next` in the text, `lines` lines, their values in `values`. */
export interface RowScan {
  next: number;
  lines: number;
  /** Index among those lines of the last that held a row, −1 if none. */
  lastRow: number;
  values: Float64Array;
  timePreviousS: number;
  /** Whether it stopped before a line it does not read (rather than at the end of the text laid out). */
  refused: boolean;
}

/**
 * The record reader's fast path for runs of numeric rows (assembly/rows.ts): a fresh process
 * reads them at full speed from the first line, where TypeScript runs unoptimized for the first
 * tens of thousands. One instance per thread, made on first use; undefined where the engine has
 * no WebAssembly (the reader then reads every row itself).
 */
export class RowScanner {
  private static instance: RowScanner | null | undefined;
  private readonly exports: RowsExports;
  private readonly text: number;
  private readonly values: number;
  private readonly state: number;
  /** The text laid out in memory: `laidFrom` to `laidFrom + laidLength` of `laid`, one byte a character. */
  private laid: string | undefined;
  private laidFrom = 0;
  private laidLength = 0;

  static get(): RowScanner | undefined {
    if (RowScanner.instance === undefined) {
      try {
        RowScanner.instance = new RowScanner();
      } catch {
        RowScanner.instance = null;
      }
    }
    return RowScanner.instance ?? undefined;
  }

  private constructor() {
    const module = new WebAssembly.Module(Buffer.from(ROWS_WASM_BASE64, 'base64'));
    const instance = new WebAssembly.Instance(module, {});
    this.exports = instance.exports as unknown as RowsExports;
    this.text = this.exports.heapBase();
    this.values = this.text + TEXT_BYTES;
    this.state = this.values + CAPACITY * 8;
    const memory = this.exports.memory;
    const pages = Math.ceil((this.state + 64) / 65536) - memory.buffer.byteLength / 65536;
    if (pages > 0) memory.grow(pages);
  }

  /**
   * Read the rows of `source` from character `from` on, while its lines are rows the scanner
   * reads. With `copy`, up to TEXT_BYTES characters from `from` are laid out in memory first;
   * without, only text already laid out is read, and undefined is returned when `from` is outside it.
   */
  scan(source: string, from: number, layout: RowLayout, copy: boolean): RowScan | undefined {
    if (copy) this.layOut(source, from);
    else if (source !== this.laid || from < this.laidFrom || from >= this.laidFrom + this.laidLength)
      return undefined;
    const offset = from - this.laidFrom;
    const memory = this.exports.memory.buffer;
    const state = new Float64Array(memory, this.state, 8);
    state[0] = layout.count;
    state[1] = layout.timeFirstS;
    state[2] = layout.timePreviousS;
    this.exports.scanRows(
      this.text + offset,
      this.laidLength - offset,
      layout.columns,
      layout.valueColumn,
      layout.whitespace ? 1 : 0,
      layout.unitMS2,
      layout.limitMS2,
      this.values,
      CAPACITY,
      this.state,
    );
    return {
      next: from + state[3],
      lines: state[4],
      lastRow: state[5],
      values: new Float64Array(memory, this.values, state[0] - layout.count),
      timePreviousS: state[2],
      refused: state[6] === 1,
    };
  }

  /** Let go of the text laid out, so that it is not kept alive after the reading. */
  release(): void {
    this.laid = undefined;
  }

  /**
   * Lay out source[from, from + TEXT_BYTES) one byte a character, so that offsets in memory are
   * offsets in the text: ASCII as itself, any other character as 0x80, which the scanner refuses.
   */
  private layOut(source: string, from: number): void {
    const piece = source.slice(from, from + TEXT_BYTES);
    const bytes = Buffer.from(this.exports.memory.buffer, this.text, TEXT_BYTES);
    bytes.write(piece, 0, 'latin1');
    for (const match of piece.matchAll(/[\u0080-\uffff]/g)) bytes[match.index] = 0x80;
    this.laid = source;
    this.laidFrom = from;
    this.laidLength = piece.length;
  }
}
