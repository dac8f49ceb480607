import { ROWS_WASM_BASE64 } from './rows-binary.js';

/** Characters of text handed to the WebAssembly row scanner at a time. */
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
  samplePeak(samples: number, count: number, out: number): void;
}

/** The reader's layout and running time check, as numericRow in read.ts sees them. */
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

/** What one scan read: up to `next` in the text, `lines` lines, `rows` values in `values`. */
export interface RowScan {
  next: number;
  lines: number;
  /** Index among those lines of the last that held a row, −1 if none. */
  lastRow: number;
  values: Float64Array;
  timePreviousS: number;
}

/**
 * The WebAssembly twin of RecordReader.numericRow (assembly/rows.ts), for runs of many rows: a
 * fresh process reads them at full speed from the first line, where the TypeScript loop ran
 * unoptimized for the first tens of thousands. One instance per thread, made on first use;
 * undefined where the engine has no WebAssembly (the reader then reads every row itself).
 */
export class RowScanner {
  private static instance: RowScanner | null | undefined;
  private readonly exports: RowsExports;
  private readonly text: number;
  private readonly values: number;
  private readonly state: number;
  private readonly encoder = new TextEncoder();

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
   * createRecord's pass over the samples (assembly/rows.ts, samplePeak): the peak |sample| and
   * the index of the first sample that is not finite (−1 when all are). In pieces of CAPACITY
   * samples, through the memory the rows are read into.
   */
  samplePeak(samples: Float64Array): { peak: number; firstNotFinite: number } {
    let peak = 0;
    for (let from = 0; from < samples.length; from += CAPACITY) {
      const piece = samples.subarray(from, from + CAPACITY);
      const memory = this.exports.memory.buffer;
      new Float64Array(memory, this.values, piece.length).set(piece);
      this.exports.samplePeak(this.values, piece.length, this.state);
      const out = new Float64Array(memory, this.state, 2);
      if (out[0] > peak) peak = out[0];
      if (out[1] >= 0) return { peak, firstNotFinite: from + out[1] };
    }
    return { peak, firstNotFinite: -1 };
  }

  /**
   * Read rows of `source` from character `from` on, at most TEXT_BYTES characters of it, while
   * its lines are rows numericRow would read (ASCII only, so characters and bytes are the same
   * count). `refused` tells whether it stopped before a line it does not read (rather than at the
   * end of what it was given).
   */
  scan(source: string, from: number, layout: RowLayout): RowScan & { refused: boolean } {
    const piece = source.slice(from, from + TEXT_BYTES);
    const { written } = this.encoder.encodeInto(piece, this.textView());
    return this.run(from, written, layout);
  }

  /** scan() over UTF-8 bytes from byte `from` on: the scanner stops at the first byte outside ASCII. */
  scanBytes(bytes: Uint8Array, from: number, layout: RowLayout): RowScan & { refused: boolean } {
    const piece = bytes.subarray(from, from + TEXT_BYTES);
    this.textView().set(piece);
    return this.run(from, piece.length, layout);
  }

  private textView(): Uint8Array {
    return new Uint8Array(this.exports.memory.buffer, this.text, TEXT_BYTES);
  }

  /** Scan the `length` bytes laid out at the text's place, which began at `from` in the source. */
  private run(from: number, length: number, layout: RowLayout): RowScan & { refused: boolean } {
    const memory = this.exports.memory.buffer;
    const state = new Float64Array(memory, this.state, 8);
    state[0] = layout.count;
    state[1] = layout.timeFirstS;
    state[2] = layout.timePreviousS;
    this.exports.scanRows(
      this.text,
      length,
      layout.columns,
      layout.valueColumn,
      layout.whitespace ? 1 : 0,
      layout.unitMS2,
      layout.limitMS2,
      this.values,
      CAPACITY,
      this.state,
    );
    const rows = state[0] - layout.count;
    return {
      next: from + state[3],
      lines: state[4],
      lastRow: state[5],
      values: new Float64Array(memory, this.values, rows),
      timePreviousS: state[2],
      refused: state[6] === 1,
    };
  }
}
