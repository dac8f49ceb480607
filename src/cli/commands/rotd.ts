import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { rotdTable, rotdToCsv, rotdToJson } from '../../formats/rotd.js';
import { METHOD_DESCRIPTIONS } from '../../oscillator/recurrence.js';
import { rotdFigure } from '../../plot/rotd-figure.js';
import { rotdThreads } from '../../spectrum/spectrum.js';
import { rotDSpectraParallel } from '../../threads/rotd-pool.js';
import { gridWords } from '../announce.js';
import { type AxisCliOptions, addAxisOption, svgAxisFromOptions } from '../options/axis.js';
import { addOutputOptions, type OutputCliOptions, outputFormat, writeProduct } from '../options/format.js';
import { addGridOptions, type GridCliOptions, gridFromOptions } from '../options/grid.js';
import { addProcessingOptions, applyProcessing, type ProcessingCliOptions } from '../options/processing.js';
import { addRecordOptions, loadRecord, positiveNumber, type RecordCliOptions } from '../options/record.js';
import { addThreadOptions, parseThreads } from '../options/threads.js';

export interface RotDCliOptions
  extends RecordCliOptions,
    ProcessingCliOptions,
    GridCliOptions,
    OutputCliOptions,
    AxisCliOptions {
  angleStep?: string;
  threads?: string;
}

export function registerRotD(program: Command): void {
  const command = program
    .command('rotd')
    .description('RotD50, RotD100 and geometric-mean PSA of two horizontal components')
    .argument('<first>', 'first horizontal component, or - for standard input')
    .argument('<second>', 'second horizontal component (same time step), at right angles to the first');
  addRecordOptions(command);
  addProcessingOptions(command);
  addGridOptions(command);
  command.option('--angle-step <degrees>', 'rotation step over 0–180°, at most 1° and a divisor of 180', '1');
  addAxisOption(command);
  addOutputOptions(command, 'also draw RotD50, RotD100 and the geometric mean, DIR/rotd.svg').action(runRotD);
  addThreadOptions(command, false);
}

export async function runRotD(first: string, second: string, options: RotDCliOptions): Promise<void> {
  outputFormat(options);
  const axis = svgAxisFromOptions(options);
  if (first === '-' && second === '-')
    throw usageError('only one of the two components can be standard input');
  const grid = gridFromOptions(options);
  const angleStepDeg = positiveNumber('--angle-step', options.angleStep ?? '1');
  // The same processing on both components, each step stated with its record.
  const one = applyProcessing(await loadRecord(first, options), options);
  const two = applyProcessing(await loadRecord(second, options), options);
  const samples = Math.max(one.accelMS2.length, two.accelMS2.length);
  const threads =
    options.threads === undefined
      ? rotdThreads(grid.periodsS.length, grid.dampings.length, samples)
      : parseThreads(options.threads);
  const spectra = await rotDSpectraParallel(one, two, { ...grid, angleStepDeg, threads });
  await writeProduct([first, second], options, {
    json: () => rotdToJson(spectra),
    csv: () => rotdToCsv(spectra),
    table: () => rotdTable(spectra),
    figures: () => [
      ['rotd.svg', rotdFigure({ spectra, methodDescription: METHOD_DESCRIPTIONS[spectra.method], axis })],
    ],
    summary: `RotD50, RotD100 and geometric mean of ${spectra.records[0].name} and ${spectra.records[1].name}, ${gridWords(spectra.periodsS.length, spectra.curves.length)}`,
  });
}
