import { existsSync, readdirSync, readFileSync, realpathSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Command } from 'commander';
import { inputError, usageError } from '../../base/errors.js';
import { sanitiseName } from '../../batch/names.js';
import { checkShard, spectraDisagreement } from '../../batch/shard-check.js';
import { analyseSuite } from '../../batch/suite.js';
import { formatJson } from '../../formats/spectrum-json.js';
import { SHARD_FORMAT, type ShardJson, suiteJson } from '../../formats/suite.js';
import { suiteToCsv } from '../../formats/suite-csv.js';
import { METHOD_DESCRIPTIONS } from '../../oscillator/recurrence.js';
import { OutputSet } from '../../output/output-set.js';
import { announceSuccess } from '../announce.js';

export function registerMerge(program: Command): void {
  program
    .command('merge')
    .description('combine the outputs of `batch --shard` runs into the suite files of a single run')
    .argument('<dirs...>', 'folders holding shard-i-of-N.json files (and the shards’ record folders)')
    .requiredOption(
      '--out <dir>',
      'folder for suite.json and the record folders (may be one of the shard folders)',
    )
    .action(runMerge);
}

const SHARD_FILE = /^shard-\d+-of-\d+\.json$/;

/** Read every shard summary, check that they make one whole run, copy the record folders, write suite.json. */
export async function runMerge(dirs: string[], { out }: { out: string }): Promise<void> {
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

  const outputs = new OutputSet().folder(out);
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
  const suite = join(out, 'suite.json');
  // The same suite files a single run without a target writes (the suite options are not taken with --shard).
  const analysis = analyseSuite(records, first.settings);
  outputs.file(suite, formatJson(suiteJson(records, failed, first.settings, analysis)));
  outputs.file(join(out, 'suite.csv'), suiteToCsv(analysis, first.settings.periodsS));
  const written = [suite, join(out, 'suite.csv')];
  if (records.length > 0) {
    const { suiteFigures } = await import('../../report/suite-outputs.js');
    const figures = await suiteFigures({
      analysis,
      settings: first.settings,
      failed,
      methodDescription: METHOD_DESCRIPTIONS[first.settings.method],
      commandLine: ['merge', ...dirs, '--out', out],
      written: ['suite.json', 'suite.csv', 'suite.svg'],
    });
    for (const [name, text] of figures) {
      outputs.file(join(out, name), text);
      written.push(join(out, name));
    }
  }
  outputs.write();
  announceSuccess(`merged ${count} shards: ${records.length} records, ${failed.length} failed`, written);
}
