import { availableParallelism } from 'node:os';
import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { parseShard } from '../../batch/shard.js';
import { checkSuitePlan, type SuiteAnalysisOptions } from '../../batch/suite.js';
import { structurePeriodRange } from '../../batch/suite-check.js';
import type { SuiteSettings } from '../../batch/work.js';
import { parseScaleRange } from '../../spectrum/scale.js';
import { type GridCliOptions, gridFromOptions } from './grid.js';
import { type ProcessingCliOptions, processingPlanFromOptions } from './processing.js';
import { type RecordCliOptions, recordReadOptions, wholeNumber } from './record.js';
import { targetFromOptions } from './target.js';
import { parseThreads } from './threads.js';

/** The options of `quakesweep batch`. */
export interface BatchCliOptions extends RecordCliOptions, ProcessingCliOptions, GridCliOptions {
  out?: string;
  threads?: string;
  /** The old name of --threads, still taken (hidden from the help). */
  jobs?: string;
  shard?: string;
  shardCount?: string;
  target?: string;
  scaleEach?: boolean;
  scaleRange?: string;
  structurePeriod?: string;
  checkRange?: string;
  checkFraction?: string;
}

/** The options of the suite's target, scaling and check (batch, and merge for sharded runs). */
export function addSuiteOptions(command: Command): Command {
  return command
    .option(
      '--target <spec>',
      'target spectrum, as for `spectrum --target` (asce7-16:…, asce7-22:…, ec8:…, or a table file): drawn, and the suite mean checked against it',
    )
    .option('--scale-each', 'scale each record to the target (least squares in ln PSA) before the statistics')
    .option(
      '--scale-range <a:b>',
      'periods, s, over which each record is fitted (default: 0.2T–2T of --structure-period, else every grid period > 0 the target covers)',
    )
    .option(
      '--structure-period <s>',
      'the structure period T: check (and scaling) range 0.2T–2T (common practice)',
    )
    .option(
      '--check-range <a:b>',
      'periods, s, over which the suite mean is checked (default: 0.2T–2T, else the scaling range)',
    )
    .option(
      '--check-fraction <f>',
      'least ratio of suite mean to target that passes, 0.9 or 90% (default 0.9)',
    );
}

/** The default least ratio of suite mean to target (common practice: 90%). */
export const DEFAULT_CHECK_FRACTION = 0.9;

/** A batch run as the options describe it: its folder, what every record shares, threads and shard. */
export function batchPlan(options: BatchCliOptions) {
  const out = options.out;
  if (out === undefined) throw usageError('--out <dir> is required');
  if (options.name !== undefined)
    throw usageError('--name does not apply to batch: each record is named after its file');
  const grid = gridFromOptions(options);
  const { source: _source, name: _name, ...read } = recordReadOptions('', options);
  const settings: SuiteSettings = {
    read,
    plan: processingPlanFromOptions(options),
    periodsS: Array.from(grid.periodsS),
    dampings: Array.from(grid.dampings),
    method: grid.method,
  };
  const shard =
    options.shard === undefined ? null : parseShard(options.shard, process.env, options.shardCount);
  if (options.shardCount !== undefined && options.shard !== 'auto')
    throw usageError('--shard-count goes with --shard auto');
  const suite = suiteFromOptions(options);
  if (shard !== null && suite.options.target !== undefined)
    throw usageError(
      '--target does not go with --shard: give it (and the scaling and check options) to `quakesweep merge` of the shards',
    );
  checkSuitePlan(settings, suite.options);
  return { out, settings, threads: batchThreads(options), shard, ...suite };
}

/** --threads, or its old name --jobs (both given must agree); default the number of cores. */
export function batchThreads(options: Pick<BatchCliOptions, 'threads' | 'jobs'>): number {
  const { threads, jobs } = options;
  if (threads !== undefined && jobs !== undefined && threads !== jobs)
    throw usageError('--jobs is the old name of --threads: give one of them');
  if (threads !== undefined) return parseThreads(threads);
  return jobs === undefined ? availableParallelism() : wholeNumber('--jobs', jobs, 1, 256);
}

/**
 * The target, the scaling and the check as the options ask for them, and the files read for them.
 * The check runs whenever there is a target; its range is --check-range, else 0.2T–2T of
 * --structure-period, else the scaling range. --structure-period also gives the scaling range
 * unless --scale-range does.
 */
export function suiteFromOptions(options: BatchCliOptions): {
  options: SuiteAnalysisOptions;
  targetFiles: string[];
} {
  const needsTarget = (
    [
      ['--scale-each', options.scaleEach],
      ['--structure-period', options.structurePeriod],
      ['--check-range', options.checkRange],
      ['--check-fraction', options.checkFraction],
    ] as const
  ).find(([, value]) => value !== undefined && value !== false);
  if (options.target === undefined && needsTarget !== undefined)
    throw usageError(`${needsTarget[0]} needs --target`);
  const target = targetFromOptions({ target: options.target, scaleRange: options.scaleRange });
  if (target === undefined) return { options: {}, targetFiles: [] };
  const structure = options.structurePeriod === undefined ? undefined : parsePeriod(options.structurePeriod);
  const structureRange = structure === undefined ? undefined : structurePeriodRange(structure);
  const scaleRangeS = target.rangeS ?? structureRange;
  const fraction =
    options.checkFraction === undefined ? DEFAULT_CHECK_FRACTION : parseFraction(options.checkFraction);
  let rangeS: [number, number] | undefined;
  let rangeSource: string;
  if (options.checkRange !== undefined) {
    rangeS = parseScaleRange(options.checkRange, '--check-range');
    rangeSource = '--check-range';
  } else if (structureRange !== undefined) {
    rangeS = structureRange;
    rangeSource = `0.2T to 2T with the structure period T = ${structure} s (common practice)`;
  } else if (scaleRangeS !== undefined) {
    rangeS = [scaleRangeS[0], scaleRangeS[1]];
    rangeSource = 'the scaling range (--scale-range)';
  } else {
    rangeS = [Math.max(target.spectrum.minPeriodS, Number.MIN_VALUE), target.spectrum.maxPeriodS];
    rangeSource = 'every grid period above 0 s where the target is defined';
  }
  return {
    options: {
      target: target.spectrum,
      scaleEach: options.scaleEach === true,
      scaleRangeS,
      check: { fraction, rangeS, rangeSource },
    },
    targetFiles: target.files,
  };
}

function parsePeriod(text: string): number {
  const value = Number(text);
  if (text.trim() === '' || !(value > 0) || !Number.isFinite(value))
    throw usageError(`--structure-period '${text}': a period in seconds above 0, e.g. 1.2`);
  return value;
}

function parseFraction(text: string): number {
  const part = text.trim();
  const percent = part.endsWith('%');
  const value = Number(percent ? part.slice(0, -1) : part) / (percent ? 100 : 1);
  if (part === '' || !(value > 0) || !(value <= 2) || !Number.isFinite(value))
    throw usageError(`--check-fraction '${text}': a fraction such as 0.9 or 90%`);
  return value;
}
