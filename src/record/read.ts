import { inputError, usageError } from '../errors.js';
import { ACCELERATION_UNITS, type AccelerationUnit } from '../units.js';
import { createRecord, type GroundRecord } from './record.js';

/** How the values are laid out in the file. `auto` tells single-column from time–value files. */
export type RecordLayout = 'auto' | 'single' | 'table' | 'wrapped';

export interface ReadOptions {
  /** The unit of the acceleration values; required, never guessed. */
  units: AccelerationUnit;
  /** Time step, s, for files without a time column (single and wrapped layouts). */
  dtS?: number;
  /** 1-based column holding the acceleration (default: the last column of a table). */
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
  const parser = new RecordParser(options);
  parser.push(text);
  return parser.finish();
}

/** Read a record from a stream of text or bytes (a file, standard input), chunk by chunk. */
export async function readRecordStream(
  input: AsyncIterable<string | Uint8Array>,
  options: ReadOptions,
): Promise<GroundRecord> {
  const parser = new RecordParser(options);
  const decoder = new TextDecoder('utf-8');
  for await (const chunk of input)
    parser.push(typeof chunk === 'string' ? chunk : decoder.decode(chunk, { stream: true }));
  parser.push(decoder.decode());
  return parser.finish();
}

const SEPARATOR = /[\s,;]+/;

/** Incremental line parser: holds the values read so far in a growing Float64Array. */
class RecordParser {
  private readonly options: ReadOptions;
  private pending = '';
  private lineNumber = 0;
  private firstChunk = true;
  private values: Float64Array = new Float64Array(4096);
  private count = 0;
  private times: Float64Array | undefined;
  private columns = 0;
  private firstDataLine = 0;

  constructor(options: ReadOptions) {
    this.options = options;
    const layout = options.layout ?? 'auto';
    if ((layout === 'single' || layout === 'wrapped') && options.dtS === undefined) {
      throw usageError(`the ${layout} layout has no time column: give the time step with --dt`);
    }
    if (options.dtS !== undefined && !(options.dtS > 0 && Number.isFinite(options.dtS))) {
      throw usageError(`--dt must be a positive number of seconds, got ${options.dtS}`);
    }
  }

  push(text: string): void {
    if (this.firstChunk && text.length > 0) {
      this.firstChunk = false;
      if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
    }
    const lines = (this.pending + text).split('\n');
    this.pending = lines.pop() ?? '';
    for (const line of lines) this.line(line);
  }

  finish(): GroundRecord {
    if (this.pending.length > 0) this.line(this.pending);
    this.pending = '';
    const o = this.options;
    if (this.count === 0) throw inputError('no acceleration values found', { file: o.source });
    const accel = this.values.slice(0, this.count);
    const factor = ACCELERATION_UNITS[o.units];
    for (let i = 0; i < accel.length; i++) accel[i] *= factor;
    let dtS = o.dtS;
    if (this.times !== undefined) {
      dtS = this.uniformStep();
      if (o.dtS !== undefined && Math.abs(o.dtS - dtS) > 1e-6 * dtS) {
        throw usageError(`--dt ${o.dtS} disagrees with the time column's step ${dtS} in ${o.source}`);
      }
    }
    if (dtS === undefined)
      throw usageError(`${o.source} has one value per line: give the time step with --dt`);
    if (accel.length < 2)
      throw inputError(`only ${accel.length} sample found; a record needs at least 2`, { file: o.source });
    return createRecord({
      name: o.name ?? baseName(o.source),
      source: o.source,
      dtS,
      accelMS2: accel,
      unitsRead: o.units,
    });
  }

  private line(raw: string): void {
    this.lineNumber++;
    if (this.lineNumber <= (this.options.skip ?? 0)) return;
    const line = raw.endsWith('\r') ? raw.slice(0, -1) : raw;
    const trimmed = line.trim();
    if (trimmed === '' || trimmed.startsWith('#')) return;
    const fields = trimmed.split(SEPARATOR).filter((field) => field !== '');
    const numbers = fields.map(parseNumber);
    const layout = this.options.layout ?? 'auto';
    if (numbers.some((value) => Number.isNaN(value))) {
      if (this.count === 0 && this.firstDataLine === 0 && layout !== 'wrapped') {
        this.firstDataLine = -1; // one header row allowed before the data
        return;
      }
      const bad = fields[numbers.findIndex((value) => Number.isNaN(value))];
      throw inputError(`'${bad}' is not a number`, { file: this.options.source, line: this.lineNumber });
    }
    if (layout === 'wrapped') {
      for (const value of numbers) this.add(value);
      return;
    }
    if (this.columns === 0) {
      this.columns = numbers.length;
      if (layout === 'single' && this.columns !== 1) {
        throw inputError(`expected one value per line, found ${this.columns}`, {
          file: this.options.source,
          line: this.lineNumber,
        });
      }
      if (this.columns > 1) this.times = new Float64Array(4096);
    } else if (numbers.length !== this.columns) {
      throw inputError(`expected ${this.columns} columns, found ${numbers.length}`, {
        file: this.options.source,
        line: this.lineNumber,
      });
    }
    if (this.columns === 1) {
      this.add(numbers[0]);
      return;
    }
    const column = this.options.column ?? this.columns;
    if (column < 1 || column > this.columns || column === 1) {
      throw usageError(`--column ${column}: the table has ${this.columns} columns and column 1 is time`);
    }
    this.addTimed(numbers[0], numbers[column - 1]);
  }

  private add(value: number): void {
    if (this.count === this.values.length) this.values = grow(this.values);
    this.values[this.count++] = value;
  }

  private timeLines: number[] = [];

  private addTimed(time: number, value: number): void {
    if (this.times === undefined) return;
    if (this.count === this.times.length) this.times = grow(this.times);
    this.times[this.count] = time;
    if (this.count < 2 || this.timeLines.length < 2) this.timeLines.push(this.lineNumber);
    this.add(value);
    this.checkStep(time);
  }

  private step = 0;

  private checkStep(time: number): void {
    const times = this.times!;
    const i = this.count - 1;
    if (i === 0) return;
    const delta = time - times[i - 1];
    if (i === 1) {
      if (!(delta > 0))
        throw inputError(`time does not increase (${times[0]} then ${time})`, {
          file: this.options.source,
          line: this.lineNumber,
        });
      this.step = delta;
      return;
    }
    const expected = times[0] + i * this.step;
    if (Math.abs(time - expected) > 1e-3 * this.step) {
      throw inputError(
        `the time step changes here: ${time} s where ${expected.toPrecision(8)} s was expected (step ${this.step} s)`,
        {
          file: this.options.source,
          line: this.lineNumber,
        },
      );
    }
  }

  private uniformStep(): number {
    const times = this.times!;
    if (this.count < 2) return Number.NaN;
    return (times[this.count - 1] - times[0]) / (this.count - 1);
  }
}

function grow(array: Float64Array): Float64Array {
  const bigger = new Float64Array(array.length * 2);
  bigger.set(array);
  return bigger;
}

/** A number, with Fortran exponents (1.5D-03) accepted; NaN for anything else. */
export function parseNumber(text: string): number {
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eEdD][+-]?\d+)?$/.test(text)) return Number.NaN;
  return Number(text.replace(/[dD]/, 'e'));
}

function baseName(source: string): string {
  if (source === '-') return 'stdin';
  const base = source.split(/[\\/]/).pop() ?? source;
  const dot = base.lastIndexOf('.');
  return dot > 0 ? base.slice(0, dot) : base;
}
