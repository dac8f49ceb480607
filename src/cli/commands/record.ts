import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { formatNumber } from '../../base/numbers.js';
import { parseAccelerationUnit, parseLengthUnit } from '../../base/units.js';
import { type RecordOutputOptions, recordToCsv, recordToJson, recordToText } from '../../formats/record.js';
import { appliedSteps } from '../../record/reading.js';
import type { GroundRecord } from '../../record/record.js';
import { scaleRecord } from '../../spectrum/scale.js';
import { responseSpectrumParallel } from '../../spectrum/spectrum.js';
import { fitTarget, targetRecord } from '../../spectrum/target.js';
import { count } from '../announce.js';
import { addOutputOptions, type OutputCliOptions, outputFormat, writeProduct } from '../options/format.js';
import { addGridOptions, type GridCliOptions, gridFromOptions } from '../options/grid.js';
import { addProcessingOptions, applyProcessing, type ProcessingCliOptions } from '../options/processing.js';
import { addRecordOptions, loadRecord, positiveNumber, type RecordCliOptions } from '../options/record.js';
import { addTargetOptions, type TargetCliOptions, targetFromOptions } from '../options/target.js';
import { addThreadOptions, sweepFromOptions, type ThreadCliOptions } from '../options/threads.js';

export interface RecordCommandCliOptions
  extends RecordCliOptions,
    ProcessingCliOptions,
    GridCliOptions,
    TargetCliOptions,
    ThreadCliOptions,
    OutputCliOptions {
  scale?: string;
  accelUnit?: string;
  lengthUnit?: string;
  with?: string;
}

/** What --with may add beside the acceleration. */
const HISTORIES = ['velocity', 'displacement'] as const;

export function registerRecord(program: Command): void {
  const command = program
    .command('record')
    .description(
      'write the record as processed (and scaled): acceleration, and on request velocity and displacement, with a header stating every step',
    )
    .argument('<record>', 'record file, or - for standard input');
  addRecordOptions(command);
  addProcessingOptions(command);
  command.option('--scale <factor>', 'multiply the processed record by this factor (instead of --target)');
  addTargetOptions(command);
  addGridOptions(command);
  addThreadOptions(command);
  command
    .option('--accel-unit <unit>', 'unit of the acceleration written (default: the --units read)')
    .option(
      '--length-unit <unit>',
      'length unit of velocity (per second) and displacement: m, cm, mm, in, ft',
      'm',
    )
    .option('--with <list>', 'also write these histories: velocity, displacement or velocity,displacement');
  addOutputOptions(command).action(runRecord);
}

export async function runRecord(source: string, options: RecordCommandCliOptions): Promise<void> {
  outputFormat(options);
  const output: RecordOutputOptions = {
    accelUnit: parseAccelerationUnit(options.accelUnit ?? options.units),
    lengthUnit: parseLengthUnit(options.lengthUnit ?? 'm'),
    ...parseHistories(options.with),
  };
  const target = targetFromOptions(options);
  if (target !== undefined && options.scale !== undefined)
    throw usageError('give --scale or --target, not both');
  if (target !== undefined && !target.apply)
    throw usageError(
      '--target only scales the record written with --apply-scale; add it, or leave out --target',
    );
  const factor = options.scale === undefined ? undefined : positiveNumber('--scale', options.scale);
  // Checked before the record is read, as every command checks its options first.
  const grid = target === undefined ? undefined : gridFromOptions(options);
  const sweep = sweepFromOptions(options);
  const processed = applyProcessing(await loadRecord(source, options), options);
  let record: GroundRecord = processed;
  if (factor !== undefined) record = scaleRecord(processed, factor, givenScaleStep(factor));
  if (target !== undefined && grid !== undefined) {
    const swept = await responseSpectrumParallel(processed, { ...grid, ...sweep });
    record = targetRecord(processed, fitTarget(swept, target.spectrum, target).fit);
  }
  const steps = appliedSteps(record.processing).map((step) => step.operation);
  await writeProduct([source, ...(target?.files ?? [])], options, {
    json: () => recordToJson(record, output),
    csv: () => recordToCsv(record, output),
    table: () => recordToText(record, output),
    figures: () => [],
    summary: `record ${record.name}, ${count(record.accelMS2.length, 'sample')} at ${formatNumber(record.dtS, 6)} s, ${steps.length === 0 ? 'as read' : steps.join(', ')}, acceleration in ${output.accelUnit}`,
  });
}

/** --with: which of velocity and displacement to add. */
export function parseHistories(text: string | undefined): { velocity: boolean; displacement: boolean } {
  const words = (text ?? '')
    .split(',')
    .map((word) => word.trim().toLowerCase())
    .filter((word) => word !== '');
  for (const word of words)
    if (!(HISTORIES as readonly string[]).includes(word))
      throw usageError(`--with '${text}': use velocity, displacement or velocity,displacement`);
  return { velocity: words.includes('velocity'), displacement: words.includes('displacement') };
}

function givenScaleStep(factor: number) {
  return {
    operation: 'scale',
    description: `amplitude × ${factor} (given with --scale)`,
    parameters: { factor },
  };
}
