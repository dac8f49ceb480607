import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import type { Command } from 'commander';
import { QuakesweepError, usageError } from '../../base/errors.js';
import { expandPatterns } from '../../batch/glob.js';
import { assignNames } from '../../batch/names.js';
import { parseShard, type Shard, shardSlice } from '../../batch/shard.js';
import type { RecordOutcome, SuiteSettings } from '../../batch/work.js';
import { formatJson } from '../../formats/spectrum-json.js';
import {
  type SuiteFailure,
  type SuiteRecord,
  shardFileName,
  shardJson,
  suiteJson,
} from '../../formats/suite.js';
import { OutputSet } from '../../output/output-set.js';
import { addGridOptions, type GridCliOptions, gridFromOptions } from '../options/grid.js';
import {
  addProcessingOptions,
  type ProcessingCliOptions,
  processingPlanFromOptions,
} from '../options/processing.js';
import {
  addRecordOptions,
  positiveInteger,
  type RecordCliOptions,
  recordReadOptions,
} from '../options/record.js';

export interface BatchCliOptions extends RecordCliOptions, ProcessingCliOptions, GridCliOptions {
  out?: string;
  jobs?: string;
  shard?: string;
  shardCount?: string;
}

export function registerBatch(program: Command): void {
  const command = program
    .command('batch')
    .description(
      'spectra of many records on every core, with the suite mean, median and 16th/84th percentiles',
    )
    .argument('<files...>', 'record files, or patterns with * and ? in the file name (quote them)');
  addRecordOptions(command);
  addProcessingOptions(command);
  addGridOptions(command);
  command
    .requiredOption(
      '--out <dir>',
      'output folder: DIR/<record>/spectra.json and DIR/suite.json (created if its parent exists)',
    )
    .option('--jobs <n>', 'threads, the main one included (default: the number of cores)')
    .option(
      '--shard <i/N|auto>',
      'process only the i-th (1-based) of N slices of the sorted files; auto reads Slurm or Kubernetes variables',
    )
    .option(
      '--shard-count <n>',
      'with --shard auto under Kubernetes: the number of shards (or QUAKESWEEP_SHARD_COUNT)',
    )
    .action(async (files: string[], options: BatchCliOptions) => {
      await runBatch(files, options);
    });
}

/** What the options say every record shares. */
export function suiteSettings(options: BatchCliOptions): SuiteSettings {
  if (options.name !== undefined)
    throw usageError('--name does not apply to batch: each record is named after its file');
  const grid = gridFromOptions(options);
  const { source: _source, name: _name, ...read } = recordReadOptions('', options);
  return {
    read,
    plan: processingPlanFromOptions(options),
    periodsS: Array.from(grid.periodsS),
    dampings: Array.from(grid.dampings),
    method: grid.method,
  };
}

export async function runBatch(args: string[], options: BatchCliOptions): Promise<void> {
  const out = options.out;
  if (out === undefined) throw usageError('--out <dir> is required');
  const settings = suiteSettings(options);
  const jobs = options.jobs === undefined ? availableParallelism() : positiveInteger('--jobs', options.jobs);
  const shard: Shard | null =
    options.shard === undefined ? null : parseShard(options.shard, process.env, options.shardCount);
  if (options.shardCount !== undefined && options.shard !== 'auto')
    throw usageError('--shard-count goes with --shard auto');
  const { files: all, unmatched } = expandPatterns(args);
  if (all.length === 0) throw usageError(`no file matches ${unmatched.join(', ')}`);
  const names = assignNames(all);
  const mine = shard === null ? all : shardSlice(all, shard);
  new OutputSet(all).folder(out).write();

  const tasks = mine.map((file) => ({ file, name: names.get(file) as string, outDir: out, settings }));
  // The pool and the progress bar are loaded here, not at start-up, so other commands do not pay
  // for them.
  const { runTasks } = await import('../../threads/batch-pool.js');
  const { SingleBar } = process.stderr.isTTY ? await import('cli-progress') : { SingleBar: undefined };
  const bar = SingleBar
    ? new SingleBar({
        stream: process.stderr,
        format: 'quakesweep batch [{bar}] {value}/{total} records, {eta}s left',
      })
    : null;
  bar?.start(tasks.length, 0);
  let outcomes: RecordOutcome[];
  try {
    outcomes = await runTasks(tasks, jobs, () => bar?.increment());
  } finally {
    bar?.stop();
  }
  const records: SuiteRecord[] = [];
  const failed: SuiteFailure[] = [];
  // A pattern that matched nothing counts against the whole run, so only the first shard lists it.
  if (shard === null || shard.index === 1)
    for (const pattern of unmatched) failed.push({ file: pattern, error: `${pattern}: no file matches` });
  for (const outcome of outcomes) {
    if (outcome.ok) {
      records.push({ name: outcome.name, file: outcome.file, psaG: outcome.psaG });
      for (const warning of outcome.warnings)
        process.stderr.write(`quakesweep: warning: ${outcome.file}: ${warning}\n`);
    } else {
      failed.push({ file: outcome.file, error: outcome.error });
    }
  }
  const outputs = new OutputSet(all);
  if (shard === null) {
    outputs.file(join(out, 'suite.json'), formatJson(suiteJson(records, failed, settings)));
  } else {
    outputs.file(
      join(out, shardFileName(shard)),
      formatJson(shardJson(shard, all, settings, records, failed)),
    );
  }
  outputs.write();
  const what = shard === null ? 'suite.json' : shardFileName(shard);
  process.stderr.write(
    `quakesweep: ${records.length} of ${records.length + failed.length} records done; ${join(out, what)}\n`,
  );
  if (failed.length > 0) {
    for (const f of failed) process.stderr.write(`quakesweep: failed: ${f.error}\n`);
    throw new QuakesweepError(
      'internal',
      `${failed.length} record${failed.length === 1 ? '' : 's'} failed (listed above and in ${what})`,
    );
  }
}
