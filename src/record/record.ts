import { inputError } from '../base/errors.js';
import { printable } from '../base/printable.js';
import type { AccelerationUnit } from '../base/units.js';

/** One processing operation that was applied to a record, as stated in every output that used it. */
export interface ProcessingStep {
  /** Short machine name, e.g. `baseline`, `taper`, `filter`, `resample`, `scale`. */
  operation: string;
  /** One line for a reviewer, e.g. "high-pass Butterworth, order 4, 0.1 Hz, zero-phase". */
  description: string;
  /** The parameters, in SI units and plain numbers. */
  parameters: { [name: string]: number | string | boolean | null };
}

/** A ground-acceleration record (not `Record`, TypeScript's own type); always m/s² inside the program. */
export interface GroundRecord {
  /** A name for people: the file's base name unless given. */
  readonly name: string;
  /** Where it came from: the path as given, `-` for standard input, or a description. */
  readonly source: string;
  /** Time step, s. */
  readonly dtS: number;
  /** Ground acceleration samples, m/s², at t = 0, dtS, 2 dtS, … */
  readonly accelMS2: Float64Array;
  /** The unit the values were given in. */
  readonly unitsRead: AccelerationUnit;
  /** What has been done to the record since it was read, in order. */
  readonly processing: readonly ProcessingStep[];
  /** Peak |ground acceleration|, m/s². */
  readonly pgaMS2: number;
}

/** What createRecord takes: the record without its PGA, and `source`, `unitsRead`, `processing` optional. */
export type RecordFields = Pick<GroundRecord, 'name' | 'dtS' | 'accelMS2'> &
  Partial<Pick<GroundRecord, 'source' | 'unitsRead' | 'processing'>>;

/** Build a record, refusing a step or samples that cannot describe a ground motion. */
export function createRecord(fields: RecordFields): GroundRecord {
  const { name, dtS, accelMS2 } = fields;
  const source = fields.source ?? name;
  if (!Number.isFinite(dtS) || dtS <= 0)
    throw inputError(`the time step must be a positive number of seconds, got ${dtS}`, { file: source });
  if (accelMS2.length < 2)
    throw inputError(`a record needs at least 2 samples, got ${accelMS2.length}`, { file: source });
  const pgaMS2 = peakGroundAcceleration(fields);
  if (!Number.isFinite(pgaMS2)) {
    const i = accelMS2.findIndex((a) => !Number.isFinite(a));
    throw inputError(`sample ${i + 1} is not a finite number (${accelMS2[i]})`, { file: source });
  }
  return {
    // Names and paths reach terminals, SVG and HTML: no control sequences, nothing XML forbids.
    name: printable(name),
    source: printable(source),
    dtS,
    accelMS2,
    unitsRead: fields.unitsRead ?? 'm/s2',
    processing: fields.processing ?? [],
    pgaMS2,
  };
}

/** A copy of `record` with new samples (and step) and one more processing step on its list. */
export function withProcessing(
  record: GroundRecord,
  accelMS2: Float64Array,
  step: ProcessingStep,
  dtS: number = record.dtS,
): GroundRecord {
  return createRecord({ ...record, accelMS2, dtS, processing: [...record.processing, step] });
}

/** Peak absolute ground acceleration, m/s²; NaN or Infinity when a sample is not finite. */
export function peakGroundAcceleration(record: Pick<GroundRecord, 'accelMS2'>): number {
  const a = record.accelMS2;
  let peak = 0;
  for (let i = 0; i < a.length; i++) peak = Math.max(peak, Math.abs(a[i]));
  return peak;
}

/** A record's default name: the base name of the file at `path` without its last extension. */
export function recordName(path: string): string {
  const base = path.split(/[\\/]/).pop() ?? path;
  const dot = base.lastIndexOf('.');
  return dot > 0 ? base.slice(0, dot) : base;
}
