import { describe, expect, it } from 'vitest';
import {
  PARALLEL_MIN_OSCILLATOR_STEPS,
  plannedSteps,
  planSweep,
  sweepThreads,
} from '../../src/oscillator/plan.js';
import { sweepOscillators } from '../../src/oscillator/sweep.js';
import { synthesizeRecord } from '../../src/record/synth.js';

// 10,001 samples: 2,400 oscillators make 24 million oscillator-steps, above the rule's 20 million.
const record = synthesizeRecord({ seed: 5, dtS: 0.01, durationS: 100 });

describe('plannedSteps', () => {
  it('counts at least one step a sample for every oscillator (sub-steps only add)', () => {
    const plan = planSweep(record.accelMS2, record.dtS, { periodsS: [0.1, 1, 3], dampings: [0.02, 0.05] });
    expect(plannedSteps(plan, record.accelMS2.length)).toBeGreaterThanOrEqual(
      6 * (record.accelMS2.length - 1),
    );
  });
});

describe('sweepThreads: the one thread rule of the CLI and the library', () => {
  const small = planSweep(record.accelMS2, record.dtS, { periodsS: [0.5, 1], dampings: [0.05] });
  const many = Array.from({ length: 400 }, (_, i) => 0.05 + i * 0.025);
  const large = planSweep(record.accelMS2, record.dtS, {
    periodsS: many,
    dampings: [0, 0.02, 0.05, 0.1, 0.2, 0.3],
  });

  it('keeps a small sweep on this thread and splits a large one over every core', () => {
    expect(plannedSteps(small, record.accelMS2.length)).toBeLessThan(PARALLEL_MIN_OSCILLATOR_STEPS);
    expect(plannedSteps(large, record.accelMS2.length)).toBeGreaterThanOrEqual(PARALLEL_MIN_OSCILLATOR_STEPS);
    for (const threads of ['auto', undefined] as const) {
      expect(sweepThreads(small, record.accelMS2.length, threads, 8)).toBe(1);
      expect(sweepThreads(large, record.accelMS2.length, threads, 8)).toBe(8);
    }
  });

  it('takes a number of threads as given, but no more than there are groups of work', () => {
    expect(large.groups.length).toBeGreaterThan(3);
    expect(sweepThreads(large, record.accelMS2.length, 3, 8)).toBe(3);
    expect(sweepThreads(large, record.accelMS2.length, 1, 8)).toBe(1);
    // The issue's case: 256 threads for a few periods started 256 workers (2 GB, 8 s).
    expect(sweepThreads(small, record.accelMS2.length, 256, 8)).toBe(small.groups.length);
    expect(small.groups.length).toBeLessThan(256);
  });
});

describe('coefficients checked before the sweep', () => {
  // The issue's cases: T = 1e7 s at 0.01 s (T/h = 1e9) gave 0 from the SIMD kernel and NaN from the
  // TypeScript one; ζ = 1e5 made the sub-step count explode. Both are refused, for both kernels.
  const short = synthesizeRecord({ seed: 3, dtS: 0.01, durationS: 2 });
  it('refuses a period too many steps long for the coefficients’ precision, on either kernel', () => {
    // 3,000 s of record (a single pulse in zeros) lets T = 2e6 s pass the record-length ceiling
    // (1000 lengths) while T/h = 2e8 is beyond the precision limit of 1e8.
    const long = new Float64Array(300_001);
    long[10] = 1;
    for (const kernel of ['js', 'wasm'] as const)
      expect(() => sweepOscillators(long, 0.01, { periodsS: [1, 2e6], dampings: [0.05], kernel })).toThrow(
        /T = 2000000 s.*lose their precision/,
      );
  });

  it('refuses a period more than 1000 times the record’s length, and takes one up to there', () => {
    // 2 s of record: 2,000 s is the longest period (our limit, src/oscillator/grid.ts).
    expect(() => planSweep(short.accelMS2, short.dtS, { periodsS: [1, 1e7], dampings: [0.05] })).toThrow(
      /T = 1e\+7 s is more than 1000 times the record's length \(2 s\); use periods up to 2000 s/,
    );
    const peaks = sweepOscillators(short.accelMS2, short.dtS, { periodsS: [2000], dampings: [0.05] });
    expect(Number.isFinite(peaks.sdM[0])).toBe(true);
  });

  it('refuses damping above the largest measured, and takes it up to there', () => {
    expect(() => planSweep(short.accelMS2, short.dtS, { periodsS: [1], dampings: [1e5] })).toThrow(
      /above 100 \(10000%\)/,
    );
    const peaks = sweepOscillators(short.accelMS2, short.dtS, {
      periodsS: [1],
      dampings: [100],
      kernel: 'js',
    });
    expect(Number.isFinite(peaks.sdM[0]) && peaks.sdM[0] > 0).toBe(true);
  });
});
