import { join } from 'node:path';
import { type Command, Option } from 'commander';
import { CAUTION } from '../../base/caution.js';
import { QuakesweepError, usageError } from '../../base/errors.js';
import { printable } from '../../base/printable.js';
import { expandPatterns } from '../../batch/glob.js';
import { assignNames } from '../../batch/names.js';
import { shardSlice } from '../../batch/shard.js';
import { analyseSuite } from '../../batch/suite.js';
import { formatJson } from '../../formats/spectrum-json.js';
import { shardFileName, shardJson, suiteOutcomes } from '../../formats/suite.js';
import { OutputSet } from '../../output/output-set.js';
import { addSuiteOptions, type BatchCliOptions, batchPlan } from '../options/batch.js';
import { addGridOptions } from '../options/grid.js';
import { addProcessingOptions } from '../options/processing.js';
import { addRecordOptions } from '../options/record.js';
import { runWithProgress } from '../progress.js';
import { addSuiteFiles } from '../suite-files.js';

export function registerBatch(program: Command): void {
  const command = program
    .command('batch')
    .description(
      'spectra of many records on every core, with the suite mean, median and ±1σ band; optionally each record scaled to a target and the suite mean checked against it',
    )
    .argument('<files...>', 'record files, or patterns with * and ? in the file name (quote them)');
  addRecordOptions(command);
  addProcessingOptions(command);
  addGridOptions(command);
  command
    .requiredOption(
      '--out <dir>',
      'output folder: DIR/<record>/spectra.json, DIR/suite.json, suite.csv, suite.svg and suite.html (created if its parent exists)',
    )
    .option('--threads <n>', 'threads, the main one included (default: the number of cores)')
    .addOption(new Option('--jobs <n>', 'the old name of --threads').hideHelp());
  addSuiteOptions(command);
  command
    .option(
      '--shard <i/N|auto>',
      'process only the i-th (1-based) of N slices of the sorted files; auto reads Slurm or Kubernetes variables',
    )
    .option(
      '--shard-count <n>',
      'with --shard auto under Kubernetes: the number of shards (or QUAKESWEEP_SHARD_COUNT)',
    )
    .action((args: string[], options: BatchCliOptions, cmd: Command) => {
      const words =
        (cmd.parent as unknown as { rawArgs?: string[] } | null)?.rawArgs ?? process.argv.slice(2);
      return runBatch(args, options, words);
    });
}

export async function runBatch(
  args: string[],
  options: BatchCliOptions,
  commandLine: readonly string[] = ['batch', ...args],
): Promise<void> {
  const { out, settings, threads, shard, options: suite, targetFiles } = batchPlan(options);
  const { files: all, unmatched, duplicates } = expandPatterns(args);
  if (all.length === 0) throw usageError(`no file matches ${unmatched.join(', ')}`);
  for (const { dropped, kept } of duplicates)
    process.stderr.write(`quakesweep: ${printable(`${dropped} is the same file as ${kept}`)}; swept once\n`);
  const names = assignNames(all);
  const mine = shard === null ? all : shardSlice(all, shard);
  const inputs = [...all, ...targetFiles];
  // Every output checked against every input before any work; all written at the end, as one set.
  const planned =
    shard === null ? ['suite.json', 'suite.csv', 'suite.svg', 'suite.html'] : [shardFileName(shard)];
  const early = new OutputSet(inputs).folder(
    out,
    planned.map((f): [string, string] => [f, '']),
  );
  for (const file of mine) early.folder(join(out, names.get(file) as string), [['spectra.json', '']]);
  early.check();
  const tasks = mine.map((file) => ({ file, name: names.get(file) as string, outDir: out, settings }));
  const outcomes = await runWithProgress(tasks, threads);
  for (const outcome of outcomes) {
    if (!outcome.ok) continue;
    for (const warning of outcome.warnings)
      process.stderr.write(`quakesweep: warning: ${printable(`${outcome.file}: ${warning}`)}\n`);
  }
  // A pattern that matched nothing counts against the whole run, so only the first shard lists it.
  const listed = shard === null || shard.index === 1 ? unmatched : [];
  const { records, failed } = suiteOutcomes(outcomes, listed);
  const outputs = new OutputSet(inputs).folder(out);
  for (const outcome of outcomes)
    if (outcome.ok) outputs.folder(join(out, outcome.name), [['spectra.json', outcome.spectra]]);
  let what: string;
  let result = '';
  if (shard !== null) {
    what = shardFileName(shard);
    outputs.file(join(out, what), formatJson(shardJson(shard, all, settings, records, failed)));
  } else {
    what = 'suite.json';
    const analysis = analyseSuite(records, settings, suite);
    ({ result } = await addSuiteFiles(outputs, out, { analysis, records, failed, settings, commandLine }));
  }
  outputs.write();
  process.stderr.write(`quakesweep: ${CAUTION}\n`);
  process.stderr.write(
    `quakesweep: ${records.length} of ${records.length + failed.length} records done${result}; ${printable(join(out, what))}\n`,
  );
  if (failed.length > 0) {
    for (const f of failed) process.stderr.write(`quakesweep: failed: ${printable(f.error)}\n`);
    throw new QuakesweepError(
      'internal',
      `${failed.length} record${failed.length === 1 ? '' : 's'} failed (listed above and in ${what})`,
    );
  }
}
