import type { Command } from 'commander';
import { dampingTable, dampingToCsv, dampingToJson } from '../../formats/damping.js';
import { METHOD_DESCRIPTIONS } from '../../oscillator/recurrence.js';
import { dampingFigure } from '../../plot/damping-figure.js';
import { compareDamping } from '../../spectrum/damping.js';
import { responseSpectrumParallel } from '../../spectrum/spectrum.js';
import { gridWords } from '../announce.js';
import { type AxisCliOptions, addAxisOption, svgAxisFromOptions } from '../options/axis.js';
import { addOutputOptions, type OutputCliOptions, outputFormat, writeProduct } from '../options/format.js';
import { addGridOptions, type GridCliOptions, gridFromOptions } from '../options/grid.js';
import { addProcessingOptions, applyProcessing, type ProcessingCliOptions } from '../options/processing.js';
import { addRecordOptions, loadRecord, type RecordCliOptions } from '../options/record.js';
import { addThreadOptions, sweepFromOptions, type ThreadCliOptions } from '../options/threads.js';

export interface DampingCliOptions
  extends RecordCliOptions,
    ProcessingCliOptions,
    GridCliOptions,
    ThreadCliOptions,
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
  addProcessingOptions(command);
  addGridOptions(command, DEFAULT_DAMPING_LIST);
  addThreadOptions(command);
  addAxisOption(command);
  addOutputOptions(command, 'also draw the spectra and their ratios to 5%, DIR/damping.svg').action(
    runDamping,
  );
}

export async function runDamping(source: string, options: DampingCliOptions): Promise<void> {
  outputFormat(options);
  const axis = svgAxisFromOptions(options);
  const grid = gridFromOptions(options);
  const sweep = sweepFromOptions(options);
  const added = !Array.from(grid.dampings).some((d) => Math.abs(d - REFERENCE_DAMPING) < 1e-12);
  const dampings = added ? Float64Array.from([...grid.dampings, REFERENCE_DAMPING]).sort() : grid.dampings;
  const record = applyProcessing(await loadRecord(source, options), options);
  const spectrum = await responseSpectrumParallel(record, { ...grid, dampings, ...sweep });
  const comparison = compareDamping(spectrum, REFERENCE_DAMPING);
  const methodDescription = METHOD_DESCRIPTIONS[spectrum.method];
  await writeProduct([source], options, {
    json: () => dampingToJson(spectrum, comparison, added),
    csv: () => dampingToCsv(spectrum, comparison),
    table: () => dampingTable(spectrum, comparison, added),
    figures: () => [
      ['damping.svg', dampingFigure({ record: spectrum.record, methodDescription, comparison, axis })],
    ],
    summary: `damping comparison of ${spectrum.record.name}, ${gridWords(spectrum.periodsS.length, spectrum.curves.length)}`,
  });
}
