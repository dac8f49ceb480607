import type { AccelerationUnit } from '../base/units.js';
import type { GroundRecord, ProcessingStep } from './record.js';

/**
 * How a record was read, stated in every output as the first entry of its processing list
 * (operation `read`), and the warnings of reading, one entry each after it (operation `warning`):
 * every format, figure and the report print that list, so what the reader found travels with the
 * numbers without a second path.
 */
export interface ReadingFacts {
  dtS: number;
  /** Where the step came from: `time column`, `--dt`, or the header line that stated it. */
  dtFrom: string;
  units: AccelerationUnit;
  unitsFrom: string;
  layout: 'single' | 'table' | 'wrapped';
  /** The table's value column, by number and name when it has one. */
  column?: { index: number; name?: string };
  /** Lines before the first row of values (header, comments, blanks), all skipped. */
  headerLines: number;
  /** The header's point count, when it states one. */
  headerPoints?: number;
  /** Declared widths, or the width found where values touch. */
  fixed?: string;
  /** The time column's unit when it is not seconds, and where that came from. */
  timeUnit?: string;
  /** Statements that an option overrode the header. */
  overrides: string[];
}

export function readingStep(f: ReadingFacts): ProcessingStep {
  const parts = [
    `Δt ${f.dtS} s from ${f.dtFrom}`,
    `values in ${f.units} from ${f.unitsFrom}`,
    ...f.overrides,
    layoutText(f),
  ];
  if (f.headerPoints !== undefined) parts.push(`${f.headerPoints} points, as the header states`);
  if (f.timeUnit !== undefined) parts.push(`times in ${f.timeUnit}`);
  return {
    operation: 'read',
    description: `as read: ${parts.join('; ')}`,
    // Keys that do not apply are left out (no nulls in outputs).
    parameters: {
      dt_s: f.dtS,
      dt_from: f.dtFrom,
      units: f.units,
      units_from: f.unitsFrom,
      layout: f.layout,
      ...(f.column === undefined ? {} : { column: f.column.index }),
      ...(f.column?.name === undefined ? {} : { column_name: f.column.name }),
      header_lines: f.headerLines,
      ...(f.headerPoints === undefined ? {} : { header_points: f.headerPoints }),
      ...(f.fixed === undefined ? {} : { fields: f.fixed }),
      ...(f.timeUnit === undefined ? {} : { time_unit: f.timeUnit }),
    },
  };
}

function layoutText(f: ReadingFacts): string {
  const after =
    f.headerLines === 0 ? '' : ` after ${f.headerLines} header ${f.headerLines === 1 ? 'line' : 'lines'}`;
  const fixed = f.fixed === undefined ? '' : `, ${f.fixed}`;
  if (f.layout !== 'table') return `${f.layout} layout${fixed}${after}`;
  const name = f.column?.name === undefined ? '' : ` '${f.column.name}'`;
  return `table, acceleration in column ${f.column?.index}${name}${fixed}${after}`;
}

/** A step's description without the label of its kind ("as read: ", "warning: "), for text that labels it itself. */
export function stepText(step: { operation?: string; description: string }): string {
  if (step.operation === 'read') return step.description.replace(/^as read: /, '');
  if (step.operation === 'warning') return step.description.replace(/^warning: /, '');
  return step.description;
}

export function warningStep(text: string): ProcessingStep {
  return { operation: 'warning', description: `warning: ${text}`, parameters: { warning: text } };
}

/** The warnings found while reading the record (none for a record made otherwise). */
export function readingWarnings(record: Pick<GroundRecord, 'processing'>): string[] {
  return record.processing
    .filter((step) => step.operation === 'warning')
    .map((step) => String(step.parameters.warning));
}

/** The steps applied to the record after reading it (processing, scaling): its list without the reading entry and warnings. */
export function appliedSteps<Step extends { operation?: string }>(processing: readonly Step[]): Step[] {
  return processing.filter((step) => step.operation !== 'read' && step.operation !== 'warning');
}
