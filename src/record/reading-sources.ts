import { inputError, usageError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';
import { ACCELERATION_UNIT_NAMES, ACCELERATION_UNITS, type AccelerationUnit } from '../base/units.js';
import { escapeUnprintable } from './fields.js';
import { columnNameUnit, type HeaderKeys, timeNameInMs } from './header.js';
import { type LayoutSeen, wrappedHint } from './layout-choice.js';
import { checkTimeScale, plausibilityWarnings } from './plausibility.js';
import type { ReadOptions } from './read.js';
import { readingStep, warningStep } from './reading.js';
import { createRecord, type GroundRecord, recordName } from './record.js';

/** What the reader hands over at the end of the text. */
export interface ReadEnd {
  accelMS2: Float64Array;
  layout: 'single' | 'table' | 'wrapped';
  /** The time column's mean step in its own unit (tables). */
  columnStepS: number | undefined;
  firstLine: number;
  /** The width of fields found where values touch, and the first line where they did. */
  width: number | undefined;
  touchingLine: number;
  endedWithoutBreak: boolean;
  valueColumn: number;
}

type Names = { fields: string[]; line: number } | undefined;

/**
 * Where the time step, the unit and the value column come from: an option, the header or the time
 * column; an option overrides the header and the record says so. Builds the record with its
 * reading step and warnings (reading.ts).
 */
export class ReadingSources {
  unitsRead: AccelerationUnit = 'm/s2';
  private unitsFrom = '';
  private readonly warnings: string[] = [];
  private readonly overrides: string[] = [];
  private columnName: string | undefined;
  /** Seconds per unit of the time column, and why when it is not 1. */
  private timeFactor = 1;
  private timeUnitFrom: string | undefined;

  constructor(
    private readonly options: ReadOptions,
    private readonly keys: HeaderKeys,
  ) {
    if (options.timeUnit === 'ms') {
      this.timeFactor = 0.001;
      this.timeUnitFrom = 'ms (--time-unit)';
    }
  }

  /** The table's 1-based value column: --column by number or name, else the one value column. */
  valueColumn(columns: number, names: Names, seen?: LayoutSeen): number {
    const o = this.options;
    const named = names !== undefined && names.fields.length === columns ? names.fields : undefined;
    const shown = named?.map(escapeUnprintable).join(', ');
    const listed = named === undefined ? '' : `; its columns: ${shown}`;
    let column: number;
    if (typeof o.column === 'string') {
      const wanted = bare(o.column);
      const index = named?.findIndex((name) => bare(name) === wanted) ?? -1;
      if (named === undefined)
        throw usageError(
          `--column '${o.column}': ${o.source} has no row of column names; give a number from 2 to ${columns}`,
        );
      if (index < 0) throw usageError(`--column '${o.column}': ${o.source} has no such column${listed}`);
      column = index + 1;
    } else if (o.column !== undefined) {
      column = o.column;
    } else if (columns === 2) {
      column = 2;
    } else {
      const which = named === undefined ? `time, then ${columns - 1} value columns with no names` : shown;
      // With no names the columns may be values wrapped several a line.
      const or = named === undefined && seen !== undefined ? `; or, if it ${wrappedHint(seen)}` : '';
      throw usageError(
        `${o.source} has ${columns} columns (${which}): choose the acceleration with --column (a name or a number from 2 to ${columns})${or}`,
      );
    }
    if (column === 1 || column > columns)
      throw usageError(
        `--column ${column}: ${o.source} has ${columns} columns; column 1 is time, so choose 2 to ${columns}${listed}`,
      );
    this.columnName = named?.[column - 1];
    if (named !== undefined && o.timeUnit === undefined && timeNameInMs(named[0])) {
      this.timeFactor = 0.001;
      this.timeUnitFrom = `ms, as the time column's name '${named[0]}' says`;
    }
    return column;
  }

  /** The values' unit: --units, else the header's key, else the value column's name. */
  units(valueColumn: number, names: Names): AccelerationUnit {
    const o = this.options;
    const k = this.keys.units;
    const name = valueColumn > 0 ? names?.fields[valueColumn - 1] : undefined;
    const nameUnit = name === undefined ? undefined : columnNameUnit(name);
    const header =
      k !== undefined
        ? { unit: k.value, where: `the header (line ${k.line}: '${k.text}')` }
        : nameUnit !== undefined
          ? { unit: nameUnit, where: `the column name '${name}' (line ${names?.line})` }
          : undefined;
    if (o.units !== undefined) {
      this.unitsRead = o.units;
      this.unitsFrom = '--units';
      if (header !== undefined && ACCELERATION_UNITS[header.unit] !== ACCELERATION_UNITS[o.units]) {
        this.overrides.push(`--units ${o.units} overrides ${header.where}, which says ${header.unit}`);
        this.warnings.push(
          `--units ${o.units} contradicts ${header.where}, which says ${header.unit}; the values are read in ${o.units} as told`,
        );
      } else if (header !== undefined) {
        this.unitsFrom = `--units, as ${header.where} says too`;
      }
    } else if (header !== undefined) {
      this.unitsRead = header.unit;
      this.unitsFrom = header.where;
    } else {
      throw usageError(
        `the record's units are required (--units); accepted: ${ACCELERATION_UNIT_NAMES} (${o.source}'s header states none)`,
      );
    }
    return this.unitsRead;
  }

  /** The record: its step from the options, the header or the time column, checked, with its reading step. */
  record(end: ReadEnd): GroundRecord {
    const o = this.options;
    const file = o.source;
    const count = end.accelMS2.length;
    const k = this.keys.dtS;
    const headerWhere = k === undefined ? '' : `the header (line ${k.line}: '${k.text}')`;
    let dtS: number;
    let dtFrom: string;
    if (end.columnStepS !== undefined) {
      dtS = end.columnStepS * this.timeFactor;
      if (o.dtS !== undefined && Math.abs(o.dtS - dtS) > 1e-4 * dtS)
        throw inputError(`--dt ${o.dtS} disagrees with the time column's step, ${formatS(dtS)} s`, { file });
      dtFrom = 'the time column';
      if (k !== undefined && Math.abs(k.value - dtS) > 1e-4 * dtS)
        this.warnings.push(
          `${headerWhere} states Δt ${k.value} s but the time column steps ${formatS(dtS)} s; the time column's step is used`,
        );
      else if (k !== undefined) dtFrom = `the time column, as ${headerWhere} says too`;
    } else if (o.dtS !== undefined) {
      dtS = o.dtS;
      dtFrom = '--dt';
      if (k !== undefined && Math.abs(k.value - dtS) > 1e-9 * dtS)
        this.overrides.push(`--dt ${dtS} s overrides ${headerWhere}, which says ${k.value} s`);
    } else if (k !== undefined) {
      dtS = k.value;
      dtFrom = headerWhere;
    } else {
      throw usageError(`${file} has no time column: give the time step with --dt (the header states none)`);
    }
    checkTimeScale(dtS, count, dtFrom, file, o.timeUnit !== undefined);
    this.checkPoints(count, end.endedWithoutBreak);
    const record = createRecord({
      name: o.name ?? (file === '-' ? 'stdin' : recordName(file)),
      source: file,
      dtS,
      accelMS2: end.accelMS2,
      unitsRead: this.unitsRead,
    });
    const step = readingStep({
      dtS,
      dtFrom,
      units: this.unitsRead,
      unitsFrom: this.unitsFrom,
      layout: end.layout,
      column: end.layout === 'table' ? { index: end.valueColumn, name: this.columnName } : undefined,
      headerLines: end.firstLine - 1,
      headerPoints: this.keys.points?.value,
      fixed: fixedText(o.fixed, end),
      timeUnit: this.timeUnitFrom,
      overrides: this.overrides,
    });
    const warnings = [...this.warnings, ...plausibilityWarnings(record)];
    return { ...record, processing: [step, ...warnings.map(warningStep)] };
  }

  /** A header's point count must be what was read; fewer at an end with no line break is a file cut short. */
  private checkPoints(count: number, endedWithoutBreak: boolean): void {
    const points = this.keys.points;
    if (points === undefined || points.value === count) return;
    const place = { file: this.options.source, line: points.line };
    const stated = `the header states ${points.value} points`;
    if (count > points.value)
      throw inputError(
        `${stated} but ${count} values were read: is the layout right (--layout, --column, --fixed)?`,
        place,
      );
    if (!endedWithoutBreak)
      throw inputError(
        `${stated} but the file holds ${count} values: is the layout right, or is the file incomplete?`,
        place,
      );
    throw inputError(
      `${stated} but the file ends after ${count}, on a line with no line break: it looks cut short (still being written or copied?); read it once it is whole`,
      place,
    );
  }
}

/** A column's name compared without case, quotes or surrounding blanks. */
function bare(name: string): string {
  return name
    .trim()
    .replace(/^["']|["']$/g, '')
    .trim()
    .toLowerCase();
}

function fixedText(declared: readonly number[] | undefined, end: ReadEnd): string | undefined {
  if (declared !== undefined)
    return `fixed-width fields ${declared.every((w) => w === declared[0]) ? `${declared.length}x${declared[0]}` : declared.join(',')} (--fixed)`;
  if (end.touchingLine === 0) return undefined;
  const width = end.width === undefined ? '' : `fields of ${end.width}; `;
  return `values that touch split at their signs (${width}first on line ${end.touchingLine})`;
}

function formatS(valueS: number): string {
  return formatNumber(valueS, 6);
}
