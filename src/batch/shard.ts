import { usageError } from '../base/errors.js';

/** One shard of a batch: the `index`-th (1-based) of `count` slices of the sorted file list. */
export interface Shard {
  index: number;
  count: number;
}

/** The environment variable that gives the shard count with JOB_COMPLETION_INDEX (Kubernetes). */
export const SHARD_COUNT_VARIABLE = 'QUAKESWEEP_SHARD_COUNT';

function whole(text: string | undefined, what: string): number {
  const value = Number(text);
  if (text === undefined || text.trim() === '' || !Number.isInteger(value)) {
    throw usageError(`${what} must be a whole number, got '${text ?? ''}'`);
  }
  return value;
}

/**
 * `--shard i/N` (1 ≤ i ≤ N) or `--shard auto`: SLURM_ARRAY_TASK_ID with SLURM_ARRAY_TASK_COUNT (or
 * _MIN/_MAX; index = ID − MIN + 1, so 0- and 1-based arrays both work), else JOB_COMPLETION_INDEX
 * (0-based, index = it + 1) with the count from --shard-count or QUAKESWEEP_SHARD_COUNT.
 */
export function parseShard(
  text: string,
  env: Readonly<Record<string, string | undefined>>,
  shardCount?: string,
): Shard {
  const variable = (name: string) => whole(env[name], name);
  let shard: Shard;
  if (text !== 'auto') {
    const match = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
    if (match === null) throw usageError(`--shard '${text}': write i/N (1-based, e.g. 2/8) or auto`);
    shard = { index: Number(match[1]), count: Number(match[2]) };
  } else if (env['SLURM_ARRAY_TASK_ID'] !== undefined) {
    const id = variable('SLURM_ARRAY_TASK_ID');
    const min = env['SLURM_ARRAY_TASK_MIN'] === undefined ? 0 : variable('SLURM_ARRAY_TASK_MIN');
    let count: number;
    if (shardCount !== undefined) count = whole(shardCount, '--shard-count');
    else if (env['SLURM_ARRAY_TASK_COUNT'] !== undefined) count = variable('SLURM_ARRAY_TASK_COUNT');
    else if (env['SLURM_ARRAY_TASK_MAX'] !== undefined) count = variable('SLURM_ARRAY_TASK_MAX') - min + 1;
    else throw usageError('--shard auto: Slurm gave no SLURM_ARRAY_TASK_COUNT or _MAX; add --shard-count N');
    shard = { index: id - min + 1, count };
  } else if (env['JOB_COMPLETION_INDEX'] !== undefined) {
    const count = shardCount ?? env[SHARD_COUNT_VARIABLE];
    if (count === undefined)
      throw usageError(
        `--shard auto with JOB_COMPLETION_INDEX needs --shard-count N or ${SHARD_COUNT_VARIABLE}`,
      );
    shard = { index: variable('JOB_COMPLETION_INDEX') + 1, count: whole(count, 'the shard count') };
  } else {
    throw usageError('--shard auto: neither SLURM_ARRAY_TASK_ID nor JOB_COMPLETION_INDEX is set');
  }
  if (!(shard.count >= 1) || !(shard.index >= 1) || shard.index > shard.count) {
    throw usageError(`shard ${shard.index}/${shard.count}: need 1 ≤ i ≤ N (shards are numbered from 1)`);
  }
  return shard;
}

/** The shard's contiguous slice of the sorted list: items ⌊(i−1)n/N⌋ up to ⌊in/N⌋ (exclusive). */
export function shardSlice<T>(sorted: readonly T[], shard: Shard): T[] {
  const n = sorted.length;
  return sorted.slice(
    Math.floor(((shard.index - 1) * n) / shard.count),
    Math.floor((shard.index * n) / shard.count),
  );
}
