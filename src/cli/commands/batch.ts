import { join } from 'node:path';
import type { Command } from 'commander';
import { QuakesweepError, usageError } from '../../base/errors.js';
import { expandPatterns } from '../../batch/glob.js';
import { assignNames } from '../../batch/names.js';
import { shardSlice } from '../../batch/shard.js';
import { formatJson } from '../../formats/spectrum-json.js';
import { shardFileName, shardJson, suiteJson, suiteOutcomes } from '../../formats/suite.js';
import { OutputSet } from '../../output/output-set.js';
import { type BatchCliOptions, batchPlan } from '../options/batch.js';
import { addGridOptions } from '../options/grid.js';
import { addProcessingOptions } from '../options/processing.js';
import { addRecordOptions } from '../options/record.js';
import { runWithProgress } from '../progress.js';

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
    .action(runBatch);
}

export async function runBatch(args: string[], options: BatchCliOptions): Promise<void> {
  const { out, settings, jobs, shard } = batchPlan(options);
  const { files: all, unmatched } = expandPatterns(args);
  if (all.length === 0) throw usageError(`no file matches ${unmatched.join(', ')}`);
  const names = assignNames(all);
  const mine = shard === null ? all : shardSlice(all, shard);
  new OutputSet(all).folder(out).write();
  const tasks = mine.map((file) => ({ file, name: names.get(file) as string, outDir: out, settings }));
  const outcomes = await runWithProgress(tasks, jobs);
  for (const outcome of outcomes) {
    if (!outcome.ok) continue;
    for (const warning of outcome.warnings)
      process.stderr.write(`quakesweep: warning: ${outcome.file}: ${warning}\n`);
  }
  // A pattern that matched nothing counts against the whole run, so only the first shard lists it.
  const listed = shard === null || shard.index === 1 ? unmatched : [];
  const { records, failed } = suiteOutcomes(outcomes, listed);
  const what = shard === null ? 'suite.json' : shardFileName(shard);
  const summary =
    shard === null ? suiteJson(records, failed, settings) : shardJson(shard, all, settings, records, failed);
  new OutputSet(all).file(join(out, what), formatJson(summary)).write();
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
