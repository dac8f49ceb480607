import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseShard, shardSlice } from '../../src/batch/shard.js';

describe('shards', () => {
  it('reads i/N as 1-based and refuses 0 or i > N', () => {
    expect(parseShard('2/8', {})).toEqual({ index: 2, count: 8 });
    expect(() => parseShard('0/8', {})).toThrow(/1 ≤ i ≤ N/);
    expect(() => parseShard('9/8', {})).toThrow(/1 ≤ i ≤ N/);
    expect(() => parseShard('two', {})).toThrow(/i\/N/);
  });

  it('reads Slurm arrays, 0- or 1-based, by their MIN (Slurm sbatch --array documentation, from memory)', () => {
    const one = {
      SLURM_ARRAY_TASK_ID: '3',
      SLURM_ARRAY_TASK_MIN: '1',
      SLURM_ARRAY_TASK_MAX: '4',
      SLURM_ARRAY_TASK_COUNT: '4',
    };
    expect(parseShard('auto', one)).toEqual({ index: 3, count: 4 });
    const zero = { SLURM_ARRAY_TASK_ID: '0', SLURM_ARRAY_TASK_MIN: '0', SLURM_ARRAY_TASK_MAX: '3' };
    expect(parseShard('auto', zero)).toEqual({ index: 1, count: 4 });
  });

  it('reads a Kubernetes Indexed Job: JOB_COMPLETION_INDEX is 0-based, the count is given', () => {
    expect(parseShard('auto', { JOB_COMPLETION_INDEX: '0', QUAKESWEEP_SHARD_COUNT: '5' })).toEqual({
      index: 1,
      count: 5,
    });
    expect(parseShard('auto', { JOB_COMPLETION_INDEX: '4' }, '5')).toEqual({ index: 5, count: 5 });
    expect(() => parseShard('auto', { JOB_COMPLETION_INDEX: '4' })).toThrow(/shard-count/);
    expect(() => parseShard('auto', {})).toThrow(/SLURM_ARRAY_TASK_ID/);
  });

  it('slices partition the list in order: every item once (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer(), { maxLength: 60 }),
        fc.integer({ min: 1, max: 12 }),
        (items, count) => {
          const joined = Array.from({ length: count }, (_, i) =>
            shardSlice(items, { index: i + 1, count }),
          ).flat();
          expect(joined).toEqual(items);
        },
      ),
    );
  });
});
