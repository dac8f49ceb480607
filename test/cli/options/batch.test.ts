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

  it('runs on every core unless --threads (or its old name --jobs) says otherwise', () => {
    expect(batchPlan(base).threads).toBe(availableParallelism());
    expect(batchPlan({ ...base, threads: '3' }).threads).toBe(3);
    expect(batchPlan({ ...base, jobs: '3' }).threads).toBe(3);
    expect(batchPlan({ ...base, jobs: '2', threads: '2' }).threads).toBe(2);
  });

  it('without --target: no target, no scaling, no check', () => {
    expect(batchPlan(base).options).toEqual({});
    expect(batchPlan(base).targetFiles).toEqual([]);
  });

  const target = 'asce7-16:sds=1.0,sd1=0.6,tl=8';

  it('--structure-period T gives the check and the scaling range 0.2T–2T (common practice)', () => {
    const plan = batchPlan({ ...base, target, scaleEach: true, structurePeriod: '1.5' });
    expect(plan.options.scaleEach).toBe(true);
    expect(plan.options.scaleRangeS?.[0]).toBeCloseTo(0.3, 15);
    expect(plan.options.scaleRangeS?.[1]).toBeCloseTo(3, 15);
    expect(plan.options.check?.rangeS).toEqual(plan.options.scaleRangeS);
    expect(plan.options.check?.fraction).toBe(0.9);
    expect(plan.options.check?.rangeSource).toMatch(/0\.2T to 2T .*T = 1\.5 s \(common practice\)/);
    expect(plan.options.target?.code).toBe('asce7-16');
  });

  it('--check-range and --scale-range override --structure-period each for its own; --check-fraction takes 0.8 or 80%', () => {
    const plan = batchPlan({
      ...base,
      target,
      scaleEach: true,
      structurePeriod: '1',
      scaleRange: '0.1:1',
      checkRange: '0.5:1.5',
      checkFraction: '80%',
    });
    expect(plan.options.scaleRangeS).toEqual([0.1, 1]);
    expect(plan.options.check).toEqual({ fraction: 0.8, rangeS: [0.5, 1.5], rangeSource: '--check-range' });
    expect(batchPlan({ ...base, target, checkFraction: '0.85' }).options.check?.fraction).toBe(0.85);
  });

  it('with a target alone the check covers the scaling range, else every period the target covers', () => {
    const ranged = batchPlan({ ...base, target, scaleRange: '0.2:2' }).options.check;
    expect(ranged?.rangeS).toEqual([0.2, 2]);
    const whole = batchPlan({ ...base, target }).options.check;
    expect(whole?.rangeS[1]).toBe(Number.POSITIVE_INFINITY); // ASCE 7-16 has no upper period limit
    expect(whole?.rangeSource).toMatch(/every grid period above 0 s/);
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
    [{ jobs: '0' }, "--jobs must be a whole number from 1 to 256, got '0'"],
    [{ jobs: '1.5' }, "--jobs must be a whole number from 1 to 256, got '1.5'"],
    [{ threads: '0' }, "--threads must be a whole number from 1 to 256, got '0'"],
    [{ threads: '2', jobs: '3' }, '--jobs is the old name of --threads: give one of them'],
    [{ scaleEach: true }, '--scale-each needs --target'],
    [{ structurePeriod: '1' }, '--structure-period needs --target'],
    [{ checkRange: '0.2:2' }, '--check-range needs --target'],
    [{ checkFraction: '0.9' }, '--check-fraction needs --target'],
    [{ target: 'asce7-16:sds=1,sd1=0.6,tl=8', structurePeriod: '0' }, "--structure-period '0'"],
    [{ target: 'asce7-16:sds=1,sd1=0.6,tl=8', checkRange: '2:1' }, "--check-range '2:1'"],
    [{ target: 'asce7-16:sds=1,sd1=0.6,tl=8', checkFraction: '0' }, "--check-fraction '0'"],
    [{ target: 'asce7-16:sds=1,sd1=0.6,tl=8', checkFraction: 'most' }, "--check-fraction 'most'"],
    [{ target: 'asce7-16:sds=1,sd1=0.6,tl=8', shard: '1/2' }, '--target does not go with --shard: give it'],
    // Refused before any record is swept (base grid: 0, 0.5, 2 s; 2% and 5%).
    [{ target: 'asce7-16:sds=1,sd1=0.6,tl=8', damping: '2%' }, 'the target is for 5% damping'],
    [
      { target: 'asce7-16:sds=1,sd1=0.6,tl=8', checkRange: '0.6:1.9' },
      'no period of the grid lies in the check range 0.6–1.9 s',
    ],
    [
      { target: 'ec8:type=1,ground=C,ag=0.25', periods: '0,1,5', scaleEach: true, structurePeriod: '2.5' },
      'the scaling range 0.5–5 s reaches T = 5 s, outside the target (defined from 0 s to 4 s)',
    ],
    [{ shard: '2/3', shardCount: '3' }, '--shard-count goes with --shard auto'],
    [{ units: 'furlongs' }, 'furlongs'],
    [{ periods: '0,-1' }, '--periods'],
    [{ filter: 'notch:5' }, "--filter 'notch:5'"],
  ])('refuses %o, naming the option', (options, message) => {
    expect(() => batchPlan({ ...base, ...options })).toThrow(message);
  });
});
