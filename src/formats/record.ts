import { CAUTION, cautionLines } from '../base/caution.js';
import { ACCELERATION_UNITS, type AccelerationUnit, LENGTH_UNITS, type LengthUnit } from '../base/units.js';
import { integrateRecord } from '../record/integrate.js';
import { PROCESSING_ORDER } from '../record/process.js';
import { appliedSteps } from '../record/reading.js';
import type { GroundRecord } from '../record/record.js';
import { csvNote } from './csv-cell.js';
import { notFiniteError } from './finite.js';

/** What `quakesweep record` writes: the acceleration in `accelUnit`, and on request its integrals. */
export interface RecordOutputOptions {
  accelUnit: AccelerationUnit;
  /** Length unit of velocity (per second) and displacement. */
  lengthUnit: LengthUnit;
  velocity: boolean;
  displacement: boolean;
}

/** How velocity and displacement are obtained, stated with them. */
export const INTEGRATION_NOTE =
  'velocity and displacement: running trapezoidal integrals of the acceleration written, from rest (no baseline beyond the processing stated)';

interface Column {
  name: string;
  values: Float64Array;
  /** SI units in one unit written. */
  factor: number;
}

/** The history's columns: time, acceleration, then velocity and displacement when asked. */
function recordColumns(record: GroundRecord, o: RecordOutputOptions): Column[] {
  const lengthM = LENGTH_UNITS[o.lengthUnit];
  const { velocityMS, displacementM } = integrateRecord(record);
  const columns: Column[] = [
    { name: `accel_${o.accelUnit}`, values: record.accelMS2, factor: ACCELERATION_UNITS[o.accelUnit] },
  ];
  if (o.velocity) columns.push({ name: `velocity_${o.lengthUnit}_s`, values: velocityMS, factor: lengthM });
  if (o.displacement)
    columns.push({ name: `displacement_${o.lengthUnit}`, values: displacementM, factor: lengthM });
  return columns;
}

/**
 * The header, one statement a line: the time step, point count and unit first (a reader that
 * takes them from a header finds them there), then source, every processing step in order, the
 * units of each column, how to read the file back, and the caution.
 */
export function recordHeader(
  record: GroundRecord,
  o: RecordOutputOptions,
  columns: readonly string[],
): string[] {
  const reading = record.processing
    .filter((step) => !appliedSteps([step]).length)
    .map((step) => step.description);
  const steps = appliedSteps(record.processing).map((step, i) => `step ${i + 1}: ${step.description}`);
  return [
    `processed ground-acceleration record ${record.name}, written by quakesweep record`,
    `dt: ${record.dtS} s`,
    `npts: ${record.accelMS2.length}`,
    `units: ${o.accelUnit} (acceleration)`,
    `source: ${record.source} (read in ${record.unitsRead})`,
    ...reading,
    `processing (applied in the order ${[...PROCESSING_ORDER, 'scale'].join(', ')}): ${steps.length === 0 ? 'none, the record as read' : `${steps.length} step${steps.length === 1 ? '' : 's'}`}`,
    ...steps,
    `columns: ${columns.join(', ')}; time in s from the first sample`,
    ...(o.velocity || o.displacement ? [INTEGRATION_NOTE] : []),
    `read back: quakesweep spectrum FILE --units ${o.accelUnit}${columns.length > 2 ? ' --column 2' : ''}`,
    ...cautionLines(),
  ].map((line) => line.replace(/[\r\n]+/g, ' '));
}

/**
 * A value in SI written in a unit of `factor` SI units: the shortest text that reads back to the
 * same double in that unit (ECMA-262 Number::toString). It reads back to the same SI double
 * (text × factor) in m/s² always, and in other units for values as they were read; a processed
 * value in g may come back one rounding away (about 1e-16 relative), as no decimal may give it.
 */
function decimalIn(si: number, factor: number): string {
  return String(factor === 1 ? si : si / factor);
}

/** Time of sample i at 12 significant digits, so that the column reads back with one uniform step. */
function timeText(i: number, dtS: number): string {
  return String(Number((i * dtS).toPrecision(12)));
}

/** The rows as text: each value the shortest decimal that reads back to the same double in SI. */
function rowTexts(record: GroundRecord, columns: readonly Column[]): string[][] {
  const rows: string[][] = [];
  for (let i = 0; i < record.accelMS2.length; i++) {
    const row = [timeText(i, record.dtS)];
    for (const c of columns) {
      const value = c.values[i];
      if (!Number.isFinite(value)) throw notFiniteError(`${c.name} at sample ${i + 1} = ${value}`);
      row.push(decimalIn(value, c.factor));
    }
    rows.push(row);
  }
  return rows;
}

/** CSV: the header on `#` lines, a row of column names, one row a sample. */
export function recordToCsv(record: GroundRecord, o: RecordOutputOptions): string {
  const columns = recordColumns(record, o);
  const names = ['time_s', ...columns.map((c) => c.name)];
  const lines = recordHeader(record, o, names).map((line) => `# ${csvNote(line)}`);
  lines.push(names.join(','));
  for (const row of rowTexts(record, columns)) lines.push(row.join(','));
  return `${lines.join('\n')}\n`;
}

/** Text: the same header and rows, columns separated by spaces and right-aligned. */
export function recordToText(record: GroundRecord, o: RecordOutputOptions): string {
  const columns = recordColumns(record, o);
  const names = ['time_s', ...columns.map((c) => c.name)];
  const rows = rowTexts(record, columns);
  const widths = names.map((name, j) => Math.max(name.length, ...rows.map((row) => row[j].length)));
  const line = (cells: readonly string[]) => cells.map((cell, j) => cell.padStart(widths[j])).join('  ');
  const lines = recordHeader(record, o, names).map((text) => `# ${text}`);
  lines.push(line(names));
  for (const row of rows) lines.push(line(row));
  return `${lines.join('\n')}\n`;
}

/** JSON: the header's facts as fields and each column as an array (in the units its key names). */
export function recordToJson(record: GroundRecord, o: RecordOutputOptions) {
  const columns = recordColumns(record, o);
  return {
    caution: CAUTION,
    record: {
      name: record.name,
      source: record.source,
      units_read: record.unitsRead,
      npts: record.accelMS2.length,
      dt_s: record.dtS,
    },
    processing: record.processing.map((step) => ({ ...step })),
    accel_unit: o.accelUnit,
    length_unit: o.lengthUnit,
    ...(o.velocity || o.displacement ? { integration: INTEGRATION_NOTE } : {}),
    ...Object.fromEntries(
      columns.map((c) => [c.name, Array.from(c.values, (value) => Number(decimalIn(value, c.factor)))]),
    ),
  };
}
