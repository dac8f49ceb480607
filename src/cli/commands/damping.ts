import type { Command } from 'commander';
import { dampingTable, dampingToCsv, dampingToJson } from '../../formats/damping.js';
import { METHOD_DESCRIPTIONS } from '../../oscillator/recurrence.js';
import { dampingFigure } from '../../plot/damping-figure.js';
import { compareDamping } from '../../spectrum/damping.js';
import { responseSpectrum } from '../../spectrum/spectrum.js';
import { type AxisCliOptions, addAxisOption, svgAxisFromOptions } from '../options/axis.js';
import { addOutputOptions, type OutputCliOptions, outputFormat, writeProduct } from '../options/format.js';
import { addGridOptions, type GridCliOptions, gridFromOptions } from '../options/grid.js';
import { addRecordOptions, loadRecord, type RecordCliOptions } from '../options/record.js';

export interface DampingCliOptions
  extends RecordCliOptions,
    GridCliOptions,
    OutputCliOptions,
    AxisCliOptions {}

/** Damping ratios compared when --damping is not given. */
export const DEFAULT_DAMPING_LIST = '2%,5%,10%,20%';

/** The reference damping every ratio is taken against. */
const REFERENCE_DAMPING = 0.05;

export function registerDamping(program: Command): void {
  const command = program
    .command('damping')
    .description(
      'PSA at several damping ratios and its ratio to 5% damping, beside the Eurocode 8 and Newmark–Hall factors',
    )
    .argument('<record>', 'record file, or - for standard input');
  addRecordOptions(command);
  addGridOptions(command, DEFAULT_DAMPING_LIST);
  addAxisOption(command);
  addOutputOptions(
    command,
    'json or csv (default: a table on the terminal, or json with --out)',
    'also draw the spectra and their ratios to 5%, DIR/damping.svg',
  ).action(runDamping);
}

export async function runDamping(source: string, options: DampingCliOptions): Promise<void> {
  outputFormat(options, 'json or csv');
  const axis = svgAxisFromOptions(options);
  const grid = gridFromOptions(options);
  const added = !Array.from(grid.dampings).some((d) => Math.abs(d - REFERENCE_DAMPING) < 1e-12);
  const dampings = added ? Float64Array.from([...grid.dampings, REFERENCE_DAMPING]).sort() : grid.dampings;
  const record = await loadRecord(source, options);
  const spectrum = responseSpectrum(record, { ...grid, dampings });
  const comparison = compareDamping(spectrum, REFERENCE_DAMPING);
  const methodDescription = METHOD_DESCRIPTIONS[spectrum.method];
  await writeProduct([source], options, {
    json: () => dampingToJson(spectrum, comparison, added),
    csv: () => dampingToCsv(spectrum, comparison),
    table: () => dampingTable(spectrum, comparison, added),
    figures: () => [
      ['damping.svg', dampingFigure({ record: spectrum.record, methodDescription, comparison, axis })],
    ],
  });
}
