import { availableParallelism } from 'node:os';
import { describe, expect, it } from 'vitest';
import { batchPlan } from '../../../src/cli/options/batch.js';

describe('batchPlan', () => {
  const base = { out: 'suite', units: 'cm/s2', dt: '0.02', periods: '0,0.5,2', damping: '2%,5%' };

  it('carries what every record shares: reading, processing, grid; no source or name', () => {
    const plan = batchPlan({
      ...base,
      skip: '3',
      baseline: 'linear',
      taper: '5%',
      method: 'piecewise-exact',
    });
    expect(plan.out).toBe('suite');
    expect(plan.settings.read).toEqual({
      units: 'cm/s2',
      dtS: 0.02,
      column: undefined,
      skip: 3,
      layout: 'auto',
    });
    expect(plan.settings.read).not.toHaveProperty('source');
    expect(plan.settings.read).not.toHaveProperty('name');
    expect(plan.settings.plan).toEqual({ baselineOrder: 1, taperFraction: 0.05 });
    expect(plan.settings.periodsS).toEqual([0, 0.5, 2]); // plain arrays: they go to the workers and the JSON
    expect(plan.settings.dampings).toEqual([0.02, 0.05]);
    expect(plan.settings.method).toBe('piecewise-exact');
    expect(plan.shard).toBeNull();
  });

  it('runs on every core unless --jobs says otherwise', () => {
    expect(batchPlan(base).jobs).toBe(availableParallelism());
    expect(batchPlan({ ...base, jobs: '3' }).jobs).toBe(3);
  });

  it('--shard i/N is the i-th of N slices; auto reads the scheduler’s variables', () => {
    expect(batchPlan({ ...base, shard: '2/3' }).shard).toEqual({ index: 2, count: 3 });
    const saved = process.env['JOB_COMPLETION_INDEX'];
    process.env['JOB_COMPLETION_INDEX'] = '0'; // Kubernetes indexed jobs count from 0
    try {
      expect(batchPlan({ ...base, shard: 'auto', shardCount: '4' }).shard).toEqual({ index: 1, count: 4 });
    } finally {
      if (saved === undefined) delete process.env['JOB_COMPLETION_INDEX'];
      else process.env['JOB_COMPLETION_INDEX'] = saved;
    }
  });

  it.each([
    [{ out: undefined }, '--out <dir> is required'],
    [{ name: 'x' }, '--name does not apply to batch: each record is named after its file'],
    [{ jobs: '0' }, "--jobs must be a whole number ≥ 1, got '0'"],
    [{ jobs: '1.5' }, "--jobs must be a whole number ≥ 1, got '1.5'"],
    [{ shard: '2/3', shardCount: '3' }, '--shard-count goes with --shard auto'],
    [{ units: 'furlongs' }, 'furlongs'],
    [{ periods: '0,-1' }, '--periods'],
    [{ filter: 'notch:5' }, "--filter 'notch:5'"],
  ])('refuses %o, naming the option', (options, message) => {
    expect(() => batchPlan({ ...base, ...options })).toThrow(message);
  });
});
