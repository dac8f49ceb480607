import { join } from 'node:path';
import { type Command, Option } from 'commander';
import { CAUTION } from '../../base/caution.js';
import { QuakesweepError, usageError } from '../../base/errors.js';
import { formatNumber } from '../../base/numbers.js';
import { printable } from '../../base/printable.js';
import { expandPatterns } from '../../batch/glob.js';
import { assignNames } from '../../batch/names.js';
import { shardSlice } from '../../batch/shard.js';
import { analyseSuite } from '../../batch/suite.js';
import { formatJson } from '../../formats/spectrum-json.js';
import { shardFileName, shardJson, suiteJson, suiteOutcomes } from '../../formats/suite.js';
import { suiteToCsv } from '../../formats/suite-csv.js';
import { METHOD_DESCRIPTIONS } from '../../oscillator/recurrence.js';
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
    .addOption(new Option('--jobs <n>', 'the old name of --threads').hideHelp())
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
    )
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
    for (const warning of analysis.check?.warnings ?? [])
      process.stderr.write(`quakesweep: warning: suite check: ${warning}\n`);
    outputs.file(join(out, 'suite.csv'), suiteToCsv(analysis, settings.periodsS));
    if (records.length > 0) {
      const written = ['suite.json', 'suite.csv', 'suite.svg'];
      const methodDescription = METHOD_DESCRIPTIONS[settings.method];
      // The figure and report modules (and jsdom) load only here.
      const { suiteFigures } = await import('../../report/suite-outputs.js');
      const figures = await suiteFigures({
        analysis,
        settings,
        failed,
        methodDescription,
        commandLine,
        written,
      });
      for (const [file, text] of figures) outputs.file(join(out, file), text);
    }
    // suite.json, which names the others, is renamed last.
    outputs.file(join(out, what), formatJson(suiteJson(records, failed, settings, analysis)));
    const check = analysis.check;
    if (check !== undefined)
      result = `; suite check ${check.pass ? 'PASS' : 'FAIL'} (least mean/target ${formatNumber(check.worstRatio, 3)} at ${formatNumber(check.worstPeriodS, 3)} s, needs ${check.fraction}; preliminary)`;
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
