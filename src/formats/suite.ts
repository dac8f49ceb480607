import { CAUTION } from '../base/caution.js';
import { compareText } from '../batch/glob.js';
import type { Shard } from '../batch/shard.js';
import { STATISTICS_METHOD } from '../batch/statistics.js';
import { analyseSuite, type SuiteAnalysis } from '../batch/suite.js';
import { SUITE_CHECK_NOTE } from '../batch/suite-check.js';
import type { RecordOutcome, SuiteSettings } from '../batch/work.js';
import { frequenciesHz } from './frequency.js';

/** A record of the suite that was swept, with its PSA in g (per damping, per period). */
export interface SuiteRecord {
  name: string;
  file: string;
  psaG: number[][];
  /** PGA as read and processed, g (absent in shard files of older versions). */
  pgaG?: number;
  /** What reading the record warned of (absent in shard files of older versions). */
  warnings?: string[];
}

export interface SuiteFailure {
  file: string;
  error: string;
}

/**
 * suite.json of a set of records: names and failures sorted, statistics over the records by name
 * (of the scaled spectra when the analysis scaled them), each record's PGA and factor, and the
 * target, the scaling and the check when the analysis has them.
 */
export function suiteJson(
  records: readonly SuiteRecord[],
  failed: readonly SuiteFailure[],
  settings: Pick<SuiteSettings, 'periodsS' | 'dampings'>,
  analysis: SuiteAnalysis = analyseSuite(records, settings),
) {
  const { members, factors } = analysis;
  return {
    caution: CAUTION,
    records: members.map((r) => r.name),
    failed: [...failed].sort((a, b) => compareText(a.file, b.file)),
    warnings: analysis.warnings,
    periods_s: [...settings.periodsS],
    frequencies_hz: frequenciesHz(settings.periodsS),
    statistics: STATISTICS_METHOD,
    spectra_scaled: analysis.scaling !== undefined,
    spectra: analysis.statistics,
    per_record: members.map((r, i) => ({
      name: r.name,
      file: r.file,
      pga_g: r.pgaG ?? null,
      scale_factor: factors[i],
      pga_scaled_g: r.pgaG === undefined ? null : r.pgaG * factors[i],
    })),
    ...suiteTargetJson(analysis),
  };
}

/** The keys a target adds to suite.json: the target, each record's scaling and the suite check. */
export function suiteTargetJson({ target, scaling, check }: SuiteAnalysis) {
  if (target === undefined) return {};
  return {
    target: {
      code: target.spectrum.code,
      description: target.spectrum.description,
      parameters: target.spectrum.parameters,
      damping: target.damping,
      psa_g: target.psaG,
    },
    ...(scaling && {
      scaling: {
        criterion: scaling.criterion,
        damping: target.damping,
        records: scaling.records.map((r) => ({
          name: r.name,
          factor: r.factor,
          range_s: r.rangeS,
          period_count: r.periodCount,
          mean_ratio: r.meanRatio,
          min_ratio: r.minRatio,
          max_ratio: r.maxRatio,
        })),
      },
    }),
    ...(check && {
      check: {
        result: check.pass ? 'pass' : 'fail',
        note: SUITE_CHECK_NOTE,
        criterion: check.criterion,
        fraction: check.fraction,
        range_s: check.rangeS,
        range_source: check.rangeSource,
        checked_range_s: check.checkedRangeS,
        period_count: check.periodCount,
        damping: target.damping,
        worst_ratio: check.worstRatio,
        worst_period_s: check.worstPeriodS,
        ratio_mean_to_target: check.ratios,
        warnings: check.warnings,
      },
    }),
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
    if (outcome.ok)
      records.push({
        name: outcome.name,
        file: outcome.file,
        psaG: outcome.psaG,
        pgaG: outcome.pgaG,
        warnings: outcome.warnings,
      });
    else failed.push({ file: outcome.file, error: outcome.error });
  }
  return { records, failed };
}
