import { CAUTION } from '../base/caution.js';
import { compareText } from '../batch/glob.js';
import type { Shard } from '../batch/shard.js';
import { STATISTICS_METHOD, suiteStatistics } from '../batch/statistics.js';
import type { RecordOutcome, SuiteSettings } from '../batch/work.js';
import { frequenciesHz } from './frequency.js';

/** A record of the suite that was swept, with its PSA in g (per damping, per period). */
export interface SuiteRecord {
  name: string;
  file: string;
  psaG: number[][];
}

export interface SuiteFailure {
  file: string;
  error: string;
}

/** suite.json of a set of records: names and failures sorted, statistics over the records by name. */
export function suiteJson(
  records: readonly SuiteRecord[],
  failed: readonly SuiteFailure[],
  settings: Pick<SuiteSettings, 'periodsS' | 'dampings'>,
) {
  const sorted = [...records].sort((a, b) => compareText(a.name, b.name));
  return {
    caution: CAUTION,
    records: sorted.map((r) => r.name),
    failed: [...failed].sort((a, b) => compareText(a.file, b.file)),
    periods_s: [...settings.periodsS],
    frequencies_hz: frequenciesHz(settings.periodsS),
    statistics: STATISTICS_METHOD,
    spectra: suiteStatistics(sorted, settings.dampings, settings.periodsS.length),
  };
}

export const SHARD_FORMAT = 'quakesweep-shard-1';

export function shardFileName(shard: Shard): string {
  return `shard-${shard.index}-of-${shard.count}.json`;
}

/**
 * What one shard writes (DIR/shard-i-of-N.json): enough to merge to the same suite.json exactly;
 * `allFiles`, every file of the whole run, sorted, lets a merge check the shards belong together.
 */
export function shardJson(
  shard: Shard,
  allFiles: string[],
  settings: SuiteSettings,
  records: SuiteRecord[],
  failed: SuiteFailure[],
) {
  return { caution: CAUTION, format: SHARD_FORMAT, shard, all_files: allFiles, settings, records, failed };
}

export type ShardJson = ReturnType<typeof shardJson>;

/** A run's outcomes as suite records and failures, the patterns that matched no file failing first. */
export function suiteOutcomes(outcomes: readonly RecordOutcome[], unmatched: readonly string[]) {
  const records: SuiteRecord[] = [];
  const failed: SuiteFailure[] = unmatched.map((pattern) => ({
    file: pattern,
    error: `${pattern}: no file matches`,
  }));
  for (const outcome of outcomes) {
    if (outcome.ok) records.push({ name: outcome.name, file: outcome.file, psaG: outcome.psaG });
    else failed.push({ file: outcome.file, error: outcome.error });
  }
  return { records, failed };
}
