import { availableParallelism } from 'node:os';
import { usageError } from '../../base/errors.js';
import { parseShard } from '../../batch/shard.js';
import type { SuiteSettings } from '../../batch/work.js';
import { type GridCliOptions, gridFromOptions } from './grid.js';
import { type ProcessingCliOptions, processingPlanFromOptions } from './processing.js';
import { type RecordCliOptions, recordReadOptions, wholeNumber } from './record.js';

/** The options of `quakesweep batch`. */
export interface BatchCliOptions extends RecordCliOptions, ProcessingCliOptions, GridCliOptions {
  out?: string;
  jobs?: string;
  shard?: string;
  shardCount?: string;
}

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
  const jobs = options.jobs === undefined ? availableParallelism() : wholeNumber('--jobs', options.jobs, 1);
  const shard =
    options.shard === undefined ? null : parseShard(options.shard, process.env, options.shardCount);
  if (options.shardCount !== undefined && options.shard !== 'auto')
    throw usageError('--shard-count goes with --shard auto');
  return { out, settings, jobs, shard };
}
