import { existsSync, readdirSync, readFileSync, realpathSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Command } from 'commander';
import { inputError, usageError } from '../../base/errors.js';
import { sanitiseName } from '../../batch/names.js';
import { checkShard, spectraDisagreement } from '../../batch/shard-check.js';
import { analyseSuite, checkSuitePlan } from '../../batch/suite.js';
import { SHARD_FORMAT, type ShardJson } from '../../formats/suite.js';
import { OutputSet } from '../../output/output-set.js';
import { announceSuccess } from '../announce.js';
import { addSuiteOptions, type BatchCliOptions, suiteFromOptions } from '../options/batch.js';
import { addSuiteFiles } from '../suite-files.js';

type MergeCliOptions = Pick<
  BatchCliOptions,
  'out' | 'target' | 'scaleEach' | 'scaleRange' | 'structurePeriod' | 'checkRange' | 'checkFraction'
>;

export function registerMerge(program: Command): void {
  const command = program
    .command('merge')
    .description(
      'combine the outputs of `batch --shard` runs into the suite files of a single run; with --target, scale and check the suite as batch does',
    )
    .argument('<dirs...>', 'folders holding shard-i-of-N.json files (and the shards’ record folders)')
    .requiredOption(
      '--out <dir>',
      'folder for suite.json and the record folders (may be one of the shard folders)',
    );
  addSuiteOptions(command);
  command.action((dirs: string[], options: MergeCliOptions, cmd: Command) => {
    const words = (cmd.parent as unknown as { rawArgs?: string[] } | null)?.rawArgs ?? process.argv.slice(2);
    return runMerge(dirs, options, words);
  });
}

const SHARD_FILE = /^shard-\d+-of-\d+\.json$/;

/**
 * Read every shard summary, check that they make one whole run, copy the record folders, and write
 * the suite files a single batch run would (with the target, scaling and check given here).
 */
export async function runMerge(
  dirs: string[],
  options: MergeCliOptions,
  commandLine: readonly string[] = ['merge', ...dirs, '--out', options.out ?? ''],
): Promise<void> {
  const out = options.out;
  if (out === undefined) throw usageError('--out <dir> is required');
  const suite = suiteFromOptions(options);
  // The suite files checked against the target's files before any work.
  new OutputSet(suite.targetFiles)
    .folder(
      out,
      ['suite.json', 'suite.csv', 'suite.svg', 'suite.html'].map((f): [string, string] => [f, '']),
    )
    .check();
  const shards: { dir: string; file: string; json: ShardJson }[] = [];
  for (const dir of dirs) {
    if (!existsSync(dir)) throw usageError(`${dir}: no such folder`);
    for (const entry of readdirSync(dir).sort()) {
      if (!SHARD_FILE.test(entry)) continue;
      const file = join(dir, entry);
      let json: ShardJson;
      try {
        json = JSON.parse(readFileSync(file, 'utf8')) as ShardJson;
      } catch {
        throw inputError('not valid JSON; expected a shard summary of `quakesweep batch --shard`', { file });
      }
      if (json?.format !== SHARD_FORMAT)
        throw inputError(`not a shard summary (format ${SHARD_FORMAT})`, { file });
      checkShard(json, file);
      shards.push({ dir, file, json });
    }
  }
  if (shards.length === 0) throw usageError(`no shard-i-of-N.json in ${dirs.join(', ')}`);
  const first = shards[0].json;
  const count = first.shard.count;
  const seen = new Map<number, string>();
  for (const { file, json } of shards) {
    if (json.shard.count !== count)
      throw inputError(`is shard ${json.shard.index} of ${json.shard.count}, others are of ${count}`, {
        file,
      });
    if (JSON.stringify(json.settings) !== JSON.stringify(first.settings))
      throw inputError('was run with other reading, processing or grid options', { file });
    if (JSON.stringify(json.all_files) !== JSON.stringify(first.all_files))
      throw inputError('was run on another list of files', { file });
    const again = seen.get(json.shard.index);
    if (again !== undefined)
      throw inputError(`shard ${json.shard.index} of ${count} is also in ${again}`, { file });
    seen.set(json.shard.index, file);
  }
  const missing = Array.from({ length: count }, (_, i) => i + 1).filter((i) => !seen.has(i));
  if (missing.length > 0)
    throw usageError(`shard${missing.length > 1 ? 's' : ''} ${missing.join(', ')} of ${count} missing`);

  const outputs = new OutputSet(suite.targetFiles).folder(out);
  const names = new Map<string, string>();
  const files = new Map<string, string>();
  for (const { dir, file, json } of shards) {
    const sameFolder = existsSync(out) && realpathSync(dir) === realpathSync(resolve(out));
    for (const record of json.records) {
      const { name } = record;
      if (typeof name !== 'string' || sanitiseName(name) !== name) {
        throw inputError(`record name ${JSON.stringify(name)} is not a safe folder name`, { file });
      }
      const twice = names.get(name) ?? files.get(record.file);
      if (twice !== undefined)
        throw inputError(
          `record ${name} (${record.file}) is also in ${twice}: a record belongs to one shard`,
          {
            file,
          },
        );
      names.set(name, file);
      files.set(record.file, file);
      const copied = join(dir, name, 'spectra.json');
      const bytes = readFileSync(copied);
      let spectra: unknown;
      try {
        spectra = JSON.parse(bytes.toString('utf8'));
      } catch {
        throw inputError('not valid JSON; expected the spectra of a record of the batch', { file: copied });
      }
      const problem = spectraDisagreement(record, first.settings, spectra);
      if (problem !== undefined)
        throw inputError(`${problem}: the shard or the record was changed after the batch`, { file: copied });
      if (!sameFolder) outputs.folder(join(out, name), [['spectra.json', bytes]]);
    }
  }
  const records = shards.flatMap((shard) => shard.json.records);
  const failed = shards.flatMap((shard) => shard.json.failed);
  const settings = first.settings;
  checkSuitePlan(settings, suite.options);
  const analysis = analyseSuite(records, settings, suite.options);
  const { written, result } = await addSuiteFiles(outputs, out, {
    analysis,
    records,
    failed,
    settings,
    commandLine,
  });
  outputs.write();
  announceSuccess(
    `merged ${count} shards: ${records.length} records, ${failed.length} failed${result}`,
    written,
  );
}
