import { ROWS_WASM_BASE64 } from './rows-binary.js';

/** Characters of text laid out in the WebAssembly row scanner's memory at a time. */
const TEXT_BYTES = 1 << 18;
/** Rows it may read at a time: a row takes at least two bytes (a digit and a line end). */
const CAPACITY = TEXT_BYTES / 2;

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

/**
 * The reader's fast path for runs of numeric rows (assembly/rows.ts), at full speed from the first
 * line, where TypeScript runs unoptimized for tens of thousands. One per thread, made on first use;
 * null without WebAssembly.
 */
export class RowScanner {
  private static instance: RowScanner | null | undefined;
  private readonly memory: WebAssembly.Memory;
  private readonly scanRows: (...args: number[]) => void;
  private readonly text: number;
  private readonly values: number;
  private readonly state: number;
  /** The text laid out in memory: `laidFrom` to `laidFrom + laidLength` of `laid`, one byte a character. */
  private laid: string | undefined;
  private laidFrom = 0;
  private laidLength = 0;

  static get(): RowScanner | null {
    if (RowScanner.instance === undefined) {
      try {
        RowScanner.instance = new RowScanner();
      } catch {
        RowScanner.instance = null;
      }
    }
    return RowScanner.instance;
  }

  private constructor() {
    const module = new WebAssembly.Module(Buffer.from(ROWS_WASM_BASE64, 'base64'));
    const exports = new WebAssembly.Instance(module, {}).exports as {
      memory: WebAssembly.Memory;
      heapBase(): number;
      scanRows(...args: number[]): void;
    };
    this.memory = exports.memory;
    this.scanRows = exports.scanRows;
    this.text = exports.heapBase();
    this.values = this.text + TEXT_BYTES;
    this.state = this.values + CAPACITY * 8;
    const pages = Math.ceil((this.state + 64) / 65536) - this.memory.buffer.byteLength / 65536;
    if (pages > 0) this.memory.grow(pages);
  }

  /**
   * Read the rows of `source` from `from` up to `next`: `lines` lines, `values` a view of memory
   * valid until the next scan. The text is laid out from `from` only when `from` lies outside what
   * is laid out already. `refused`: it stopped before a line it does not read, not at the end.
   */
  scan(source: string, from: number, layout: RowLayout) {
    if (source !== this.laid || from < this.laidFrom || from >= this.laidFrom + this.laidLength)
      this.layOut(source, from);
    const offset = from - this.laidFrom;
    const state = new Float64Array(this.memory.buffer, this.state, 8);
    state[0] = layout.count;
    state[1] = layout.timeFirstS;
    state[2] = layout.timePreviousS;
    this.scanRows(
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
    const next = from + state[3];
    const refused = state[6] === 1;
    if (!refused) this.laidLength = next - this.laidFrom;
    return {
      next,
      lines: state[4],
      values: new Float64Array(this.memory.buffer, this.values, state[0] - layout.count),
      timePreviousS: state[2],
      refused,
    };
  }

  /** Let go of the text laid out, so that it is not kept alive after the reading. */
  release(): void {
    this.laid = undefined;
  }

  /** Lay out one byte a character, so memory offsets are text offsets; non-ASCII as 0x80, refused. */
  private layOut(source: string, from: number): void {
    const piece = source.slice(from, from + TEXT_BYTES);
    const bytes = Buffer.from(this.memory.buffer, this.text, TEXT_BYTES);
    bytes.write(piece, 0, 'latin1');
    for (const match of piece.matchAll(/[\u0080-\uffff]/g)) bytes[match.index] = 0x80;
    this.laid = source;
    this.laidFrom = from;
    this.laidLength = piece.length;
  }
}
