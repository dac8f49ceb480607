import { inputError } from '../base/errors.js';
import { type Shard, shardSlice } from './shard.js';

/** Most shards a run may be split into: far beyond any cluster's array, far below what memory holds. */
export const MAX_SHARDS = 100_000;

/** The parts of a shard summary a merge reads, once checked. */
export interface CheckedShard {
  shard: Shard;
  allFiles: string[];
  periodsS: number[];
  dampings: number[];
  records: { name: string; file: string; psaG: number[][]; pgaG?: number; warnings?: string[] }[];
  failed: { file: string; error: string }[];
}

/** Relative difference within which a copied spectrum agrees with its summary (JSON keeps 17 digits). */
const AGREEMENT = 1e-12;

const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);
const finiteAtLeastZero = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v) && v >= 0;

/**
 * Check a shard summary read back (shard-i-of-N.json, written by `batch --shard`): whole shard
 * numbers, a count up to MAX_SHARDS, the files a list of names, the periods ascending, each record's PSA a finite, ≥ 0
 * table of dampings × periods, and its file one of this shard's slice of the run's files.
 */
export function checkShard(json: unknown, file: string): CheckedShard {
  const fail = (message: string) => inputError(message, { file });
  if (!isObject(json)) throw fail('not a shard summary: not a JSON object');
  const shard = json['shard'];
  if (!isObject(shard)) throw fail('"shard" must be {"index": i, "count": N}');
  const { index, count } = shard;
  if (!Number.isInteger(count) || (count as number) < 1 || (count as number) > MAX_SHARDS)
    throw fail(`"shard.count" must be a whole number from 1 to ${MAX_SHARDS}, got ${JSON.stringify(count)}`);
  if (!Number.isInteger(index) || (index as number) < 1 || (index as number) > (count as number))
    throw fail(`"shard.index" must be a whole number from 1 to ${count}, got ${JSON.stringify(index)}`);
  const allFiles = json['all_files'];
  if (!Array.isArray(allFiles) || !allFiles.every((f) => typeof f === 'string'))
    throw fail('"all_files" must be a list of file names');
  const settings = json['settings'];
  if (!isObject(settings)) throw fail('"settings" must be an object');
  const periodsS = settings['periodsS'];
  const dampings = settings['dampings'];
  if (!Array.isArray(periodsS) || periodsS.length === 0 || !periodsS.every(finiteAtLeastZero))
    throw fail('"settings.periodsS" must be a list of finite periods ≥ 0 s');
  // The grid is always written ascending without repeats (the period parser sorts and refuses twins).
  if (!periodsS.every((t, i) => i === 0 || t > periodsS[i - 1]))
    throw fail('"settings.periodsS" must be in ascending order without repeats');
  if (!Array.isArray(dampings) || dampings.length === 0 || !dampings.every(finiteAtLeastZero))
    throw fail('"settings.dampings" must be a list of finite damping ratios ≥ 0');
  const records = json['records'];
  const failed = json['failed'];
  if (!Array.isArray(records)) throw fail('"records" must be a list');
  if (
    !Array.isArray(failed) ||
    !failed.every((f) => isObject(f) && typeof f['file'] === 'string' && typeof f['error'] === 'string')
  )
    throw fail('"failed" must be a list of {"file", "error"}');
  const mine = new Set(shardSlice(allFiles as string[], { index: index as number, count: count as number }));
  for (const [i, record] of records.entries()) {
    const at = `"records"[${i}]`;
    if (!isObject(record) || typeof record['name'] !== 'string' || typeof record['file'] !== 'string')
      throw fail(`${at} must have a "name" and a "file"`);
    if (!mine.has(record['file']))
      throw fail(`${at}: ${record['file']} is not one of the files of shard ${index} of ${count}`);
    const psa = record['psaG'];
    const table =
      Array.isArray(psa) &&
      psa.length === dampings.length &&
      psa.every(
        (row) => Array.isArray(row) && row.length === periodsS.length && row.every(finiteAtLeastZero),
      );
    if (!table)
      throw fail(
        `${at} (${record['name']}): "psaG" must be ${dampings.length} × ${periodsS.length} finite numbers ≥ 0`,
      );
    if (record['pgaG'] !== undefined && !finiteAtLeastZero(record['pgaG']))
      throw fail(`${at} (${record['name']}): "pgaG" must be a finite number ≥ 0`);
    const warnings = record['warnings'];
    if (warnings !== undefined && !(Array.isArray(warnings) && warnings.every((w) => typeof w === 'string')))
      throw fail(`${at} (${record['name']}): "warnings" must be a list of texts`);
  }
  // Each file of the slice is a record or a failure, once; a failure may also be a pattern that
  // matched nothing (not among the files; only shard 1 lists those), but never another shard's
  // file or one of the records.
  const all = new Set(allFiles as string[]);
  const done = new Set(records.map((record) => record['file'] as string));
  for (const [i, { file: failure }] of (failed as { file: string }[]).entries()) {
    if (all.has(failure) && !mine.has(failure))
      throw fail(`"failed"[${i}]: ${failure} is not one of the files of shard ${index} of ${count}`);
    if (!all.has(failure) && index !== 1)
      throw fail(
        `"failed"[${i}]: ${failure} is not among the run's files (only shard 1 lists unmatched patterns)`,
      );
    if (done.has(failure)) throw fail(`"failed"[${i}]: ${failure} is also among the shard's records`);
    done.add(failure);
  }
  const lost = [...mine].find((file) => !done.has(file));
  if (lost !== undefined)
    throw fail(`${lost} of shard ${index} of ${count} is neither among its records nor its failures`);
  return {
    shard: { index: index as number, count: count as number },
    allFiles: allFiles as string[],
    periodsS: periodsS as number[],
    dampings: dampings as number[],
    records: records as CheckedShard['records'],
    failed: failed as CheckedShard['failed'],
  };
}

/**
 * Check that a record's copied spectra.json holds the numbers its shard summary states: the same
 * periods and dampings, and the same PSA (g) and PGA to AGREEMENT. Returns a problem, or undefined.
 */
export function spectraDisagreement(
  record: CheckedShard['records'][number],
  shard: Pick<CheckedShard, 'periodsS' | 'dampings'>,
  spectra: unknown,
): string | undefined {
  if (!isObject(spectra) || !Array.isArray(spectra['periods_s']) || !Array.isArray(spectra['spectra']))
    return 'is not a spectrum JSON';
  const periods = spectra['periods_s'];
  if (periods.length !== shard.periodsS.length || periods.some((t, i) => t !== shard.periodsS[i]))
    return 'has other periods than the shard summary';
  for (const [d, damping] of shard.dampings.entries()) {
    const curve = spectra['spectra'].find((c) => isObject(c) && c['damping'] === damping) as
      | Record<string, unknown>
      | undefined;
    const psa = curve?.['psa_g'];
    if (!Array.isArray(psa) || psa.length !== periods.length) return `has no PSA curve at damping ${damping}`;
    for (let p = 0; p < periods.length; p++) {
      const stated = record.psaG[d][p];
      if (!agree(psa[p], stated))
        return `says PSA ${psa[p]} g at T = ${periods[p]} s, ζ = ${damping}, where the shard summary says ${stated}`;
    }
  }
  const pga = isObject(spectra['record']) ? spectra['record']['pga_g'] : undefined;
  if (record.pgaG !== undefined && !agree(pga, record.pgaG))
    return `says PGA ${pga} g, where the shard summary says ${record.pgaG}`;
  return undefined;
}

function agree(value: unknown, stated: number): boolean {
  return (
    typeof value === 'number' &&
    Math.abs(value - stated) <= AGREEMENT * Math.max(Math.abs(value), Math.abs(stated))
  );
}
